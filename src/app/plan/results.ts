/**
 * Reads the planner's form into a `plan` request (°C, h, mm, %C, m/s) and plans it with the
 * chosen furnace's calibration. The search (about 20 simulator runs) runs in the physics worker as
 * you type; the screen keeps the last plan, marked updating, until the newest request is answered.
 */
import { computed, effect } from '@preact/signals';
import { type InputError, PLAN_REQUEST, planTwoStepCycle, type PlanResult, type Result } from '../../physics';
import { baseValues, cycleDefaults, formCalibration, type CycleDefaults } from '../cycle/results';
import { factorOf, type CalibrationState } from '../settings/calibration';
import { deferred } from '../ui/Deferred';
import { NO_ERRORS, type Outcome } from '../ui/outcome';
import { orDefault, placeError, readForm, type FormValues } from '../ui/readForm';
import { latestRun } from '../worker/client';
import { planForm, type PlanForm, type PotentialStepForm } from './state';

export interface PlanOutcome {
  request: Record<string, unknown>;
  plan: PlanResult;
  calibration: CalibrationState;
}

function stepValues(step: PotentialStepForm, defaultBetaMPerS: number): FormValues {
  return {
    temperatureC: step.temperature,
    carbonPotentialPct: step.carbonPotential,
    betaMPerS: orDefault(step.beta, defaultBetaMPerS),
  };
}

/** The planner's form laid out as a `plan` request (physics `PLAN_REQUEST`). */
export function planValues(form: PlanForm, settings: CycleDefaults): FormValues {
  return {
    ...baseValues(form, settings),
    boost: stepValues(form.boost, settings.betaMPerS),
    diffuse: stepValues(form.diffuse, settings.betaMPerS),
    ...(form.hardening ? { hardening: { temperatureC: form.hardeningTemp, timeH: form.hardeningTime } } : {}),
    targetEcdMm: { min: form.ecdMin, max: form.ecdMax },
    targetSurfaceCarbonPct: { min: form.surfaceMin, max: form.surfaceMax },
  };
}

/** The `plan` request of the form (each number read and checked against its limit; physics checks the rest), or the fields it cannot read. */
export function buildPlanRequest(
  form: PlanForm,
  settings: CycleDefaults,
): { request?: Record<string, unknown>; errors: Record<string, InputError>; fields: ReadonlySet<string> } {
  const read = readForm(PLAN_REQUEST, planValues(form, settings));
  return Object.keys(read.errors).length > 0
    ? { errors: read.errors, fields: read.fields }
    : { request: read.request, errors: NO_ERRORS, fields: read.fields };
}

export interface PlanRequest {
  request: Record<string, unknown>;
  calibration: CalibrationState;
  /** The request paths that are inputs, where an error of the plan is placed. */
  fields: ReadonlySet<string>;
}

/** The form read into a `plan` request with the chosen furnace's calibration, or the fields it cannot read. */
export function planRequestOf(form: PlanForm, settings: CycleDefaults): Outcome<PlanRequest> {
  const built = buildPlanRequest(form, settings);
  if (!built.request) return { errors: built.errors };
  const calibration = formCalibration(form, settings);
  const factor = factorOf(calibration);
  const request = factor === 1 ? built.request : { ...built.request, diffusivityFactor: factor };
  return { errors: NO_ERRORS, result: { request, calibration, fields: built.fields } };
}

/** What the screen shows for a planned request: the plan, or its error placed on the field that caused it. */
export function planOutcomeOf(
  { request, calibration, fields }: PlanRequest,
  plan: Result<PlanResult>,
): Outcome<PlanOutcome> {
  if (!plan.ok) return placeError(plan.error, fields);
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
  const { calibration, fields } = asked.result;
  return { ...planOutcomeOf({ request: answer.input, calibration, fields }, answer.output), updating };
});
