// Power coupled between fibers by overlap integrals of their actual mode fields (scalar, weakly guiding).
// η = |∫∫ E1 E2* dA|² / (∫∫|E1|² dA ∫∫|E2|² dA) (Snyder & Love 1983, ch. 20; Marcuse 1977 for the Gaussian case).
//
// A single-mode field f(ρ) centred at lateral offset d (along x) from a multimode axis is written in the
// multimode fiber's polar coordinates; its azimuthal cosine coefficients
//   F_l(r) = ∫₀^{2π} f(√(r² + d² − 2 r d cos φ)) cos(lφ) dφ
// give the overlap with the cos(lφ) orientation of each LP_lm mode. The sin(lφ) orientation overlaps zero
// (the integrand is odd in φ), so an offset in any direction couples to one orientation per LP mode. F_l is
// computed by the trapezoid rule in φ, which is spectrally accurate for smooth periodic integrands
// (Trefethen & Weideman 2014, SIAM Review 56(3)); for a Gaussian f it equals 2π e^{−(r²+d²)/w²} I_l(2rd/w²).
import { InputError, ModelError, requireInteger, requireNumber, requirePositive, requireWavelengthNm } from './errors';
import { vNumber } from './fiber';
import { DB_PER_NEPER, lateralOffsetLossDb, MFD_MIN_UM, mfdMismatchLossDb } from './jointLoss';
import { lpModes, solveLpMode } from './lpModes';
import { lpFieldAt, modeFieldDiameterUm } from './modeField';
import { gradedIndexProfile, solveRadialModes, stepIndexProfile, type RadialSolverOptions } from './radialSolver';

/** A circularly symmetric field amplitude f(ρ), ρ in µm, with the radius beyond which it is negligible. */
export interface RadialField {
  /** Short description, e.g. "Gaussian, MFD 9.2 µm". */
  name: string;
  at: (rhoUm: number) => number;
  /** f(ρ)² < 1e-16 f(0)² beyond this radius (µm). */
  extentUm: number;
  /** ∫∫ f² dA = 2π ∫ f(ρ)² ρ dρ (µm²). */
  powerUm2: number;
  /**
   * Wavelength the field belongs to (nm). A mode field depends on it, so a field is only ever overlapped with
   * fields and modes of the same wavelength: anything else is refused with a ModelError.
   */
  wavelengthNm: number;
}

/**
 * Two wavelengths closer than this (nm) count as the same: they differ only by rounding of a converted entry
 * (1.55 µm typed is 1550.0000000000002 nm). Any real difference changes the fields far more.
 */
export const SAME_WAVELENGTH_TOLERANCE_NM = 1e-6;

/** ModelError unless the two wavelengths agree: overlapping a field of one wavelength with modes of another is meaningless. */
function requireSameWavelength(what: string, aNm: number, bNm: number): void {
  if (!(Math.abs(aNm - bNm) <= SAME_WAVELENGTH_TOLERANCE_NM)) {
    throw new ModelError(
      `${what}: the single-mode field was computed for ${aNm} nm and the other for ${bNm} nm; an overlap needs both at one wavelength.`,
      'overlap integral',
      `compute both at the same wavelength`,
    );
  }
}

/** Gaussian amplitude exp(−ρ²/w²), w = MFD/2 (Marcuse 1977); `wavelengthNm` is the wavelength that MFD belongs to. */
export function gaussianRadialField(mfdUm: number, wavelengthNm: number): RadialField {
  // MFD ≥ 0.1 µm as for the Gaussian joint formulas: a subnormal MFD gave w = 0 and a zero-size field.
  const w = requireNumber('mfdUm', mfdUm, { min: MFD_MIN_UM, max: 100, unit: 'µm' }) / 2;
  const lambda = requireWavelengthNm('wavelengthNm', wavelengthNm);
  // exp(−2ρ²/w²) < 1e-16 for ρ > w √(8 ln 10 · 2)/2 ≈ 4.3 w.
  const extentUm = w * Math.sqrt(8 * Math.LN10);
  return { name: `Gaussian, MFD ${mfdUm} µm`, at: (rho) => Math.exp(-(rho * rho) / (w * w)), extentUm, powerUm2: (Math.PI * w * w) / 2, wavelengthNm: lambda };
}

/**
 * A tabulated field on a uniform grid ρ_i = i·stepUm (linear interpolation, zero beyond the table), measured or
 * computed at `wavelengthNm`. Power by the trapezoid rule on the same table.
 */
