import { useMemo, useState } from 'preact/hooks';
import { InputError } from '../physics/errors';
import { parseQuantity, type QuantityKind } from '../physics/units';
import { SEE_MARKED_FIELD } from './useResult';

export interface QuantityState {
  /** The text as typed. */
  text: string;
  setText: (t: string) => void;
  /** The parsed value in the kind's base unit (nm, km, mm, µm, dBm, plain), or undefined when it does not parse. */
  value: number | undefined;
  /**
   * Set when the text does not parse: a pointer to the field, for a headline or a card. The field
   * itself says what is wrong with its own label and unit (NumberField's parseErrorText).
   */
  error: string | undefined;
  /** Conversion note, e.g. "1.55 µm = 1550 nm". */
  conversion: string;
  /** The argument name used in messages, e.g. `wavelengthNm`. */
  argument: string;
  kind: QuantityKind;
  /** Set when parsing failed: rethrown by need() inside a computation. */
  failure: InputError | undefined;
}

/** One typed field's state. Parsing is derived from the text, never stored twice. */
export function useQuantity(argument: string, kind: QuantityKind, initialText: string): QuantityState {
  const [text, setText] = useState(initialText);
  const parsed = useMemo(() => {
    try {
      const p = parseQuantity(argument, text, kind);
      return { value: p.value, conversion: p.conversion, failure: undefined };
    } catch (e) {
      if (e instanceof InputError) return { value: undefined, conversion: '', failure: e };
      throw e;
    }
  }, [argument, text, kind]);
  return {
    text,
    setText,
    value: parsed.value,
    conversion: parsed.conversion,
    failure: parsed.failure,
    error: parsed.failure ? SEE_MARKED_FIELD : undefined,
    argument,
    kind,
  };
}

/** The field's value, or its parse error thrown — for use inside a useResult computation. */
export function need(q: QuantityState): number {
  if (q.value === undefined) throw q.failure ?? new InputError(q.argument, q.text, 'a number');
  return q.value;
}

/**
 * The field's value in its base unit, for reports and titles: "1,55 µm" typed into a
 * wavelength field reads "1550 nm", never the raw text with a second unit stuck on.
 */
export function shownValue(q: QuantityState, unit: string, significant = 6): string {
  if (q.value === undefined) return `${q.text.slice(0, 20)} (not a number)`;
  const v = Number(q.value.toPrecision(significant));
  return unit ? `${v} ${unit}` : String(v);
}
