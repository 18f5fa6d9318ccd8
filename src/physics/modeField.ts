// Mode fields of the weakly guiding step-index fiber and the mode field diameter (MFD) of LP01.
// Three definitions: Petermann II (the one ITU-T G.650.1 uses), the best-fit Gaussian, and
// Marcuse's closed-form fit of that Gaussian.
import { BESSEL_MAX_ORDER, besselJPairUnchecked, besselK01ScaledUnchecked, besselKLogScaledUnchecked } from './bessel';
import { InputError, ModelError, requireInteger, requireNumber, requirePositive } from './errors';
import { vNumber } from './fiber';
import { LP11_CUTOFF_V, LP_MAX_V, LP_MIN_V, solveLpMode, type LPMode } from './lpModes';
import { compositeRule } from './quadrature';
import { brentRoot } from './roots';

/** Largest radius accepted by the field functions, in core radii. */
export const FIELD_MAX_R_OVER_A = 1000;
/** Marcuse 1977's fit is stated accurate to 1 % for 1.2 < V < 2.4 (range as we recall it from the paper). */
export const MARCUSE_MIN_V = 1.2;
export const MARCUSE_MAX_V = 2.4;
/** Marcuse 1977, BSTJ 56(5): w/a = 0.65 + 1.619 V^-3/2 + 2.879 V^-6. */
const MARCUSE_A = 0.65;
const MARCUSE_B = 1.619;
const MARCUSE_C = 2.879;

export type MfdDefinition = 'petermann2' | 'gaussian' | 'marcuse';
export const MFD_DEFINITIONS: readonly MfdDefinition[] = ['petermann2', 'gaussian', 'marcuse'];

/** Below this w, K_l(w) for l ≥ 1 is near or beyond the float64 range (K_1(w) ≈ 1/w). */
const TINY_W = 1e-300;
/** |J_l(u)| below this makes the field (and its square) overflow: u is then at a zero of J_l. */
const MIN_EDGE_AMPLITUDE = 1e-150;

function requireMode(mode: unknown): LPMode {
  const m = mode as LPMode;
  if (typeof m !== 'object' || m === null) throw new InputError('mode', mode, 'an LP mode from lpModes or solveLpMode');
  requireInteger('mode.l', m.l, 0, BESSEL_MAX_ORDER);
  // A guided mode has u, w < V ≤ LP_MAX_V. Unbounded u made Miller's recurrence run ~u steps (u = 1e308: forever).
  requirePositive('mode.u', m.u, { max: LP_MAX_V });
  requireNumber('mode.w', m.w, { min: 0, max: LP_MAX_V });
  // At a zero of J_l the field J_l(u r/a)/J_l(u) is unbounded: no guided mode sits there (u < j_{l,m}).
  if (!(Math.abs(besselJPairUnchecked(m.l, m.u)[0]) > MIN_EDGE_AMPLITUDE)) {
    throw new ModelError(`u = ${m.u} is at a zero of J_${m.l}: this is not a guided LP mode.`, 'Gloge 1971 LP modes', 'use a mode from lpModes or solveLpMode');
  }
  return m;
}

/**
 * Scalar radial amplitude of an LP_lm mode, continuous and equal to 1 at the core boundary:
 * J_l(u r/a)/J_l(u) inside, K_l(w r/a)/K_l(w) outside (Gloge 1971, field of the LP modes).
 * The azimuthal factor cos(lφ) is left to the caller.
 */
export function lpFieldAt(mode: LPMode, rOverA: number): number {
  const { l, u, w } = requireMode(mode);
  const rho = requireNumber('rOverA', rOverA, { min: 0, max: FIELD_MAX_R_OVER_A, hint: (x) => (x < 0 ? 'a radius is ≥ 0' : undefined) });
  return radialFieldUnchecked(l, u, w)(rho);
}

