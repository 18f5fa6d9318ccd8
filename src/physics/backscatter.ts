// Rayleigh backscatter of a single-mode fiber: how much of the scattered light the mode catches again (capture
// fraction), the backscatter level an OTDR sees for a pulse width, the return loss of a length of fiber, and the
// one-way "gainer" error at a joint between two fibers of different mode field diameter.
//
// Rayleigh scattering sends a small share α_s of the light in every metre off in all directions; the fiber's own mode
// catches back a fraction S of it. For a Gaussian mode of spot radius w (MFD/2) in glass of index n,
//   S = 3 / (2·(n·k·w)²),  k = 2π/λ        (Brinkmeyer 1980, JOSA 70(8), Gaussian-mode capture fraction;
//                                           the factor 3/2 is the dipole pattern of Rayleigh scattering)
// so S ∝ 1/w², as in src/physics/otdr.ts. A pulse of width τ lights a length v_g·τ/2 of fiber at once, so the power
// returning right after launch is P_bs/P_0 = S·α_s·v_g·τ/2 (Personick 1977, BSTJ 56(3), backscatter of a pulse).
// The check value the trade uses, about −82 dB for 1 ns at 1550 nm on standard fiber, is "from practice".
import { InputError, requireNumber, requireWavelengthNm } from './errors';
import { DB_PER_NEPER, MFD_MIN_UM } from './jointLoss';
import { GROUP_INDEX_MAX, GROUP_INDEX_MIN, pulseSpatialExtent } from './otdrSetup';

const MFD_MAX_UM = 100;
const M_PER_KM = 1000;
const UM_PER_NM = 1e-3;
/** Refractive index of the glass for the capture fraction: a silica core near 1.46 (common practice). */
export const BACKSCATTER_DEFAULT_FIBER_INDEX = 1.46;
/**
 * Rayleigh scattering coefficient A of a germania-doped standard single-mode fiber, α_s = A/λ⁴ (λ in µm):
 * about 0.9 dB·µm⁴/km (typical, from memory: pure silica is near 0.7–0.8; this gives 0.16 dB/km at 1550 nm).
 */
export const TYPICAL_RAYLEIGH_DB_UM4_PER_KM = 0.9;
/** Largest scattering or attenuation accepted (dB/km): far above any fiber, below numbers that lose meaning. */
export const MAX_FIBER_LOSS_DB_PER_KM = 100;
/** Smallest scattering loss accepted (dB/km): a millionth of any real fiber's, and far from underflow (a subnormal gave −Infinity dB). */
export const MIN_SCATTERING_DB_PER_KM = 1e-6;
/** Shortest length for a backscatter return loss (km): 1 mm. */
export const MIN_BACKSCATTER_LENGTH_KM = 1e-6;

function requireIndex(argument: string, value: unknown): number {
  return requireNumber(argument, value ?? BACKSCATTER_DEFAULT_FIBER_INDEX, { min: GROUP_INDEX_MIN, max: GROUP_INDEX_MAX });
}

export interface CaptureFraction {
  /** Share of the light scattered at a point that the guided mode carries back, 0–1. */
  fraction: number;
  /** The same in dB (negative): 10·log10 S. */
  fractionDb: number;
  /** Spot radius w = MFD/2 used (µm). */
  spotRadiusUm: number;
}

