/** Safety notes, one tap away from every screen. Each defers to the plant's procedures, codes and qualified people. */
import { useScreenContext } from '../settings/screenContext';
import { Deferred } from '../ui/Deferred';
import { ApproximationsNote } from './ApproximationsNote';
import { SAFETY_NOTES } from './notes';
import './screen.css';

const pairs = <T,>(items: readonly T[]): T[][] =>
  Array.from({ length: Math.ceil(items.length / 2) }, (_, i) => items.slice(2 * i, 2 * i + 2));

export default function SafetyScreen() {
  const ctx = useScreenContext();
  const { t } = ctx;
  return (
    <div class="screen safety">
      <h1 tabIndex={-1}>{t('app.safety.title')}</h1>
      <p class="note">{t('app.safety.intro')}</p>
      {/* The notes below the first two are drawn in later tasks, two at a time: a long page is many short tasks. */}
      {pairs(SAFETY_NOTES).map((pair, i) => {
        const notes = pair.map((id) => (
          <section key={id} class="card safety-note" aria-labelledby={`safety-${id}`}>
            <h2 id={`safety-${id}`}>{t(`app.safety.notes.${id}.title`)}</h2>
            <p>{t(`app.safety.notes.${id}.text`)}</p>
            <p class="safety-defer">{t('app.safety.defer')}</p>
          </section>
        ));
        return i === 0 ? notes : <Deferred key={pair[0]}>{notes}</Deferred>;
      })}
      <Deferred>
        <ApproximationsNote ctx={ctx} />
      </Deferred>
    </div>
  );
}
