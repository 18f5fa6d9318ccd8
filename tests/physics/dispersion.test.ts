import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import fixture from '../fixtures/dispersion/dispersion.json';
import {
  chromaticDispersion,
  DISPERSION_CRITERION,
  dispersionFiberFromNa,
  dispersionLimitedReach,
  dispersionSlope,
  dispersionSweep,
  InputError,
  linkDispersionPsPerNm,
  FUSED_SILICA,
  germaniaDopedSilica,
  lp01WaveguideFunctions,
  materialDispersionPsPerNmKm,
  ModelError,
  zeroDispersion,
  type DispersionFiber,
} from '../../src/physics';

function expectWithin(got: number, expected: number, tol: number, input: unknown) {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`input ${JSON.stringify(input)}: got ${got}, expected ${expected}, tolerance ${tol}`);
}

// Standard-like single-mode fiber model: step-index core of radius 4.1 µm with 3.5 mol % GeO₂ over pure silica
// (Δ ≈ 0.36 %, NA ≈ 0.123, fiber cutoff ≈ 1318 nm): the textbook picture of a G.652 fiber (common practice).
const STANDARD_LIKE: DispersionFiber = { coreRadiusUm: 4.1, germaniaFraction: 0.035 };

describe('a standard-like single-mode fiber', () => {
  // ITU-T G.652: zero-dispersion wavelength λ0 from 1300 to 1324 nm (the range itself is the tolerance).
  it('has its zero-dispersion wavelength within the G.652 range 1300–1324 nm', () => {
    const z = zeroDispersion(STANDARD_LIKE);
    expect(z).toBeDefined();
    const w0 = z!.wavelengthNm;
    if (!(w0 >= 1300 && w0 <= 1324)) throw new Error(`λ0: got ${w0} nm, expected 1300–1324 nm (ITU-T G.652)`);
  });

  // D(1550) ≈ 17 ps/(nm·km) for G.652 fiber (common practice); ±1 ps/(nm·km) covers the usual 16–18 spread.
  it('disperses about 17 ps/(nm·km) at 1550 nm', () => {
    expectWithin(chromaticDispersion(STANDARD_LIKE, 1550).totalPsPerNmKm, 17, 1, 1550);
  });

  // G.652 zero-dispersion slope S0 ≤ 0.092 ps/(nm²·km); typical 0.086–0.09 (common practice, from memory).
  it('has a zero-dispersion slope between 0.08 and 0.092 ps/(nm²·km)', () => {
    const s = zeroDispersion(STANDARD_LIKE)!.slopePsPerNm2Km;
    if (!(s >= 0.08 && s <= 0.092)) throw new Error(`S0: got ${s}, expected 0.08–0.092 ps/(nm²·km)`);
  });

  it('is single-mode over the whole sweep: V stays below 2.405 from 1320 nm up', () => {
    for (const p of dispersionSweep(STANDARD_LIKE, { fromNm: 1320, toNm: 1650, stepNm: 10 })) expect(p.v).toBeLessThan(2.405);
  });

  it('material dispersion dominates and the waveguide part is negative (it shifts λ0 to longer wavelengths)', () => {
    const p = chromaticDispersion(STANDARD_LIKE, 1550);
    expect(p.materialPsPerNmKm).toBeGreaterThan(p.totalPsPerNmKm);
    expect(p.waveguidePsPerNmKm).toBeLessThan(0);
    expectWithin(p.materialPsPerNmKm + p.waveguidePsPerNmKm + p.profilePsPerNmKm, p.totalPsPerNmKm, 1e-12, 'parts add up');
  });
});

describe('agreement with an independent 50-digit computation (tests/fixtures/dispersion/generate.py, mpmath)', () => {
  // The fixture differentiates n_eff numerically in 50-digit arithmetic; the app differentiates analytically in
  // double precision. Agreement to 1e-8 ps/(nm·km) covers the mode solver's ~1e-13 error in u, amplified
  // by the second derivative.
  it.each(fixture.dispersion)('D at $wavelengthNm nm for a = $coreRadiusUm µm, x = $germaniaFraction', (row) => {
    const got = chromaticDispersion({ coreRadiusUm: row.coreRadiusUm, germaniaFraction: row.germaniaFraction }, row.wavelengthNm).totalPsPerNmKm;
    expectWithin(got, row.dispersionPsPerNmKm, 1e-8, row);
  });

  // b to 1e-13 (mode solver accuracy), derivatives analytic here vs 5-point differences there: 1e-10.
  it.each(fixture.lp01)('LP01 b, d(Vb)/dV and V d²(Vb)/dV² at V = $v', (row) => {
    const g = lp01WaveguideFunctions(row.v);
    expectWithin(g.b, row.b, 1e-13, row);
    expectWithin(g.dVbDv, row.dVbDv, 1e-10, row);
    expectWithin(g.vD2VbDv2, row.vD2VbDv2, 1e-10, row);
  });
});

