// Mode-filter mandrel: which mode groups N turns of a multimode cord on a mandrel strip, mode by mode.
//
// Model (per guided LP mode of the straight fiber, with its own propagation constant β = k n_eff):
// - A bend of radius R is a straight guide with the tilted index n²(x)(1 + 2x/R), x toward the outside of the bend
//   (Heiblum & Harris 1975, conformal transformation). With the elastic-optic correction R is replaced by
//   R_eff ≈ 1.28 R (Schermer & Cole 2007; the same default as the single-mode bend screen, src/physics/bending.ts).
// - Outside the core the tilted cladding index rises past n_eff at x₂ = R(n_eff²/n₂² − 1)/2: the mode tunnels
//   through the barrier between its outer turning point x₁ and x₂. WKB transmission per encounter
//   T = exp(−2Φ), Φ = k ∫_{x₁}^{x₂} √(n_eff² − n²(x)(1 + 2x/R)) dx (Snyder & Love 1983, ch. 7, tunnelling rays).
//   A mode with n_eff² ≤ n₂²(1 + 2a/R) meets no barrier at all and is refracted out at once (T = 1).
// - The mode meets the outer side once per ray period z_p = 4 n_eff x_t I_α / (NA √(1 − b)), x_t = a(1 − b)^{1/α},
//   I_α = ∫₀¹ (1 − s^α)^{−1/2} ds (meridional ray in an α-profile, Gloge & Marcatili 1973; I₂ = π/2 gives the
//   familiar 2π a n_eff/NA). Power left after a wrapped length L: t = exp(−T L / z_p).
// Each mode is treated as a ray in the plane of the bend and the power within a mode group as shared among its
// members (modes of one group are near-degenerate and couple strongly): the usual mode-group picture of multimode
// practice. Modes just above the threshold lose a little per turn, which is why the number of turns matters.
// Cross-check: with no core barrier (step profile) the modes with 2Φ < 1 are those Gloge 1972 counts as lost,
// M_eff/M = 1 − ((α + 2)/(2αΔ)) [2a/R + (3/(2 n₂ k R))^{2/3}] (Gloge 1972, Applied Optics 11(11); formula from memory).
import { DEFAULT_BEND_RADIUS_MODEL, stressRadiusFactor, type BendRadiusModel } from './bending';
import type { MultimodeFiberSpec, MultimodeModeSet } from './coupling';
import { InputError, ModelError, requireNumber, requireWavelengthNm } from './errors';
import { vNumber } from './fiber';
import { compositeRule, gaussLegendre } from './quadrature';
import { gradedIndexProfile, stepIndexProfile } from './radialSolver';

/** Mandrel diameters accepted (mm): from a pencil to a cable drum; smaller would break the fiber. */
export const MIN_MANDREL_DIAMETER_MM = 3;
export const MAX_MANDREL_DIAMETER_MM = 500;
/** Outer diameter of what is wrapped: a 250 µm coated fiber to a 5 mm cord. */
export const MIN_CORD_DIAMETER_MM = 0.1;
export const MAX_CORD_DIAMETER_MM = 10;
export const MAX_MANDREL_TURNS = 100;

/** A group counts as stripped below this share of its power left, kept above KEPT (between: partly). */
export const STRIPPED_BELOW = 0.1;
export const KEPT_ABOVE = 0.9;

export interface ModeTransmission {
  l: number;
  m: number;
  principal: number;
  degeneracy: 2 | 4;
  b: number;
  /** 2Φ of the WKB barrier (0: no barrier, refracted out at once). */
  barrier: number;
  /** Ray period z_p (mm). */
  rayPeriodMm: number;
  /** Share of the mode's power left after the wrap, 0..1. */
  transmission: number;
}

export type GroupFate = 'kept' | 'partly' | 'stripped';

export interface GroupTransmission {
  principal: number;
  /** Power-weighted share left (by degeneracy: the power sharing inside the group). */
  transmission: number;
  fate: GroupFate;
  /** Share of the launched power in the group before and after the wrap (of the launched total). */
  before: number;
  after: number;
}

