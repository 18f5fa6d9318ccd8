// Joint loss between two single-mode fibers (splice or connector) in the Gaussian-field picture.
// Each fiber's LP01 field is taken as a Gaussian of spot radius w = MFD/2 (Marcuse 1977).
// The combined case (mismatch + offset + tilt + end gap at once) is the exact overlap of two
// Gaussian beams, evaluated in closed form with complex Gaussian integrals; it is the same
// physics as the general formula of Nemoto & Makimoto 1979 and reduces to each of Marcuse's
// separate formulas when only one imperfection is present (the tests check that).
import { InputError, requireNumber, requireWavelengthNm } from './errors';

/** Index of air for the gap. n = 1.00027 at 1550 nm and room conditions; 1.0 is common practice. */
export const INDEX_AIR = 1.0;
/**
 * Index of a typical index-matching gel. Gels are made to match silica (≈1.44–1.47 over
 * 850–1625 nm, Malitson 1965), so 1.46 is the usual figure. Common practice.
 */
export const INDEX_MATCHING_GEL = 1.46;
/** Fused silica at 1550 nm, Malitson 1965 Sellmeier equation (n = 1.4440). Used as the default fiber index. */
export const SILICA_INDEX_1550NM = 1.444;
/** dB per neper of power: 10 / ln 10. */
export const DB_PER_NEPER = 10 / Math.LN10;
const RAD_PER_DEG = Math.PI / 180;

/** Largest tilt the paraxial Gaussian-beam model is used for. Common practice for small-angle overlap. */
export const MAX_TILT_DEG = 10;
/** Largest end gap accepted: beyond a few mm no connector or splice is being described. */
export const MAX_GAP_UM = 5000;
/** Largest lateral offset accepted (µm): a cladding diameter and more. */
export const MAX_OFFSET_UM = 500;
/** MFD range a single-mode fiber can have (µm). */
const MFD_MAX_UM = 100;
/**
 * Smallest MFD accepted (µm): no guided mode is narrower than about half the wavelength (diffraction limit),
 * and the shortest wavelength accepted is 200 nm. Also keeps w² far from underflow (a 5e-324 µm MFD gave NaN).
 */
export const MFD_MIN_UM = 0.1;

export type JointCause = 'mismatch' | 'offset' | 'tilt' | 'gap' | 'fresnel';

export interface GaussianJointInput {
  /** Mode field diameter of the launching fiber (µm). */
  mfd1Um: number;
  /** Mode field diameter of the receiving fiber (µm). */
  mfd2Um: number;
  wavelengthNm: number;
  /** Distance between the two fiber axes at the joint (µm). Default 0. */
  lateralOffsetUm?: number;
  /**
   * Angle between the two fiber axes (degrees). Default 0. A positive tilt turns the receiving
   * fiber the same way as its offset (outward); the sign only matters when offset and gap are both present.
   */
  tiltDeg?: number;
  /** End gap between the fiber faces along the axis (µm). 0 means physical contact. Default 0. */
  gapUm?: number;
  /** Index of what fills the gap: INDEX_AIR or INDEX_MATCHING_GEL. Default air. */
  mediumIndex?: number;
  /**
   * Index of the fiber glass at the end faces. Used for the Fresnel loss of a gap, and for the tilt term when
   * there is no gap (gapUm = 0: glass on both sides, so the tilt phase builds up in glass). Default SILICA_INDEX_1550NM.
   */
  fiberIndex?: number;
}

export interface FresnelLoss {
  /** Power reflectance of one face: ((n_f − n_m)/(n_f + n_m))². */
  reflectancePerSurface: number;
  /** Loss of two faces taken once each, reflections not re-added: −10 log10 (1 − R)². */
  lossDb: number;
  /**
   * The two faces form an etalon. With coherent light and a gap stable to a fraction of a wavelength
   * the loss swings with gap width between these two values; incoherent light or a drifting gap averages
   * close to lossDb. Airy function of a two-surface Fabry–Perot (Born & Wolf 1999, §7.6.1).
   */
  etalonMinLossDb: number;
  etalonMaxLossDb: number;
}

