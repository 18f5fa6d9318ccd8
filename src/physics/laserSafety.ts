// Laser-hazard context for a wavelength and an optical power: the usual cautions, what the wavelength
// means for the eye, and where the hazard level comes from. Context only: this module never classifies
// a product, never clears a fiber for work, and never calls any power level harmless for the eye.
// The hazard-level limits of IEC 60825-2 are not reproduced here: they were not available to check,
// so the only number used is the class 3B upper limit (see CLASS_3B_UPPER_LIMIT_MW), and only to say
// that a power is above it.
import { InputError, requireNumber, requireWavelengthNm } from './errors';
import { dbmToMw, POWER_DBM_MAX, POWER_DBM_MIN } from './power';

/** Hazard levels of IEC 60825-2:2021 (edition 4.0), assessed at each accessible location of a fiber system. */
export const HAZARD_LEVELS = ['1', '1M', '2', '2M', '3R', '3B', '4'] as const;
export type HazardLevel = (typeof HAZARD_LEVELS)[number];

/** The edition named wherever a hazard level is mentioned. */
export const IEC_60825_2_EDITION = 'IEC 60825-2:2021 (edition 4.0)';

/**
 * Hazard levels allowed at each kind of location (IEC 60825-2, as summarised by the Finnish radiation safety
 * authority STUK, "Lasers in optic cables"): controlled 1–3B, restricted 1–3R, unrestricted 1–2M.
 */
export const LEVELS_ALLOWED_BY_LOCATION: Readonly<Record<'unrestricted' | 'restricted' | 'controlled', readonly HazardLevel[]>> = {
  unrestricted: ['1', '1M', '2', '2M'],
  restricted: ['1', '1M', '2', '2M', '3R'],
  controlled: ['1', '1M', '2', '2M', '3R', '3B'],
};

/**
 * Upper limit of class 3B for continuous emission, 500 mW (IEC 60825-1:2014, class 3B accessible emission
 * limit, 315 nm to 1 mm; checked against secondary summaries of the standard, not the text itself).
 * At or above it the emission is beyond 3B: class 4, and hazard level 4 at an accessible fiber location.
 */
export const CLASS_3B_UPPER_LIMIT_MW = 500;

/** Visible band 400–700 nm, as IEC 60825-1 uses it for classes 2 and 2M (common practice). */
export const VISIBLE_MIN_NM = 400;
export const VISIBLE_MAX_NM = 700;

/** The usual cautions for fiber work (common practice). Always shown, at every power. */
export const USUAL_LASER_CAUTIONS: readonly string[] = [
  'Never look into a fiber end, a connector, an adapter or an equipment port, lit or not, with or without magnification.',
  'Inspect end faces only with a fiber inspection scope that has a laser filter, or with a camera probe that shows the end face on a screen.',
  'Treat every fiber as live until a power meter has proven it dark; a far-end transmitter or amplifier can switch on at any time.',
  'Connect the light source last and disconnect it first; cap every unused connector and adapter.',
  'Never use a magnifier, microscope without filter, or binoculars near an open fiber end: optics gather the light into the eye.',
  'Fiber shards pierce skin and eyes: wear safety glasses, work over a dark mat, put offcuts in a marked shard container, never on the floor or clothing, and do not eat or drink at the work area.',
  'Cleavers and strippers are sharp: keep blades covered when not in use.',
];

/** Who decides. Shown with every result. */
export const GOVERNING_STATEMENT =
  'Your site’s laser-safety program, IEC 60825-1 and IEC 60825-2 as adopted locally, and local codes govern. This calculator gives context only: it does not classify equipment and does not clear a fiber for work.';

export type WavelengthBand = 'ultraviolet' | 'visible' | 'infrared';

