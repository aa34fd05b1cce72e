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

/**
 * A job shop's log for a seed: 4–15 jobs at 900–940 °C, each timed for an ECD aimed log-uniformly
 * at 0.3–1.5 mm, "measured" = closed-form ECD with D × kTrue and the scatter given.
 */
function shopLog(
  seed: number,
  scatter: (truthMm: number, z: number) => number,
): { kTrue: number; samples: CalibrationSample[] } {
  const u = uniform(seed);
  const z = normal(u);
  const kTrue = 0.7 + 0.7 * u();
  const jobs = 4 + Math.floor(u() * 12);
  const samples = Array.from({ length: jobs }, (_, i) => {
    const D = agrenDiffusivity(900 + 40 * u() + 273.15, 0.55);
    const aimMm = 0.3 * 5 ** u();
    const timeS = (aimMm / (constantSurfaceDepth(3600, D, 0.9, 0.2, 0.4) * 1e3)) ** 2 * 3600;
    const predictEcdMm = (k: number) => constantSurfaceDepth(timeS, k * D, 0.9, 0.2, 0.4) * 1e3;
    return { id: `job-${i}`, measuredEcdMm: scatter(predictEcdMm(kTrue), z()), predictEcdMm };
  });
  return { kTrue, samples };
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
  it.each([
    [
      '4 % proportional scatter (lab scatter growing with depth)',
      (truthMm: number, z: number) => truthMm * (1 + 0.04 * z),
    ],
    ['a constant 0.03 mm scatter', (truthMm: number, z: number) => truthMm + 0.03 * z],
  ])('with %s, the 95 % interval covers the true k in 93–97 % of 1000 seeded synthetic job-shop logs', (_, scatter) => {
    // Each log: 4–15 jobs aimed at 0.3–1.5 mm (a job shop's pins to shafts), k drawn from 0.7–1.4.
    // Measured: 95.2 % (proportional) and 96.3 % (constant); the fit on depth it replaced held 85.5 % and 94.0 %.
    const logs = 1000;
    let covered = 0;
    for (let seed = 1; seed <= logs; seed++) {
      const { kTrue, samples } = shopLog(seed, scatter);
      const fit = fitDiffusivityFactor(samples);
      if (fit.ok && fit.value.interval95.low <= kTrue && fit.value.interval95.high >= kTrue) covered++;
    }
    expect(covered / logs).toBeGreaterThanOrEqual(0.93);
    expect(covered / logs).toBeLessThanOrEqual(0.97);
  });
  it('a job with no case (predicted 0 mm) cannot be fitted on ln(ECD): a typed error, not NaN', () => {
    const samples = syntheticLog(1, 4, 0, 3);
    samples[0] = { ...samples[0]!, predictEcdMm: () => 0 };
    expect(fitDiffusivityFactor(samples)).toMatchObject({ ok: false, error: { code: 'calibration.noSensitivity' } });
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
