import type { QuantityState } from './useQuantity';
import type { FieldFault } from './useResult';
import type { QuantityKind } from '../physics/units';
import { sentence } from './errorText';
import { memoAlike } from './rendersAlike';

/** The wavelengths field equipment commonly runs at, offered as quick picks (common practice). */
export const OPERATING_WAVELENGTHS_NM: readonly number[] = [850, 1300, 1310, 1490, 1550, 1625];

/**
 * The phone keypad a field opens. 'decimal' has digits and the decimal separator only (a ± key
 * is added beside a signed field); 'text' has letters and the minus sign, for fields that take a
 * unit word ("0.5 mW", "300 m").
 */
export type Keypad = 'decimal' | 'text';

/** Kinds whose values are often typed with a unit word, so they open the full keyboard. */
const UNIT_WORD_KINDS: readonly QuantityKind[] = ['power', 'length'];

/** An example for the field's hint, per kind, in the field's own unit. */
const EXAMPLES: Record<QuantityKind, string> = {
  wavelength: 'such as 1550 (or 1,55 µm)',
  length: 'such as 2.5 (or 300 m)',
  radius: 'such as 15 (or 1.5 cm)',
  size: 'such as 9.2',
  power: 'such as −3 (or 0.5 mW)',
  ratio: 'such as 0.5',
  plain: 'such as 0.3',
};

export interface NumberInputProps {
  /** The input's id; the explanation beside it is `${id}-err`, the conversion `${id}-conv`. */
  id: string;
  label: string;
  /** The unit the value is shown in; typed units (µm, km, mW…) are converted and the conversion shown. */
  unit: string;
  text: string;
  onText: (text: string) => void;
  /** Plain-words reason the text gives no result, shown beside the field. */
  error?: string;
  /** Conversion note, e.g. "350 m = 0.35 km". */
  conversion?: string;
  /** Common values offered as one-tap buttons, in `unit`. */
  quickPicks?: readonly number[];
  /** Text on a quick-pick button when "value unit" reads wrong, e.g. "1 turn". */
  quickPickLabel?: (value: number) => string;
  /** The current value, to mark the quick pick that matches it. */
  pickedValue?: number;
  help?: string;
  keypad?: Keypad;
  /** The value may be negative: a decimal keypad gets a ± key. */
  signed?: boolean;
}

/** Flips the sign of what is typed, keeping the rest of the text as it is. */
export function toggleSign(text: string): string {
  const t = text.trimStart();
  if (/^[-−–]/.test(t)) return t.slice(1);
  if (t.startsWith('+')) return `-${t.slice(1)}`;
  return `-${t}`;
}

/**
 * A number input with its unit, the keypad that fits it, conversion note and plain-words error beside it.
 * Presentational only: NumberField feeds it from a useQuantity state; list rows (fiber sections,
 * chain steps) feed it from their own row text.
 */
export function NumberInput({ id, label, unit, text, onText, error, conversion, quickPicks, quickPickLabel, pickedValue, help, keypad = 'decimal', signed }: NumberInputProps) {
  const describedBy = [error && `${id}-err`, conversion && !error && `${id}-conv`, help && `${id}-help`].filter(Boolean).join(' ');
  return (
    <div class={`field${error ? ' field-invalid' : ''}`}>
      <label for={id}>{label}</label>
      <div class="field-input">
        {signed && keypad === 'decimal' && (
          <button type="button" class="sign-toggle" aria-label={`± change the sign of ${label}`} onClick={() => onText(toggleSign(text))}>
            ±
          </button>
        )}
        <input
          id={id}
          data-number
          type="text"
          inputMode={keypad}
          enterKeyHint="done"
          autoComplete="off"
          autoCapitalize="off"
          spellcheck={false}
          value={text}
          aria-invalid={error ? 'true' : undefined}
          aria-describedby={describedBy || undefined}
          onInput={(e) => onText((e.currentTarget as HTMLInputElement).value)}
        />
        <span class="field-unit" aria-hidden="true">{unit}</span>
      </div>
      {quickPicks && quickPicks.length > 0 && (
        <div class="quick-picks" role="group" aria-label={`Common values for ${label}`}>
          {quickPicks.map((v) => (
            <button type="button" key={v} aria-pressed={pickedValue === v} onClick={() => onText(String(v))}>
              {quickPickLabel ? quickPickLabel(v) : `${v}\u00a0${unit}`}
            </button>
          ))}
        </div>
      )}
      {conversion && !error && <p id={`${id}-conv`} class="field-conversion">{conversion}</p>}
      {error && (
        <p id={`${id}-err`} class="field-error" role="alert">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      {help && <p id={`${id}-help`} class="field-help">{help}</p>}
    </div>
  );
}

export interface NumberFieldProps extends Pick<NumberInputProps, 'label' | 'unit' | 'quickPicks' | 'quickPickLabel' | 'help' | 'signed' | 'keypad'> {
  q: QuantityState;
  /** A computation's error; shown here when it names this field's argument. */
  calc?: { errorArgument: string | undefined; fault?: FieldFault };
  /** The example in this field's hint; defaults by kind. */
  example?: string;
}

/** The words beside a field that does not parse, with its own label, unit and example. */
export function parseErrorText(q: QuantityState, label: string, unit: string, example?: string): string | undefined {
  if (!q.failure) return undefined;
  const unitWords = unit && !unit.startsWith('(') ? ` in ${unit}` : '';
  return sentence(label, `a number${unitWords}, ${example ?? EXAMPLES[q.kind]}`, q.failure.hint);
}

type NumberFieldViewProps = Omit<NumberFieldProps, 'calc'> & { fault: FieldFault | undefined };

/** A field bound to one useQuantity state; its id is `f-<argument>`. */
function NumberFieldView({ q, fault, example, keypad, ...rest }: NumberFieldViewProps) {
  const error = parseErrorText(q, rest.label, rest.unit, example) ?? (fault ? sentence(rest.label, fault.allowed, fault.hint) : undefined);
  return (
    <NumberInput
      {...rest}
      id={`f-${q.argument}`}
      text={q.text}
      onText={q.setText}
      error={error}
      conversion={q.conversion}
      pickedValue={q.value}
      keypad={keypad ?? (UNIT_WORD_KINDS.includes(q.kind) ? 'text' : 'decimal')}
    />
  );
}

const NumberFieldAlike = memoAlike(NumberFieldView);

/**
 * A typed quantity's field. Skipped when the screen re-renders with the same props (a key in another field).
 * Of the computation it is given, only the fault that names this field goes on to be compared: the whole
 * result, compared in depth for every field on every key, cost more than drawing the field.
 */
export function NumberField({ calc, ...props }: NumberFieldProps) {
  return <NumberFieldAlike {...props} fault={calc?.errorArgument === props.q.argument ? calc.fault : undefined} />;
}
