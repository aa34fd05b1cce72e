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
  readCaseSpec,
  checkTemperatureC,
  checkTimeH,
  readRecipe,
  type Result,
  runCycle,
} from '../physics';
import { physicsRequestOf } from './inputs';
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

/**
 * Why a measured job of the furnace is left out of the fit: no recorded calculation, no time or
 * temperature it ran at, inputs today's checks refuse (2000 °C, 5000 h), or a calculation that
 * gives no case to compare.
 */
export type SkipReason = 'noInputs' | 'noRunConditions' | 'invalidInputs' | 'noCase';

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

const measuredEcdMm = (job: Job): number | undefined => {
  const ecd = job.lab?.ecdMm;
  return ecd !== undefined && ecd > 0 ? ecd : undefined;
};

/** A closed-form job: re-run at the temperature and time it ran (for a time or temperature request: the answer). */
function closedFormPredictor(job: Job, model: DiffusivityModelId | undefined): Predictor | SkipReason {
  const inputs = job.inputs!;
  if (inputs.kind === 'cycle') return 'invalidInputs';
  const temperatureC = inputs.kind === 'temperature' ? job.prediction?.temperatureC : inputs.temperatureC;
  const timeH = inputs.kind === 'time' ? job.prediction?.timeH : inputs.timeH;
  if (temperatureC === undefined || timeH === undefined) return 'noRunConditions';
  if (!checkTemperatureC(temperatureC, 'temperatureC').ok || !checkTimeH(timeH, 'timeH').ok) return 'invalidInputs';
  const spec = readCaseSpec({ ...physicsRequestOf(inputs), ...(model ? { model } : {}), diffusivityFactor: 1 });
  if (!spec.ok) return 'invalidInputs';
  return (factor) =>
    depthFigures({ ...spec.value, diffusivityFactor: factor }, temperatureC, timeH).effectiveCaseDepthMm;
}

/** A cycle job: the recorded recipe through the simulator with D × k (k replaces the factor it was planned with). */
function cyclePredictor(job: Job, model: DiffusivityModelId | undefined): Predictor | SkipReason {
  const inputs = job.inputs!;
  if (inputs.kind !== 'cycle') return 'invalidInputs';
  const recipe = readRecipe(model ? { ...inputs.recipe, model } : inputs.recipe);
  if (!recipe.ok) return 'invalidInputs';
  return (factor) => runCycle({ ...recipe.value, diffusivityFactor: factor }).effectiveCaseDepthMm;
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
    const predictor = !job.inputs
      ? 'noInputs'
      : job.inputs.kind === 'cycle'
        ? cyclePredictor(job, options.model)
        : closedFormPredictor(job, options.model);
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
