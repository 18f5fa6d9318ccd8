// Scalar (weakly guiding) mode solver for any circularly symmetric index profile n(r).
// LP modes ψ(r) cos(lφ) obey the scalar radial wave equation (Gloge 1971; Snyder & Love 1983, ch. 13):
//   (1/r) d/dr (r dψ/dr) − (l²/r²) ψ + k² n(r)² ψ = β² ψ.
// It is discretised by conservative finite differences on a cell-centred grid r_j = (j − ½)h, which puts no
// node on the axis and makes the matrix symmetric after the scaling φ_j = √r_j ψ_j. Eigenvalues β² inside
// (k² n_cl², k² n_co²) are the guided modes; they are found by bisection on the Sturm sequence count and
// their vectors by inverse iteration (Wilkinson 1965, ch. 5; Golub & Van Loan 2013, §8.4). Second order in h.
import { InputError, ModelError, requireNumber, requirePositive, requireWavelengthNm } from './errors';

export interface IndexProfile {
  /** What it is, for display: e.g. "graded-index α = 2". */
  name: string;
  coreRadiusUm: number;
  /** Largest index in the core (on the axis for an α-profile). */
  coreIndex: number;
  /** Uniform cladding index, reached at r ≥ coreRadiusUm. */
  claddingIndex: number;
  /** n(r) for r ≥ 0 (µm). Must equal claddingIndex for r ≥ coreRadiusUm. */
  indexAt: (rUm: number) => number;
}

/** Fused silica at 850 nm (Malitson 1965 Sellmeier, n = 1.4525): default cladding of multimode profiles. */
export const SILICA_INDEX_850NM = 1.4525;

/**
 * Power-law (α) profile: n(r)² = n1² (1 − 2Δ (r/a)^α) in the core, n2 outside, with n1² − n2² = NA²
 * (Gloge & Marcatili 1973, BSTJ 52(9)). α = 2 is the near-parabolic OM-class profile; α → ∞ is a step.
 */
export function gradedIndexProfile(opts: { coreRadiusUm: number; na: number; alpha: number; claddingIndex?: number }): IndexProfile {
  const a = requirePositive('coreRadiusUm', opts?.coreRadiusUm, { max: 500, unit: 'µm' });
  const na = requirePositive('na', opts?.na, { max: 0.5 });
  const alpha = requireNumber('alpha', opts?.alpha, { min: 0.5, max: 1000 });
  const n2 = requireNumber('claddingIndex', opts?.claddingIndex ?? SILICA_INDEX_850NM, { min: 1, max: 4 });
  const n1sq = n2 * n2 + na * na;
  requireGuiding(na, n1sq, n2);
  const twoDelta = (na * na) / n1sq;
  return {
    name: `graded-index α = ${alpha}`,
    coreRadiusUm: a,
    coreIndex: Math.sqrt(n1sq),
    claddingIndex: n2,
    indexAt: (r) => (r >= a ? n2 : Math.sqrt(n1sq * (1 - twoDelta * (r / a) ** alpha))),
  };
}

/** An NA so small that n1 rounds to n2 (NA ≲ 1e-8) describes no guide at all. */
function requireGuiding(na: number, n1sq: number, n2: number): void {
  if (!(Math.sqrt(n1sq) > n2)) throw new InputError('na', na, 'an NA large enough to raise the core index above the cladding index', 'fibers have NA from about 0.05 to 0.5');
}

/** Step profile with n1² − n2² = NA². */
export function stepIndexProfile(opts: { coreRadiusUm: number; na: number; claddingIndex?: number }): IndexProfile {
  const a = requirePositive('coreRadiusUm', opts?.coreRadiusUm, { max: 500, unit: 'µm' });
  const na = requirePositive('na', opts?.na, { max: 0.5 });
  const n2 = requireNumber('claddingIndex', opts?.claddingIndex ?? SILICA_INDEX_850NM, { min: 1, max: 4 });
  const n1 = Math.sqrt(n2 * n2 + na * na);
  requireGuiding(na, n1 * n1, n2);
  return { name: 'step-index', coreRadiusUm: a, coreIndex: n1, claddingIndex: n2, indexAt: (r) => (r < a ? n1 : n2) };
}