export function tabulatedRadialField(name: string, stepUm: number, values: ArrayLike<number>, wavelengthNm: number): RadialField {
  const h = requirePositive('stepUm', stepUm, { max: MAX_TABLE_STEP_UM, unit: 'µm' });
  const lambda = requireWavelengthNm('wavelengthNm', wavelengthNm);
  if (values === null || typeof values !== 'object' || typeof values.length !== 'number') throw new InputError('values', values, 'a list of field samples');
  const n = values.length;
  if (n < 3 || n > MAX_TABLE_SAMPLES) throw new InputError('values', n, `from 3 to ${MAX_TABLE_SAMPLES} samples`);
  // A loop, not Math.max(...values): spreading 200 000 samples overflowed the call stack (RangeError).
  let peak = 0;
  for (let i = 0; i < n; i++) peak = Math.max(peak, Math.abs(requireNumber(`values[${i}]`, values[i], { min: -MAX_TABLE_VALUE, max: MAX_TABLE_VALUE })));
  if (!(peak > 0)) throw new InputError('values', 'all zero', 'a field that is not zero everywhere');
  let last = n - 1;
  while (last > 1 && values[last] * values[last] < 1e-16 * peak * peak) last--;
  let power = 0;
  for (let i = 1; i < n; i++) {
    const a = values[i - 1] * values[i - 1] * (i - 1) * h;
    const b = values[i] * values[i] * i * h;
    power += 0.5 * (a + b) * h;
  }
  if (!(power > 0) || !Number.isFinite(power)) throw new InputError('values', `power ${power}`, 'a field with a finite, non-zero power', 'the samples are too small or too large');
  const table = Float64Array.from(values);
  return {
    name: typeof name === 'string' ? name : 'tabulated field',
    wavelengthNm: lambda,
    extentUm: Math.min((n - 1) * h, (last + 1) * h),
    powerUm2: 2 * Math.PI * power,
    at: (rho) => {
      const x = rho / h;
      const i = Math.floor(x);
      if (i >= n - 1) return 0;
      const t = x - i;
      return table[i] * (1 - t) + table[i + 1] * t;
    },
  };
}

/** Limits of a tabulated field: far beyond any fiber field, small enough that f² and ∫f² r dr stay finite. */
const MAX_TABLE_STEP_UM = 100;
const MAX_TABLE_SAMPLES = 1_000_000;
const MAX_TABLE_VALUE = 1e100;

/** Checks that `f` is a field made by gaussianRadialField, tabulatedRadialField or lp01RadialField. */
function requireRadialField(argument: string, f: unknown): RadialField {
  const field = f as RadialField;
  if (field === null || typeof field !== 'object' || typeof field.at !== 'function') throw new InputError(argument, f, 'a radial field (gaussianRadialField, tabulatedRadialField or lp01RadialField)');
  requirePositive(`${argument}.extentUm`, field.extentUm, { max: 1e6, unit: 'µm' });
  requirePositive(`${argument}.powerUm2`, field.powerUm2);
  requireWavelengthNm(`${argument}.wavelengthNm`, field.wavelengthNm);
  return field;
}

/** Checks that `set` is a mode set from multimodeModes: a grid and one field per mode on it. */
function requireModeSet(set: unknown): MultimodeModeSet {
  const s = set as MultimodeModeSet;
  if (s === null || typeof s !== 'object' || !ArrayBuffer.isView(s.rUm) || !Array.isArray(s.modes)) throw new InputError('modes', set, 'a mode set from multimodeModes');
  requirePositive('modes.stepUm', s.stepUm, { unit: 'µm' });
  requireWavelengthNm('modes.wavelengthNm', s.wavelengthNm);
  for (const m of s.modes) {
    if (!m || !ArrayBuffer.isView(m.field) || m.field.length !== s.rUm.length || !Number.isInteger(m.l) || m.l < 0 || m.l > MAX_AZIMUTHAL_ORDER) {
      throw new InputError('modes.modes', m, 'modes sampled on the set’s own grid, as multimodeModes returns them');
    }
  }
  return s;
}

/** Multimode fiber described for the launch calculation. */
export interface MultimodeFiberSpec {
  profile: 'step' | 'graded';
  coreRadiusUm: number;
  na: number;
  /** Graded-index α (default 2). Ignored for a step. */
  alpha?: number;
  claddingIndex?: number;
}

export interface MultimodeModeSet {
  /** Wavelength the modes were solved for (nm): a field of another wavelength is refused with a ModelError. */
  wavelengthNm: number;
  /** Cell-centred radii (µm) on which every field is sampled. */
  rUm: Float64Array;
  stepUm: number;
  v: number;
  modes: { l: number; m: number; b: number; principal: number; degeneracy: 2 | 4; field: Float64Array }[];
  totalModeCount: number;
  /** How the modes were obtained, for "how computed". */
  method: string;
}

export interface MultimodeOptions extends RadialSolverOptions {
  /**
   * 'auto' (default): a step profile uses the Bessel-function LP modes (Gloge 1971, the project's mode engine), a graded
   * profile the finite-difference solver. 'finite-difference' forces the solver for both (for cross-checks).
   */
  method?: 'auto' | 'finite-difference';
}

