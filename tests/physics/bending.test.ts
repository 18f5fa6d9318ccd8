import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  BEND_INSENSITIVE_NOTE,
  bendLoss,
  bendLossSweep,
  criticalBendRadius,
  DEFAULT_BEND_RADIUS_MODEL,
  InputError,
  macNumber,
  MACROBEND_LIMITS,
  MACROBEND_LIMITS_EDITION,
  solveLpMode,
  STRESS_RADIUS_FACTOR_SILICA,
  stressRadiusFactor,
} from '../../src/physics';
import fixture from '../fixtures/bending/bending.json';

const fiber = fixture.fiber;

function nearRel(got: number, expected: number, rel: number, what: string): void {
  if (!(Math.abs(got - expected) <= rel * Math.abs(expected))) throw new Error(`${what}: got ${got}, expected ${expected} ± ${rel * 100} %`);
}

describe('Marcuse 1976 curvature loss, reproduced for a stated fiber (a = 4.1 µm, NA 0.12, n2 = 1.444)', () => {
  // Reference: independent scipy implementation (tests/fixtures/bending/generate.py). Same formula, separate code:
  // LP01 from scipy Bessel roots, K1 from scipy. Agreement limited by the LP01 root (1e-12) → 1e-9 relative,
  // loosened to 1e-7 because exp(−cR) amplifies a relative error in γ by cR (up to ~60 at 30 mm).
  it.each(fixture.rows)(
    '$wavelengthNm nm, R = $bendRadiusMm mm, stress corrected: $stressCorrected',
    ({ wavelengthNm, bendRadiusMm, stressCorrected, lossDbPerTurn, lossDbPerM }) => {
      const r = bendLoss({ ...fiber, wavelengthNm, bendRadiusMm, radiusModel: stressCorrected ? 'stress-corrected' : 'geometric' });
      nearRel(r.lossDbPerTurn, lossDbPerTurn, 1e-7, 'dB/turn');
      nearRel(r.lossDbPerM, lossDbPerM, 1e-7, 'dB/m');
    },
  );

  // The one stated factor: R_eff/R = 1/(1 − (n²/2)(p12 − ν(p11 + p12))) with p11 = 0.121, p12 = 0.270, ν = 0.17
  // (Schermer & Cole 2007, constants from memory). By hand for n = 1.449: n²/2 = 1.049800; 0.270 − 0.17 × 0.391 = 0.203530;
  // product 0.213666; 1/(1 − 0.213666) = 1.27172.
  it('the elastic-optic radius factor for a silica core of index 1.449 is 1.272 (Schermer & Cole 2007)', () => {
    nearRel(stressRadiusFactor(1.449), 1.27172, 1e-5, 'factor at n = 1.449');
    nearRel(STRESS_RADIUS_FACTOR_SILICA, 1.2717, 3e-4, 'stated factor');
    nearRel(stressRadiusFactor(Math.sqrt(fiber.claddingIndex ** 2 + fiber.na ** 2)), fixture.radiusFactor, 1e-12, 'factor of the fixture fiber');
  });

  it('the stress correction changes the loss more than ten times at 15 mm (regression pin: 12.78×, the code’s own value)', () => {
    const geometric = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 15, radiusModel: 'geometric' });
    const corrected = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 15, radiusModel: 'stress-corrected' });
    const ratio = geometric.lossDbPerTurn / corrected.lossDbPerTurn;
    // Real check: the corrected loss at R is the geometric loss at 1.272·R per metre (Schermer & Cole 2007 define the
    // correction as a change of radius only), so the ratio follows from the fixture's geometric curve alone.
    const atEffective = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 15 * corrected.radiusFactor, radiusModel: 'geometric' });
    nearRel(corrected.lossDbPerM, atEffective.lossDbPerM, 1e-12, 'corrected = geometric at the effective radius');
    expect(ratio).toBeGreaterThan(10);
    // Regression pin: 12.78 is what this code gave when the fixture was made; it guards against drift, not physics.
    nearRel(ratio, 12.78, 0.005, 'ratio');
  });

  it('a fiber type (or the screen) can choose its own factor explicitly, and the result says it was chosen', () => {
    const chosen = bendLoss({ ...fiber, radiusFactor: 1.2, wavelengthNm: 1550, bendRadiusMm: 15 });
    expect(chosen.radiusFactor).toBe(1.2);
    expect(chosen.radiusFactorChosen).toBe(true);
    nearRel(chosen.effectiveRadiusMm, 18, 1e-12, 'effective radius');
    nearRel(chosen.lossDbPerM, bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 18, radiusModel: 'geometric' }).lossDbPerM, 1e-12, 'loss per metre');
    expect(bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 15 }).radiusFactorChosen).toBe(false);
    expect(() => bendLoss({ ...fiber, radiusFactor: 0.5, wavelengthNm: 1550, bendRadiusMm: 15 })).toThrow(InputError);
    const c = criticalBendRadius({ ...fiber, radiusFactor: 1, wavelengthNm: 1550 });
    const g = criticalBendRadius({ ...fiber, radiusModel: 'geometric', wavelengthNm: 1550 });
    nearRel(c.bendRadiusMm, g.bendRadiusMm, 1e-12, 'factor 1 is the geometric radius');
  });

  it('the default model is the stress-corrected one', () => {
    expect(DEFAULT_BEND_RADIUS_MODEL).toBe('stress-corrected');
    expect(bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 15 }).radiusModel).toBe('stress-corrected');
  });
});

