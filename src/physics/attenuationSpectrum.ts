// Fiber attenuation at any wavelength of a plan, from the few values a fiber type lists (say 1310, 1550 and
// 1625 nm). A PON runs at 1270, 1310, 1490 and 1577 nm and a coarse WDM plan at 18 wavelengths from 1271 to
// 1611 nm, so the link budget's "listed value within ±30 nm" rule (linkBudget.ts, attenuationAt) is not enough.
//
// How a value is reached, in this order (each is shown beside the number):
//   1. listed: a value listed within ±2 nm is used as is;
//   2. interpolated: between two listed values, linear in wavelength (common practice for planning between
//      the specified windows; smooth parts of the loss spectrum are close to linear over 100–200 nm);
//   3. nearest: outside the listed span but within ±30 nm of the nearest listed value, that value
//      (the same window tolerance as linkBudget.ts, WINDOW_TOLERANCE_NM);
//   4. Rayleigh: below the shortest listed wavelength, up to 100 nm, the shortest listed value scaled by
//      (λ0/λ)^4 — Rayleigh scattering, the dominant loss of silica fiber between 1200 and 1600 nm, goes as λ^-4
//      (Rayleigh1899; Keiser2000 §3.1). Scaling the whole value, absorption included, over-estimates slightly:
//      a safe side for a budget.
// Anything else is refused (ModelError): extrapolating towards the infrared absorption edge (beyond the longest
// listed value) has no safe simple rule.
//
// The water peak (OH absorption near 1383 nm, WATER_PEAK_NM) is not modelled: interpolating across it is only
// right for a low-water-peak fiber (G.652.C/D, G.657), whose 1383 nm attenuation is at most its 1310 nm value
// (G652, from memory). Where no value is listed inside the water-peak region, the result says so.
import { InputError, ModelError, requireNumber, requireWavelengthNm } from './errors';
import { WINDOW_TOLERANCE_NM, type AttenuationAt } from './linkBudget';

/** A listed value this close to the asked wavelength is used as is. */
export const LISTED_MATCH_NM = 2;
/** How far below the shortest listed value the λ^-4 scaling is trusted. Common practice (about one band). */
export const RAYLEIGH_EXTRAPOLATION_MAX_NM = 100;
/** Centre of the OH absorption peak of silica fiber (G652, from memory: attenuation specified at 1383 ± 3 nm). */
export const WATER_PEAK_NM = 1383;
/** The E band, 1360–1460 nm, where the water peak lies (ITU-T G-series Supplement 39, band table; from memory). */
export const WATER_PEAK_REGION_NM = { from: 1360, to: 1460 } as const;
/** Largest attenuation accepted in a list, dB/km (a slip beyond this; the link budget uses the same bound). */
const MAX_DB_PER_KM = 100;

export type AttenuationBasis = 'listed' | 'interpolated' | 'nearest' | 'rayleigh';

export interface SpectralAttenuation {
  wavelengthNm: number;
  dbPerKm: number;
  basis: AttenuationBasis;
  /** How the value was reached, in words, e.g. "interpolated between 1310 nm (0.4) and 1550 nm (0.3)". */
  how: string;
  /** True when the wavelength lies in the water-peak region (1360–1460 nm). */
  inWaterPeakRegion: boolean;
  /** True when the value is in the water-peak region and no listed value there backs it. */
  waterPeakUnlisted: boolean;
}

function checkedList(list: unknown, label: string): AttenuationAt[] {
  if (!Array.isArray(list) || list.length === 0) {
    throw new ModelError(`${label}: no attenuation values are listed.`, 'attenuation spectrum', 'add the attenuation in dB/km at one or more wavelengths');
  }
  const out = list.map((p: Partial<AttenuationAt> | undefined, i) => ({
    wavelengthNm: requireWavelengthNm(`attenuationDbPerKm[${i}].wavelengthNm`, p?.wavelengthNm),
    dbPerKm: requireNumber(`attenuationDbPerKm[${i}].dbPerKm`, p?.dbPerKm, { min: 0, max: MAX_DB_PER_KM, unit: 'dB/km' }),
  }));
  return out.sort((a, b) => a.wavelengthNm - b.wavelengthNm);
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(4)));
}

