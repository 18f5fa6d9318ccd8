import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  gaussianFitLp01,
  lp01Field,
  lpFieldAt,
  marcuseSpotRatio,
  MARCUSE_MAX_V,
  MARCUSE_MIN_V,
  modeFieldDiameterUm,
  petermann2SpotRatio,
} from '../../src/physics/modeField';
import { lpModes, solveLpMode } from '../../src/physics/lpModes';
import { InputError } from '../../src/physics/errors';
import fixture from '../fixtures/scipy-mode-field/mode-field.json';

function expectRelative(label: string, got: number, expected: number, tolerance: number): void {
  const error = Math.abs(got / expected - 1);
  if (!(error <= tolerance)) {
    throw new Error(`${label}: got ${got}, expected ${expected}, relative error ${error.toExponential(2)} > tolerance ${tolerance}`);
  }
}

/** A standard-like single-mode fiber for the checks below (our choice): a = 4.1 µm, NA = 0.12. */
const STANDARD_LIKE = { coreRadiusUm: 4.1, na: 0.12 };

describe(`LP01 spot sizes against plain numerical integration with scipy ${fixture.scipy}`, () => {
  // Petermann II: our closed form (Lommel integrals) vs scipy quad to infinity at epsrel 1e-13 → 1e-11.
  it.each(fixture.rows)('Petermann II spot w_p/a at V = $v is $petermann2', (row) => {
    expectRelative(`w_p/a at V = ${row.v}`, petermann2SpotRatio(row.v), row.petermann2, 1e-11);
  });
  // Gaussian fit: scipy's bounded minimizer can only place a flat maximum to ≈ √ε ≈ 1.5e-8
  // relative, so 5e-8 on w0; the overlap at the maximum is second-order in that, so 1e-12.
  it.each(fixture.rows)('best-fit Gaussian spot w0/a at V = $v is $gaussian, with overlap $overlap', (row) => {
    const fit = gaussianFitLp01(row.v);
    expectRelative(`w0/a at V = ${row.v}`, fit.spotRatio, row.gaussian, 5e-8);
    expectRelative(`overlap at V = ${row.v}`, fit.overlap, row.overlap, 1e-12);
  });
  it('the best-fit Gaussian is a true maximum of the overlap: 0.01 % either side is worse', () => {
    fc.assert(
      // V ≥ 1.2 keeps the field below e^-15 of its edge value at 40a, where the samples stop
      fc.property(fc.double({ min: 1.2, max: 4, noNaN: true }), (v) => {
        const { spotRatio, overlap } = gaussianFitLp01(v);
        const field = lp01Field(v, { samples: 4001, rMaxOverA: 40 });
        // independent η by the trapezoid rule on the sampled field (coarser: compare only the ordering)
        const eta = (s: number) => {
          let i1 = 0;
          let p = 0;
          for (let i = 1; i < field.rOverA.length; i++) {
            const r = field.rOverA[i];
            const h = field.rOverA[i] - field.rOverA[i - 1];
            i1 += h * r * field.field[i] * Math.exp(-(r * r) / (s * s));
            p += h * r * field.field[i] ** 2;
          }
          return (i1 * i1) / (p * ((s * s) / 4));
        };
        expect(eta(spotRatio)).toBeGreaterThan(eta(spotRatio * 1.0001) - 1e-12);
        expect(eta(spotRatio)).toBeGreaterThan(eta(spotRatio * 0.9999) - 1e-12);
        expect(overlap).toBeLessThan(1);
      }),
      { numRuns: 10 },
    );
  });
});

