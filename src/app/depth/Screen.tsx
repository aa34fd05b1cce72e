/** Case depth: from time and temperature, or the time or the temperature for a target depth. */
import { useMemo } from 'preact/hooks';
import { Answer } from '../ui/Answer';
import { Deferred } from '../ui/Deferred';
import { BandMethod } from '../range/BandMethod';
import { UNIT_SYMBOLS } from '../ui/format';
import { FurnaceField } from '../fields/FurnaceField';
import { fieldSetters } from '../ui/setters';
import { defaults, model } from '../settings/state';
import { NumberField } from '../ui/NumberField';
import { ResultsCard } from '../ui/ResultsCard';
import { ThresholdField } from '../fields/ThresholdField';
import { Segmented } from '../ui/Segmented';
import { SteelFields } from '../fields/SteelFields';
import { useScreenContext } from '../settings/screenContext';
import { LogSaveButton } from '../log/save/LogActions';
import { depthLogEntry } from './logEntry';
import { depthOutcome, shownDepthForm, solveFor, usesField } from './results';
import { depthView } from './rows';
import { CARBON_SOURCES, depthForm, SOLVE_FOR } from './state';
import './screen.css';

export default function DepthScreen() {
  const ctx = useScreenContext();
  const { t, show, word } = ctx;
  // What was typed is drawn at once (DepthInputs); the answer and results follow in the next task.
  const outcome = depthOutcome.value;
  const marginPct = defaults.value.totalCaseMarginPct;
  const view = useMemo(
    () => (outcome.result ? depthView(outcome.result, t, show, marginPct) : undefined),
    [outcome, t, show, marginPct],
  );
  const grade = shownDepthForm.value.steel.grade;
  const logEntry = useMemo(() => (outcome.result ? depthLogEntry(outcome.result, grade) : undefined), [outcome, grade]);

  return (
    <div class="screen depth">
      <h1 tabIndex={-1}>{t('app.depth.title')}</h1>
      <Answer
        label={view ? view.answerLabel : t('app.common.noResult')}
        value={view?.answer}
        detail={view?.answerDetail}
        note={view?.answerNote}
      />
      <DepthInputs />
      <Deferred>
        <ResultsCard id="depth-results" error={word(outcome.general)} view={view}>
          {view && <BandMethod show={show} withBeta={false} />}
        </ResultsCard>
        <LogSaveButton entry={logEntry} />
      </Deferred>
    </div>
  );
}

const setDepth = fieldSetters(depthForm);

/** The form: redrawn on every keystroke, each field only when its own props change (stable handlers). */
function DepthInputs() {
  const ctx = useScreenContext();
  const { t, units, show, word } = ctx;
  const form = depthForm.value;
  const mode = solveFor(form);
  const errors = depthOutcome.value.errors;
  const modeChoices = useMemo(() => SOLVE_FOR.map((m) => ({ value: m, label: t(`app.depth.solveFor.${m}`) })), [t]);
  const carbonChoices = useMemo(
    () => CARBON_SOURCES.map((c) => ({ value: c, label: t(`app.depth.carbonSource.${c}`) })),
    [t],
  );
  const carbonLabel = form.carbonSource === 'surface' ? t('app.fields.surfaceCarbon') : t('app.fields.carbonPotential');

  return (
    <>
      <Segmented
        name="depth-mode"
        legend={t('app.depth.solveForLegend')}
        value={mode}
        choices={modeChoices}
        onChange={setDepth('solveFor')}
      />

      <section class="card" aria-labelledby="depth-inputs">
        <h2 id="depth-inputs">{t('app.common.inputs')}</h2>
        <div class="field-grid">
          {usesField(mode, 'temperature') && (
            <NumberField
              id="depth-temperature"
              label={t('app.fields.temperature')}
              unit={units.temperature}
              value={form.temperature}
              onInput={setDepth('temperature')}
              error={word(errors.temperature)}
            />
          )}
          {usesField(mode, 'time') && (
            <NumberField
              id="depth-time"
              label={t('app.fields.time')}
              unit={units.time}
              value={form.time}
              onInput={setDepth('time')}
              error={word(errors.time)}
            />
          )}
          {usesField(mode, 'targetDepth') && (
            <NumberField
              id="depth-target"
              label={t('app.fields.targetDepth')}
              unit={units.depth}
              value={form.targetDepth}
              onInput={setDepth('targetDepth')}
              error={word(errors.targetDepth)}
            />
          )}
        </div>
        <Segmented
          name="depth-carbon-source"
          legend={t('app.depth.carbonSourceLegend')}
          value={form.carbonSource === 'surface' ? 'surface' : 'potential'}
          choices={carbonChoices}
          onChange={setDepth('carbonSource')}
        />
        <div class="field-grid">
          <NumberField
            id="depth-carbon"
            label={carbonLabel}
            unitLabel={UNIT_SYMBOLS.pctC}
            value={form.carbon}
            onInput={setDepth('carbon')}
            error={word(errors.carbon)}
          />
          <ThresholdField
            id="depth-threshold"
            value={form.threshold}
            onInput={setDepth('threshold')}
            error={word(errors.threshold)}
            show={show}
          />
        </div>
        <SteelFields
          idPrefix="depth-steel"
          steel={form.steel}
          onChange={setDepth('steel')}
          errors={errors}
          word={word}
        />
        <FurnaceField id="depth-furnace" model={model.value} ctx={ctx} />
      </section>
    </>
  );
}
