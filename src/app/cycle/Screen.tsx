/** Cycle editor: steps (add, remove, reorder, duplicate), part shape, steel, model, threshold, furnace; results, range, chart and table. */
import { useMemo } from 'preact/hooks';
import { sizePath } from '../fields/shape';
import { isModelId } from '../../physics';
import { defaults, model } from '../settings/state';
import { Answer } from '../ui/Answer';
import { calibrationWords } from '../fields/calibrationWords';
import { Deferred } from '../ui/Deferred';
import { CycleBand } from '../range/CycleBand';
import { FurnaceField } from '../fields/FurnaceField';
import { learntFurnaces } from '../settings/plantThreshold';
import { ModelField } from '../fields/ModelField';
import { patch } from '../ui/persist';
import { ResultsCard } from '../ui/ResultsCard';
import { ThresholdField } from '../fields/ThresholdField';
import { useScreenContext } from '../settings/screenContext';
import { ShapeFields } from '../fields/ShapeFields';
import { SteelFields } from '../fields/SteelFields';
import { fieldSetters } from '../ui/setters';
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
  type CycleForm,
  type StepForm,
} from './state';
import { StepCard } from './StepCard';
import { cycleView } from './view';
import './screen.css';

export default function CycleScreen() {
  const ctx = useScreenContext();
  const { t, show } = ctx;
  // A keystroke redraws its own step at once (CycleSteps); the results follow in the next task.
  const result = cycleOutcome.value.result;
  // Only the answer is worded here: the rows, chart and method are worded with the results part, in its own task.
  const answerNote = result ? calibrationWords(result.calibration, t, show)?.short : undefined;
  return (
    <div class="screen cycle">
      <CycleTabs current="cycle" />
      <h1 tabIndex={-1}>{t('app.cycle.title')}</h1>
      <Answer
        label={result ? t('app.depth.answerDepth') : t('app.common.noResult')}
        value={result ? show.depth(result.simulation.effectiveCaseDepthMm) : undefined}
        note={answerNote}
      />
      <ReplacedNote />
      <Deferred>
        <CycleSteps />
      </Deferred>
      <Deferred>
        <CyclePart />
      </Deferred>
      <Deferred>
        <CycleResults />
      </Deferred>
    </div>
  );
}

/** Rows, likely range, charts, method and tables of the newest result, and "save to log". */
function CycleResults() {
  const ctx = useScreenContext();
  const { t, units, show, word } = ctx;
  const outcome = cycleOutcome.value;
  const result = outcome.result;
  const view = useMemo(() => (result ? cycleView(result, t, show, units) : undefined), [result, t, show, units]);
  const logEntry = useMemo(() => (result ? cycleLogEntry(result) : undefined), [result]);
  return (
    <>
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
    </>
  );
}

/** After a plan replaced the steps: the person's own can come back. */
function ReplacedNote() {
  const { t } = useScreenContext();
  const replaced = replacedCycle.value;
  if (!replaced.active) return null;
  return (
    <div class="card replaced-note" role="status">
      <p>{t('app.cycle.replaced.text', { count: replaced.form.steps.length })}</p>
      <div class="button-row">
        <button type="button" class="button" onClick={undoCycleReplace}>
          {t('app.cycle.replaced.undo')}
        </button>
        <button type="button" class="button" onClick={keepCycleReplace}>
          {t('app.cycle.replaced.keep')}
        </button>
      </div>
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
        error={word(errors[sizePath(form.shape) ?? ''])}
        ctx={ctx}
      />
      <SteelFields
        idPrefix="cycle-steel"
        steel={form.steel}
        onChange={setCycle('steel')}
        errors={errors}
        path="steel."
        word={word}
      />
      <ModelField id="cycle-model" value={form.model} onChange={setCycle('model')} ctx={ctx} />
      <ThresholdField
        id="cycle-threshold"
        value={form.threshold}
        onInput={setCycle('threshold')}
        error={word(errors.thresholdCarbonPct)}
        show={show}
      />
      <FurnaceField
        id="cycle-furnace"
        model={isModelId(form.model) ? form.model : model.value}
        ctx={ctx}
        more={learntFurnaces.value}
      />
    </section>
  );
}
