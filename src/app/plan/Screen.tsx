/**
 * Plan a two-step cycle from the drawing: boost and diffuse times for a target effective case
 * depth and surface carbon, worked out as you type; what binds when they are out of reach; the
 * plan opened in the cycle editor or saved to the log.
 */
import { useMemo } from 'preact/hooks';
import { isModelId } from '../../physics';
import { cycleFormOfRecipe } from '../cycle/fromRecipe';
import { CycleTabs } from '../cycle/CycleTabs';
import { cycleLogEntry } from '../cycle/logEntry';
import { cycleForm } from '../cycle/state';
import { LogSaveButton } from '../log/save/LogActions';
import { defaults, model } from '../settings/state';
import { hrefFor } from '../shell/route';
import { Answer } from '../ui/Answer';
import { Deferred } from '../ui/Deferred';
import { fieldSetters } from '../ui/setters';
import { CycleBand } from '../range/CycleBand';
import { UNIT_SYMBOLS } from '../ui/format';
import { FurnaceField } from '../fields/FurnaceField';
import { ModelField } from '../fields/ModelField';
import { NumberField } from '../ui/NumberField';
import { patch } from '../ui/persist';
import { ResultsCard } from '../ui/ResultsCard';
import { useScreenContext } from '../settings/screenContext';
import { ShapeFields } from '../fields/ShapeFields';
import { SteelFields } from '../fields/SteelFields';
import { CheckField } from '../ui/TextField';
import { ThresholdField } from '../fields/ThresholdField';
import { planOutcome } from './results';
import { planForm, type PlanForm } from './state';
import { StepFields } from './StepFields';
import { planView } from './view';
import './screen.css';

export default function PlanScreen() {
  const ctx = useScreenContext();
  const { t, show, word } = ctx;
  // The form is drawn at once (PlanTargets, PlanSteps, PlanPart); the plan follows from the worker.
  const outcome = planOutcome.value;
  const result = outcome.result;
  const view = useMemo(() => (result ? planView(result, t, show) : undefined), [result, t, show]);
  const logEntry = useMemo(
    () =>
      result?.plan.reachable
        ? cycleLogEntry({
            recipe: result.plan.recipe,
            simulation: result.plan.predicted,
            calibration: result.calibration,
          })
        : undefined,
    [result],
  );
  const openInEditor = () => {
    if (!result) return;
    const form = planForm.peek();
    cycleForm.value = cycleFormOfRecipe(result.plan.recipe, {
      steel: form.steel,
      model: form.model,
      threshold: form.threshold,
      size: form.size,
      defaultBetaMPerS: defaults.value.betaMPerS,
      labelOf: (label) =>
        label === 'boost' || label === 'diffuse' || label === 'hardening' ? t(`app.plan.steps.${label}`) : label,
    });
    location.hash = hrefFor('cycle');
  };

  return (
    <div class="screen plan">
      <CycleTabs current="plan" />
      <h1 tabIndex={-1}>{t('app.plan.title')}</h1>
      <Answer
        label={view ? view.answerLabel : t('app.common.noResult')}
        value={view?.answer}
        detail={view?.answerDetail}
        note={view?.answerNote}
        updating={outcome.updating ? t('app.common.updating') : undefined}
      />
      <PlanTargets />
      <Deferred>
        <PlanSteps />
      </Deferred>
      <Deferred>
        <PlanPart />
      </Deferred>
      <Deferred>
        {view?.binding && (
          <section class="card plan-findings" aria-labelledby="plan-findings">
            <h2 id="plan-findings">{t('app.plan.bindingHeading')}</h2>
            <p class="plan-binding">{view.binding}</p>
            {view.suggestions.length > 0 && (
              <>
                <h3>{t('app.plan.suggestionsHeading')}</h3>
                <ul class="plan-suggestions">
                  {view.suggestions.map((s, i) => (
                    <li key={i}>{s}</li>
                  ))}
                </ul>
              </>
            )}
          </section>
        )}

        <ResultsCard id="plan-results" error={word(outcome.general)} view={view}>
          <CycleBand id="plan-band" recipe={result?.plan.recipe} ctx={ctx} />
        </ResultsCard>
        <div class="plan-actions">
          <button
            type="button"
            class="button button-primary button-wide"
            disabled={!result}
            onClick={openInEditor}
            aria-describedby="plan-open-hint"
          >
            {t('app.plan.openInEditor')}
          </button>
          <p id="plan-open-hint" class="note">
            {t('app.plan.openHint')}
          </p>
        </div>
        <LogSaveButton entry={logEntry} />
        {result && !result.plan.reachable && <p class="note">{t('app.plan.saveOnlyReachable')}</p>}
      </Deferred>
    </div>
  );
}

