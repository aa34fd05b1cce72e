/** Labelled free-text inputs (a step's name, a work order, a date, notes) with a hint and an error beside them. */
import type { ComponentChildren } from 'preact';
import { describedBy, FieldNotes } from './FieldNotes';

export interface TextFieldProps {
  id: string;
  label: string;
  value: string;
  onInput: (value: string) => void;
  placeholder?: string | undefined;
  maxLength?: number;
  /** 'date' and 'time' give the phone's own pickers; 'search' a clear button. */
  type?: 'text' | 'search' | 'date' | 'time' | 'password';
  hint?: string | undefined;
  error?: string | undefined;
  /** Upper-case keyboards for codes such as initials and furnace names. */
  autoCapitalize?: 'characters' | 'sentences' | 'off';
  /** Shown under the box (quick picks). */
  children?: ComponentChildren;
}

/** Preact splits input attributes by `type` into a union a union of types cannot match; each of ours is text-like. */
const asTextInput = (type: NonNullable<TextFieldProps['type']>) => type as 'text';

export function TextField({
  id,
  label,
  value,
  onInput,
  placeholder,
  maxLength = 40,
  type = 'text',
  hint,
  error,
  autoCapitalize,
  children,
}: TextFieldProps) {
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <div class={error ? 'field-box field-box-invalid' : 'field-box'}>
        <input
          id={id}
          type={asTextInput(type)}
          autoComplete="off"
          autoCapitalize={autoCapitalize}
          spellcheck={false}
          value={value}
          placeholder={placeholder}
          maxLength={type === 'date' || type === 'time' ? undefined : maxLength}
          aria-invalid={error ? 'true' : undefined}
          aria-describedby={describedBy(id, hint, error)}
          onInput={(e) => onInput(e.currentTarget.value)}
        />
      </div>
      {children}
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}

/** Several lines of free text (notes); kept exactly as written. */
export function TextAreaField({
  id,
  label,
  value,
  onInput,
  maxLength,
  hint,
  error,
}: Omit<TextFieldProps, 'type' | 'placeholder' | 'children' | 'autoCapitalize'>) {
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <div class={error ? 'field-box field-box-invalid' : 'field-box'}>
        <textarea
          id={id}
          rows={3}
          value={value}
          maxLength={maxLength}
          aria-invalid={error ? 'true' : undefined}
          aria-describedby={describedBy(id, hint, error)}
          onInput={(e) => onInput(e.currentTarget.value)}
        />
      </div>
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}

/** A large checkbox with its label. */
export function CheckField({
  id,
  label,
  checked,
  onChange,
}: {
  id: string;
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
}) {
  return (
    <label class="check" for={id}>
      <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.currentTarget.checked)} />
      <span>{label}</span>
    </label>
  );
}

/** One-tap values under a field (the plant's furnaces, its usual parts). */
export function QuickPicks({
  label,
  values,
  current,
  onPick,
}: {
  label: string;
  values: readonly string[];
  current: string;
  onPick: (value: string) => void;
}) {
  if (values.length === 0) return null;
  return (
    <div class="quick-picks" role="group" aria-label={label}>
      {values.map((value) => (
        <button
          key={value}
          type="button"
          class="button quick-pick"
          aria-pressed={value === current ? 'true' : 'false'}
          onClick={() => onPick(value)}
        >
          {value}
        </button>
      ))}
    </div>
  );
}
