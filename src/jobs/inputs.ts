/**
 * What a job was planned with: a closed-form calculator request (depth, time or
 * temperature, the same fields the physics functions read) or a multi-step cycle Recipe.
 * Numbers are stored as finite numbers; the physics layer checked their ranges when it ran.
 */
import * as v from 'valibot';
import {
  ALLOY_ELEMENT_MAX_PCT,
  DIFFUSIVITY_FACTOR_LIMITS,
  MAX_CARBON_PCT,
  MAX_TEMPERATURE_TOLERANCE_C,
  MAX_TOTAL_CASE_MARGIN_PCT,
  MAX_STEPS,
  MODEL_IDS,
  TEXT_LENGTH_LIMITS,
  HARDNESS_UNITS,
  type Recipe,
} from '../physics';

export const ModelIdSchema = v.picklist(MODEL_IDS);

export const finiteNumber = () => v.pipe(v.number(), v.finite());
export const numberBetween = (min: number, max: number) =>
  v.pipe(v.number(), v.finite(), v.minValue(min), v.maxValue(max));
export const positiveNumber = () => v.pipe(v.number(), v.finite(), v.gtValue(0));
export const textUpTo = (max: number) => v.pipe(v.string(), v.maxLength(max));

export const CarbonPctSchema = numberBetween(0, MAX_CARBON_PCT);
/** Total case ends this far above core carbon, %C (physics checkTotalCaseMargin). */
const TotalCaseMarginSchema = v.pipe(v.number(), v.finite(), v.gtValue(0), v.maxValue(MAX_TOTAL_CASE_MARGIN_PCT));

const elementPct = () => numberBetween(0, ALLOY_ELEMENT_MAX_PCT);
export const CompositionSchema = v.strictObject({
  Si: elementPct(),
  Mn: elementPct(),
  Cr: elementPct(),
  Ni: elementPct(),
  Mo: elementPct(),
});

/** The fields every closed-form request shares (see physics readCaseSpec). */
const caseSpecEntries = {
  surfaceCarbonPct: v.optional(CarbonPctSchema),
  carbonPotentialPct: v.optional(CarbonPctSchema),
  coreCarbonPct: CarbonPctSchema,
  thresholdCarbonPct: v.optional(CarbonPctSchema),
  model: v.optional(ModelIdSchema),
  composition: v.optional(CompositionSchema),
  /** Furnace calibration factor on D (1 when uncalibrated). */
  diffusivityFactor: v.optional(numberBetween(DIFFUSIVITY_FACTOR_LIMITS.min, DIFFUSIVITY_FACTOR_LIMITS.max)),
  /** Furnace temperature tolerance for the uncertainty band, ±°C. */
  temperatureToleranceC: v.optional(numberBetween(0, MAX_TEMPERATURE_TOLERANCE_C)),
  totalCaseMarginPct: v.optional(TotalCaseMarginSchema),
};

export const DepthInputSchema = v.strictObject({
  kind: v.literal('depth'),
  temperatureC: finiteNumber(),
  timeH: positiveNumber(),
  ...caseSpecEntries,
});

export const TimeInputSchema = v.strictObject({
  kind: v.literal('time'),
  temperatureC: finiteNumber(),
  targetDepthMm: positiveNumber(),
  ...caseSpecEntries,
});

export const TemperatureInputSchema = v.strictObject({
  kind: v.literal('temperature'),
  timeH: positiveNumber(),
  targetDepthMm: positiveNumber(),
  ...caseSpecEntries,
});

const RecipeStepSchema = v.strictObject({
  label: v.optional(textUpTo(TEXT_LENGTH_LIMITS.label)),
  durationH: positiveNumber(),
  startTempC: finiteNumber(),
  endTempC: finiteNumber(),
  carbonPotentialPct: v.nullable(CarbonPctSchema),
  betaMPerS: v.optional(positiveNumber()),
});

const PartShapeSchema = v.variant('kind', [
  v.strictObject({ kind: v.literal('semi-infinite') }),
  v.strictObject({ kind: v.literal('plate'), thicknessMm: positiveNumber() }),
  v.strictObject({ kind: v.literal('bar'), diameterMm: positiveNumber() }),
]);

/** A hardness in a recipe (core hardness, ECD limit); physics checked its range when it ran. */
const RecipeHardnessSchema = v.strictObject({ value: finiteNumber(), unit: v.picklist(HARDNESS_UNITS) });

export const RecipeSchema = v.strictObject({
  name: v.optional(textUpTo(TEXT_LENGTH_LIMITS.name)),
  steel: v.strictObject({
    grade: v.optional(textUpTo(TEXT_LENGTH_LIMITS.grade)),
    coreCarbonPct: CarbonPctSchema,
    composition: v.optional(CompositionSchema),
    coreHardness: v.optional(RecipeHardnessSchema),
  }),
  model: v.optional(ModelIdSchema),
  thresholdCarbonPct: v.optional(CarbonPctSchema),
  ecdHardnessLimit: v.optional(RecipeHardnessSchema),
  totalCaseMarginPct: v.optional(TotalCaseMarginSchema),
  /** The furnace's calibration factor on D the cycle was predicted with (absent: 1). */
  diffusivityFactor: v.optional(numberBetween(DIFFUSIVITY_FACTOR_LIMITS.min, DIFFUSIVITY_FACTOR_LIMITS.max)),
  shape: v.optional(PartShapeSchema),
  steps: v.pipe(v.array(RecipeStepSchema), v.minLength(1), v.maxLength(MAX_STEPS)),
});

export const CycleInputSchema = v.strictObject({ kind: v.literal('cycle'), recipe: RecipeSchema });

export const JobInputsSchema = v.variant('kind', [
  DepthInputSchema,
  TimeInputSchema,
  TemperatureInputSchema,
  CycleInputSchema,
]);

export type JobInputs = v.InferOutput<typeof JobInputsSchema>;
export type JobInputKind = JobInputs['kind'];
export const JOB_INPUT_KINDS = ['depth', 'time', 'temperature', 'cycle'] as const satisfies readonly JobInputKind[];
// Compile-time: the list names every kind of the union (a type error here otherwise).
type Holds<T extends true> = T;
type _EveryKindListed = Holds<Exclude<JobInputKind, (typeof JOB_INPUT_KINDS)[number]> extends never ? true : false>;

/** A closed-form input without its `kind`: exactly the request the physics function takes. */
export function physicsRequestOf(inputs: Exclude<JobInputs, { kind: 'cycle' }>): Record<string, unknown> {
  const { kind: _kind, ...request } = inputs;
  return request;
}

// Compile-time proof that the stored recipe and the physics contract are the same shape.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type _RecipeMatchesContract = Holds<Same<v.InferOutput<typeof RecipeSchema>, Recipe>>;
