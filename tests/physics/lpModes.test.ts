import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  LP11_CUTOFF_V,
  LP_MAX_V,
  LP_MIN_V,
  lpCutoffV,
  lpModes,
  lpVectorModes,
  solveLpMode,
  totalModeCount,
  type LPMode,
} from '../../src/physics/lpModes';
import { besselJ, besselK } from '../../src/physics/bessel';
import { InputError, ModelError } from '../../src/physics/errors';
import fixture from '../fixtures/scipy-lp-modes/lp-modes.json';

function expectClose(label: string, got: number, expected: number, tolerance: number): void {
  const error = Math.abs(got - expected);
  if (!(error <= tolerance)) {
    throw new Error(`${label}: got ${got}, expected ${expected}, error ${error.toExponential(2)} > tolerance ${tolerance}`);
  }
}

const key = (mode: { l: number; m: number }) => `LP${mode.l},${mode.m}`;

describe(`b(V) against an independent scipy solution (scipy ${fixture.scipy}, brentq on the same equation)`, () => {
  // Tolerance 1e-13 absolute on b: scipy's brentq stops within 1e-15 in u, which moves
  // b = 1 − u²/V² by ≤ 2u·1e-15/V² ≲ 2e-15; our Bessel functions add ~1e-14 to the equation.
  it.each(fixture.families)('LP$l$m at V = $v has b = $b', (row) => {
    const mode = solveLpMode(row.l, row.m, row.v);
    expectClose(`b of LP${row.l}${row.m} at V = ${row.v}`, mode.b, row.b, 1e-13);
  });

  it.each(fixture.modeSets)('at V = $v the same modes are guided as found by scanning the equation, with the same b', (set) => {
    const ours = lpModes(set.v);
    expect(ours.map(key).sort()).toEqual(set.modes.map(key).sort());
    const byKey = new Map(ours.map((mode) => [key(mode), mode]));
    for (const ref of set.modes) {
      expectClose(`b of ${key(ref)} at V = ${set.v}`, (byKey.get(key(ref)) as LPMode).b, ref.b, 1e-12);
    }
  });
});

describe('cutoffs are zeros of Bessel functions (Gloge 1971; values from A&S Table 9.5, 5D)', () => {
  it.each([
    [0, 1, 0, 'LP01 is never cut off'],
    [1, 1, 2.40483, 'j_{0,1}'],
    [0, 2, 3.83171, 'j_{1,1}'],
    [2, 1, 3.83171, 'j_{1,1}'],
    [1, 2, 5.52008, 'j_{0,2}'],
    [3, 1, 5.13562, 'j_{2,1}'],
    [4, 1, 6.38016, 'j_{3,1}'],
    [0, 3, 7.01559, 'j_{1,2}'],
    [2, 2, 7.01559, 'j_{1,2}'],
  ])('LP%i%i is cut off at V = %f (%s)', (l, m, table) => {
    expectClose(`cutoff of LP${l}${m}`, lpCutoffV(l, m), table, 5e-6);
  });

  it('the single-mode limit is V = 2.405 (common practice), the first zero of J_0', () => {
    expect(LP11_CUTOFF_V.toFixed(3)).toBe('2.405');
    expect(lpCutoffV(1, 1)).toBeCloseTo(LP11_CUTOFF_V, 14);
  });

  it.each([
    [2.0, 1],
    [2.4, 1],
    [2.41, 2],
    [3.0, 2],
    [3.9, 4],
  ])('at V = %f there are %i LP modes', (v, count) => {
    expect(lpModes(v)).toHaveLength(count);
  });
});

describe('vector-mode families (Gloge 1971, mode designations)', () => {
  it.each([
    [0, 1, ['HE11'], 2],
    [0, 2, ['HE12'], 2],
    [1, 1, ['TE01', 'TM01', 'HE21'], 4],
    [1, 2, ['TE02', 'TM02', 'HE22'], 4],
    [2, 1, ['EH11', 'HE31'], 4],
    [3, 1, ['EH21', 'HE41'], 4],
    [10, 1, ['EH91', 'HE11,1'], 4], // a comma only where two-digit orders would be ambiguous
  ])('LP%i%i stands for %j with degeneracy %i', (l, m, families, degeneracy) => {
    expect(lpVectorModes(l, m)).toEqual(families);
    const v = lpCutoffV(l, m) + 1;
    const mode = solveLpMode(l, m, v);
    expect(mode.vectorModes).toEqual(families);
    expect(mode.degeneracy).toBe(degeneracy);
  });
});

