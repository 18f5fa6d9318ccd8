// Bessel functions of the first kind J_n and modified second kind K_n, integer order.
// Our own implementation (no dependency): every method below is a published algorithm,
// cited at its definition; accuracy is checked in tests/physics/bessel.test.ts against
// Abramowitz & Stegun tables and a scipy fixture.
import { ModelError, requireInteger, requireNumber, requirePositive } from './errors';
import { brentRoot } from './roots';

/** Highest order accepted. Checked against scipy up to 150 (the fixture); the methods hold further. */
export const BESSEL_MAX_ORDER = 500;
/** Largest J argument accepted: beyond, Miller's recurrence would cost > 1e5 steps when Hankel's series fails. */
export const BESSEL_J_MAX_ARGUMENT = 1e5;
/** Highest zero index accepted by besselJZero. */
export const BESSEL_MAX_ZERO_INDEX = 10000;

/** Euler–Mascheroni constant γ, A&S 6.1.3. */
const EULER_GAMMA = 0.5772156649015329;
/** √½, exact phase factor of the Hankel expansion. */
const SQRT_HALF = Math.SQRT1_2;
/** Machine epsilon for float64. */
const EPS = Number.EPSILON;
/** Recurrence values are rescaled when they pass this, to stay far from overflow. */
const RESCALE_AT = 1e250;
/** Below this argument J_n is its leading power-series term to full precision. */
const TINY_X = 1e-20;
/** Hankel's series is used only from this argument on (below, Miller is as cheap and always converges). */
const HANKEL_MIN_X = 30;
/** Largest Hankel term allowed: each unit of 10 in the largest term costs one decimal digit. */
const HANKEL_MAX_TERM = 10;
/** Series for K0, K1 below this argument; Temme's continued fraction above (Temme 1975). */
const K_SERIES_MAX_X = 2;

function requireOrder(n: unknown, name = 'n'): number {
  return requireInteger(name, n, 0, BESSEL_MAX_ORDER);
}

/**
 * Start order for Miller's backward recurrence. The discarded solution Y_N shrinks like
 * Ai/Bi beyond the turning point N ≈ x: exp(-(4/3)ζ^{3/2}) with ζ ≈ (N - x)(2/x)^{1/3}
 * (Olver 1974, ch. 11), so N - x ≈ 10 x^{1/3} + 16 leaves it below 1e-17 relative.
 */
function millerStart(n: number, x: number): number {
  const m = Math.max(n, x);
  const start = Math.ceil(m + 16 + 10 * Math.cbrt(m));
  return start % 2 === 0 ? start : start + 1;
}

/**
 * J_n(x) and J_{n+1}(x) by Miller's backward recurrence J_{k-1} = (2k/x) J_k - J_{k+1}
 * (A&S 9.1.27), normalized with 1 = J_0 + 2 Σ J_{2k} (A&S 9.1.46). Stable for all x > 0:
 * backward recurrence is strongly stable where k > x and neutral where k < x.
 * Internal: no validation; x ≥ 0, n ≥ 0.
 */
export function besselJPairUnchecked(n: number, x: number): [number, number] {
  if (x === 0) return [n === 0 ? 1 : 0, 0];
  if (x < TINY_X) {
    // Leading term of the power series (A&S 9.1.10): the next term is smaller by x²/(4(n+1)) < 1e-40,
    // and Miller's steps of ratio 2k/x would overflow before they could be rescaled.
    let jn = 1;
    for (let k = 1; k <= n && jn !== 0; k++) jn *= x / 2 / k;
    return [jn, (jn * x) / 2 / (n + 1)];
  }
  const start = millerStart(n + 1, x);
  const twoOverX = 2 / x;
  let above = 0; // J_{k+1}
  let here = 1e-30; // J_k, arbitrary scale
  let sum = 0;
  let jn = 0;
  let jn1 = 0;
  if (start === n + 1) jn1 = here;
  for (let k = start; k >= 1; k--) {
    const below = k * twoOverX * here - above;
    above = here;
    here = below;
    const order = k - 1;
    if (order === n) jn = here;
    else if (order === n + 1) jn1 = here;
    if (order % 2 === 0) sum += order === 0 ? here : 2 * here;
    if (Math.abs(here) > RESCALE_AT) {
      here /= RESCALE_AT;
      above /= RESCALE_AT;
      sum /= RESCALE_AT;
      jn /= RESCALE_AT;
      jn1 /= RESCALE_AT;
    }
  }
  return [jn / sum, jn1 / sum];
}

