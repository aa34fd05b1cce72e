import { describe, expect, it } from 'vitest';
import { caseDepth } from '../../src/physics/caseDepth';
import { depthBand } from '../../src/physics/uncertainty';

const pinion = { temperatureC: 925, timeH: 6, surfaceCarbonPct: 0.9, coreCarbonPct: 0.2 };

describe('uncertainty band on depth', () => {
  it('closed form: the band holds the nominal, the model range and the ±8 °C range', () => {
    const r = caseDepth(pinion);
    if (!r.ok) throw new Error(r.error.code);
    const band = r.value.uncertaintyMm;
    expect(band.nominalMm).toBe(r.value.effectiveCaseDepthMm);
    expect(band.temperatureToleranceC).toBe(8);
    expect(band.minMm).toBeLessThanOrEqual(Math.min(band.models.min, band.temperature.min));
    expect(band.maxMm).toBeGreaterThanOrEqual(Math.max(band.models.max, band.temperature.max));
    expect(band.models).toEqual({ min: r.value.modelRangeMm.min, max: r.value.modelRangeMm.max });
    expect(band.beta).toBeUndefined();
  });
  it('a wider furnace tolerance widens the band; zero tolerance leaves only the model spread', () => {
    const band = (tol: number) => {
      const r = caseDepth({ ...pinion, temperatureToleranceC: tol });
      if (!r.ok) throw new Error(r.error.code);
      return r.value.uncertaintyMm;
    };
    expect(band(15).maxMm - band(15).minMm).toBeGreaterThan(band(8).maxMm - band(8).minMm);
    expect(band(0).minMm).toBeCloseTo(band(0).models.min, 12);
    expect(band(0).maxMm).toBeCloseTo(band(0).models.max, 12);
  });
  it('includes β corners when the prediction uses β, and takes every combination into account', () => {
    const calls: string[] = [];
    const band = depthBand(
      (c) => {
        calls.push(`${c.model}/${c.tempOffsetC}/${c.betaMPerS ?? 'nominal'}`);
        return 1 + c.tempOffsetC / 100 + (c.betaMPerS ?? 2e-7) * 1e6;
      },
      'agren',
      { temperatureToleranceC: 10, betaRangeMPerS: { min: 1e-7, max: 3e-7 } },
    );
    // 18 corners; nominal; the other two models and the two offsets at nominal β (β alone reuses corners).
    expect(new Set(calls).size).toBe(3 * 3 * 2 + 1 + 2 + 2);
    expect(band.minMm).toBeCloseTo(1 - 0.1 + 0.1, 12);
    expect(band.maxMm).toBeCloseTo(1 + 0.1 + 0.3, 12);
    expect(band.beta).toEqual({ min: expect.closeTo(1.1, 12), max: expect.closeTo(1.3, 12) });
  });
});