describe('each part of D on its own, against independent numerical derivatives (tests/fixtures/dispersion/generate.py)', () => {
  // Material part: −(λ/c)·d²/dλ²[n₂ + b(n₁ − n₂)] at fixed b, differentiated numerically in 50 digits; the app's
  // analytic n″ agrees to the mode solver's b (1e-13) times n″: 1e-8 ps/(nm·km) is ample and still far below
  // any change of the formula (dropping the b-weighted core term moves it by ~0.1 ps/(nm·km)).
  it.each(fixture.parts)('material part at $wavelengthNm nm for a = $coreRadiusUm µm, x = $germaniaFraction', (row) => {
    const got = chromaticDispersion({ coreRadiusUm: row.coreRadiusUm, germaniaFraction: row.germaniaFraction }, row.wavelengthNm).materialPsPerNmKm;
    expectWithin(got, row.materialPsPerNmKm, 1e-8, row);
  });

  // Waveguide part: −(N₂²Δ/(n₂cλ))·V d²(Vb)/dV² with N₂ = n₂ − λn₂′ and V(Vb)″ both by numerical derivatives there.
  // Dropping the group-index factor (N₂² → n₂²) moves it by ~3 %, scaling it by anything by as much: 1e-8 catches both.
  it.each(fixture.parts)('waveguide part at $wavelengthNm nm for a = $coreRadiusUm µm, x = $germaniaFraction', (row) => {
    const got = chromaticDispersion({ coreRadiusUm: row.coreRadiusUm, germaniaFraction: row.germaniaFraction }, row.wavelengthNm).waveguidePsPerNmKm;
    expectWithin(got, row.waveguidePsPerNmKm, 1e-8, row);
  });

  // With both parts pinned, the profile part (the remainder) is pinned too: total − material − waveguide, all from the fixture.
  it.each(fixture.parts)('profile part at $wavelengthNm nm for a = $coreRadiusUm µm is what the total leaves', (row) => {
    const total = fixture.dispersion.find((d) => d.coreRadiusUm === row.coreRadiusUm && d.germaniaFraction === row.germaniaFraction && d.wavelengthNm === row.wavelengthNm);
    if (!total) return;
    const got = chromaticDispersion({ coreRadiusUm: row.coreRadiusUm, germaniaFraction: row.germaniaFraction }, row.wavelengthNm).profilePsPerNmKm;
    expectWithin(got, total.dispersionPsPerNmKm - row.materialPsPerNmKm - row.waveguidePsPerNmKm, 3e-8, row);
  });
});

describe('material dispersion of a glass on its own', () => {
  const glassOf = (x: number) => (x === 0 ? FUSED_SILICA : germaniaDopedSilica(x));
  // −(λ/c)·n″ with n″ by 5-point differences in 50 digits (generate.py): agreement to rounding, 1e-9 ps/(nm·km).
  it.each(fixture.glass)('$glass at $wavelengthNm nm', (row) => {
    expectWithin(materialDispersionPsPerNmKm({ glass: glassOf(row.germaniaFraction), wavelengthNm: row.wavelengthNm }), row.dispersionPsPerNmKm, 1e-9, row);
  });

  // Agrawal, Nonlinear Fiber Optics (5th ed.), §1.2.3: for bulk fused silica β₂ vanishes at about 1.27 µm. The
  // Malitson 1965 Sellmeier equation puts it at 1272.75 nm (fixture); the published figure to its stated 2 digits.
  it('fused silica has zero material dispersion near 1.27 µm (Agrawal §1.2.3)', () => {
    const zeroNm = fixture.silicaZeroMaterialDispersionNm;
    expect(Math.abs(zeroNm - 1270)).toBeLessThan(5);
    expect(materialDispersionPsPerNmKm({ glass: FUSED_SILICA, wavelengthNm: zeroNm - 5 })).toBeLessThan(0);
    expect(materialDispersionPsPerNmKm({ glass: FUSED_SILICA, wavelengthNm: zeroNm + 5 })).toBeGreaterThan(0);
  });

  it('the material part of a fiber is the b-weighted mix of its core and cladding glasses', () => {
    const p = chromaticDispersion(STANDARD_LIKE, 1550);
    const clad = materialDispersionPsPerNmKm({ glass: FUSED_SILICA, wavelengthNm: 1550 });
    const core = materialDispersionPsPerNmKm({ glass: germaniaDopedSilica(STANDARD_LIKE.germaniaFraction), wavelengthNm: 1550 });
    expectWithin(p.materialPsPerNmKm, (1 - p.b) * clad + p.b * core, 1e-12, 'mix');
  });

  it('refuses a wavelength outside the glass’s Sellmeier range', () => {
    expect(() => materialDispersionPsPerNmKm({ glass: germaniaDopedSilica(0.05), wavelengthNm: 2400 })).toThrow(ModelError);
  });
});

