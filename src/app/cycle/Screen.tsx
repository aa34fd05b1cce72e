/** Cycle editor: steps (add, remove, reorder, duplicate), part shape, steel, model, threshold, furnace; results, range, chart and table. */
import { useMemo } from 'preact/hooks';
import { isModelId } from '../../physics';
import { defaults, model } from '../settings/state';
import { Answer } from '../ui/Answer';
import { CycleBand } from '../range/CycleBand';
import { FurnaceField } from '../fields/FurnaceField';
import { ModelField } from '../fields/ModelField';
import { patch } from '../ui/persist';
import { ResultsCard } from '../ui/ResultsCard';
import { ThresholdField } from '../fields/ThresholdField';
import { useScreenContext } from '../settings/screenContext';
import { ShapeFields } from '../fields/ShapeFields';
import { SteelFields } from '../fields/SteelFields';
import { CycleTabs } from './CycleTabs';
import { CycleCharts } from './CycleCharts';
import { LogSaveButton } from '../log/save/LogActions';
import { cycleLogEntry } from './logEntry';
import { cycleOutcome } from './results';
import {
  addStep,
  cycleForm,
  duplicateStep,
  keepCycleReplace,
  MAX_STEPS,
  moveStep,
  removeStep,
  replacedCycle,
  undoCycleReplace,
  updateStep,
} from './state';
import { StepCard } from './StepCard';
import { cycleView } from './view';
import './screen.css';

export default function CycleScreen() {
  const ctx = useScreenContext();
  const { t, units, show, word } = ctx;
  const form = cycleForm.value;
  const outcome = cycleOutcome.value;
  const errors = outcome.errors;
  const result = outcome.result;
  const view = useMemo(() => (result ? cycleView(result, t, show, units) : undefined), [result, t, show, units]);
  const logEntry = useMemo(() => (result ? cycleLogEntry(result) : undefined), [result]);
  const canAdd = form.steps.length < MAX_STEPS;
  const set = (next: typeof form) => patch(cycleForm, next);
  return (
    <div class="screen cycle">
      <CycleTabs current="cycle" />
      <h1 tabIndex={-1}>{t('app.cycle.title')}</h1>
      <Answer
        label={view ? t('app.depth.answerDepth') : t('app.common.noResult')}
        value={view?.answer}
        note={view?.answerNote}
      />

      {replacedCycle.value.active && (
        <div class="card replaced-note" role="status">
          <p>{t('app.cycle.replaced.text', { count: replacedCycle.value.form.steps.length })}</p>
          <div class="button-row">
            <button type="button" class="button" onClick={undoCycleReplace}>
              {t('app.cycle.replaced.undo')}
            </button>
            <button type="button" class="button" onClick={keepCycleReplace}>
              {t('app.cycle.replaced.keep')}
            </button>
          </div>
        </div>
      )}

      <section aria-labelledby="cycle-steps">
        <h2 id="cycle-steps">{t('app.cycle.stepsHeading')}</h2>
        <ol class="card-stack steps">
          {form.steps.map((step, i) => (
            <StepCard
              key={step.key}
              index={i}
              count={form.steps.length}
              step={step}
              errors={errors}
              ctx={ctx}
              betaPlaceholder={show.number(defaults.value.betaMPerS / 1e-7, 2)}
              canAdd={canAdd}
              onChange={(changes) => set(updateStep(form, i, changes))}
              onMove={(by) => set(moveStep(form, i, by))}
              onDuplicate={() => set(duplicateStep(form, i))}
              onRemove={() => set(removeStep(form, i))}
            />
          ))}
        </ol>
        <button type="button" class="button button-wide" disabled={!canAdd} onClick={() => set(addStep(form))}>
          {t('app.cycle.addStep')}
        </button>
      </section>

      <section class="card" aria-labelledby="cycle-part">
        <h2 id="cycle-part">{t('app.cycle.partHeading')}</h2>
        <ShapeFields
          idPrefix="cycle"
          shape={form.shape}
          size={form.size}
          onChange={(changes) => patch(cycleForm, changes)}
          error={word(errors.size)}
          ctx={ctx}
        />
        <SteelFields
          idPrefix="cycle-steel"
          steel={form.steel}
          onChange={(s) => patch(cycleForm, { steel: s })}
          errors={errors}
          word={word}
        />
        <ModelField id="cycle-model" value={form.model} onChange={(v) => patch(cycleForm, { model: v })} ctx={ctx} />
        <ThresholdField
          id="cycle-threshold"
          value={form.threshold}
          onInput={(v) => patch(cycleForm, { threshold: v })}
          error={word(errors.threshold)}
          show={show}
        />
        <FurnaceField id="cycle-furnace" model={isModelId(form.model) ? form.model : model.value} ctx={ctx} />
      </section>

      <ResultsCard id="cycle-results" error={word(outcome.general)} view={view}>
        <CycleBand id="cycle-band" recipe={result?.recipe} ctx={ctx} />
        {view && result && (
          <CycleCharts
            simulation={result.simulation}
            profile={view.chart}
            history={view.history}
            hardnessMethod={view.hardnessMethod}
            ctx={ctx}
          />
        )}
      </ResultsCard>
      <LogSaveButton entry={logEntry} />
    </div>
  );
}
