/**
 * A cycle worked out on a calibrated furnace and saved to the log records the factor in its
 * recipe, so what the log holds reproduces what it predicted: the inputs, read back from the store
 * and simulated again, give the logged prediction. The same for a plan saved from the planner.
 */
import { describe, expect, it } from 'vitest';
import { cycleLogEntry } from '../../src/app/cycle/logEntry';
import { computeCycle } from '../../src/app/cycle/results';
import { DEFAULT_CYCLE_FORM } from '../../src/app/cycle/state';
import { draftOf, EMPTY_JOB_FORM } from '../../src/app/log/jobForm';
import { computePlan } from '../../src/app/plan/results';
import { DEFAULT_PLAN_FORM } from '../../src/app/plan/state';
import { calibrationState, type StoredCalibration } from '../../src/app/settings/calibration';
import type { LogEntry } from '../../src/app/log/entry';
import { readRecipe, runCycle } from '../../src/physics';
import { freshStore, unwrap } from '../jobs/helpers';

const f1: StoredCalibration = {
  furnace: 'F1',
  factor: 1.21,
  low: 1.1,
  high: 1.33,
  jobCount: 5,
  rmsMm: 0.02,
  fittedAt: '2025-03-05T10:00:00.000Z',
  model: 'agren',
  apply: true,
};
const settings = {
  model: 'agren' as const,
  ecdThresholdPct: 0.4,
  totalCaseMarginPct: 0.05,
  betaMPerS: 1.5e-7,
  calibrationFor: (m: 'agren' | 'tibbetts' | 'wells-batz-mehl') => calibrationState([f1], 'F1', m),
};

/** Saves the entry as a job, reads it back from the store and simulates its recorded recipe again. */
async function savedAndRerun(entry: LogEntry) {
  const store = await freshStore();
  const form = { ...EMPTY_JOB_FORM, operator: 'MK', furnace: 'F1', partNumber: 'KR-2231', gradeName: 'SAE 8620' };
  const added = unwrap(await store.add(draftOf(form, entry)));
  const job = unwrap(await store.get(added.id));
  store.close();
  if (job.inputs?.kind !== 'cycle') throw new Error('expected a cycle job');
  const recipe = readRecipe(job.inputs.recipe);
  if (!recipe.ok) throw new Error(recipe.error.code);
  return { job, rerun: runCycle(recipe.value) };
}

describe('a calibrated cycle job reproduces its logged prediction', () => {
  it('cycle editor: the recipe carries k = 1.21, and its re-run gives the logged ECD, total case and surface carbon', async () => {
    const result = computeCycle(DEFAULT_CYCLE_FORM, settings).result!;
    expect(result.calibration.kind).toBe('applied');
    const { job, rerun } = await savedAndRerun(cycleLogEntry(result));
    expect(job.inputs?.kind === 'cycle' && job.inputs.recipe.diffusivityFactor).toBe(1.21);
    expect(rerun.effectiveCaseDepthMm).toBe(job.prediction!.effectiveCaseDepthMm);
    expect(rerun.totalCaseDepthMm).toBe(job.prediction!.totalCaseDepthMm);
    expect(rerun.surfaceCarbonPct).toBe(job.prediction!.surfaceCarbonPct);
    // And the factor matters: without it the same recipe predicts a shallower case.
    const uncalibrated = computeCycle(DEFAULT_CYCLE_FORM, { ...settings, calibrationFor: undefined }).result!;
    expect(uncalibrated.simulation.effectiveCaseDepthMm).toBeLessThan(job.prediction!.effectiveCaseDepthMm * 0.95);
  });

  it('planner: a plan made with k = 1.21 and saved reproduces its prediction the same way', async () => {
    const planned = computePlan(DEFAULT_PLAN_FORM, settings).result!;
    expect(planned.plan.reachable).toBe(true);
    const entry = cycleLogEntry({
      recipe: planned.plan.recipe,
      simulation: planned.plan.predicted,
      calibration: planned.calibration,
    });
    const { job, rerun } = await savedAndRerun(entry);
    expect(job.inputs?.kind === 'cycle' && job.inputs.recipe.diffusivityFactor).toBe(1.21);
    expect(rerun.effectiveCaseDepthMm).toBe(job.prediction!.effectiveCaseDepthMm);
    expect(rerun.surfaceCarbonPct).toBe(job.prediction!.surfaceCarbonPct);
  });
});
