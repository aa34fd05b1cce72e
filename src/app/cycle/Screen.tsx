/** Cycle editor: steps (add, remove, reorder, duplicate), part shape, steel, model, threshold, furnace; results, range, chart and table. */
import { useMemo } from 'preact/hooks';
import { isModelId } from '../../physics';
import { defaults, model, theme } from '../settings/state';
import { Answer } from '../ui/Answer';
import { Deferred } from '../ui/Deferred';
import { CycleBand } from '../range/CycleBand';
import { FurnaceField } from '../fields/FurnaceField';
import { ModelField } from '../fields/ModelField';
import { patch } from '../ui/persist';
import { ResultsCard } from '../ui/ResultsCard';
import { ThresholdField } from '../fields/ThresholdField';
import { useScreenContext } from '../settings/screenContext';
import { ShapeFields } from '../fields/ShapeFields';
import { SteelFields } from '../fields/SteelFields';
import { fieldSetters } from '../ui/setters';
import { CycleTabs } from './CycleTabs';
import { ProfileChart } from './ProfileChart';
import { ProfileTable } from './ProfileTable';
import { LogSaveButton } from '../log/save/LogActions';
import { cycleLogEntry } from './logEntry';
import { cycleOutcome } from './results';
import {
  addStep,
  cycleForm,
  duplicateStep,
  MAX_STEPS,
  moveStep,
  removeStep,
  updateStep,
  type CycleForm,
  type StepForm,
} from './state';
import { StepCard } from './StepCard';
import { cycleView } from './view';
import './screen.css';

export default function CycleScreen() {
  const ctx = useScreenContext();
  const { t, units, show, word } = ctx;
  // The form is drawn at once (CycleSteps, CyclePart); the results follow in the next task.
  const outcome = cycleOutcome.value;
  const result = outcome.result;
  const view = useMemo(() => (result ? cycleView(result, t, show, units) : undefined), [result, t, show, units]);
  const logEntry = useMemo(() => (result ? cycleLogEntry(result) : undefined), [result]);
  return (
    <div class="screen cycle">
      <CycleTabs current="cycle" />
      <h1 tabIndex={-1}>{t('app.cycle.title')}</h1>
      <Answer
        label={view ? t('app.depth.answerDepth') : t('app.common.noResult')}
        value={view?.answer}
        note={view?.answerNote}
      />
      <CycleSteps />
      <Deferred>
        <CyclePart />
      </Deferred>
      <Deferred>
        <ResultsCard id="cycle-results" error={word(outcome.general)} view={view}>
          <CycleBand id="cycle-band" recipe={result?.recipe} ctx={ctx} />
          {view && <ProfileChart data={view.chart} label={t('app.cycle.chartLabel')} theme={theme.value} />}
          {view && <p class="note">{view.hardnessMethod}</p>}
          {result && <ProfileTable profile={result.simulation.profile} ctx={ctx} />}
        </ResultsCard>
        <LogSaveButton entry={logEntry} />
      </Deferred>
    </div>
  );
}

const replaceForm = (next: CycleForm) => patch(cycleForm, next);

interface StepHandlers {
  onChange: (changes: Partial<StepForm>) => void;
  onMove: (by: -1 | 1) => void;
  onDuplicate: () => void;
  onRemove: () => void;
}

/** Per step position, handlers that read the form when called: the same functions on every render. */
const stepHandlers = new Map<number, StepHandlers>();
function handlersOf(index: number): StepHandlers {
  let handlers = stepHandlers.get(index);
  if (!handlers) {
    handlers = {
      onChange: (changes) => replaceForm(updateStep(cycleForm.peek(), index, changes)),
      onMove: (by) => replaceForm(moveStep(cycleForm.peek(), index, by)),
      onDuplicate: () => replaceForm(duplicateStep(cycleForm.peek(), index)),
      onRemove: () => replaceForm(removeStep(cycleForm.peek(), index)),
    };
    stepHandlers.set(index, handlers);
  }
  return handlers;
}

const addOne = () => replaceForm(addStep(cycleForm.peek()));

/** The steps: a keystroke redraws only the step it changed (the others keep their props). */
function CycleSteps() {
  const ctx = useScreenContext();
  const { t, show } = ctx;
  const form = cycleForm.value;
  const errors = cycleOutcome.value.errors;
  const canAdd = form.steps.length < MAX_STEPS;
  const betaPlaceholder = show.number(defaults.value.betaMPerS / 1e-7, 2);
  return (
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
            betaPlaceholder={betaPlaceholder}
            canAdd={canAdd}
            {...handlersOf(i)}
          />
        ))}
      </ol>
      <button type="button" class="button button-wide" disabled={!canAdd} onClick={addOne}>
        {t('app.cycle.addStep')}
      </button>
    </section>
  );
}

const setCycle = fieldSetters(cycleForm);
const setShape = (changes: Partial<CycleForm>) => patch(cycleForm, changes);

/** Part shape, steel, model, threshold and furnace. */
function CyclePart() {
  const ctx = useScreenContext();
  const { t, show, word } = ctx;
  const form = cycleForm.value;
  const errors = cycleOutcome.value.errors;
  return (
    <section class="card" aria-labelledby="cycle-part">
      <h2 id="cycle-part">{t('app.cycle.partHeading')}</h2>
      <ShapeFields
        idPrefix="cycle"
        shape={form.shape}
        size={form.size}
        onChange={setShape}
        error={word(errors.size)}
        ctx={ctx}
      />
      <SteelFields idPrefix="cycle-steel" steel={form.steel} onChange={setCycle('steel')} errors={errors} word={word} />
      <ModelField id="cycle-model" value={form.model} onChange={setCycle('model')} ctx={ctx} />
      <ThresholdField
        id="cycle-threshold"
        value={form.threshold}
        onInput={setCycle('threshold')}
        error={word(errors.threshold)}
        show={show}
      />
      <FurnaceField id="cycle-furnace" model={isModelId(form.model) ? form.model : model.value} ctx={ctx} />
    </section>
  );
}
