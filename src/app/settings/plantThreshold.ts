/**
 * The plant's learnt ECD thresholds (per furnace and steel grade) and whether each is applied, kept
 * with the settings like the depth correction, so the calculators read them without the log. Each
 * keeps the diffusion speed fitted with it: the two are learnt together and applied together.
 */
import { DIFFUSIVITY_FACTOR_LIMITS, type DiffusivityModelId, isModelId, MAX_CARBON_PCT } from '../../physics';
import { FURNACE_NAME_MAX, SHORT_TEXT_MAX } from '../../jobs/limits';
import { computed } from '@preact/signals';
import { persisted } from '../ui/persist';

export interface StoredThreshold {
  furnace: string;
  /** The grade id from the list, or the grade's name as written. */
  grade: string;
  thresholdPct: number;
  low: number;
  high: number;
  /** The diffusion-speed factor fitted with it, and its 95 % interval. */
  factor: number;
  factorLow: number;
  factorHigh: number;
  loadCount: number;
  fittedAt: string;
  model: DiffusivityModelId;
  apply: boolean;
}

const STORED_FIELDS = [
  'furnace',
  'grade',
  'thresholdPct',
  'low',
  'high',
  'factor',
  'factorLow',
  'factorHigh',
  'loadCount',
  'fittedAt',
  'model',
  'apply',
] as const satisfies readonly (keyof StoredThreshold)[];

const finiteIn = (x: unknown, min: number, max: number): x is number =>
  typeof x === 'number' && Number.isFinite(x) && x >= min && x <= max;
const text = (x: unknown, max: number): x is string => typeof x === 'string' && x.trim() !== '' && x.length <= max;

function isThreshold(raw: unknown): raw is StoredThreshold {
  if (typeof raw !== 'object' || raw === null) return false;
  const c = raw as Record<string, unknown>;
  const { min, max } = DIFFUSIVITY_FACTOR_LIMITS;
  return (
    text(c.furnace, FURNACE_NAME_MAX) &&
    text(c.grade, SHORT_TEXT_MAX) &&
    finiteIn(c.thresholdPct, 0, MAX_CARBON_PCT) &&
    finiteIn(c.low, -MAX_CARBON_PCT, c.thresholdPct) &&
    finiteIn(c.high, c.thresholdPct, 2 * MAX_CARBON_PCT) &&
    finiteIn(c.factorLow, min, max) &&
    finiteIn(c.factor, c.factorLow, max) &&
    finiteIn(c.factorHigh, c.factor, Number.MAX_VALUE) &&
    Number.isInteger(c.loadCount) &&
    (c.loadCount as number) > 0 &&
    typeof c.fittedAt === 'string' &&
    !Number.isNaN(Date.parse(c.fittedAt)) &&
    isModelId(c.model) &&
    typeof c.apply === 'boolean'
  );
}

const keyOf = (t: Pick<StoredThreshold, 'furnace' | 'grade'>) => `${t.furnace}\u0000${t.grade}`;

/** Stored thresholds as checked on read: malformed entries dropped, one per furnace and grade (the last), sorted. */
export function readThresholds(stored: unknown): StoredThreshold[] {
  if (!Array.isArray(stored)) return [];
  const byKey = new Map<string, StoredThreshold>();
  for (const entry of stored) {
    if (!isThreshold(entry)) continue;
    // Only the known fields are kept: anything else stored beside them is dropped.
    byKey.set(keyOf(entry), Object.fromEntries(STORED_FIELDS.map((k) => [k, entry[k]])) as unknown as StoredThreshold);
  }
  return [...byKey.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([, v]) => v);
}

export const plantThresholds = persisted<StoredThreshold[]>('plantThresholds', [], readThresholds);

/** The furnaces with a learnt threshold (offered in the cycle and planner screens' furnace choice). */
export const learntFurnaces = computed(() => [...new Set(plantThresholds.value.map((t) => t.furnace))]);

export function storeThreshold(entry: StoredThreshold): void {
  plantThresholds.value = readThresholds([...plantThresholds.value.filter((t) => keyOf(t) !== keyOf(entry)), entry]);
}

export function setThresholdApplied(furnace: string, grade: string, apply: boolean): void {
  plantThresholds.value = plantThresholds.value.map((t) =>
    t.furnace === furnace && t.grade === grade ? { ...t, apply } : t,
  );
}

/** The threshold applied to a calculation of `grade` in `furnace` with `model`, if one is turned on. */
export function appliedThreshold(
  list: readonly StoredThreshold[],
  furnace: string,
  grade: string | undefined,
  model: DiffusivityModelId,
): StoredThreshold | undefined {
  if (furnace === '' || grade === undefined) return undefined;
  return list.find((t) => t.furnace === furnace && t.grade === grade && t.apply && t.model === model);
}
