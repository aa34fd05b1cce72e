/**
 * The `traverse` command: the lab's hardness points in, the effective case depth by the
 * drawing's limit out (ISO 18203: 550 HV by default; SAE J423: 50 HRC), with surface and
 * core hardness. The effective case depth is the depth at which the hardness falls to the
 * limit, by linear interpolation between the two points that bracket it. A traverse with no
 * single such depth (it never falls to the limit, starts at or below it, or crosses it more
 * than once) is reported with a warning and no number.
 */
import { hardnessIn, hrcToHv, type Hardness, type HardnessUnit } from '../hardness';
import { ok, type Result, type Warning } from '../result';
import { readTraverse, type TraversePoint, type TraverseRequest } from './readTraverse';

export interface TraverseResult {
  /** Depth where the hardness falls to the limit, mm; null when the traverse gives no single answer. */
  effectiveCaseDepthMm: number | null;
  limit: Hardness;
  /** The first point, as measured. */
  surfaceHardness: Hardness;
  /** Mean of the deepest points once the traverse has levelled off (CORE_RULE); absent otherwise. */
  coreHardness?: Hardness;
  /** The two points, as measured, between which the limit was crossed; null with no single answer. */
  bracket: [TraversePoint, TraversePoint] | null;
  /** How many times consecutive points pass from above the limit to at-or-below it, or back. */
  crossings: number;
  warnings: Warning[];
}

/**
 * The core is read from the deepest `points` points once they have levelled off: all below
 * the limit and within `spread` of each other (20 HV, or 2 HRC when all are in HRC; about the
 * scatter of repeated readings). Our rule, stated in the app.
 */
export const CORE_RULE = { points: 3, spread: { HV: 20, HRC: 2 } } as const satisfies {
  points: number;
  spread: Record<HardnessUnit, number>;
};

/** Rounding of the command's output: 1 µm and 0.1 HV/HRC, far inside what a traverse resolves. */
const round = (value: number, digits: number) => Number(value.toFixed(digits));
const DEPTH_DIGITS = 3;
const HARDNESS_DIGITS = 1;

const asHardness = (p: TraversePoint): Hardness => ({ value: p.value, unit: p.unit });

/**
 * Where the limit is crossed between `upper` (above it) and `lower` (at or below), mm. Interpolated
 * in the limit's scale; an HV point softer than the Rockwell C table under an HRC limit has no HRC
 * value, so that bracket is interpolated in HV with the limit converted.
 */
function crossingDepthMm(upper: TraversePoint, lower: TraversePoint, limit: Hardness, warnings: Warning[]): number {
  let unit = limit.unit;
  let limitValue = limit.value;
  if (hardnessIn(asHardness(lower), unit) === undefined) {
    unit = 'HV';
    limitValue = hrcToHv(limit.value)!;
    warnings.push({
      code: 'traverse.crossedInHv',
      params: { depthMm: lower.depthMm, value: lower.value, limitHv: round(limitValue, HARDNESS_DIGITS) },
    });
  }
  const h0 = hardnessIn(asHardness(upper), unit)!;
  const h1 = hardnessIn(asHardness(lower), unit)!;
  return upper.depthMm + ((h0 - limitValue) / (h0 - h1)) * (lower.depthMm - upper.depthMm);
}

/** Core hardness from the deepest points, or the warning saying why there is none. */
function coreHardness(points: readonly TraversePoint[], above: readonly boolean[]): Hardness | Warning {
  const count = CORE_RULE.points;
  const deepest = points.slice(-count);
  if (deepest.length < count || above.slice(-count).some(Boolean)) {
    return { code: 'traverse.coreNotReached', params: { count } };
  }
  const unit: HardnessUnit = deepest.every((p) => p.unit === deepest[0]!.unit) ? deepest[0]!.unit : 'HV';
  // HRC → HV always converts, so every value exists in `unit`.
  const values = deepest.map((p) => hardnessIn(asHardness(p), unit)!);
  const spread = Math.max(...values) - Math.min(...values);
  if (spread > CORE_RULE.spread[unit]) {
    return {
      code: 'traverse.coreNotLevelled',
      params: { count, spread: round(spread, HARDNESS_DIGITS), tolerance: CORE_RULE.spread[unit], unit },
    };
  }
  return { value: values.reduce((sum, v) => sum + v, 0) / count, unit };
}

const isWarning = (value: Hardness | Warning): value is Warning => 'code' in value;

/** The effective case depth and the rest of a validated traverse, unrounded (the app formats it). */
export function analyseTraverse({ points, limit }: TraverseRequest): TraverseResult {
  const warnings: Warning[] = [];
  const otherUnits = [...new Set(points.map((p) => p.unit).filter((u) => u !== limit.unit))];
  for (const from of otherUnits)
    warnings.push({ code: 'traverse.convertedApproximately', params: { from, to: limit.unit } });
  // No value in the limit's scale means an HV point below the HRC table: softer than any HRC limit.
  const above = points.map((p) => (hardnessIn(asHardness(p), limit.unit) ?? -Infinity) > limit.value);
  let crossings = 0;
  for (let i = 1; i < points.length; i++) if (above[i] !== above[i - 1]) crossings++;
  const first = points[0]!;
  const last = points[points.length - 1]!;
  const limitParams = { limit: limit.value, limitUnit: limit.unit };
  if (!above[0]) {
    warnings.push({
      code: 'traverse.startsBelowLimit',
      params: { value: first.value, unit: first.unit, ...limitParams },
    });
  } else if (crossings === 0) {
    warnings.push({ code: 'traverse.neverReachesLimit', params: { depthMm: last.depthMm, ...limitParams } });
  }
  if (crossings > 1) warnings.push({ code: 'traverse.multipleCrossings', params: { crossings, ...limitParams } });

  let effectiveCaseDepthMm: number | null = null;
  let bracket: TraverseResult['bracket'] = null;
  if (above[0] && crossings === 1) {
    const k = above.indexOf(false) - 1;
    bracket = [points[k]!, points[k + 1]!];
    effectiveCaseDepthMm = crossingDepthMm(bracket[0], bracket[1], limit, warnings);
  }
  const core = coreHardness(points, above);
  if (isWarning(core)) warnings.push(core);
  return {
    effectiveCaseDepthMm,
    limit,
    surfaceHardness: asHardness(first),
    ...(isWarning(core) ? {} : { coreHardness: core }),
    bracket,
    crossings,
    warnings,
  };
}

const roundHardness = (h: Hardness): Hardness => ({ value: round(h.value, HARDNESS_DIGITS), unit: h.unit });

/** `traverse`: request → effective case depth, surface and core hardness, or a typed error naming the point. */
export function traverse(request: unknown): Result<TraverseResult> {
  const read = readTraverse(request);
  if (!read.ok) return read;
  const result = analyseTraverse(read.value);
  return ok({
    ...result,
    effectiveCaseDepthMm:
      result.effectiveCaseDepthMm === null ? null : round(result.effectiveCaseDepthMm, DEPTH_DIGITS),
    ...(result.coreHardness ? { coreHardness: roundHardness(result.coreHardness) } : {}),
  });
}
