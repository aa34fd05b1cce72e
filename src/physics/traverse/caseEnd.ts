/**
 * Where a traverse has come most of the way down to its core: the depth at which the hardness,
 * falling past the case limit, reaches `core + CASE_END_FRACTION × (limit − core)`. With the
 * limit it fixes two carbon levels on the same traverse, which is what lets the plant's
 * threshold fit (`plantThreshold.ts`) tell the furnace's diffusion speed from the steel's
 * hardness limit. A quarter of the way rather than the core itself: the last few points lie in
 * the flat tail, where a reading's scatter moves the depth more than anything the furnace did.
 */
import { CONVERTIBLE_RANGE, hardnessIn, type Hardness, type HardnessUnit } from '../hardness';
import type { TraversePoint } from './readTraverse';
import type { TraverseResult } from './traverse';

/** Share of the way from core up to the limit at which the case is taken to end (our choice). */
export const CASE_END_FRACTION = 0.25;

/**
 * The scale the levels are compared in: HRC when core and limit both convert to it (as the app's
 * indicative curve, which is a straight line in HRC), else HV (a soft core has no HRC value).
 */
function levelUnit(core: Hardness, limit: Hardness): HardnessUnit {
  const inHrc = (h: Hardness) => {
    const hrc = hardnessIn(h, 'HRC');
    return hrc !== undefined && hrc >= CONVERTIBLE_RANGE.HRC.min;
  };
  return inHrc(core) && inHrc(limit) ? 'HRC' : 'HV';
}

/** HRC → HV always converts and every HV point has an HV value, so `unit` from levelUnit always exists. */
const valueIn = (p: Hardness, unit: HardnessUnit) => hardnessIn(p, unit) ?? -Infinity;

/**
 * The case-end depth of an analysed traverse, mm; undefined when the traverse has no single ECD,
 * no core reading, or never falls to the level before its last point.
 */
export function caseEndDepthMm(
  points: readonly TraversePoint[],
  analysis: Pick<TraverseResult, 'effectiveCaseDepthMm' | 'coreHardness' | 'limit' | 'bracket'>,
  fraction = CASE_END_FRACTION,
): number | undefined {
  const { coreHardness: core, limit, bracket } = analysis;
  if (analysis.effectiveCaseDepthMm === null || !core || !bracket) return undefined;
  const unit = levelUnit(core, limit);
  const coreValue = valueIn(core, unit);
  const level = coreValue + fraction * (valueIn(limit, unit) - coreValue);
  const start = points.indexOf(bracket[1]);
  for (let j = Math.max(start, 1); j < points.length; j++) {
    const lower = valueIn(points[j]!, unit);
    if (lower > level) continue;
    // The point before lies above the level: it is the bracket's upper point or one passed over.
    const upperPoint = points[j - 1]!;
    const upper = valueIn(upperPoint, unit);
    return upperPoint.depthMm + ((upper - level) / (upper - lower)) * (points[j]!.depthMm - upperPoint.depthMm);
  }
  return undefined;
}
