/** Reads the cycle form into a Recipe (°C, h, mm, m/s) and runs it through the simulate adapter. */
import { computed } from '@preact/signals';
import {
  ALLOY_ELEMENTS,
  type DiffusivityModelId,
  type Hardness,
  isModelId,
  type Recipe,
  type RecipeStep,
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
import { BETA_INPUT_SCALE, defaults, model } from '../settings/state';
import { readField, readOptionalField } from '../ui/fieldText';
import { deferred } from '../ui/Deferred';
import { FieldReader, NO_ERRORS, placeError, type Outcome } from '../ui/outcome';
import { readShape } from '../fields/shape';
import { readComposition } from '../fields/steel';
import { PHYSICS_UNITS } from '../ui/units';
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

/** Recipe field names → form field names where they differ (the planner's requests share them). */
export const CYCLE_FIELD_MAP: Readonly<Record<string, string>> = {
  'steel.coreCarbonPct': 'coreCarbon',
  thresholdCarbonPct: 'threshold',
  'shape.thicknessMm': 'size',
  'shape.diameterMm': 'size',
  ...Object.fromEntries(ALLOY_ELEMENTS.map((e) => [`steel.composition.${e}`, `composition.${e}`])),
};

export function formFields(form: CycleForm): ReadonlySet<string> {
  return new Set([
    'coreCarbon',
    'threshold',
    'size',
    ...ALLOY_ELEMENTS.map((e) => `composition.${e}`),
    ...form.steps.flatMap((_, i) =>
      ['durationH', 'startTempC', 'endTempC', 'carbonPotentialPct', 'betaMPerS'].map((f) => `steps.${i}.${f}`),
    ),
  ]);
}

/** The form fields a cycle and a plan share: steel, model, ECD threshold, shape. */
export type BaseForm = Pick<CycleForm, 'steel' | 'model' | 'threshold' | 'shape' | 'size'>;

/** Steel, model, threshold, case criterion and shape of a cycle or plan request (errors into `read`); undefined when a field cannot be read. */
export function readBaseFields(
  form: BaseForm,
  settings: CycleDefaults,
  read: FieldReader,
): Omit<Recipe, 'steps' | 'name'> | undefined {
  const coreCarbonPct = read.value(readField(form.steel.coreCarbon, 'coreCarbon'));
  const composition = read.value(readComposition(form.steel));
  const threshold = read.value(readOptionalField(form.threshold, 'threshold'));
  const shape = readShape(form.shape, form.size, read);
  if (coreCarbonPct === undefined || !shape) return undefined;
  return {
    steel: { grade: form.steel.grade, coreCarbonPct, ...(composition ? { composition } : {}) },
    model: isModelId(form.model) ? form.model : settings.model,
    thresholdCarbonPct: threshold ?? settings.ecdThresholdPct,
    ...(settings.ecdHardnessLimit ? { ecdHardnessLimit: settings.ecdHardnessLimit } : {}),
    totalCaseMarginPct: settings.totalCaseMarginPct,
    shape,
  };
}

export function buildRecipe(
  form: CycleForm,
  settings: CycleDefaults,
): { recipe?: Recipe; errors: FieldReader['errors'] } {
  const read = new FieldReader();
  const steps: (RecipeStep | undefined)[] = form.steps.map((s, i) => {
    const durationH = read.value(readField(s.duration, `steps.${i}.durationH`, PHYSICS_UNITS.time));
    const startTempC = read.value(readField(s.startTemp, `steps.${i}.startTempC`, PHYSICS_UNITS.temperature));
    const endTempC = read.value(readField(s.endTemp, `steps.${i}.endTempC`, PHYSICS_UNITS.temperature));
    const carbonPotentialPct = s.neutral
      ? null
      : read.value(readField(s.carbonPotential, `steps.${i}.carbonPotentialPct`));
    const betaTyped = read.value(readOptionalField(s.beta, `steps.${i}.betaMPerS`));
    if (
      durationH === undefined ||
      startTempC === undefined ||
      endTempC === undefined ||
      carbonPotentialPct === undefined
    )
      return undefined;
    return {
      ...(s.label.trim() ? { label: s.label.trim() } : {}),
      durationH,
      startTempC,
      endTempC,
      carbonPotentialPct,
      betaMPerS: betaTyped === undefined ? settings.betaMPerS : betaTyped * BETA_INPUT_SCALE,
    };
  });
  const base = readBaseFields(form, settings, read);
  if (read.failed || !base) return { errors: read.errors };
  return { errors: NO_ERRORS, recipe: { ...base, steps: steps as RecipeStep[] } };
}

export function computeCycle(form: CycleForm, settings: CycleDefaults): Outcome<CycleResult> {
  const { recipe, errors } = buildRecipe(form, settings);
  if (!recipe) return { errors };
  const calibration: CalibrationState = settings.calibrationFor?.(recipe.model ?? settings.model) ?? { kind: 'none' };
  const factor = factorOf(calibration);
  const calibrated: Recipe = factor === 1 ? recipe : { ...recipe, diffusivityFactor: factor };
  const simulation = simulateCycle(calibrated);
  if (!simulation.ok) return placeError(simulation.error, CYCLE_FIELD_MAP, formFields(form));
  return { errors: NO_ERRORS, result: { recipe: calibrated, simulation: simulation.value, calibration } };
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

export const cycleOutcome = computed(() => computeCycle(shownCycleForm.value, cycleDefaults.value));