/**
 * Largest V for the exact step-index path (time guard): sampling and orthonormalising every LP mode costs about
 * V^2.6; measured on a 2-core test machine 1.0 s at V = 65, 3.2 s at V = 98 and 17 s at V = 163. V = 65 keeps a
 * 62.5 µm, NA 0.275 step core at 850 nm (V = 63.5).
 */
export const MAX_EXACT_STEP_V = 65;

/** Guided modes of a multimode fiber on a common radial grid, each with ∫ψ² r dr = 1 on that grid. */
export function multimodeModes(fiber: MultimodeFiberSpec, wavelengthNm: number, options: MultimodeOptions = {}): MultimodeModeSet {
  if (!fiber || (fiber.profile !== 'step' && fiber.profile !== 'graded')) {
    throw new InputError('fiber.profile', fiber?.profile, "'step' or 'graded'");
  }
  const profile =
    fiber.profile === 'graded'
      ? gradedIndexProfile({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, alpha: fiber.alpha ?? 2, claddingIndex: fiber.claddingIndex })
      : stepIndexProfile({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, claddingIndex: fiber.claddingIndex });
  // The solver is asked for at most l = 0 when only its grid is wanted (the Bessel path below).
  const exactStep = fiber.profile === 'step' && (options?.method ?? 'auto') === 'auto';
  if (exactStep) {
    const v = vNumber({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm });
    if (v > MAX_EXACT_STEP_V) {
      throw new ModelError(
        `V = ${v.toFixed(1)} is above ${MAX_EXACT_STEP_V}, the largest step-index fiber whose exact modes are computed here (seconds of work beyond).`,
        'exact LP modes on the solver grid',
        'use a smaller core or NA, or a longer wavelength',
      );
    }
  }
  const s = solveRadialModes(profile, wavelengthNm, exactStep ? { ...options, maxL: 0 } : options);
  if (!exactStep) {
    return {
      wavelengthNm,
      rUm: s.rUm,
      stepUm: s.stepUm,
      v: s.v,
      modes: s.modes.map((m) => ({ l: m.l, m: m.m, b: m.b, principal: m.principal, degeneracy: m.degeneracy, field: m.field })),
      totalModeCount: s.totalModeCount,
      method: `${profile.name} profile, scalar finite-difference mode solver (${s.rUm.length} radial cells)`,
    };
  }
  // Step: exact LP modes J_l(u r/a)/J_l(u), K_l(w r/a)/K_l(w) sampled on the solver's grid. Sampled modes are
  // orthogonal on the grid only to the quadrature error (~1e-4); modes of one l are orthonormalised there by
  // modified Gram–Schmidt (Golub & Van Loan 2013, §5.2.8), b descending, which moves each by that much and makes
  // the summed overlaps obey Bessel's inequality to rounding: power can never come out above 1.
  const a = fiber.coreRadiusUm;
  const lp = lpModes(vNumber({ coreRadiusUm: a, na: fiber.na, wavelengthNm }));
  const n = s.rUm.length;
  const dot = (x: Float64Array, y: Float64Array) => {
    let acc = 0;
    for (let j = 0; j < n; j++) acc += x[j] * y[j] * s.rUm[j];
    return acc * s.stepUm;
  };
  const byL = new Map<number, Float64Array[]>();
  const modes = lp.map((mode) => {
    const field = new Float64Array(n);
    for (let j = 0; j < n; j++) field[j] = lpFieldAt(mode, s.rUm[j] / a);
    const earlier = byL.get(mode.l) ?? [];
    for (const q of earlier) {
      const c = dot(field, q);
      for (let j = 0; j < n; j++) field[j] -= c * q[j];
    }
    const scale = 1 / Math.sqrt(dot(field, field));
    for (let j = 0; j < n; j++) field[j] *= scale;
    earlier.push(field);
    byL.set(mode.l, earlier);
    return { l: mode.l, m: mode.m, b: mode.b, principal: 2 * mode.m + mode.l - 1, degeneracy: mode.degeneracy, field };
  });
  return {
    wavelengthNm,
    rUm: s.rUm,
    stepUm: s.stepUm,
    v: s.v,
    modes,
    totalModeCount: modes.reduce((n, m) => n + m.degeneracy, 0),
    method: `step-index LP modes from the Bessel-function solution (Gloge 1971), sampled on ${s.rUm.length} radial cells`,
  };
}

/** Highest azimuthal order asked of azimuthalCoefficients: above any guided l at V ≤ MAX_SOLVER_V (l < V). */
const MAX_AZIMUTHAL_ORDER = 200;
/** Most radii: the solver's own grid is at most 6000 cells; fieldOverlapLoss uses up to MAX_OVERLAP_CELLS. */
const MAX_AZIMUTHAL_RADII = 50_000;

