// Guided LP modes of a weakly guiding step-index fiber (Gloge 1971, Appl. Opt. 10(10)).
// u = a √(k²n1² − β²), w = a √(β² − k²n2²), u² + w² = v², b = w²/v².
// Characteristic equation (Gloge 1971, the weakly guiding eigenvalue equation, with J_{-1} = −J_1, K_{-1} = K_1 for l = 0):
//   u J_{l-1}(u)/J_l(u) = −w K_{l-1}(w)/K_l(w).
// Each root is bracketed by Bessel zeros (cutoff j_{l-1,m} below, j_{l,m} above) and found by
// Newton's method with the analytic derivative, safeguarded by bisection inside that bracket.
import { besselJRatioUnchecked, besselJZero, besselKTermUnchecked, BESSEL_MAX_ORDER } from './bessel';
import { InputError, ModelError, requireInteger, requirePositive } from './errors';

export interface LPMode {
  /** Azimuthal order. */
  l: number;
  /** Radial order (1 = first). */
  m: number;
  /** Normalized transverse wavenumber in the core. */
  u: number;
  /** Normalized decay constant in the cladding. */
  w: number;
  /** Normalized propagation constant b = w²/v², in (0, 1). */
  b: number;
  /** V at which this mode is cut off (not guided at or below it). */
  cutoffV: number;
  /** 2 for l = 0 (two polarizations), 4 for l ≥ 1 (two polarizations × cos/sin). */
  degeneracy: 2 | 4;
  /** The exact (vector) mode families this LP mode stands for, e.g. ['TE01', 'TM01', 'HE21']. */
  vectorModes: string[];
  /** True when v is within NEAR_CUTOFF_DV of cutoffV (or so close that b underflows): b is then tiny and fragile. */
  nearCutoff: boolean;
}

/** Largest V accepted: ~22 000 guided modes, a large-core multimode fiber. */
export const LP_MAX_V = 300;
/** Smallest V accepted: below, the LP01 decay constant w ≈ 1.12 exp(−2/V²) underflows (small-argument forms of K_0, K_1, A&S 9.6.8–9.6.9, put into the LP01 equation). */
export const LP_MIN_V = 0.1;
/** A mode with 0 < v − cutoffV < this is flagged nearCutoff (issue 3). */
export const NEAR_CUTOFF_DV = 1e-6;
/** Single-mode cutoff: first zero of J_0, A&S Table 9.5 (j_{0,1} = 2.4048255577). */
export const LP11_CUTOFF_V = 2.404825557695773;
/** Lowest log(w) searched: e^-700 ≈ 1e-304, the edge of the float64 range. */
const LOG_W_MIN = -700;
const MAX_RADIAL_ORDER = 10000;

function requireV(v: unknown): number {
  return requirePositive('v', v, {
    max: LP_MAX_V,
    hint: (x) => (x > LP_MAX_V ? 'this is a very large multimode core; use a ray (geometric) model instead' : undefined),
  });
}

function checkMinV(v: number): void {
  if (v < LP_MIN_V) {
    throw new ModelError(
      `V = ${v} is below ${LP_MIN_V}: LP01 is so weakly bound there that its field reaches far into the cladding and cannot be represented`,
      'Gloge 1971 LP modes',
      'check the core radius, NA and wavelength: single-mode fibers work near V = 1.5 to 2.4',
    );
  }
}

/** Vector-mode families of LP_lm (Gloge 1971, mode designations): HE_1m; TE_0m, TM_0m, HE_2m; EH_(l-1)m, HE_(l+1)m. */
export function lpVectorModes(l: number, m: number): string[] {
  requireInteger('l', l, 0, BESSEL_MAX_ORDER - 1);
  requireInteger('m', m, 1, MAX_RADIAL_ORDER);
  const name = (family: string, order: number) => (order < 10 && m < 10 ? `${family}${order}${m}` : `${family}${order},${m}`);
  if (l === 0) return [name('HE', 1)];
  if (l === 1) return [name('TE', 0), name('TM', 0), name('HE', 2)];
  return [name('EH', l - 1), name('HE', l + 1)];
}