describe('at and near cutoff', () => {
  it('a mode below its cutoff is refused in words that name it unambiguously: LP10,1 (cut off at j9,1 = 13.3543, A&S Table 9.5)', () => {
    expect(() => solveLpMode(10, 1, 5)).toThrow(/^LP10,1 is not guided at V = 5: it is cut off at V = 13\.3543/);
  });

  it('a mode exactly at its cutoff is not guided', () => {
    expect(() => solveLpMode(1, 1, LP11_CUTOFF_V)).toThrow(ModelError);
    expect(lpModes(LP11_CUTOFF_V).map(key)).toEqual(['LP0,1']);
  });
  it.each([1e-9, 1e-7])('a mode %f above its cutoff is guided, flagged nearCutoff, with 0 ≤ b < 1e-6', (dv) => {
    for (const [l, m] of [[1, 1], [0, 2], [2, 1], [1, 2]]) {
      const v = lpCutoffV(l, m) + dv;
      const mode = solveLpMode(l, m, v);
      expect(mode.nearCutoff).toBe(true);
      expect(mode.b).toBeGreaterThanOrEqual(0);
      expect(mode.b).toBeLessThan(1e-6);
      expect(lpModes(v).some((x) => x.l === l && x.m === m)).toBe(true);
    }
  });
  it('a mode 1e-3 above its cutoff is not flagged', () => {
    expect(solveLpMode(1, 1, LP11_CUTOFF_V + 1e-3).nearCutoff).toBe(false);
  });
});

