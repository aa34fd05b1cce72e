/** The cycle screen's one link to the cycle solver (kept apart so tests and screens share it), with a furnace's factor on D. */
import {
  DEFAULT_MODEL,
  DIFFUSIVITY_MODELS,
  isModelId,
  type Result,
  scaledDiffusivity,
  simulateCycle,
  type SimulationResult,
} from '../../physics';

/** Simulates a cycle request (validated by the solver's reader) with its model's D × `diffusivityFactor`. */
export function simulate(request: unknown, diffusivityFactor = 1): Result<SimulationResult> {
  if (diffusivityFactor === 1) return simulateCycle(request);
  const id = typeof request === 'object' && request !== null ? (request as { model?: unknown }).model : undefined;
  const model = DIFFUSIVITY_MODELS[isModelId(id) ? id : DEFAULT_MODEL].diffusivity;
  return simulateCycle(request, { diffusivity: scaledDiffusivity(model, diffusivityFactor) });
}
