/**
 * Loads charged cold: on a ramp nothing happens until the part crosses A1 (727 °C, Fe–Fe₃C
 * eutectoid), and the first time step with austenite starts there. References are the same
 * recipe at 8× resolution (grid and time steps), never the code's own formula.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Recipe, RecipeStep } from '../../../src/physics/cycle/recipe';
import { runCycle, solveRecipe } from '../../../src/physics/cycle/simulate';
import { EUTECTOID_TEMP_C } from '../../../src/physics/steel';
import { plainRecipe, relativeError, soak } from './fixtures';

const ramp = (hours: number, fromC: number, toC: number, potentialPct: number | null = 1): RecipeStep => ({
  durationH: hours,
  startTempC: fromC,
  endTempC: toC,
  carbonPotentialPct: potentialPct,
  betaMPerS: 1.5e-7,
});

describe('a heat-up ramp from a cold or part-warm load, against 8× resolution', () => {
  it.each([20, 400, 700])(
    'ramp from %s °C to 925 °C over 2 h, then 4 h at 925 °C: ECD within 0.3 %, surface within 0.003 %C',
    (startC) => {
      const recipe = plainRecipe([ramp(2, startC, 925), soak(4, 925, 1)]);
      const coarse = runCycle(recipe, 1);
      const fine = runCycle(recipe, 8);
      expect(relativeError(coarse.effectiveCaseDepthMm, fine.effectiveCaseDepthMm)).toBeLessThan(0.003);
      expect(Math.abs(coarse.surfaceCarbonPct - fine.surfaceCarbonPct)).toBeLessThan(0.003);
    },
  );

  it('a long slow ramp 20 → 800 °C over 10 h (once carburized as if all at A1: 2.4× too deep) agrees with 8× within 0.3 %', () => {
    const recipe = plainRecipe([ramp(10, 20, 800, 0.9)]);
    const coarse = runCycle(recipe, 1);
    const fine = runCycle(recipe, 8);
    expect(relativeError(coarse.effectiveCaseDepthMm, fine.effectiveCaseDepthMm)).toBeLessThan(0.003);
    expect(Math.abs(coarse.surfaceCarbonPct - fine.surfaceCarbonPct)).toBeLessThan(0.003);
  });

  it('nothing happens before the crossing: the ramp from 20 °C equals an idle wait plus the ramp from 727 °C', () => {
    const crossingH = (2 * (EUTECTOID_TEMP_C - 20)) / (925 - 20);
    const fromCold = runCycle(plainRecipe([ramp(2, 20, 925), soak(4, 925, 1)]));
    const fromA1 = runCycle(
      plainRecipe([soak(crossingH, 20, null), ramp(2 - crossingH, EUTECTOID_TEMP_C, 925), soak(4, 925, 1)]),
    );
    expect(relativeError(fromCold.effectiveCaseDepthMm, fromA1.effectiveCaseDepthMm)).toBeLessThan(1e-9);
    expect(Math.abs(fromCold.surfaceCarbonPct - fromA1.surfaceCarbonPct)).toBeLessThan(1e-9);
  });

  it('a ramp that never reaches 727 °C leaves the core carbon everywhere', () => {
    const recipe = plainRecipe([ramp(5, 20, 720), soak(3, 720, 1)], { kind: 'semi-infinite' }, 0.18);
    const run = solveRecipe(recipe);
    expect(Array.from(run.carbonPct).every((c) => c === 0.18)).toBe(true);
    expect(run.surfaceCarbonPct).toBe(0.18);
    expect(runCycle(recipe).effectiveCaseDepthMm).toBe(0);
  });
});

describe('property: cutting a ramp in two anywhere changes the case by less than 0.2 %', () => {
  it('heat-up or cool-down ramps (any start 20–1000 °C, end 600–1050 °C), then a soak at 925 °C', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 20, max: 1000 }),
        fc.integer({ min: 600, max: 1050 }),
        fc.double({ min: 0.3, max: 5, noNaN: true }),
        fc.double({ min: 0.02, max: 0.98, noNaN: true }),
        fc.constantFrom(1, null),
        (startC, endC, hours, cut, potentialPct) => {
          const soakAfter = soak(3, 925, 0.9);
          const whole: Recipe = plainRecipe([ramp(hours, startC, endC, potentialPct), soakAfter]);
          const cutC = startC + cut * (endC - startC);
          const halves: Recipe = plainRecipe([
            ramp(cut * hours, startC, cutC, potentialPct),
            ramp((1 - cut) * hours, cutC, endC, potentialPct),
            soakAfter,
          ]);
          const a = runCycle(whole).effectiveCaseDepthMm;
          const b = runCycle(halves).effectiveCaseDepthMm;
          expect(relativeError(b, a)).toBeLessThan(0.002);
        },
      ),
      { numRuns: 200 },
    );
  });
});
