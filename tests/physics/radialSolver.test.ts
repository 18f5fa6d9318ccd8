import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { gradedIndexProfile, InputError, lpModes, solveRadialModes, stepIndexProfile } from '../../src/physics';
import fixture from '../fixtures/radialSolver/stepModes.json';

const LAMBDA_NM = 1000;
const NA = 0.15;
/** Core radius giving the wanted V at 1000 nm with NA 0.15: a = V λ / (2π NA). */
function stepFiberFor(v: number) {
  return stepIndexProfile({ coreRadiusUm: (v * LAMBDA_NM) / 1000 / (2 * Math.PI * NA), na: NA });
}

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

describe('a step profile solved by finite differences agrees with the Bessel-function solution', () => {
  // Reference: scipy roots of Gloge's LP equation (tests/fixtures/radialSolver/generate.py).
  // Tolerance: the default grid puts ≥ max(60, V/0.2) cells across the core; the FD error in b is
  // ≈ (V h/a)²/12 ≲ 3e-3, worst for the step (index jump). Measured worst case 2.7e-3 at V = 30.
  it.each(fixture.fibers)('V = $v: the same guided modes, b within 3e-3', ({ v, modes }) => {
    const s = solveRadialModes(stepFiberFor(v), LAMBDA_NM);
    near(s.v, v, 1e-9, 'V');
    expect(s.modes.map((m) => `LP${m.l}${m.m}`).sort()).toEqual(modes.map((m) => `LP${m.l}${m.m}`).sort());
    for (const ref of modes) {
      const got = s.modes.find((m) => m.l === ref.l && m.m === ref.m);
      near(got?.b ?? Number.NaN, ref.b, 3e-3, `LP${ref.l}${ref.m} at V = ${v}`);
    }
  });

  // The same check against the project's own Bessel-function solution (Gloge 1971, src/physics/lpModes.ts),
  // at V values between the fixture's, same 3e-3 tolerance and reasoning.
  it.each([3.1, 7.7, 18.5])('V = %s: same modes and b (within 3e-3) as the Bessel-function LP solution', (v) => {
    const s = solveRadialModes(stepFiberFor(v), LAMBDA_NM);
    const exact = lpModes(v).filter((m) => m.b > 1e-3);
    for (const ref of exact) {
      const got = s.modes.find((m) => m.l === ref.l && m.m === ref.m);
      near(got?.b ?? Number.NaN, ref.b, 3e-3, `LP${ref.l}${ref.m} at V = ${v}`);
    }
    expect(s.modes.length).toBeGreaterThanOrEqual(exact.length);
    expect(s.modes.length).toBeLessThanOrEqual(lpModes(v).length);
  });

  it('the error falls as h² (second-order scheme): doubling the cells cuts it at least three times', () => {
    const { v, modes } = fixture.fibers[2];
    const coarse = solveRadialModes(stepFiberFor(v), LAMBDA_NM, { cellsPerCore: 60 });
    const fine = solveRadialModes(stepFiberFor(v), LAMBDA_NM, { cellsPerCore: 120 });
    const worst = (s: typeof coarse) =>
      Math.max(...modes.map((ref) => Math.abs((s.modes.find((m) => m.l === ref.l && m.m === ref.m)?.b ?? 1) - ref.b)));
    expect(worst(fine)).toBeLessThan(worst(coarse) / 3);
  });

  it('the single-mode fiber at V = 2.2 has LP01 with b within 2e-4 (grid 60 cells per core)', () => {
    const s = solveRadialModes(stepFiberFor(2.2), LAMBDA_NM);
    expect(s.modes).toHaveLength(1);
    near(s.modes[0].b, fixture.fibers[0].modes[0].b, 2e-4, 'LP01 b');
  });
});

