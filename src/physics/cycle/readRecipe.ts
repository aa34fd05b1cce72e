/**
 * Reads an untrusted cycle request (CLI JSON, form state) into a typed Recipe with
 * every default filled in, or a typed error naming the field (`steps.2.durationH`).
 * Nothing here throws.
 */
import { CONVERTIBLE_RANGE } from '../hardness';
import { checkCoreBelowLimit } from '../indicativeHardness';
import { readOptionalHardness } from '../readHardness';
import { fail, ok, type InputError, type Result } from '../result';
import { DEFAULT_ECD_THRESHOLD_PCT } from '../steel';
import {
  asFields,
  checkBeta,
  checkCarbonPct,
  checkTotalCaseMargin,
  checkTimeH,
  MAX_TIME_H,
  readChecked,
  readComposition,
  readModel,
  readNumber,
  readOptionalNumber,
  shownValue,
  TEMPERATURE_LIMITS_C,
  type Fields,
} from '../validate';
import { DEFAULT_BETA_M_PER_S, type PartShape, type Recipe, type RecipeStep, type SteelSpec } from './recipe';

/** Most steps accepted in one recipe (a real cycle has a handful). */
export const MAX_STEPS = 50;
/**
 * Step temperatures accepted, °C. Lower than the calculators' range so a heat-up ramp can
 * start from a cold or part-warm load; the solver lets nothing diffuse below the eutectoid.
 */
export const STEP_TEMPERATURE_LIMITS_C = { min: 0, max: TEMPERATURE_LIMITS_C.max } as const;
/** Plate thickness and bar diameter accepted, mm. */
export const SHAPE_SIZE_LIMITS_MM = { min: 0.1, max: 1000 } as const;
/** Longest name or label kept, characters. */
const MAX_TEXT_LENGTH = 120;

/** Re-labels an error with the path of the object it came from. */
export function under<T>(prefix: string, result: Result<T>): Result<T> {
  if (result.ok) return result;
  const e: InputError = result.error;
  return fail(e.code, e.field === undefined ? prefix : `${prefix}.${e.field}`, e.params);
}

const text = (raw: unknown): string | undefined =>
  typeof raw === 'string' && raw.trim() !== '' ? raw.trim().slice(0, MAX_TEXT_LENGTH) : undefined;

/** A recipe step's temperature: anything a load can be at, from cold to the hottest accepted; no austenite is a caution here, not an error. */
export function checkStepTemperatureC(value: number, field: string): Result<number> {
  const { min, max } = STEP_TEMPERATURE_LIMITS_C;
  return value >= min && value <= max ? ok(value) : fail('temperature.outOfRange', field, { value, min, max });
}

/** Atmosphere carbon potential: a number, or explicitly null for neutral gas (absent is an error, not a guess). */
function readPotential(fields: Fields): Result<number | null> {
  const raw = fields.carbonPotentialPct;
  if (raw === null) return ok(null);
  return readChecked(fields, 'carbonPotentialPct', checkCarbonPct);
}

function readStep(raw: unknown): Result<RecipeStep> {
  const fields = asFields(raw);
  if (!fields.ok) return fields;
  const f = fields.value;
  const durationH = readChecked(f, 'durationH', checkTimeH);
  if (!durationH.ok) return durationH;
  const startTempC = readChecked(f, 'startTempC', checkStepTemperatureC);
  if (!startTempC.ok) return startTempC;
  const endRaw = readOptionalNumber(f, 'endTempC');
  if (!endRaw.ok) return endRaw;
  // A soak may give only its start temperature.
  const endTempC = checkStepTemperatureC(endRaw.value ?? startTempC.value, 'endTempC');
  if (!endTempC.ok) return endTempC;
  const potential = readPotential(f);
  if (!potential.ok) return potential;
  const betaRaw = readOptionalNumber(f, 'betaMPerS');
  if (!betaRaw.ok) return betaRaw;
  const beta = checkBeta(betaRaw.value ?? DEFAULT_BETA_M_PER_S, 'betaMPerS');
  if (!beta.ok) return beta;
  const step: RecipeStep = {
    durationH: durationH.value,
    startTempC: startTempC.value,
    endTempC: endTempC.value,
    carbonPotentialPct: potential.value,
    betaMPerS: beta.value,
  };
  const label = text(f.label);
  if (label !== undefined) step.label = label;
  return ok(step);
}

function readSteps(raw: unknown): Result<RecipeStep[]> {
  if (!Array.isArray(raw) || raw.length === 0) return fail('steps.empty', 'steps');
  if (raw.length > MAX_STEPS) return fail('steps.tooMany', 'steps', { count: raw.length, max: MAX_STEPS });
  const steps: RecipeStep[] = [];
  for (let i = 0; i < raw.length; i++) {
    const step = under(`steps.${i}`, readStep(raw[i]));
    if (!step.ok) return step;
    steps.push(step.value);
  }
  const totalH = steps.reduce((sum, s) => sum + s.durationH, 0);
  return totalH <= MAX_TIME_H ? ok(steps) : fail('time.tooLong', 'steps', { value: totalH, max: MAX_TIME_H });
}

