// Reflections in a link: a glass face, an air gap between two faces (an etalon), index-matching gel, typical connector
// polishes, and the total optical return loss (ORL) of a link from its reflections and its backscatter.
//
// The trade uses two numbers for one thing and mixes their signs:
//   reflectance  R_dB  = 10·log10(P_reflected / P_incident)   negative, e.g. −55 dB  (ITU-T G.650.3 / IEC usage)
//   return loss  RL_dB = 10·log10(P_incident / P_reflected)   positive, e.g.  55 dB  (IEC 61300-3-6: "a positive number")
// Every result here carries both, named, so a screen can show them side by side.
import { InputError, requireNumber, requireWavelengthNm } from './errors';
import { fresnelLoss, INDEX_AIR, INDEX_MATCHING_GEL } from './jointLoss';

/** Index of the fiber glass at its end face for reflections: a germania-doped core near 1.468 at 1550 nm (common practice). */
export const FIBER_FACE_INDEX = 1.468;
/** Smallest reflected share expressed (1e-30 = −300 dB): below it a number means nothing and logs would run away. */
const MIN_FRACTION = 1e-30;

export interface Reflection {
  /** Reflected share of the incident power, 0–1. */
  fraction: number;
  /** Reflectance, negative dB: 10·log10(fraction). */
  reflectanceDb: number;
  /** Return loss, positive dB: −10·log10(fraction). */
  returnLossDb: number;
}

/** The same reflection as a fraction, a reflectance (negative dB) and a return loss (positive dB). */
export function reflectionFromFraction(fraction: number): Reflection {
  const f = Math.max(MIN_FRACTION, requireNumber('fraction', fraction, { min: 0, max: 1 }));
  const reflectanceDb = 10 * Math.log10(f);
  return { fraction: f, reflectanceDb, returnLossDb: -reflectanceDb };
}

/** A reflectance typed in dB, either sign (−45 or 45 both mean "45 dB down"), as a reflection. */
export function reflectionFromDb(db: number): Reflection {
  const v = requireNumber('reflectanceDb', db, { min: -300, max: 300, unit: 'dB' });
  return reflectionFromFraction(10 ** (-Math.abs(v) / 10));
}

/** Reflection of one flat face at normal incidence, R = ((n_f − n_m)/(n_f + n_m))² (Born & Wolf 1999, §1.5; via jointLoss.fresnelLoss). */
export function faceReflection(input: { fiberIndex?: number; mediumIndex?: number }): Reflection {
  const nf = input?.fiberIndex ?? FIBER_FACE_INDEX;
  const nm = input?.mediumIndex ?? INDEX_AIR;
  return reflectionFromFraction(fresnelLoss(nf, nm).reflectancePerSurface);
}

export interface GapReflection {
  /** One face alone. */
  face: Reflection;
  /** Two faces in phase (gap an odd number of quarter waves in the medium): 4R/(1 + R)². */
  maximum: Reflection;
  /** Two faces out of phase (gap a whole number of half waves): 0 in the ideal etalon; floored at MIN_FRACTION. */
  minimum: Reflection;
  /** Incoherent sum (the average over gap width or a broad source): 2R/(1 + R). */
  average: Reflection;
  /** At the given gap, when gapUm and wavelengthNm are given. */
  atGap?: Reflection;
}

/**
 * Reflection of a gap between two equal faces, as a Fabry–Perot etalon (Airy formula, Born & Wolf 1999, §7.6.1):
 * R_e(δ) = F sin²(δ/2) / (1 + F sin²(δ/2)), F = 4R/(1 − R)², δ = 4π n_m s / λ. Ranges from 0 to 4R/(1 + R)² as the
 * gap changes by a quarter wave. Plane waves: valid for gaps well under the mode's Rayleigh range (tens of µm);
 * wider gaps also lose the far reflection to diffraction, which lowers the maximum.
 */
export function gapReflection(input: { fiberIndex?: number; mediumIndex?: number; gapUm?: number; wavelengthNm?: number }): GapReflection {
  const face = faceReflection(input ?? {});
  const r = face.fraction;
  const f = (4 * r) / ((1 - r) * (1 - r));
  const result: GapReflection = {
    face,
    maximum: reflectionFromFraction((4 * r) / ((1 + r) * (1 + r))),
    minimum: reflectionFromFraction(0),
    average: reflectionFromFraction((2 * r) / (1 + r)),
  };
  if (input?.gapUm !== undefined || input?.wavelengthNm !== undefined) {
    const s = requireNumber('gapUm', input.gapUm, { min: 0, max: 5000, unit: 'µm' });
    const lambdaUm = requireWavelengthNm('wavelengthNm', input.wavelengthNm) / 1000;
    const nm = input.mediumIndex ?? INDEX_AIR;
    const sin = Math.sin((2 * Math.PI * nm * s) / lambdaUm); // sin(δ/2), δ = 4π n s / λ
    const x = f * sin * sin;
    result.atGap = reflectionFromFraction(x / (1 + x));
  }
  return result;
}

