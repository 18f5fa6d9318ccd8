// Is an event on the trace a splice (or connector) or a macrobend? Decided from its loss at two or more wavelengths.
//
// A joint's loss hardly changes with wavelength: an MFD mismatch is nearly flat, and an offset loss 4.34·(d/w)² falls
// a little as the mode widens (Marcuse 1977, BSTJ 56(5)). A macrobend's loss rises steeply with wavelength, because the
// mode's evanescent tail reaches further out (Marcuse 1976, JOSA 66(3)). So the event is fitted twice:
//   splice model: L(λ) = a·(w(λ₀)/w(λ))² + b, a ≥ 0 the offset part at the shortest wavelength λ₀, b ≥ 0 a flat part
//                 (mismatch, connector), w from the fiber's Petermann II MFD (ITU-T G.650.1) at each wavelength;
//   bend model:   L(λ) = N·P(λ, R), P the loss per turn of the project's bend model (bending.ts) at radius R, N ≥ 0
//                 the number of turns (fractional: a partial loop), searched over radius.
// A model fits when it reproduces every reading within the stated reading uncertainty. Both, one or neither may fit;
// the verdict says which, in so many words. The bend model's radii for trench-assisted (G.657) fibers are not real
// radii: such fibers bend far better than their equivalent step-index fiber (see BEND_INSENSITIVE_NOTE).
import { InputError, requireNumber, requireWavelengthNm } from './errors';
import { bendLossSweep, DEFAULT_BEND_RADIUS_MODEL, type BendFiber, type BendRadiusModel } from './bending';
import { DB_PER_NEPER, lateralOffsetLossDb, mfdMismatchLossDb } from './jointLoss';
import { modeFieldDiameterUm } from './modeField';

/** Default uncertainty of one event-loss reading (dB): typical repeatability of a clean OTDR event reading, from memory. */
export const DEFAULT_READING_TOLERANCE_DB = 0.03;
/** Radii searched for a bend (mm): tighter than 2 mm breaks most coated fibers; beyond 60 mm a single-mode fiber loses nothing measurable. Common practice. */
export const BEND_SEARCH_MIN_MM = 2;
export const BEND_SEARCH_MAX_MM = 60;
/** Radius grid step of the search (mm): 0.05 mm, finer than any radius a technician could act on or measure. */
const BEND_SEARCH_STEP_MM = 0.05;
/** Most turns one event can hold: a coil of more than 100 loops is not one place on a trace. Common practice. */
export const MAX_BEND_TURNS = 100;
/** Below this length of bent fiber (mm) a fitted "bend" is a kink or point pressure (crush, tight tie), not a loop. */
export const KINK_ARC_MM = 1;
export const MIN_READINGS = 2;
export const MAX_READINGS = 6;
/** Readings closer than this in wavelength say nothing about the trend (nm). */
export const MIN_WAVELENGTH_SEPARATION_NM = 20;
/** Largest event loss accepted (dB): a bigger step is a break, not a bend or splice to classify. */
export const MAX_EVENT_LOSS_DB = 20;

export interface EventReading {
  wavelengthNm: number;
  /** Event loss at this wavelength (dB), best the average of both directions. */
  lossDb: number;
}

export interface BendOrSpliceInput {
  fiber: BendFiber;
  readings: readonly EventReading[];
  /** Uncertainty of each reading (dB). Default DEFAULT_READING_TOLERANCE_DB. */
  toleranceDb?: number;
  radiusModel?: BendRadiusModel;
}

export type EventVerdict = 'splice' | 'bend' | 'either' | 'neither' | 'no-loss';

export interface SpliceFit {
  fits: boolean;
  /** Offset-shaped part at the shortest wavelength (dB). */
  offsetPartDb: number;
  /** Wavelength-flat part (dB). */
  flatPartDb: number;
  /** Lateral offset between equal fibers that gives the offset part (µm), Marcuse 1977 inverted. */
  offsetUm: number;
  /** MFD ratio (larger/smaller) whose mismatch alone gives the flat part, Marcuse 1977 inverted. */
  mfdRatio: number;
  /** Model loss at each reading's wavelength (dB), in the order of `readings` in the result. */
  predictedDb: number[];
  /** Largest |model − reading| (dB). */
  worstResidualDb: number;
}