/**
 * J_n(x) / J_{n+1}(x) by the same backward recurrence, stopped at order n: no normalization
 * is needed for a ratio, so this costs N − n steps. Infinite at zeros of J_{n+1} (returned as
 * a huge finite or infinite number). Internal: x > 0, n ≥ 0.
 */
export function besselJRatioUnchecked(n: number, x: number): number {
  const start = millerStart(n + 1, x);
  const twoOverX = 2 / x;
  let above = 0;
  let here = 1e-30;
  for (let k = start; k > n; k--) {
    const below = k * twoOverX * here - above;
    above = here;
    here = below;
    if (Math.abs(here) > RESCALE_AT) {
      here /= RESCALE_AT;
      above /= RESCALE_AT;
    }
  }
  return here / above;
}

/**
 * Hankel's asymptotic expansion for large x (A&S 9.2.5, 9.2.9, 9.2.10):
 * J_n(x) = √(2/(πx)) (P cos χ − Q sin χ), χ = x − (2n+1)π/4.
 * Returns undefined when the series would lose more than one digit (large n for this x).
 */
function besselJHankel(n: number, x: number): number | undefined {
  const mu = 4 * n * n;
  const eightX = 8 * x;
  let p = 1;
  let q = 0;
  let term = 1;
  let previous = Infinity;
  for (let k = 1; k < 200; k++) {
    term *= (mu - (2 * k - 1) * (2 * k - 1)) / (k * eightX);
    const size = Math.abs(term);
    if (size > HANKEL_MAX_TERM) return undefined;
    // Signs: P = 1 − t2 + t4 − …, Q = t1 − t3 + …
    switch (k % 4) {
      case 1: q += term; break;
      case 2: p -= term; break;
      case 3: q -= term; break;
      default: p += term;
    }
    if (size < 0.5 * EPS * Math.min(1, Math.hypot(p, q))) {
      // cos χ and sin χ without subtracting a large multiple of π from x: the phase
      // (2n+1)π/4 is an odd multiple of π/4, so its cosine and sine are ±√½.
      const octant = (2 * n + 1) % 8; // 1, 3, 5 or 7
      const cosPhase = octant === 1 || octant === 7 ? SQRT_HALF : -SQRT_HALF;
      const sinPhase = octant === 1 || octant === 3 ? SQRT_HALF : -SQRT_HALF;
      const c = Math.cos(x);
      const s = Math.sin(x);
      const cosChi = c * cosPhase + s * sinPhase;
      const sinChi = s * cosPhase - c * sinPhase;
      return Math.sqrt(2 / (Math.PI * x)) * (p * cosChi - q * sinChi);
    }
    if (size > previous && k > 2) return undefined; // the series has started to diverge
    previous = size;
  }
  return undefined;
}

/**
 * Bessel function of the first kind J_n(x), integer n from 0 to BESSEL_MAX_ORDER, 0 ≤ x ≤ 1e5.
 * Accuracy about 1e-14 relative to the envelope √(2/(πx)) (so relative away from zeros,
 * absolute near them); values below the float64 range return 0.
 */
export function besselJ(n: number, x: number): number {
  requireOrder(n);
  requireNumber('x', x, { min: 0, max: BESSEL_J_MAX_ARGUMENT, hint: negativeHint(x) });
  if (x === 0) return n === 0 ? 1 : 0;
  if (x >= HANKEL_MIN_X) {
    const value = besselJHankel(n, x);
    if (value !== undefined) return value;
  }
  return besselJPairUnchecked(n, x)[0];
}

function negativeHint(x: unknown): string | undefined {
  return typeof x === 'number' && x < 0 ? 'J_n(−x) = (−1)^n J_n(x): pass |x|' : undefined;
}

/**
 * e^x K_0(x) and e^x K_1(x) for x > 0.
 * x ≤ 2: power series A&S 9.6.13 for K_0 with I_0, I_1 from A&S 9.6.10, and the Wronskian
 * I_0 K_1 + I_1 K_0 = 1/x (A&S 9.6.15) for K_1; loses at most a factor 15 to cancellation (at x = 2).
 * x > 2: Temme's continued fraction with Steed's summation (Temme 1975, J. Comput. Phys. 19, eqs. 3.8–3.10).
 */
