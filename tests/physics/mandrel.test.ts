import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, MANDREL_TABLE, mandrelFilter, multimodeModes, rayPeriodIntegral, recommendedMandrel } from '../../src/physics';


function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

const GRADED = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };
const STEP = { profile: 'step' as const, coreRadiusUm: 25, na: 0.2 };
const graded850 = multimodeModes(GRADED, 850);
const step1300 = multimodeModes(STEP, 1300);

describe('ray period of an α-profile', () => {
  // I_α = ∫₀¹ (1 − s^α)^{−1/2} ds = B(1/α, 1/2)/α (A&S 6.2.1 with s^α = t): π/2 for α = 2, 2 for α = 1,
  // Γ(1/4)Γ(1/2)/(4Γ(3/4)) = 1.3110287771461 for α = 4 (Γ values A&S Table 6.1); 1 for a step.
  it.each([
    { alpha: 1, expected: 2 },
    { alpha: 2, expected: Math.PI / 2 },
    { alpha: 4, expected: 1.3110287771461 },
    { alpha: Number.POSITIVE_INFINITY, expected: 1 },
  ])('I_α for α = $alpha is $expected (1e-9)', ({ alpha, expected }) => {
    near(rayPeriodIntegral({ alpha }), expected, 1e-9, `I_${alpha}`);
  });

  it('every ray of a parabolic fiber has the period 2π a n_eff / NA (Gloge & Marcatili 1973), within 1e-9 relative', () => {
    const r = mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: 25, cordDiameterMm: 0.25, turns: 5 });
    const n2 = 1.4525; // default cladding of gradedIndexProfile (radialSolver.ts)
    for (const m of r.perMode) {
      const neff = Math.sqrt(n2 * n2 + m.b * 0.04);
      near(m.rayPeriodMm, (2 * Math.PI * 25 * neff) / 0.2 / 1000, 1e-9 * m.rayPeriodMm, `LP${m.l}${m.m}`);
    }
  });
});

describe('modes stripped by a mandrel against Gloge 1972', () => {
  // Gloge 1972 (formula from memory): share of modes still guided in a bend of radius R,
  // M_eff/M = 1 − ((α + 2)/(2αΔ)) [2a/R + (3/(2 n₂ k R))^{2/3}]. Its second term is the band of modes whose
  // WKB barrier exponent is below 1 (2Φ < 1) in the cladding; a step has no barrier inside the core, so there the
  // count of modes with 2Φ ≥ 1 must reproduce Gloge's share. Tolerance 0.03: the modes are discrete (≈ 300 here)
  // and Gloge's formula is the continuum limit with n₁ ≈ n₂.
  it.each([20, 30, 60])('a step-index 50 µm fiber on a %d mm mandrel keeps the share of modes Gloge 1972 gives (±0.03)', (d) => {
    const r = mandrelFilter({ fiber: STEP, wavelengthNm: 1300, modes: step1300, mandrelDiameterMm: d, cordDiameterMm: 0.25, turns: 5 });
    const total = r.perMode.reduce((s, m) => s + m.degeneracy, 0);
    const kept = r.perMode.reduce((s, m) => s + (m.barrier >= 1 ? m.degeneracy : 0), 0) / total;
    near(kept, r.glogeGuidedModeShare, 0.03, 'share of modes with 2Φ ≥ 1');
  });

  // In a graded core the barrier starts inside the core, which Gloge's count leaves out; on the mandrels the
  // trade uses (15–25 mm) it is thin and the share of modes keeping half their power matches within 0.02.
  it.each([15, 25])('a graded 50 µm fiber on a %d mm mandrel keeps the share of modes Gloge 1972 gives (±0.02)', (d) => {
    const r = mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: d, cordDiameterMm: 0.25, turns: 5 });
    const total = r.perMode.reduce((s, m) => s + m.degeneracy, 0);
    const kept = r.perMode.reduce((s, m) => s + (m.transmission > 0.5 ? m.degeneracy : 0), 0) / total;
    near(kept, r.glogeGuidedModeShare, 0.02, 'share of modes keeping half their power');
  });

  it('strips whole groups from the top down: once a group is stripped every higher group is too', () => {
    const r = mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: 25, cordDiameterMm: 0.25, turns: 5 });
    const first = r.perGroup.findIndex((g) => g.fate === 'stripped');
    expect(first).toBeGreaterThan(0);
    for (const g of r.perGroup.slice(first)) expect(g.fate).toBe('stripped');
    expect(r.perGroup[0].fate).toBe('kept');
  });

  it('more than five turns add little (under 0.2 dB for five more), one turn does most of the work', () => {
    // "More than 5 full wraps creates little additional loss, so 3 to 5 turns are commonly specified" (common practice).
    const loss = (turns: number) => mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: 25, cordDiameterMm: 0.25, turns }).lossDb;
    expect(loss(10) - loss(5)).toBeLessThan(0.2);
    expect(loss(1)).toBeGreaterThan(0.8 * loss(5));
  });
});

