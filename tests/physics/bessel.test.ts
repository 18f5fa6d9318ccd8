import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  besselJ,
  besselJPairUnchecked,
  besselJZero,
  besselK,
  besselKScaled,
  BESSEL_MAX_ORDER,
} from '../../src/physics/bessel';
import { InputError, ModelError } from '../../src/physics/errors';
import fixture from '../fixtures/scipy-bessel/bessel.json';

interface Row { n: number; x: number; j: number; k: number | null; kScaled: number | null; jHigh: number; kHigh: number | null }
const rows = fixture.values as Row[];

/** √(2/(πx)): the size of J_n where it oscillates (x > n); errors there are measured against it. */
function envelope(n: number, x: number): number {
  return x > n ? Math.sqrt(2 / (Math.PI * x)) : 0;
}

/** Fails with input, got, expected and tolerance in the message. */
function expectClose(label: string, got: number, expected: number, tolerance: number, scale = Math.abs(expected)): void {
  const error = Math.abs(got - expected);
  const allowed = tolerance * scale;
  if (!(error <= allowed)) {
    throw new Error(`${label}: got ${got}, expected ${expected}, error ${error.toExponential(2)} > allowed ${allowed.toExponential(2)} (${tolerance} × ${scale.toExponential(3)})`);
  }
}

describe('J_n against Abramowitz & Stegun Table 9.1 (orders 0, 1, 2; J_0 to 15D, J_1 and J_2 to 10D)', () => {
  // Values as printed in A&S Table 9.1 (digits from memory of the table; each agrees with 30-digit mpmath).
  it.each([
    [0, 1.0, 0.765197686557967, 5e-16],
    [0, 2.0, 0.223890779141236, 5e-16],
    [0, 5.0, -0.177596771314338, 5e-16],
    [0, 10.0, -0.245935764451348, 5e-16],
    [1, 1.0, 0.4400505857, 5e-11],
    [1, 2.0, 0.5767248078, 5e-11],
    [1, 5.0, -0.3275791376, 5e-11],
    [1, 10.0, 0.0434727462, 5e-11],
    [2, 1.0, 0.1149034849, 5e-11],
    [2, 2.0, 0.3528340286, 5e-11],
    [2, 5.0, 0.0465651163, 5e-11],
    [2, 10.0, 0.2546303137, 5e-11],
  ])('J_%i(%f) = %f to the table\'s last digit (half a unit: %f)', (n, x, table, halfUnit) => {
    expectClose(`J_${n}(${x})`, besselJ(n, x), table, halfUnit, 1);
  });
});

describe('e^x K_n(x) against Abramowitz & Stegun Table 9.8 (orders 0, 1, 2; 10D)', () => {
  // A&S Table 9.8 lists e^x K_0(x), e^x K_1(x) to 10D and e^x K_2(x) to 9D for x = 5 … 20
  // (digits from memory of the table; each agrees with 30-digit mpmath).
  it.each([
    [0, 1.0, 1.1444630798, 5e-11],
    [1, 1.0, 1.6361534863, 5e-11],
    [0, 2.0, 0.8415682151, 5e-11],
    [1, 2.0, 1.0334768471, 5e-11],
    [0, 5.0, 0.5478075643, 5e-11],
    [1, 5.0, 0.6002738588, 5e-11],
    [2, 5.0, 0.787917108, 5e-10],
    [0, 10.0, 0.3916319344, 5e-11],
    [1, 10.0, 0.4107665706, 5e-11],
    [2, 10.0, 0.473785249, 5e-10],
    [0, 20.0, 0.2785448767, 5e-11],
    [1, 20.0, 0.2854254969, 5e-11],
  ])('e^x K_%i(%f) = %f to the table\'s last digit (half a unit: %f)', (n, x, table, halfUnit) => {
    expectClose(`e^x K_${n}(${x})`, besselKScaled(n, x), table, halfUnit, 1);
  });
});