export function besselK01ScaledUnchecked(x: number): [number, number] {
  if (x <= K_SERIES_MAX_X) {
    const q = (x * x) / 4;
    let term = 1; // q^k / (k!)^2
    let i0 = 1;
    let harmonicSum = 0; // Σ q^k/(k!)² H_k
    let harmonic = 0;
    let i1Term = 1; // q^k / (k!(k+1)!)
    let i1 = 1;
    for (let k = 1; k < 60; k++) {
      term *= q / (k * k);
      harmonic += 1 / k;
      i0 += term;
      harmonicSum += term * harmonic;
      i1Term *= q / (k * (k + 1));
      i1 += i1Term;
      if (term * harmonic < EPS * 1e-3 * harmonicSum && term < EPS * 1e-3) break;
    }
    i1 *= x / 2;
    const k0 = -(Math.log(x) - Math.LN2 + EULER_GAMMA) * i0 + harmonicSum; // log(x) − ln 2: x/2 underflows for subnormal x
    const k1 = (1 / x - i1 * k0) / i0;
    const scale = Math.exp(x);
    return [k0 * scale, k1 * scale];
  }
  if (x >= K_ASYMPTOTIC_X) return [kScaledAsymptotic(0, x), kScaledAsymptotic(1, x)];
  // Temme 1975: K_ν for ν = μ = 0 from the continued fraction for the ratio of confluent
  // hypergeometric functions U(ν+1/2+k, 2ν+1, 2x), summed by Steed's algorithm.
  const a1 = 0.25; // 1/4 − μ²
  let b = 2 * (1 + x);
  let d = 1 / b;
  let delh = d;
  let h = d;
  let q1 = 0;
  let q2 = 1;
  let q = a1;
  let c = a1;
  let a = -a1;
  let s = 1 + q * delh;
  for (let i = 2; i < 10000; i++) {
    a -= 2 * (i - 1);
    c = (-a * c) / i;
    const qNew = (q1 - b * q2) / a;
    q1 = q2;
    q2 = qNew;
    q += c * qNew;
    b += 2;
    d = 1 / (b + a * d);
    delh = (b * d - 1) * delh;
    h += delh;
    const dels = q * delh;
    s += dels;
    if (Math.abs(dels / s) < EPS / 2) break;
  }
  h *= a1;
  const k0 = Math.sqrt(Math.PI / (2 * x)) / s;
  const k1 = (k0 * (x + 0.5 - h)) / x;
  return [k0, k1];
}

/** From here on e^x K_ν(x) by its large-argument expansion; its terms fall below 1e-17 within a few. */
const K_ASYMPTOTIC_X = 1000;

/** e^x K_ν(x) ~ √(π/(2x)) Σ (μ−1)(μ−9)…(μ−(2k−1)²)/(k!(8x)^k), μ = 4ν² (A&S 9.7.2). For x ≥ 1000. */
function kScaledAsymptotic(nu: number, x: number): number {
  const mu = 4 * nu * nu;
  let term = 1;
  let sum = 1;
  for (let k = 1; k < 30; k++) {
    term *= (mu - (2 * k - 1) * (2 * k - 1)) / (k * 8 * x);
    sum += term;
    if (Math.abs(term) < EPS * 0.1) break;
  }
  return Math.sqrt(Math.PI / (2 * x)) * sum;
}

/** Overflow guard for the forward K recurrence. */
const K_RESCALE = 1e280;
/** Largest exponential chunk applied in one multiplication (well inside the float64 range). */
const EXP_CHUNK = 600;

/**
 * e^x K_n(x) by forward recurrence K_{k+1} = K_{k-1} + (2k/x) K_k (A&S 9.6.26), which is
 * stable because K grows with order. Returns mantissa and the count of K_RESCALE factors.
 */
function besselKScaledParts(n: number, x: number): [number, number] {
  const [k0, k1] = besselK01ScaledUnchecked(x);
  if (n === 0) return [k0, 0];
  let below = k0;
  let here = k1;
  let rescales = 0;
  for (let k = 1; k < n; k++) {
    const next = below + ((2 * k) / x) * here;
    below = here;
    here = next;
    if (here > K_RESCALE) {
      here /= K_RESCALE;
      below /= K_RESCALE;
      rescales++;
    }
  }
  return [here, rescales];
}

/** Largest argument of the scaled K: Temme's b = 2(1 + x) overflows near 9e307 (e^x K_0 then came out 0, not √(π/2x)). */
export const BESSEL_K_SCALED_MAX_ARGUMENT = 1e300;

function requireKArgument(x: unknown, max?: number): number {
  return requirePositive('x', x, {
    max,
    hint: typeof x === 'number' && x <= 0 ? 'K_n is infinite at x = 0 and undefined for x < 0' : undefined,
  });
}

function overflow(n: number, x: number, scaled: boolean): ModelError {
  return new ModelError(
    `${scaled ? 'e^x K' : 'K'}_${n}(${x}) is beyond the float64 range (about 1.8e308)`,
    'Bessel K',
    'K_n grows like (n−1)!/2·(2/x)^n for small x: use a larger x or a lower order',
  );
}