export interface RadialMode {
  l: number;
  /** Radial order, 1 = fewest radial nodes. */
  m: number;
  /** Propagation constant β (rad/µm). */
  betaPerUm: number;
  /** Effective index β/k. */
  effectiveIndex: number;
  /** Normalised propagation constant b = (n_eff² − n_cl²)/(n_co² − n_cl²), 0..1. */
  b: number;
  /** 2 for l = 0 (two polarisations), 4 for l ≥ 1 (cos/sin × two polarisations). */
  degeneracy: 2 | 4;
  /** Principal mode number 2m + l − 1: modes of one group share β in a parabolic profile (Gloge & Marcatili 1973). */
  principal: number;
  /**
   * Radial field ψ(r_j) on the solver grid, normalised so that ∫ψ² r dr = 1; the full transverse field is
   * ψ/√(2π) for l = 0 and ψ cos(lφ)/√π (or sin) for l ≥ 1, each of unit power.
   */
  field: Float64Array;
}

export interface RadialSolution {
  profile: IndexProfile;
  wavelengthNm: number;
  /** V = k a √(n_co² − n_cl²). */
  v: number;
  /** Cell-centred radii r_j = (j − ½) h (µm). */
  rUm: Float64Array;
  stepUm: number;
  /** Guided modes, b descending. */
  modes: RadialMode[];
  /** Σ degeneracy: every guided mode with both polarisations and orientations. */
  totalModeCount: number;
}

export interface RadialSolverOptions {
  /** Cells across the core radius (integer, the core edge falls on a cell boundary). Default from V, see below. */
  cellsPerCore?: number;
  /** Outer boundary (µm), field forced to zero beyond. Default a + max(a, 10a/V). */
  rMaxUm?: number;
  /** Only solve up to this azimuthal order (default: all guided orders). */
  maxL?: number;
}

/** Fewest cells across the core: resolves the step and the first radial oscillations. */
const MIN_CELLS_PER_CORE = 60;
/**
 * Grid rule: the FD error in the transverse eigenvalue is ≈ κ⁴h²/12 with κ ≤ V/a, so the error in b is at
 * most (V h / a)²/12 ≈ 3e-3 with h = GRID_B_ACCURACY_FACTOR · a / V. Measured against the Bessel solution
 * of a step (worst case, the index jump costs accuracy) it is below 3e-3; smooth α-profiles do ten times better.
 */
const GRID_B_ACCURACY_FACTOR = 0.2;
/** Most cells the solver will take (memory/time guard: 6000 cells ≈ 50 kB per mode). */
const MAX_CELLS = 6000;
/**
 * Largest V solved (time/memory guard). Cost grows about as V^3: measured on a 2-core test machine, about 0.9 s
 * at V = 120 (step or α = 2) and 11 s with 300 MB of fields at V = 314 (MAX_CELLS alone allowed V ≈ 600,
 * ~45 000 modes, GBs). V = 120 still covers every OM-class fiber (50/62.5 µm, NA ≤ 0.275) from 600 nm up.
 */
export const MAX_SOLVER_V = 120;
/**
 * Bisection stops at this relative width of the guided β² range; the eigenvalue is then refined by the
 * Rayleigh quotient of the inverse-iteration vector, whose error is the square of the vector's (Parlett 1998, §4.6).
 */
const BISECTION_RELATIVE_TOLERANCE = 1e-8;
/** Inverse-iteration sweeps: from a shift this close, two sweeps reach rounding level; three for margin. */
const INVERSE_ITERATIONS = 3;

function defaultCellsPerCore(v: number): number {
  return Math.max(MIN_CELLS_PER_CORE, Math.ceil(v / GRID_B_ACCURACY_FACTOR));
}

