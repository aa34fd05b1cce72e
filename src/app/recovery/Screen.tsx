/** Upset recovery: what the furnace did, converted to time at the set temperature, and the time still needed. */
import { EUTECTOID_TEMP_C } from '../../physics';
import { Icon } from '../ui/Icon';
import { NO_VALUE, UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { ErrorNote } from '../ui/Notices';
import type { FieldText } from '../ui/fieldText';
import { fieldSetters } from '../ui/setters';
import { ResultList, type ResultRow } from '../ui/ResultList';
import { useScreenContext } from '../settings/screenContext';
import { LogNoteButton } from '../log/save/LogActions';
import { recoveryNote } from './logNote';
import { recoveryOutcome } from './results';
import { addReading, MAX_READINGS, recoveryForm, removeReading, setReading } from './state';
import './screen.css';

export default function RecoveryScreen() {
  const { t, show } = useScreenContext();
  // What was typed is drawn at once (RecoveryInputs); the answer and results follow in the next task.
  const outcome = recoveryOutcome.value;
  const r = outcome.result;
  const rows: ResultRow[] = r
    ? [
        {
          key: 'extra',
          label: t('app.recovery.extraTime'),
          value: show.time(r.extraTimeH ?? 0),
          detail: show.hoursMinutes(r.extraTimeH ?? 0),
          main: true,
        },
        {
          key: 'equivalent',
          label: t('app.recovery.equivalentTime', { temperature: show.temperature(r.setTemperatureC) }),
          value: show.time(r.equivalentTimeH),
          detail: show.hoursMinutes(r.equivalentTimeH),
        },
        { key: 'elapsed', label: t('app.recovery.elapsed'), value: show.time(r.elapsedH) },
        {
          key: 'lost',
          label: r.lostTimeH >= 0 ? t('app.recovery.lostTime') : t('app.recovery.gainedTime'),
          value: show.time(Math.abs(r.lostTimeH)),
          detail: show.hoursMinutes(Math.abs(r.lostTimeH)),
        },
      ]
    : [];
  const note = r ? recoveryNote(r, t, show) : undefined;
  const generalReadingsError = useGeneralReadingsError();
  return (
    <div class="screen recovery">
      <h1 tabIndex={-1}>{t('app.recovery.title')}</h1>
      <p class="note">{t('app.recovery.intro')}</p>
      <div class="answer" aria-live="polite">
        <span class="answer-label">
          {r
            ? t('app.recovery.answerLabel', { temperature: show.temperature(r.setTemperatureC) })
            : t('app.common.noResult')}
        </span>
        <span class="answer-value">{r ? show.hoursMinutes(r.extraTimeH ?? 0) : NO_VALUE}</span>
      </div>
      <RecoveryInputs />
      <section class="card" aria-labelledby="recovery-results">
        <h2 id="recovery-results">{t('app.common.results')}</h2>
        {r && <ResultList rows={rows} label={t('app.common.results')} />}
        {!r && !generalReadingsError && <p class="note">{t('app.common.fixInputs')}</p>}
        <p class="note">{t('app.recovery.method', { limit: show.temperature(EUTECTOID_TEMP_C) })}</p>
      </section>
      <LogNoteButton note={note} />
    </div>
  );
}

function useGeneralReadingsError(): string | undefined {
  const { word } = useScreenContext();
  const outcome = recoveryOutcome.value;
  return word(outcome.general ?? outcome.errors.history);
}

const setRecovery = fieldSetters(recoveryForm);
const addOne = () => (recoveryForm.value = addReading(recoveryForm.peek()));

interface ReadingHandlers {
  time: (value: FieldText) => void;
  temperature: (value: FieldText) => void;
  remove: () => void;
}

/** Per reading position, handlers that read the form when called: the same functions on every render. */
const readingHandlers = new Map<number, ReadingHandlers>();
function readingHandlersOf(i: number): ReadingHandlers {
  let handlers = readingHandlers.get(i);
  if (!handlers) {
    handlers = {
      time: (time) => (recoveryForm.value = setReading(recoveryForm.peek(), i, { time })),
      temperature: (temperature) => (recoveryForm.value = setReading(recoveryForm.peek(), i, { temperature })),
      remove: () => (recoveryForm.value = removeReading(recoveryForm.peek(), i)),
    };
    readingHandlers.set(i, handlers);
  }
  return handlers;
}

/** The set point and the readings: a keystroke redraws only its own field. */
function RecoveryInputs() {
  const { t, units, word } = useScreenContext();
  const form = recoveryForm.value;
  const outcome = recoveryOutcome.value;
  const generalReadingsError = useGeneralReadingsError();
  return (
    <>
      <section class="card" aria-labelledby="recovery-plan">
        <h2 id="recovery-plan">{t('app.recovery.planHeading')}</h2>
        <div class="field-grid">
          <NumberField
            id="recovery-set"
            label={t('app.recovery.setTemperature')}
            unit={units.temperature}
            value={form.setTemperature}
            onInput={setRecovery('setTemperature')}
            error={word(outcome.errors.setTemperatureC)}
          />
          <NumberField
            id="recovery-required"
            label={t('app.recovery.requiredTime')}
            unit={units.time}
            value={form.requiredTime}
            onInput={setRecovery('requiredTime')}
            error={word(outcome.errors.requiredTimeH)}
          />
        </div>
      </section>
      <section class="card" aria-labelledby="recovery-readings">
        <h2 id="recovery-readings">{t('app.recovery.readingsHeading')}</h2>
        <p class="note">{t('app.recovery.readingsHint')}</p>
        <div class="reading reading-titles" aria-hidden="true">
          <span />
          <span>{t('app.recovery.timeColumn', { unit: UNIT_SYMBOLS[units.time] })}</span>
          <span>{t('app.recovery.temperatureColumn', { unit: UNIT_SYMBOLS[units.temperature] })}</span>
          <span />
        </div>
        <ol class="card-stack">
          {form.readings.map((reading, i) => (
            <li key={i} class="reading">
              <span class="reading-number" aria-hidden="true">
                {i + 1}
              </span>
              <NumberField
                compact
                hideLabel
                id={`reading-${i}-time`}
                label={t('app.recovery.readingTime', { n: i + 1 })}
                unit={units.time}
                value={reading.time}
                onInput={readingHandlersOf(i).time}
                error={word(outcome.errors[`history.${i}.timeH`])}
              />
              <NumberField
                compact
                hideLabel
                id={`reading-${i}-temperature`}
                label={t('app.recovery.readingTemperature', { n: i + 1 })}
                unit={units.temperature}
                value={reading.temperature}
                onInput={readingHandlersOf(i).temperature}
                error={word(outcome.errors[`history.${i}.temperatureC`])}
              />
              <button
                type="button"
                class="button reading-remove"
                aria-label={t('app.recovery.removeReading', { n: i + 1 })}
                onClick={readingHandlersOf(i).remove}
              >
                <Icon name="remove" />
              </button>
            </li>
          ))}
        </ol>
        <ErrorNote message={generalReadingsError} />
        <button type="button" class="button" disabled={form.readings.length >= MAX_READINGS} onClick={addOne}>
          {t('app.recovery.addReading')}
        </button>
      </section>
    </>
  );
}
