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
import { appliedThreshold, plantThresholds } from '../settings/plantThreshold';
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
  /**
   * The chosen furnace's correction for a model: for a grade (given when no threshold is typed), a
   * threshold learnt for it and turned on; else the depth correction (none: uncalibrated).
   */
  calibrationFor?: (model: DiffusivityModelId, grade?: string) => CalibrationState;
}

export interface CycleResult {
  recipe: Recipe;
  simulation: SimulationResult;
  calibration: CalibrationState;
}

/** The form fields a cycle and a plan share: steel, model, ECD threshold, shape. */
export type BaseForm = Pick<CycleForm, 'steel' | 'model' | 'threshold' | 'shape' | 'size'>;

const modelOf = (form: BaseForm, settings: CycleDefaults) => (isModelId(form.model) ? form.model : settings.model);

/** The chosen furnace's correction for this form: a learnt threshold for its grade when none is typed, else the depth correction. */
export function formCalibration(form: BaseForm, settings: CycleDefaults): CalibrationState {
  const grade = form.threshold.text.trim() === '' ? form.steel.grade : undefined;
  return settings.calibrationFor?.(modelOf(form, settings), grade) ?? { kind: 'none' };
}

/** Steel, model, threshold, case criterion, margin and shape of a cycle or plan, laid out as the request (physics `RECIPE_REQUEST`). */
export function baseValues(form: BaseForm, settings: CycleDefaults): FormValues {
  const correction = formCalibration(form, settings);
  return {
    steel: { grade: form.steel.grade, coreCarbonPct: form.steel.coreCarbon, composition: steelComposition(form.steel) },
    model: modelOf(form, settings),
    thresholdCarbonPct: orDefault(
      form.threshold,
      correction.kind === 'learnt' ? correction.learnt.thresholdPct : settings.ecdThresholdPct,
    ),
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
  const calibration = formCalibration(form, settings);
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
  const learnt = plantThresholds.value;
  const furnace = chosenFurnace.value;
  return {
    model: model.value,
    ecdThresholdPct: defaults.value.ecdThresholdPct,
    ecdHardnessLimit: defaults.value.ecdHardnessLimit,
    totalCaseMarginPct: defaults.value.totalCaseMarginPct,
    betaMPerS: defaults.value.betaMPerS,
    calibrationFor: (m, grade) => {
      const applied = appliedThreshold(learnt, furnace, grade, m);
      return applied ? { kind: 'learnt', furnace, learnt: applied } : calibrationState(list, furnace, m);
    },
  };
});

/** The form as the results show it: one task behind the typing (ui/Deferred.tsx). */
export const shownCycleForm = deferred(cycleForm);

/** Worked out in the task after the typing and drawn in the one after that, so the simulation and the drawing never share a task. */
export const cycleOutcome = deferred(computed(() => computeCycle(shownCycleForm.value, cycleDefaults.value)));
