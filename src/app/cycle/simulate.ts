/**
 * The cycle screen's only link to the cycle solver. Until src/physics/cycle exports
 * `simulateCycle`, this points at the closed-form PREVIEW (see preview.ts), and the
 * screen says so. To wire the solver, change the marked line to:
 *   export const simulate: Simulate = simulateCycle;   (import { simulateCycle } from '../../physics/cycle/…')
 */
import type { Result } from '../../physics';
import type { SimulationResult } from '../../physics/cycle/recipe';
import { previewCycle } from './preview';

type Simulate = (request: unknown) => Result<SimulationResult>;

export const simulate: Simulate = previewCycle; // ← wire simulateCycle here

/** True while the screen shows the preview rather than the solver. */
export const isPreview: boolean = (simulate as unknown) === previewCycle;