/** Fewest azimuthal samples on [0, π]. */
const MIN_PHI_SAMPLES = 32;
/** Most azimuthal samples on [0, π] (cost guard). */
const MAX_PHI_SAMPLES = 4096;
/** Samples per spot radius along the arc where the field varies fastest (trapezoid converges long before). */
const PHI_SAMPLES_PER_SPOT = 12;

export interface AzimuthalCoefficients {
  /** F_l(r_j), l = 0..lMax. */
  coefficients: Float64Array[];
  /** G(r_j) = ∫₀^{2π} f² dφ with the same rule: Σ_j G_j r_j h is the field's power on this grid. */
  ringPower: Float64Array;
}

/**
 * F_l(r_j) for l = 0..lMax: azimuthal cosine coefficients of f centred at offset d.
 * Trapezoid on the full circle, folded onto [0, π] by symmetry (end points weighted ½).
 */
export function azimuthalCoefficients(f: RadialField, rUm: ArrayLike<number>, offsetUm: number, lMax: number): AzimuthalCoefficients {
  requireRadialField('f', f);
  if (rUm === null || typeof rUm !== 'object' || typeof rUm.length !== 'number' || rUm.length > MAX_AZIMUTHAL_RADII) {
    throw new InputError('rUm', rUm, `a list of at most ${MAX_AZIMUTHAL_RADII} radii`);
  }
  for (let j = 0; j < rUm.length; j++) requireNumber(`rUm[${j}]`, rUm[j], { min: 0, max: 1e6, unit: 'µm' });
  // Unchecked, a NaN offset threw RangeError (array length NaN) and lMax = 1e9 ran for ever.
  requireNumber('offsetUm', offsetUm, { min: 0, max: MAX_LAUNCH_OFFSET_UM, unit: 'µm' });
  requireInteger('lMax', lMax, 0, MAX_AZIMUTHAL_ORDER);
  const nr = rUm.length;
  const out: Float64Array[] = [];
  for (let l = 0; l <= lMax; l++) out.push(new Float64Array(nr));
  const ringPower = new Float64Array(nr);
  if (offsetUm === 0) {
    for (let j = 0; j < nr; j++) {
      const fv = f.at(rUm[j]);
      out[0][j] = 2 * Math.PI * fv;
      ringPower[j] = 2 * Math.PI * fv * fv;
    }
    return { coefficients: out, ringPower };
  }
  const d = offsetUm;
  // Near φ = 0 the distance grows like √((r−d)² + r d φ²): the arc scale is spot/√(r d).
  const spot = f.extentUm / 4;
  const rFar = d + f.extentUm;
  const nPhi = Math.min(MAX_PHI_SAMPLES, Math.max(MIN_PHI_SAMPLES, 4 * (lMax + 1), Math.ceil((PHI_SAMPLES_PER_SPOT * Math.PI * Math.sqrt(rFar * d)) / spot)));
  const dPhi = Math.PI / nPhi;
  const cosPhi = new Float64Array(nPhi + 1);
  for (let i = 0; i <= nPhi; i++) cosPhi[i] = Math.cos(i * dPhi);
  // cos(lφ_i) table, row-major by i.
  const cosTable = new Float64Array((nPhi + 1) * (lMax + 1));
  for (let i = 0; i <= nPhi; i++) for (let l = 0; l <= lMax; l++) cosTable[i * (lMax + 1) + l] = Math.cos(l * i * dPhi);
  const acc = new Float64Array(lMax + 1);
  for (let j = 0; j < nr; j++) {
    const r = rUm[j];
    if (Math.abs(r - d) > f.extentUm) continue; // f is negligible on the whole circle
    acc.fill(0);
    let acc2 = 0;
    const r2d2 = r * r + d * d;
    const twoRd = 2 * r * d;
    for (let i = 0; i <= nPhi; i++) {
      const rho2 = r2d2 - twoRd * cosPhi[i];
      const fv = f.at(Math.sqrt(rho2 > 0 ? rho2 : 0));
      if (fv === 0) continue;
      const wgt = (i === 0 || i === nPhi ? 0.5 : 1) * fv;
      acc2 += wgt * fv;
      const base = i * (lMax + 1);
      for (let l = 0; l <= lMax; l++) acc[l] += wgt * cosTable[base + l];
    }
    for (let l = 0; l <= lMax; l++) out[l][j] = 2 * dPhi * acc[l];
    ringPower[j] = 2 * dPhi * acc2;
  }
  return { coefficients: out, ringPower };
}

export interface ModeCoupling {
  l: number;
  m: number;
  principal: number;
  degeneracy: 2 | 4;
  b: number;
  /** Fraction of the single-mode power in this LP mode (both orientations; the sin one is zero). */
  fraction: number;
}

