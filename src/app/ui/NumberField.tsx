/** A labelled numeric input: accepts a decimal comma, shows its unit and its error in words beside it. */
import { useState } from 'preact/hooks';
import { language } from '../../i18n/useT';
import { displayText, takesDuration, type FieldText } from './fieldText';
import { describedBy, FieldNotes } from './FieldNotes';
import { localizeTyped, UNIT_SYMBOLS } from './format';

export interface NumberFieldProps {
  id: string;
  label: string;
  value: FieldText;
  /** Unit the field is shown and typed in ('' for none); `unitLabel` overrides its symbol. */
  unit?: string;
  unitLabel?: string;
  onInput: (next: FieldText) => void;
  error?: string | undefined;
  hint?: string | undefined;
  placeholder?: string | undefined;
  compact?: boolean;
  /** Label kept for screen readers only (a table-like row with visible column titles). */
  hideLabel?: boolean;
}

export function NumberField({
  id,
  label,
  value,
  unit = '',
  unitLabel,
  onInput,
  error,
  hint,
  placeholder,
  compact,
  hideLabel,
}: NumberFieldProps) {
  // While a person types, exactly what they typed; otherwise a plain number with the locale's decimal
  // mark (a default "0.75" reads "0,75" in German), which reads back as the same value.
  const [typing, setTyping] = useState(false);
  const asTyped = displayText(value, unit, language.value);
  const shown = typing ? asTyped : localizeTyped(asTyped, language.value);
  const symbol = unitLabel ?? (unit ? (UNIT_SYMBOLS[unit] ?? unit) : '');
  return (
    <div class={compact ? 'field field-compact' : 'field'}>
      <label for={id} class={hideLabel ? 'visually-hidden' : undefined}>
        {label}
        {symbol && <span class="visually-hidden"> ({symbol})</span>}
      </label>
      <div class={error ? 'field-box field-box-invalid' : 'field-box'}>
        <input
          id={id}
          type="text"
          // A time may be typed as 1:20 or 80 min, which the digits-only keyboard cannot.
          inputMode={takesDuration(unit) ? 'text' : 'decimal'}
          autoComplete="off"
          spellcheck={false}
          value={shown}
          placeholder={placeholder}
          aria-invalid={error ? 'true' : undefined}
          aria-describedby={describedBy(id, hint, error)}
          onInput={(e) => {
            setTyping(true);
            onInput({ text: e.currentTarget.value, unit });
          }}
          onBlur={() => setTyping(false)}
        />
        {symbol && (
          <span class="field-unit" aria-hidden="true">
            {symbol}
          </span>
        )}
      </div>
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}