export interface MandrelResult {
  /** Radius of the fiber's own axis on the mandrel (mm): mandrel plus half the cord. */
  fiberBendRadiusMm: number;
  effectiveRadiusMm: number;
  radiusModel: BendRadiusModel;
  /** Fiber length in the wrap (mm). */
  wrappedLengthMm: number;
  turns: number;
  perMode: ModeTransmission[];
  perGroup: GroupTransmission[];
  /** Powers per LP mode after the wrap (same order as the mode set; not renormalised). */
  powersAfter: number[];
  /** Insertion loss of the wrap for the launch given (dB ≥ 0). */
  lossDb: number;
  groupsStripped: number;
  groupsPartly: number;
  highestGroup: number;
  /** Share of modes Gloge 1972 counts as still guided in the bend (0..1), with the same radius. */
  glogeGuidedModeShare: number;
  method: string;
}

/** Rule for the core part of the barrier integral (smooth after the substitution below). */
const BARRIER_PANELS = 4;
const BARRIER_POINTS_PER_PANEL = 16;
/** Steps across the core when looking for the outer turning point (then bisection to 1e-12 of the core radius). */
const TURNING_POINT_SCAN_STEPS = 400;
/** Points of the Gauss–Legendre rule for I_α. */
const RAY_PERIOD_POINTS = 48;
/** 1 − b is kept above this in the ray period (a mode at b = 1 exactly does not exist; keeps z_p finite). */
const MIN_ONE_MINUS_B = 1e-9;
const UM_PER_MM = 1000;
const DB_PER_NEPER_POWER = 10 / Math.LN10;

/** I_α = ∫₀¹ (1 − s^α)^{−1/2} ds with s = 1 − u² (removes the end-point singularity): ∫₀¹ 2u / √(1 − (1 − u²)^α) du. */
export function rayPeriodIntegral(input: { alpha: number }): number {
  const alpha = input?.alpha;
  if (alpha === Number.POSITIVE_INFINITY) return 1;
  const al = requireNumber('alpha', alpha, { min: 0.5, max: 1000 });
  const { nodes, weights } = gaussLegendre(RAY_PERIOD_POINTS);
  let s = 0;
  for (let i = 0; i < nodes.length; i++) {
    const u = 0.5 * (nodes[i] + 1);
    const u2 = u * u;
    // 1 − (1 − u²)^α by expm1/log1p: exact to rounding even where u² is tiny.
    const d = -Math.expm1(al * Math.log1p(-u2));
    s += 0.5 * weights[i] * ((2 * u) / Math.sqrt(d));
  }
  return s;
}

export interface MandrelInput {
  fiber: MultimodeFiberSpec;
  wavelengthNm: number;
  /** The fiber's modes at this wavelength, from multimodeModes. */
  modes: MultimodeModeSet;
  mandrelDiameterMm: number;
  /** Outer diameter of the wrapped cord or coated fiber (mm). */
  cordDiameterMm: number;
  turns: number;
  /** Power per LP mode before the wrap (default: overfilled, equal power in every mode). */
  powers?: readonly number[];
  radiusModel?: BendRadiusModel;
}

