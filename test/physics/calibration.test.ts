import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitDiffusivityFactor, type CalibrationSample } from '../../src/physics/calibration';
import { constantSurfaceDepth } from '../../src/physics/closedForm';
import { agrenDiffusivity } from '../../src/physics/diffusivity';
import { mulberry32 } from '../../src/physics/random';

/** Deterministic uniform numbers in [0, 1), so every synthetic log is reproducible. */
const uniform = mulberry32;
/** Standard normal deviates by Box–Muller. */
const normal = (u: () => number) => () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());

/** A synthetic log: jobs at 900–950 °C for 3–10 h, "measured" = closed-form ECD with D × kTrue, plus noise. */
function syntheticLog(kTrue: number, jobs: number, noiseMm: number, seed: number): CalibrationSample[] {
  const u = uniform(seed);
  const z = normal(u);
  return Array.from({ length: jobs }, (_, i) => {
    const tempK = 900 + 50 * u() + 273.15;
    const timeS = (3 + 7 * u()) * 3600;
    const D = agrenDiffusivity(tempK, 0.55);
    const predictEcdMm = (k: number) => constantSurfaceDepth(timeS, k * D, 0.9, 0.2, 0.4) * 1e3;
    return { id: `job-${i}`, measuredEcdMm: predictEcdMm(kTrue) + noiseMm * z(), predictEcdMm };
  });
}

describe('furnace calibration: least-squares diffusivity factor k', () => {
  it('recovers k exactly from noise-free synthetic logs', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        fc.integer({ min: 3, max: 30 }),
        fc.nat(),
        (k, jobs, seed) => {
          const fit = fitDiffusivityFactor(syntheticLog(k, jobs, 0, seed));
          expect(fit.ok).toBe(true);
          if (!fit.ok) return;
          expect(fit.value.factor / k).toBeCloseTo(1, 8);
          expect(fit.value.rmsResidualMm).toBeLessThan(1e-8);
        },
      ),
      { numRuns: 50 },
    );
  });
  it('with 0.03 mm lab scatter, k = 1.15 lies inside the 95 % interval and residuals are reported per job', () => {
    const fit = fitDiffusivityFactor(syntheticLog(1.15, 12, 0.03, 7));
    expect(fit.ok).toBe(true);
    if (!fit.ok) return;
    expect(fit.value.interval95.low).toBeLessThan(1.15);
    expect(fit.value.interval95.high).toBeGreaterThan(1.15);
    expect(fit.value.interval95.high - fit.value.interval95.low).toBeLessThan(0.3);
    expect(fit.value.residuals).toHaveLength(12);
    expect(fit.value.rmsResidualMm).toBeGreaterThan(0.01);
    expect(fit.value.rmsResidualMm).toBeLessThan(0.06);
  });
  it('the 95 % interval covers the true k in 90–99 % of 400 noisy synthetic logs', () => {
    let covered = 0;
    for (let seed = 1; seed <= 400; seed++) {
      const fit = fitDiffusivityFactor(syntheticLog(0.85, 6, 0.04, seed));
      if (fit.ok && fit.value.interval95.low <= 0.85 && fit.value.interval95.high >= 0.85) covered++;
    }
    expect(covered / 400).toBeGreaterThan(0.9);
    expect(covered / 400).toBeLessThan(0.99);
  });
  it('refuses fewer than three jobs, and factors beyond 0.1–10', () => {
    expect(fitDiffusivityFactor(syntheticLog(1, 2, 0, 1))).toMatchObject({
      ok: false,
      error: { code: 'calibration.tooFewJobs' },
    });
    const absurd = syntheticLog(1, 5, 0, 1).map((s) => ({ ...s, measuredEcdMm: s.measuredEcdMm * 10 }));
    expect(fitDiffusivityFactor(absurd)).toMatchObject({ ok: false, error: { code: 'calibration.factorOutOfRange' } });
  });
});