/**
 * Attenuation of a fiber type at one wavelength, from its listed values (see the head of this file for the
 * rules and their sources). Throws ModelError when the wavelength is beyond what the list can support.
 */
export function attenuationAtWavelength(input: { attenuationDbPerKm: readonly AttenuationAt[]; wavelengthNm: number; label?: string }): SpectralAttenuation {
  if (!input || typeof input !== 'object') throw new InputError('input', input, 'the fiber type’s attenuation list and a wavelength');
  const label = typeof input.label === 'string' && input.label !== '' ? input.label : 'fiber';
  const w = requireWavelengthNm('wavelengthNm', input.wavelengthNm);
  const list = checkedList(input.attenuationDbPerKm, label);
  const inRegion = w >= WATER_PEAK_REGION_NM.from && w <= WATER_PEAK_REGION_NM.to;
  const listedInRegion = list.some((p) => p.wavelengthNm >= WATER_PEAK_REGION_NM.from && p.wavelengthNm <= WATER_PEAK_REGION_NM.to);
  const base = { wavelengthNm: w, inWaterPeakRegion: inRegion, waterPeakUnlisted: inRegion && !listedInRegion };

  let nearest = list[0]!;
  for (const p of list) if (Math.abs(p.wavelengthNm - w) < Math.abs(nearest.wavelengthNm - w)) nearest = p;
  if (Math.abs(nearest.wavelengthNm - w) <= LISTED_MATCH_NM) {
    return { ...base, dbPerKm: nearest.dbPerKm, basis: 'listed', how: `listed at ${nearest.wavelengthNm} nm` };
  }
  const first = list[0]!;
  const last = list[list.length - 1]!;
  if (w > first.wavelengthNm && w < last.wavelengthNm) {
    let i = 0;
    while (list[i + 1]!.wavelengthNm < w) i++;
    const a = list[i]!;
    const b = list[i + 1]!;
    // Linear interpolation in wavelength between the neighbouring listed values (common practice).
    const t = (w - a.wavelengthNm) / (b.wavelengthNm - a.wavelengthNm);
    const dbPerKm = a.dbPerKm + t * (b.dbPerKm - a.dbPerKm);
    return { ...base, dbPerKm, basis: 'interpolated', how: `interpolated between ${a.wavelengthNm} nm (${fmt(a.dbPerKm)} dB/km) and ${b.wavelengthNm} nm (${fmt(b.dbPerKm)} dB/km)` };
  }
  if (Math.abs(nearest.wavelengthNm - w) <= WINDOW_TOLERANCE_NM) {
    return { ...base, dbPerKm: nearest.dbPerKm, basis: 'nearest', how: `value at ${nearest.wavelengthNm} nm, the nearest listed (within ${WINDOW_TOLERANCE_NM} nm)` };
  }
  if (w < first.wavelengthNm && first.wavelengthNm - w <= RAYLEIGH_EXTRAPOLATION_MAX_NM) {
    // Rayleigh scattering ∝ λ^-4 (Rayleigh1899; Keiser2000 §3.1): scaled from the shortest listed value.
    const dbPerKm = first.dbPerKm * (first.wavelengthNm / w) ** 4;
    return { ...base, dbPerKm, basis: 'rayleigh', how: `${fmt(first.dbPerKm)} dB/km at ${first.wavelengthNm} nm scaled by (λ0/λ)⁴ (Rayleigh scattering)` };
  }
  const listed = list.map((p) => `${p.wavelengthNm} nm`).join(', ');
  throw new ModelError(
    `${label}: no attenuation can be estimated at ${w} nm from the listed values (${listed}).`,
    'attenuation spectrum',
    `add the attenuation at ${w} nm to the fiber type`,
  );
}