// Snyder & Love 1983 (Optical Waveguide Theory, §23, fundamental mode of a step profile, weak guidance) give the
// power attenuation coefficient in their own notation, from their own derivation (radiation from a curved fiber
// by the volume-current method):
//   γ = (√π / (2ρ)) (ρ/R)^{1/2} U² / (V² W^{3/2} K₁²(W)) · exp(−(4/3)(R/ρ) Δ W³/V²),  Δ = (n₁² − n₂²)/(2n₁²).
// Marcuse's 2α = √π κ² e^{−(2γ³/3β²)R} / (2 γ^{3/2} V² √R K₁²(γa)) coincides with it term by term (κ = U/ρ, γ = W/ρ),
// except that Marcuse's exponent carries the mode's β² where Snyder & Love's carries k²n₁² = V²/(2ρ²Δ): the same to the
// weak-guidance order. Written out here from S&L's form (formula from memory), with U and W from the mode engine.
describe('Snyder & Love 1983 LP01 bend formula coincides with Marcuse 1976', () => {
  const SL = (wavelengthNm: number, bendRadiusMm: number, useBeta: boolean) => {
    const rho = fiber.coreRadiusUm;
    const n2 = fiber.claddingIndex;
    const n1 = Math.sqrt(n2 * n2 + fiber.na * fiber.na);
    const k = (2 * Math.PI * 1000) / wavelengthNm;
    const V = k * rho * fiber.na;
    const { u: U, w: W } = solveLpMode(0, 1, V);
    const delta = (n1 * n1 - n2 * n2) / (2 * n1 * n1);
    const R = bendRadiusMm * 1000;
    const beta2 = (k * n2) ** 2 + (W / rho) ** 2;
    const exponent = useBeta ? ((2 * W ** 3) / (3 * rho ** 3 * beta2)) * R : (4 / 3) * (R / rho) * delta * (W ** 3 / V ** 2);
    // K₁(W) by its integral representation K₁(W) = ∫₀^∞ e^{−W cosh t} cosh t dt (A&S 9.6.24), midpoint rule.
    let k1 = 0;
    const h = 1e-3;
    for (let t = h / 2; t < 30; t += h) k1 += Math.exp(-W * Math.cosh(t)) * Math.cosh(t) * h;
    const gammaPerUm = (Math.sqrt(Math.PI) / (2 * rho)) * Math.sqrt(rho / R) * (U * U) / (V * V * W ** 1.5 * k1 * k1) * Math.exp(-exponent);
    return (10 / Math.LN10) * gammaPerUm * 1e6; // dB/m
  };

  it.each([
    [1550, 10],
    [1550, 15],
    [1625, 20],
    [1310, 8],
  ])('at %s nm and R = %s mm (geometric radius), with β² in the exponent: identical to 1e-6', (wavelengthNm, bendRadiusMm) => {
    const app = bendLoss({ ...fiber, wavelengthNm, bendRadiusMm, radiusModel: 'geometric' }).lossDbPerM;
    nearRel(app, SL(wavelengthNm, bendRadiusMm, true), 1e-6, 'dB/m');
  });

  // With S&L's own k²n₁² the exponent differs by the factor β²/(k²n₁²) = 1 − 2Δ(1 − b) (≈ 0.4 % here): the two
  // published forms agree within exp(exponent × 2Δ), the size of the weak-guidance approximation itself.
  it.each([
    [1550, 10],
    [1550, 15],
    [1625, 20],
  ])('at %s nm and R = %s mm, S&L’s own form agrees within the weak-guidance error', (wavelengthNm, bendRadiusMm) => {
    const app = bendLoss({ ...fiber, wavelengthNm, bendRadiusMm, radiusModel: 'geometric' }).lossDbPerM;
    const sl = SL(wavelengthNm, bendRadiusMm, false);
    const n1sq = fiber.claddingIndex ** 2 + fiber.na ** 2;
    const twoDelta = (n1sq - fiber.claddingIndex ** 2) / n1sq;
    const bound = Math.abs(Math.log(SL(wavelengthNm, bendRadiusMm, true) / sl)) + 1e-6;
    expect(Math.abs(Math.log(app / sl))).toBeLessThanOrEqual(bound);
    expect(bound).toBeLessThan(twoDelta * 40); // exponent ≲ 40 over these radii
  });
});

