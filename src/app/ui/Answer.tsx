/** The main answer at the top of a calculator, kept in view while scrolling: label, figure, detail, and the calibration used. */
import { useEffect, useRef } from 'preact/hooks';
import { NO_VALUE } from './format';

/** The header's height: the answer sticks just below it (ui.css `.answer { top }`). */
const HEADER_PX = 60;
/** Room the bottom navigation takes. */
const NAV_PX = 72;

/**
 * Keeps the field being edited clear of the sticky answer: the page's scroll padding is the space
 * the header and answer cover (so the browser scrolls a focused field below them), and a field that
 * gets the focus under either, or under the bottom navigation, is scrolled into the clear.
 */
function useFieldsClearOf(answerRef: { current: HTMLElement | null }) {
  useEffect(() => {
    const answer = answerRef.current;
    if (!answer || typeof ResizeObserver === 'undefined' || !('adoptedStyleSheets' in document)) return;
    const covered = () =>
      getComputedStyle(answer).position === 'sticky' ? HEADER_PX + answer.offsetHeight + 8 : HEADER_PX;
    // A constructed style sheet, not a style attribute: the markup carries none (CSP and its test).
    const sheet = new CSSStyleSheet();
    document.adoptedStyleSheets = [...document.adoptedStyleSheets, sheet];
    const observer = new ResizeObserver(() => sheet.replaceSync(`:root { --covered-top: ${covered()}px; }`));
    observer.observe(answer);
    const onFocus = (event: FocusEvent) => {
      const field = event.target;
      if (!(
        field instanceof HTMLInputElement ||
        field instanceof HTMLTextAreaElement ||
        field instanceof HTMLSelectElement
      ))
        return;
      requestAnimationFrame(() => {
        const box = field.getBoundingClientRect();
        const bottom = (window.visualViewport?.height ?? window.innerHeight) - NAV_PX;
        if (box.top < covered() || box.bottom > bottom) field.scrollIntoView({ block: 'center' });
      });
    };
    document.addEventListener('focusin', onFocus);
    return () => {
      observer.disconnect();
      document.removeEventListener('focusin', onFocus);
      document.adoptedStyleSheets = document.adoptedStyleSheets.filter((s) => s !== sheet);
    };
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
