/**
 * What a calculator hands to the log: the steel, the request it ran and its prediction.
 * Built by each calculator from its own results (depth/logEntry.ts, cycle/logEntry.ts);
 * the person adds only what the calculator cannot know (work order, part, furnace, ...).
 */
import type { JobInputs, Prediction, Steel } from '../../jobs';

export interface LogEntry {
  /** The grade name is absent for a custom composition: the person names it. */
  steel: Omit<Steel, 'gradeName'> & { gradeName?: string };
  inputs: JobInputs;
  prediction: Prediction;
  /** The furnace chosen in the calculator: the save form starts with it. */
  furnace?: string;
}
