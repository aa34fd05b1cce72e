/** Reads the cycle form into a Recipe (°C, h, mm, m/s) by the recipe's request description and simulates it. */
import { computed } from '@preact/signals';
import {
  type DiffusivityModelId,
  type Hardness,
  type InputError,
  isModelId,
  RECIPE_REQUEST,
  readRecipe,
  type Recipe,
  simulateCycle,
  type SimulationResult,
} from '../../physics';
import {
  calibrations,
  calibrationState,
  chosenFurnace,
  factorOf,
  type CalibrationState,
} from '../settings/calibration';
import { defaults, model } from '../settings/state';
import { deferred } from '../ui/Deferred';
import { NO_ERRORS, type Outcome } from '../ui/outcome';
import { orDefault, placeError, readForm, type FormValues } from '../ui/readForm';
import { shapeValues } from '../fields/shape';
import { steelComposition } from '../fields/steel';
import { cycleForm, type CycleForm } from './state';

export interface CycleDefaults {
  model: DiffusivityModelId;
  ecdThresholdPct: number;
  /** The case criterion the threshold stands for (absent: the physics default, 550 HV). */
  ecdHardnessLimit?: Hardness;
  totalCaseMarginPct: number;
  betaMPerS: number;
  /** The chosen furnace's calibration for a model (none: uncalibrated). */
  calibrationFor?: (model: DiffusivityModelId) => CalibrationState;
}

export interface CycleResult {
  recipe: Recipe;
  simulation: SimulationResult;
  calibration: CalibrationState;
}

/** The form fields a cycle and a plan share: steel, model, ECD threshold, shape. */
export type BaseForm = Pick<CycleForm, 'steel' | 'model' | 'threshold' | 'shape' | 'size'>;

/** Steel, model, threshold, case criterion, margin and shape of a cycle or plan, laid out as the request (physics `RECIPE_REQUEST`). */
export function baseValues(form: BaseForm, settings: CycleDefaults): FormValues {
  return {
    steel: { grade: form.steel.grade, coreCarbonPct: form.steel.coreCarbon, composition: steelComposition(form.steel) },
    model: isModelId(form.model) ? form.model : settings.model,
    thresholdCarbonPct: orDefault(form.threshold, settings.ecdThresholdPct),
    ...(settings.ecdHardnessLimit ? { ecdHardnessLimit: settings.ecdHardnessLimit } : {}),
    totalCaseMarginPct: settings.totalCaseMarginPct,
    shape: shapeValues(form.shape, form.size),
  };
}

/** The cycle form laid out as a `simulate` request: the base and every step, β empty meaning the settings' β. */
export function cycleValues(form: CycleForm, settings: CycleDefaults): FormValues {
  return {
    ...baseValues(form, settings),
    steps: form.steps.map((s) => ({
      durationH: s.duration,
      startTempC: s.startTemp,
      endTempC: s.endTemp,
      carbonPotentialPct: s.neutral ? null : s.carbonPotential,
      betaMPerS: orDefault(s.beta, settings.betaMPerS),
      ...(s.label.trim() ? { label: s.label } : {}),
    })),
  };
}

/** The recipe of the form (°C, h, mm, m/s, defaults filled in), or the errors by request path. */
export function buildRecipe(
  form: CycleForm,
  settings: CycleDefaults,
): { recipe?: Recipe; errors: Record<string, InputError>; fields: ReadonlySet<string> } {
  const read = readForm(RECIPE_REQUEST, cycleValues(form, settings));
  if (Object.keys(read.errors).length > 0) return { errors: read.errors, fields: read.fields };
  const recipe = readRecipe(read.request);
  if (!recipe.ok) return { ...placeError(recipe.error, read.fields), fields: read.fields };
  return { recipe: recipe.value, errors: NO_ERRORS, fields: read.fields };
}

export function computeCycle(form: CycleForm, settings: CycleDefaults): Outcome<CycleResult> {
  const calibration: CalibrationState = settings.calibrationFor?.(
    isModelId(form.model) ? form.model : settings.model,
  ) ?? { kind: 'none' };
  const factor = factorOf(calibration);
  const read = readForm(RECIPE_REQUEST, {
    ...cycleValues(form, settings),
    ...(factor === 1 ? {} : { diffusivityFactor: factor }),
  });
  if (Object.keys(read.errors).length > 0) return { errors: read.errors };
  const recipe = readRecipe(read.request);
  if (!recipe.ok) return placeError(recipe.error, read.fields);
  const simulation = simulateCycle(recipe.value);
  if (!simulation.ok) return placeError(simulation.error, read.fields);
  return { errors: NO_ERRORS, result: { recipe: recipe.value, simulation: simulation.value, calibration } };
}

/** The settings a cycle calculation reads, with the chosen furnace's calibration (shared by the planner). */
export const cycleDefaults = computed<CycleDefaults>(() => {
  const list = calibrations.value;
  const furnace = chosenFurnace.value;
  return {
    model: model.value,
    ecdThresholdPct: defaults.value.ecdThresholdPct,
    ecdHardnessLimit: defaults.value.ecdHardnessLimit,
    totalCaseMarginPct: defaults.value.totalCaseMarginPct,
    betaMPerS: defaults.value.betaMPerS,
    calibrationFor: (m) => calibrationState(list, furnace, m),
  };
});

/** The form as the results show it: one task behind the typing (ui/Deferred.tsx). */
export const shownCycleForm = deferred(cycleForm);

/** Worked out in the task after the typing and drawn in the one after that, so the simulation and the drawing never share a task. */
export const cycleOutcome = deferred(computed(() => computeCycle(shownCycleForm.value, cycleDefaults.value)));
