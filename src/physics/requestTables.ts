/**
 * Every request physics reads, as data (requestSpec.ts): the closed-form `depth`, `time` and
 * `temperature` requests, the cycle recipe (`simulate`) and its steps, the `plan` request,
 * `equivalent-time` and `convert`. The readers read these; the job record's schema and the app's
 * form reader are built from them. A field is added to a request by adding it here (and its words).
 */
import { DEFAULT_BETA_M_PER_S } from './cycle/recipe';
import { DEFAULT_MODEL, MODEL_IDS } from './diffusivity';
import { HARDNESS_UNITS } from './hardness';
import { LIMITS, MAX_STEPS, TEXT_LENGTH_LIMITS } from './limits';
import { choice, composition, hardness, list, num, object, text, variant, type FieldSpec } from './requestSpec';
import { DEFAULT_ECD_THRESHOLD_PCT, TOTAL_CASE_MARGIN_PCT } from './steel';
import { DEFAULT_TEMPERATURE_TOLERANCE_C } from './uncertainty';
import { UNITS } from './units';

/** Carbon at which D is evaluated for an equivalent time when the request gives none: mid-case (common practice), wt%. */
export const DEFAULT_HISTORY_CARBON_PCT = 0.5;
/** Longest cycle (boost + diffuse + hardening) the planner proposes unless the request says otherwise, h (our choice: beyond the deepest pit-furnace cases, well inside the longest time accepted). */
export const DEFAULT_MAX_TOTAL_H = 100;

const model = choice(MODEL_IDS, { default: DEFAULT_MODEL, unknown: 'model.unknown', param: 'model' });
/** A furnace's calibration factor on D: 1 when uncalibrated. */
const diffusivityFactor = num(LIMITS.diffusivityFactor, { default: 1 });
const totalCaseMarginPct = num(LIMITS.totalCaseMargin, { default: TOTAL_CASE_MARGIN_PCT });

/** What every closed-form request shares: the steel, the carbon levels and the furnace. */
const CASE_SPEC_FIELDS = {
  model,
  composition: composition(),
  coreCarbonPct: num(LIMITS.carbon),
  /** One of surface carbon and carbon potential is required (the reader checks). */
  surfaceCarbonPct: num(LIMITS.carbon, { optional: true }),
  carbonPotentialPct: num(LIMITS.carbon, { optional: true }),
  thresholdCarbonPct: num(LIMITS.carbon, { default: DEFAULT_ECD_THRESHOLD_PCT }),
  diffusivityFactor,
  temperatureToleranceC: num(LIMITS.temperatureTolerance, { default: DEFAULT_TEMPERATURE_TOLERANCE_C }),
  totalCaseMarginPct,
} as const;

export const DEPTH_REQUEST = {
  temperatureC: num(LIMITS.temperature),
  timeH: num(LIMITS.time),
  ...CASE_SPEC_FIELDS,
} as const;

export const TIME_REQUEST = {
  temperatureC: num(LIMITS.temperature),
  targetDepthMm: num(LIMITS.depth),
  ...CASE_SPEC_FIELDS,
} as const;

export const TEMPERATURE_REQUEST = {
  timeH: num(LIMITS.time),
  targetDepthMm: num(LIMITS.depth),
  ...CASE_SPEC_FIELDS,
} as const;

export const RECIPE_STEP = object({
  durationH: num(LIMITS.time),
  startTempC: num(LIMITS.stepTemperature),
  endTempC: num(LIMITS.stepTemperature, { defaultFrom: 'startTempC' }),
  /** Required: a number, or null for neutral gas (absent is an error, not a guess). */
  carbonPotentialPct: num(LIMITS.carbon, { nullable: true }),
  betaMPerS: num(LIMITS.beta, { default: DEFAULT_BETA_M_PER_S }),
  label: text(TEXT_LENGTH_LIMITS.label),
});