/** F(ρ) of one mode at many radii: the Bessel values at the core boundary, shared by every radius, taken once. */
function radialFieldUnchecked(l: number, u: number, w: number): (rho: number) => number {
  const jAtCore = besselJPairUnchecked(l, u)[0];
  // The w → 0 limit of K_l(wρ)/K_l(w); for l ≥ 1 also below 1e-300, where K_l(w) ≈ (l−1)! 2^(l−1) w^−l overflows
  // (relative error of the limit ~w², nil) and a subnormal w gave NaN.
  const wLimit = w === 0 || (l >= 1 && w < TINY_W);
  const kLogAtCore = wLimit ? 0 : besselKLogScaledUnchecked(l, w);
  return (rho) => {
    if (rho <= 1) return besselJPairUnchecked(l, u * rho)[0] / jAtCore;
    if (wLimit) return l === 0 ? 1 : Math.pow(rho, -l);
    return Math.exp(besselKLogScaledUnchecked(l, w * rho) - kLogAtCore - w * (rho - 1));
  };
}

/**
 * Intensity |ψ|² of LP_lm over a square of side 2·extentOverA core radii, centred on the axis,
 * on a cells × cells grid (row-major, top row first, y up), normalized to a maximum of 1:
 * ψ = F(r) cos(lφ) with F from lpFieldAt (the even member of the cos/sin pair).
 */
export function lpIntensityGrid(mode: LPMode, cells: number, extentOverA: number): number[] {
  const { l, u, w } = requireMode(mode);
  const n = requireInteger('cells', cells, 2, 400);
  const extent = requirePositive('extentOverA', extentOverA, { max: 100 });
  const field = radialFieldUnchecked(l, u, w);
  // The samples sit symmetrically about both axes: column k and column n−1−k are the same distance from
  // the axis, and so are rows. F(r) depends on that pair of distances alone, whichever is the row, so it is
  // computed once per pair (about n²/8 Bessel evaluations, not n²); the angle still varies per sample.
  const half = Math.ceil(n / 2);
  const fromEdge = (k: number) => Math.min(k, n - 1 - k);
  const fieldByDistances = new Float64Array(half * half).fill(Number.NaN);
  const values: number[] = new Array(n * n);
  let max = 0;
  for (let row = 0; row < n; row++) {
    const y = extent * (1 - (2 * (row + 0.5)) / n);
    const dy = fromEdge(row);
    for (let col = 0; col < n; col++) {
      const x = extent * ((2 * (col + 0.5)) / n - 1);
      const dx = fromEdge(col);
      const slot = dx < dy ? dx * half + dy : dy * half + dx;
      let f = fieldByDistances[slot]!;
      if (Number.isNaN(f)) f = fieldByDistances[slot] = field(Math.hypot(x, y));
      const amplitude = f * (l === 0 ? 1 : Math.cos(l * Math.atan2(y, x)));
      const intensity = amplitude * amplitude;
      values[row * n + col] = intensity;
      if (intensity > max) max = intensity;
    }
  }
  if (max > 0) for (let i = 0; i < values.length; i++) values[i] /= max;
  return values;
}

/**
 * Sampled LP01 radial field E(r)/E(0) at V = v, inside and outside the core, for plots.
 * Defaults: 241 samples from r = 0 to 3a.
 */
export function lp01Field(v: number, opts: { samples?: number; rMaxOverA?: number } = {}): { rOverA: number[]; field: number[] } {
  const samples = requireInteger('samples', opts.samples ?? 241, 2, 100000);
  const rMax = requirePositive('rMaxOverA', opts.rMaxOverA ?? 3, { max: FIELD_MAX_R_OVER_A });
  const { u, w } = solveLpMode(0, 1, v);
  const centre = besselJPairUnchecked(0, u)[0]; // E(0) = 1/J_0(u) relative to E(a) = 1
  const fieldAt = radialFieldUnchecked(0, u, w);
  const rOverA: number[] = [];
  const field: number[] = [];
  for (let i = 0; i < samples; i++) {
    const rho = (rMax * i) / (samples - 1);
    rOverA.push(rho);
    field.push(centre * fieldAt(rho));
  }
  return { rOverA, field };
}

