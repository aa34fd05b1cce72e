/**
 * Total case depth for a chosen margin above core carbon (the default margin is
 * TOTAL_CASE_MARGIN_PCT, common practice). Same closed form and D as caseDepth.ts.
 */
import { constantSurfaceDepth } from './closedForm';
import { fail, ok, type Result } from './result';
import { SECONDS_PER_HOUR } from './units';

export interface TotalCaseInputs {
  diffusivityM2PerS: number;
  timeH: number;
  surfaceCarbonPct: number;
  coreCarbonPct: number;
}

/** Depth where carbon is `marginPct` above core, mm; the margin must leave the threshold inside the profile. */
export function totalCaseDepthForMarginMm(figures: TotalCaseInputs, marginPct: number): Result<number> {
  const thresholdPct = figures.coreCarbonPct + marginPct;
  if (!(marginPct > 0 && thresholdPct < figures.surfaceCarbonPct)) {
    return fail('threshold.outsideProfile', 'totalCaseMarginPct', {
      thresholdPct,
      corePct: figures.coreCarbonPct,
      surfacePct: figures.surfaceCarbonPct,
    });
  }
  const depthM = constantSurfaceDepth(
    figures.timeH * SECONDS_PER_HOUR,
    figures.diffusivityM2PerS,
    figures.surfaceCarbonPct,
    figures.coreCarbonPct,
    thresholdPct,
  );
  return ok(depthM * 1e3);
}
