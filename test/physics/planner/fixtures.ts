/** Requests and helpers shared by the planner tests. */
import { readFileSync } from 'node:fs';
import { runCycle } from '../../../src/physics/cycle/simulate';
import type { Recipe, SimulationResult } from '../../../src/physics/cycle/recipe';
import { DIFFUSIVITY_MODELS } from '../../../src/physics/diffusivity';

export const readExample = (file: string): string =>
  readFileSync(new URL(`../../../public/examples/${file}`, import.meta.url), 'utf8');

/** The demo pinion plan request (KR-2231, SAE 8620; invented scenario). */
export const pinionRequest = (): Record<string, unknown> => JSON.parse(readExample('pinion-kr2231-plan.json'));

/** The pinion request with some fields replaced. */
export const pinionWith = (patch: Record<string, unknown>): Record<string, unknown> => ({
  ...pinionRequest(),
  ...patch,
});

/** The recipe simulated forward at the simulator's default resolution, D scaled by the furnace factor. */
export function forward(recipe: Recipe, factor = 1, resolution = 1): SimulationResult {
  const model = DIFFUSIVITY_MODELS[recipe.model ?? 'agren'].diffusivity;
  return runCycle(recipe, resolution, { diffusivity: (tempK, carbonPct) => factor * model(tempK, carbonPct) });
}

export const within = (value: number, range: { min: number; max: number }) => value >= range.min && value <= range.max;
