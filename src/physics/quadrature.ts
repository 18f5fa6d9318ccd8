// Gauss–Legendre quadrature: nodes and weights computed once, then composite rules on panels.

export interface GaussRule {
  /** Nodes on [−1, 1]. */
  nodes: Float64Array;
  weights: Float64Array;
}

const rules = new Map<number, GaussRule>();

/**
 * n-point Gauss–Legendre rule on [−1, 1]: nodes are the zeros of P_n, found by Newton from
 * cos(π(i − 1/4)/(n + 1/2)) (A&S 22.16.6 asymptotics), weights 2/((1 − x²) P_n'(x)²) (A&S 25.4.29).
 * Exact for polynomials of degree ≤ 2n − 1.
 */
export function gaussLegendre(n: number): GaussRule {
  const cached = rules.get(n);
  if (cached) return cached;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let iteration = 0; iteration < 100; iteration++) {
      // Bonnet's recurrence (A&S 22.7.10) for P_n(x) and then P_n'(x) (A&S 22.8.5).
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const step = p1 / dp;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    const w = 2 / ((1 - x * x) * dp * dp);
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  const rule = { nodes, weights };
  rules.set(n, rule);
  return rule;
}

/** Nodes and weights of a composite Gauss–Legendre rule over the panels between `breaks`. */
export function compositeRule(breaks: readonly number[], pointsPerPanel: number): { x: Float64Array; w: Float64Array } {
  const { nodes, weights } = gaussLegendre(pointsPerPanel);
  const panels = breaks.length - 1;
  const x = new Float64Array(panels * pointsPerPanel);
  const w = new Float64Array(panels * pointsPerPanel);
  for (let p = 0; p < panels; p++) {
    const half = (breaks[p + 1] - breaks[p]) / 2;
    const mid = (breaks[p + 1] + breaks[p]) / 2;
    for (let i = 0; i < pointsPerPanel; i++) {
      x[p * pointsPerPanel + i] = mid + half * nodes[i];
      w[p * pointsPerPanel + i] = half * weights[i];
    }
  }
  return { x, w };
}
