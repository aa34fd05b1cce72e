/**
 * Reads an untrusted cycle request (CLI JSON, form state) into a typed Recipe with every
 * default filled in, or a typed error naming the field (`steps.2.durationH`). The fields are
 * those of `RECIPE_REQUEST` (requestTables.ts); here are the checks between fields.
 * Nothing here throws.
 */
import { checkCoreBelowLimit } from '../indicativeHardness';
import { checkLimit, LIMITS } from '../limits';
import { readRequest, type ReadOf, type RequestOf } from '../requestSpec';
import { RECIPE_REQUEST } from '../requestTables';
import { fail, ok, type Result } from '../result';
import type { Recipe } from './recipe';

export { under } from '../requestSpec';
export { MAX_STEPS } from '../limits';

/** A recipe step's temperature: anything a load can be at, from cold to the hottest accepted; no austenite is a caution here, not an error. */
export const checkStepTemperatureC = (value: number, field: string) => checkLimit(LIMITS.stepTemperature, value, field);

/** What the fields of a cycle and a plan share, as read (requestTables.ts `CYCLE_BASE`). */
export type CycleBase = Omit<ReadOf<typeof RECIPE_REQUEST>, 'steps'>;

/** The cross-checks of a cycle's base: an ECD threshold above core carbon, a core softer than the case limit. */
export function checkCycleBase<B extends CycleBase>(base: B): Result<B> {
  const { thresholdCarbonPct } = base;
  const core = base.steel.coreCarbonPct;
  if (!(thresholdCarbonPct > core)) {
    return fail('threshold.notAboveCore', 'thresholdCarbonPct', { thresholdPct: thresholdCarbonPct, corePct: core });
  }
  const hardness = checkCoreBelowLimit(base);
  return hardness.ok ? ok(base) : hardness;
}

/**
 * `simulate` request → Recipe, defaults filled in: model (Ågren), ECD threshold (0.40 %C),
 * shape (semi-infinite), total-case margin, furnace factor 1, β of each step
 * (DEFAULT_BETA_M_PER_S), a soak's end temperature.
 */
export function readRecipe(request: unknown): Result<Recipe> {
  const read = readRequest(RECIPE_REQUEST, request);
  if (!read.ok) return read;
  const recipe = checkCycleBase(read.value);
  if (!recipe.ok) return recipe;
  const totalH = recipe.value.steps.reduce((sum, s) => sum + s.durationH, 0);
  return totalH <= LIMITS.time.max
    ? recipe
    : fail('time.tooLong', 'steps', { value: totalH, min: LIMITS.time.min, max: LIMITS.time.max });
}

// Compile-time: what the reader returns is a Recipe, and every Recipe is a request it reads (so a
// solved recipe can be stored and read again). A type error here means the table and the contract differ.
type Holds<T extends true> = T;
type _ReadIsRecipe = Holds<ReadOf<typeof RECIPE_REQUEST> extends Recipe ? true : false>;
type _RecipeIsRequest = Holds<Recipe extends RequestOf<typeof RECIPE_REQUEST> ? true : false>;
