/** A short set of exclusive options as large radio segments (thumb-sized, keyboard: arrow keys). */
import type { Choice } from './ChoiceField';

export interface SegmentedProps {
  name: string;
  legend: string;
  value: string;
  choices: readonly Choice[];
  onChange: (value: string) => void;
  /** Lets the options wrap onto more rows (five statuses on a phone). */
  wrap?: boolean;
  /** Legend for screen readers only (the field beside it names the choice). */
  hideLegend?: boolean;
}

export function Segmented({ name, legend, value, choices, onChange, wrap, hideLegend }: SegmentedProps) {
  return (
    <fieldset class={wrap ? 'segmented segmented-wrap' : 'segmented'}>
      <legend class={hideLegend ? 'visually-hidden' : undefined}>{legend}</legend>
      <div class="segmented-options">
        {choices.map((c) => (
          <label
            key={c.value}
            class={`segment${c.value === value ? ' segment-on' : ''}${c.disabled ? ' segment-disabled' : ''}`}
          >
            <input
              type="radio"
              name={name}
              value={c.value}
              disabled={c.disabled}
              checked={c.value === value}
              onChange={() => onChange(c.value)}
            />
            <span>{c.label}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