/**
 * Cutoff V of LP_lm (Gloge 1971, cutoff condition J_{l-1}(v) = 0): LP01 never cuts off (0); LP0m at j_{1,m-1};
 * LP_lm (l ≥ 1) at j_{l-1,m}, the m-th zero of J_{l-1}.
 */
export function lpCutoffV(l: number, m: number): number {
  requireInteger('l', l, 0, BESSEL_MAX_ORDER - 1);
  requireInteger('m', m, 1, MAX_RADIAL_ORDER);
  return cutoffUnchecked(l, m);
}

function cutoffUnchecked(l: number, m: number): number {
  if (l === 0) return m === 1 ? 0 : besselJZero(1, m - 1);
  return besselJZero(l - 1, m);
}

/** H(u, w) = u J_{l-1}(u) + [w K_{l-1}(w)/K_l(w)] J_l(u); zero at a guided LP_lm mode. */
/**
 * The eigenvalue function in ratio form and its partial derivatives:
 *   h = f(u) + g(w), f = u J_{l-1}(u)/J_l(u), g = w K_{l-1}(w)/K_l(w)  (zero at a guided mode),
 *   f'(u) = (l² − (f − l)²)/u − u,  g'(w) = ((g + l)² − l²)/w − w,
 * both from Bessel's equation and the recurrences A&S 9.1.27, 9.6.26 (Riccati form of J_l'/J_l, K_l'/K_l).
 * f has a pole at the top of the bracket (a zero of J_l); h decreases through the bracket
 * from g(w_c) > 0 at the cutoff to below 0, so its sign alone tells which side of the root we are.
 */
function eigenvalueFunction(l: number, u: number, w: number): [number, number, number] {
  // f: l ≥ 1 uses J_{l-1}/J_l; l = 0 uses J_{-1}/J_0 = −J_1/J_0.
  const f = l === 0 ? -u / besselJRatioUnchecked(0, u) : u * besselJRatioUnchecked(l - 1, u);
  const g = besselKTermUnchecked(l, w);
  const fl = f - l;
  const gl = g + l;
  const dfdu = (l * l - fl * fl) / u - u;
  const dgdw = (gl * gl - l * l) / w - w;
  return [f + g, dfdu, dgdw];
}

/** √(v² − x²) without cancellation when x ≈ v. */
function complement(v: number, x: number): number {
  return x >= v ? 0 : Math.sqrt((v - x) * (v + x));
}

/** Safeguarded Newton: a Newton step once it falls inside the bracket, bisection otherwise. */
const NEWTON_DONE = 1e-11;
const MAX_NEWTON_STEPS = 100;

/**
 * Root of a decreasing function with known signs at the ends (positive at `positiveEnd`,
 * negative at `negativeEnd`), by Newton safeguarded with bisection. `evaluate` returns
 * [value, derivative] at x. Never leaves the bracket, so it cannot jump to a neighbouring mode.
 */
function safeguardedNewton(
  evaluate: (x: number) => [number, number],
  positiveEnd: number,
  negativeEnd: number,
  start: number,
): number {
  let pos = positiveEnd;
  let neg = negativeEnd;
  let x = start;
  for (let i = 0; i < MAX_NEWTON_STEPS; i++) {
    const [value, slope] = evaluate(x);
    if (value === 0) return x;
    if (value > 0) pos = x;
    else neg = x;
    const lo = Math.min(pos, neg);
    const hi = Math.max(pos, neg);
    let next = x - value / slope;
    // A converged Newton step may land on a bracket end by rounding: accept it, never bisect then.
    if (Math.abs(next - x) <= NEWTON_DONE * Math.abs(x)) return next;
    if (!(next > lo && next < hi)) next = 0.5 * (pos + neg);
    x = next;
    if (hi - lo <= 4 * Number.EPSILON * Math.abs(x)) return x;
  }
  return x;
}

