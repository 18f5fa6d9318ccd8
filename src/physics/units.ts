// Unit parsing and conversion at the edges (UI, import). Formulas never convert inside.
import { InputError } from './errors';

/** Quantities a person types into a field, each with the base unit formulas use. */
export type QuantityKind = 'wavelength' | 'length' | 'radius' | 'size' | 'power' | 'ratio' | 'plain';

export const BASE_UNIT: Record<QuantityKind, string> = {
  wavelength: 'nm',
  length: 'km',
  radius: 'mm',
  size: 'µm',
  power: 'dBm',
  ratio: '',
  plain: '',
};

/** Factor from each accepted unit to the base unit of its kind. Power is handled apart (log scale). */
const UNIT_FACTORS: Record<Exclude<QuantityKind, 'power'>, Record<string, number>> = {
  wavelength: { nm: 1, 'µm': 1000, um: 1000, 'μm': 1000, micron: 1000 },
  length: { km: 1, m: 1e-3, mm: 1e-6 },
  radius: { mm: 1, cm: 10, m: 1000, 'µm': 1e-3, um: 1e-3, 'μm': 1e-3 },
  size: { 'µm': 1, um: 1, 'μm': 1, nm: 1e-3, mm: 1000 },
  ratio: { '': 1, '%': 0.01 },
  plain: { '': 1 },
};

export interface ParsedQuantity {
  /** The value in the base unit of its kind. */
  value: number;
  /** The unit the person typed ('' when none: the base unit was assumed). */
  typedUnit: string;
  /** Plain-words note on the conversion, e.g. "1.55 µm = 1550 nm"; empty when none. */
  conversion: string;
}

/** Longest text a field accepts; anything longer is refused before parsing. */
export const MAX_FIELD_CHARS = 64;

/**
 * Digits grouped in threes by a thin space (U+2009), a narrow no-break space (U+202F) or a no-break space (U+00A0),
 * as the SI Brochure (9th ed., §5.4.4) writes long numbers: "1 550", "0.000 1". Only these three: an ordinary
 * space between digits ("1 550") stays an error, since it is as likely a slip as a grouping.
 */
const GROUP_SPACE = String.raw`[\u2009\u202f\u00a0]`;
const INT_PART = String.raw`(?:\d{1,3}(?:${GROUP_SPACE}\d{3})+|\d+)`;
const FRAC_PART = String.raw`(?:\d{3}${GROUP_SPACE})*\d+`;
// (?!\d): the number ends where the digits end, so "0,0083 mm" is never read as 0.008 followed by a unit "3 mm".
const NUMBER_RE = new RegExp(String.raw`^([+-]?(?:${INT_PART}(?:\.(?:${FRAC_PART})?)?|\.${FRAC_PART})(?:e[+-]?\d+)?)(?!\d)\s*(.*)$`, 'i');
const GROUP_SPACES = /[\u2009\u202f\u00a0]/g;

/**
 * Minus signs people type or paste: U+2212 (the typographic minus, what word processors and many phone keyboards
 * give) and U+2013 (the en dash, often used as a minus). Read as the ASCII hyphen-minus.
 */
const MINUS_SIGNS = /[\u2212\u2013]/g;

/** What a field of each kind accepts, in words with the unit symbols beside them: shown when a text is refused. */
export const UNITS_IN_WORDS: Record<QuantityKind, string> = {
  wavelength: 'a number in nanometres (nm) or micrometres (µm, um, micron); no unit means nm',
  length: 'a number in kilometres (km), metres (m) or millimetres (mm); no unit means km',
  radius: 'a number in millimetres (mm), centimetres (cm), metres (m) or micrometres (µm, um); no unit means mm',
  size: 'a number in micrometres (µm, um), nanometres (nm) or millimetres (mm); no unit means µm',
  power: 'a power in dBm, or in milliwatts (mW), microwatts (µW, uW), nanowatts (nW) or watts (W); no unit means dBm',
  ratio: 'a plain number, or a percentage (%)',
  plain: 'a plain number with no unit',
};

/**
 * Parses what a person typed: "1550", "1,55 µm", "2.5 km", "-3 dBm", "−3 dBm", "0.5 mW", "1 550 nm" (thin space).
 * A decimal comma is accepted when it is the only separator (common practice in much of Europe).
 * Whatever follows the number must be a unit of the field's kind, written as listed in UNITS_IN_WORDS: any other
 * word ("0.5 milliwatt", "3 dB" in a power field) is refused, never read as the base unit.
 * Throws InputError naming `argument` for anything that is not one finite number with a known unit.
 */