describe("Marcuse's closed-form spot size (Marcuse 1977, BSTJ 56(5))", () => {
  it('w/a = 0.65 + 1.619 V^-1.5 + 2.879 V^-6: at V = 2 it is 0.65 + 0.5724 + 0.0450 = 1.2674 (hand calculation)', () => {
    expectRelative('Marcuse at V = 2', marcuseSpotRatio(2), 0.65 + 1.619 / Math.pow(2, 1.5) + 2.879 / 64, 1e-15);
  });
  it.each([1.2, 1.4, 1.6, 1.8, 2.0, 2.2, 2.4])('at V = %f it is within 1 % of the exact best-fit Gaussian, as Marcuse states for 1.2 < V < 2.4', (v) => {
    expectRelative(`Marcuse vs exact Gaussian at V = ${v}`, marcuseSpotRatio(v), gaussianFitLp01(v).spotRatio, 0.01);
  });
  it('outside 1.2 < V < 2.4 the result carries a validity note, and at V = 0.8 the formula is indeed off by more than 10 %', () => {
    // a = 4.1 µm, NA 0.12 at 2000 nm: V = 1.546 inside; at 2500 nm V = 1.236 inside; so use a smaller core.
    const result = modeFieldDiameterUm({ coreRadiusUm: 1.4, na: 0.12, wavelengthNm: 1310, definition: 'marcuse' });
    expect(result.v).toBeLessThan(MARCUSE_MIN_V);
    expect(result.validity).toMatch(/1\.2 < V < 2\.4/);
    expect(Math.abs(marcuseSpotRatio(0.8) / gaussianFitLp01(0.8).spotRatio - 1)).toBeGreaterThan(0.1);
  });
  it('inside its range there is no validity note', () => {
    const result = modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1310, definition: 'marcuse' });
    expect(result.v).toBeGreaterThan(MARCUSE_MIN_V);
    expect(result.v).toBeLessThan(MARCUSE_MAX_V);
    expect(result.validity).toBeUndefined();
  });
});

describe('MFD of a standard-like single-mode fiber (a = 4.1 µm, NA = 0.12, our choice)', () => {
  it('Petermann II MFD at 1310 nm lies in the ITU-T G.652 (11/2016) nominal range 8.6–9.2 µm', () => {
    const { mfdUm, validity } = modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1310, definition: 'petermann2' });
    expect(mfdUm).toBeGreaterThanOrEqual(8.6);
    expect(mfdUm).toBeLessThanOrEqual(9.2);
    expect(validity).toBeUndefined();
  });
  it('Petermann II MFD at 1550 nm lies in 9.9–10.9 µm, the usual data-sheet range for G.652 fiber (common practice; G.652 sets no 1550 nm MFD)', () => {
    const { mfdUm } = modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1550, definition: 'petermann2' });
    expect(mfdUm).toBeGreaterThanOrEqual(9.9);
    expect(mfdUm).toBeLessThanOrEqual(10.9);
  });
  it.each(['petermann2', 'gaussian', 'marcuse'] as const)('the %s MFD grows with wavelength (the field spreads as V falls)', (definition) => {
    const at1310 = modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1310, definition }).mfdUm;
    const at1550 = modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1550, definition }).mfdUm;
    expect(at1550).toBeGreaterThan(at1310);
  });
  it('above the LP11 cutoff the MFD carries a not-single-mode note', () => {
    const result = modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 850, definition: 'petermann2' });
    expect(result.validity).toMatch(/not single-mode/);
  });
});

describe('the LP field itself', () => {
  it('is 1 at the core boundary from both sides, for every guided mode', () => {
    for (const mode of lpModes(12)) {
      expect(lpFieldAt(mode, 1)).toBeCloseTo(1, 12);
      expect(lpFieldAt(mode, 1 + 1e-12)).toBeCloseTo(1, 9);
    }
  });
  it('has a continuous slope at the core boundary (that is what the eigenvalue equation says), to 1e-5', () => {
    // central differences with h = 1e-5 carry an O(h) one-sided error; 1e-5 relative is ample
    for (const mode of lpModes(12)) {
      const h = 1e-5;
      const inside = (lpFieldAt(mode, 1) - lpFieldAt(mode, 1 - h)) / h;
      const outside = (lpFieldAt(mode, 1 + h) - lpFieldAt(mode, 1)) / h;
      expect(Math.abs(inside - outside)).toBeLessThan(1e-4 * Math.max(1, Math.abs(inside)) + 30 * h * (mode.u * mode.u + mode.w * mode.w));
    }
  });
  it('LP01 starts at 1 on the axis and falls monotonically outward', () => {
    const { rOverA, field } = lp01Field(2.2);
    expect(rOverA[0]).toBe(0);
    expect(field[0]).toBe(1);
    for (let i = 1; i < field.length; i++) expect(field[i]).toBeLessThan(field[i - 1]);
  });
  it('decays like K_l outside: the LP01 field at 3a is J0(u) K0(3w)/K0(w) (A&S 9.6 values via the public besselK)', async () => {
    const { besselJ, besselK } = await import('../../src/physics/bessel');
    const mode = solveLpMode(0, 1, 2.0);
    const { field } = lp01Field(2.0, { samples: 4, rMaxOverA: 3 });
    expectRelative('E(3a)', field[3], besselJ(0, mode.u) * (besselK(0, 3 * mode.w) / besselK(0, mode.w)), 1e-13);
  });
  it('never returns NaN, even far out at high order', () => {
    for (const mode of lpModes(60).filter((m) => m.l > 40)) {
      expect(Number.isFinite(lpFieldAt(mode, 50))).toBe(true);
    }
  });
});

