/**
 * Reads an untrusted `plan` request (CLI JSON, form state) into a typed PlanRequest with
 * every default filled in, or a typed error naming the field (`boost.temperatureC`,
 * `targetEcdMm.min`). Nothing here throws.
 */
import { checkStepTemperatureC, readCycleBase, under, type CycleBase } from '../cycle/readRecipe';
import { DEFAULT_BETA_M_PER_S, type PartShape } from '../cycle/recipe';
import { fail, ok, type Result } from '../result';
import {
  asFields,
  checkBeta,
  checkCarbonPct,
  checkDepthMm,
  checkDiffusivityFactor,
  checkTemperatureC,
  checkTimeH,
  readChecked,
  readOptionalNumber,
  type Fields,
} from '../validate';

/** Longest cycle (boost + diffuse + hardening) the planner proposes unless the request says otherwise, h (our choice: beyond the deepest pit-furnace cases, well inside MAX_TIME_H). */
export const DEFAULT_MAX_TOTAL_H = 100;

/** Shortest boost + diffuse time the planner considers, h (6 min). */
export const MIN_CARBURIZE_H = 0.1;

/** A carburizing step at one temperature and carbon potential. */
export interface PotentialStep {
  temperatureC: number;
  carbonPotentialPct: number;
  betaMPerS: number;
}

/** The soak at hardening temperature before the quench, at the diffuse step's carbon potential and β. */
export interface HardeningStep {
  temperatureC: number;
  timeH: number;
}

export interface TargetRange {
  min: number;
  max: number;
}

export interface PlanRequest extends CycleBase {
  boost: PotentialStep;
  diffuse: PotentialStep;
  hardening?: HardeningStep;
  targetEcdMm: TargetRange;
  targetSurfaceCarbonPct: TargetRange;
  /** Furnace calibration factor on D (1 when uncalibrated). */
  diffusivityFactor: number;
  /** Longest total cycle accepted as a plan, h. */
  maxTotalH: number;
}

/** An object field: missing is `field.missing` at the field, other errors get its path. */
function readObject<T>(fields: Fields, field: string, read: (f: Fields) => Result<T>): Result<T> {
  const raw = fields[field];
  if (raw === undefined || raw === null) return fail('field.missing', field);
  const inner = asFields(raw);
  return under(field, inner.ok ? read(inner.value) : inner);
}

/** An optional number field with a default, range-checked. */
function readOptionalChecked(
  f: Fields,
  field: string,
  fallback: number,
  check: (value: number, field: string) => Result<number>,
): Result<number> {
  const raw = readOptionalNumber(f, field);
  return raw.ok ? check(raw.value ?? fallback, field) : raw;
}

function readPotentialStep(f: Fields): Result<PotentialStep> {
  const temperatureC = readChecked(f, 'temperatureC', checkTemperatureC);
  if (!temperatureC.ok) return temperatureC;
  const potential = readChecked(f, 'carbonPotentialPct', checkCarbonPct);
  if (!potential.ok) return potential;
  const beta = readOptionalChecked(f, 'betaMPerS', DEFAULT_BETA_M_PER_S, checkBeta);
  if (!beta.ok) return beta;
  return ok({ temperatureC: temperatureC.value, carbonPotentialPct: potential.value, betaMPerS: beta.value });
}

/** The hardening soak becomes a recipe step: a temperature without austenite is a caution there, not an error. */
function readHardening(f: Fields): Result<HardeningStep> {
  const temperatureC = readChecked(f, 'temperatureC', checkStepTemperatureC);
  if (!temperatureC.ok) return temperatureC;
  const timeH = readChecked(f, 'timeH', checkTimeH);
  return timeH.ok ? ok({ temperatureC: temperatureC.value, timeH: timeH.value }) : timeH;
}

function readRange(check: (value: number, field: string) => Result<number>) {
  return (f: Fields): Result<TargetRange> => {
    const min = readChecked(f, 'min', check);
    if (!min.ok) return min;
    const max = readChecked(f, 'max', check);
    if (!max.ok) return max;
    return min.value <= max.value
      ? ok({ min: min.value, max: max.value })
      : fail('range.minAboveMax', undefined, { min: min.value, max: max.value });
  };
}