describe('graded-index multimode fiber', () => {
  const om = gradedIndexProfile({ coreRadiusUm: 25, na: 0.2, alpha: 2 });
  const s = solveRadialModes(om, 850);

  it('a 50 µm α = 2 fiber at 850 nm (V ≈ 37) carries V²/4 ≈ 340 modes counting degeneracy (Gloge & Marcatili 1973)', () => {
    // Mode count of an α-profile: M ≈ (α/(α+2)) V²/2, = V²/4 for α = 2 (Gloge & Marcatili 1973).
    const expected = (s.v * s.v) / 4;
    expect(Math.abs(s.totalModeCount - expected) / expected).toBeLessThan(0.03);
    expect(s.totalModeCount).toBeGreaterThan(300);
  });

  it('modes of one principal group share b = 1 − 2g/V, as in an infinite parabolic profile', () => {
    // Infinite parabola: β² = k²n1² − 2 (k n1 √(2Δ)/a) g (Gloge & Marcatili 1973; exact for the infinite parabola in the scalar approximation); the real profile is
    // cut off at r = a, which only matters near cutoff, so the check covers groups well inside (g < 0.75·V/2).
    const inner = s.modes.filter((m) => m.principal < 0.75 * (s.v / 2));
    expect(inner.length).toBeGreaterThan(40);
    for (const m of inner) near(m.b, 1 - (2 * m.principal) / s.v, 1e-3, `LP${m.l}${m.m} (g = ${m.principal})`);
  });

  it('there are about V/2 mode groups (parabolic profile)', () => {
    const groups = new Set(s.modes.map((m) => m.principal));
    expect(Math.abs(groups.size - s.v / 2)).toBeLessThanOrEqual(1.5);
  });
});

describe('mode fields', () => {
  it('every field has unit power, ∫ψ² r dr = 1', () => {
    const s = solveRadialModes(stepFiberFor(12), LAMBDA_NM);
    for (const m of s.modes) {
      let p = 0;
      for (let j = 0; j < s.rUm.length; j++) p += m.field[j] * m.field[j] * s.rUm[j] * s.stepUm;
      near(p, 1, 1e-9, `LP${m.l}${m.m} power`);
    }
  });

  it('modes of the same azimuthal order are orthogonal (Sturm–Liouville)', () => {
    const s = solveRadialModes(stepFiberFor(12), LAMBDA_NM);
    const l0 = s.modes.filter((m) => m.l === 0);
    for (let i = 0; i < l0.length; i++) {
      for (let j = i + 1; j < l0.length; j++) {
        let dot = 0;
        for (let q = 0; q < s.rUm.length; q++) dot += l0[i].field[q] * l0[j].field[q] * s.rUm[q] * s.stepUm;
        near(dot, 0, 1e-8, `LP0${l0[i].m}·LP0${l0[j].m}`);
      }
    }
  });

  it('LP0m has m − 1 radial zero crossings', () => {
    const s = solveRadialModes(stepFiberFor(12), LAMBDA_NM);
    for (const m of s.modes.filter((x) => x.l === 0)) {
      let crossings = 0;
      const peak = Math.max(...Array.from(m.field, Math.abs));
      let last = 0;
      for (const f of m.field) {
        if (Math.abs(f) < 1e-6 * peak) continue;
        const sg = Math.sign(f);
        if (last !== 0 && sg !== last) crossings++;
        last = sg;
      }
      expect(crossings).toBe(m.m - 1);
    }
  });
});

describe('physical laws', () => {
  it('every guided mode has 0 < b < 1 and effective index between cladding and core', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 20, noNaN: true }), fc.double({ min: 1, max: 8, noNaN: true }), (v, alpha) => {
        const p = gradedIndexProfile({ coreRadiusUm: (v * LAMBDA_NM) / 1000 / (2 * Math.PI * NA), na: NA, alpha });
        const s = solveRadialModes(p, LAMBDA_NM);
        return s.modes.every((m) => m.b > 0 && m.b < 1 && m.effectiveIndex > p.claddingIndex && m.effectiveIndex < p.coreIndex);
      }),
      { numRuns: 30 },
    );
  });

  it('more V never means fewer modes', () => {
    const counts = [2, 4, 8, 16].map((v) => solveRadialModes(stepFiberFor(v), LAMBDA_NM).totalModeCount);
    for (let i = 1; i < counts.length; i++) expect(counts[i]).toBeGreaterThanOrEqual(counts[i - 1]);
  });
});

describe('bad input', () => {
  it.each([
    () => gradedIndexProfile({ coreRadiusUm: -1, na: 0.2, alpha: 2 }),
    () => gradedIndexProfile({ coreRadiusUm: 25, na: Number.NaN, alpha: 2 }),
    () => stepIndexProfile({ coreRadiusUm: 25, na: 0.9 }),
    () => solveRadialModes(stepFiberFor(5), 1.3),
  ])('is refused with an InputError (%#)', (call) => {
    expect(call).toThrow(InputError);
  });
});
