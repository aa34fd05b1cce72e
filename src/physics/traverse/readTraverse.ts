/**
 * Reads an untrusted `traverse` request (CLI JSON, form state) into a typed request, or a
 * typed error naming the point (`points.3.depthMm`). Nothing here throws.
 */
import { CASE_CRITERIA, type Hardness, type HardnessUnit } from '../hardness';
import { readHardnessFields, readOptionalHardness } from '../readHardness';
import { fail, ok, type Result } from '../result';
import { under } from '../cycle/readRecipe';
import { asFields, readNumber } from '../validate';

export interface TraversePoint {
  /** Distance from the surface, mm. */
  depthMm: number;
  value: number;
  unit: HardnessUnit;
}

export interface TraverseRequest {
  /** Sorted from the surface inward, depths strictly increasing. */
  points: TraversePoint[];
  /** The hardness the effective case depth is read at. */
  limit: Hardness;
}

/** A traverse needs a point above and a point below the limit. */
export const MIN_TRAVERSE_POINTS = 2;
/** Most points accepted (a traverse has tens). */
export const MAX_TRAVERSE_POINTS = 200;
/** Deepest point accepted, mm: past the core of any carburized part, short of a depth typed in µm. */
export const MAX_TRAVERSE_DEPTH_MM = 50;
/** Limit when the request names none: 550 HV, ISO 18203. */
export const DEFAULT_TRAVERSE_LIMIT: Hardness = CASE_CRITERIA['iso-18203'];

/** 1-based point number for messages; the field path stays 0-based like every other path. */
const pointNumber = (index: number) => index + 1;

function readPoint(raw: unknown, index: number, previous: TraversePoint | undefined): Result<TraversePoint> {
  const fields = asFields(raw);
  if (!fields.ok) return fail('traverse.pointNotObject', undefined, { point: pointNumber(index) });
  const depth = readNumber(fields.value, 'depthMm');
  if (!depth.ok) return depth;
  const depthMm = depth.value;
  if (depthMm < 0) return fail('traverse.depthNegative', 'depthMm', { point: pointNumber(index), value: depthMm });
  if (depthMm > MAX_TRAVERSE_DEPTH_MM)
    return fail('depth.tooDeep', 'depthMm', { value: depthMm, max: MAX_TRAVERSE_DEPTH_MM });
  if (depthMm === previous?.depthMm) {
    return fail('traverse.depthRepeated', 'depthMm', {
      point: pointNumber(index),
      previousPoint: pointNumber(index - 1),
      value: depthMm,
    });
  }
  if (previous !== undefined && depthMm < previous.depthMm) {
    return fail('traverse.depthNotIncreasing', 'depthMm', {
      point: pointNumber(index),
      value: depthMm,
      previousPoint: pointNumber(index - 1),
      previous: previous.depthMm,
    });
  }
  const hardness = readHardnessFields(fields.value);
  if (!hardness.ok) return hardness;
  return ok({ depthMm, ...hardness.value });
}

/** `{points: [{depthMm, value, unit}], limit?: {value, unit}}` → TraverseRequest (limit 550 HV by default). */
export function readTraverse(request: unknown): Result<TraverseRequest> {
  const fields = asFields(request);
  if (!fields.ok) return fields;
  const raw = fields.value.points;
  if (!Array.isArray(raw)) return fail('field.missing', 'points');
  if (raw.length < MIN_TRAVERSE_POINTS) {
    return fail('traverse.tooFewPoints', 'points', { count: raw.length, min: MIN_TRAVERSE_POINTS });
  }
  if (raw.length > MAX_TRAVERSE_POINTS) {
    return fail('traverse.tooManyPoints', 'points', { count: raw.length, max: MAX_TRAVERSE_POINTS });
  }
  const points: TraversePoint[] = [];
  for (let i = 0; i < raw.length; i++) {
    const point = under(`points.${i}`, readPoint(raw[i], i, points[i - 1]));
    if (!point.ok) return point;
    points.push(point.value);
  }
  const limit = under('limit', readOptionalHardness(fields.value.limit, DEFAULT_TRAVERSE_LIMIT));
  if (!limit.ok) return limit;
  return ok({ points, limit: limit.value ?? DEFAULT_TRAVERSE_LIMIT });
}
