/**
 * Cycle simulator: the three-step demo cycle (boost, diffuse, drop to hardening temperature)
 * on SAE 8620, as one full `simulate` request, the way every keystroke on the cycle screen runs it.
 */
import { runCycle, simulateCycle } from '../../src/physics/cycle/simulate';
import { readRecipe } from '../../src/physics/cycle/readRecipe';
import { findGrade } from '../../src/physics/grades';
import { medianMs } from './timing';

const sae8620 = findGrade('sae-8620')!;

/** Boost 4 h at 925 °C Cp 1.10, diffuse 2 h at 925 °C Cp 0.80, 0.5 h at 850 °C Cp 0.80. */
export const threeStepRequest = {
  name: 'KR-2231 pinion, F1',
  steel: { grade: sae8620.name, coreCarbonPct: 0.2, composition: sae8620.composition },
  model: 'agren',
  shape: { kind: 'semi-infinite' },
  steps: [
    { label: 'boost', durationH: 4, startTempC: 925, endTempC: 925, carbonPotentialPct: 1.1, betaMPerS: 1.5e-7 },
    { label: 'diffuse', durationH: 2, startTempC: 925, endTempC: 925, carbonPotentialPct: 0.8, betaMPerS: 1.5e-7 },
    { label: 'harden', durationH: 0.5, startTempC: 850, endTempC: 850, carbonPotentialPct: 0.8, betaMPerS: 1.5e-7 },
  ],
};

/** Resolution of the converged reference run (× finer grid and time steps). */
const REFERENCE_RESOLUTION = 32;
const RUNS = 200;

export async function run(): Promise<Record<string, number>> {
  const recipe = readRecipe(threeStepRequest);
  if (!recipe.ok) throw new Error(`bench recipe rejected: ${recipe.error.code}`);
  const result = simulateCycle(threeStepRequest);
  if (!result.ok) throw new Error(`bench recipe failed: ${result.error.code}`);
  const ecdMm = result.value.effectiveCaseDepthMm;
  const cycle3StepTimeSteps = result.value.surfaceHistory.length - 1;
  const convergedEcdMm = runCycle(recipe.value, REFERENCE_RESOLUTION).effectiveCaseDepthMm;
  const cycle3StepEcdErrorPct = (Math.abs(ecdMm - convergedEcdMm) / convergedEcdMm) * 100;
  const cycle3StepMs = await medianMs(() => simulateCycle(threeStepRequest), RUNS, 50);
  const cycle3StepSolveOnlyMs = await medianMs(() => runCycle(recipe.value), RUNS, 50);
  const cycle3StepReferenceMs = await medianMs(() => runCycle(recipe.value, REFERENCE_RESOLUTION), 20, 2);
  console.log(
    `3-step cycle (demo pinion): median ${cycle3StepMs.toFixed(4)} ms over ${RUNS} runs (validated request), ` +
      `${cycle3StepSolveOnlyMs.toFixed(4)} ms from a validated recipe`,
  );
  console.log(
    `  ECD ${ecdMm.toFixed(5)} mm, converged (${REFERENCE_RESOLUTION}× finer) ${convergedEcdMm.toFixed(5)} mm: ` +
      `error ${cycle3StepEcdErrorPct.toFixed(4)} %; surface ${result.value.surfaceCarbonPct.toFixed(4)} %C; ` +
      `reference run ${cycle3StepReferenceMs.toFixed(1)} ms; ${cycle3StepTimeSteps} time steps at default resolution`,
  );
  return {
    cycle3StepMs,
    cycle3StepSolveOnlyMs,
    cycle3StepEcdErrorPct,
    cycle3StepEcdMm: ecdMm,
    cycle3StepReferenceMs,
    cycle3StepTimeSteps,
  };
}