/** Deepest effective case a part can have, mm: half a plate, the radius of a bar. */
function deepestCaseMm(shape: PartShape): number | undefined {
  if (shape.kind === 'plate') return shape.thicknessMm / 2;
  if (shape.kind === 'bar') return shape.diameterMm / 2;
  return undefined;
}

/** Cross-checks between fields: a boost richer than the diffuse, targets inside the part and above the threshold. */
function crossCheck(plan: PlanRequest): Result<PlanRequest> {
  const { boost, diffuse, targetEcdMm, targetSurfaceCarbonPct, thresholdCarbonPct, steel, hardening, maxTotalH } = plan;
  if (!(boost.carbonPotentialPct > diffuse.carbonPotentialPct)) {
    return fail('carbon.boostNotAboveDiffuse', 'boost.carbonPotentialPct', {
      boostPct: boost.carbonPotentialPct,
      diffusePct: diffuse.carbonPotentialPct,
    });
  }
  if (!(targetSurfaceCarbonPct.min > thresholdCarbonPct)) {
    return fail('threshold.outsideProfile', 'targetSurfaceCarbonPct.min', {
      thresholdPct: thresholdCarbonPct,
      corePct: steel.coreCarbonPct,
      surfacePct: targetSurfaceCarbonPct.min,
    });
  }
  const deepestMm = deepestCaseMm(plan.shape);
  if (deepestMm !== undefined && !(targetEcdMm.max < deepestMm)) {
    return fail('depth.tooDeep', 'targetEcdMm.max', { value: targetEcdMm.max, max: deepestMm });
  }
  const shortestH = (hardening?.timeH ?? 0) + MIN_CARBURIZE_H;
  if (!(maxTotalH >= shortestH))
    return fail('time.limitTooShort', 'maxTotalH', { value: maxTotalH, min: Number(shortestH.toFixed(2)) });
  return ok(plan);
}

/**
 * `plan` request → PlanRequest, defaults filled in as for `simulate` (model, threshold, shape,
 * β), and diffusivityFactor 1, maxTotalH DEFAULT_MAX_TOTAL_H.
 */
export function readPlanRequest(request: unknown): Result<PlanRequest> {
  const fields = asFields(request);
  if (!fields.ok) return fields;
  const f = fields.value;
  const base = readCycleBase(f);
  if (!base.ok) return base;
  const boost = readObject(f, 'boost', readPotentialStep);
  if (!boost.ok) return boost;
  const diffuse = readObject(f, 'diffuse', readPotentialStep);
  if (!diffuse.ok) return diffuse;
  const hardening =
    f.hardening === undefined || f.hardening === null ? ok(undefined) : readObject(f, 'hardening', readHardening);
  if (!hardening.ok) return hardening;
  const targetEcdMm = readObject(f, 'targetEcdMm', readRange(checkDepthMm));
  if (!targetEcdMm.ok) return targetEcdMm;
  const targetSurface = readObject(f, 'targetSurfaceCarbonPct', readRange(checkCarbonPct));
  if (!targetSurface.ok) return targetSurface;
  const factor = readOptionalChecked(f, 'diffusivityFactor', 1, checkDiffusivityFactor);
  if (!factor.ok) return factor;
  const maxTotalH = readOptionalChecked(f, 'maxTotalH', DEFAULT_MAX_TOTAL_H, checkTimeH);
  if (!maxTotalH.ok) return maxTotalH;
  return crossCheck({
    ...base.value,
    boost: boost.value,
    diffuse: diffuse.value,
    ...(hardening.value ? { hardening: hardening.value } : {}),
    targetEcdMm: targetEcdMm.value,
    targetSurfaceCarbonPct: targetSurface.value,
    diffusivityFactor: factor.value,
    maxTotalH: maxTotalH.value,
  });
}
