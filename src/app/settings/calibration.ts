/**
 * Each furnace's fitted diffusivity factor and whether it is applied, kept with the settings
 * (not in the job log) so the calculators read it without opening the log's database; and the
 * furnace the calculators work for (one choice shared by every calculator: a person stands at
 * one furnace at a time).
 */
import { DIFFUSIVITY_FACTOR_LIMITS, type DiffusivityModelId, isModelId } from '../../physics';
import { FURNACE_NAME_MAX } from '../../jobs/limits';
import { persisted } from '../ui/persist';

export interface StoredCalibration {
  furnace: string;
  /** Factor on D and its 95 % interval. */
  factor: number;
  low: number;
  high: number;
  jobCount: number;
  /** Root-mean-square residual of the fit, mm. */
  rmsMm: number;
  /** When it was fitted (ISO 8601). */
  fittedAt: string;
  /** The diffusivity model it was fitted for: it is applied to that model only. */
  model: DiffusivityModelId;
  /** Applied to this furnace's predictions (off until the person turns it on). */
  apply: boolean;
}

const finiteIn = (x: unknown, min: number, max: number): x is number =>
  typeof x === 'number' && Number.isFinite(x) && x >= min && x <= max;

function isCalibration(raw: unknown): raw is StoredCalibration {
  if (typeof raw !== 'object' || raw === null) return false;
  const c = raw as Record<string, unknown>;
  const { min, max } = DIFFUSIVITY_FACTOR_LIMITS;
  return (
    typeof c.furnace === 'string' &&
    c.furnace.trim() !== '' &&
    c.furnace.length <= FURNACE_NAME_MAX &&
    finiteIn(c.low, min, max) &&
    finiteIn(c.factor, c.low, max) &&
    finiteIn(c.high, c.factor, max) &&
    Number.isInteger(c.jobCount) &&
    (c.jobCount as number) > 0 &&
    finiteIn(c.rmsMm, 0, Number.MAX_VALUE) &&
    typeof c.fittedAt === 'string' &&
    !Number.isNaN(Date.parse(c.fittedAt)) &&
    isModelId(c.model) &&
    typeof c.apply === 'boolean'
  );
}

/** Stored calibrations as checked on read: malformed entries dropped, one per furnace (the last), sorted by furnace. */
export function readCalibrations(stored: unknown): StoredCalibration[] {
  if (!Array.isArray(stored)) return [];
  const byFurnace = new Map<string, StoredCalibration>();
  for (const entry of stored) {
    if (isCalibration(entry)) {
      const { furnace, factor, low, high, jobCount, rmsMm, fittedAt, model, apply } = entry;
      byFurnace.set(furnace, { furnace, factor, low, high, jobCount, rmsMm, fittedAt, model, apply });
    }
  }
  return [...byFurnace.values()].sort((a, b) => (a.furnace < b.furnace ? -1 : a.furnace > b.furnace ? 1 : 0));
}

export const calibrations = persisted<StoredCalibration[]>('calibrations', [], readCalibrations);

/** The furnace the calculators work for ('' for none). */
export const chosenFurnace = persisted<string>('furnace', '');

/** Stores a fit for its furnace, replacing an earlier one. */
export function storeCalibration(entry: StoredCalibration): void {
  calibrations.value = readCalibrations([...calibrations.value.filter((c) => c.furnace !== entry.furnace), entry]);
}

/** Turns applying a furnace's stored factor on or off. */
export function setApplied(furnace: string, apply: boolean): void {
  calibrations.value = calibrations.value.map((c) => (c.furnace === furnace ? { ...c, apply } : c));
}

export type CalibrationState =
  | { kind: 'none' }
  | { kind: 'uncalibrated'; furnace: string }
  | { kind: 'off' | 'otherModel' | 'applied'; furnace: string; calibration: StoredCalibration }
  /** The steel's threshold learnt in this furnace, with the diffusion speed fitted with it (settings/plantThreshold.ts). */
  | { kind: 'learnt'; furnace: string; learnt: LearntThreshold };

/** What a calculation takes from a learnt threshold (its full record is StoredThreshold). */
export interface LearntThreshold {
  grade: string;
  thresholdPct: number;
  low: number;
  high: number;
  factor: number;
  loadCount: number;
}

/** What the chosen furnace's calibration means for a calculation with `model`. */
export function calibrationState(
  list: readonly StoredCalibration[],
  furnace: string,
  model: DiffusivityModelId,
): CalibrationState {
  if (furnace === '') return { kind: 'none' };
  const calibration = list.find((c) => c.furnace === furnace);
  if (!calibration) return { kind: 'uncalibrated', furnace };
  const kind = !calibration.apply ? 'off' : calibration.model !== model ? 'otherModel' : 'applied';
  return { kind, furnace, calibration };
}

/** The factor on D a calculation uses (1 unless a calibration is applied). */
export const factorOf = (state: CalibrationState): number =>
  state.kind === 'applied' ? state.calibration.factor : state.kind === 'learnt' ? state.learnt.factor : 1;
