import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { brentRoot } from '../../src/physics/roots';
import { ModelError } from '../../src/physics/errors';

describe("Brent's method (Brent 1973, ch. 4)", () => {
  it.each([
    ['cos x on [1, 2] → π/2', (x: number) => Math.cos(x), 1, 2, Math.PI / 2],
    ['x³ − 2 on [0, 2] → ∛2', (x: number) => x * x * x - 2, 0, 2, Math.cbrt(2)],
    ['e^x − 10 on [0, 5] → ln 10', (x: number) => Math.exp(x) - 10, 0, 5, Math.LN10],
    ['a steep step-like tanh(50(x − 0.3)) → 0.3', (x: number) => Math.tanh(50 * (x - 0.3)), -1, 1, 0.3],
  ])('%s to 4 ulp', (_name, f, a, b, root) => {
    const got = brentRoot(f, a, b);
    expect(Math.abs(got - root)).toBeLessThanOrEqual(4 * Number.EPSILON * Math.abs(root));
  });

  it('stays inside the bracket and converges for any monotone cubic (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -10, max: 10, noNaN: true }), (r) => {
        const f = (x: number) => (x - r) * ((x - r) * (x - r) + 1);
        const got = brentRoot(f, -20, 20);
        expect(got).toBeGreaterThanOrEqual(-20);
        expect(got).toBeLessThanOrEqual(20);
        expect(Math.abs(got - r)).toBeLessThanOrEqual(1e-14 * Math.max(1, Math.abs(r)));
      }),
    );
  });

  it('refuses ends without a sign change with a ModelError', () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(ModelError);
  });
});
