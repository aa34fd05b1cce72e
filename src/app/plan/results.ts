/**
 * Reads the planner's form into a `plan` request (°C, h, mm, %C, m/s) and plans it with the
 * chosen furnace's calibration. The search (about 20 simulator runs) runs in the physics worker as
 * you type; the screen keeps the last plan, marked updating, until the newest request is answered.
 */
import { computed, effect } from '@preact/signals';
import { ALLOY_ELEMENTS, isModelId, planTwoStepCycle, type PlanResult, type Result } from '../../physics';
import { CYCLE_FIELD_MAP, cycleDefaults, readBaseFields, type CycleDefaults } from '../cycle/results';
import { factorOf, type CalibrationState } from '../settings/calibration';
import { BETA_INPUT_SCALE } from '../settings/state';
import { readField, readOptionalField } from '../ui/fieldText';
import { deferred } from '../ui/Deferred';
import { FieldReader, NO_ERRORS, placeError, type Outcome } from '../ui/outcome';
import { PHYSICS_UNITS } from '../ui/units';
import { latestRun } from '../worker/client';
import { planForm, type PlanForm, type PotentialStepForm } from './state';

export interface PlanOutcome {
  request: Record<string, unknown>;
  plan: PlanResult;
  calibration: CalibrationState;
}

/** Request field paths → form fields where they differ (other errors sit on the field of the same path). */
const FIELD_MAP: Record<string, string> = {
  ...CYCLE_FIELD_MAP,
  targetEcdMm: 'targetEcdMm.max',
  targetSurfaceCarbonPct: 'targetSurfaceCarbonPct.max',
};

const STEP_FIELDS = ['temperatureC', 'carbonPotentialPct', 'betaMPerS'];

export const PLAN_FORM_FIELDS: ReadonlySet<string> = new Set([
  'coreCarbon',
  'threshold',
  'size',
  ...ALLOY_ELEMENTS.map((e) => `composition.${e}`),
  ...['boost', 'diffuse'].flatMap((step) => STEP_FIELDS.map((f) => `${step}.${f}`)),
  'hardening.temperatureC',
  'hardening.timeH',
  ...['targetEcdMm', 'targetSurfaceCarbonPct'].flatMap((range) => [`${range}.min`, `${range}.max`]),
]);

function readStep(step: PotentialStepForm, name: string, read: FieldReader, defaultBetaMPerS: number) {
  const temperatureC = read.value(readField(step.temperature, `${name}.temperatureC`, PHYSICS_UNITS.temperature));
  const carbonPotentialPct = read.value(readField(step.carbonPotential, `${name}.carbonPotentialPct`));
  const beta = read.value(readOptionalField(step.beta, `${name}.betaMPerS`));
  return {
    temperatureC,
    carbonPotentialPct,
    betaMPerS: beta === undefined ? defaultBetaMPerS : beta * BETA_INPUT_SCALE,
  };
}

/** The `plan` request of the form (numbers still unchecked: physics checks ranges), or the fields it cannot read. */
export function buildPlanRequest(
  form: PlanForm,
  settings: CycleDefaults,
): { request?: Record<string, unknown>; errors: FieldReader['errors'] } {
  const read = new FieldReader();
  const base = readBaseFields(form, settings, read);
  const boost = readStep(form.boost, 'boost', read, settings.betaMPerS);
  const diffuse = readStep(form.diffuse, 'diffuse', read, settings.betaMPerS);
  const hardening = form.hardening
    ? {
        temperatureC: read.value(readField(form.hardeningTemp, 'hardening.temperatureC', PHYSICS_UNITS.temperature)),
        timeH: read.value(readField(form.hardeningTime, 'hardening.timeH', PHYSICS_UNITS.time)),
      }
    : undefined;
  const targetEcdMm = {
    min: read.value(readField(form.ecdMin, 'targetEcdMm.min', PHYSICS_UNITS.depth)),
    max: read.value(readField(form.ecdMax, 'targetEcdMm.max', PHYSICS_UNITS.depth)),
  };
  const targetSurfaceCarbonPct = {
    min: read.value(readField(form.surfaceMin, 'targetSurfaceCarbonPct.min')),
    max: read.value(readField(form.surfaceMax, 'targetSurfaceCarbonPct.max')),
  };
  if (read.failed || !base) return { errors: read.errors };
  return {
    errors: NO_ERRORS,
    request: {
      ...base,
      boost,
      diffuse,
      ...(hardening ? { hardening } : {}),
      targetEcdMm,
      targetSurfaceCarbonPct,
    },
  };
}

export interface PlanRequest {
  request: Record<string, unknown>;
  calibration: CalibrationState;
}

/** The form read into a `plan` request with the chosen furnace's calibration, or the fields it cannot read. */
export function planRequestOf(form: PlanForm, settings: CycleDefaults): Outcome<PlanRequest> {
  const built = buildPlanRequest(form, settings);
  if (!built.request) return { errors: built.errors };
  const model = isModelId(built.request.model) ? built.request.model : settings.model;
  const calibration: CalibrationState = settings.calibrationFor?.(model) ?? { kind: 'none' };
  const factor = factorOf(calibration);
  const request = factor === 1 ? built.request : { ...built.request, diffusivityFactor: factor };
  return { errors: NO_ERRORS, result: { request, calibration } };
}

/** What the screen shows for a planned request: the plan, or its error placed on the field that caused it. */
export function planOutcomeOf({ request, calibration }: PlanRequest, plan: Result<PlanResult>): Outcome<PlanOutcome> {
  if (!plan.ok) return placeError(plan.error, FIELD_MAP, PLAN_FORM_FIELDS);
  return { errors: NO_ERRORS, result: { request, plan: plan.value, calibration } };
}

/** Plans the form here and now (the tests; the screen plans in the worker). */
export function computePlan(form: PlanForm, settings: CycleDefaults): Outcome<PlanOutcome> {
  const asked = planRequestOf(form, settings);
  return asked.result ? planOutcomeOf(asked.result, planTwoStepCycle(asked.result.request)) : { errors: asked.errors };
}

/** The form as the plan shows it: one task behind the typing (ui/Deferred.tsx). */
export const shownPlanForm = deferred(planForm);

/** The request of the form as typed (cheap: reading and checking fields). */
export const planRequest = computed(() => planRequestOf(shownPlanForm.value, cycleDefaults.value));

const planner = latestRun('plan');
// Every new request goes to the worker; the newest one wins.
effect(() => {
  const asked = planRequest.value.result;
  if (asked) planner.run(asked.request);
});

/** The newest plan answered for this form, kept on screen (marked updating) while the next is worked out. */
export const planOutcome = computed((): Outcome<PlanOutcome> & { updating: boolean } => {
  const asked = planRequest.value;
  if (!asked.result) return { errors: asked.errors, updating: false };
  const answer = planner.answer.value;
  const updating = planner.updating.value;
  if (!answer || 'failed' in answer) return { errors: NO_ERRORS, updating };
  const calibration = asked.result.calibration;
  return { ...planOutcomeOf({ request: answer.input, calibration }, answer.output), updating };
});