export interface JointLossResult {
  /** Loss of the joint: combined Gaussian overlap plus the Fresnel loss when there is a gap. */
  totalLossDb: number;
  /** Overlap (mode coupling) part of the loss, all imperfections at once. */
  couplingLossDb: number;
  /** Each imperfection alone, the others set to zero (dB, never negative). */
  contributions: Record<JointCause, number>;
  /** The largest single contribution, or 'none' when all are below 0.001 dB. */
  dominant: JointCause | 'none';
  /** Sum of the separate contributions; differs from totalLossDb when effects interact (offset with gap). */
  sumOfSeparateDb: number;
  /** Spot radii w1, w2 (µm) used. */
  spotRadius1Um: number;
  spotRadius2Um: number;
}

/** Below this a contribution is reported as "none dominates". */
const NEGLIGIBLE_DB = 1e-3;

/** Fresnel loss of the two end faces of a gap: R = ((n1 − n2)/(n1 + n2))² (Born & Wolf 1999, eq. 1.5.(21a) at normal incidence). */
export function fresnelLoss(fiberIndex: number = SILICA_INDEX_1550NM, mediumIndex: number = INDEX_AIR): FresnelLoss {
  const nf = requireNumber('fiberIndex', fiberIndex, { min: 1, max: 4 });
  const nm = requireNumber('mediumIndex', mediumIndex, { min: 1, max: 4 });
  const r = ((nf - nm) / (nf + nm)) ** 2;
  const lossDb = -2 * 10 * Math.log10(1 - r);
  // Airy transmission of two equal faces: T = (1−R)² / ((1−R)² + 4R sin²(δ/2)), δ the round-trip phase.
  // δ = 0 gives T = 1; δ = π gives T = ((1−R)/(1+R))².
  const etalonMaxLossDb = -20 * Math.log10((1 - r) / (1 + r));
  return { reflectancePerSurface: r, lossDb: Math.max(0, lossDb), etalonMinLossDb: 0, etalonMaxLossDb: Math.max(0, etalonMaxLossDb) };
}

interface Normalised {
  w1: number;
  w2: number;
  d: number;
  thetaRad: number;
  gap: number;
  medium: number;
  fiber: number;
  /** k in the gap medium (rad/µm): diffraction across the gap. */
  k: number;
  /**
   * k of whatever the tilted wavefront crosses (rad/µm): the gap medium when there is a gap, the glass when
   * the faces touch (a fusion splice or physical contact has no air in the light's path).
   */
  kTilt: number;
}

/**
 * Index the tilt term uses: the glass when the faces touch (gap 0), the gap medium otherwise. The tilt phase
 * k·θ·x is set by the medium in which the two tilted wavefronts meet (Marcuse 1977, tilt formula with n the
 * index of that medium); with no gap that medium is the fiber glass.
 */
export function tiltMediumIndex(input: { gapUm?: number; mediumIndex?: number; fiberIndex?: number }): number {
  const gap = requireNumber('gapUm', input?.gapUm ?? 0, { min: 0, max: MAX_GAP_UM, unit: 'µm' });
  const medium = requireNumber('mediumIndex', input?.mediumIndex ?? INDEX_AIR, { min: 1, max: 2 });
  const fiber = requireNumber('fiberIndex', input?.fiberIndex ?? SILICA_INDEX_1550NM, { min: 1, max: 2 });
  return gap > 0 ? medium : fiber;
}

