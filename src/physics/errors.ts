// Typed, explained errors for every public physics function.
// A physics function never returns NaN: it either returns a finite, physically valid
// result or throws one of these, naming the argument, the allowed range and a hint.

/** Base class: anything the calculators throw on purpose. */
export class CalcError extends Error {
  override name = 'CalcError';
}

/** An argument is missing, not a finite number, or outside the range the model allows. */
export class InputError extends CalcError {
  override name = 'InputError';
  constructor(
    /** The argument as the caller named it, e.g. `wavelengthNm`. */
    readonly argument: string,
    /** The offending value, as given. */
    readonly value: unknown,
    /** The allowed range in plain words, e.g. `200 to 2500 nm`. */
    readonly allowed: string,
    /** The likely mistake, e.g. `did you mean 1550 nm?`. */
    readonly hint?: string,
  ) {
    super(`${argument} = ${describeValue(value)} is not allowed: expected ${allowed}${hint ? ` (${hint})` : ''}.`);
  }
}

/**
 * The inputs are each valid, but together they ask for something the model cannot give
 * (for example label values no step-index fiber can reproduce, or a mode that is not guided).
 */
export class ModelError extends CalcError {
  override name = 'ModelError';
  constructor(
    message: string,
    /** Which model or formula refused, e.g. `Marcuse 1976 bend loss`. */
    readonly model: string,
    readonly hint?: string,
  ) {
    super(message);
  }
}

export function isCalcError(e: unknown): e is CalcError {
  return e instanceof CalcError;
}

function describeValue(value: unknown): string {
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return 'NaN (not a number)';
    if (!Number.isFinite(value)) return value > 0 ? 'Infinity' : '-Infinity';
    return String(value);
  }
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? value.slice(0, 40) + '…' : value);
  if (value === undefined) return 'missing';
  if (value === null) return 'null';
  return typeof value;
}

export interface RangeSpec {
  min?: number;
  max?: number;
  /** Default true: min itself is allowed. */
  minInclusive?: boolean;
  /** Default true: max itself is allowed. */
  maxInclusive?: boolean;
  /** Unit shown in the message, e.g. `nm`. */
  unit?: string;
  /** A hint to add when the value is out of range. */
  hint?: string | ((value: number) => string | undefined);
}

function rangeText(spec: RangeSpec): string {
  const u = spec.unit ? ` ${spec.unit}` : '';
  const lo = spec.min;
  const hi = spec.max;
  const loIn = spec.minInclusive ?? true;
  const hiIn = spec.maxInclusive ?? true;
  if (lo !== undefined && hi !== undefined) {
    if (loIn && hiIn) return `a number from ${lo} to ${hi}${u}`;
    return `a number ${loIn ? '≥' : '>'} ${lo} and ${hiIn ? '≤' : '<'} ${hi}${u}`;
  }
  if (lo !== undefined) return `a number ${loIn ? '≥' : '>'} ${lo}${u}`;
  if (hi !== undefined) return `a number ${hiIn ? '≤' : '<'} ${hi}${u}`;
  return `a finite number${u}`;
}

/** Throws InputError unless `value` is a finite number inside `spec`; returns it typed. */
export function requireNumber(argument: string, value: unknown, spec: RangeSpec = {}): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(argument, value, rangeText(spec), 'a finite number is needed');
  }
  const { min, max } = spec;
  const loIn = spec.minInclusive ?? true;
  const hiIn = spec.maxInclusive ?? true;
  const below = min !== undefined && (loIn ? value < min : value <= min);
  const above = max !== undefined && (hiIn ? value > max : value >= max);
  if (below || above) {
    const hint = typeof spec.hint === 'function' ? spec.hint(value) : spec.hint;
    throw new InputError(argument, value, rangeText(spec), hint);
  }
  return value;
}

/** Throws InputError unless `value` is a finite number > 0 (and ≤ max if given). */
export function requirePositive(argument: string, value: unknown, spec: Omit<RangeSpec, 'min' | 'minInclusive'> = {}): number {
  return requireNumber(argument, value, { ...spec, min: 0, minInclusive: false });
}

/** Throws InputError unless `value` is an integer in [min, max]. */
export function requireInteger(argument: string, value: unknown, min: number, max: number): number {
  const v = requireNumber(argument, value, { min, max });
  if (!Number.isInteger(v)) throw new InputError(argument, value, `a whole number from ${min} to ${max}`);
  return v;
}

/** Wavelength range every public function accepts (UV to mid-IR silica transmission edge). Common practice. */
export const WAVELENGTH_MIN_NM = 200;
export const WAVELENGTH_MAX_NM = 2500;

/**
 * Wavelength in nm, 200–2500. A value that looks like µm (0.2–2.5) or m (2e-7–2.5e-6)
 * gets a "did you mean" hint, since 1.55 typed into a nm field is the classic slip.
 */
export function requireWavelengthNm(argument: string, value: unknown): number {
  return requireNumber(argument, value, {
    min: WAVELENGTH_MIN_NM,
    max: WAVELENGTH_MAX_NM,
    unit: 'nm',
    hint: (v) => {
      if (v >= 0.2 && v <= 2.5) return `did you mean ${round(v * 1000)} nm (${v} µm)?`;
      if (v >= 2e-7 && v <= 2.5e-6) return `did you mean ${round(v * 1e9)} nm (${v} m)?`;
      if (v >= 2e5 && v <= 2.5e6) return `did you mean ${round(v / 1000)} nm (${v} pm)?`;
      return undefined;
    },
  });
}

function round(v: number): number {
  return Math.round(v * 1000) / 1000;
}