export interface BendFit {
  fits: boolean;
  /** Best-fitting radius (mm) and turns; undefined when no radius gives a positive number of turns. */
  bendRadiusMm?: number;
  turns?: number;
  /** Length of bent fiber N·2πR (mm). */
  arcLengthMm?: number;
  /** Radii (mm) and turns over which the model reproduces every reading within the uncertainty; undefined if none. */
  radiusRangeMm?: [number, number];
  turnsRange?: [number, number];
  /** True when the best fit is less than KINK_ARC_MM of bent fiber: a kink or point pressure rather than a loop. */
  kinkLike?: boolean;
  predictedDb: number[];
  worstResidualDb: number;
}

export interface BendOrSpliceResult {
  verdict: EventVerdict;
  /** Readings sorted by wavelength. */
  readings: EventReading[];
  toleranceDb: number;
  /** Ratio of the loss at the longest wavelength to the shortest (undefined when the shortest is within the uncertainty). */
  lossRatio?: number;
  /** MFD (Petermann II) of the fiber at each reading's wavelength (µm). */
  mfdUm: number[];
  splice: SpliceFit;
  bend: BendFit;
  /** True when a reading is below zero by more than the uncertainty: a one-way "gainer", not an event loss. */
  hasGain: boolean;
}

function requireReadings(list: unknown): EventReading[] {
  if (!Array.isArray(list)) throw new InputError('readings', list, `a list of ${MIN_READINGS} to ${MAX_READINGS} readings`);
  if (list.length < MIN_READINGS || list.length > MAX_READINGS) throw new InputError('readings', list.length, `${MIN_READINGS} to ${MAX_READINGS} readings, at different wavelengths`);
  const readings = list.map((r: unknown, i) => {
    const x = r as Partial<EventReading> | null;
    return {
      wavelengthNm: requireWavelengthNm(`readings[${i}].wavelengthNm`, x?.wavelengthNm),
      lossDb: requireNumber(`readings[${i}].lossDb`, x?.lossDb, { min: -MAX_EVENT_LOSS_DB, max: MAX_EVENT_LOSS_DB, unit: 'dB' }),
    };
  });
  readings.sort((a, b) => a.wavelengthNm - b.wavelengthNm);
  for (let i = 1; i < readings.length; i++) {
    if (readings[i]!.wavelengthNm - readings[i - 1]!.wavelengthNm < MIN_WAVELENGTH_SEPARATION_NM) {
      throw new InputError('readings', readings[i]!.wavelengthNm, `wavelengths at least ${MIN_WAVELENGTH_SEPARATION_NM} nm apart`, 'two readings at the same wavelength say nothing about how the loss changes');
    }
  }
  return readings;
}

const worst = (pred: number[], obs: number[]) => pred.reduce((m, p, i) => Math.max(m, Math.abs(p - obs[i]!)), 0);
const sse = (pred: number[], obs: number[]) => pred.reduce((s, p, i) => s + (p - obs[i]!) ** 2, 0);

/** Non-negative least squares with two columns (shape o, constant 1): the few candidate solutions, best feasible. */
function fitSplice(shape: number[], obs: number[]): { a: number; b: number } {
  const n = obs.length;
  const so = shape.reduce((s, v) => s + v, 0);
  const soo = shape.reduce((s, v) => s + v * v, 0);
  const sl = obs.reduce((s, v) => s + v, 0);
  const sol = shape.reduce((s, v, i) => s + v * obs[i]!, 0);
  const candidates: { a: number; b: number }[] = [{ a: 0, b: 0 }];
  const det = n * soo - so * so;
  if (Math.abs(det) > 1e-14 * n * soo) {
    const a = (n * sol - so * sl) / det;
    const b = (soo * sl - so * sol) / det;
    if (a >= 0 && b >= 0) candidates.push({ a, b });
  }
  if (soo > 0) candidates.push({ a: Math.max(0, sol / soo), b: 0 });
  candidates.push({ a: 0, b: Math.max(0, sl / n) });
  let best = candidates[0]!;
  let bestErr = Infinity;
  for (const c of candidates) {
    const err = sse(shape.map((o) => c.a * o + c.b), obs);
    if (err < bestErr) {
      bestErr = err;
      best = c;
    }
  }
  return best;
}