/**
 * Petermann II spot size w_p/a of LP01 from the exact field, in closed form:
 * w_p² = 2 ∫E² r dr / ∫(dE/dr)² r dr (ITU-T G.650.1, definition of MFD = 2 w_p; Petermann 1983),
 * with both integrals done analytically by Lommel's integral ∫ t Z_n² dt = (t²/2)(Z_n² − Z_{n−1}Z_{n+1})
 * (Watson 1944, §5.11) inside (J) and outside (K). Accuracy ≈ 1e-14 relative.
 */
export function petermann2SpotRatio(v: number): number {
  const { u, w } = solveLpMode(0, 1, v);
  const [j0, j1] = besselJPairUnchecked(0, u);
  const j2 = (2 / u) * j1 - j0;
  const [k0, k1] = besselK01ScaledUnchecked(w);
  const r1 = k1 / k0; // K_1/K_0
  const r2 = 1 + (2 / w) * r1; // K_2/K_0 (A&S 9.6.26)
  const power = j1 * j1 + j0 * j0 * r1 * r1; // 2 ∫E² ρ dρ with E(a) = J_0(u)
  const slope = u * u * (j1 * j1 - j0 * j2) + w * w * j0 * j0 * (r2 - r1 * r1); // 2 ∫E'² ρ dρ
  return Math.sqrt((2 * power) / slope);
}

/** Marcuse's spot-size fit w/a = 0.65 + 1.619 V^-1.5 + 2.879 V^-6 (Marcuse 1977, BSTJ 56(5); ±1 % for 1.2 < V < 2.4). */
export function marcuseSpotRatio(v: number): number {
  requireNumber('v', v, { min: LP_MIN_V, max: LP_MAX_V, hint: 'the same V range as the exact LP01 solution' });
  return MARCUSE_A + MARCUSE_B * Math.pow(v, -1.5) + MARCUSE_C * Math.pow(v, -6);
}

const POINTS_PER_PANEL = 16;
const CORE_PANELS = 4;
/** Outside the core the field falls like e^{−w(ρ−1)}: integrate to ρ − 1 = 50/w (e^-50 ≈ 2e-22). */
const CLADDING_DECAY_LENGTHS = 50;
/** Geometric panels in the cladding, from (50/w)·2^-12 to 50/w, resolve both the K decay and the Gaussian. */
const CLADDING_PANEL_HALVINGS = 12;

interface SampledField {
  rho: Float64Array;
  weight: Float64Array; // quadrature weight × ρ
  field: Float64Array;
  power: number; // ∫E² ρ dρ
}

function sampleLp01(v: number): SampledField & { mode: LPMode } {
  const mode = solveLpMode(0, 1, v);
  const { u, w } = mode;
  const breaks: number[] = [];
  for (let i = 0; i <= CORE_PANELS; i++) breaks.push(i / CORE_PANELS);
  const reach = CLADDING_DECAY_LENGTHS / Math.max(w, 1e-300);
  for (let k = CLADDING_PANEL_HALVINGS; k >= 0; k--) breaks.push(1 + reach * Math.pow(2, -k));
  const { x, w: qw } = compositeRule(breaks, POINTS_PER_PANEL);
  const field = new Float64Array(x.length);
  const weight = new Float64Array(x.length);
  let power = 0;
  const centre = besselJPairUnchecked(0, u)[0];
  const fieldAt = radialFieldUnchecked(0, u, w);
  for (let i = 0; i < x.length; i++) {
    field[i] = centre * fieldAt(x[i]);
    weight[i] = qw[i] * x[i];
    power += weight[i] * field[i] * field[i];
  }
  return { rho: x, weight, field, power, mode };
}