/** Power left in every mode after N turns on a mandrel, the loss, and which groups are stripped. */
export function mandrelFilter(input: MandrelInput): MandrelResult {
  const fiber = input?.fiber;
  if (!fiber || (fiber.profile !== 'step' && fiber.profile !== 'graded')) throw new InputError('fiber.profile', fiber?.profile, "'step' or 'graded'");
  const lambda = requireWavelengthNm('wavelengthNm', input.wavelengthNm);
  const profile =
    fiber.profile === 'graded'
      ? gradedIndexProfile({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, alpha: fiber.alpha ?? 2, claddingIndex: fiber.claddingIndex })
      : stepIndexProfile({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, claddingIndex: fiber.claddingIndex });
  const alpha = fiber.profile === 'graded' ? (fiber.alpha ?? 2) : Number.POSITIVE_INFINITY;
  const set = input.modes;
  if (set === null || typeof set !== 'object' || !Array.isArray(set.modes) || set.modes.length === 0 || typeof set.v !== 'number') throw new InputError('modes', set, 'a mode set from multimodeModes');
  const v = vNumber({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm: lambda });
  if (!(Math.abs(set.v - v) <= 1e-6 * v)) throw new InputError('modes', `V = ${set.v}`, `modes solved for this fiber at ${lambda} nm (V = ${v.toFixed(3)})`);
  for (const m of set.modes) {
    if (!m || !(m.b >= 0 && m.b <= 1) || !Number.isInteger(m.principal) || m.principal < 1 || !(m.degeneracy === 2 || m.degeneracy === 4)) throw new InputError('modes.modes', m, 'modes as multimodeModes returns them');
  }
  const mandrelMm = requireNumber('mandrelDiameterMm', input.mandrelDiameterMm, { min: MIN_MANDREL_DIAMETER_MM, max: MAX_MANDREL_DIAMETER_MM, unit: 'mm' });
  const cordMm = requireNumber('cordDiameterMm', input.cordDiameterMm, { min: MIN_CORD_DIAMETER_MM, max: MAX_CORD_DIAMETER_MM, unit: 'mm', hint: (x) => (x >= 100 && x <= 10000 ? `did you mean ${x / 1000} mm (${x} µm)?` : undefined) });
  const turns = requireNumber('turns', input.turns, { min: 0, max: MAX_MANDREL_TURNS });
  const model = input.radiusModel ?? DEFAULT_BEND_RADIUS_MODEL;
  if (model !== 'stress-corrected' && model !== 'geometric') throw new InputError('radiusModel', model, "'stress-corrected' or 'geometric'");
  let powers: number[];
  if (input.powers === undefined) {
    const total = set.modes.reduce((s, m) => s + m.degeneracy, 0);
    powers = set.modes.map((m) => m.degeneracy / total);
  } else {
    if (!Array.isArray(input.powers) || input.powers.length !== set.modes.length) throw new InputError('powers', input.powers, `${set.modes.length} values, one per LP mode`);
    powers = input.powers.map((p, i) => requireNumber(`powers[${i}]`, p, { min: 0, max: 1e300 }));
  }
  const launched = powers.reduce((s, x) => s + x, 0);
  if (!(launched > 0) || !Number.isFinite(launched)) throw new InputError('powers', 'all zero', 'some power in at least one mode');

  const a = profile.coreRadiusUm;
  const n1 = profile.coreIndex;
  const n2 = profile.claddingIndex;
  const naSq = n1 * n1 - n2 * n2;
  const na = Math.sqrt(naSq);
  const k = (2 * Math.PI * 1000) / lambda; // 1/µm
  const fiberRadiusMm = (mandrelMm + cordMm) / 2;
  const factor = model === 'stress-corrected' ? stressRadiusFactor(n1) : 1;
  const rEffUm = fiberRadiusMm * factor * UM_PER_MM;
  const lengthMm = turns * 2 * Math.PI * fiberRadiusMm;
  const iAlpha = rayPeriodIntegral({ alpha });
  const core = compositeRule(Array.from({ length: BARRIER_PANELS + 1 }, (_, i) => i / BARRIER_PANELS), BARRIER_POINTS_PER_PANEL);
  const tilted = (x: number) => {
    const n = profile.indexAt(x);
    return n * n * (1 + (2 * x) / rEffUm);
  };

  const perMode: ModeTransmission[] = set.modes.map((mode) => {
    const neffSq = n2 * n2 + mode.b * naSq;
    const neff = Math.sqrt(neffSq);
    const qa = neffSq - n2 * n2 * (1 + (2 * a) / rEffUm); // > 0: a barrier exists beyond the core
    const oneMinusB = Math.max(MIN_ONE_MINUS_B, 1 - mode.b);
    const xt = alpha === Number.POSITIVE_INFINITY ? a : a * oneMinusB ** (1 / alpha);
    const rayPeriodUm = (4 * neff * xt * iAlpha) / (na * Math.sqrt(oneMinusB));
    let barrier = 0;
    if (qa > 0) {
      // Outer turning point x₁: the last point of the core where the tilted index is still above n_eff.
      let x1 = a;
      if (tilted(a * (1 - 1e-12)) < neffSq) {
        let hi = a;
        let lo = a;
        for (let i = TURNING_POINT_SCAN_STEPS - 1; i >= 0; i--) {
          lo = (a * i) / TURNING_POINT_SCAN_STEPS;
          if (tilted(lo) >= neffSq) break;
          hi = lo;
        }
        for (let it = 0; it < 60 && hi - lo > 1e-12 * a; it++) {
          const mid = 0.5 * (lo + hi);
          if (tilted(mid) >= neffSq) lo = mid;
          else hi = mid;
        }
        x1 = 0.5 * (lo + hi);
      }
      // Core part, x = x₁ + (a − x₁) t²: the √ at x₁ becomes smooth in t.
      let coreIntegral = 0;
      const span = a - x1;
      if (span > 0) {
        for (let i = 0; i < core.x.length; i++) {
          const t = core.x[i];
          const x = x1 + span * t * t;
          const d = neffSq - tilted(x);
          if (d > 0) coreIntegral += core.w[i] * Math.sqrt(d) * 2 * span * t;
        }
      }
      // Cladding part in closed form: ∫_a^{x₂} √(q_a − 2n₂²(x − a)/R) dx = R q_a^{3/2} / (3 n₂²).
      const claddingIntegral = (rEffUm * qa ** 1.5) / (3 * n2 * n2);
      barrier = 2 * k * (coreIntegral + claddingIntegral);
    }
    const encountersPerUm = 1 / rayPeriodUm;
    const tunnelled = barrier === 0 ? 1 : Math.exp(-barrier);
    const transmission = Math.exp(-tunnelled * lengthMm * UM_PER_MM * encountersPerUm);
    return { l: mode.l, m: mode.m, principal: mode.principal, degeneracy: mode.degeneracy, b: mode.b, barrier, rayPeriodMm: rayPeriodUm / UM_PER_MM, transmission: Math.min(1, Math.max(0, transmission)) };
  });

  const powersAfter = powers.map((p, i) => p * perMode[i].transmission);
  const left = powersAfter.reduce((s, x) => s + x, 0);
  const groups = new Map<number, { deg: number; degT: number; before: number; after: number }>();
  perMode.forEach((m, i) => {
    const g = groups.get(m.principal) ?? { deg: 0, degT: 0, before: 0, after: 0 };
    g.deg += m.degeneracy;
    g.degT += m.degeneracy * m.transmission;
    g.before += powers[i] / launched;
    g.after += powersAfter[i] / launched;
    groups.set(m.principal, g);
  });
  const perGroup: GroupTransmission[] = [...groups.entries()]
    .sort((x, y) => x[0] - y[0])
    .map(([principal, g]) => {
      const transmission = Math.min(1, Math.max(0, g.degT / g.deg));
      const fate: GroupFate = transmission < STRIPPED_BELOW ? 'stripped' : transmission > KEPT_ABOVE ? 'kept' : 'partly';
      return { principal, transmission, fate, before: g.before, after: g.after };
    });
  const lossDb = left > 0 ? Math.max(0, -DB_PER_NEPER_POWER * Math.log(left / launched)) : Number.NaN;
  if (!Number.isFinite(lossDb)) throw new ModelError('The wrap strips every guided mode: no power is left to measure.', 'mandrel mode filter', 'use a larger mandrel or fewer turns');

  // Gloge 1972 with the same (effective) radius, Δ = NA²/(2n₁²); (α + 2)/(2α) → 1/2 for a step.
  const delta = naSq / (2 * n1 * n1);
  const shape = alpha === Number.POSITIVE_INFINITY ? 0.5 : (alpha + 2) / (2 * alpha);
  const glogeGuidedModeShare = Math.min(1, Math.max(0, 1 - (shape / delta) * ((2 * a) / rEffUm + (3 / (2 * n2 * k * rEffUm)) ** (2 / 3))));

  return {
    fiberBendRadiusMm: fiberRadiusMm,
    effectiveRadiusMm: rEffUm / UM_PER_MM,
    radiusModel: model,
    wrappedLengthMm: lengthMm,
    turns,
    perMode,
    perGroup,
    powersAfter,
    lossDb,
    groupsStripped: perGroup.filter((g) => g.fate === 'stripped').length,
    groupsPartly: perGroup.filter((g) => g.fate === 'partly').length,
    highestGroup: perGroup.length ? perGroup[perGroup.length - 1].principal : 0,
    glogeGuidedModeShare,
    method: `WKB tunnelling through the bend barrier of the tilted index (Heiblum & Harris 1975; Snyder & Love 1983), ${model === 'stress-corrected' ? `stress-corrected radius ${factor.toFixed(3)} × R (Schermer & Cole 2007)` : 'geometric radius'}, one encounter per ray period`,
  };
}

