/** Mass balance: the carbon in the part equals what crossed the surface, and nothing else. */
import { describe, expect, it } from 'vitest';
import type { Recipe } from '../../../src/physics/cycle/recipe';
import { solveRecipe } from '../../../src/physics/cycle/simulate';
import { SECONDS_PER_HOUR } from '../../../src/physics/units';
import {
  CONSTANT_D,
  constantDiffusivity,
  demoCycle,
  gridUptake,
  plainRecipe,
  relativeError,
  soak,
  surfaceTransferUptake,
} from './fixtures';

const cases: [string, Recipe][] = [
  ['three-step demo cycle, semi-infinite', demoCycle()],
  ['demo cycle, 3 mm plate', demoCycle({ kind: 'plate', thicknessMm: 3 })],
  ['demo cycle, 4 mm bar', demoCycle({ kind: 'bar', diameterMm: 4 })],
  [
    'neutral ramp from 20 °C, carburize, neutral soak',
    plainRecipe([
      { durationH: 2, startTempC: 20, endTempC: 930, carbonPotentialPct: null },
      soak(3, 930, 1.0),
      soak(1, 930, null),
    ]),
  ],
  ['decarburizing step (potential below core)', plainRecipe([soak(2, 925, 0.9), soak(2, 925, 0.1)])],
];

describe('mass balance', () => {
  it.each(cases)(
    '%s: carbon taken up equals the time integral of the surface flux within 0.5 % (measured ~1e-14)',
    (_, recipe) => {
      const run = solveRecipe(recipe);
      const uptake = gridUptake(run, recipe.steel.coreCarbonPct);
      expect(Math.abs(uptake)).toBeGreaterThan(0);
      expect(relativeError(uptake, run.fluxUptakePctM)).toBeLessThan(0.005);
      // Stricter: the scheme is conservative, so the two agree to rounding.
      expect(relativeError(uptake, run.fluxUptakePctM)).toBeLessThan(1e-9);
    },
  );

  it('a neutral-gas step moves carbon inward but takes up none (uptake stays at Crank §3.3.2 M_t of the boost)', () => {
    const recipe = plainRecipe([soak(3, 925, 0.9), soak(2, 925, null)]);
    const afterBoost = solveRecipe(plainRecipe([soak(3, 925, 0.9)]), { diffusivity: constantDiffusivity });
    const afterNeutral = solveRecipe(recipe, { diffusivity: constantDiffusivity });
    const expected = surfaceTransferUptake(3 * SECONDS_PER_HOUR, CONSTANT_D, 1.5e-7, 0.9, 0.2);
    expect(relativeError(gridUptake(afterNeutral, 0.2), expected)).toBeLessThan(0.005);
    expect(afterNeutral.surfaceCarbonPct).toBeLessThan(afterBoost.surfaceCarbonPct - 0.05);
  });

  it('below the eutectoid nothing diffuses and nothing is taken up, even under a carburizing atmosphere', () => {
    const run = solveRecipe(plainRecipe([soak(5, 650, 1.0)]));
    expect(gridUptake(run, 0.2)).toBe(0);
    expect(run.surfaceCarbonPct).toBe(0.2);
  });
});