export type Polish = 'PC' | 'UPC' | 'APC';

export interface PolishTypical {
  polish: Polish;
  name: string;
  /** Typical worst reflectance of a mated pair in good condition (dB, negative). */
  reflectanceDb: number;
  source: string;
}

/**
 * Typical reflectance of a clean mated connector pair by end-face polish. Typical figures of the trade, not a standard
 * limit (component standards set grades; check the one that applies).
 */
export const POLISH_TYPICAL: readonly PolishTypical[] = [
  { polish: 'PC', name: 'Physical contact (PC)', reflectanceDb: -40, source: 'typical, common practice' },
  { polish: 'UPC', name: 'Ultra-polished physical contact (UPC)', reflectanceDb: -50, source: 'typical, common practice' },
  { polish: 'APC', name: 'Angled physical contact (APC, 8°)', reflectanceDb: -60, source: 'typical, common practice' },
];

/** Glass–air face of a fiber, gel between faces, and the typical polishes in one table (for the screen). */
export function typicalReflections(input: { fiberIndex?: number } = {}): { label: string; reflection: Reflection; source: string }[] {
  const nf = input?.fiberIndex ?? FIBER_FACE_INDEX;
  return [
    { label: 'Open glass–air end, cleaved flat', reflection: faceReflection({ fiberIndex: nf, mediumIndex: INDEX_AIR }), source: 'Fresnel, Born & Wolf 1999 §1.5' },
    { label: 'Air gap between two flat faces, worst case', reflection: gapReflection({ fiberIndex: nf, mediumIndex: INDEX_AIR }).maximum, source: 'Airy etalon, Born & Wolf 1999 §7.6.1' },
    { label: 'Index-matching gel between faces, worst case', reflection: gapReflection({ fiberIndex: nf, mediumIndex: INDEX_MATCHING_GEL }).maximum, source: `Airy etalon with gel n = ${INDEX_MATCHING_GEL} (common practice)` },
    ...POLISH_TYPICAL.map((p) => ({ label: p.name, reflection: reflectionFromDb(p.reflectanceDb), source: p.source })),
  ];
}

export interface OrlEvent {
  /** Reflectance of the event, dB; either sign is read as "that many dB down". */
  reflectanceDb: number;
  /** One-way loss between the source and the event (dB); the reflection pays it twice. */
  lossBeforeDb: number;
}

export interface OrlResult {
  /** Total optical return loss of the link (dB, positive). */
  orlDb: number;
  /** Total reflected share as a reflectance (dB, negative). */
  totalReflectanceDb: number;
  /** Each event's share of the returned light, in input order, then the backscatter's (0–1). */
  shares: number[];
  backscatterShare: number;
}

export const ORL_MAX_EVENTS = 500;

/**
 * Total ORL: the powers returned add, each reflection reduced by the round-trip loss before it:
 * ORL = −10·log10(Σ R_i·10^(−2·A_i/10) + R_bs) (IEC 61300-3-6 definition of return loss applied to the sum; common practice).
 */
export function linkReturnLoss(input: { events: readonly OrlEvent[]; backscatterReturnLossDb?: number }): OrlResult {
  const events = input?.events;
  if (!Array.isArray(events)) throw new InputError('events', events, 'a list of reflective events');
  if (events.length > ORL_MAX_EVENTS) throw new InputError('events', events.length, `at most ${ORL_MAX_EVENTS} events`);
  const parts = events.map((e, i) => {
    const r = reflectionFromDb(requireNumber(`events[${i}].reflectanceDb`, e?.reflectanceDb, { min: -300, max: 300, unit: 'dB' })).fraction;
    const a = requireNumber(`events[${i}].lossBeforeDb`, e?.lossBeforeDb, { min: 0, max: 100, unit: 'dB' });
    return r * 10 ** (-2 * a / 10);
  });
  const bs = input.backscatterReturnLossDb === undefined ? 0 : reflectionFromDb(requireNumber('backscatterReturnLossDb', input.backscatterReturnLossDb, { min: 0, max: 300, unit: 'dB' })).fraction;
  const total = parts.reduce((s, p) => s + p, 0) + bs;
  if (!(total > 0)) throw new InputError('events', events.length, 'at least one reflection or a backscatter return loss');
  const t = reflectionFromFraction(Math.min(1, total));
  return { orlDb: t.returnLossDb, totalReflectanceDb: t.reflectanceDb, shares: parts.map((p) => p / total), backscatterShare: bs / total };
}
