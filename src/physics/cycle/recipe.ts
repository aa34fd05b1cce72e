/**
 * The cycle recipe and the simulation result: the contract shared by the solver,
 * the CLI's `simulate` and `plan`, the cycle screen and the job log.
 * Units in names; carbon in wt%, β in m/s.
 */
import type { DiffusivityModelId } from '../diffusivity';
import type { Warning } from '../result';
import type { Composition } from '../steel';

/** Typical carbon transfer coefficient β of endothermic gas at 900–950 °C, m/s (from memory; literature scatters 1–3e-7). */
export const DEFAULT_BETA_M_PER_S = 1.5e-7;

export interface RecipeStep {
  /** Optional plain label, e.g. "boost". */
  label?: string;
  durationH: number;
  startTempC: number;
  /** Equal to startTempC for a soak; different for a linear ramp. */
  endTempC: number;
  /** Atmosphere carbon potential, wt%; null for no transfer (neutral gas). */
  carbonPotentialPct: number | null;
  /** Carbon transfer coefficient, m/s; DEFAULT_BETA_M_PER_S when absent. */
  betaMPerS?: number;
}

export type PartShape =
  | { kind: 'semi-infinite' }
  /** Carburized on both faces. */
  | { kind: 'plate'; thicknessMm: number }
  /** Round bar carburized radially. */
  | { kind: 'bar'; diameterMm: number };

export interface SteelSpec {
  /** Optional grade id or name for the record (see grades.ts). */
  grade?: string;
  coreCarbonPct: number;
  composition?: Composition;
}

export interface Recipe {
  name?: string;
  steel: SteelSpec;
  model?: DiffusivityModelId;
  thresholdCarbonPct?: number;
  /** Total case ends this far above core carbon, %C (default TOTAL_CASE_MARGIN_PCT). */
  totalCaseMarginPct?: number;
  shape?: PartShape;
  steps: RecipeStep[];
}

export interface ProfilePoint {
  depthMm: number;
  carbonPct: number;
  /** Indicative maximum as-quenched hardness. */
  hardnessHrc: number;
}

export interface SurfaceHistoryPoint {
  timeH: number;
  carbonPct: number;
}

export interface SimulationResult {
  effectiveCaseDepthMm: number;
  totalCaseDepthMm: number;
  surfaceCarbonPct: number;
  profile: ProfilePoint[];
  surfaceHistory: SurfaceHistoryPoint[];
  warnings: Warning[];
}
