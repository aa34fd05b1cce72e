/** The main answer at the top of a calculator, kept in view while scrolling: label, figure, detail, and the calibration used. */
import { useEffect, useRef } from 'preact/hooks';
import { NO_VALUE } from './format';

/** Room the bottom navigation takes. */
const NAV_PX = 72;

/**
 * Keeps the field being edited clear of the sticky answer: a field that gets the focus under the
 * answer (or under the bottom navigation) is scrolled to the middle of what is left in view.
 */
function useFieldsClearOf(answerRef: { current: HTMLElement | null }) {
  useEffect(() => {
    const onFocus = (event: FocusEvent) => {
      const field = event.target;
      const answer = answerRef.current;
      if (!answer || !(field instanceof HTMLElement) || !field.matches('input, textarea, select')) return;
      requestAnimationFrame(() => {
        const box = field.getBoundingClientRect();
        const covered = answer.getBoundingClientRect();
        const under = box.top < covered.bottom && box.bottom > covered.top;
        if (under || box.bottom > innerHeight - NAV_PX) field.scrollIntoView({ block: 'center' });
      });
    };
    document.addEventListener('focusin', onFocus);
    return () => document.removeEventListener('focusin', onFocus);
  }, [answerRef]);
}

export interface AnswerProps {
  label: string;
  value: string | undefined;
  detail?: string | undefined;
  note?: string | undefined;
  /** While a newer answer is worked out: the words of the small mark beside the one shown. */
  updating?: string | undefined;
}

export function Answer({ label, value, detail, note, updating }: AnswerProps) {
  const answerRef = useRef<HTMLDivElement>(null);
  useFieldsClearOf(answerRef);
  return (
    <div
      ref={answerRef}
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