describe('properties of the guided mode set', () => {
  const anyV = fc.double({ min: 0.5, max: 100, noNaN: true });

  it('every b is in (0, 1) (b may underflow to 0 only when flagged nearCutoff)', () => {
    fc.assert(
      fc.property(anyV, (v) => {
        for (const mode of lpModes(v)) {
          expect(mode.b).toBeLessThan(1);
          if (!mode.nearCutoff) expect(mode.b).toBeGreaterThan(0);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('each mode solves the eigenvalue equation u J_{l-1} K_l + w K_{l-1} J_l = 0 (checked with the public J, K), to 1e-11', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 40, noNaN: true }), (v) => {
        for (const mode of lpModes(v)) {
          if (mode.nearCutoff || mode.w < 1e-3) continue; // K_l(w) overflows/varies too fast to check this way
          const { l, u, w } = mode;
          const jBelow = l === 0 ? -besselJ(1, u) : besselJ(l - 1, u);
          const kBelow = besselK(l === 0 ? 1 : l - 1, w);
          const kHere = besselK(l, w);
          const a = u * jBelow * kHere;
          const c = w * kBelow * besselJ(l, u);
          const scale = Math.max(Math.abs(a), Math.abs(c), u * kHere * Math.abs(besselJ(l, u)), 1e-300);
          expect(Math.abs(a + c) / scale).toBeLessThan(1e-11);
        }
      }),
      { numRuns: 30 },
    );
  });

  it('b falls as m grows within each l, and as l grows for each m', () => {
    fc.assert(
      fc.property(anyV, (v) => {
        const modes = lpModes(v);
        const b = new Map(modes.map((mode) => [key(mode), mode.b]));
        for (const mode of modes) {
          const nextM = b.get(key({ l: mode.l, m: mode.m + 1 }));
          const nextL = b.get(key({ l: mode.l + 1, m: mode.m }));
          if (nextM !== undefined) expect(nextM).toBeLessThan(mode.b);
          if (nextL !== undefined) expect(nextL).toBeLessThan(mode.b);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('b of a given mode grows with V', () => {
    fc.assert(
      fc.property(fc.double({ min: 4, max: 60, noNaN: true }), fc.double({ min: 1.001, max: 1.5, noNaN: true }), (v, factor) => {
        for (const [l, m] of [[0, 1], [1, 1], [0, 2], [2, 1]]) {
          expect(solveLpMode(l, m, v * factor).b).toBeGreaterThan(solveLpMode(l, m, v).b);
        }
      }),
    );
  });

  it('no misses and no duplicates: for each l, m runs 1, 2, 3 … without gaps, l runs 0, 1, 2 … and the list is sorted by b', () => {
    fc.assert(
      fc.property(anyV, (v) => {
        const modes = lpModes(v);
        const keys = modes.map(key);
        expect(new Set(keys).size).toBe(keys.length);
        const maxL = Math.max(...modes.map((mode) => mode.l));
        for (let l = 0; l <= maxL; l++) {
          const ms = modes.filter((mode) => mode.l === l).map((mode) => mode.m).sort((p, q) => p - q);
          expect(ms).toEqual(ms.map((_, i) => i + 1));
          // the next radial order is not guided: its cutoff is at or above v
          expect(lpCutoffV(l, ms.length + 1)).toBeGreaterThanOrEqual(v);
        }
        expect(lpCutoffV(maxL + 1, 1)).toBeGreaterThanOrEqual(v);
        for (let i = 1; i < modes.length; i++) expect(modes[i].b).toBeLessThanOrEqual(modes[i - 1].b);
      }),
      { numRuns: 40 },
    );
  });

  it('the mode count never falls as V grows', () => {
    fc.assert(
      fc.property(anyV, fc.double({ min: 0, max: 5, noNaN: true }), (v, dv) => {
        expect(lpModes(Math.min(v + dv, 100)).length).toBeGreaterThanOrEqual(lpModes(v).length);
      }),
      { numRuns: 40 },
    );
  });

  it('for large V the total mode count approaches V²/2 (Gloge 1971): |N − V²/2| ≤ V for 20 ≤ V ≤ 100', () => {
    // V²/2 is the leading (area) term of the count; what remains grows only like V (a boundary
    // term, plus the jump of 2 or 4 at each cutoff), so the relative error falls like 1/V:
    // ≤ 5 % at V = 20, ≤ 1 % at V = 100. Measured over a sweep: |N − V²/2| ≤ 0.55 V.
    fc.assert(
      fc.property(fc.double({ min: 20, max: 100, noNaN: true }), (v) => {
        const count = totalModeCount(lpModes(v));
        expect(Math.abs(count - (v * v) / 2)).toBeLessThanOrEqual(v);
      }),
      { numRuns: 25 },
    );
  });
});

describe('bad input is refused with a typed error', () => {
  it.each([
    ['a NaN', Number.NaN],
    ['an infinite', Infinity],
    ['a zero', 0],
    ['a negative', -2],
    ['a too large', LP_MAX_V + 1],
  ])('%s V throws InputError', (_label, v) => {
    expect(() => lpModes(v)).toThrow(InputError);
    expect(() => solveLpMode(0, 1, v)).toThrow(InputError);
  });
  it('a V below the smallest representable LP01 throws ModelError with a hint', () => {
    expect(() => lpModes(LP_MIN_V / 2)).toThrow(ModelError);
  });
  it.each([
    ['fractional l', () => lpCutoffV(1.5, 1)],
    ['negative l', () => solveLpMode(-1, 1, 3)],
    ['m = 0', () => lpCutoffV(0, 0)],
  ])('%s throws InputError', (_label, call) => {
    expect(call).toThrow(InputError);
  });
  it('an unguided mode is refused with a message naming its cutoff', () => {
    expect(() => solveLpMode(1, 1, 2.0)).toThrow(/LP11 is not guided at V = 2: it is cut off at V = 2.4048/);
  });
});

describe('b–V curves for the diagram', () => {
  it('LP11 rises from b = 0 at its cutoff V = 2.405 and grows with V', async () => {
    const { lpBvCurve } = await import('../../src/physics/lpModes');
    const curve = lpBvCurve(1, 1, 6, 50);
    expect(curve[0]).toEqual([LP11_CUTOFF_V, 0]);
    for (let i = 1; i < curve.length; i++) expect(curve[i][1]).toBeGreaterThan(curve[i - 1][1]);
    expect(curve.at(-1)?.[0]).toBe(6);
  });
  it('is empty below the cutoff', async () => {
    const { lpBvCurve } = await import('../../src/physics/lpModes');
    expect(lpBvCurve(0, 2, 3)).toEqual([]);
  });
});