const setPlan = fieldSetters(planForm);
const patchPlan = (changes: Partial<PlanForm>) => patch(planForm, changes);

/** The targets: a keystroke redraws only its own field (the handlers stay the same functions). */
function PlanTargets() {
  const { t, units, show, word } = useScreenContext();
  const form = planForm.value;
  const errors = planOutcome.value.errors;
  return (
    <section class="card" aria-labelledby="plan-targets">
      <h2 id="plan-targets">{t('app.plan.targetsHeading')}</h2>
      <fieldset class="plan-group plan-range">
        <legend>{t('app.plan.ecdTarget')}</legend>
        <div class="field-grid">
          <NumberField
            id="plan-ecd-min"
            label={t('app.plan.atLeast')}
            unit={units.depth}
            value={form.ecdMin}
            onInput={setPlan('ecdMin')}
            error={word(errors['targetEcdMm.min'])}
          />
          <NumberField
            id="plan-ecd-max"
            label={t('app.plan.atMost')}
            unit={units.depth}
            value={form.ecdMax}
            onInput={setPlan('ecdMax')}
            error={word(errors['targetEcdMm.max'])}
          />
        </div>
      </fieldset>
      <fieldset class="plan-group plan-range">
        <legend>{t('app.plan.surfaceTarget')}</legend>
        <div class="field-grid">
          <NumberField
            id="plan-surface-min"
            label={t('app.plan.atLeast')}
            unitLabel={UNIT_SYMBOLS.pctC}
            value={form.surfaceMin}
            onInput={setPlan('surfaceMin')}
            error={word(errors['targetSurfaceCarbonPct.min'])}
          />
          <NumberField
            id="plan-surface-max"
            label={t('app.plan.atMost')}
            unitLabel={UNIT_SYMBOLS.pctC}
            value={form.surfaceMax}
            onInput={setPlan('surfaceMax')}
            error={word(errors['targetSurfaceCarbonPct.max'])}
          />
        </div>
      </fieldset>
      <ThresholdField
        id="plan-threshold"
        value={form.threshold}
        onInput={setPlan('threshold')}
        error={word(errors.threshold)}
        show={show}
      />
    </section>
  );
}

/** Boost, diffuse and the hardening step. */
function PlanSteps() {
  const ctx = useScreenContext();
  const { t, units, show, word } = ctx;
  const form = planForm.value;
  const errors = planOutcome.value.errors;
  const betaPlaceholder = show.number(defaults.value.betaMPerS / 1e-7, 2);
  return (
    <section class="card" aria-labelledby="plan-steps">
      <h2 id="plan-steps">{t('app.plan.stepsHeading')}</h2>
      <StepFields
        name="boost"
        step={form.boost}
        onChange={setPlan('boost')}
        errors={errors}
        betaPlaceholder={betaPlaceholder}
        ctx={ctx}
      />
      <StepFields
        name="diffuse"
        step={form.diffuse}
        onChange={setPlan('diffuse')}
        errors={errors}
        betaPlaceholder={betaPlaceholder}
        ctx={ctx}
      />
      <CheckField
        id="plan-hardening"
        label={t('app.plan.hardening')}
        checked={form.hardening}
        onChange={setPlan('hardening')}
      />
      {form.hardening && (
        <div class="field-grid">
          <NumberField
            id="plan-hardening-temperature"
            label={t('app.fields.temperature')}
            unit={units.temperature}
            value={form.hardeningTemp}
            onInput={setPlan('hardeningTemp')}
            error={word(errors['hardening.temperatureC'])}
          />
          <NumberField
            id="plan-hardening-time"
            label={t('app.cycle.duration')}
            unit={units.time}
            value={form.hardeningTime}
            onInput={setPlan('hardeningTime')}
            error={word(errors['hardening.timeH'])}
          />
        </div>
      )}
    </section>
  );
}

/** Part shape, steel, model and furnace. */
function PlanPart() {
  const ctx = useScreenContext();
  const { t, word } = ctx;
  const form = planForm.value;
  const errors = planOutcome.value.errors;
  const formModel = isModelId(form.model) ? form.model : model.value;
  return (
    <section class="card" aria-labelledby="plan-part">
      <h2 id="plan-part">{t('app.cycle.partHeading')}</h2>
      <ShapeFields
        idPrefix="plan"
        shape={form.shape}
        size={form.size}
        onChange={patchPlan}
        error={word(errors.size)}
        ctx={ctx}
      />
      <SteelFields idPrefix="plan-steel" steel={form.steel} onChange={setPlan('steel')} errors={errors} word={word} />
      <ModelField id="plan-model" value={form.model} onChange={setPlan('model')} ctx={ctx} />
      <FurnaceField id="plan-furnace" model={formModel} ctx={ctx} />
    </section>
  );
}