export interface LaunchResult {
  direction: 'single-mode to multimode' | 'multimode to single-mode';
  /** Fraction of the launched power that ends up guided in the receiving fiber, 0..1. */
  coupledFraction: number;
  lossDb: number;
  /** Per LP mode of the multimode fiber, b descending. SM→MM: power launched into it; MM→SM: its share of what reaches the SM fiber. */
  perMode: ModeCoupling[];
  /** Sum of perMode fractions by principal mode number g = 2m + l − 1 (ascending g). */
  perGroup: { principal: number; fraction: number; modeCount: number }[];
  /** Fewest LP modes that together carry 90 % of the coupled power. */
  modesFor90Percent: number;
  multimodeV: number;
  /** Every guided mode of the multimode fiber, polarisations and orientations counted. */
  multimodeModeCount: number;
  method: string;
}

/** Share of the coupled power used for the "modes carrying 90 %" count. */
export const POWER_SHARE_FOR_MODE_COUNT = 0.9;

function overlapFractions(f: RadialField, set: MultimodeModeSet, offsetUm: number): number[] {
  requireRadialField('field', f);
  requireModeSet(set);
  requireSameWavelength('Launch between single-mode and multimode fibers', f.wavelengthNm, set.wavelengthNm);
  const lMax = set.modes.reduce((mx, m) => Math.max(mx, m.l), 0);
  const { coefficients: coeff, ringPower } = azimuthalCoefficients(f, set.rUm, offsetUm, lMax);
  // The field's power by the same quadrature as the overlaps: then the discrete modes, orthonormal on this
  // grid, obey Bessel's inequality exactly and the guided fractions can never sum above 1 by rounding of h.
  let power = 0;
  for (let j = 0; j < set.rUm.length; j++) power += ringPower[j] * set.rUm[j];
  power *= set.stepUm;
  if (!(power > 0)) throw new ModelError('The single-mode field lies entirely outside the multimode fiber’s grid.', 'overlap integral', 'reduce the offset');
  return set.modes.map((mode) => {
    const fl = coeff[mode.l];
    let s = 0;
    for (let j = 0; j < set.rUm.length; j++) s += mode.field[j] * fl[j] * set.rUm[j];
    s *= set.stepUm;
    // Unit-power transverse fields: ψ/√(2π) for l = 0, ψ cos(lφ)/√π for l ≥ 1.
    const c = mode.l === 0 ? s / Math.sqrt(2 * Math.PI) : s / Math.sqrt(Math.PI);
    return (c * c) / power;
  });
}

function summarise(direction: LaunchResult['direction'], set: MultimodeModeSet, weights: number[], coupledFraction: number, method: string): LaunchResult {
  const total = weights.reduce((s, x) => s + x, 0);
  const perMode: ModeCoupling[] = set.modes.map((m, i) => ({
    l: m.l,
    m: m.m,
    principal: m.principal,
    degeneracy: m.degeneracy,
    b: m.b,
    fraction: weights[i],
  }));
  const groups = new Map<number, { fraction: number; modeCount: number }>();
  for (const pm of perMode) {
    const g = groups.get(pm.principal) ?? { fraction: 0, modeCount: 0 };
    g.fraction += pm.fraction;
    g.modeCount += 1;
    groups.set(pm.principal, g);
  }
  const perGroup = [...groups.entries()].sort((a, b) => a[0] - b[0]).map(([principal, g]) => ({ principal, ...g }));
  const sorted = [...weights].sort((a, b) => b - a);
  let acc = 0;
  let modesFor90Percent = 0;
  for (const x of sorted) {
    if (acc >= POWER_SHARE_FOR_MODE_COUNT * total) break;
    acc += x;
    modesFor90Percent++;
  }
  const clamped = Math.min(1, Math.max(0, coupledFraction));
  if (!(clamped > 0)) {
    throw new ModelError('No power is coupled: the field lies outside the other fiber’s guided modes.', 'overlap integral', 'reduce the offset');
  }
  return {
    direction,
    coupledFraction: clamped,
    lossDb: Math.max(0, -DB_PER_NEPER * Math.log(clamped)),
    perMode,
    perGroup,
    modesFor90Percent,
    multimodeV: set.v,
    multimodeModeCount: set.totalModeCount,
    method,
  };
}

/** Radial cells for a single-mode overlap: 400 across the narrower field's extent (≈ 90 per spot radius). */
const OVERLAP_CELLS_PER_EXTENT = 400;
const OVERLAP_MIN_CELLS = 200;
/** Most cells of one overlap grid (time/memory guard): two fields up to 100× apart in size. */
const MAX_OVERLAP_CELLS = 40_000;

/** Allowed excess of the summed mode overlaps over 1 before the grid is called too coarse. */
const OVERLAP_SUM_SLACK = 1e-3;

/** Largest offset accepted (µm). */
export const MAX_LAUNCH_OFFSET_UM = 200;