describe('zeros of J_n against Abramowitz & Stegun Table 9.5 (10D for n = 0, 5D otherwise)', () => {
  it.each([
    [0, 1, 2.4048255577, 5e-11],
    [0, 2, 5.5200781103, 5e-11],
    [0, 3, 8.6537279129, 5e-11],
    [0, 20, 62.0484691902, 5e-11],
    [1, 1, 3.83171, 5e-6],
    [1, 2, 7.01559, 5e-6],
    [2, 1, 5.13562, 5e-6],
    [3, 1, 6.38016, 5e-6],
    [8, 1, 12.22509, 5e-6],
    [8, 20, 74.18277, 5e-6],
  ])('j_{%i,%i} = %f to the table\'s last digit (half a unit: %f)', (n, k, table, halfUnit) => {
    expectClose(`j_{${n},${k}}`, besselJZero(n, k), table, halfUnit, 1);
  });
});

describe(`against the scipy / mpmath fixture (scipy ${fixture.scipy}, mpmath ${fixture.mpmath}; n ≤ 150, 1e-3 ≤ x ≤ 1e3)`, () => {
  // Tolerances:
  //  J vs 30-digit mpmath: 5e-14 of max(|J|, envelope) — relative where J_n is monotone (x ≤ n),
  //    absolute on the scale of the envelope where it oscillates, since near a zero of J no
  //    float64 method can be relative. Values below 1e-290 (deep underflow) must come back ≤ 1e-290.
  //  J vs scipy: 1e-12 of the same scale: scipy's jv is itself off by up to 5e-13 at x ≈ 1e3.
  //  K vs mpmath: 2e-14 relative; e^x K vs scipy kve: 2e-13 relative (scipy's own error ≈ 1e-13).
  const tiny = 1e-290;
  const jRows = rows.filter((r) => Math.max(Math.abs(r.jHigh), envelope(r.n, r.x)) > tiny);
  const underflowRows = rows.filter((r) => Math.max(Math.abs(r.jHigh), envelope(r.n, r.x)) <= tiny);

  it.each(jRows)('J_$n($x) matches mpmath', (r) => {
    expectClose(`J_${r.n}(${r.x})`, besselJ(r.n, r.x), r.jHigh, 5e-14, Math.max(Math.abs(r.jHigh), envelope(r.n, r.x)));
  });
  it.each(jRows)('J_$n($x) matches scipy jv', (r) => {
    expectClose(`J_${r.n}(${r.x})`, besselJ(r.n, r.x), r.j, 1e-12, Math.max(Math.abs(r.j), envelope(r.n, r.x)));
  });
  it.each(underflowRows)('J_$n($x) underflows as it should (|J| < 1e-290)', (r) => {
    expect(Math.abs(besselJ(r.n, r.x))).toBeLessThanOrEqual(tiny);
  });
  const kRows = rows.filter((r) => r.kHigh !== null && r.kHigh > tiny);
  it.each(kRows)('K_$n($x) matches mpmath', (r) => {
    expectClose(`K_${r.n}(${r.x})`, besselK(r.n, r.x), r.kHigh as number, 2e-14);
  });
  const kScaledRows = rows.filter((r) => r.kScaled !== null);
  it.each(kScaledRows)('e^x K_$n($x) matches scipy kve', (r) => {
    expectClose(`e^x K_${r.n}(${r.x})`, besselKScaled(r.n, r.x), r.kScaled as number, 2e-13);
  });
  const overflowRows = rows.filter((r) => r.kHigh === null);
  it.each(overflowRows)('K_$n($x) beyond the float64 range is refused with a ModelError, never Infinity or NaN', (r) => {
    expect(() => besselK(r.n, r.x)).toThrow(ModelError);
    expect(() => besselKScaled(r.n, r.x)).toThrow(ModelError);
  });
  it('K_125(0.316228), which scipy overflows but float64 can hold (mpmath: 1.01264583278e307), is finite and right', () => {
    const row = rows.find((r) => r.n === 125 && r.x === 0.316228) as Row;
    expect(row.k).toBeNull();
    expectClose('K_125(0.316228)', besselK(125, 0.316228), row.kHigh as number, 2e-14);
  });
  it.each([
    // 30-digit mpmath values (besselk × exp), beyond the fixture's x ≤ 1e3: the large-argument branch (A&S 9.7.2)
    [0, 1e4, 0.012532984717699285288],
    [1, 5e3, 0.017725867766374100722],
    [5, 2e3, 0.028198854387666537184],
    [150, 1e6, 0.0012674933653082623346],
    [0, 999, 0.039648145678546110853],
    [0, 1001, 0.039608527229384946986],
  ])('e^x K_%i(%f) = %f for large x (mpmath)', (n, x, expected) => {
    expectClose(`e^x K_${n}(${x})`, besselKScaled(n, x), expected, 2e-14);
  });
  it('K_0 at the smallest subnormal x is finite (≈ 744.4) and K_1 there is refused as beyond float64', () => {
    expectClose('K_0(5e-324)', besselK(0, Number.MIN_VALUE), -Math.log(Number.MIN_VALUE) + Math.LN2 - 0.5772156649015329, 1e-15); // K_0 ≈ −ln(x/2) − γ, A&S 9.6.13
    expect(() => besselK(1, Number.MIN_VALUE)).toThrow(ModelError);
  });
  it('K_n far beyond underflow (x = 1e308) is 0, returned at once', () => {
    expect(besselK(3, 1e308)).toBe(0);
  });
  const zeroCases = fixture.zeros.flatMap((z) => z.zeros.map((value, i) => ({ n: z.n, k: i + 1, value })));
  it.each(zeroCases)('j_{$n,$k} matches scipy jn_zeros to 1e-14 relative', ({ n, k, value }) => {
    expectClose(`j_{${n},${k}}`, besselJZero(n, k), value, 1e-14);
  });
});