// ---------------------------------------------------------------- the mandrels the trade uses

export interface MandrelRecommendation {
  coreDiameterUm: number;
  cordDiameterMm: number;
  mandrelDiameterMm: number;
  turns: number;
}

/**
 * Mandrel diameters for five non-overlapping turns of a launch cord, by core and cord diameter. Source: TIA/EIA-568-B.1
 * clause 11.3.3, Table 11-15 (the clause, the table and the five turns checked against a tester maker's note on it;
 * the diameters themselves from memory, not checked against the text). Common practice in loss testing with LED
 * sources; an encircled-flux launch replaces it in IEC 61280-4-1 and TIA-526-14-B.
 */
export const MANDREL_TABLE_SOURCE = 'TIA/EIA-568-B.1 clause 11.3.3, Table 11-15, five turns (diameters from memory)';
export const MANDREL_TABLE: readonly MandrelRecommendation[] = [
  { coreDiameterUm: 50, cordDiameterMm: 0.25, mandrelDiameterMm: 25, turns: 5 },
  { coreDiameterUm: 50, cordDiameterMm: 0.9, mandrelDiameterMm: 25, turns: 5 },
  { coreDiameterUm: 50, cordDiameterMm: 2.0, mandrelDiameterMm: 23, turns: 5 },
  { coreDiameterUm: 50, cordDiameterMm: 2.4, mandrelDiameterMm: 23, turns: 5 },
  { coreDiameterUm: 50, cordDiameterMm: 3.0, mandrelDiameterMm: 22, turns: 5 },
  { coreDiameterUm: 62.5, cordDiameterMm: 0.25, mandrelDiameterMm: 20, turns: 5 },
  { coreDiameterUm: 62.5, cordDiameterMm: 0.9, mandrelDiameterMm: 20, turns: 5 },
  { coreDiameterUm: 62.5, cordDiameterMm: 2.0, mandrelDiameterMm: 18, turns: 5 },
  { coreDiameterUm: 62.5, cordDiameterMm: 2.4, mandrelDiameterMm: 18, turns: 5 },
  { coreDiameterUm: 62.5, cordDiameterMm: 3.0, mandrelDiameterMm: 17, turns: 5 },
];

/** The table's mandrel for this core and cord, or undefined (core other than 50/62.5 µm, cord not in the table). */
export function recommendedMandrel(input: { coreDiameterUm: number; cordDiameterMm: number }): MandrelRecommendation | undefined {
  const d = requireNumber('coreDiameterUm', input?.coreDiameterUm, { min: 0, minInclusive: false, max: 1000, unit: 'µm' });
  const c = requireNumber('cordDiameterMm', input.cordDiameterMm, { min: 0, minInclusive: false, max: 100, unit: 'mm' });
  return MANDREL_TABLE.find((r) => Math.abs(r.coreDiameterUm - d) <= 2.5 && Math.abs(r.cordDiameterMm - c) <= 0.05);
}
