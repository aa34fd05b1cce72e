/**
 * How a logged job ran, ready to be calculated again: a closed-form request at the temperature and
 * time it ran (for a time or temperature request: the answer stored in its prediction), or its cycle
 * recipe. The depth correction, the plant's threshold and the job page's predicted profile all re-run
 * jobs through here, each with its own change (a factor on D, another threshold, the lab's core).
 */
import {
  checkTemperatureC,
  checkTimeH,
  readCaseSpec,
  readRecipe,
  type CaseSpec,
  type DiffusivityModelId,
  type Recipe,
} from '../physics';
import { physicsRequestOf } from './inputs';
import type { Job } from './schema';

/**
 * Why a job cannot be re-run: no recorded calculation, no time or temperature it ran at, or inputs
 * today's checks refuse (2000 °C, 5000 h). (`noCase`: a re-run that gives no case to compare.)
 */
export type SkipReason = 'noInputs' | 'noRunConditions' | 'invalidInputs' | 'noCase';

export type JobRun =
  { kind: 'closedForm'; spec: CaseSpec; temperatureC: number; timeH: number } | { kind: 'cycle'; recipe: Recipe };

export interface RerunOptions {
  /** Re-run with this model instead of the job's own. */
  model?: DiffusivityModelId;
  /** Re-run with this ECD threshold carbon instead of the job's own. */
  thresholdCarbonPct?: number;
}

/** The job as it ran, with the options' changes, or why it cannot be re-run. */
export function jobRun(job: Job, options: RerunOptions = {}): JobRun | SkipReason {
  const inputs = job.inputs;
  if (!inputs) return 'noInputs';
  const changes = {
    ...(options.model ? { model: options.model } : {}),
    ...(options.thresholdCarbonPct === undefined ? {} : { thresholdCarbonPct: options.thresholdCarbonPct }),
  };
  if (inputs.kind === 'cycle') {
    const recipe = readRecipe({ ...inputs.recipe, ...changes });
    return recipe.ok ? { kind: 'cycle', recipe: recipe.value } : 'invalidInputs';
  }
  const temperatureC = inputs.kind === 'temperature' ? job.prediction?.temperatureC : inputs.temperatureC;
  const timeH = inputs.kind === 'time' ? job.prediction?.timeH : inputs.timeH;
  if (temperatureC === undefined || timeH === undefined) return 'noRunConditions';
  if (!checkTemperatureC(temperatureC, 'temperatureC').ok || !checkTimeH(timeH, 'timeH').ok) return 'invalidInputs';
  const spec = readCaseSpec({ ...physicsRequestOf(inputs), ...changes, diffusivityFactor: 1 });
  return spec.ok ? { kind: 'closedForm', spec: spec.value, temperatureC, timeH } : 'invalidInputs';
}