function readSteel(raw: unknown): Result<SteelSpec> {
  if (raw === undefined || raw === null) return fail('field.missing');
  const fields = asFields(raw);
  if (!fields.ok) return fields;
  const core = readChecked(fields.value, 'coreCarbonPct', checkCarbonPct);
  if (!core.ok) return core;
  const composition = readComposition(fields.value);
  if (!composition.ok) return composition;
  const steel: SteelSpec = { coreCarbonPct: core.value };
  if (composition.value !== undefined) steel.composition = composition.value;
  // The indicative hardness curve is drawn in HRC: the core must convert.
  const coreHardness = under(
    'coreHardness',
    readOptionalHardness(fields.value.coreHardness, undefined, CONVERTIBLE_RANGE),
  );
  if (!coreHardness.ok) return coreHardness;
  if (coreHardness.value !== undefined) steel.coreHardness = coreHardness.value;
  const grade = text(fields.value.grade);
  if (grade !== undefined) steel.grade = grade;
  return ok(steel);
}

function readSize(fields: Fields, field: string): Result<number> {
  const value = readNumber(fields, field);
  if (!value.ok) return value;
  const { min, max } = SHAPE_SIZE_LIMITS_MM;
  return value.value >= min && value.value <= max
    ? value
    : fail('shape.sizeOutOfRange', field, { value: value.value, min, max });
}

function readShape(raw: unknown): Result<PartShape> {
  if (raw === undefined || raw === null) return ok({ kind: 'semi-infinite' });
  const fields = asFields(raw);
  if (!fields.ok) return fail('shape.unknown', 'kind', { kind: shownValue(raw) });
  const kind = fields.value.kind;
  if (kind === 'semi-infinite') return ok({ kind });
  if (kind === 'plate') {
    const thicknessMm = readSize(fields.value, 'thicknessMm');
    return thicknessMm.ok ? ok({ kind, thicknessMm: thicknessMm.value }) : thicknessMm;
  }
  if (kind === 'bar') {
    const diameterMm = readSize(fields.value, 'diameterMm');
    return diameterMm.ok ? ok({ kind, diameterMm: diameterMm.value }) : diameterMm;
  }
  if (kind === undefined || kind === null || kind === '') return fail('field.missing', 'kind');
  return fail('shape.unknown', 'kind', { kind: shownValue(kind) });
}

/** Everything of a cycle request but its steps: shared by `simulate` and `plan`. */
export type CycleBase = Omit<Recipe, 'steps' | 'model' | 'thresholdCarbonPct' | 'shape'> &
  Required<Pick<Recipe, 'model' | 'thresholdCarbonPct' | 'shape'>>;

/** Steel, model, ECD threshold (above core), hardness limit and shape of a request, defaults filled in, and its name. */
export function readCycleBase(f: Fields): Result<CycleBase> {
  const steel = under('steel', readSteel(f.steel));
  if (!steel.ok) return steel;
  const model = readModel(f);
  if (!model.ok) return model;
  const thresholdRaw = readOptionalNumber(f, 'thresholdCarbonPct');
  if (!thresholdRaw.ok) return thresholdRaw;
  const threshold = checkCarbonPct(thresholdRaw.value ?? DEFAULT_ECD_THRESHOLD_PCT, 'thresholdCarbonPct');
  if (!threshold.ok) return threshold;
  const thresholdCarbonPct = threshold.value;
  const core = steel.value.coreCarbonPct;
  if (!(thresholdCarbonPct > core)) {
    return fail('threshold.notAboveCore', 'thresholdCarbonPct', { thresholdPct: thresholdCarbonPct, corePct: core });
  }
  const limit = under('ecdHardnessLimit', readOptionalHardness(f.ecdHardnessLimit, undefined, CONVERTIBLE_RANGE));
  if (!limit.ok) return limit;
  const ecdHardnessLimit = limit.value;
  const hardness = checkCoreBelowLimit({ steel: steel.value, thresholdCarbonPct, ecdHardnessLimit });
  if (!hardness.ok) return hardness;
  const shape = under('shape', readShape(f.shape));
  if (!shape.ok) return shape;
  const margin = readOptionalNumber(f, 'totalCaseMarginPct');
  if (!margin.ok) return margin;
  const base: CycleBase = { steel: steel.value, model: model.value, thresholdCarbonPct, shape: shape.value };
  if (ecdHardnessLimit !== undefined) base.ecdHardnessLimit = ecdHardnessLimit;
  if (margin.value !== undefined) {
    const checked = checkTotalCaseMargin(margin.value, 'totalCaseMarginPct');
    if (!checked.ok) return checked;
    base.totalCaseMarginPct = checked.value;
  }
  const name = text(f.name);
  if (name !== undefined) base.name = name;
  return ok(base);
}

/**
 * `simulate` request → Recipe, defaults filled in: model (Ågren), ECD threshold
 * (0.40 %C), shape (semi-infinite), β of each step (DEFAULT_BETA_M_PER_S).
 */
export function readRecipe(request: unknown): Result<Recipe> {
  const fields = asFields(request);
  if (!fields.ok) return fields;
  const base = readCycleBase(fields.value);
  if (!base.ok) return base;
  const steps = readSteps(fields.value.steps);
  if (!steps.ok) return steps;
  const { name, ...rest } = base.value;
  const recipe: Recipe = { ...rest, steps: steps.value };
  if (name !== undefined) recipe.name = name;
  return ok(recipe);
}
