// A plain text field with its unit and its error beside it, for the library form.
// (The UI kit's NumberField is bound to one useQuantity; this form keeps a draft object instead.)
import type { ComponentChildren } from 'preact';

export interface FieldProps {
  id: string;
  label: string;
  unit?: string;
  value: string;
  onInput: (v: string) => void;
  error?: string;
  help?: string;
  inputMode?: 'decimal' | 'text';
  multiline?: boolean;
  maxLength?: number;
  children?: ComponentChildren;
}

export function Field({ id, label, unit, value, onInput, error, help, inputMode = 'decimal', multiline, maxLength }: FieldProps) {
  const describedBy = [error && `${id}-err`, help && `${id}-help`].filter(Boolean).join(' ') || undefined;
  const common = {
    id,
    value,
    'aria-invalid': error ? ('true' as const) : undefined,
    'aria-describedby': describedBy,
    maxLength,
    onInput: (e: Event) => onInput((e.currentTarget as HTMLInputElement | HTMLTextAreaElement).value),
  };
  return (
    <div class={`field${error ? ' field-invalid' : ''}`}>
      <label for={id}>{label}</label>
      <div class="field-input">
        {multiline ? <textarea {...common} rows={3} /> : <input {...common} type="text" inputMode={inputMode} autoComplete="off" spellcheck={inputMode === 'text'} />}
        {unit && (
          <span class="field-unit" aria-hidden="true">
            {unit}
          </span>
        )}
      </div>
      {error && (
        <p id={`${id}-err`} class="field-error" role="alert">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      {help && (
        <p id={`${id}-help`} class="field-help">
          {help}
        </p>
      )}
    </div>
  );
}

export interface ChoiceProps<T extends string> {
  id: string;
  label: string;
  value: T;
  options: [T, string][];
  onChange: (v: T) => void;
  error?: string;
}

export function Choice<T extends string>({ id, label, value, options, onChange, error }: ChoiceProps<T>) {
  return (
    <div class={`field${error ? ' field-invalid' : ''}`}>
      <label for={id}>{label}</label>
      <select id={id} value={value} aria-invalid={error ? 'true' : undefined} onChange={(e) => onChange((e.currentTarget as HTMLSelectElement).value as T)}>
        {options.map(([v, text]) => (
          <option key={v} value={v}>
            {text}
          </option>
        ))}
      </select>
      {error && (
        <p class="field-error" role="alert">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
    </div>
  );
}
