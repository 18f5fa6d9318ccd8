// WDM channel grids: the dense frequency grid of ITU-T G.694.1 (fixed spacings and the flexible grid), the
// coarse wavelength grid of ITU-T G.694.2, the conversion between frequency and vacuum wavelength, and the
// nearest grid point to a laser's frequency or wavelength.
//
// G694.1 (10/2020): fixed grids at 193.1 THz + n × spacing, spacing 12.5, 25, 50 or 100 GHz (n any integer);
//   flexible grid: nominal central frequency 193.1 THz + n × 0.00625 THz, slot width m × 12.5 GHz (m ≥ 1).
// G694.2 (12/2003): 18 nominal central wavelengths 1271 + 20 k nm, k = 0 … 17 (1271 to 1611 nm); the 2003
//   edition moved the 2002 grid (1270 … 1610 nm) by 1 nm. Both recommendations convert with
//   c = 2.99792458 × 10^8 m/s, the exact SI value (BIPM SI Brochure, 9th ed., 2019).
// The band edges (O, E, S, C, L, U) are those of ITU-T G-series Supplement 39 (from memory): they only
// select which channels a list shows; no channel is refused for lying outside a band.
import { InputError, requireInteger, requireNumber } from './errors';
// c = 299 792 458 m/s, exact by definition of the metre (BIPM SI Brochure 2019); the value G.694.1 and G.694.2 use.
import { SPEED_OF_LIGHT_M_PER_S } from './dispersion';
/** Anchor of the dense grid, 193.1 THz (G694.1). Kept in GHz so grid arithmetic stays exact. */
export const DWDM_ANCHOR_GHZ = 193_100;
/** Fixed-grid channel spacings of G.694.1, GHz. */
export const DWDM_SPACINGS_GHZ = [100, 50, 25, 12.5] as const;
export type DwdmSpacingGHz = (typeof DWDM_SPACINGS_GHZ)[number];
/** Flexible grid: central frequency granularity 6.25 GHz, slot width granularity 12.5 GHz (G694.1). */
export const FLEX_CENTRE_STEP_GHZ = 6.25;
export const FLEX_SLOT_WIDTH_STEP_GHZ = 12.5;
/** Coarse grid of G.694.2 (12/2003): first wavelength, spacing, count. */
export const CWDM_FIRST_NM = 1271;
export const CWDM_SPACING_NM = 20;
export const CWDM_CHANNEL_COUNT = 18;

export type OpticalBand = 'O' | 'E' | 'S' | 'C' | 'L' | 'U';
/** Band edges in nm (ITU-T G-series Supplement 39, from memory); the lower edge belongs to the band. */
export const OPTICAL_BANDS: readonly { band: OpticalBand; name: string; fromNm: number; toNm: number }[] = [
  { band: 'O', name: 'Original', fromNm: 1260, toNm: 1360 },
  { band: 'E', name: 'Extended', fromNm: 1360, toNm: 1460 },
  { band: 'S', name: 'Short wavelength', fromNm: 1460, toNm: 1530 },
  { band: 'C', name: 'Conventional', fromNm: 1530, toNm: 1565 },
  { band: 'L', name: 'Long wavelength', fromNm: 1565, toNm: 1625 },
  { band: 'U', name: 'Ultra-long wavelength', fromNm: 1625, toNm: 1675 },
];

/**
 * Wavelengths (and the matching frequencies) the grid functions accept: the O band's lower edge to the U band's
 * upper edge, 1260–1675 nm (179.0–237.9 THz), where telecom WDM lives.
 */
export const GRID_MIN_NM = 1260;
export const GRID_MAX_NM = 1675;
export const GRID_MIN_THZ = SPEED_OF_LIGHT_M_PER_S / GRID_MAX_NM / 1000;
export const GRID_MAX_THZ = SPEED_OF_LIGHT_M_PER_S / GRID_MIN_NM / 1000;
/** Longest channel list returned (12.5 GHz over the whole O band is about 1,420 channels). */
export const MAX_CHANNEL_LIST = 5000;

function requireGridThz(argument: string, v: unknown): number {
  return requireNumber(argument, v, {
    min: GRID_MIN_THZ,
    max: GRID_MAX_THZ,
    unit: 'THz',
    hint: (x) => (x >= 1260 && x <= 1675 ? `did you mean ${x} nm? that is ${(SPEED_OF_LIGHT_M_PER_S / x / 1000).toFixed(3)} THz` : x >= 179_000 && x <= 238_000 ? `did you mean ${x / 1000} THz (${x} GHz)?` : undefined),
  });
}

function requireGridNm(argument: string, v: unknown): number {
  return requireNumber(argument, v, {
    min: GRID_MIN_NM,
    max: GRID_MAX_NM,
    unit: 'nm',
    hint: (x) => (x >= 179 && x <= 238 ? `did you mean ${x} THz?` : x >= 1.26 && x <= 1.675 ? `did you mean ${x * 1000} nm (${x} µm)?` : undefined),
  });
}

