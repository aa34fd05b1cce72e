/** A labelled drop-down for longer lists (steel grade, model, unit). */
export interface Choice {
  value: string;
  label: string;
  /** Shown but not selectable (e.g. a status the signed-in person may not set). */
  disabled?: boolean;
}

export interface ChoiceFieldProps {
  id: string;
  label: string;
  value: string;
  choices: readonly Choice[];
  onChange: (value: string) => void;
  hint?: string | undefined;
  compact?: boolean;
  /**
   * Choices that are a person's or a file's own words (a furnace, a column heading), longer than a
   * menu shows on a phone: the chosen one is drawn in lines of its own over the menu, which a tap still opens.
   */
  wrap?: boolean;
}

export function ChoiceField({ id, label, value, choices, onChange, hint, compact, wrap }: ChoiceFieldProps) {
  return (
    <div class={compact ? 'field field-compact' : 'field'}>
      <label for={id}>{label}</label>
      <div class={wrap ? 'field-box choice-wrap' : 'field-box'}>
        {wrap && (
          <span class="choice-shown" aria-hidden="true">
            {choices.find((c) => c.value === value)?.label}
          </span>
        )}
        <select
          id={id}
          value={value}
          aria-describedby={hint ? `${id}-hint` : undefined}
          onChange={(e) => onChange(e.currentTarget.value)}
        >
          {choices.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </select>
      </div>
      {hint && (
        <p id={`${id}-hint`} class="field-hint">
          {hint}
        </p>
      )}
    </div>
  );
}
