/**
 * The cycle recipe and the simulation result: the contract shared by the solver,
 * the CLI's `simulate` and `plan`, the cycle screen and the job log.
 * Units in names; carbon in wt%, β in m/s.
 */
import type { DiffusivityModelId } from '../diffusivity';
import type { Hardness } from '../hardness';
import type { IndicativeHardnessBasis } from '../indicativeHardness';
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
  /** Core hardness after quench (the part master's or the lab's); the grade's typical value when absent. */
  coreHardness?: Hardness;
}

export interface Recipe {
  name?: string;
  steel: SteelSpec;
  model?: DiffusivityModelId;
  thresholdCarbonPct?: number;
  /** The hardness the effective case depth stands for: 550 HV (ISO 18203) when absent, or 50 HRC (SAE J423). */
  ecdHardnessLimit?: Hardness;
  /** Total case ends this far above core carbon, %C (default TOTAL_CASE_MARGIN_PCT). */
  totalCaseMarginPct?: number;
  /** The furnace's calibration factor on D (1 when absent: uncalibrated). */
  diffusivityFactor?: number;
  shape?: PartShape;
  steps: RecipeStep[];
}

export interface ProfilePoint {
  depthMm: number;
  carbonPct: number;
  /** Indicative hardness (indicativeHardness.ts): the criterion's hardness at the threshold carbon, the core's in the core. */
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
  /** The anchors of the profile's indicative hardness. */
  hardnessBasis: IndicativeHardnessBasis;
  warnings: Warning[];
}
