/**
 * The carbon and indicative hardness profile of a closed-form (constant surface, Crank eq. 3.13)
 * calculation at the temperature and time it ran: what the job's page draws beneath the lab's
 * traverse. Same sampling as a cycle's profile (`PROFILE_POINTS` points to 1.5 × the total case).
 */
import { depthFigures, type CaseSpec } from './caseDepth';
import { diffusionLength } from './closedForm';
import { erf } from './erf';
import type { Hardness } from './hardness';
import { indicativeHardnessBasis, indicativeHardnessHrc, type IndicativeHardnessBasis } from './indicativeHardness';
import type { Warning } from './result';
import { MIN_PROFILE_DEPTH_M, PROFILE_DEPTH_FACTOR, PROFILE_POINTS } from './cycle/profile';
import type { ProfilePoint } from './cycle/recipe';
import { SECONDS_PER_HOUR } from './units';

export interface ClosedFormProfile {
  effectiveCaseDepthMm: number;
  totalCaseDepthMm: number;
  profile: ProfilePoint[];
  hardnessBasis: IndicativeHardnessBasis;
  warnings: Warning[];
}

export function closedFormProfile(
  spec: CaseSpec,
  temperatureC: number,
  timeH: number,
  hardness: { grade?: string; coreHardness?: Hardness; ecdHardnessLimit?: Hardness } = {},
): ClosedFormProfile {
  const figures = depthFigures(spec, temperatureC, timeH);
  const { basis, warnings } = indicativeHardnessBasis({
    steel: {
      coreCarbonPct: spec.coreCarbonPct,
      ...(hardness.grade === undefined ? {} : { grade: hardness.grade }),
      ...(hardness.coreHardness ? { coreHardness: hardness.coreHardness } : {}),
    },
    thresholdCarbonPct: spec.thresholdCarbonPct,
    ...(hardness.ecdHardnessLimit ? { ecdHardnessLimit: hardness.ecdHardnessLimit } : {}),
  });
  const timeS = timeH * SECONDS_PER_HOUR;
  // Crank eq. 3.13, C = Cs − (Cs − C0)·erf(x / 2√(Dt)), with erf: closedForm's erfc form would put
  // erfc's code on the first screen, which loads closedForm but not this module.
  const length = 2 * diffusionLength(figures.diffusivityM2PerS, timeS);
  const carbonAt = (depthM: number) =>
    spec.surfaceCarbonPct - (spec.surfaceCarbonPct - spec.coreCarbonPct) * erf(depthM / length);
  const maxDepthMm = Math.max(PROFILE_DEPTH_FACTOR * figures.totalCaseDepthMm, MIN_PROFILE_DEPTH_M * 1e3);
  const profile: ProfilePoint[] = [];
  for (let k = 0; k < PROFILE_POINTS; k++) {
    const depthMm = (maxDepthMm * k) / (PROFILE_POINTS - 1);
    const carbonPct = figures.diffusivityM2PerS > 0 ? carbonAt(depthMm / 1e3) : spec.coreCarbonPct;
    profile.push({ depthMm, carbonPct, hardnessHrc: indicativeHardnessHrc(carbonPct, basis) });
  }
  return {
    effectiveCaseDepthMm: figures.effectiveCaseDepthMm,
    totalCaseDepthMm: figures.totalCaseDepthMm,
    profile,
    hardnessBasis: basis,
    warnings,
  };
}