const SHAPE = variant(
  {
    'semi-infinite': {},
    /** Carburized on both faces. */
    plate: { thicknessMm: num(LIMITS.shapeSize) },
    /** Round bar carburized radially. */
    bar: { diameterMm: num(LIMITS.shapeSize) },
  },
  { default: 'semi-infinite', unknown: 'shape.unknown' },
);

/** Steel, model, ECD threshold, case criterion, shape, furnace factor and name: what a cycle and a plan share. */
const CYCLE_BASE = {
  steel: object({
    coreCarbonPct: num(LIMITS.carbon),
    composition: composition(),
    /** The indicative hardness curve is drawn in HRC: the core must convert. */
    coreHardness: hardness('convertible'),
    grade: text(TEXT_LENGTH_LIMITS.grade),
  }),
  model,
  thresholdCarbonPct: num(LIMITS.carbon, { default: DEFAULT_ECD_THRESHOLD_PCT }),
  /** The hardness the effective case depth stands for; absent: 550 HV (ISO 18203). */
  ecdHardnessLimit: hardness('convertible'),
  shape: SHAPE,
  totalCaseMarginPct,
  diffusivityFactor,
  name: text(TEXT_LENGTH_LIMITS.name),
} as const;

export const RECIPE_REQUEST = {
  ...CYCLE_BASE,
  steps: list(RECIPE_STEP, { min: 1, max: MAX_STEPS, tooFew: 'steps.empty', tooMany: 'steps.tooMany' }),
} as const;

const POTENTIAL_STEP = object({
  temperatureC: num(LIMITS.temperature),
  carbonPotentialPct: num(LIMITS.carbon),
  betaMPerS: num(LIMITS.beta, { default: DEFAULT_BETA_M_PER_S }),
});

const range = (limit: (typeof LIMITS)[keyof typeof LIMITS]) => object({ min: num(limit), max: num(limit) });

export const PLAN_REQUEST = {
  ...CYCLE_BASE,
  boost: POTENTIAL_STEP,
  diffuse: POTENTIAL_STEP,
  /** The soak at hardening temperature before the quench: no austenite there is a caution, not an error. */
  hardening: object({ temperatureC: num(LIMITS.stepTemperature), timeH: num(LIMITS.time) }, { optional: true }),
  targetEcdMm: range(LIMITS.depth),
  targetSurfaceCarbonPct: range(LIMITS.carbon),
  /** Longest total cycle accepted as a plan. */
  maxTotalH: num(LIMITS.time, { default: DEFAULT_MAX_TOTAL_H }),
} as const;

export const EQUIVALENT_TIME_REQUEST = {
  history: list(object({ timeH: num(LIMITS.historyTime), temperatureC: num(LIMITS.historyTemperature) }), {
    min: 2,
    tooFew: 'history.tooShort',
  }),
  setTemperatureC: num(LIMITS.temperature),
  model,
  carbonPct: num(LIMITS.carbon, { default: DEFAULT_HISTORY_CARBON_PCT }),
  /** Soak the recipe asks for at the set temperature. */
  requiredTimeH: num(LIMITS.time, { optional: true }),
} as const;

/** Every unit `convert` knows: lengths, temperatures, times, diffusivities and the two hardness scales. */
export const CONVERTIBLE_UNITS = [...Object.values(UNITS).flat(), ...HARDNESS_UNITS] as const;

export const CONVERT_REQUEST = {
  value: num(),
  from: choice(CONVERTIBLE_UNITS, { unknown: 'unit.unknown', param: 'unit' }),
  /** Left out: every unit of the quantity. */
  to: choice(CONVERTIBLE_UNITS, { optional: true, unknown: 'unit.unknown', param: 'unit' }),
} as const;

/** Each request by the CLI command that reads it. */
export const REQUESTS = {
  depth: DEPTH_REQUEST,
  time: TIME_REQUEST,
  temperature: TEMPERATURE_REQUEST,
  simulate: RECIPE_REQUEST,
  plan: PLAN_REQUEST,
  'equivalent-time': EQUIVALENT_TIME_REQUEST,
  convert: CONVERT_REQUEST,
} as const satisfies Record<string, Readonly<Record<string, FieldSpec>>>;