describe('dispersion results are finite for every fiber-like parameter set (property)', () => {
  // Single-mode and near-single-mode equivalent step-index fibers: core radius 1.5–6 µm, NA 0.08–0.25
  // (G.652, G.654, G.655, G.657 equivalents and typed values all fall inside; common practice).
  it('D, its parts, V and group index are finite from 1200 to 1700 nm', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.5, max: 6, noNaN: true }),
        fc.double({ min: 0.08, max: 0.25, noNaN: true }),
        fc.double({ min: 1200, max: 1700, noNaN: true }),
        (a, na, w) => {
          const p = chromaticDispersion(dispersionFiberFromNa({ coreRadiusUm: a, na }), w);
          for (const [k, v] of Object.entries(p)) if (!Number.isFinite(v)) throw new Error(`a=${a} NA=${na} λ=${w}: ${k} = ${v}`);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('sweep, slope and link figures', () => {
  it('a 1200–1650 nm sweep at 1 nm has 451 points in order', () => {
    const s = dispersionSweep(STANDARD_LIKE);
    expect(s).toHaveLength(451);
    expect(s[0]!.wavelengthNm).toBe(1200);
    expect(s[450]!.wavelengthNm).toBe(1650);
  });

  it('the slope at 1550 nm matches the change of D over ±10 nm', () => {
    const d = (w: number) => chromaticDispersion(STANDARD_LIKE, w).totalPsPerNmKm;
    // Over ±10 nm the curvature of D adds ~1e-5 ps/(nm²·km) to the wide difference: tolerance 1e-4.
    expectWithin(dispersionSlope(STANDARD_LIKE, 1550), (d(1560) - d(1540)) / 20, 1e-4, 1550);
  });

  it('80 km at 17 ps/(nm·km) accumulates 1360 ps/nm', () => {
    expect(linkDispersionPsPerNm(17, 80)).toBe(1360);
  });

  // Quarter-bit-slot criterion |D|·L·Δλ ≤ 1/(4B): 10 Gbit/s → 25 ps; Δλ = 0.1 nm → 250 ps/nm; at 17 ps/(nm·km)
  // the reach is 250/17 = 14.70588… km (arithmetic of the stated criterion, Agrawal §2.4).
  it('10 Gbit/s with a 0.1 nm wide source reaches 14.7 km on 17 ps/(nm·km) fiber', () => {
    const r = dispersionLimitedReach({ dispersionPsPerNmKm: 17, bitRateGbps: 10, spectralWidthNm: 0.1 });
    expectWithin(r.maxPsPerNm, 250, 1e-12, r);
    expectWithin(r.reachKm!, 250 / 17, 1e-12, r);
    expect(r.criterion).toBe(DISPERSION_CRITERION);
  });

  it('at zero dispersion there is no first-order reach limit, and it says so rather than a number', () => {
    expect(dispersionLimitedReach({ dispersionPsPerNmKm: 0, bitRateGbps: 10, spectralWidthNm: 1 }).reachKm).toBeUndefined();
  });

  it('halving the bit rate doubles the reach, and negative D counts like positive', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 40, noNaN: true }), fc.double({ min: 0.1, max: 100, noNaN: true }), (d, b) => {
        const full = dispersionLimitedReach({ dispersionPsPerNmKm: d, bitRateGbps: b, spectralWidthNm: 0.2 }).reachKm!;
        const half = dispersionLimitedReach({ dispersionPsPerNmKm: -d, bitRateGbps: b / 2, spectralWidthNm: 0.2 }).reachKm!;
        expectWithin(half / full, 2, 1e-12, { d, b });
      }),
    );
  });
});

describe('bad input', () => {
  it.each([
    ['a wavelength typed in µm', () => chromaticDispersion(STANDARD_LIKE, 1.55), InputError],
    ['a wavelength outside 600–1800 nm', () => chromaticDispersion(STANDARD_LIKE, 2000), InputError],
    ['no germania in the core', () => chromaticDispersion({ coreRadiusUm: 4, germaniaFraction: 0 }, 1550), InputError],
    ['a core so thin LP01 is barely bound', () => chromaticDispersion({ coreRadiusUm: 0.05, germaniaFraction: 0.01 }, 1700), ModelError],
    ['a reversed sweep', () => dispersionSweep(STANDARD_LIKE, { fromNm: 1600, toNm: 1300 }), InputError],
    ['a zero bit rate', () => dispersionLimitedReach({ dispersionPsPerNmKm: 17, bitRateGbps: 0, spectralWidthNm: 1 }), InputError],
  ])('%s is refused', (_n, f, kind) => {
    expect(f).toThrow(kind);
  });
});
