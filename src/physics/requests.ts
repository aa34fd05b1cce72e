/** Every request physics reads, by the CLI command that reads it (requestTables.ts, cycle/requestTables.ts). */
import { PLAN_REQUEST, RECIPE_REQUEST } from './cycle/requestTables';
import type { FieldSpec } from './requestSpec';
import {
  CONVERT_REQUEST,
  DEPTH_REQUEST,
  EQUIVALENT_TIME_REQUEST,
  TEMPERATURE_REQUEST,
  TIME_REQUEST,
} from './requestTables';

/** Each request by the CLI command that reads it. */
export const REQUESTS = {
  depth: DEPTH_REQUEST,
  time: TIME_REQUEST,
  temperature: TEMPERATURE_REQUEST,
  simulate: RECIPE_REQUEST,
  plan: PLAN_REQUEST,
  'equivalent-time': EQUIVALENT_TIME_REQUEST,
  convert: CONVERT_REQUEST,
} as const satisfies Record<string, Readonly<Record<string, FieldSpec>>>;