describe('what a technician sees', () => {
  it('ten turns lose ten times one turn', () => {
    const one = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 12 });
    const ten = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 12, turns: 10 });
    nearRel(ten.totalLossDb, 10 * one.lossDbPerTurn, 1e-12, 'ten turns');
  });

  it('1625 nm is more bend-sensitive than 1550 nm, and 1550 nm more than 1310 nm', () => {
    const at = (wavelengthNm: number) => bendLoss({ ...fiber, wavelengthNm, bendRadiusMm: 15 }).lossDbPerTurn;
    expect(at(1625)).toBeGreaterThan(at(1550));
    expect(at(1550)).toBeGreaterThan(at(1310));
  });

  it('the critical radius is where the loss per turn is 0.1 dB', () => {
    const c = criticalBendRadius({ ...fiber, wavelengthNm: 1550 });
    expect(c.status).toBe('found');
    nearRel(bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: c.bendRadiusMm }).lossDbPerTurn, 0.1, 1e-9, 'loss at critical radius');
    // The bracket comes from the independent scipy fixture (tests/fixtures/bending/generate.py), not from this code:
    // its rows give more than 0.1 dB/turn at 10 mm and less at 15 mm (stress corrected, 1550 nm).
    const row = (r: number) => fixture.rows.find((x) => x.wavelengthNm === 1550 && x.bendRadiusMm === r && x.stressCorrected)!.lossDbPerTurn;
    expect(row(10)).toBeGreaterThan(0.1);
    expect(row(15)).toBeLessThan(0.1);
    expect(c.bendRadiusMm).toBeGreaterThan(10);
    expect(c.bendRadiusMm).toBeLessThan(15);
  });

  // ITU-T G.652 (11/2016), macrobending loss: 100 turns on a 30 mm radius lose at most 0.1 dB at 1625 nm (values
  // written here as the Recommendation states them, from memory; not read from the code's MACROBEND_LIMITS).
  // The model fiber (a = 4.1 µm, NA 0.12: MFD ≈ 9.2 µm at 1310 nm, cutoff ≈ 1.3 µm) is a G.652-like design.
  it('a G.652-like fiber loses under 0.1 dB in 100 turns at 30 mm radius at 1625 nm (ITU-T G.652)', () => {
    // With the default (stress-corrected) radius. The geometric radius predicts about 0.13 dB here, above a limit every
    // G.652 fiber meets: the reason the corrected radius, which matches measurement, is the default.
    const r = bendLoss({ ...fiber, wavelengthNm: 1625, bendRadiusMm: 30, turns: 100 });
    expect(r.radiusModel).toBe('stress-corrected');
    expect(r.totalLossDb).toBeLessThan(0.1);
    const limit = MACROBEND_LIMITS.find((x) => x.category === 'G.652.D');
    expect(limit).toMatchObject({ bendRadiusMm: 30, turns: 100, maxLossDb1625: 0.1 });
  });

  it('a sweep over 200 radii gives falling loss with radius', () => {
    const pts = bendLossSweep({ ...fiber, wavelengthNm: 1550, minRadiusMm: 5, maxRadiusMm: 40, count: 200 });
    expect(pts).toHaveLength(200);
    for (let i = 1; i < pts.length; i++) expect(pts[i].lossDbPerTurn).toBeLessThan(pts[i - 1].lossDbPerTurn);
  });

  it('MAC number: 9.2 µm MFD and 1260 nm cutoff give 7.3 (MFD/λc, common practice)', () => {
    nearRel(macNumber(9.2, 1260), 9.2 / 1.26, 1e-12, 'MAC');
  });
});

