/**
 * Likely range of a cycle's ECD (models × furnace temperature ±8 °C × β 1–3e-7 m/s, 23 simulator
 * runs) on the demo pinion cycle, as the cycle screen and the planner work it out on demand; and a
 * furnace calibration fit from 30 cycle jobs, as the log's calibration view does per furnace.
 */
import { readFileSync } from 'node:fs';
import { calibrateFurnace, calibrationSamples } from '../../src/jobs/calibration';
import { fitDiffusivityFactor } from '../../src/physics/calibration';
import { cycleDepthBand } from '../../src/physics/cycle/band';
import { readRecipe } from '../../src/physics/cycle/readRecipe';
import { DEFAULT_BETA_RANGE_M_PER_S } from '../../src/physics/uncertainty';
import { cycleJobsOnOneFurnace } from '../fixtures/cycleJobs';
import { medianMs } from './timing';

const recipe = readRecipe(
  JSON.parse(readFileSync(new URL('../../public/examples/pinion-kr2231-cycle.json', import.meta.url), 'utf8')),
);

export async function run(): Promise<Record<string, number>> {
  if (!recipe.ok) throw new Error(recipe.error.code);
  const band = cycleDepthBand(recipe.value, { betaRangeMPerS: DEFAULT_BETA_RANGE_M_PER_S });
  const bandMs = await medianMs(
    () => cycleDepthBand(recipe.value, { betaRangeMPerS: DEFAULT_BETA_RANGE_M_PER_S }),
    20,
    3,
  );
  console.log(
    `cycle band: ${bandMs.toFixed(1)} ms median, ${band.simulations} simulations, ECD ${band.nominalMm.toFixed(3)} mm in ${band.minMm.toFixed(3)}–${band.maxMm.toFixed(3)} mm`,
  );
  const jobs = cycleJobsOnOneFurnace(30);
  const fitMs = await medianMs(() => calibrateFurnace(jobs, 'F1'), 5, 1);
  const fit = calibrateFurnace(jobs, 'F1').fit;
  // Simulator runs of one fit: the one per job at k = 1 that picks usable jobs, then the fit's own.
  const { samples } = calibrationSamples(jobs, 'F1');
  let fitRuns = 0;
  fitDiffusivityFactor(
    samples.map((s) => ({
      ...s,
      predictEcdMm: (k: number) => {
        if (k !== 1) fitRuns++;
        return s.predictEcdMm(k);
      },
    })),
  );
  const calibrationRuns = samples.length + fitRuns;
  console.log(
    `calibrationFit30CyclesMs: ${fitMs.toFixed(0)} ms median (target ≤ 50 ms; a calibration fit from 30 cycle jobs), ${calibrationRuns} simulator runs${fit.ok ? `, k = ${fit.value.factor.toFixed(3)}` : ''}`,
  );
  return {
    bandMs,
    bandSimulations: band.simulations,
    calibrationFit30CyclesMs: fitMs,
    calibrationFit30CyclesRuns: calibrationRuns,
  };
}
