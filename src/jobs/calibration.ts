/**
 * Furnace calibration from the job log. Each job of one furnace that has a lab ECD and the
 * inputs it was planned with becomes a calibration sample whose prediction re-runs that
 * calculation with D × k: a closed-form request with `diffusivityFactor: k` at the time and
 * temperature it ran, or the recorded cycle with `diffusivityFactor: k`. Physics fits k.
 * k is relative to one diffusivity model: `model` re-runs every job with it (the app passes the
 * model it calculates with), otherwise each job keeps its own.
 */
import {
  type CalibrationFit,
  type CalibrationSample,
  depthFigures,
  type DiffusivityModelId,
  fitDiffusivityFactor,
  type Result,
  runCycle,
} from '../physics';
import { measuredEcdMm } from './labFigures';
import { jobRun, type SkipReason } from './rerun';
import { compareNewestFirst } from './query';
import type { Job } from './schema';

/** Most recent lab results used per furnace (our choice: a furnace drifts, so old traverses weigh less than new ones). */
export const DEFAULT_CALIBRATION_JOBS = 30;

export interface CalibrationOptions {
  /** Re-run every job with this model (default: each job's own). */
  model?: DiffusivityModelId;
  /** Use only the newest this many usable jobs (default DEFAULT_CALIBRATION_JOBS). */
  maxJobs?: number;
}

export interface SkippedJob {
  id: string;
  reason: SkipReason;
}

export interface SampleSet {
  samples: CalibrationSample[];
  skipped: SkippedJob[];
}

export interface FurnaceCalibration {
  furnace: string;
  fit: Result<CalibrationFit>;
  skipped: SkippedJob[];
}

type Predictor = (factor: number) => number;

/** The job's ECD as a function of the factor on D: its closed-form request or its cycle re-run with D × k. */
function predictorOf(job: Job, model: DiffusivityModelId | undefined): Predictor | SkipReason {
  const run = jobRun(job, model ? { model } : {});
  if (typeof run === 'string') return run;
  if (run.kind === 'closedForm') {
    return (factor) =>
      depthFigures({ ...run.spec, diffusivityFactor: factor }, run.temperatureC, run.timeH).effectiveCaseDepthMm;
  }
  // k replaces the factor the cycle was planned with.
  return (factor) => runCycle({ ...run.recipe, diffusivityFactor: factor }).effectiveCaseDepthMm;
}

/**
 * The predictor, if it gives a case at k = 1 (else the fit on ln ECD has nothing to compare);
 * its value at 1 is kept, since the fit starts there.
 */
function withCase(predictor: Predictor): Predictor | SkipReason {
  const atOne = predictor(1);
  if (!(atOne > 0)) return 'noCase';
  return (factor) => (factor === 1 ? atOne : predictor(factor));
}

/** The calibration samples of one furnace (newest first), and the measured jobs that could not be used. */
export function calibrationSamples(jobs: readonly Job[], furnace: string, options: CalibrationOptions = {}): SampleSet {
  const maxJobs = options.maxJobs ?? DEFAULT_CALIBRATION_JOBS;
  const measured = jobs
    .filter((job) => job.furnace === furnace && measuredEcdMm(job) !== undefined)
    .sort(compareNewestFirst);
  const samples: CalibrationSample[] = [];
  const skipped: SkippedJob[] = [];
  for (const job of measured) {
    if (samples.length >= maxJobs) break;
    const predictor = predictorOf(job, options.model);
    const usable = typeof predictor === 'string' ? predictor : withCase(predictor);
    if (typeof usable === 'string') skipped.push({ id: job.id, reason: usable });
    else samples.push({ id: job.id, measuredEcdMm: measuredEcdMm(job)!, predictEcdMm: usable });
  }
  return { samples, skipped };
}

/** Fits the diffusivity factor of one furnace from its lab results. */
export function calibrateFurnace(
  jobs: readonly Job[],
  furnace: string,
  options: CalibrationOptions = {},
): FurnaceCalibration {
  const { samples, skipped } = calibrationSamples(jobs, furnace, options);
  return { furnace, fit: fitDiffusivityFactor(samples), skipped };
}

/** Furnaces with at least one lab ECD, sorted. */
export function furnacesWithLabDepth(jobs: readonly Job[]): string[] {
  return [...new Set(jobs.filter((job) => measuredEcdMm(job) !== undefined).map((job) => job.furnace))].sort();
}
