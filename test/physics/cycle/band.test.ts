/** The likely-range band of a cycle's ECD: depthBand over the simulator, each distinct case run once. */
import { describe, expect, it } from 'vitest';
import { bandRecipe, cycleDepthBand } from '../../../src/physics/cycle/band';
import { runCycle } from '../../../src/physics/cycle/simulate';
import { DIFFUSIVITY_MODELS } from '../../../src/physics/diffusivity';
import { demoCycle } from './fixtures';

const betaRange = { min: 1e-7, max: 3e-7 };

describe('cycle depth band', () => {
  it('moves every step temperature by the offset and sets every β when the case gives one', () => {
    const recipe = demoCycle();
    const moved = bandRecipe(recipe, { tempOffsetC: -8, betaMPerS: 3e-7 });
    expect(moved.steps.map((s) => s.startTempC)).toEqual(recipe.steps.map((s) => s.startTempC - 8));
    expect(moved.steps.map((s) => s.endTempC)).toEqual(recipe.steps.map((s) => s.endTempC - 8));
    expect(moved.steps.every((s) => s.betaMPerS === 3e-7)).toBe(true);
    expect(bandRecipe(recipe, { tempOffsetC: 0 }).steps).toEqual(recipe.steps);
  });

  it('runs 23 distinct simulations with a β range (18 corners, the nominal, two models and two offsets at nominal β), 9 without (the corners alone)', () => {
    expect(cycleDepthBand(demoCycle(), { betaRangeMPerS: betaRange }).simulations).toBe(23);
    expect(cycleDepthBand(demoCycle()).simulations).toBe(9);
  });

  it('its nominal is the simulator ECD, and it holds the model, temperature and β ranges', () => {
    const recipe = demoCycle();
    const band = cycleDepthBand(recipe, { betaRangeMPerS: betaRange, temperatureToleranceC: 8 });
    expect(band.nominalMm).toBeCloseTo(runCycle(recipe).effectiveCaseDepthMm, 12);
    for (const part of [band.models, band.temperature, band.beta!]) {
      expect(band.minMm).toBeLessThanOrEqual(part.min);
      expect(band.maxMm).toBeGreaterThanOrEqual(part.max);
    }
    // Hotter and a faster surface transfer carburize deeper.
    expect(band.temperature.max).toBeGreaterThan(band.nominalMm);
    expect(band.temperature.min).toBeLessThan(band.nominalMm);
    expect(band.beta!.max).toBeGreaterThan(band.beta!.min);
  });

  it('zero tolerance and no β range leave only the spread of the three models', () => {
    const band = cycleDepthBand(demoCycle(), { temperatureToleranceC: 0 });
    expect(band.minMm).toBe(band.models.min);
    expect(band.maxMm).toBe(band.models.max);
  });

  it('the recipe’s calibration factor scales D in every case: the nominal equals the simulator run with D × k', () => {
    const recipe = { ...demoCycle(), diffusivityFactor: 1.2 };
    const band = cycleDepthBand(recipe);
    const direct = runCycle(demoCycle(), 1, {
      diffusivity: (tempK, carbonPct) => 1.2 * DIFFUSIVITY_MODELS.agren.diffusivity(tempK, carbonPct),
    });
    expect(band.nominalMm).toBeCloseTo(direct.effectiveCaseDepthMm, 12);
    expect(band.models.max).toBeGreaterThan(cycleDepthBand(demoCycle()).models.max);
    expect(band.nominalMm).toBeGreaterThan(cycleDepthBand(demoCycle()).nominalMm);
  });
});