/** Lateral offset (µm) between equal fibers of spot radius w that loses `lossDb`: L = 4.343·(d/w)² inverted (Marcuse 1977). */
export function offsetForLossUm(input: { mfdUm: number; lossDb: number }): number {
  const mfd = requireNumber('mfdUm', input?.mfdUm, { min: 0.1, max: 100, unit: 'µm' });
  const loss = requireNumber('lossDb', input?.lossDb, { min: 0, max: 100, unit: 'dB' });
  const w = mfd / 2;
  // Marcuse 1977: T = exp(−2d²/(w1² + w2²)); with w1 = w2 = w, L = DB_PER_NEPER·d²/w².
  return w * Math.sqrt(loss / DB_PER_NEPER);
}

/** MFD ratio r = larger/smaller whose mismatch alone loses `lossDb`: −20·log10(2r/(1 + r²)) inverted (Marcuse 1977). */
export function mfdRatioForLoss(input: { lossDb: number }): number {
  const loss = requireNumber('lossDb', input?.lossDb, { min: 0, max: 60, unit: 'dB' });
  const t = 10 ** (-loss / 20); // 2r/(1 + r²)
  return (1 + Math.sqrt(Math.max(0, 1 - t * t))) / t;
}

/**
 * Splice or bend from the losses of one event at two or more wavelengths: both models fitted, each judged by whether
 * it reproduces every reading within the reading uncertainty (see the header for the models and their sources).
 */
