// Safeguarded one-dimensional root finding, shared by the mode solver and the label inverter.
import { ModelError } from './errors';

export interface BrentOptions {
  /** Absolute tolerance on x (added to 2ε|x|). Default 0. */
  xTolerance?: number;
  /** Iteration cap. Default 200 (bisection alone halves a float64 interval to nothing in ~1100). */
  maxIterations?: number;
  /** Known f(a) and f(b), to save two evaluations. */
  fa?: number;
  fb?: number;
}

const EPS = Number.EPSILON;

/**
 * Root of f in [a, b] where f(a) and f(b) differ in sign, by Brent's method
 * (Brent 1973, "Algorithms for Minimization without Derivatives", ch. 4, procedure zero):
 * inverse quadratic / secant steps, falling back to bisection, so it never leaves the bracket
 * and converges superlinearly on smooth f. Throws ModelError when the ends do not bracket a root.
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, options: BrentOptions = {}): number {
  const tol0 = options.xTolerance ?? 0;
  const maxIterations = options.maxIterations ?? 200;
  let fa = options.fa ?? f(a);
  let fb = options.fb ?? f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (Math.sign(fa) === Math.sign(fb) || Number.isNaN(fa) || Number.isNaN(fb)) {
    throw new ModelError(`no sign change between ${a} and ${b}`, 'root bracket', 'the equation has no root in this interval');
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < maxIterations; i++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * tol0;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}
