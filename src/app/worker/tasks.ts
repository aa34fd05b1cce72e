/**
 * The heavy computations the screens hand to the worker: each a pure function from plain data
 * to plain data (both cross the thread boundary by structured clone). The same table runs inline
 * where there is no worker (unit tests in Node).
 */
import type { Job } from '../../jobs';
// Straight from the module, so the worker does not carry the log's store along.
import { calibrateFurnace, type FurnaceCalibration } from '../../jobs/calibration';
import { plantThresholds, type PlantThreshold } from '../../jobs/plantThreshold';
import {
  cycleDepthBand,
  planTwoStepCycle,
  type CycleBand,
  type CycleBandOptions,
  type DiffusivityModelId,
  type PlanResult,
  type Recipe,
  type Result,
} from '../../physics';

export interface BandInput {
  recipe: Recipe;
  options: CycleBandOptions;
}

export interface CalibrationInput {
  /** The measured jobs of the furnaces (the others are not sent). */
  jobs: readonly Job[];
  furnaces: readonly string[];
  model: DiffusivityModelId;
}

export interface ThresholdInput {
  /** The jobs with a traverse (the others are not sent). */
  jobs: readonly Job[];
  model: DiffusivityModelId;
}

export const TASKS = {
  /** The two-step planner's search (about 20 simulator runs). */
  plan: (request: Record<string, unknown>): Result<PlanResult> => planTwoStepCycle(request),
  /** The likely range of a cycle (23 simulator runs). */
  band: ({ recipe, options }: BandInput): CycleBand => cycleDepthBand(recipe, options),
  /** A furnace calibration per furnace (up to 30 lab results each, every one re-run while fitting). */
  calibrate: ({ jobs, furnaces, model }: CalibrationInput): FurnaceCalibration[] =>
    furnaces.map((furnace) => calibrateFurnace(jobs, furnace, { model })),
  /** The plant's threshold per furnace and grade (each traverse's load re-run at every trial factor). */
  plantThresholds: ({ jobs, model }: ThresholdInput): PlantThreshold[] => plantThresholds(jobs, model),
};

export type TaskName = keyof typeof TASKS;
export type TaskInput<K extends TaskName> = Parameters<(typeof TASKS)[K]>[0];
export type TaskOutput<K extends TaskName> = ReturnType<(typeof TASKS)[K]>;

/** A request to the worker and its answer, with the time the computation took there. */
export interface TaskRequest {
  id: number;
  task: TaskName;
  input: unknown;
}
export type TaskReply = { id: number; ms: number; output: unknown } | { id: number; ms: number; error: string };

/** Runs one request (in the worker, or inline). Never throws: a failure comes back as `error`. */
export function runRequest({ id, task, input }: TaskRequest): TaskReply {
  const start = performance.now();
  try {
    const run = TASKS[task] as (input: unknown) => unknown;
    const output = run(input);
    return { id, ms: performance.now() - start, output };
  } catch (error) {
    return { id, ms: performance.now() - start, error: String(error) };
  }
}