/**
 * Modified Bessel function of the second kind K_n(x), integer n 0..BESSEL_MAX_ORDER, x > 0.
 * About 1e-14 relative. Throws ModelError when K_n(x) is beyond the float64 range
 * (e.g. K_150(1e-3)); returns 0 when it is below it (x ≳ 700).
 */
export function besselK(n: number, x: number): number {
  requireOrder(n);
  requireKArgument(x);
  const [mantissa, rescales] = besselKScaledParts(n, x);
  // Apply e^{-x} and the rescale factors alternately so that neither overflows first.
  let value = mantissa;
  let remainingX = x;
  let remainingScale = rescales;
  while (remainingX > 0 || remainingScale > 0) {
    if (remainingScale > 0 && (value < 1 || remainingX === 0)) {
      value *= K_RESCALE;
      remainingScale--;
      if (value === Infinity) throw overflow(n, x, false);
    } else {
      const chunk = Math.min(remainingX, EXP_CHUNK);
      value *= Math.exp(-chunk);
      remainingX -= chunk;
      if (value === 0) return 0; // underflow: K_n(x) < 5e-324 (x ≳ 745 for moderate n)
    }
  }
  if (!Number.isFinite(value)) throw overflow(n, x, false); // K_1(x) ≈ 1/x overflows for x < 5.6e-309
  return value;
}

/** e^x K_n(x): no underflow for large x. Same accuracy as besselK; ModelError beyond float64. */
export function besselKScaled(n: number, x: number): number {
  requireOrder(n);
  requireKArgument(x, BESSEL_K_SCALED_MAX_ARGUMENT);
  const [mantissa, rescales] = besselKScaledParts(n, x);
  let value = mantissa;
  for (let i = 0; i < rescales; i++) value *= K_RESCALE;
  if (!Number.isFinite(value)) throw overflow(n, x, true);
  return value;
}

/**
 * w K_{l-1}(w) / K_l(w) for l ≥ 0 with K_{-1} = K_1; 0 at w = 0 (the limit).
 * Via the ratio ρ_k = K_k/K_{k-1}, ρ_{k+1} = 2k/w + 1/ρ_k (A&S 9.6.26), never overflowing.
 * Internal: used by the LP-mode equation (Gloge 1971, eq. 9).
 */
export function besselKTermUnchecked(l: number, w: number): number {
  if (w === 0) return 0;
  const [k0, k1] = besselK01ScaledUnchecked(w);
  let ratio = k1 / k0; // ρ_1 = K_1/K_0
  if (l === 0) return w * ratio; // K_{-1}/K_0 = K_1/K_0
  for (let k = 1; k < l; k++) ratio = (2 * k) / w + 1 / ratio;
  return w / ratio;
}

/**
 * ln(e^x K_l(x)) by the ratio recurrence of besselKTermUnchecked: never overflows, for fields
 * K_l(wρ)/K_l(w) at high order and small argument. Internal: x > 0.
 */
export function besselKLogScaledUnchecked(l: number, x: number): number {
  const [k0, k1] = besselK01ScaledUnchecked(x);
  let log = Math.log(k0);
  if (l === 0) return log;
  let ratio = k1 / k0;
  log += Math.log(ratio);
  for (let k = 1; k < l; k++) {
    ratio = (2 * k) / x + 1 / ratio;
    log += Math.log(ratio);
  }
  return log;
}

// ---------------------------------------------------------------------------------------------
// Zeros of J_n

/** First zero of the Airy function Ai, A&S Table 10.13. */
const AIRY_A1 = -2.338107410459767;
/** Second zero of Ai, A&S Table 10.13. */
const AIRY_A2 = -4.087949444130971;
/** Third zero of Ai, A&S Table 10.13. */
const AIRY_A3 = -5.520559828095551;

/** k-th zero of Ai: table for k ≤ 3, else A&S 10.4.94–10.4.105, T(t) = t^{2/3}(1 + 5/48 t^-2 − 5/36 t^-4). */
function airyZero(k: number): number {
  if (k === 1) return AIRY_A1;
  if (k === 2) return AIRY_A2;
  if (k === 3) return AIRY_A3;
  const t = (3 * Math.PI * (4 * k - 1)) / 8;
  const t2 = 1 / (t * t);
  return -Math.pow(t, 2 / 3) * (1 + (5 / 48) * t2 - (5 / 36) * t2 * t2);
}

