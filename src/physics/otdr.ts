// What an OTDR shows at a splice between two unlike single-mode fibers, and how to get the true loss back.
//
// Why a "gainer" appears: an OTDR does not measure the light that crosses the splice; it measures the light
// scattered back from each point of the fiber and recaptured by the fiber's own mode. The fraction recaptured
// (the capture fraction) is inversely proportional to the mode area, S ∝ 1/w² (Brinkmeyer 1980). A fiber
// with a smaller MFD sends back more light per metre. Going from a large-MFD fiber into a small-MFD fiber,
// the backscatter level jumps up after the splice by more than the splice loss pulls it down: the trace
// rises and the splice reads as a gain. From the other end the same step adds to the loss. The true loss
// is the same both ways, so averaging the two directional readings cancels the backscatter step.
import { requireNumber } from './errors';
import { MFD_MIN_UM, mfdMismatchLossDb } from './jointLoss';

const MFD_MAX_UM = 100;
/** Largest directional reading accepted (dB): anything beyond is a break, not a splice. */
export const MAX_OTDR_READING_DB = 30;

export interface OtdrSpliceInput {
  /** MFD of the fiber on the side where the OTDR is first connected ("A end"), µm. */
  mfdAUm: number;
  /** MFD of the fiber beyond the splice ("B end"), µm. */
  mfdBUm: number;
  /** Loss beyond the MFD mismatch (offset, tilt, …) the splice really has, dB. Default 0. */
  extraLossDb?: number;
  /**
   * Ratio of the Rayleigh scattering coefficients, fiber B over fiber A. Default 1: the same glass on both
   * sides. Different doping changes it; it enters exactly like the capture-fraction ratio (Hartog & Gold 1984).
   */
  rayleighRatioBA?: number;
}

export interface OtdrSpliceReading {
  /** The loss the light really suffers crossing the splice: MFD mismatch (Marcuse 1977) + extraLossDb. */
  trueLossDb: number;
  /** Part of the true loss due to the MFD mismatch alone. */
  mismatchLossDb: number;
  /** What the OTDR shows measuring from the A end (negative = a "gainer"). */
  apparentFromADb: number;
  /** What the OTDR shows measuring from the B end. */
  apparentFromBDb: number;
  /** One-way backscatter step 5 log10(S_A/S_B): added from A, taken away from B. */
  backscatterStepDb: number;
  /** True when either directional reading is below zero. */
  showsGainer: boolean;
}

/**
 * Apparent splice loss in each direction. One-way trace step from A: L + 5 log10(S_A α_A / (S_B α_B)), with
 * capture fraction S ∝ 1/w² (Brinkmeyer 1980, JOSA 70(8)), so the MFD term is 10 log10(w_B/w_A);
 * from B the sign flips (Hartog & Gold 1984, JLT 2(2); bidirectional averaging as in ITU-T G.650.3 (03/2008)).
 */
export function otdrSpliceReading(input: OtdrSpliceInput): OtdrSpliceReading {
  const mfdA = requireNumber('mfdAUm', input?.mfdAUm, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' });
  const mfdB = requireNumber('mfdBUm', input?.mfdBUm, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' });
  const extra = requireNumber('extraLossDb', input?.extraLossDb ?? 0, { min: 0, max: MAX_OTDR_READING_DB, unit: 'dB' });
  const rayleigh = requireNumber('rayleighRatioBA', input?.rayleighRatioBA ?? 1, { min: 0.1, max: 10 }); // symmetric about 1; a subnormal ratio gave Infinity
  const mismatchLossDb = mfdMismatchLossDb(mfdA, mfdB);
  const trueLossDb = mismatchLossDb + extra;
  // S_A/S_B = (w_B/w_A)²; α_A/α_B = 1/rayleigh. Half of the round-trip dB shows on a one-way scale.
  const backscatterStepDb = 5 * Math.log10((mfdB / mfdA) ** 2 / rayleigh);
  const apparentFromADb = trueLossDb + backscatterStepDb;
  const apparentFromBDb = trueLossDb - backscatterStepDb;
  return {
    trueLossDb,
    mismatchLossDb,
    apparentFromADb,
    apparentFromBDb,
    backscatterStepDb,
    showsGainer: apparentFromADb < 0 || apparentFromBDb < 0,
  };
}

export interface OtdrTwoWayResult {
  /** (reading from A + reading from B) / 2: the backscatter step cancels (ITU-T G.650.3 (03/2008), common practice). */
  trueLossDb: number;
  /** (reading from A − reading from B) / 2: the backscatter step seen from A. */
  backscatterStepDb: number;
  /**
   * MFD ratio w_B / w_A implied by the step, 10^(step/10), assuming the same Rayleigh coefficient on both
   * sides (the capture-fraction model of Brinkmeyer 1980).
   */
  impliedMfdRatioBA: number;
  /** True when one of the two readings was a gain. */
  hadGainer: boolean;
  /**
   * False when the average is below zero: no passive splice gains, so the two readings do not belong to the
   * same splice or one of them is mis-read (wrong event, different pulse width or index setting).
   */
  consistent: boolean;
}

/** From two directional OTDR readings of the same splice to the true loss. */
export function otdrTwoWayAverage(fromADb: number, fromBDb: number): OtdrTwoWayResult {
  const range = { min: -MAX_OTDR_READING_DB, max: MAX_OTDR_READING_DB, unit: 'dB' };
  const a = requireNumber('fromADb', fromADb, range);
  const b = requireNumber('fromBDb', fromBDb, range);
  const backscatterStepDb = (a - b) / 2;
  return {
    trueLossDb: (a + b) / 2,
    backscatterStepDb,
    impliedMfdRatioBA: 10 ** (backscatterStepDb / 10),
    hadGainer: a < 0 || b < 0,
    consistent: a + b >= 0,
  };
}
