/** The simulated cycle as a job-log entry: the whole recipe and what it predicted (no band: the solver gives none). */
import { DEFAULT_MODEL, findGrade } from '../../physics';
import type { LogEntry } from '../log/entry';
import { APP_VERSION } from '../version';
import type { CycleResult } from './results';

export function cycleLogEntry({ recipe, simulation }: CycleResult): LogEntry {
  const grade = findGrade(recipe.steel.grade ?? '');
  return {
    steel: {
      ...(grade ? { gradeId: grade.id, gradeName: grade.name } : {}),
      coreCarbonPct: recipe.steel.coreCarbonPct,
      ...(recipe.steel.composition ? { composition: recipe.steel.composition } : {}),
    },
    inputs: { kind: 'cycle', recipe },
    prediction: {
      effectiveCaseDepthMm: simulation.effectiveCaseDepthMm,
      totalCaseDepthMm: simulation.totalCaseDepthMm,
      surfaceCarbonPct: simulation.surfaceCarbonPct,
      model: recipe.model ?? DEFAULT_MODEL,
      timeH: recipe.steps.reduce((sum, step) => sum + step.durationH, 0),
      appVersion: APP_VERSION,
    },
  };
}