/** Capture fraction S = 3/(2 (n k w)²) of a Gaussian mode (Brinkmeyer 1980, JOSA 70(8)); w = MFD/2. */
export function backscatterCaptureFraction(input: { mfdUm: number; wavelengthNm: number; fiberIndex?: number }): CaptureFraction {
  const mfd = requireNumber('mfdUm', input?.mfdUm, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' });
  const lambdaUm = requireWavelengthNm('wavelengthNm', input?.wavelengthNm) * UM_PER_NM;
  const n = requireIndex('fiberIndex', input?.fiberIndex);
  const w = mfd / 2;
  const nkw = (2 * Math.PI * n * w) / lambdaUm;
  if (nkw < 2) {
    // S ≤ 3/8 already means a spot comparable to the wavelength: outside the Gaussian, weakly guiding picture.
    throw new InputError('mfdUm', mfd, `a mode field diameter well above the wavelength (over ${((2 * 2 * lambdaUm) / (2 * Math.PI * n)).toFixed(2)} µm here)`);
  }
  const fraction = 3 / (2 * nkw * nkw);
  return { fraction, fractionDb: 10 * Math.log10(fraction), spotRadiusUm: w };
}

/** Rayleigh scattering loss α_s = A / λ⁴ (dB/km; λ in µm), the λ⁻⁴ law of Rayleigh scattering. */
export function rayleighScatteringDbPerKm(input: { wavelengthNm: number; coefficientDbUm4PerKm?: number }): number {
  const lambdaUm = requireWavelengthNm('wavelengthNm', input?.wavelengthNm) * UM_PER_NM;
  const a = requireNumber('coefficientDbUm4PerKm', input?.coefficientDbUm4PerKm ?? TYPICAL_RAYLEIGH_DB_UM4_PER_KM, { min: 0.01, max: 20, unit: 'dB·µm⁴/km' });
  const loss = a / lambdaUm ** 4;
  if (loss > MAX_FIBER_LOSS_DB_PER_KM) throw new InputError('wavelengthNm', lambdaUm / UM_PER_NM, `a wavelength where scattering stays below ${MAX_FIBER_LOSS_DB_PER_KM} dB/km`);
  return loss;
}

export interface BackscatterInput {
  mfdUm: number;
  wavelengthNm: number;
  /** Rayleigh scattering loss at this wavelength (dB/km). */
  scatteringDbPerKm: number;
  pulseWidthNs: number;
  groupIndex: number;
  fiberIndex?: number;
}

export interface BackscatterLevel {
  captureFraction: number;
  captureFractionDb: number;
  /** α_s in 1/m (power). */
  scatteringPerM: number;
  /** Δz = c·τ/(2 n_g) (m). */
  spatialExtentM: number;
  /** Backscatter level right after launch relative to the launched pulse power, 10·log10(S·α_s·Δz) (dB, negative). */
  levelDb: number;
  /** The same fiber's level for a 1 ns pulse: the "backscatter coefficient" OTDRs ask for (dB). */
  coefficientDb1ns: number;
}

/** Backscatter level P_bs/P_0 = S·α_s·Δz for a pulse (Personick 1977, BSTJ 56(3)); S from Brinkmeyer 1980. */
export function backscatterLevel(input: BackscatterInput): BackscatterLevel {
  const s = backscatterCaptureFraction({ mfdUm: input?.mfdUm, wavelengthNm: input?.wavelengthNm, fiberIndex: input?.fiberIndex });
  const scatter = requireNumber('scatteringDbPerKm', input.scatteringDbPerKm, { min: MIN_SCATTERING_DB_PER_KM, max: MAX_FIBER_LOSS_DB_PER_KM, unit: 'dB/km' });
  const extent = pulseSpatialExtent({ pulseWidthNs: input.pulseWidthNs, groupIndex: input.groupIndex });
  const scatteringPerM = scatter / DB_PER_NEPER / M_PER_KM;
  const oneNs = pulseSpatialExtent({ pulseWidthNs: 1, groupIndex: input.groupIndex }).twoPointResolutionM;
  const level = (dz: number) => 10 * Math.log10(s.fraction * scatteringPerM * dz);
  return {
    captureFraction: s.fraction,
    captureFractionDb: s.fractionDb,
    scatteringPerM,
    spatialExtentM: extent.twoPointResolutionM,
    levelDb: level(extent.twoPointResolutionM),
    coefficientDb1ns: level(oneNs),
  };
}

export interface BackscatterReturnLoss {
  /** Return loss of the length (dB, positive): −10·log10 of the backscattered share. */
  returnLossDb: number;
  /** Return loss of an endless fiber of the same kind (dB): the limit the length approaches. */
  limitDb: number;
  /** Backscattered share of the launched power (fraction). */
  reflectedFraction: number;
  /** Length at which the return loss is within 0.1 dB of its limit (km). */
  nearLimitKm: number;
}

/**
 * Rayleigh backscatter return loss of a length L: ∫₀ᴸ S·α_s·e^(−2αz) dz = S·α_s·(1 − e^(−2αL))/(2α), α the total
 * attenuation (integral of the backscatter of each metre, Personick 1977; S from Brinkmeyer 1980). Grows with L toward
 * S·α_s/(2α).
 */
export function backscatterReturnLoss(input: { mfdUm: number; wavelengthNm: number; scatteringDbPerKm: number; attenuationDbPerKm: number; lengthKm: number; fiberIndex?: number }): BackscatterReturnLoss {
  const s = backscatterCaptureFraction({ mfdUm: input?.mfdUm, wavelengthNm: input?.wavelengthNm, fiberIndex: input?.fiberIndex }).fraction;
  const scatter = requireNumber('scatteringDbPerKm', input.scatteringDbPerKm, { min: MIN_SCATTERING_DB_PER_KM, max: MAX_FIBER_LOSS_DB_PER_KM, unit: 'dB/km' });
  const atten = requireNumber('attenuationDbPerKm', input.attenuationDbPerKm, { min: scatter, max: MAX_FIBER_LOSS_DB_PER_KM, unit: 'dB/km', hint: 'the total attenuation includes the scattering loss, so it cannot be smaller' });
  const lengthKm = requireNumber('lengthKm', input.lengthKm, { min: MIN_BACKSCATTER_LENGTH_KM, max: 1000, unit: 'km' });
  const alphaPerKm = atten / DB_PER_NEPER; // power attenuation, 1/km
  const alphaSPerKm = scatter / DB_PER_NEPER;
  const limitFraction = (s * alphaSPerKm) / (2 * alphaPerKm);
  const reflectedFraction = limitFraction * -Math.expm1(-2 * alphaPerKm * lengthKm);
  // Within 0.1 dB of the limit: 1 − e^(−2αL) = 10^(−0.01) → L = −ln(1 − 10^(−0.01)) / (2α).
  const nearLimitKm = -Math.log(1 - 10 ** -0.01) / (2 * alphaPerKm);
  return { returnLossDb: -10 * Math.log10(reflectedFraction), limitDb: -10 * Math.log10(limitFraction), reflectedFraction, nearLimitKm };
}

export interface GainerError {
  /** Backscatter level of fiber B minus fiber A at the same power (dB, round trip). */
  levelDifferenceDb: number;
  /** Error added to the splice reading taken from the A end (dB, one-way scale; negative shows as a gain). */
  errorFromADb: number;
  /** Error added to the reading from the B end: the opposite sign. */
  errorFromBDb: number;
}

/**
 * One-way OTDR error at a joint from fiber A into fiber B: half the round-trip change of backscatter level,
 * 5·log10((S_A·α_sA)/(S_B·α_sB)), with S from the two MFDs (Brinkmeyer 1980; Hartog & Gold 1984, JLT 2(2)). This is the
 * same step that src/physics/otdr.ts adds to the true loss; the two are checked against each other in the tests.
 */
export function gainerError(input: { mfdAUm: number; mfdBUm: number; wavelengthNm: number; scatteringRatioBA?: number }): GainerError {
  const sa = backscatterCaptureFraction({ mfdUm: input?.mfdAUm, wavelengthNm: input?.wavelengthNm }).fraction;
  const sb = backscatterCaptureFraction({ mfdUm: input?.mfdBUm, wavelengthNm: input?.wavelengthNm }).fraction;
  const ratio = requireNumber('scatteringRatioBA', input.scatteringRatioBA ?? 1, { min: 0.1, max: 10 });
  const levelDifferenceDb = 10 * Math.log10((sb * ratio) / sa);
  return { levelDifferenceDb, errorFromADb: -levelDifferenceDb / 2, errorFromBDb: levelDifferenceDb / 2 };
}
