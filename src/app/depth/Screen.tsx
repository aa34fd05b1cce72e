/** Case depth: from time and temperature, or the time or the temperature for a target depth. */
import { Answer } from '../ui/Answer';
import { BandMethod } from '../range/BandMethod';
import { UNIT_SYMBOLS } from '../ui/format';
import { FurnaceField } from '../fields/FurnaceField';
import { patch } from '../ui/persist';
import { defaults, model } from '../settings/state';
import { NumberField } from '../ui/NumberField';
import { ResultsCard } from '../ui/ResultsCard';
import { ThresholdField } from '../fields/ThresholdField';
import { Segmented } from '../ui/Segmented';
import { SteelFields } from '../fields/SteelFields';
import { useScreenContext } from '../settings/screenContext';
import { LogSaveButton } from '../log/save/LogActions';
import { depthLogEntry } from './logEntry';
import { carbonPath, depthOutcome, solveFor, usesField } from './results';
import { depthView } from './rows';
import { CARBON_SOURCES, depthForm, SOLVE_FOR } from './state';
import './screen.css';

export default function DepthScreen() {
  const ctx = useScreenContext();
  const { t, units, show, word } = ctx;
  const form = depthForm.value;
  const mode = solveFor(form);
  const outcome = depthOutcome.value;
  const errors = outcome.errors;
  const view = outcome.result ? depthView(outcome.result, t, show, defaults.value.totalCaseMarginPct) : undefined;
  const logEntry = outcome.result ? depthLogEntry(outcome.result, form.steel.grade) : undefined;
  const modeChoices = SOLVE_FOR.map((m) => ({ value: m, label: t(`app.depth.solveFor.${m}`) }));
  const carbonChoices = CARBON_SOURCES.map((c) => ({ value: c, label: t(`app.depth.carbonSource.${c}`) }));
  const carbonLabel = form.carbonSource === 'surface' ? t('app.fields.surfaceCarbon') : t('app.fields.carbonPotential');

  return (
    <div class="screen depth">
      <h1 tabIndex={-1}>{t('app.depth.title')}</h1>
      <Answer
        label={view ? view.answerLabel : t('app.common.noResult')}
        value={view?.answer}
        detail={view?.answerDetail}
        note={view?.answerNote}
      />

      <Segmented
        name="depth-mode"
        legend={t('app.depth.solveForLegend')}
        value={mode}
        choices={modeChoices}
        onChange={(v) => patch(depthForm, { solveFor: v })}
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
              onInput={(v) => patch(depthForm, { temperature: v })}
              error={word(errors.temperatureC)}
            />
          )}
          {usesField(mode, 'time') && (
            <NumberField
              id="depth-time"
              label={t('app.fields.time')}
              unit={units.time}
              value={form.time}
              onInput={(v) => patch(depthForm, { time: v })}
              error={word(errors.timeH)}
            />
          )}
          {usesField(mode, 'targetDepth') && (
            <NumberField
              id="depth-target"
              label={t('app.fields.targetDepth')}
              unit={units.depth}
              value={form.targetDepth}
              onInput={(v) => patch(depthForm, { targetDepth: v })}
              error={word(errors.targetDepthMm)}
            />
          )}
        </div>
        <Segmented
          name="depth-carbon-source"
          legend={t('app.depth.carbonSourceLegend')}
          value={form.carbonSource === 'surface' ? 'surface' : 'potential'}
          choices={carbonChoices}
          onChange={(v) => patch(depthForm, { carbonSource: v })}
        />
        <div class="field-grid">
          <NumberField
            id="depth-carbon"
            label={carbonLabel}
            unitLabel={UNIT_SYMBOLS.pctC}
            value={form.carbon}
            onInput={(v) => patch(depthForm, { carbon: v })}
            error={word(errors[carbonPath(form)])}
          />
          <ThresholdField
            id="depth-threshold"
            value={form.threshold}
            onInput={(v) => patch(depthForm, { threshold: v })}
            error={word(errors.thresholdCarbonPct)}
            show={show}
          />
        </div>
        <SteelFields
          idPrefix="depth-steel"
          steel={form.steel}
          onChange={(s) => patch(depthForm, { steel: s })}
          errors={errors}
          path=""
          word={word}
        />
        <FurnaceField id="depth-furnace" model={model.value} ctx={ctx} />
      </section>

      <ResultsCard id="depth-results" error={word(outcome.general)} view={view}>
        {view && <BandMethod show={show} withBeta={false} />}
      </ResultsCard>
      <LogSaveButton entry={logEntry} />
    </div>
  );
}