/** Power from a single-mode field (centred, or offset by offsetUm) into each guided mode of a multimode fiber. */
export function singleModeToMultimode(input: { source: RadialField; modes: MultimodeModeSet; offsetUm?: number }): LaunchResult {
  const d = requireNumber('offsetUm', input?.offsetUm ?? 0, { min: 0, max: MAX_LAUNCH_OFFSET_UM, unit: 'µm' });
  const fr = overlapFractions(input?.source, input?.modes, d);
  const total = fr.reduce((s, x) => s + x, 0);
  // Discrete FD modes obey Bessel's inequality exactly; sampled Bessel modes are orthogonal on the grid only
  // to the quadrature error (~1e-5). More than that means the grid cannot resolve this field.
  if (total > 1 + OVERLAP_SUM_SLACK) throw new ModelError(`Overlap sum ${total} exceeds 1: the grid is too coarse for this field.`, 'overlap integral');
  return summarise('single-mode to multimode', input.modes, fr, total, `overlap of ${input.source.name} with each mode: ${input.modes.method}`);
}

/** How the multimode fiber's power is spread over its modes before the joint. */
export type ModePowerDistribution =
  | { kind: 'uniform' }
  /** Equal power in every mode of principal number g ≤ fraction × highest g, none in the rest. */
  | { kind: 'restricted'; groupFraction: number };

/**
 * Power from a multimode fiber with the given mode power distribution into a single-mode fiber.
 * Modes are mutually incoherent (a long multimode fiber scrambles their phases, common practice); each of the
 * M guided modes (orientations and polarisations counted) carries its share, and each polarisation couples into
 * the matching single-mode polarisation with the same spatial overlap η. So P = Σ p_mode η_mode; for a uniform
 * distribution P = (2/M) Σ_LP η = (2/M) × (SM→MM coupled fraction), by reciprocity.
 */
export function multimodeToSingleMode(input: { target: RadialField; modes: MultimodeModeSet; distribution: ModePowerDistribution; offsetUm?: number }): LaunchResult {
  const d = requireNumber('offsetUm', input?.offsetUm ?? 0, { min: 0, max: MAX_LAUNCH_OFFSET_UM, unit: 'µm' });
  const set = requireModeSet(input?.modes);
  const dist = input.distribution;
  const gMax = set.modes.reduce((mx, m) => Math.max(mx, m.principal), 1);
  let gLimit = gMax;
  if (dist?.kind === 'restricted') {
    const frac = requireNumber('groupFraction', dist.groupFraction, { min: 0, minInclusive: false, max: 1 });
    gLimit = Math.max(1, Math.floor(frac * gMax));
  } else if (dist?.kind !== 'uniform') {
    throw new InputError('distribution', dist, "{ kind: 'uniform' } or { kind: 'restricted', groupFraction }");
  }
  const lit = set.modes.map((m) => m.principal <= gLimit);
  const litCount = set.modes.reduce((s, m, i) => s + (lit[i] ? m.degeneracy : 0), 0);
  const eta = overlapFractions(input.target, set, d);
  // Each LP mode: degeneracy/litCount of the power; half its members are cos-oriented (l ≥ 1) or it is l = 0.
  // Only the cos orientation overlaps; each of its two polarisations brings η.
  const contributions = set.modes.map((m, i) => (lit[i] ? (2 * eta[i]) / litCount : 0));
  const total = contributions.reduce((s, x) => s + x, 0);
  const described = dist.kind === 'uniform' ? 'uniform over all modes' : `uniform over mode groups g ≤ ${gLimit} of ${gMax}`;
  return summarise('multimode to single-mode', set, contributions, total, `incoherent sum over modes (${described}); ${set.method}`);
}

/**
 * Exact overlap of two circularly symmetric single-mode fields with lateral offset (no gap, no tilt):
 * η = (∫∫ f1(r) f2(|r − d|) dA)² / (P1 P2) (Snyder & Love 1983, ch. 20). With LP01 fields this is the exact
 * scalar joint loss to set beside the Gaussian formulas of Marcuse 1977.
 */