describe('identities (property tests)', () => {
  const order = fc.integer({ min: 1, max: 150 });
  const argument = fc.double({ min: 1e-3, max: 1e3, noNaN: true });

  it('three-term recurrence J_{n-1} + J_{n+1} = (2n/x) J_n (A&S 9.1.27), to 2e-13 of the largest term or the envelope', () => {
    // Each J carries up to ~5e-14 of the envelope √(2/(πx)) at x ≈ 1e3 (see the fixture tolerance);
    // three of them, one multiplied by 2n/x ≤ 1 there, stay within 2e-13 of that scale.
    fc.assert(
      fc.property(order, argument, (n, x) => {
        const a = besselJ(n - 1, x);
        const b = besselJ(n + 1, x);
        const c = ((2 * n) / x) * besselJ(n, x);
        const scale = Math.max(Math.abs(a), Math.abs(b), Math.abs(c), envelope(n, x), 1e-300);
        expectClose(`J_${n - 1}+J_${n + 1} at ${x}`, a + b, c, 2e-13, scale);
      }),
    );
  });

  it('sum of squares J_0² + 2 Σ J_k² = 1 (A&S 9.1.76), to 1e-13', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 100, noNaN: true }), (x) => {
        let sum = besselJ(0, x) ** 2;
        for (let k = 1; k <= Math.min(BESSEL_MAX_ORDER, Math.ceil(x) + 60); k++) sum += 2 * besselJ(k, x) ** 2;
        expectClose(`Σ J² at ${x}`, sum, 1, 1e-13);
      }),
    );
  });

  it('Bessel\'s integral J_n(x) = (1/π)∫₀^π cos(nτ − x sin τ) dτ (A&S 9.1.21), trapezoid rule, to 1e-13', () => {
    // The integrand is smooth and periodic, so the trapezoid rule converges geometrically once
    // the point count exceeds about x + n; 2(x + n) + 80 points leave it at rounding level.
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 40 }), fc.double({ min: 0.01, max: 60, noNaN: true }), (n, x) => {
        const points = 2 * Math.ceil(x + n) + 80;
        const h = (2 * Math.PI) / points;
        let s = 0;
        for (let i = 0; i < points; i++) {
          const tau = i * h;
          s += Math.cos(n * tau - x * Math.sin(tau));
        }
        const integral = s / points; // (1/2π)∫₀^{2π} = (1/π)∫₀^π by symmetry
        expectClose(`J_${n}(${x})`, besselJ(n, x), integral, 1e-13, 1);
      }),
    );
  });

  it('K_n(x) = ∫₀^∞ e^{−x cosh t} cosh(nt) dt (A&S 9.6.24), trapezoid rule, to 1e-13 relative', () => {
    // In scaled form e^x K_n = ∫ e^{−x(cosh t − 1)} cosh(nt) dt; the integrand is entire and decays
    // doubly exponentially, so the trapezoid rule with a step of 0.02 converges to rounding level.
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 20 }), fc.double({ min: 0.1, max: 50, noNaN: true }), (n, x) => {
        const h = 0.02;
        let s = 0.5; // t = 0 term, weight ½
        for (let i = 1; i < 100000; i++) {
          const t = i * h;
          const term = Math.exp(-x * (Math.cosh(t) - 1) + n * t) * 0.5 * (1 + Math.exp(-2 * n * t));
          s += term;
          if (term < 1e-18 * s) break;
        }
        expectClose(`e^x K_${n}(${x})`, besselKScaled(n, x), s * h, 1e-13);
      }),
    );
  });

  it('Wronskian I_n K_{n+1} + I_{n+1} K_n = 1/x (A&S 9.6.15), with I_n from its power series (A&S 9.6.10), to 1e-13', () => {
    // The series for I_n has only positive terms, so it is accurate to rounding for x ≤ 20.
    const besselI = (n: number, x: number) => {
      let term = Math.pow(x / 2, n);
      for (let k = 1; k <= n; k++) term /= k;
      let sum = term;
      for (let k = 1; k < 200 && term > 1e-18 * sum; k++) {
        term *= (x * x) / 4 / (k * (n + k));
        sum += term;
      }
      return sum;
    };
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 10 }), fc.double({ min: 0.05, max: 20, noNaN: true }), (n, x) => {
        const w = besselI(n, x) * besselK(n + 1, x) + besselI(n + 1, x) * besselK(n, x);
        expectClose(`Wronskian at n = ${n}, x = ${x}`, w * x, 1, 1e-13);
      }),
    );
  });

  it('K_n is positive, falls with x and grows with n (A&S 9.6.1, 9.6.26)', () => {
    // n ≤ 60 keeps K_n(0.01) ≈ 1e218 inside the float64 range, x ≤ 500 keeps K_0 above underflow.
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 60 }), fc.double({ min: 1e-2, max: 500, noNaN: true }), (n, x) => {
        const here = besselK(n, x);
        const further = besselK(n, x * 1.01);
        const higher = besselK(n + 1, x);
        expect(here).toBeGreaterThan(0);
        expect(further).toBeLessThan(here);
        expect(higher).toBeGreaterThanOrEqual(here);
      }),
    );
  });

  it('Miller\'s recurrence and Hankel\'s expansion agree where both apply (x ≥ 30), to 2e-13 of the envelope', () => {
    // Miller's rounding errors add up like a random walk over its ~x + 10 x^{1/3} steps
    // (≈ 1100 at x = 1000, so ≈ √1100 · ε ≈ 4e-15 typical, several times that at worst;
    // at x = 2000 we have seen 2e-13, which is why besselJ prefers Hankel's series there).
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 20 }), fc.double({ min: 30, max: 1000, noNaN: true }), (n, x) => {
        expectClose(`J_${n}(${x})`, besselJ(n, x), besselJPairUnchecked(n, x)[0], 2e-13, envelope(n, x));
      }),
    );
  });

  it('zeros interlace j_{n,k} < j_{n+1,k} < j_{n,k+1} (A&S 9.5.2) and J_n vanishes there', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 149 }), fc.integer({ min: 1, max: 60 }), (n, k) => {
        const z = besselJZero(n, k);
        expect(besselJZero(n + 1, k)).toBeGreaterThan(z);
        expect(besselJZero(n + 1, k)).toBeLessThan(besselJZero(n, k + 1));
        expect(Math.abs(besselJ(n, z))).toBeLessThan(1e-14);
      }),
    );
  });
});

describe('bad input is refused with a typed error', () => {
  it.each([
    ['NaN order', () => besselJ(Number.NaN, 1)],
    ['fractional order', () => besselJ(1.5, 1)],
    ['negative order', () => besselK(-1, 1)],
    ['order above the maximum', () => besselJ(BESSEL_MAX_ORDER + 1, 1)],
    ['negative J argument', () => besselJ(0, -2)],
    ['infinite J argument', () => besselJ(0, Infinity)],
    ['K at zero', () => besselK(0, 0)],
    ['K at NaN', () => besselKScaled(1, Number.NaN)],
    ['zero index 0', () => besselJZero(0, 0)],
  ])('%s throws InputError', (_label, call) => {
    expect(call).toThrow(InputError);
  });
  it('the message for a negative J argument names the argument and the symmetry to use', () => {
    expect(() => besselJ(0, -2)).toThrow(/x = -2 .*J_n\(−x\) = \(−1\)\^n J_n\(x\)/);
  });
});
