// Macrobend loss of the LP01 mode of a step-index (or equivalent step-index) single-mode fiber.
// Model: Marcuse's curvature-loss formula (Marcuse 1976, JOSA 66(3)), with the bend radius optionally
// replaced by an effective radius that accounts for the elastic-optic (stress) effect in bent silica
// (Schermer & Cole 2007, IEEE JQE 43(10)). The correction is an explicit choice: it changes the answer
// by more than ten times at a 15 mm radius, and the default follows the published comparison with
// measurement, which found the stress-corrected radius matches real fibers.
//
// The factor, stated once: R_eff = 1.272 R for a silica core of index 1.449, from
// R_eff/R = 1/(1 − (n²/2)(p12 − ν(p11 + p12))) with p11 = 0.121, p12 = 0.270, ν = 0.17 (Schermer & Cole 2007;
// constants from memory). It is computed from the fiber's own core index (1.270–1.275 for n = 1.44–1.46).
// A fiber type or the screen can choose another factor explicitly (BendFiber.radiusFactor), e.g. a figure
// fitted to its own bend measurements.
//
// Trench-assisted and other bend-insensitive designs (ITU-T G.657) are not step-index fibers: they bend far
// better than any step-index model predicts. For them the category limits, not this estimate, are what to use.
import { besselK } from './bessel';
import { ModelError, requireInteger, requireNumber, requirePositive, requireWavelengthNm } from './errors';
import { solveLpMode } from './lpModes';
import { MFD_MIN_UM } from './jointLoss';

/** Strain-optic (Pockels) coefficients and Poisson ratio of fused silica, as used by Schermer & Cole 2007. */
export const SILICA_P11 = 0.121;
export const SILICA_P12 = 0.27;
export const SILICA_POISSON_RATIO = 0.17;
/** Default cladding index for a fiber given only by core radius and NA: fused silica at 1550 nm (Malitson 1965). */
export const BEND_DEFAULT_CLADDING_INDEX = 1.444;
/**
 * R_eff/R for a silica core of index 1.449: 1/(1 − 1.0498 × (0.270 − 0.17 × 0.391)) = 1/(1 − 0.21367) = 1.2717
 * (Schermer & Cole 2007 with the constants above). The number stated wherever the correction is described.
 */
export const STRESS_RADIUS_FACTOR_SILICA = 1.272;
/** Range of an explicitly chosen R_eff/R: 1 (no correction) to 2 (far beyond any published figure). */
export const MIN_RADIUS_FACTOR = 1;
export const MAX_RADIUS_FACTOR = 2;
/** Per-turn loss that defines the "critical radius" shown to the user (issue 4). */
export const CRITICAL_LOSS_DB_PER_TURN = 0.1;
/** LP11 cutoff, first zero of J0 (A&S Table 9.5). */
const FIRST_ZERO_J0 = 2.404825557695773;
/** Radius search range for the critical radius (mm). */
export const MIN_BEND_RADIUS_MM = 1;
export const MAX_BEND_RADIUS_MM = 500;
const UM_PER_MM = 1000;
const UM_PER_M = 1e6;
const MM_PER_M = 1000;
const DB_PER_NEPER = 10 / Math.LN10;

export type BendRadiusModel = 'stress-corrected' | 'geometric';
/** Default: stress-corrected, because that is what agrees with measured silica fibers (Schermer & Cole 2007). */
export const DEFAULT_BEND_RADIUS_MODEL: BendRadiusModel = 'stress-corrected';

export interface BendFiber {
  coreRadiusUm: number;
  na: number;
  /** Default BEND_DEFAULT_CLADDING_INDEX. */
  claddingIndex?: number;
  /**
   * R_eff/R chosen explicitly (1–2), for a fiber whose own bend measurements call for another factor. When given it
   * replaces the radius model's factor (the result says so); when absent the radius model decides.
   */
  radiusFactor?: number;
}

export interface BendLossInput extends BendFiber {
  wavelengthNm: number;
  bendRadiusMm: number;
  /** Number of full turns (default 1). */
  turns?: number;
  /** Default DEFAULT_BEND_RADIUS_MODEL. */
  radiusModel?: BendRadiusModel;
}

