/**
 * The plant's own hardness limit from the job log: for one steel grade in one furnace, each job
 * whose lab result has a traverse with an ECD and a case end (`caseEndDepthMm`) and whose
 * calculation can be re-run becomes a sample: the traverse's two depths beside the job's predicted
 * carbon profile with D × k. Physics fits the threshold carbon and k together (`fitPlantThreshold`).
 * Like the depth correction, every job is re-run with one model (the app's) and k replaces any
 * factor it was planned with.
 */
import {
  caseEndDepthMm,
  carbonDepthsOfCycle,
  depthFigures,
  fitPlantThreshold,
  type DiffusivityModelId,
  type PlantThresholdFit,
  type Result,
  type ThresholdSample,
} from '../physics';
import { DEFAULT_CALIBRATION_JOBS } from './calibration';
import { analyseStoredTraverse } from './labFigures';
import { compareNewestFirst } from './query';
import { jobRun, type SkipReason } from './rerun';
import type { Job } from './schema';

/** Why a job with a traverse is left out: as for the depth correction, or a traverse without both depths. */
export type ThresholdSkipReason = SkipReason | 'noCaseEnd';

export interface ThresholdSkip {
  id: string;
  reason: ThresholdSkipReason;
}

export interface PlantThreshold {
  furnace: string;
  /** The grade id (or name when not from the list) the loads were of. */
  grade: string;
  fit: Result<PlantThresholdFit>;
  skipped: ThresholdSkip[];
}

/** The grade a job is of, as the threshold is kept: the list's id, else the name as written. */
export const gradeOf = (job: Pick<Job, 'steel'>): string => job.steel.gradeId ?? job.steel.gradeName;

type Profile = ThresholdSample['profile'];

/** The job's predicted profile with D × k: the depth where carbon falls to a level, mm. */
function profileOf(job: Job, model: DiffusivityModelId | undefined): Profile | SkipReason {
  const run = jobRun(job, model ? { model } : {});
  if (typeof run === 'string') return run;
  if (run.kind === 'closedForm') {
    const { spec, temperatureC, timeH } = run;
    return (factor) => (carbonPct) =>
      carbonPct >= spec.surfaceCarbonPct
        ? 0
        : depthFigures({ ...spec, diffusivityFactor: factor, thresholdCarbonPct: carbonPct }, temperatureC, timeH)
            .effectiveCaseDepthMm;
  }
  return (factor) => carbonDepthsOfCycle({ ...run.recipe, diffusivityFactor: factor });
}

/** The samples of one grade in one furnace (newest first, at most `maxJobs`) and the traverses left out. */
export function thresholdSamples(
  jobs: readonly Job[],
  furnace: string,
  grade: string,
  options: { model?: DiffusivityModelId; maxJobs?: number } = {},
): { samples: ThresholdSample[]; skipped: ThresholdSkip[] } {
  const maxJobs = options.maxJobs ?? DEFAULT_CALIBRATION_JOBS;
  const measured = jobs
    .filter((job) => job.furnace === furnace && gradeOf(job) === grade && job.lab?.traverse)
    .sort(compareNewestFirst);
  const samples: ThresholdSample[] = [];
  const skipped: ThresholdSkip[] = [];
  for (const job of measured) {
    if (samples.length >= maxJobs) break;
    const traverse = job.lab!.traverse!;
    const analysis = analyseStoredTraverse(traverse);
    const caseEnd = analysis ? caseEndDepthMm(traverse.points, analysis) : undefined;
    if (analysis?.effectiveCaseDepthMm == null || caseEnd === undefined) {
      skipped.push({ id: job.id, reason: 'noCaseEnd' });
      continue;
    }
    const profile = profileOf(job, options.model);
    if (typeof profile === 'string') {
      skipped.push({ id: job.id, reason: profile });
      continue;
    }
    samples.push({
      id: job.id,
      measuredEcdMm: analysis.effectiveCaseDepthMm,
      measuredCaseEndMm: caseEnd,
      coreCarbonPct: job.steel.coreCarbonPct,
      profile,
    });
  }
  return { samples, skipped };
}

/** Furnace and grade pairs with at least one traverse, sorted. */
export function thresholdGroups(jobs: readonly Job[]): { furnace: string; grade: string }[] {
  const keys = new Map<string, { furnace: string; grade: string }>();
  for (const job of jobs) {
    if (!job.lab?.traverse) continue;
    const grade = gradeOf(job);
    keys.set(`${job.furnace}\u0000${grade}`, { furnace: job.furnace, grade });
  }
  return [...keys.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([, v]) => v);
}

/** The plant threshold of each furnace and grade with traverses. */
export function plantThresholds(jobs: readonly Job[], model?: DiffusivityModelId): PlantThreshold[] {
  return thresholdGroups(jobs).map(({ furnace, grade }) => {
    const { samples, skipped } = thresholdSamples(jobs, furnace, grade, model ? { model } : {});
    return { furnace, grade, fit: fitPlantThreshold(samples), skipped };
  });
}