/**
 * Best-fit Gaussian spot size w0/a of LP01 and its power overlap η with the exact field
 * (the Gaussian approximation of Marcuse 1977): w0 maximizes η(s) = (∫E e^{−ρ²/s²} ρ dρ)² / (∫E² ρ dρ · s²/4).
 * dη/ds = 0 ⇔ ∫E e^{−ρ²/s²}(2ρ²/s² − 1) ρ dρ = 0, solved by Brent's method; the integrals by
 * composite Gauss–Legendre (64 nodes in the core, 208 on geometric panels in the cladding):
 * w0 to about 1e-12 relative.
 */
export function gaussianFitLp01(v: number): { spotRatio: number; overlap: number } {
  const sampled = sampleLp01(v);
  const { rho, weight, field } = sampled;
  const stationarity = (s: number) => {
    let sum = 0;
    for (let i = 0; i < rho.length; i++) {
      const t = (rho[i] * rho[i]) / (s * s);
      sum += weight[i] * field[i] * Math.exp(-t) * (2 * t - 1);
    }
    return sum;
  };
  const guess = marcuseSpotRatio(v);
  let lo = guess / 2;
  let hi = guess * 2;
  while (stationarity(lo) <= 0) lo /= 2;
  while (stationarity(hi) >= 0) hi *= 2;
  const s = brentRoot(stationarity, lo, hi);
  let overlapIntegral = 0;
  for (let i = 0; i < rho.length; i++) overlapIntegral += weight[i] * field[i] * Math.exp(-(rho[i] * rho[i]) / (s * s));
  const overlap = (overlapIntegral * overlapIntegral) / (sampled.power * ((s * s) / 4));
  return { spotRatio: s, overlap };
}

export interface ModeFieldDiameter {
  mfdUm: number;
  definition: MfdDefinition;
  v: number;
  /** Set when the result is outside the range where its definition or formula holds. */
  validity?: string;
  /** Gaussian definition only: power overlap of the best-fit Gaussian with the exact field (1 = perfect). */
  overlap?: number;
}

/**
 * Mode field diameter of LP01 at a wavelength, by one of three definitions:
 * 'petermann2' (ITU-T G.650.1), 'gaussian' (best-fit Gaussian), 'marcuse' (Marcuse 1977 closed form).
 */
export function modeFieldDiameterUm(input: {
  coreRadiusUm: number;
  na: number;
  wavelengthNm: number;
  definition: MfdDefinition;
}): ModeFieldDiameter {
  const definition = input?.definition;
  if (!MFD_DEFINITIONS.includes(definition)) {
    throw new InputError('definition', definition, `one of ${MFD_DEFINITIONS.join(', ')}`);
  }
  const v = vNumber(input);
  const a = input.coreRadiusUm;
  const notes: string[] = [];
  if (v > LP11_CUTOFF_V) {
    notes.push(`V = ${v.toFixed(3)} is above the LP11 cutoff (2.405): the fiber is not single-mode here, and this MFD describes LP01 only.`);
  }
  let spot: number;
  let overlap: number | undefined;
  if (definition === 'petermann2') spot = petermann2SpotRatio(v);
  else if (definition === 'gaussian') ({ spotRatio: spot, overlap } = gaussianFitLp01(v));
  else {
    solveLpMode(0, 1, v); // same V range as the exact definitions
    spot = marcuseSpotRatio(v);
    if (v < MARCUSE_MIN_V || v > MARCUSE_MAX_V) {
      notes.push(`Marcuse's formula is stated accurate to 1 % only for ${MARCUSE_MIN_V} < V < ${MARCUSE_MAX_V}; here V = ${v.toFixed(3)}, so use the exact Gaussian fit or Petermann II.`);
    }
  }
  const result: ModeFieldDiameter = { mfdUm: 2 * a * spot, definition, v };
  if (overlap !== undefined) result.overlap = overlap;
  if (notes.length) result.validity = notes.join(' ');
  return result;
}
