/**
 * The calibration view's data: for each furnace with lab depths (or a stored calibration), the
 * fit from the log as it is now, the figures kept in the settings, and whether those are out of
 * date. Pure: the view renders it and stores figures only when the person asks.
 */
import { calibrateFurnace, furnacesWithLabDepth, measuredEcdMm, type FurnaceCalibration, type Job } from '../../jobs';
import type { CalibrationFit, DiffusivityModelId } from '../../physics';
import type { StoredCalibration } from '../settings/calibration';

export interface FurnaceCard {
  furnace: string;
  /** The fit from the log as it is now (with the jobs it skipped). */
  calibration: FurnaceCalibration;
  /** The figures kept in the settings, if any. */
  stored?: StoredCalibration;
  /** The current fit as figures to store (absent when the fit failed). */
  fresh?: StoredCalibration;
  /** Stored figures that differ from the current fit (other factor, jobs or model). */
  stale: boolean;
}

/** A fit as the figures the settings keep. */
export function storableFit(
  furnace: string,
  fit: CalibrationFit,
  model: DiffusivityModelId,
  fittedAt: string,
  apply: boolean,
): StoredCalibration {
  return {
    furnace,
    factor: fit.factor,
    low: fit.interval95.low,
    high: fit.interval95.high,
    jobCount: fit.jobCount,
    rmsMm: fit.rmsResidualMm,
    fittedAt,
    model,
    apply,
  };
}

const sameFit = (a: StoredCalibration, b: StoredCalibration) =>
  a.model === b.model &&
  a.jobCount === b.jobCount &&
  Math.abs(a.factor - b.factor) <= 1e-9 * b.factor &&
  Math.abs(a.low - b.low) <= 1e-9 * b.low;

/** The furnaces the view has a card for: those with lab depths in the log, and those with stored figures. */
export function calibrationFurnaces(jobs: readonly Job[], stored: readonly StoredCalibration[]): string[] {
  return [...new Set([...furnacesWithLabDepth(jobs), ...stored.map((s) => s.furnace)])].sort();
}

/** The jobs a calibration reads: those with a lab ECD (the only ones worth sending to the worker). */
export const measuredJobs = (jobs: readonly Job[]): Job[] => jobs.filter((job) => measuredEcdMm(job) !== undefined);

/** One card per fitted furnace, beside the figures the settings keep. */
export function cardsOf(
  calibrations: readonly FurnaceCalibration[],
  stored: readonly StoredCalibration[],
  model: DiffusivityModelId,
  now: Date,
): FurnaceCard[] {
  return calibrations.map((calibration) => {
    const furnace = calibration.furnace;
    const kept = stored.find((s) => s.furnace === furnace);
    const fresh = calibration.fit.ok
      ? storableFit(furnace, calibration.fit.value, model, now.toISOString(), kept?.apply ?? false)
      : undefined;
    return {
      furnace,
      calibration,
      ...(kept ? { stored: kept } : {}),
      ...(fresh ? { fresh } : {}),
      stale: kept !== undefined && (fresh === undefined || !sameFit(kept, fresh)),
    };
  });
}

/** The cards computed here and now (the tests; the view fits in the worker). */
export function calibrationCards(
  jobs: readonly Job[],
  stored: readonly StoredCalibration[],
  model: DiffusivityModelId,
  now: Date,
): FurnaceCard[] {
  const fits = calibrationFurnaces(jobs, stored).map((furnace) => calibrateFurnace(jobs, furnace, { model }));
  return cardsOf(fits, stored, model, now);
}
