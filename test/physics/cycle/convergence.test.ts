/** Grid and time-step convergence of the cycle solver at its default resolution. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readRecipe } from '../../../src/physics/cycle/readRecipe';
import type { Recipe } from '../../../src/physics/cycle/recipe';
import { runCycle } from '../../../src/physics/cycle/simulate';
import { demoCycle, plainRecipe, relativeError, soak } from './fixtures';

function example(file: string): Recipe {
  const recipe = readRecipe(
    JSON.parse(readFileSync(new URL(`../../../public/examples/${file}`, import.meta.url), 'utf8')),
  );
  if (!recipe.ok) throw new Error(`${file}: ${recipe.error.code}`);
  return recipe.value;
}

const cases: [string, Recipe][] = [
  ['three-step demo cycle (semi-infinite)', demoCycle()],
  ['KR-4410 shaft example (bar, heat-up ramp)', example('shaft-kr4410-cycle.json')],
  ['KR-0907 pin example (small bar)', example('pin-kr0907-cycle.json')],
  ['single 30 min soak, Ågren', plainRecipe([soak(0.5, 925, 0.9)])],
  ['short boost, long diffuse at 950 °C', plainRecipe([soak(1, 950, 1.2), soak(6, 950, 0.7)])],
  ['demo cycle in a 3 mm plate', demoCycle({ kind: 'plate', thicknessMm: 3 })],
];

describe('halving grid spacing and time step (resolution 2) at default resolution', () => {
  it.each(cases)('%s: ECD changes by less than 0.2 %, surface carbon by less than 0.005 %C', (_, recipe) => {
    const base = runCycle(recipe, 1);
    const fine = runCycle(recipe, 2);
    expect(relativeError(base.effectiveCaseDepthMm, fine.effectiveCaseDepthMm)).toBeLessThan(0.002);
    expect(Math.abs(base.surfaceCarbonPct - fine.surfaceCarbonPct)).toBeLessThan(0.005);
  });

  it('the demo cycle at default resolution is within 0.2 % of a 16× finer run', () => {
    const recipe = demoCycle();
    expect(
      relativeError(runCycle(recipe, 1).effectiveCaseDepthMm, runCycle(recipe, 16).effectiveCaseDepthMm),
    ).toBeLessThan(0.002);
  });

  it('errors shrink with resolution: second order, as the scheme is designed', () => {
    const recipe = plainRecipe([soak(6, 925, 0.9)]);
    const reference = runCycle(recipe, 16).effectiveCaseDepthMm;
    const coarse = relativeError(runCycle(recipe, 0.5).effectiveCaseDepthMm, reference);
    const fine = relativeError(runCycle(recipe, 2).effectiveCaseDepthMm, reference);
    // Four times finer should cut the error by about 16; demand at least 6.
    expect(fine).toBeLessThan(coarse / 6);
  });
});
