/**
 * Every request physics reads, as data (requestSpec.ts): here the closed-form `depth`, `time` and
 * `temperature` requests, `equivalent-time` and `convert` and what cycles share with them; the
 * cycle recipe (`simulate`) and the `plan` request in cycle/requestTables.ts; all of them by CLI
 * command in requests.ts. The readers read these; the job record's schema and the app's
 * form reader are built from them. A field is added to a request by adding it here (and its words).
 */
import { DEFAULT_MODEL, MODEL_IDS } from './diffusivity';
import { HARDNESS_UNITS } from './hardness';
import { LIMITS } from './limits';
import { choice, composition, list, num, object } from './requestSpec';
import { DEFAULT_ECD_THRESHOLD_PCT, TOTAL_CASE_MARGIN_PCT } from './steel';
import { DEFAULT_TEMPERATURE_TOLERANCE_C } from './uncertainty';
import { UNITS } from './units';

/** Carbon at which D is evaluated for an equivalent time when the request gives none: mid-case (common practice), wt%. */
export const DEFAULT_HISTORY_CARBON_PCT = 0.5;

export const model = choice(MODEL_IDS, { default: DEFAULT_MODEL, unknown: 'model.unknown', param: 'model' });
/** A furnace's calibration factor on D: 1 when uncalibrated. */
export const diffusivityFactor = num(LIMITS.diffusivityFactor, { default: 1 });
export const totalCaseMarginPct = num(LIMITS.totalCaseMargin, { default: TOTAL_CASE_MARGIN_PCT });

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
