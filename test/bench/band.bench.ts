/**
 * Likely range of a cycle's ECD (models × furnace temperature ±8 °C × β 1–3e-7 m/s, 23 simulator
 * runs) on the demo pinion cycle, as the cycle screen and the planner work it out on demand; and a
 * furnace calibration fit from 30 cycle jobs, as the log's calibration view does per furnace.
 */
import { readFileSync } from 'node:fs';
import { calibrateFurnace } from '../../src/jobs/calibration';
import type { Job } from '../../src/jobs/schema';
import { cycleDepthBand } from '../../src/physics/cycle/band';
import { readRecipe } from '../../src/physics/cycle/readRecipe';
import { DEFAULT_BETA_RANGE_M_PER_S } from '../../src/physics/uncertainty';
import { medianMs } from './timing';

const recipe = readRecipe(
  JSON.parse(readFileSync(new URL('../../public/examples/pinion-kr2231-cycle.json', import.meta.url), 'utf8')),
);

/** 30 cycle jobs on one furnace, lab depths 5 % deeper than predicted (invented). */
function cycleJobs(): Job[] {
  if (!recipe.ok) throw new Error(recipe.error.code);
  return Array.from({ length: 30 }, (_, i) => {
    const at = new Date(Date.UTC(2025, 0, 1) + i * 3.6e6).toISOString();
    return {
      id: `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
      createdAt: at,
      updatedAt: at,
      shift: 'A',
      shiftDate: '2025-01-01',
      operator: 'MK',
      furnace: 'F1',
      workOrder: '',
      partNumber: 'KR-2231',
      steel: { gradeName: 'SAE 8620', coreCarbonPct: 0.2 },
      inputs: {
        kind: 'cycle',
        recipe: {
          ...recipe.value,
          steps: recipe.value.steps.map((s, j) => (j === 1 ? { ...s, durationH: s.durationH + i * 0.1 } : s)),
        },
      },
      status: 'done',
      lab: { ecdMm: 0.95 + i * 0.01 },
      notes: '',
    };
  });
}

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
  const jobs = cycleJobs();
  const fitMs = await medianMs(() => calibrateFurnace(jobs, 'F1'), 5, 1);
  const fit = calibrateFurnace(jobs, 'F1').fit;
  console.log(
    `calibration fit, 30 cycle jobs: ${fitMs.toFixed(0)} ms median${fit.ok ? `, k = ${fit.value.factor.toFixed(3)}` : ''}`,
  );
  return { bandMs, bandSimulations: band.simulations, calibrationFit30CyclesMs: fitMs };
}
