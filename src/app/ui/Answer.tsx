/** The main answer at the top of a calculator, kept in view while scrolling: label, figure, detail, and the calibration used. */
import { NO_VALUE } from './format';

export interface AnswerProps {
  label: string;
  value: string | undefined;
  detail?: string | undefined;
  note?: string | undefined;
  /** While a newer answer is worked out: the words of the small mark beside the one shown. */
  updating?: string | undefined;
}

export function Answer({ label, value, detail, note, updating }: AnswerProps) {
  return (
    <div
      class="answer"
      aria-live="polite"
      aria-busy={updating ? 'true' : undefined}
      data-updating={updating ? '' : undefined}
    >
      <span class="answer-label">{label}</span>
      <span class="answer-value" data-answer>
        {value ?? NO_VALUE}
      </span>
      {updating && <span class="answer-updating">{updating}</span>}
      {detail && <span class="answer-detail">{detail}</span>}
      {note && <span class="answer-note">{note}</span>}
    </div>
  );
}
