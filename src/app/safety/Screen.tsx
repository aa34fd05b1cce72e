/** Safety notes, one tap away from every screen. Each defers to the plant's procedures, codes and qualified people. */
import { useScreenContext } from '../settings/screenContext';
import { ApproximationsNote } from './ApproximationsNote';
import { SAFETY_NOTES } from './notes';
import './screen.css';

export default function SafetyScreen() {
  const ctx = useScreenContext();
  const { t } = ctx;
  return (
    <div class="screen safety">
      <h1 tabIndex={-1}>{t('app.safety.title')}</h1>
      <p class="note">{t('app.safety.intro')}</p>
      {SAFETY_NOTES.map((id) => (
        <section key={id} class="card safety-note" aria-labelledby={`safety-${id}`}>
          <h2 id={`safety-${id}`}>{t(`app.safety.notes.${id}.title`)}</h2>
          <p>{t(`app.safety.notes.${id}.text`)}</p>
          <p class="safety-defer">{t('app.safety.defer')}</p>
        </section>
      ))}
      <ApproximationsNote ctx={ctx} />
    </div>
  );
}
