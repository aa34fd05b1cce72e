/**
 * The predicted carbon and indicative hardness profile of a logged job, as it was predicted (its own
 * model and factor), to draw beneath the lab's traverse. The hardness curve is anchored on the
 * traverse's own case limit and, where the lab read one, the lab's core hardness, so measured and
 * predicted agree where they should: at the core, and at the limit where the prediction is right.
 */
import {
  closedFormProfile,
  hardnessIn,
  runCycle,
  type Hardness,
  type IndicativeHardnessBasis,
  type ProfilePoint,
} from '../physics';
import { jobRun, type SkipReason } from './rerun';
import type { Job } from './schema';

export interface PredictedProfile {
  effectiveCaseDepthMm: number;
  profile: ProfilePoint[];
  hardnessBasis: IndicativeHardnessBasis;
}

/** A core the curve can rise from: one softer than the limit (else the grade's typical core is used). */
const usableCore = (core: Hardness | undefined, limit: Hardness): Hardness | undefined => {
  if (!core) return undefined;
  const coreHrc = hardnessIn(core, 'HRC');
  const limitHrc = hardnessIn(limit, 'HRC');
  // A core below the Rockwell C table is softer than any limit; else compare in HRC.
  return coreHrc === undefined || (limitHrc !== undefined && coreHrc < limitHrc) ? core : undefined;
};

export function predictedProfile(
  job: Job,
  { limit, coreHardness }: { limit: Hardness; coreHardness?: Hardness | undefined },
): PredictedProfile | SkipReason {
  const run = jobRun(job);
  if (typeof run === 'string') return run;
  const core = usableCore(coreHardness, limit);
  if (run.kind === 'cycle') {
    const { recipe } = run;
    const result = runCycle({
      ...recipe,
      steel: { ...recipe.steel, ...(core ? { coreHardness: core } : {}) },
      ecdHardnessLimit: limit,
    });
    return {
      effectiveCaseDepthMm: result.effectiveCaseDepthMm,
      profile: result.profile,
      hardnessBasis: result.hardnessBasis,
    };
  }
  const factor = job.inputs?.kind === 'cycle' ? 1 : (job.inputs?.diffusivityFactor ?? 1);
  const result = closedFormProfile({ ...run.spec, diffusivityFactor: factor }, run.temperatureC, run.timeH, {
    grade: job.steel.gradeId ?? job.steel.gradeName,
    ...(core ? { coreHardness: core } : {}),
    ecdHardnessLimit: limit,
  });
  return {
    effectiveCaseDepthMm: result.effectiveCaseDepthMm,
    profile: result.profile,
    hardnessBasis: result.hardnessBasis,
  };
}
