/**
 * What a job was planned with: a closed-form calculator request (depth, time or temperature)
 * or a multi-step cycle recipe, each exactly the request physics reads. The schemas are built
 * from physics' request descriptions (requestSchema.ts), so the log accepts what physics accepts.
 */
import * as v from 'valibot';
import {
  DEPTH_REQUEST,
  LIMITS,
  MODEL_IDS,
  RECIPE_REQUEST,
  TEMPERATURE_REQUEST,
  TIME_REQUEST,
  type Recipe,
  type RequestOf,
} from '../physics';
import { CompositionSchema, limitSchema, requestEntries, requestSchema } from './requestSchema';

export { CompositionSchema };

export const ModelIdSchema = v.picklist(MODEL_IDS);

export const numberBetween = (min: number, max: number) =>
  v.pipe(v.number(), v.finite(), v.minValue(min), v.maxValue(max));
export const positiveNumber = () => v.pipe(v.number(), v.finite(), v.gtValue(0));
export const textUpTo = (max: number) => v.pipe(v.string(), v.maxLength(max));

export const CarbonPctSchema = limitSchema(LIMITS.carbon);

/** The stored closed-form inputs: the request and which calculator it went to. */
export type DepthInputs = { kind: 'depth' } & RequestOf<typeof DEPTH_REQUEST>;
export type TimeInputs = { kind: 'time' } & RequestOf<typeof TIME_REQUEST>;
export type TemperatureInputs = { kind: 'temperature' } & RequestOf<typeof TEMPERATURE_REQUEST>;
/** A stored recipe: what `simulate` reads (a soak may leave out its end temperature, a step its β). */
export type StoredRecipe = RequestOf<typeof RECIPE_REQUEST>;
export interface CycleInputs {
  kind: 'cycle';
  recipe: StoredRecipe;
}
export type JobInputs = DepthInputs | TimeInputs | TemperatureInputs | CycleInputs;

export const RecipeSchema = requestSchema(RECIPE_REQUEST);

/** Every kind of inputs, told apart by `kind`; unknown fields refused. */
export const JobInputsSchema = v.variant('kind', [
  v.strictObject({ kind: v.literal('depth'), ...requestEntries(DEPTH_REQUEST) }),
  v.strictObject({ kind: v.literal('time'), ...requestEntries(TIME_REQUEST) }),
  v.strictObject({ kind: v.literal('temperature'), ...requestEntries(TEMPERATURE_REQUEST) }),
  v.strictObject({ kind: v.literal('cycle'), recipe: RecipeSchema }),
]) as unknown as v.GenericSchema<JobInputs>;

export type JobInputKind = JobInputs['kind'];
export const JOB_INPUT_KINDS = ['depth', 'time', 'temperature', 'cycle'] as const satisfies readonly JobInputKind[];
// Compile-time: the list names every kind of the union (a type error here otherwise).
type Holds<T extends true> = T;
type _EveryKindListed = Holds<Exclude<JobInputKind, (typeof JOB_INPUT_KINDS)[number]> extends never ? true : false>;
// Compile-time: every recipe the simulator ran can be stored as it is.
type _RecipeStores = Holds<Recipe extends StoredRecipe ? true : false>;

/** A closed-form input without its `kind`: exactly the request the physics function takes. */
export function physicsRequestOf(inputs: Exclude<JobInputs, { kind: 'cycle' }>): Record<string, unknown> {
  const { kind: _kind, ...request } = inputs;
  return request;
}