/** Number of eigenvalues of the symmetric tridiagonal (d, e) strictly below x (Sturm sequence count). */
function sturmCount(d: Float64Array, e2: Float64Array, x: number): number {
  let count = 0;
  let q = d[0] - x;
  if (q < 0) count++;
  const n = d.length;
  for (let j = 1; j < n; j++) {
    // A zero pivot is nudged to a tiny number: the count is unaffected (Wilkinson 1965, §5.43).
    const prev = q === 0 ? Number.MIN_VALUE * 1e10 : q;
    q = d[j] - x - e2[j - 1] / prev;
    if (q < 0) count++;
  }
  return count;
}

/** Solves (T − λ I) y = x in place for tridiagonal T (Thomas algorithm); tiny pivots are perturbed. */
function shiftedSolve(d: Float64Array, e: Float64Array, lambda: number, x: Float64Array, work: Float64Array): void {
  const n = d.length;
  const tiny = 1e-14 * (Math.abs(lambda) + 1);
  let piv = d[0] - lambda;
  if (Math.abs(piv) < tiny) piv = tiny;
  work[0] = e[0] / piv;
  x[0] = x[0] / piv;
  for (let j = 1; j < n; j++) {
    piv = d[j] - lambda - e[j - 1] * work[j - 1];
    if (Math.abs(piv) < tiny) piv = tiny;
    work[j] = j < n - 1 ? e[j] / piv : 0;
    x[j] = (x[j] - e[j - 1] * x[j - 1]) / piv;
  }
  for (let j = n - 2; j >= 0; j--) x[j] -= work[j] * x[j + 1];
}

/**
 * Every guided LP mode of the profile at the wavelength, by finite differences.
 * Accuracy (tests/physics/radialSolver.test.ts, against the Bessel-function solution of a step): b within
 * 2e-3 of the exact value on the default grid for every mode not within 0.02 of cutoff.
 */
