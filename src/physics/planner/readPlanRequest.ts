/**
 * Reads an untrusted `plan` request (CLI JSON, form state) into a typed PlanRequest with
 * every default filled in, or a typed error naming the field (`boost.temperatureC`,
 * `targetEcdMm.min`). Nothing here throws.
 */
import { checkCycleBase, type CycleBase } from '../cycle/readRecipe';
import type { PartShape } from '../cycle/recipe';
import { readRequest, type ReadOf } from '../requestSpec';
import { PLAN_REQUEST } from '../requestTables';
import { fail, ok, type Result } from '../result';

export { DEFAULT_MAX_TOTAL_H } from '../requestTables';

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

/** Deepest effective case a part can have, mm: half a plate, the radius of a bar. */
function deepestCaseMm(shape: PartShape): number | undefined {
  if (shape.kind === 'plate') return shape.thicknessMm / 2;
  if (shape.kind === 'bar') return shape.diameterMm / 2;
  return undefined;
}

/** Cross-checks between fields: ranges in order, a boost richer than the diffuse, targets inside the part and above the threshold. */
function crossCheck(plan: PlanRequest): Result<PlanRequest> {
  const { boost, diffuse, targetEcdMm, targetSurfaceCarbonPct, thresholdCarbonPct, steel, hardening, maxTotalH } = plan;
  for (const [name, range] of [
    ['targetEcdMm', targetEcdMm],
    ['targetSurfaceCarbonPct', targetSurfaceCarbonPct],
  ] as const) {
    // Beside the upper end, the one a person reaches for to widen a range.
    if (!(range.min <= range.max)) return fail('range.minAboveMax', `${name}.max`, { min: range.min, max: range.max });
  }
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
 * β, diffusivityFactor 1), and maxTotalH DEFAULT_MAX_TOTAL_H.
 */
export function readPlanRequest(request: unknown): Result<PlanRequest> {
  const read = readRequest(PLAN_REQUEST, request);
  if (!read.ok) return read;
  const base = checkCycleBase(read.value);
  return base.ok ? crossCheck(base.value) : base;
}

// Compile-time: the reader's output is a PlanRequest (a type error here means the table and the contract differ).
type Holds<T extends true> = T;
type _ReadIsPlanRequest = Holds<ReadOf<typeof PLAN_REQUEST> extends PlanRequest ? true : false>;
