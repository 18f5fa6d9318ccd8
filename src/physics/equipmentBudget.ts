// Does a link fit the equipment? The equipment is described either by its power budget in dB (what a
// data sheet or a PON class states) or by its transmitter and receiver levels in dBm. The power budget
// is the weakest transmitter power minus the receiver sensitivity (common practice; the decibel makes
// it a difference). What is left after the highest link loss and the design margin is the spare:
// spare = budget − highest loss − design margin (definition of the decibel: losses in series add).
// With levels, the strongest transmitter through the lowest loss must also stay below the receiver
// overload; with a budget alone that check cannot be made, and the result says so.
import { InputError, requireNumber } from './errors';

/** dBm range accepted for transmitter and receiver levels (same as the link budget's equipment check). */
export const EQUIPMENT_DBM_MIN = -100;
export const EQUIPMENT_DBM_MAX = 60;
/** Largest equipment power budget and design margin accepted: beyond it the entry is surely a slip (common practice). */
export const MAX_POWER_BUDGET_DB = 100;
/** Largest link loss accepted: far beyond any power budget, so a link this lossy is simply short. */
export const MAX_LINK_LOSS_DB = 10_000;

export type EquipmentLimits =
  | { kind: 'budget'; powerBudgetDb: number }
  | { kind: 'levels'; txMinDbm: number; txMaxDbm: number; rxSensitivityDbm: number; rxOverloadDbm: number };

/**
 * fits: at least the design margin is left. no-margin: the receiver gets enough, but the design
 * margin is not all there. short: the highest loss exceeds the power budget. overload: the strongest
 * signal exceeds the receiver overload (checked with levels only).
 */
export type FitVerdict = 'fits' | 'no-margin' | 'short' | 'overload';

export interface EquipmentFit {
  verdict: FitVerdict;
  /** Weakest transmitter minus receiver sensitivity, or the budget as entered. */
  powerBudgetDb: number;
  /** Budget − highest loss − design margin; negative when the margin (or more) is missing. */
  spareDb: number;
  /** Highest loss − budget when the link is short (> 0), else 0. */
  shortDb: number;
  /** How much the strongest signal exceeds the receiver overload (> 0 when overloaded), else 0; undefined without levels. */
  overloadDb?: number;
  /** Weakest and strongest signal at the receiver, dBm; undefined without levels. */
  weakestRxDbm?: number;
  strongestRxDbm?: number;
}

/** Checks a link of `lowestLossDb` … `highestLossDb` against the equipment, keeping `designMarginDb` in hand. */
export function equipmentFit(input: { limits: EquipmentLimits; lowestLossDb: number; highestLossDb: number; designMarginDb: number }): EquipmentFit {
  const lowestLossDb = requireNumber('lowestLossDb', input?.lowestLossDb, { min: 0, max: MAX_LINK_LOSS_DB, unit: 'dB' });
  const highestLossDb = requireNumber('highestLossDb', input?.highestLossDb, { min: lowestLossDb, max: MAX_LINK_LOSS_DB, unit: 'dB' });
  const designMarginDb = requireNumber('designMarginDb', input?.designMarginDb, { min: 0, max: MAX_POWER_BUDGET_DB, unit: 'dB' });
  const limits = input?.limits;
  let powerBudgetDb: number;
  let overloadDb: number | undefined;
  let weakestRxDbm: number | undefined;
  let strongestRxDbm: number | undefined;
  if (limits?.kind === 'budget') {
    powerBudgetDb = requireNumber('powerBudgetDb', limits.powerBudgetDb, { min: 0, max: MAX_POWER_BUDGET_DB, unit: 'dB' });
  } else if (limits?.kind === 'levels') {
    const p = { min: EQUIPMENT_DBM_MIN, max: EQUIPMENT_DBM_MAX, unit: 'dBm' };
    const txMinDbm = requireNumber('txMinDbm', limits.txMinDbm, p);
    const txMaxDbm = requireNumber('txMaxDbm', limits.txMaxDbm, p);
    const rxSensitivityDbm = requireNumber('rxSensitivityDbm', limits.rxSensitivityDbm, p);
    const rxOverloadDbm = requireNumber('rxOverloadDbm', limits.rxOverloadDbm, p);
    if (txMinDbm > txMaxDbm) throw new InputError('txMinDbm', txMinDbm, `at most the highest transmitter power (${txMaxDbm} dBm)`, 'lowest and highest are swapped');
    if (rxSensitivityDbm >= rxOverloadDbm) throw new InputError('rxSensitivityDbm', rxSensitivityDbm, `below the receiver overload (${rxOverloadDbm} dBm)`, 'sensitivity and overload are swapped');
    powerBudgetDb = txMinDbm - rxSensitivityDbm;
    weakestRxDbm = txMinDbm - highestLossDb;
    strongestRxDbm = txMaxDbm - lowestLossDb;
    overloadDb = Math.max(0, strongestRxDbm - rxOverloadDbm);
  } else {
    throw new InputError('limits', limits, 'a power budget in dB, or transmitter and receiver levels in dBm');
  }
  const spareDb = powerBudgetDb - highestLossDb - designMarginDb;
  const shortDb = Math.max(0, highestLossDb - powerBudgetDb);
  const verdict: FitVerdict = shortDb > 0 ? 'short' : overloadDb !== undefined && overloadDb > 0 ? 'overload' : spareDb < 0 ? 'no-margin' : 'fits';
  return { verdict, powerBudgetDb, spareDb, shortDb, overloadDb, weakestRxDbm, strongestRxDbm };
}