export interface BendLossResult {
  lossDbPerTurn: number;
  lossDbPerM: number;
  /** For all the turns. */
  totalLossDb: number;
  turns: number;
  /** Radius used in the formula (mm): R itself, or R_eff = factor × R. */
  effectiveRadiusMm: number;
  radiusFactor: number;
  radiusModel: BendRadiusModel;
  /** True when radiusFactor was chosen by the caller (BendFiber.radiusFactor), not derived from the radius model. */
  radiusFactorChosen: boolean;
  v: number;
  /** True if the fiber is not single-mode at this wavelength (V ≥ 2.405): LP11 also radiates, not included. */
  multimodeWarning: boolean;
}

/**
 * R_eff / R = 1 / (1 − (n²/2)(p12 − ν(p11 + p12))) (Schermer & Cole 2007, equivalent bend radius; constants
 * p11 = 0.121, p12 = 0.270, ν = 0.17 as used there, from memory). n: the core index; 1.272 at n = 1.449.
 */
export function stressRadiusFactor(coreIndex: number): number {
  const n = requireNumber('coreIndex', coreIndex, { min: 1, max: 2 });
  return 1 / (1 - ((n * n) / 2) * (SILICA_P12 - SILICA_POISSON_RATIO * (SILICA_P11 + SILICA_P12)));
}

interface Prepared {
  /** κ = u/a, γ = w/a (1/µm). */
  kappa: number;
  gamma: number;
  beta2: number;
  v: number;
  k1w: number;
  coreIndex: number;
}

function prepare(fiber: BendFiber, wavelengthNm: number): Prepared {
  const a = requirePositive('coreRadiusUm', fiber?.coreRadiusUm, { max: 50, unit: 'µm' });
  const na = requirePositive('na', fiber?.na, { max: 0.4 });
  const n2 = requireNumber('claddingIndex', fiber?.claddingIndex ?? BEND_DEFAULT_CLADDING_INDEX, { min: 1, max: 2 });
  const lambda = requireWavelengthNm('wavelengthNm', wavelengthNm);
  const n1 = Math.sqrt(n2 * n2 + na * na);
  const k = (2 * Math.PI * 1000) / lambda;
  const v = k * a * na;
  const mode = solveLpMode(0, 1, v); // Gloge 1971 LP01 from the mode engine
  if (!(mode.w > 0)) {
    throw new ModelError(`LP01 is too close to its weak-guidance limit at V = ${v.toFixed(3)} to compute a bend loss.`, 'Marcuse 1976 bend loss', 'check the core radius and NA');
  }
  const kappa = mode.u / a;
  const gamma = mode.w / a;
  return { kappa, gamma, beta2: k * k * n1 * n1 - kappa * kappa, v, k1w: besselK(1, mode.w), coreIndex: n1 };
}

/**
 * ln of Marcuse's power loss coefficient 2α (1/µm) for LP01 at radius R (µm):
 * 2α = √π κ² exp(−(2γ³/3β²) R) / (e₀ γ^{3/2} V² √R K₁²(γa)), e₀ = 2 (Marcuse 1976, JOSA 66(3), curvature loss
 * formula for ν = 0; asymptotic, valid for R ≫ a, weak guidance and an infinite cladding).
 * Kept as a log so that large radii give tiny but nonzero losses, never 0 or NaN.
 */
function lnPowerLossPerUm(p: Prepared, radiusUm: number): number {
  return (
    0.5 * Math.log(Math.PI) +
    2 * Math.log(p.kappa) -
    ((2 * p.gamma ** 3) / (3 * p.beta2)) * radiusUm -
    Math.log(2) -
    1.5 * Math.log(p.gamma) -
    2 * Math.log(p.v) -
    0.5 * Math.log(radiusUm) -
    2 * Math.log(p.k1w)
  );
}

function radiusFactorFor(model: BendRadiusModel, coreIndex: number, chosen?: number): number {
  if (chosen !== undefined) return requireNumber('radiusFactor', chosen, { min: MIN_RADIUS_FACTOR, max: MAX_RADIUS_FACTOR, hint: 'R_eff/R: 1 is no correction, silica ≈ 1.27' });
  if (model === 'geometric') return 1;
  if (model === 'stress-corrected') return stressRadiusFactor(coreIndex);
  throw new ModelError(`Unknown bend radius model "${String(model)}".`, 'bend radius model', "use 'stress-corrected' or 'geometric'");
}