describe('laws of the mandrel model', () => {
  it('a larger mandrel never strips more, more turns never strip less, and the loss is never negative', () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 160, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), fc.integer({ min: 0, max: 9 }), (d, grow, turns) => {
        const at = (mandrelDiameterMm: number, t: number) => mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm, cordDiameterMm: 0.9, turns: t }).lossDb;
        const base = at(d, turns);
        return base >= 0 && at(d * grow, turns) <= base + 1e-12 && at(d, turns + 1) >= base - 1e-12;
      }),
      { numRuns: 40 },
    );
  });

  it('no turns, no loss', () => {
    near(mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: 15, cordDiameterMm: 3, turns: 0 }).lossDb, 0, 1e-12, 'loss');
  });

  it('a launch with no power in the high groups passes the mandrel with almost no loss (an underfilled launch is not changed)', () => {
    // Mandrel wrapping "has no effect" on an underfilled launch (common practice): only groups 1–5 lit here.
    const powers = graded850.modes.map((m) => (m.principal <= 5 ? m.degeneracy : 0));
    const r = mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: 25, cordDiameterMm: 0.25, turns: 5, powers });
    expect(r.lossDb).toBeLessThan(0.01);
  });

  it('a mode set solved at another wavelength is refused', () => {
    expect(() => mandrelFilter({ fiber: GRADED, wavelengthNm: 1300, modes: graded850, mandrelDiameterMm: 25, cordDiameterMm: 0.25, turns: 5 })).toThrow(InputError);
  });

  it('a cord diameter typed in micrometres gets a hint', () => {
    expect(() => mandrelFilter({ fiber: GRADED, wavelengthNm: 850, modes: graded850, mandrelDiameterMm: 25, cordDiameterMm: 900, turns: 5 })).toThrow(/did you mean 0.9\s?mm/);
  });
});

describe('the mandrel table', () => {
  it.each([
    { core: 50, cord: 3, mandrel: 22 },
    { core: 50, cord: 0.25, mandrel: 25 },
    { core: 62.5, cord: 3, mandrel: 17 },
    { core: 62.5, cord: 0.9, mandrel: 20 },
  ])('$core µm core in a $cord mm cord: $mandrel mm, five turns (TIA-568-B.1 Table 11-15, from memory)', ({ core, cord, mandrel }) => {
    const r = recommendedMandrel({ coreDiameterUm: core, cordDiameterMm: cord });
    expect(r?.mandrelDiameterMm).toBe(mandrel);
    expect(r?.turns).toBe(5);
  });

  it('a smaller core takes a smaller mandrel for every cord (the 62.5 µm core has more modes near its edge to lose)', () => {
    for (const row of MANDREL_TABLE.filter((r) => r.coreDiameterUm === 62.5)) {
      expect(row.mandrelDiameterMm).toBeLessThan(recommendedMandrel({ coreDiameterUm: 50, cordDiameterMm: row.cordDiameterMm })!.mandrelDiameterMm);
    }
  });

  it('has no row for a 9 µm core or a cord not in the table', () => {
    expect(recommendedMandrel({ coreDiameterUm: 9, cordDiameterMm: 3 })).toBeUndefined();
    expect(recommendedMandrel({ coreDiameterUm: 50, cordDiameterMm: 1.6 })).toBeUndefined();
  });
});