/**
 * Solve LP_lm at v given its cutoff u_c (= cutoffV) and the top of its bracket upper = min(j_{l,m}, v).
 * The root is unique in (u_c, upper) (interlacing of Bessel zeros; J_l has no zero there).
 * Solves for whichever of u, w is the smaller at the root, so both keep full relative precision
 * (near cutoff u ≈ v and w is tiny; far from cutoff w ≫ u). Near cutoff w spans many decades
 * (LP0m: w ~ exp(−1/(u_c (v − u_c)))), so there the unknown is t = ln w.
 */
function solveInBracket(l: number, m: number, v: number, cutoffV: number, upper: number): LPMode {
  const crossing = v * Math.SQRT1_2; // u = w here
  let useU: boolean;
  if (crossing <= cutoffV) useU = false;
  else if (crossing >= upper) useU = true;
  else useU = eigenvalueFunction(l, crossing, crossing)[0] <= 0;
  let u: number;
  let w: number;
  if (useU) {
    const hi = Math.min(upper, crossing);
    // Far from cutoff the root sits just below the zero j_{l,m} of J_l: u ≈ j_{l,m}(1 − 1/w) (K_{l-1}/K_l → 1).
    const wTop = complement(v, upper);
    let start = upper * (1 - 1 / Math.max(wTop, 1));
    if (!(start > cutoffV && start < hi)) start = 0.5 * (cutoffV + hi);
    u = safeguardedNewton(
      (x) => {
        const wx = complement(v, x);
        const [h, dfdu, dgdw] = eigenvalueFunction(l, x, wx);
        return [h, dfdu - (dgdw * x) / wx];
      },
      cutoffV,
      hi,
      start,
    );
    w = complement(v, u);
  } else {
    const wLo = complement(v, upper);
    const tHi = Math.log(Math.min(complement(v, cutoffV), crossing));
    const tLo = wLo > 0 ? Math.log(wLo) : LOG_W_MIN;
    const evaluate = (t: number): [number, number] => {
      const wt = Math.exp(t);
      const ut = complement(v, wt);
      const [h, dfdu, dgdw] = eigenvalueFunction(l, ut, wt);
      return [h, wt * (dgdw - (dfdu * wt) / ut)];
    };
    if (wLo === 0 && evaluate(LOG_W_MIN)[0] > 0) {
      w = 0; // the root lies below e^-700: so close to cutoff that w underflows
    } else {
      w = Math.exp(safeguardedNewton(evaluate, tHi, tLo, 0.5 * (tLo + tHi)));
    }
    u = complement(v, w);
  }
  const b = (w / v) * (w / v);
  return {
    l,
    m,
    u,
    w,
    b,
    cutoffV,
    degeneracy: l === 0 ? 2 : 4,
    vectorModes: lpVectorModes(l, m),
    nearCutoff: v - cutoffV < NEAR_CUTOFF_DV || b === 0,
  };
}

/**
 * An LP mode's name: LP01, LP11 — and with a comma once an index has two digits, LP10,1 or
 * LP1,10, so LP101 is never ambiguous (common practice in mode tables, as in LP_{10,1}).
 * Throws InputError for an index that is not a whole number (l ≥ 0, m ≥ 1).
 */
export function lpName(l: number, m: number): string {
  requireInteger('l', l, 0, Number.MAX_SAFE_INTEGER);
  requireInteger('m', m, 1, Number.MAX_SAFE_INTEGER);
  return l >= 10 || m >= 10 ? `LP${l},${m}` : `LP${l}${m}`;
}

/**
 * LP_lm at normalized frequency v. Throws ModelError when the mode is not guided (v ≤ cutoffV).
 */
