import type { QuantityState } from './useQuantity';

export interface NumberFieldProps {
  q: QuantityState;
  label: string;
  /** The unit the value is shown in; typed units (µm, km, mW…) are converted and the conversion shown. */
  unit: string;
  /** Common values offered as one-tap buttons, in `unit`. */
  quickPicks?: number[];
  /** Text on a quick-pick button when "value unit" reads wrong, e.g. "1 turn". */
  quickPickLabel?: (value: number) => string;
  help?: string;
  /** A computation's error that names this field's argument (from useResult/useComputed). */
  calc?: { error: string | undefined; errorArgument: string | undefined };
}

/** A number field with its unit, decimal keypad, conversion note and plain-words error beside it. */
export function NumberField({ q, label, unit, quickPicks, quickPickLabel, help, calc }: NumberFieldProps) {
  const id = `f-${q.argument}`;
  const calcError = calc?.errorArgument === q.argument ? calc.error : undefined;
  const error = q.error ?? calcError;
  const describedBy = [error && `${id}-err`, q.conversion && `${id}-conv`, help && `${id}-help`].filter(Boolean).join(' ');
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
          value={q.text}
          aria-invalid={error ? 'true' : undefined}
          aria-describedby={describedBy || undefined}
          onInput={(e) => q.setText((e.currentTarget as HTMLInputElement).value)}
        />
        <span class="field-unit" aria-hidden="true">{unit}</span>
      </div>
      {quickPicks && quickPicks.length > 0 && (
        <div class="quick-picks" role="group" aria-label={`Common values for ${label}`}>
          {quickPicks.map((v) => (
            <button type="button" key={v} aria-pressed={q.value === v} onClick={() => q.setText(String(v))}>
              {quickPickLabel ? quickPickLabel(v) : `${v} ${unit}`}
            </button>
          ))}
        </div>
      )}
      {q.conversion && !error && <p id={`${id}-conv`} class="field-conversion">{q.conversion}</p>}
      {error && <p id={`${id}-err`} class="field-error" role="alert"><span aria-hidden="true">⚠ </span>{error}</p>}
      {help && <p id={`${id}-help`} class="field-help">{help}</p>}
    </div>
  );
}