function evaluate(p: Prepared, bendRadiusMm: number, factor: number): { lossDbPerM: number; lossDbPerTurn: number } {
  const rEffUm = bendRadiusMm * factor * UM_PER_MM;
  const lnAlpha = lnPowerLossPerUm(p, rEffUm);
  const lossDbPerM = DB_PER_NEPER * Math.exp(lnAlpha) * UM_PER_M;
  // A turn is the fiber length 2πR of the real (not effective) radius.
  const lossDbPerTurn = lossDbPerM * ((2 * Math.PI * bendRadiusMm) / MM_PER_M);
  return { lossDbPerM, lossDbPerTurn };
}

/** Macrobend loss per turn and for N turns (Marcuse 1976, stress correction per Schermer & Cole 2007). */
export function bendLoss(input: BendLossInput): BendLossResult {
  const p = prepare(input, input?.wavelengthNm);
  const radius = requireNumber('bendRadiusMm', input.bendRadiusMm, { min: MIN_BEND_RADIUS_MM, max: MAX_BEND_RADIUS_MM, unit: 'mm' });
  const turns = requireInteger('turns', input.turns ?? 1, 1, 100000);
  const model = input.radiusModel ?? DEFAULT_BEND_RADIUS_MODEL;
  const factor = radiusFactorFor(model, p.coreIndex, input.radiusFactor);
  const { lossDbPerM, lossDbPerTurn } = evaluate(p, radius, factor);
  return {
    lossDbPerTurn,
    lossDbPerM,
    totalLossDb: lossDbPerTurn * turns,
    turns,
    effectiveRadiusMm: radius * factor,
    radiusFactor: factor,
    radiusModel: model,
    radiusFactorChosen: input.radiusFactor !== undefined,
    v: p.v,
    multimodeWarning: p.v >= FIRST_ZERO_J0,
  };
}

export interface BendSweepPoint {
  bendRadiusMm: number;
  lossDbPerTurn: number;
}

/** Loss per turn at `count` radii spaced evenly from minRadiusMm to maxRadiusMm (one mode solve for all). */
export function bendLossSweep(input: BendFiber & { wavelengthNm: number; minRadiusMm: number; maxRadiusMm: number; count: number; radiusModel?: BendRadiusModel }): BendSweepPoint[] {
  const p = prepare(input, input?.wavelengthNm);
  const lo = requireNumber('minRadiusMm', input.minRadiusMm, { min: MIN_BEND_RADIUS_MM, max: MAX_BEND_RADIUS_MM, unit: 'mm' });
  const hi = requireNumber('maxRadiusMm', input.maxRadiusMm, { min: lo, max: MAX_BEND_RADIUS_MM, unit: 'mm' });
  const count = requireInteger('count', input.count, 2, 10000);
  const factor = radiusFactorFor(input.radiusModel ?? DEFAULT_BEND_RADIUS_MODEL, p.coreIndex, input.radiusFactor);
  const out: BendSweepPoint[] = [];
  for (let i = 0; i < count; i++) {
    const r = lo + ((hi - lo) * i) / (count - 1);
    out.push({ bendRadiusMm: r, lossDbPerTurn: evaluate(p, r, factor).lossDbPerTurn });
  }
  return out;
}

export interface CriticalRadius {
  /** Radius (mm) where the loss per turn equals the threshold; below it the loss rises steeply. */
  bendRadiusMm: number;
  thresholdDbPerTurn: number;
  /** 'found', or 'below-range' when even MIN_BEND_RADIUS_MM loses less than the threshold. */
  status: 'found' | 'below-range';
}

/** Radius at which the loss per turn reaches the threshold (default 0.1 dB/turn), by bisection in log R. */
export function criticalBendRadius(input: BendFiber & { wavelengthNm: number; thresholdDbPerTurn?: number; radiusModel?: BendRadiusModel }): CriticalRadius {
  const p = prepare(input, input?.wavelengthNm);
  const threshold = requirePositive('thresholdDbPerTurn', input.thresholdDbPerTurn ?? CRITICAL_LOSS_DB_PER_TURN, { max: 100, unit: 'dB' });
  const factor = radiusFactorFor(input.radiusModel ?? DEFAULT_BEND_RADIUS_MODEL, p.coreIndex, input.radiusFactor);
  const perTurn = (r: number) => evaluate(p, r, factor).lossDbPerTurn;
  if (perTurn(MIN_BEND_RADIUS_MM) <= threshold) return { bendRadiusMm: MIN_BEND_RADIUS_MM, thresholdDbPerTurn: threshold, status: 'below-range' };
  if (perTurn(MAX_BEND_RADIUS_MM) > threshold) {
    throw new ModelError(`Even a ${MAX_BEND_RADIUS_MM} mm bend loses more than ${threshold} dB per turn: the mode is barely guided.`, 'Marcuse 1976 bend loss', 'check the core radius and NA, or use a shorter wavelength');
  }
  // Loss per turn ∝ √R exp(−cR) falls monotonically once R > 1/(2c), which holds over the whole range for
  // guided single-mode fibers (c R ≫ 1 at 1 mm). Bisection on log R, 60 steps → relative width 1e-16.
  let lo = Math.log(MIN_BEND_RADIUS_MM);
  let hi = Math.log(MAX_BEND_RADIUS_MM);
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (perTurn(Math.exp(mid)) > threshold) lo = mid;
    else hi = mid;
  }
  return { bendRadiusMm: Math.exp(0.5 * (lo + hi)), thresholdDbPerTurn: threshold, status: 'found' };
}

