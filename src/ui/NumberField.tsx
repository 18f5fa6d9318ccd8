import type { QuantityState } from './useQuantity';

/** The wavelengths field equipment commonly runs at, offered as quick picks (common practice). */
export const OPERATING_WAVELENGTHS_NM: readonly number[] = [850, 1300, 1310, 1490, 1550, 1625];

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
}

/**
 * A number input with its unit, decimal keypad, conversion note and plain-words error beside it.
 * Presentational only: NumberField feeds it from a useQuantity state; list rows (fiber sections,
 * chain steps) feed it from their own row text.
 */
export function NumberInput({ id, label, unit, text, onText, error, conversion, quickPicks, quickPickLabel, pickedValue, help }: NumberInputProps) {
  const describedBy = [error && `${id}-err`, conversion && !error && `${id}-conv`, help && `${id}-help`].filter(Boolean).join(' ');
  return (
    <div class={`field${error ? ' field-invalid' : ''}`}>
      <label for={id}>{label}</label>
      <div class="field-input">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
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
              {quickPickLabel ? quickPickLabel(v) : `${v} ${unit}`}
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

export interface NumberFieldProps extends Pick<NumberInputProps, 'label' | 'unit' | 'quickPicks' | 'quickPickLabel' | 'help'> {
  q: QuantityState;
  /** A computation's error that names this field's argument (from useResult/useComputed). */
  calc?: { error: string | undefined; errorArgument: string | undefined };
}

/** A field bound to one useQuantity state; its id is `f-<argument>`. */
export function NumberField({ q, calc, ...rest }: NumberFieldProps) {
  const calcError = calc?.errorArgument === q.argument ? calc.error : undefined;
  return (
    <NumberInput
      {...rest}
      id={`f-${q.argument}`}
      text={q.text}
      onText={q.setText}
      error={q.error ?? calcError}
      conversion={q.conversion}
      pickedValue={q.value}
    />
  );
}