/** McMahon's expansion, A&S 9.5.12: good when k is large compared with n. */
function mcMahonZero(n: number, k: number): number {
  const mu = 4 * n * n;
  const beta = (k + n / 2 - 0.25) * Math.PI;
  const e = 1 / (8 * beta);
  const e2 = e * e;
  return (
    beta -
    (mu - 1) * e -
    ((4 * (mu - 1) * (7 * mu - 31)) / 3) * e * e2 -
    ((32 * (mu - 1) * (83 * mu * mu - 982 * mu + 3779)) / 15) * e * e2 * e2
  );
}

/**
 * Olver's uniform expansion, A&S 9.5.22 (leading term and f1): j_{n,k} ≈ n z(ζ) + f1(ζ)/n,
 * ζ = n^{-2/3} a_k, where z(ζ) solves (2/3)(−ζ)^{3/2} = √(z²−1) − arcsec z (A&S 9.3.38).
 */
function olverZero(n: number, k: number): number {
  const zeta = Math.pow(n, -2 / 3) * airyZero(k);
  const target = (2 / 3) * Math.pow(-zeta, 1.5);
  // Newton for z > 1 on g(z) = √(z²−1) − arccos(1/z) − target; g'(z) = √(z²−1)/z.
  let z = 1 + Math.pow(1.5 * target, 2 / 3) / Math.cbrt(2) + target; // rough start, z ≥ 1
  for (let i = 0; i < 50; i++) {
    const root = Math.sqrt(z * z - 1);
    const g = root - Math.acos(1 / z) - target;
    const step = g / (root / z);
    let next = z - step;
    if (next <= 1) next = (z + 1) / 2;
    if (Math.abs(next - z) < 1e-15 * z) {
      z = next;
      break;
    }
    z = next;
  }
  const z2m1 = z * z - 1;
  const h = Math.pow((4 * zeta) / (1 - z * z), 0.25);
  const b0 = -5 / (48 * zeta * zeta) + Math.pow(-zeta, -0.5) * (5 / (24 * Math.pow(z2m1, 1.5)) + 1 / (8 * Math.sqrt(z2m1)));
  const f1 = 0.5 * z * h * h * b0;
  return n * z + f1 / n;
}

/**
 * k-th positive zero j_{n,k} of J_n (k ≥ 1), to about 1e-15 relative.
 * Start from McMahon (large k) or Olver's uniform expansion (small k, large n), then Newton;
 * if Newton strays more than 1.2 from the start, Brent inside start ± 1.2 (zeros of J_n, n ≥ 1,
 * are more than π apart by Sturm comparison; for n = 0 at least 3.1, so that window holds one).
 */
export function besselJZero(n: number, k: number): number {
  requireOrder(n);
  requireInteger('k', k, 1, BESSEL_MAX_ZERO_INDEX);
  const guess = k > n || n < 2 ? mcMahonZero(n, k) : olverZero(n, k);
  return refineZero(n, guess);
}

const ZERO_HALF_WIDTH = 1.2;
/** Newton is quadratic: once a step is below this (relative), the error after it is ~1e-20. */
const NEWTON_DONE = 1e-10;

/** Newton step J_n/J_n' from the ratio r = J_n/J_{n+1}: J_n'/J_n = n/x − 1/r (A&S 9.1.27). */
function zeroNewtonStep(n: number, x: number): number {
  const r = besselJRatioUnchecked(n, x);
  return r / ((n / x) * r - 1);
}

function refineZero(n: number, guess: number): number {
  let x = guess;
  for (let i = 0; i < 12; i++) {
    const step = zeroNewtonStep(n, x);
    const next = x - step;
    if (!(Math.abs(next - guess) < ZERO_HALF_WIDTH)) break; // wandered off: use the bracketed search
    x = next;
    if (Math.abs(step) <= NEWTON_DONE * x) return x;
  }
  return bracketedZero(n, guess);
}

/** Fallback: bisection/Brent on J_n inside guess ± ZERO_HALF_WIDTH (one zero there: spacing > π). */
function bracketedZero(n: number, guess: number): number {
  const f = (x: number) => besselJPairUnchecked(n, x)[0];
  const lo = Math.max(guess - ZERO_HALF_WIDTH, Number.MIN_VALUE);
  const hi = guess + ZERO_HALF_WIDTH;
  const fLo = f(lo);
  const fHi = f(hi);
  if (Math.sign(fLo) === Math.sign(fHi)) {
    throw new ModelError(`the search for a zero of J_${n} near ${guess} did not converge`, 'Bessel zero search', 'please report this case');
  }
  return brentRoot(f, lo, hi, { fa: fLo, fb: fHi });
}