export function fieldOverlapLoss(f1: RadialField, f2: RadialField, offsetUm: number): { fraction: number; lossDb: number } {
  const d = requireNumber('offsetUm', offsetUm, { min: 0, max: MAX_LAUNCH_OFFSET_UM, unit: 'µm' });
  requireRadialField('f1', f1);
  requireRadialField('f2', f2);
  requireSameWavelength('Overlap of two single-mode fields', f1.wavelengthNm, f2.wavelengthNm);
  // One midpoint grid, fine against the narrower field, out to where both fields vanish. The powers are
  // taken with the same rule as the overlap so that the quadrature error cancels (identical fields give 1).
  const extent = Math.max(f1.extentUm, f2.extentUm);
  const narrow = Math.min(f1.extentUm, f2.extentUm);
  const cells = Math.max(OVERLAP_MIN_CELLS, Math.ceil((OVERLAP_CELLS_PER_EXTENT * extent) / narrow));
  if (!(cells <= MAX_OVERLAP_CELLS)) {
    throw new ModelError(`The two fields differ in size by a factor ${(extent / narrow).toPrecision(3)}: too much for one overlap grid.`, 'overlap integral', `fields within a factor ${MAX_OVERLAP_CELLS / OVERLAP_CELLS_PER_EXTENT} of each other in size`);
  }
  const h = extent / cells;
  const r = new Float64Array(cells);
  for (let j = 0; j < cells; j++) r[j] = (j + 0.5) * h;
  const f2coeff = azimuthalCoefficients(f2, r, d, 0).coefficients[0];
  let s = 0;
  let p1 = 0;
  let p2 = 0;
  for (let j = 0; j < cells; j++) {
    const a = f1.at(r[j]);
    const b = f2.at(r[j]);
    s += a * f2coeff[j] * r[j];
    p1 += a * a * r[j];
    p2 += b * b * r[j];
  }
  s *= h;
  p1 *= 2 * Math.PI * h;
  p2 *= 2 * Math.PI * h;
  const fraction = Math.min(1, (s * s) / (p1 * p2));
  if (!(fraction > 0)) {
    throw new ModelError(`The two fields do not overlap at a ${d} µm offset: no power is coupled.`, 'overlap integral', 'reduce the offset');
  }
  return { fraction, lossDb: Math.max(0, -10 * Math.log10(fraction)) };
}

/** Single-mode fiber for the exact-field calculations: the (equivalent) step-index core. */
export interface StepFiber {
  coreRadiusUm: number;
  na: number;
}

/**
 * Table steps of the LP01 field: a/64 in the core, a/16 in the cladding (the tail e^{−w r/a} is smooth on the
 * scale a/w ≥ a/3). Catmull–Rom cubic interpolation: error ≈ h³|f‴|/… ≲ 3e-5 relative in the core; the
 * Petermann II small-offset check in tests/physics/couplingExact.test.ts holds to 0.5 %.
 */
const LP01_CORE_INTERVALS = 64;
const LP01_CLADDING_STEPS_PER_CORE_RADIUS = 16;
/**
 * The LP01 tail K0(w r/a)/K0(w) ≈ e^{−w(r/a − 1)}: its square is below 1e-12 of the value at the core edge by
 * r/a = 1 + 14/w, so the power left out is ~1e-12 of the total, far below any loss shown.
 */
const LP01_TAIL_E_FOLDS = 14;
/** Longest cladding table (cost guard for fields barely guided, V < 1). */
const LP01_MAX_CLADDING_SAMPLES = 20000;

/**
 * Catmull–Rom cubic through a uniform table (x in index units). Past the ends the neighbour is a ghost value:
 * the mirror image at r = 0 (the field is even in r) or a quadratic extrapolation 3t₀ − 3t₁ + t₂ at a joint,
 * so the slope stays right up to the table's edge.
 */
function cubicAt(t: Float64Array, x: number, mirrorAtStart: boolean): number {
  const n = t.length;
  const i = Math.floor(x);
  if (i >= n - 1) return x <= n - 1 ? t[n - 1] : 0;
  const u = x - i;
  const p0 = i > 0 ? t[i - 1] : mirrorAtStart ? t[1] : 3 * t[0] - 3 * t[1] + t[2];
  const p1 = t[i];
  const p2 = t[i + 1];
  const p3 = i + 2 < n ? t[i + 2] : 3 * t[n - 1] - 3 * t[n - 2] + t[n - 3];
  return p1 + 0.5 * u * (p2 - p0 + u * (2 * p0 - 5 * p1 + 4 * p2 - p3 + u * (3 * (p1 - p2) + p3 - p0)));
}