/**
 * MAC number = MFD (µm) / cutoff wavelength (µm): the larger, the more bend-sensitive (common practice;
 * typical single-mode fibers 6.5–8.5 at 1550 nm).
 */
export function macNumber(mfdUm: number, cutoffWavelengthNm: number): number {
  const mfd = requireNumber('mfdUm', mfdUm, { min: MFD_MIN_UM, max: 100, unit: 'µm' }); // a subnormal MFD gave MAC = 0
  const cutoff = requireWavelengthNm('cutoffWavelengthNm', cutoffWavelengthNm);
  return mfd / (cutoff / 1000);
}

export interface MacrobendLimit {
  category: 'G.652.D' | 'G.657.A1' | 'G.657.A2' | 'G.657.B2' | 'G.657.B3';
  bendRadiusMm: number;
  turns: number;
  maxLossDb1550?: number;
  maxLossDb1625: number;
}

/** Edition the limits are taken from. Values recalled from memory: indicative only; check the current edition. */
export const MACROBEND_LIMITS_EDITION = 'ITU-T G.652 (11/2016) and G.657 (11/2016), macrobending loss attributes (from memory, indicative)';

/** Maximum macrobend loss for N turns at radius R, by category (MACROBEND_LIMITS_EDITION; indicative). */
export const MACROBEND_LIMITS: readonly MacrobendLimit[] = [
  { category: 'G.652.D', bendRadiusMm: 30, turns: 100, maxLossDb1625: 0.1 },
  { category: 'G.657.A1', bendRadiusMm: 15, turns: 10, maxLossDb1550: 0.25, maxLossDb1625: 1.0 },
  { category: 'G.657.A1', bendRadiusMm: 10, turns: 1, maxLossDb1550: 0.75, maxLossDb1625: 1.5 },
  { category: 'G.657.A2', bendRadiusMm: 15, turns: 10, maxLossDb1550: 0.03, maxLossDb1625: 0.1 },
  { category: 'G.657.A2', bendRadiusMm: 10, turns: 1, maxLossDb1550: 0.1, maxLossDb1625: 0.2 },
  { category: 'G.657.A2', bendRadiusMm: 7.5, turns: 1, maxLossDb1550: 0.5, maxLossDb1625: 1.0 },
  { category: 'G.657.B2', bendRadiusMm: 15, turns: 10, maxLossDb1550: 0.03, maxLossDb1625: 0.1 },
  { category: 'G.657.B2', bendRadiusMm: 10, turns: 1, maxLossDb1550: 0.1, maxLossDb1625: 0.2 },
  { category: 'G.657.B2', bendRadiusMm: 7.5, turns: 1, maxLossDb1550: 0.5, maxLossDb1625: 1.0 },
  { category: 'G.657.B3', bendRadiusMm: 10, turns: 1, maxLossDb1550: 0.03, maxLossDb1625: 0.1 },
  { category: 'G.657.B3', bendRadiusMm: 7.5, turns: 1, maxLossDb1550: 0.08, maxLossDb1625: 0.25 },
  { category: 'G.657.B3', bendRadiusMm: 5, turns: 1, maxLossDb1550: 0.15, maxLossDb1625: 0.45 },
];

/** Plain statement shown beside every bend estimate. */
export const BEND_INSENSITIVE_NOTE =
  'Bend-insensitive fibers (G.657, usually with a trench around the core) lose far less in a bend than this step-index model predicts. For them, rely on the category limits, not on this estimate.';