/** Vacuum wavelength in nm of a frequency in THz: λ = c / f (definition; c exact). */
export function frequencyThzToWavelengthNm(input: { frequencyThz: number }): number {
  const f = requireGridThz('frequencyThz', input?.frequencyThz);
  // c [m/s] / (f [THz] · 1e12) [1/s] = λ [m]; × 1e9 nm/m → c / f / 1000 with c in m/s and f in THz.
  return SPEED_OF_LIGHT_M_PER_S / f / 1000;
}

/** Frequency in THz of a vacuum wavelength in nm: f = c / λ (definition; c exact). */
export function wavelengthNmToFrequencyThz(input: { wavelengthNm: number }): number {
  const w = requireGridNm('wavelengthNm', input?.wavelengthNm);
  return SPEED_OF_LIGHT_M_PER_S / w / 1000;
}

/** The band a wavelength falls in (lower edge inclusive), or undefined outside 1260–1675 nm. */
export function bandOf(input: { wavelengthNm: number }): OpticalBand | undefined {
  const w = requireNumber('wavelengthNm', input?.wavelengthNm, { min: 0, unit: 'nm' });
  const b = OPTICAL_BANDS.find((x) => w >= x.fromNm && (w < x.toNm || (x.band === 'U' && w === x.toNm)));
  return b?.band;
}

function requireSpacing(v: unknown): DwdmSpacingGHz {
  if (!DWDM_SPACINGS_GHZ.includes(v as DwdmSpacingGHz)) throw new InputError('spacingGHz', v, '100, 50, 25 or 12.5 GHz (the fixed grids of G.694.1)');
  return v as DwdmSpacingGHz;
}

export interface GridChannel {
  /** Grid index: centre = 193.1 THz + n × spacing. */
  n: number;
  frequencyThz: number;
  wavelengthNm: number;
  band: OpticalBand | undefined;
}

function channelAt(n: number, stepGHz: number): GridChannel {
  const frequencyThz = (DWDM_ANCHOR_GHZ + n * stepGHz) / 1000;
  const wavelengthNm = SPEED_OF_LIGHT_M_PER_S / frequencyThz / 1000;
  return { n, frequencyThz, wavelengthNm, band: bandOf({ wavelengthNm }) };
}

/** One channel of a fixed dense grid: 193.1 THz + n × spacing (G694.1). */
export function dwdmChannel(input: { n: number; spacingGHz: DwdmSpacingGHz }): GridChannel {
  const s = requireSpacing(input?.spacingGHz);
  const nMin = Math.ceil((GRID_MIN_THZ * 1000 - DWDM_ANCHOR_GHZ) / s);
  const nMax = Math.floor((GRID_MAX_THZ * 1000 - DWDM_ANCHOR_GHZ) / s);
  const n = requireInteger('n', input.n, nMin, nMax);
  return channelAt(n, s);
}

export interface NearestChannel {
  channel: GridChannel;
  /** The asked point minus the grid point: positive when the laser sits above the channel in frequency. */
  offsetGHz: number;
  /** The asked wavelength minus the channel's wavelength, nm (positive: longer wavelength). */
  offsetNm: number;
  /** |offset| as a share of the spacing (0 on the grid point, 0.5 midway between two channels). */
  offsetShareOfSpacing: number;
  spacingGHz: number;
}

function frequencyOf(input: { frequencyThz?: number; wavelengthNm?: number } | undefined): { thz: number; nm: number } {
  if (input && input.frequencyThz !== undefined) {
    const thz = requireGridThz('frequencyThz', input.frequencyThz);
    return { thz, nm: SPEED_OF_LIGHT_M_PER_S / thz / 1000 };
  }
  const nm = requireGridNm('wavelengthNm', input?.wavelengthNm);
  return { thz: SPEED_OF_LIGHT_M_PER_S / nm / 1000, nm };
}

function nearestOn(thz: number, nm: number, stepGHz: number): NearestChannel {
  const n = Math.round((thz * 1000 - DWDM_ANCHOR_GHZ) / stepGHz);
  const channel = channelAt(n, stepGHz);
  const offsetGHz = thz * 1000 - (DWDM_ANCHOR_GHZ + n * stepGHz);
  return {
    channel,
    offsetGHz,
    offsetNm: nm - channel.wavelengthNm,
    offsetShareOfSpacing: Math.min(0.5, Math.abs(offsetGHz) / stepGHz),
    spacingGHz: stepGHz,
  };
}

/** The dense-grid channel nearest to a frequency (THz) or a vacuum wavelength (nm), and the offset from it. */
export function nearestDwdmChannel(input: { frequencyThz?: number; wavelengthNm?: number; spacingGHz: DwdmSpacingGHz }): NearestChannel {
  const s = requireSpacing(input?.spacingGHz);
  const { thz, nm } = frequencyOf(input);
  return nearestOn(thz, nm, s);
}