/** The exact scalar LP01 field J0(u r/a)/J0(u), K0(w r/a)/K0(w) of a step-index fiber (the project's mode engine), tabulated. */
export function lp01RadialField(fiber: StepFiber, wavelengthNm: number): RadialField {
  const v = vNumber({ coreRadiusUm: fiber?.coreRadiusUm, na: fiber?.na, wavelengthNm });
  const mode = solveLpMode(0, 1, v);
  const a = fiber.coreRadiusUm;
  const core = new Float64Array(LP01_CORE_INTERVALS + 1);
  for (let i = 0; i <= LP01_CORE_INTERVALS; i++) core[i] = lpFieldAt(mode, i / LP01_CORE_INTERVALS);
  const tailOverA = LP01_TAIL_E_FOLDS / Math.max(mode.w, 1e-3);
  const nClad = Math.min(LP01_MAX_CLADDING_SAMPLES, Math.ceil(tailOverA * LP01_CLADDING_STEPS_PER_CORE_RADIUS) + 1);
  const clad = new Float64Array(nClad);
  for (let i = 0; i < nClad; i++) clad[i] = lpFieldAt(mode, 1 + i / LP01_CLADDING_STEPS_PER_CORE_RADIUS);
  const h1 = a / LP01_CORE_INTERVALS;
  const h2 = a / LP01_CLADDING_STEPS_PER_CORE_RADIUS;
  const extentUm = a + (nClad - 1) * h2;
  const at = (rho: number) => (rho <= a ? cubicAt(core, rho / h1, true) : cubicAt(clad, (rho - a) / h2, false));
  // Power by the trapezoid rule on the two tables (informational: overlaps take powers on their own grid).
  let power = 0;
  for (let i = 1; i < core.length; i++) power += 0.5 * h1 * (core[i - 1] ** 2 * (i - 1) * h1 + core[i] ** 2 * i * h1);
  for (let i = 1; i < nClad; i++) power += 0.5 * h2 * (clad[i - 1] ** 2 * (a + (i - 1) * h2) + clad[i] ** 2 * (a + i * h2));
  return { name: `exact LP01, V = ${v.toFixed(3)}`, at, extentUm, powerUm2: 2 * Math.PI * power, wavelengthNm };
}

export interface JointComparison {
  /** Petermann II MFDs at the wavelength, used by the Gaussian formulas (µm). */
  mfd1Um: number;
  mfd2Um: number;
  v1: number;
  v2: number;
  /** Mismatch + offset loss from the exact LP01 fields. */
  exactLossDb: number;
  /** The same from Gaussian fields of the Petermann II MFDs (Marcuse 1977). */
  gaussianLossDb: number;
  /** Loss versus offset for the plot. */
  curve: { offsetUm: number; exactDb: number; gaussianDb: number }[];
  /** Both fields along the x axis through the joint, fiber 2 shifted by the offset, peak 1. */
  fields: { xUm: number; exact1: number; exact2: number; gaussian1: number; gaussian2: number }[];
}

/** Points of the loss-versus-offset curve and of the field picture. */
const CURVE_POINTS = 31;
const FIELD_POINTS = 121;

/**
 * Exact LP01 overlap of two single-mode fibers beside the Gaussian formulas, at one offset and over a range
 * of offsets (0 to max(2 × offset, MFD/2)).
 */
export function singleModeJointComparison(input: { fiber1: StepFiber; fiber2: StepFiber; wavelengthNm: number; lateralOffsetUm: number }): JointComparison {
  const lambda = input?.wavelengthNm;
  const d = requireNumber('lateralOffsetUm', input?.lateralOffsetUm, { min: 0, max: MAX_LAUNCH_OFFSET_UM, unit: 'µm' });
  const f1 = lp01RadialField(input.fiber1, lambda);
  const f2 = lp01RadialField(input.fiber2, lambda);
  const m1 = modeFieldDiameterUm({ coreRadiusUm: input.fiber1.coreRadiusUm, na: input.fiber1.na, wavelengthNm: lambda, definition: 'petermann2' });
  const m2 = modeFieldDiameterUm({ coreRadiusUm: input.fiber2.coreRadiusUm, na: input.fiber2.na, wavelengthNm: lambda, definition: 'petermann2' });
  const gaussian = (off: number) => mfdMismatchLossDb(m1.mfdUm, m2.mfdUm) + lateralOffsetLossDb(m1.mfdUm, m2.mfdUm, off);
  const maxOff = Math.max(2 * d, Math.min(m1.mfdUm, m2.mfdUm) / 2);
  const curve = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const off = (maxOff * i) / (CURVE_POINTS - 1);
    curve.push({ offsetUm: off, exactDb: fieldOverlapLoss(f1, f2, off).lossDb, gaussianDb: gaussian(off) });
  }
  const w1 = m1.mfdUm / 2;
  const w2 = m2.mfdUm / 2;
  const half = Math.max(w1, w2) * 2.5 + d / 2;
  const fields = [];
  const peak1 = f1.at(0);
  const peak2 = f2.at(0);
  for (let i = 0; i < FIELD_POINTS; i++) {
    const x = -half + (2 * half * i) / (FIELD_POINTS - 1);
    const x2 = x - d;
    fields.push({
      xUm: x,
      exact1: f1.at(Math.abs(x)) / peak1,
      exact2: f2.at(Math.abs(x2)) / peak2,
      gaussian1: Math.exp(-(x * x) / (w1 * w1)),
      gaussian2: Math.exp(-(x2 * x2) / (w2 * w2)),
    });
  }
  return {
    mfd1Um: m1.mfdUm,
    mfd2Um: m2.mfdUm,
    v1: m1.v,
    v2: m2.v,
    exactLossDb: fieldOverlapLoss(f1, f2, d).lossDb,
    gaussianLossDb: gaussian(d),
    curve,
    fields,
  };
}
