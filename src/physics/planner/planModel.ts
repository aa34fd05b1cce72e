/**
 * The forward model the planner searches: a boost/diffuse/hardening recipe from two times,
 * simulated by the cycle solver (the recipe carries the furnace's calibration factor on D). Counts every
 * simulation so the benchmark can report what a plan costs.
 */
import { depthToCarbonM } from '../cycle/profile';
import type { Recipe, RecipeStep, SimulationResult } from '../cycle/recipe';
import { runCycle, solveRecipe } from '../cycle/simulate';
import type { PlanRequest, PotentialStep } from './readPlanRequest';

/** Effective case depth and final surface carbon of one simulated plan. */
export interface Probe {
  ecdMm: number;
  surfacePct: number;
}

/** Step labels of a planned recipe: stable words the cycle screen may translate. */
export const PLAN_STEP_LABELS = { boost: 'boost', diffuse: 'diffuse', hardening: 'hardening' } as const;

function soak(label: string, durationH: number, step: PotentialStep): RecipeStep {
  const { temperatureC, carbonPotentialPct, betaMPerS } = step;
  return { label, durationH, startTempC: temperatureC, endTempC: temperatureC, carbonPotentialPct, betaMPerS };
}

export class PlanModel {
  /** Simulator runs so far. */
  simulations = 0;

  constructor(readonly request: PlanRequest) {}

  /** Hours at hardening temperature (0 without a hardening step). */
  get hardeningH(): number {
    return this.request.hardening?.timeH ?? 0;
  }

  /** The recipe for these times, boost and diffuse `tempOffsetC` hotter; a step of zero length is left out. */
  recipe(boostH: number, diffuseH: number, tempOffsetC = 0): Recipe {
    const { boost, diffuse, hardening, name, steel, model, thresholdCarbonPct, totalCaseMarginPct, shape } =
      this.request;
    // The furnace's factor travels with the recipe, so a saved plan reproduces its prediction.
    const { diffusivityFactor } = this.request;
    const shifted = (step: PotentialStep) => ({ ...step, temperatureC: step.temperatureC + tempOffsetC });
    const steps: RecipeStep[] = [];
    if (boostH > 0) steps.push(soak(PLAN_STEP_LABELS.boost, boostH, shifted(boost)));
    if (diffuseH > 0) steps.push(soak(PLAN_STEP_LABELS.diffuse, diffuseH, shifted(diffuse)));
    if (hardening)
      steps.push(
        soak(PLAN_STEP_LABELS.hardening, hardening.timeH, { ...diffuse, temperatureC: hardening.temperatureC }),
      );
    return {
      ...(name === undefined ? {} : { name }),
      totalCaseMarginPct,
      diffusivityFactor,
      steel,
      model,
      thresholdCarbonPct,
      shape,
      steps,
    };
  }

  /**
   * ECD and surface carbon after `carburizeH` hours of boost and diffuse with `boostShare` of it
   * boost (both steps `tempOffsetC` hotter, to check a suggested change of temperature).
   */
  probe(boostShare: number, carburizeH: number, resolution: number, tempOffsetC = 0): Probe {
    this.simulations++;
    const run = solveRecipe(this.recipe(boostShare * carburizeH, (1 - boostShare) * carburizeH, tempOffsetC), {
      resolution,
    });
    return { ecdMm: depthToCarbonM(run, this.request.thresholdCarbonPct) * 1e3, surfacePct: run.surfaceCarbonPct };
  }

  /** The full simulation of a recipe (profile, history, cautions) at `resolution`. */
  simulate(recipe: Recipe, resolution: number): SimulationResult {
    this.simulations++;
    return runCycle(recipe, resolution);
  }
}
