// Optical power on the log scale: dBm ⇄ mW ⇄ µW, dB arithmetic for chains of gains and losses.
// Definition of dBm (common practice): P[dBm] = 10·log10(P / 1 mW); a ratio in dB is 10·log10(P2/P1).
import { InputError, requireNumber } from './errors';

/** Reference power of the dBm scale: 0 dBm ≡ 1 mW (definition of dBm). */
export const DBM_REFERENCE_MW = 1;

/** Decibels per decade of power ratio (definition of the decibel for power quantities). */
export const DB_PER_DECADE = 10;

/**
 * Range of powers accepted, −150 to +90 dBm (1e-15 mW to 1 MW): wider than any fiber receiver floor
 * or high-power fiber laser, and narrow enough that 10^(dBm/10) never underflows or overflows. Common practice.
 */
export const POWER_DBM_MIN = -150;
export const POWER_DBM_MAX = 90;

/** Largest single gain or loss accepted in a chain step, ±300 dB: far beyond any real element. */
export const STEP_DB_LIMIT = 300;

const MW_MIN = 10 ** (POWER_DBM_MIN / DB_PER_DECADE);
const MW_MAX = 10 ** (POWER_DBM_MAX / DB_PER_DECADE);

function requireDbm(argument: string, value: unknown): number {
  return requireNumber(argument, value, {
    min: POWER_DBM_MIN,
    max: POWER_DBM_MAX,
    unit: 'dBm',
  });
}

function requireMw(argument: string, value: unknown, unitFactorToMw: number, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(argument, value, `a positive power in ${unit}`, 'a finite number is needed');
  }
  if (!(value > 0)) {
    throw new InputError(argument, value, `a power greater than 0 ${unit}`, 'a power of zero or less has no dBm value');
  }
  const mw = value * unitFactorToMw;
  if (mw < MW_MIN || mw > MW_MAX) {
    throw new InputError(argument, value, `a power from ${MW_MIN / unitFactorToMw} to ${MW_MAX / unitFactorToMw} ${unit}`);
  }
  return mw;
}

/** P[mW] = 1 mW · 10^(P[dBm]/10). Definition of dBm. */
export function dbmToMw(powerDbm: number): number {
  const p = requireDbm('powerDbm', powerDbm);
  return DBM_REFERENCE_MW * 10 ** (p / DB_PER_DECADE);
}

/** P[dBm] = 10·log10(P[mW] / 1 mW). Definition of dBm. */
export function mwToDbm(powerMw: number): number {
  const mw = requireMw('powerMw', powerMw, 1, 'mW');
  return DB_PER_DECADE * Math.log10(mw / DBM_REFERENCE_MW);
}

const UW_PER_MW = 1000;

/** P[µW] = 1000 · P[mW]. */
export function dbmToUw(powerDbm: number): number {
  return dbmToMw(powerDbm) * UW_PER_MW;
}

/** P[dBm] from P[µW]. */
export function uwToDbm(powerUw: number): number {
  const mw = requireMw('powerUw', powerUw, 1 / UW_PER_MW, 'µW');
  return DB_PER_DECADE * Math.log10(mw / DBM_REFERENCE_MW);
}

/** Power ratio P2/P1 for a change of `gainDb` (negative for a loss). Definition of the decibel. */
export function dbToRatio(gainDb: number): number {
  const g = requireNumber('gainDb', gainDb, { min: -STEP_DB_LIMIT, max: STEP_DB_LIMIT, unit: 'dB' });
  return 10 ** (g / DB_PER_DECADE);
}

/** Change in dB for a power ratio P2/P1 (> 0). Definition of the decibel. */
export function ratioToDb(ratio: number): number {
  if (typeof ratio !== 'number' || !Number.isFinite(ratio) || !(ratio > 0)) {
    throw new InputError('ratio', ratio, 'a power ratio greater than 0', 'a ratio of zero or less has no dB value');
  }
  const db = DB_PER_DECADE * Math.log10(ratio);
  return requireNumber('ratio', db, { min: -STEP_DB_LIMIT, max: STEP_DB_LIMIT, unit: 'dB', hint: 'the ratio is beyond ±300 dB' });
}

/** Power left after a loss: P_out[dBm] = P_in[dBm] − loss[dB]. */
export function powerAfterLossDbm(powerDbm: number, lossDb: number): number {
  const p = requireDbm('powerDbm', powerDbm);
  const l = requireNumber('lossDb', lossDb, { min: -STEP_DB_LIMIT, max: STEP_DB_LIMIT, unit: 'dB' });
  return p - l;
}

/** One step in a chain: a loss (positive lossDb) or, with a negative lossDb, a gain such as an amplifier. */
export interface ChainStep {
  label: string;
  lossDb: number;
}

export interface ChainPoint {
  label: string;
  lossDb: number;
  /** Loss from the start up to and including this step. */
  cumulativeLossDb: number;
  powerDbm: number;
  powerMw: number;
}

export interface ChainResult {
  startDbm: number;
  startMw: number;
  totalLossDb: number;
  endDbm: number;
  endMw: number;
  /** Overall power ratio out/in (linear). */
  overallRatio: number;
  points: ChainPoint[];
}

/**
 * Power along a chain of losses and gains. Losses in dB add (the log of a product of ratios is the sum
 * of the logs: definition of the decibel), so the power after each step is the start power minus the
 * running total. Throws InputError when a power along the way leaves −150…+90 dBm.
 */
export function powerChain(startDbm: number, steps: readonly ChainStep[]): ChainResult {
  const start = requireDbm('startDbm', startDbm);
  if (!Array.isArray(steps)) throw new InputError('steps', steps, 'a list of losses in dB');
  let cumulative = 0;
  const points: ChainPoint[] = steps.map((s, i) => {
    const loss = requireNumber(`steps[${i}].lossDb`, s?.lossDb, { min: -STEP_DB_LIMIT, max: STEP_DB_LIMIT, unit: 'dB' });
    cumulative += loss;
    const p = requireNumber(`power after ${s.label || `step ${i + 1}`}`, start - cumulative, {
      min: POWER_DBM_MIN,
      max: POWER_DBM_MAX,
      unit: 'dBm',
      hint: 'the chain takes the power outside the range this calculator handles',
    });
    return { label: s.label, lossDb: loss, cumulativeLossDb: cumulative, powerDbm: p, powerMw: dbmToMw(p) };
  });
  const endDbm = start - cumulative;
  return {
    startDbm: start,
    startMw: dbmToMw(start),
    totalLossDb: cumulative,
    endDbm,
    endMw: dbmToMw(requireDbm('end power', endDbm)),
    overallRatio: 10 ** (-cumulative / DB_PER_DECADE),
    points,
  };
}

/** Sum of losses in dB of elements in series. */
export function sumDb(lossesDb: readonly number[]): number {
  if (!Array.isArray(lossesDb)) throw new InputError('lossesDb', lossesDb, 'a list of values in dB');
  return lossesDb.reduce<number>(
    (acc, v, i) => acc + requireNumber(`lossesDb[${i}]`, v, { min: -STEP_DB_LIMIT, max: STEP_DB_LIMIT, unit: 'dB' }),
    0,
  );
}
