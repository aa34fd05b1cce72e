/** The case-depth result as a job-log entry: the request it ran and what it predicted (with the ECD band). */
import type { JobInputs } from '../../jobs';
import { findGrade } from '../../physics';
import type { LogEntry } from '../log/entry';
import { APP_VERSION } from '../version';
import type { DepthResult } from './results';

export function depthLogEntry(result: DepthResult, gradeId: string): LogEntry {
  const { figures: f, request } = result;
  // The request exactly as physics ran it, under the calculator it went to.
  const inputs = { kind: result.solveFor, ...request } as JobInputs;
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
