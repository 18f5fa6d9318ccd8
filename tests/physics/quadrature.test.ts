import { describe, expect, it } from 'vitest';
import { compositeRule, gaussLegendre } from '../../src/physics/quadrature';

describe('Gauss–Legendre quadrature (A&S 25.4.29)', () => {
  it.each([2, 5, 16, 24])('the %i-point rule integrates x^k exactly over [−1, 1] for every k ≤ 2n − 1', (n) => {
    const { nodes, weights } = gaussLegendre(n);
    for (let k = 0; k <= 2 * n - 1; k++) {
      let sum = 0;
      for (let i = 0; i < n; i++) sum += weights[i] * nodes[i] ** k;
      const exact = k % 2 === 1 ? 0 : 2 / (k + 1);
      expect(Math.abs(sum - exact)).toBeLessThan(1e-14);
    }
  });
  it('the 2-point nodes are ±1/√3 with weights 1 (A&S Table 25.4)', () => {
    const { nodes, weights } = gaussLegendre(2);
    expect(nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect(weights[0]).toBeCloseTo(1, 15);
  });
  it('a composite rule integrates e^{−x} over [0, 30] to 1e-14', () => {
    const { x, w } = compositeRule([0, 1, 2, 4, 8, 16, 30], 16);
    let sum = 0;
    for (let i = 0; i < x.length; i++) sum += w[i] * Math.exp(-x[i]);
    expect(Math.abs(sum - (1 - Math.exp(-30)))).toBeLessThan(1e-14);
  });
});