/** Every channel of a fixed dense grid inside a band (centres with the band's lower edge ≤ λ < upper edge). */
export function dwdmChannelsInBand(input: { band: OpticalBand; spacingGHz: DwdmSpacingGHz }): GridChannel[] {
  const s = requireSpacing(input?.spacingGHz);
  const b = OPTICAL_BANDS.find((x) => x.band === input.band);
  if (!b) throw new InputError('band', input.band, 'one of O, E, S, C, L, U');
  // Highest frequency ↔ shortest wavelength: list from short to long wavelength (high to low n).
  const nHigh = Math.floor((SPEED_OF_LIGHT_M_PER_S / b.fromNm - DWDM_ANCHOR_GHZ) / s);
  const nLow = Math.ceil((SPEED_OF_LIGHT_M_PER_S / b.toNm - DWDM_ANCHOR_GHZ) / s);
  const out: GridChannel[] = [];
  for (let n = nHigh; n >= nLow && out.length < MAX_CHANNEL_LIST; n--) {
    const c = channelAt(n, s);
    if (c.wavelengthNm >= b.fromNm && c.wavelengthNm < b.toNm) out.push(c);
  }
  return out;
}

export interface FlexSlot {
  n: number;
  m: number;
  centreThz: number;
  centreNm: number;
  widthGHz: number;
  lowerEdgeThz: number;
  upperEdgeThz: number;
}

/** Largest slot-width multiplier accepted: 400 × 12.5 GHz = 5 THz, wider than any band. */
export const FLEX_M_MAX = 400;

/** A flexible-grid slot: centre 193.1 THz + n × 6.25 GHz, width m × 12.5 GHz (G694.1). */
export function flexGridSlot(input: { n: number; m: number }): FlexSlot {
  const nMin = Math.ceil((GRID_MIN_THZ * 1000 - DWDM_ANCHOR_GHZ) / FLEX_CENTRE_STEP_GHZ);
  const nMax = Math.floor((GRID_MAX_THZ * 1000 - DWDM_ANCHOR_GHZ) / FLEX_CENTRE_STEP_GHZ);
  const n = requireInteger('n', input?.n, nMin, nMax);
  const m = requireInteger('m', input.m, 1, FLEX_M_MAX);
  const centreGHz = DWDM_ANCHOR_GHZ + n * FLEX_CENTRE_STEP_GHZ;
  const widthGHz = m * FLEX_SLOT_WIDTH_STEP_GHZ;
  return {
    n,
    m,
    centreThz: centreGHz / 1000,
    centreNm: SPEED_OF_LIGHT_M_PER_S / centreGHz,
    widthGHz,
    lowerEdgeThz: (centreGHz - widthGHz / 2) / 1000,
    upperEdgeThz: (centreGHz + widthGHz / 2) / 1000,
  };
}

/** The flexible-grid central frequency nearest to a frequency or wavelength (6.25 GHz granularity). */
export function nearestFlexCentre(input: { frequencyThz?: number; wavelengthNm?: number }): NearestChannel {
  const { thz, nm } = frequencyOf(input);
  return nearestOn(thz, nm, FLEX_CENTRE_STEP_GHZ);
}

export interface CwdmChannel {
  /** 1 … 18, short to long wavelength. */
  number: number;
  wavelengthNm: number;
  frequencyThz: number;
  band: OpticalBand | undefined;
}

/** The 18 coarse-grid wavelengths, 1271 to 1611 nm every 20 nm (G694.2 (12/2003), table of nominal central wavelengths). */
export function cwdmChannels(): CwdmChannel[] {
  return Array.from({ length: CWDM_CHANNEL_COUNT }, (_, k) => {
    const wavelengthNm = CWDM_FIRST_NM + k * CWDM_SPACING_NM;
    return { number: k + 1, wavelengthNm, frequencyThz: SPEED_OF_LIGHT_M_PER_S / wavelengthNm / 1000, band: bandOf({ wavelengthNm }) };
  });
}

export interface NearestCwdm {
  channel: CwdmChannel;
  /** Asked wavelength minus the channel's, nm. */
  offsetNm: number;
}

/** The coarse-grid channel nearest to a wavelength (or frequency), with the offset in nm. */
export function nearestCwdmChannel(input: { wavelengthNm?: number; frequencyThz?: number }): NearestCwdm {
  const { nm } = frequencyOf(input);
  const k = Math.min(CWDM_CHANNEL_COUNT - 1, Math.max(0, Math.round((nm - CWDM_FIRST_NM) / CWDM_SPACING_NM)));
  const channel = cwdmChannels()[k]!;
  return { channel, offsetNm: nm - channel.wavelengthNm };
}
