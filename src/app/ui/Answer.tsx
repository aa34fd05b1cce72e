/** The main answer at the top of a calculator, kept in view while scrolling: label, figure, detail, and the calibration used. */
import { NO_VALUE } from './format';

export interface AnswerProps {
  label: string;
  value: string | undefined;
  detail?: string | undefined;
  note?: string | undefined;
}

export function Answer({ label, value, detail, note }: AnswerProps) {
  return (
    <div class="answer" aria-live="polite">
      <span class="answer-label">{label}</span>
      <span class="answer-value" data-answer>
        {value ?? NO_VALUE}
      </span>
      {detail && <span class="answer-detail">{detail}</span>}
      {note && <span class="answer-note">{note}</span>}
    </div>
  );
}