describe('reference limits', () => {
  it('name their edition and say they are indicative', () => {
    expect(MACROBEND_LIMITS_EDITION).toMatch(/G\.657 \(11\/2016\)/);
    expect(MACROBEND_LIMITS_EDITION).toMatch(/indicative/);
  });

  it('get stricter from A1 to A2 to B3 at 10 mm', () => {
    const at10 = (c: string) => MACROBEND_LIMITS.find((x) => x.category === c && x.bendRadiusMm === 10)?.maxLossDb1550 ?? Number.NaN;
    expect(at10('G.657.A2')).toBeLessThan(at10('G.657.A1'));
    expect(at10('G.657.B3')).toBeLessThan(at10('G.657.A2'));
  });

  it('cover A1, A2, B2 and B3 at 1550 and 1625 nm', () => {
    for (const c of ['G.657.A1', 'G.657.A2', 'G.657.B2', 'G.657.B3']) {
      const rows = MACROBEND_LIMITS.filter((x) => x.category === c);
      expect(rows.length).toBeGreaterThan(0);
      for (const r of rows) {
        expect(r.maxLossDb1550).toBeGreaterThan(0);
        expect(r.maxLossDb1625).toBeGreaterThan(r.maxLossDb1550 ?? 0);
      }
    }
  });

  it('come with the plain statement that trench-assisted fibers beat the step-index estimate', () => {
    expect(BEND_INSENSITIVE_NOTE).toMatch(/far less/);
    expect(BEND_INSENSITIVE_NOTE).toMatch(/category limits/);
  });
});

describe('physical laws', () => {
  it('loss is never negative and never NaN, up to 500 mm radius', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 500, noNaN: true }), fc.constantFrom(1310, 1550, 1625), fc.boolean(), (bendRadiusMm, wavelengthNm, corr) => {
        const r = bendLoss({ ...fiber, wavelengthNm, bendRadiusMm, radiusModel: corr ? 'stress-corrected' : 'geometric' });
        return Number.isFinite(r.lossDbPerTurn) && r.lossDbPerTurn >= 0 && Number.isFinite(r.totalLossDb);
      }),
    );
  });

  it('the stress correction always lowers the loss', () => {
    fc.assert(
      fc.property(fc.double({ min: 2, max: 60, noNaN: true }), (bendRadiusMm) => {
        const g = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm, radiusModel: 'geometric' }).lossDbPerTurn;
        const c = bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm, radiusModel: 'stress-corrected' }).lossDbPerTurn;
        return c < g;
      }),
    );
  });
});

describe('bad input', () => {
  it.each([
    () => bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 0 }),
    () => bendLoss({ ...fiber, wavelengthNm: 1.55, bendRadiusMm: 15 }),
    () => bendLoss({ ...fiber, wavelengthNm: 1550, bendRadiusMm: 15, turns: 2.5 }),
    () => bendLoss({ ...fiber, na: -0.1, wavelengthNm: 1550, bendRadiusMm: 15 }),
    () => macNumber(9.2, 1.26),
  ])('is refused with an InputError (%#)', (call) => {
    expect(call).toThrow(InputError);
  });
});