export function parseQuantity(argument: string, text: string, kind: QuantityKind): ParsedQuantity {
  const raw = typeof text === 'string' ? text : '';
  if (raw.length > MAX_FIELD_CHARS) {
    throw new InputError(argument, raw, `a number of at most ${MAX_FIELD_CHARS} characters`, 'the text is far too long for a number');
  }
  // Leading and trailing no-break spaces are blanks like any other; inside the text they may group digits.
  let s = raw.replace(/^[\s\u2009\u202f\u00a0]+|[\s\u2009\u202f\u00a0]+$/g, '').replace(MINUS_SIGNS, '-');
  if (s === '') throw new InputError(argument, raw, 'a number', 'the field is empty');
  // "1,55" → "1.55" only when there is exactly one comma and no point: "1,2,3" stays invalid.
  if (/^[^.]*,[^,]*$/.test(s) && (s.match(/,/g)?.length ?? 0) === 1) s = s.replace(',', '.');
  const m = NUMBER_RE.exec(s);
  const words = Object.hasOwn(UNITS_IN_WORDS, kind) ? UNITS_IN_WORDS[kind] : undefined;
  if (!m) {
    throw new InputError(argument, raw, words ?? 'a number such as 1550 or 1,55', 'only digits, one decimal point or comma, and a unit');
  }
  const num = Number(m[1]!.replace(GROUP_SPACES, ''));
  const unitRaw = (m[2] ?? '').trim();
  if (!Number.isFinite(num)) throw new InputError(argument, raw, 'a finite number', 'the number is too large');
  // "-0" is read as 0: a signed zero has no physical meaning in any field.
  const numSigned = Object.is(num, -0) ? 0 : num;

  if (kind === 'power') return parsePower(argument, raw, numSigned, unitRaw);
  if (!Object.hasOwn(UNIT_FACTORS, kind)) throw new InputError('kind', kind, Object.keys(BASE_UNIT).join(', '));

  const table = UNIT_FACTORS[kind];
  const unitKey = lookupUnit(table, unitRaw);
  if (unitKey === undefined) {
    throw new InputError(argument, raw, UNITS_IN_WORDS[kind], `"${unitRaw.slice(0, 20)}" is not a unit this field knows`);
  }
  const factor = table[unitKey]!;
  // 1e308 m in a millimetre field overflows to Infinity; −5e-324 % underflows to −0, read as 0 like "-0".
  const scaled = numSigned * factor;
  if (!Number.isFinite(scaled)) throw new InputError(argument, raw, 'a finite number', 'the number is too large');
  const value = Object.is(scaled, -0) ? 0 : scaled;
  const base = BASE_UNIT[kind];
  const conversion = unitKey !== '' && factor !== 1 ? `${formatPlain(numSigned)} ${unitKey} = ${formatPlain(value)} ${base}` : '';
  return { value, typedUnit: unitKey, conversion };
}

function lookupUnit(table: Record<string, number>, unit: string): string | undefined {
  // No unit typed: the base unit of the kind (the key whose factor is 1) is assumed.
  if (unit === '') return Object.keys(table).find((k) => table[k] === 1);
  // Own keys only: "1 constructor" must not find Object.prototype.constructor.
  if (Object.hasOwn(table, unit)) return unit;
  const lower = unit.toLowerCase();
  return Object.keys(table).find((k) => k.toLowerCase() === lower);
}

function parsePower(argument: string, raw: string, num: number, unit: string): ParsedQuantity {
  const u = unit.toLowerCase().replace('μ', 'µ');
  if (u === '' || u === 'dbm') return { value: num, typedUnit: u === '' ? '' : 'dBm', conversion: '' };
  const mwFactor: Record<string, number> = { mw: 1, 'µw': 1e-3, uw: 1e-3, nw: 1e-6, w: 1000 };
  const f = Object.hasOwn(mwFactor, u) ? mwFactor[u] : undefined;
  if (f === undefined) throw new InputError(argument, raw, UNITS_IN_WORDS.power, `"${unit.slice(0, 20)}" is not a unit this field knows`);
  const mw = num * f;
  if (!(mw > 0)) throw new InputError(argument, raw, 'a power greater than 0 in mW, µW, nW or W', 'a linear power must be positive to have a dBm value');
  const dbm = 10 * Math.log10(mw);
  if (!Number.isFinite(dbm)) throw new InputError(argument, raw, 'a finite power', 'the number is too large');
  return { value: dbm, typedUnit: unit, conversion: `${formatPlain(num)} ${unit} = ${formatPlain(dbm)} dBm` };
}

/** Plain formatting for conversion notes: up to 6 significant digits, no exponent for ordinary values. */
export function formatPlain(v: number): string {
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new InputError('value', v, 'a finite number');
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e-4 && a < 1e9) return String(Number(v.toPrecision(6)));
  return v.toExponential(4);
}