export function solveRadialModes(profile: IndexProfile, wavelengthNm: number, options: RadialSolverOptions = {}): RadialSolution {
  if (!profile || typeof profile.indexAt !== 'function') throw new InputError('profile', profile, 'an index profile (gradedIndexProfile or stepIndexProfile)');
  const lambdaNm = requireWavelengthNm('wavelengthNm', wavelengthNm);
  const a = requirePositive('profile.coreRadiusUm', profile.coreRadiusUm, { max: 500, unit: 'µm' });
  const nCl = requireNumber('profile.claddingIndex', profile.claddingIndex, { min: 1, max: 4 });
  const nCo = requireNumber('profile.coreIndex', profile.coreIndex, { min: nCl, minInclusive: false, max: 4 });
  const k = (2 * Math.PI) / (lambdaNm / 1000);
  const v = k * a * Math.sqrt(nCo * nCo - nCl * nCl);
  const cellsPerCore = options.cellsPerCore === undefined ? defaultCellsPerCore(v) : Math.round(requireNumber('cellsPerCore', options.cellsPerCore, { min: 1, max: MAX_CELLS }));
  const h = a / cellsPerCore;
  const rMax = options.rMaxUm === undefined ? a + Math.max(a, (10 * a) / v) : requireNumber('rMaxUm', options.rMaxUm, { min: a * 1.2, max: 50 * a, unit: 'µm' });
  if (v > MAX_SOLVER_V) {
    throw new ModelError(
      `V = ${v.toFixed(1)} is above ${MAX_SOLVER_V}, the largest this mode solver handles (thousands of modes, seconds of work).`,
      'finite-difference radial solver',
      'use a smaller core or NA, or a longer wavelength',
    );
  }
  const n = Math.ceil(rMax / h);
  if (n > MAX_CELLS) {
    throw new ModelError(`The fiber needs ${n} grid cells (more than ${MAX_CELLS}): V = ${v.toFixed(1)} is too large for this solver.`, 'finite-difference radial solver', 'use a shorter core radius, a smaller NA or a longer wavelength');
  }
  const maxL = options.maxL === undefined ? Number.POSITIVE_INFINITY : Math.round(requireNumber('maxL', options.maxL, { min: 0, max: 1000 }));

  const r = new Float64Array(n);
  const k2n2 = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    r[j] = (j + 0.5) * h;
    const nj = profile.indexAt(r[j]);
    if (!Number.isFinite(nj) || nj < 1) throw new ModelError(`The index profile gives n = ${nj} at r = ${r[j]} µm.`, 'index profile');
    k2n2[j] = k * k * nj * nj;
  }
  const h2 = h * h;
  // Off-diagonal r_{j+½} / (h² √(r_j r_{j+1})) — the same for every l.
  const e = new Float64Array(n - 1);
  const e2 = new Float64Array(n - 1);
  for (let j = 0; j < n - 1; j++) {
    e[j] = (j + 1) * h / (h2 * Math.sqrt(r[j] * r[j + 1]));
    e2[j] = e[j] * e[j];
  }
  const lower = k * k * nCl * nCl;
  const upper = k * k * nCo * nCo;
  const tol = BISECTION_RELATIVE_TOLERANCE * (upper - lower) + Number.EPSILON * upper;
  const d = new Float64Array(n);
  const modes: RadialMode[] = [];
  const work = new Float64Array(n);
  for (let l = 0; l <= maxL; l++) {
    for (let j = 0; j < n; j++) {
      const rin = j * h; // r_{j−½}; zero on the axis (no flux through r = 0)
      const rout = (j + 1) * h; // r_{j+½}
      d[j] = -(rin + rout) / (h2 * r[j]) - (l * l) / (r[j] * r[j]) + k2n2[j];
    }
    const below = sturmCount(d, e2, lower);
    const total = sturmCount(d, e2, upper);
    const count = total - below;
    if (count <= 0) break;
    // Eigenvalue with index i (0-based ascending) lies where sturmCount passes i.
    for (let mIndex = 0; mIndex < count; mIndex++) {
      const i = total - 1 - mIndex; // largest first: m = 1
      let lo = lower;
      let hi = upper;
      while (hi - lo > tol) {
        const mid = 0.5 * (lo + hi);
        if (sturmCount(d, e2, mid) > i) hi = mid;
        else lo = mid;
      }
      const shift = 0.5 * (lo + hi);
      const vec = new Float64Array(n).fill(1);
      for (let it = 0; it < INVERSE_ITERATIONS; it++) {
        shiftedSolve(d, e, shift + tol, vec, work);
        let norm = 0;
        for (let j = 0; j < n; j++) norm += vec[j] * vec[j];
        norm = Math.sqrt(norm);
        for (let j = 0; j < n; j++) vec[j] /= norm;
      }
      // Rayleigh quotient vᵀTv (v has unit norm).
      let rq = d[0] * vec[0] * vec[0];
      for (let j = 1; j < n; j++) rq += d[j] * vec[j] * vec[j] + 2 * e[j - 1] * vec[j - 1] * vec[j];
      const beta2 = Math.abs(rq - shift) <= 2 * tol ? rq : shift;
      // ψ = φ/√r; ∫ψ² r dr ≈ Σ φ² h = h (φ has unit 2-norm), so divide by √h.
      const field = new Float64Array(n);
      const scale = 1 / Math.sqrt(h);
      // Sign convention: ψ > 0 near the axis side of the first lobe, so pictures are comparable.
      let sign = 0;
      for (let j = 0; j < n && sign === 0; j++) if (Math.abs(vec[j]) > 1e-6) sign = Math.sign(vec[j]);
      for (let j = 0; j < n; j++) field[j] = (sign * scale * vec[j]) / Math.sqrt(r[j]);
      const m = mIndex + 1;
      const bValue = Math.min(1, Math.max(0, (beta2 - lower) / (upper - lower)));
      const beta = Math.sqrt(beta2);
      modes.push({ l, m, betaPerUm: beta, effectiveIndex: beta / k, b: bValue, degeneracy: l === 0 ? 2 : 4, principal: 2 * m + l - 1, field });
    }
  }
  modes.sort((x, y) => y.b - x.b);
  const totalModeCount = modes.reduce((s, md) => s + md.degeneracy, 0);
  return { profile, wavelengthNm: lambdaNm, v, rUm: r, stepUm: h, modes, totalModeCount };
}