export function classifyEvent(input: BendOrSpliceInput): BendOrSpliceResult {
  if (input === null || typeof input !== 'object') throw new InputError('input', input, 'an object with fiber and readings');
  const fiber = input.fiber;
  if (fiber === null || typeof fiber !== 'object') throw new InputError('fiber', fiber, 'a fiber with core radius and NA');
  const readings = requireReadings(input.readings);
  const tol = requireNumber('toleranceDb', input.toleranceDb ?? DEFAULT_READING_TOLERANCE_DB, { min: 0.001, max: 5, unit: 'dB' });
  const model = input.radiusModel ?? DEFAULT_BEND_RADIUS_MODEL;
  const obs = readings.map((r) => r.lossDb);
  const hasGain = obs.some((l) => l < -tol);

  // Splice: offset shape from the fiber's MFD at each wavelength.
  const mfdUm = readings.map((r) => modeFieldDiameterUm({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm: r.wavelengthNm, definition: 'petermann2' }).mfdUm);
  const shape = mfdUm.map((m) => (mfdUm[0]! / m) ** 2);
  const { a, b } = fitSplice(shape, obs);
  const splicePred = shape.map((o) => a * o + b);
  const spliceWorst = worst(splicePred, obs);
  const splice: SpliceFit = {
    fits: spliceWorst <= tol,
    offsetPartDb: a,
    flatPartDb: b,
    offsetUm: offsetForLossUm({ mfdUm: mfdUm[0]!, lossDb: a }),
    mfdRatio: mfdRatioForLoss({ lossDb: b }),
    predictedDb: splicePred,
    worstResidualDb: spliceWorst,
  };

  // Bend: one sweep per wavelength over the radius grid (one mode solve each), then turns fitted at every radius.
  const count = Math.round((BEND_SEARCH_MAX_MM - BEND_SEARCH_MIN_MM) / BEND_SEARCH_STEP_MM) + 1;
  const perTurn = readings.map((r) =>
    bendLossSweep({ ...fiber, wavelengthNm: r.wavelengthNm, minRadiusMm: BEND_SEARCH_MIN_MM, maxRadiusMm: BEND_SEARCH_MAX_MM, count, radiusModel: model }),
  );
  let best: { j: number; turns: number; err: number; pred: number[] } | undefined;
  let rLo = Infinity;
  let rHi = -Infinity;
  let nLo = Infinity;
  let nHi = -Infinity;
  // Plain loops, no allocation per radius: this grid is the whole cost of the classification.
  const m = readings.length;
  const table = perTurn.map((s) => Float64Array.from(s, (x) => x.lossDbPerTurn));
  for (let j = 0; j < count; j++) {
    let spp = 0;
    let spl = 0;
    for (let i = 0; i < m; i++) {
      const v = table[i]![j]!;
      spp += v * v;
      spl += v * obs[i]!;
    }
    if (!(spp > 0) || !Number.isFinite(spp)) continue;
    const turns = Math.min(MAX_BEND_TURNS, spl / spp);
    if (!(turns > 0)) continue;
    let err = 0;
    let worstHere = 0;
    for (let i = 0; i < m; i++) {
      const d = Math.abs(turns * table[i]![j]! - obs[i]!);
      err += d * d;
      if (d > worstHere) worstHere = d;
    }
    if (!best || err < best.err) best = { j, turns, err, pred: [] };
    if (worstHere <= tol) {
      const r = perTurn[0]![j]!.bendRadiusMm;
      rLo = Math.min(rLo, r);
      rHi = Math.max(rHi, r);
      nLo = Math.min(nLo, turns);
      nHi = Math.max(nHi, turns);
    }
  }
  if (best) best.pred = table.map((t) => best!.turns * t[best!.j]!);
  const bend: BendFit = best
    ? (() => {
        const r = perTurn[0]![best.j]!.bendRadiusMm;
        const w = worst(best.pred, obs);
        const fit: BendFit = { fits: rLo <= rHi, bendRadiusMm: r, turns: best.turns, arcLengthMm: best.turns * 2 * Math.PI * r, predictedDb: best.pred, worstResidualDb: w, kinkLike: best.turns * 2 * Math.PI * r < KINK_ARC_MM };
        if (rLo <= rHi) {
          fit.radiusRangeMm = [rLo, rHi];
          fit.turnsRange = [nLo, nHi];
        }
        return fit;
      })()
    : { fits: false, predictedDb: obs.map(() => 0), worstResidualDb: worst(obs.map(() => 0), obs) };

  let verdict: EventVerdict;
  if (obs.every((l) => Math.abs(l) <= tol)) verdict = 'no-loss';
  else if (hasGain) verdict = 'neither';
  else if (splice.fits && bend.fits) verdict = 'either';
  else if (splice.fits) verdict = 'splice';
  else if (bend.fits) verdict = 'bend';
  else verdict = 'neither';

  const first = obs[0]!;
  const last = obs[obs.length - 1]!;
  const result: BendOrSpliceResult = { verdict, readings, toleranceDb: tol, mfdUm, splice, bend, hasGain };
  if (first > tol) result.lossRatio = last / first; // a ratio to a loss inside the uncertainty means nothing
  return result;
}

/** Forward model used by the tests and the screen's table: the loss N turns at R give at a wavelength (bending.ts). */
export function bendEventLossDb(input: { fiber: BendFiber; wavelengthNm: number; bendRadiusMm: number; turns: number; radiusModel?: BendRadiusModel }): number {
  const turns = requireNumber('turns', input?.turns, { min: 0, max: MAX_BEND_TURNS, unit: 'turns' });
  const r = requireNumber('bendRadiusMm', input?.bendRadiusMm, { min: BEND_SEARCH_MIN_MM, max: BEND_SEARCH_MAX_MM, unit: 'mm' });
  const p = bendLossSweep({ ...input.fiber, wavelengthNm: input.wavelengthNm, minRadiusMm: r, maxRadiusMm: r, count: 2, radiusModel: input.radiusModel ?? DEFAULT_BEND_RADIUS_MODEL });
  return turns * p[0]!.lossDbPerTurn;
}

/** Forward model of a splice between equal fibers with an offset plus a flat part (jointLoss.ts). */
export function spliceEventLossDb(input: { mfdUm: number; lateralOffsetUm: number; mfdRatio?: number }): number {
  const mfd = requireNumber('mfdUm', input?.mfdUm, { min: 0.1, max: 100, unit: 'µm' });
  const ratio = requireNumber('mfdRatio', input?.mfdRatio ?? 1, { min: 1, max: 10 });
  return lateralOffsetLossDb(mfd, mfd, input.lateralOffsetUm) + mfdMismatchLossDb(mfd, mfd * ratio);
}