export function solveLpMode(l: number, m: number, v: number): LPMode {
  requireInteger('l', l, 0, BESSEL_MAX_ORDER - 1);
  requireInteger('m', m, 1, MAX_RADIAL_ORDER);
  requireV(v);
  checkMinV(v);
  const cutoffV = cutoffUnchecked(l, m);
  if (v <= cutoffV) {
    throw new ModelError(
      `${lpName(l, m)} is not guided at V = ${v}: it is cut off at V = ${cutoffV.toFixed(4)}`,
      'Gloge 1971 LP modes',
      'a mode is guided only above its cutoff V; raise V (shorter wavelength, larger core or NA)',
    );
  }
  const upper = Math.min(besselJZero(l, m), v);
  return solveInBracket(l, m, v, cutoffV, upper);
}

/** Zeros of J_n below `limit`, followed by the first zero at or above it. */
function zerosUpTo(n: number, limit: number): number[] {
  const zeros: number[] = [];
  for (let k = 1; k <= MAX_RADIAL_ORDER; k++) {
    const z = besselJZero(n, k);
    zeros.push(z);
    if (z >= limit) break;
  }
  return zeros;
}

/**
 * Every guided LP mode at v, sorted by b descending (then l, m). No misses and no duplicates:
 * each LP_lm has exactly one root between its cutoff j_{l-1,m} and j_{l,m} (interlacing of
 * Bessel zeros, A&S 9.5.2), so the modes are enumerated from the zeros, not searched for.
 */
export function lpModes(v: number): LPMode[] {
  requireV(v);
  checkMinV(v);
  const modes: LPMode[] = [];
  // Cutoffs for l = 0 are 0 and the zeros of J_1; for l ≥ 1 the zeros of J_{l-1}.
  let below = [0, ...zerosUpTo(1, v)]; // cutoff list for l = 0
  for (let l = 0; l < BESSEL_MAX_ORDER; l++) {
    const cutoffs = below.filter((z) => z < v);
    if (cutoffs.length === 0) break;
    const uppers = zerosUpTo(l, v); // zeros of J_l: bracket tops here, cutoffs of l + 1
    for (let i = 0; i < cutoffs.length; i++) {
      const upper = Math.min(uppers[i] ?? Infinity, v);
      modes.push(solveInBracket(l, i + 1, v, cutoffs[i], upper));
    }
    below = uppers;
  }
  modes.sort((p, q) => q.b - p.b || p.l - q.l || p.m - q.m);
  return modes;
}

/** Total count of guided modes with their degeneracy (both polarizations, cos and sin). */
export function totalModeCount(modes: readonly LPMode[]): number {
  if (!Array.isArray(modes)) throw new InputError('modes', modes, 'a list of LP modes from lpModes');
  return modes.reduce((sum, mode) => sum + (mode?.degeneracy === 2 || mode?.degeneracy === 4 ? mode.degeneracy : invalidMode(mode)), 0);
}

/**
 * b(V) of LP_lm sampled on (cutoffV, vMax] for a b–V diagram: `samples` points spaced evenly
 * in V from just above the cutoff (where b → 0) to vMax. Empty when vMax ≤ cutoffV.
 */
export function lpBvCurve(l: number, m: number, vMax: number, samples = 100): [v: number, b: number][] {
  requireInteger('samples', samples, 2, 10000);
  const cutoffV = lpCutoffV(l, m);
  requireV(vMax);
  const vStart = Math.max(cutoffV, LP_MIN_V);
  if (vMax <= vStart) return [];
  const points: [number, number][] = [];
  if (cutoffV > 0) points.push([cutoffV, 0]);
  for (let i = 1; i <= samples; i++) {
    const v = vStart + ((vMax - vStart) * i) / samples;
    points.push([v, solveLpMode(l, m, v).b]);
  }
  return points;
}

function invalidMode(mode: unknown): never {
  throw new InputError('modes', mode, 'LP modes with degeneracy 2 or 4, as lpModes returns them');
}
