/** Labelled free-text inputs (a step's name, a work order, a date, notes) with a hint and an error beside them. */
import type { ComponentChildren } from 'preact';
import { useEffect, useLayoutEffect, useRef } from 'preact/hooks';
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
        {type === 'text' ? (
          <WrappingLine
            id={id}
            value={value}
            placeholder={placeholder}
            maxLength={maxLength}
            autoCapitalize={autoCapitalize}
            error={error}
            describedBy={describedBy(id, hint, error)}
            onInput={onInput}
          />
        ) : (
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
        )}
      </div>
      {children}
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}

/**
 * One line of text that wraps instead of scrolling out of sight: a 40-character part number or an
 * 80-character step name is read whole on a 390 px phone. The box grows with its text; Enter and
 * pasted line breaks do not make a second line of the value.
 */
function WrappingLine({
  id,
  value,
  placeholder,
  maxLength,
  autoCapitalize,
  error,
  describedBy: described,
  onInput,
}: {
  id: string;
  value: string;
  placeholder: string | undefined;
  maxLength: number;
  autoCapitalize: TextFieldProps['autoCapitalize'];
  error: string | undefined;
  describedBy: string | undefined;
  onInput: (value: string) => void;
}) {
  const boxRef = useGrowingBox(value, placeholder);
  return (
    <textarea
      ref={boxRef}
      id={id}
      class="field-line"
      rows={1}
      autoComplete="off"
      autoCapitalize={autoCapitalize}
      spellcheck={false}
      value={value}
      placeholder={placeholder}
      maxLength={maxLength}
      aria-invalid={error ? 'true' : undefined}
      aria-describedby={described}
      onKeyDown={(e) => {
        if (e.key === 'Enter') {
          e.preventDefault();
          e.currentTarget.form?.requestSubmit();
        }
      }}
      onInput={(e) => onInput(e.currentTarget.value.replace(/[\r\n]+/gu, ' '))}
    />
  );
}

/** Several lines of free text (notes); kept exactly as written, the box as tall as its text. */
export function TextAreaField({
  id,
  label,
  value,
  onInput,
  maxLength,
  hint,
  error,
}: Omit<TextFieldProps, 'type' | 'placeholder' | 'children' | 'autoCapitalize'>) {
  const boxRef = useGrowingBox(value);
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <div class={error ? 'field-box field-box-invalid' : 'field-box'}>
        <textarea
          ref={boxRef}
          id={id}
          class="field-lines"
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

/** A textarea that grows with its text, so nothing typed hides behind a scroll bar. */
function useGrowingBox(value: string, placeholder?: string) {
  const boxRef = useRef<HTMLTextAreaElement>(null);
  useLayoutEffect(() => fitHeight(boxRef.current), [value, placeholder]);
  useEffect(() => {
    // A new width (layout settling, a turned phone) changes how many lines the text takes.
    const box = boxRef.current;
    if (!box || typeof ResizeObserver === 'undefined') return;
    let width = box.clientWidth;
    const observer = new ResizeObserver(() => {
      if (box.clientWidth === width) return;
      width = box.clientWidth;
      fitHeight(box);
    });
    observer.observe(box);
    return () => observer.disconnect();
  }, []);
  return boxRef;
}

/** As many rows as the text takes (rows, not an inline height: the markup carries no style attributes). */
function fitHeight(box: HTMLTextAreaElement | null): void {
  if (!box) return;
  const least = box.classList.contains('field-lines') ? 3 : 1;
  box.rows = least;
  while (box.scrollHeight > box.clientHeight + 1 && box.rows < 40) box.rows += 1;
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
