/**
 * A simulated or planned cycle as a job-log entry: the whole recipe and what it predicted (no band:
 * the likely range of a cycle is worked out on demand only), and the furnace chosen for it.
 */
import { DEFAULT_MODEL, findGrade, type Recipe, type SimulationResult } from '../../physics';
import type { LogEntry } from '../log/entry';
import type { CalibrationState } from '../settings/calibration';
import { APP_VERSION } from '../version';

export interface CycleOutcomeForLog {
  recipe: Recipe;
  simulation: Pick<SimulationResult, 'effectiveCaseDepthMm' | 'totalCaseDepthMm' | 'surfaceCarbonPct'>;
  calibration: CalibrationState;
}

export function cycleLogEntry({ recipe, simulation, calibration }: CycleOutcomeForLog): LogEntry {
  const grade = findGrade(recipe.steel.grade ?? '');
  return {
    ...(calibration.kind === 'none' ? {} : { furnace: calibration.furnace }),
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