describe('bad input is refused with a typed error', () => {
  it.each([
    ['an unknown definition', () => modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1310, definition: 'petermann1' as never })],
    ['a wavelength in µm', () => modeFieldDiameterUm({ ...STANDARD_LIKE, wavelengthNm: 1.31, definition: 'petermann2' })],
    ['NA ≥ 1', () => modeFieldDiameterUm({ coreRadiusUm: 4.1, na: 1.2, wavelengthNm: 1310, definition: 'gaussian' })],
    ['a negative radius in the field', () => lpFieldAt(solveLpMode(0, 1, 2), -1)],
    ['a NaN radius in the field', () => lpFieldAt(solveLpMode(0, 1, 2), Number.NaN)],
    ['a non-mode object', () => lpFieldAt({} as never, 0.5)],
    ['one sample only', () => lp01Field(2, { samples: 1 })],
    ['Marcuse at V = 0', () => marcuseSpotRatio(0)],
  ])('%s throws InputError', (_label, call) => {
    expect(call).toThrow(InputError);
  });
});

describe('the LP intensity picture', () => {
  it('LP01 is brightest on the axis and round: equal at equal radii', async () => {
    const { lpIntensityGrid } = await import('../../src/physics/modeField');
    const cells = 21;
    const grid = lpIntensityGrid(solveLpMode(0, 1, 2.2), cells, 1.5);
    const centre = grid[10 * cells + 10];
    expect(centre).toBe(1);
    expect(grid[10 * cells + 15]).toBeCloseTo(grid[15 * cells + 10], 12); // right vs below
    expect(grid[10 * cells + 20]).toBeLessThan(grid[10 * cells + 15]);
  });
  it('LP11 (cos φ) has two lobes and a dark line through the axis along y', async () => {
    const { lpIntensityGrid } = await import('../../src/physics/modeField');
    const cells = 20; // even, so no cell sits on the axis
    const grid = lpIntensityGrid(solveLpMode(1, 1, 3.5), cells, 1.5);
    const at = (row: number, col: number) => grid[row * cells + col];
    expect(Math.max(...grid)).toBe(1);
    expect(at(9, 3)).toBeGreaterThan(0.3); // left lobe on the x axis
    expect(at(9, 16)).toBeCloseTo(at(9, 3), 12); // mirror image
    expect(at(2, 9)).toBeLessThan(0.01 * at(9, 3)); // on the y axis: cos φ ≈ 0
  });
  it('every sample is the single-point field lpFieldAt × cos(lφ), squared and scaled to a brightest of 1', async () => {
    // The picture computes F(r) once per pair of distances from the axes; this checks that shortcut sample
    // by sample against lpFieldAt (itself checked against SciPy above), on odd and even grids.
    const { lpIntensityGrid } = await import('../../src/physics/modeField');
    for (const [l, m, v, cells] of [[0, 1, 2.2, 21], [1, 1, 3.5, 20], [2, 1, 5.2, 17], [0, 2, 5.2, 24]] as const) {
      const mode = solveLpMode(l, m, v);
      const extent = 1.6;
      const grid = lpIntensityGrid(mode, cells, extent);
      const direct: number[] = [];
      for (let row = 0; row < cells; row++) {
        for (let col = 0; col < cells; col++) {
          const x = extent * ((2 * col + 1) / cells - 1);
          const y = extent * (1 - (2 * row + 1) / cells);
          direct.push((lpFieldAt(mode, Math.hypot(x, y)) * Math.cos(l * Math.atan2(y, x))) ** 2);
        }
      }
      const brightest = Math.max(...direct);
      direct.forEach((d, i) => expect(grid[i], `LP${l}${m}, ${cells} cells, sample ${i}`).toBeCloseTo(d / brightest, 12));
    }
  });
  it('refuses a picture too fine for a phone', async () => {
    const { lpIntensityGrid } = await import('../../src/physics/modeField');
    expect(() => lpIntensityGrid(solveLpMode(0, 1, 2), 1000, 1.5)).toThrow(InputError);
  });
});