export interface HazardContext {
  wavelengthNm: number;
  powerDbm: number;
  powerMw: number;
  band: WavelengthBand;
  /** What this wavelength means for the eye, in plain words. */
  wavelengthNote: string;
  /** An indicative hazard level, only where a sourced number supports it (at or above the 3B upper limit). */
  indicativeLevel?: { level: HazardLevel; statement: string; source: string };
  /** Where the hazard level comes from when no indicative level is given. */
  levelStatement: string;
  /** Cautions for this wavelength and power: the usual ones first, then any this context adds. */
  cautions: string[];
  governing: string;
}

/** The hazard context for light of `wavelengthNm` at `powerDbm` (as measured or as the equipment states). */
export function laserHazardContext(input: { wavelengthNm: number; powerDbm: number }): HazardContext {
  const wavelengthNm = requireWavelengthNm('wavelengthNm', input?.wavelengthNm);
  const powerDbm = requireNumber('powerDbm', input?.powerDbm, { min: POWER_DBM_MIN, max: POWER_DBM_MAX, unit: 'dBm' });
  const powerMw = dbmToMw(powerDbm);

  const band: WavelengthBand = wavelengthNm < VISIBLE_MIN_NM ? 'ultraviolet' : wavelengthNm > VISIBLE_MAX_NM ? 'infrared' : 'visible';
  const wavelengthNote =
    band === 'infrared'
      ? `${wavelengthNm} nm is infrared: invisible, so there is no glare and no blink reflex to warn you, and a dark-looking fiber end can still carry power.`
      : band === 'visible'
        ? `${wavelengthNm} nm is visible light. A visible spot does not show how much invisible light may travel in the same fiber.`
        : `${wavelengthNm} nm is ultraviolet: invisible, and it can harm the eye and skin.`;

  const cautions = [...USUAL_LASER_CAUTIONS];
  let indicativeLevel: HazardContext['indicativeLevel'];
  let levelStatement: string;
  if (powerMw >= CLASS_3B_UPPER_LIMIT_MW) {
    indicativeLevel = {
      level: '4',
      statement: `Indicative: ${formatMw(powerMw)} is at or above the 500 mW upper limit of class 3B, so the hazard level is 4. Level 4 is not allowed at any accessible location.`,
      source: 'IEC 60825-1:2014 class 3B limit for continuous emission (from secondary summaries); hazard levels per ' + IEC_60825_2_EDITION,
    };
    levelStatement = indicativeLevel.statement;
    cautions.push(
      'At this power even diffuse reflections and the bare beam on skin are hazardous, and a dirty connector or tight bend can burn or start a fire: work only under your site’s high-power procedure, with the source switched off.',
    );
  } else {
    levelStatement = `The hazard level (1, 1M, 2, 2M, 3R, 3B or 4) at ${wavelengthNm} nm and ${formatMw(powerMw)} is set by the limits of ${IEC_60825_2_EDITION}: look up the limit in the standard as adopted locally. This calculator does not state a level here.`;
  }
  if (band !== 'visible') {
    cautions.push('Invisible light: rely on a power meter, never on what you see at the fiber end.');
  }
  return { wavelengthNm, powerDbm, powerMw, band, wavelengthNote, indicativeLevel, levelStatement, cautions, governing: GOVERNING_STATEMENT };
}

function formatMw(mw: number): string {
  if (mw >= 1) return `${Number(mw.toPrecision(4))} mW`;
  return `${Number((mw * 1000).toPrecision(4))} µW`;
}

/** All the text of a context as plain lines, for a report. */
export function hazardContextText(c: HazardContext): string {
  if (!c || typeof c !== 'object' || !Array.isArray(c.cautions)) throw new InputError('context', c, 'a hazard context from laserHazardContext');
  return [
    `Laser hazard context at ${c.wavelengthNm} nm, ${c.powerDbm} dBm (${formatMw(c.powerMw)})`,
    c.wavelengthNote,
    c.levelStatement,
    ...(c.indicativeLevel ? [`Source: ${c.indicativeLevel.source}`] : []),
    'Cautions:',
    ...c.cautions.map((x) => `  - ${x}`),
    c.governing,
  ].join('\n');
}