function normalise(input: GaussianJointInput): Normalised {
  if (input === null || typeof input !== 'object') throw new InputError('joint', input, 'an object with mfd1Um, mfd2Um, wavelengthNm');
  const mfd1 = requireNumber('mfd1Um', input.mfd1Um, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' });
  const mfd2 = requireNumber('mfd2Um', input.mfd2Um, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' });
  const lambdaNm = requireWavelengthNm('wavelengthNm', input.wavelengthNm);
  const d = requireNumber('lateralOffsetUm', input.lateralOffsetUm ?? 0, { min: 0, max: MAX_OFFSET_UM, unit: 'µm' });
  const tilt = requireNumber('tiltDeg', input.tiltDeg ?? 0, { min: -MAX_TILT_DEG, max: MAX_TILT_DEG, unit: '°', hint: 'the Gaussian model is paraxial' });
  const gap = requireNumber('gapUm', input.gapUm ?? 0, { min: 0, max: MAX_GAP_UM, unit: 'µm' });
  const medium = requireNumber('mediumIndex', input.mediumIndex ?? INDEX_AIR, { min: 1, max: 2 });
  const fiber = requireNumber('fiberIndex', input.fiberIndex ?? SILICA_INDEX_1550NM, { min: 1, max: 2 });
  const lambdaUm = lambdaNm / 1000;
  const tiltIndex = gap > 0 ? medium : fiber;
  return {
    w1: mfd1 / 2,
    w2: mfd2 / 2,
    d,
    thetaRad: tilt * RAD_PER_DEG,
    gap,
    medium,
    fiber,
    k: (2 * Math.PI * medium) / lambdaUm,
    kTilt: (2 * Math.PI * tiltIndex) / lambdaUm,
  };
}

/**
 * Natural log of the power coupling of Gaussian beam 1 (waist w1 at its fiber face) into the Gaussian
 * mode of fiber 2 (waist w2 at its face, a gap s further on, offset d and tilted θ in the x–z plane).
 * Per transverse axis, ∫exp(−A x² + B x + C) dx = √(π/A) exp(B²/4A + C); the x axis carries offset and tilt,
 * the y axis only mismatch and gap. Kept as a log so huge losses stay finite (no underflow to 0).
 */
function lnGaussianCoupling(p: Normalised): number {
  // Beam 1 after the gap: exp(−a1 x²), a1 = 1/(w1² (1 − i s/zR)), zR = k w1²/2 (Kogelnik & Li 1966).
  const zR = (p.k * p.w1 * p.w1) / 2;
  const t = p.gap / zR;
  const den = p.w1 * p.w1 * (1 + t * t);
  const a1Re = 1 / den;
  const a1Im = t / den;
  const c2 = 1 / (p.w2 * p.w2);
  // A = a1 + 1/w2² (complex), B = 2d/w2² + i kθ, C = −d²/w2². With a gap, kTilt = k (the gap medium); without
  // one the gap terms vanish (t = 0) and kTilt is the glass's.
  const aRe = a1Re + c2;
  const aIm = a1Im;
  const aAbs = Math.hypot(aRe, aIm);
  const bRe = 2 * p.d * c2;
  const bIm = p.kTilt * p.thetaRad;
  // B²/(4A): B² = (bRe² − bIm²) + 2i bRe bIm; divide by 4A.
  const b2Re = bRe * bRe - bIm * bIm;
  const b2Im = 2 * bRe * bIm;
  const q = 4 * aAbs * aAbs;
  const ratioRe = (b2Re * aRe + b2Im * aIm) / q;
  const exponentX = 2 * (ratioRe - p.d * p.d * c2);
  // Each axis: |√(π/A)|² / (‖u1‖² ‖u2‖²) = 2 √(Re a1) / (|A| w2).
  const lnAxis = Math.log((2 * Math.sqrt(a1Re)) / (aAbs * p.w2));
  return exponentX + 2 * lnAxis;
}

function lossFromLn(lnT: number): number {
  // Rounding can leave −1e−16 for a perfect joint; a joint never gains.
  return Math.max(0, -DB_PER_NEPER * lnT);
}

/** MFD mismatch alone: T = (2 w1 w2 / (w1² + w2²))² (Marcuse 1977, BSTJ 56(5), eq. 10 form; exact for Gaussians). */
export function mfdMismatchLossDb(mfd1Um: number, mfd2Um: number): number {
  const w1 = requireNumber('mfd1Um', mfd1Um, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' }) / 2;
  const w2 = requireNumber('mfd2Um', mfd2Um, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' }) / 2;
  return lossFromLn(2 * Math.log((2 * w1 * w2) / (w1 * w1 + w2 * w2)));
}

/** Lateral offset alone (the mismatch factor kept apart): T = exp(−2 d² / (w1² + w2²)) (Marcuse 1977); equal fields: 4.34 (d/w)² dB. */
export function lateralOffsetLossDb(mfd1Um: number, mfd2Um: number, lateralOffsetUm: number): number {
  const w1 = requireNumber('mfd1Um', mfd1Um, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' }) / 2;
  const w2 = requireNumber('mfd2Um', mfd2Um, { min: MFD_MIN_UM, max: MFD_MAX_UM, unit: 'µm' }) / 2;
  const d = requireNumber('lateralOffsetUm', lateralOffsetUm, { min: 0, max: MAX_OFFSET_UM, unit: 'µm' });
  return lossFromLn((-2 * d * d) / (w1 * w1 + w2 * w2));
}

/**
 * Tilt alone (the mismatch factor kept apart): T = exp(−k² θ² w1² w2² / (2 (w1² + w2²))), k = 2π n/λ with n the
 * index of the medium the tilted fields meet in; for equal fields exp(−(π n w θ/λ)²) (Marcuse 1977, BSTJ 56(5),
 * tilt formula; paraxial, θ ≲ 10°). With no gap that medium is the glass: the default is SILICA_INDEX_1550NM;
 * pass tiltMediumIndex(…) for a joint with a gap.
 */
export function tiltLossDb(mfd1Um: number, mfd2Um: number, tiltDeg: number, wavelengthNm: number, mediumIndex: number = SILICA_INDEX_1550NM): number {
  // No gap here: the medium given is the one the tilt happens in, passed as the "fiber" index of a touching joint.
  const p = normalise({ mfd1Um, mfd2Um, tiltDeg, wavelengthNm, fiberIndex: mediumIndex });
  const w1s = p.w1 * p.w1;
  const w2s = p.w2 * p.w2;
  return lossFromLn(-(p.kTilt * p.kTilt * p.thetaRad * p.thetaRad * w1s * w2s) / (2 * (w1s + w2s)));
}

/**
 * End gap alone (diffraction only, no Fresnel), as the excess over the mismatch loss:
 * T_gap = 1 / (1 + (λ s / (π n (w1² + w2²)))²); equal fields 1 / (1 + (λ s / (2π n w²))²)
 * (Marcuse 1977, BSTJ 56(5), gap formula; the mismatch factor 4w1²w2²/(w1²+w2²)² is kept apart).
 */
export function endGapLossDb(mfd1Um: number, mfd2Um: number, gapUm: number, wavelengthNm: number, mediumIndex: number = INDEX_AIR): number {
  const p = normalise({ mfd1Um, mfd2Um, gapUm, wavelengthNm, mediumIndex });
  const g = (2 * p.gap) / (p.k * (p.w1 * p.w1 + p.w2 * p.w2)); // λ s / (π n (w1² + w2²))
  return lossFromLn(-Math.log1p(g * g));
}

/**
 * Gaussian-field joint loss with every imperfection at once, each one alone, and which dominates.
 * Model: Gaussian LP01 fields (Marcuse 1977), paraxial beam in the gap (Kogelnik & Li 1966), Fresnel loss of
 * two faces added when the gap is open (assumption: reflections not re-added; see FresnelLoss for the etalon range).
 */
export function gaussianJointLoss(input: GaussianJointInput): JointLossResult {
  const p = normalise(input);
  const couplingLossDb = lossFromLn(lnGaussianCoupling(p));
  const tiltIndex = p.gap > 0 ? p.medium : p.fiber;
  const mfd1Um = 2 * p.w1;
  const mfd2Um = 2 * p.w2;
  const wavelengthNm = input.wavelengthNm;
  const fresnelDb = p.gap > 0 ? fresnelLoss(p.fiber, p.medium).lossDb : 0;
  const contributions: Record<JointCause, number> = {
    mismatch: mfdMismatchLossDb(mfd1Um, mfd2Um),
    offset: lateralOffsetLossDb(mfd1Um, mfd2Um, p.d),
    tilt: tiltLossDb(mfd1Um, mfd2Um, p.thetaRad / RAD_PER_DEG, wavelengthNm, tiltIndex),
    gap: endGapLossDb(mfd1Um, mfd2Um, p.gap, wavelengthNm, p.medium),
    fresnel: fresnelDb,
  };
  let dominant: JointCause | 'none' = 'none';
  let largest = NEGLIGIBLE_DB;
  for (const key of Object.keys(contributions) as JointCause[]) {
    if (contributions[key] > largest) {
      largest = contributions[key];
      dominant = key;
    }
  }
  const sumOfSeparateDb = Object.values(contributions).reduce((s, v) => s + v, 0);
  return {
    totalLossDb: couplingLossDb + fresnelDb,
    couplingLossDb,
    contributions,
    dominant,
    sumOfSeparateDb,
    spotRadius1Um: p.w1,
    spotRadius2Um: p.w2,
  };
}
