/** The case-depth result as a job-log entry: the request it ran and what it predicted (with the ECD band). */
import type { JobInputs } from '../../jobs';
import { findGrade } from '../../physics';
import type { LogEntry } from '../log/entry';
import { APP_VERSION } from '../version';
import type { DepthResult } from './results';

export function depthLogEntry(result: DepthResult, gradeId: string): LogEntry {
  const { figures: f, request } = result;
  const common = {
    ...(request.carbonPotentialPct === undefined ? {} : { carbonPotentialPct: request.carbonPotentialPct }),
    ...(request.surfaceCarbonPct === undefined ? {} : { surfaceCarbonPct: request.surfaceCarbonPct }),
    coreCarbonPct: request.coreCarbonPct,
    thresholdCarbonPct: request.thresholdCarbonPct,
    model: request.model,
    composition: request.composition,
    ...(request.diffusivityFactor === undefined ? {} : { diffusivityFactor: request.diffusivityFactor }),
    temperatureToleranceC: request.temperatureToleranceC,
  };
  const inputs: JobInputs =
    result.solveFor === 'time'
      ? { kind: 'time', temperatureC: f.temperatureC, targetDepthMm: result.figures.targetDepthMm, ...common }
      : result.solveFor === 'temperature'
        ? { kind: 'temperature', timeH: f.timeH, targetDepthMm: result.figures.targetDepthMm, ...common }
        : { kind: 'depth', temperatureC: f.temperatureC, timeH: f.timeH, ...common };
  const grade = findGrade(gradeId);
  return {
    ...(result.calibration.kind === 'none' ? {} : { furnace: result.calibration.furnace }),
    steel: {
      ...(grade ? { gradeId: grade.id, gradeName: grade.name } : {}),
      coreCarbonPct: request.coreCarbonPct,
      composition: request.composition,
    },
    inputs,
    prediction: {
      effectiveCaseDepthMm: f.effectiveCaseDepthMm,
      totalCaseDepthMm: f.totalCaseDepthMm,
      surfaceCarbonPct: f.surfaceCarbonPct,
      model: f.model,
      timeH: f.timeH,
      temperatureC: f.temperatureC,
      ecdBandMm: { minMm: f.uncertaintyMm.minMm, maxMm: f.uncertaintyMm.maxMm },
      appVersion: APP_VERSION,
    },
  };
}
