/**
 * Furnace calibration: a diffusivity factor k (D used = k × D of the model) fitted by
 * least squares on effective case depth to the lab results of one furnace.
 *
 * The fit runs on θ = ln k by Gauss–Newton with numerical derivatives, so any predictor
 * (closed form, where depth ∝ √k exactly, or the cycle simulator) can be calibrated.
 * The 95 % interval is θ ± t(0.975, n − 1)·se(θ), se from the residual variance
 * (linearized least squares: Bates & Watts, Nonlinear Regression Analysis and Its Applications, 1988),
 * mapped back to k; it is asymmetric in k because k > 0.
 */
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { fail, ok, type Result } from './result';
import { DIFFUSIVITY_FACTOR_LIMITS } from './validate';

export interface CalibrationSample {
  /** Job id, carried into the residuals. */
  id: string;
  measuredEcdMm: number;
  /** Predicted ECD (mm) for the job's recorded cycle with D scaled by k. */
  predictEcdMm: (factor: number) => number;
}

export interface CalibrationResidual {
  id: string;
  measuredMm: number;
  predictedMm: number;
  /** Measured minus predicted with the fitted factor, mm. */
  residualMm: number;
}

export interface CalibrationFit {
  factor: number;
  interval95: { low: number; high: number };
  jobCount: number;
  residuals: CalibrationResidual[];
  /** Root-mean-square residual, mm. */
  rmsResidualMm: number;
}

/** Fewest lab results that give a factor with an interval (two degrees of freedom). */
export const MIN_CALIBRATION_JOBS = 3;

const STEP = 1e-4;
const MAX_ITERATIONS = 50;

export function fitDiffusivityFactor(samples: readonly CalibrationSample[]): Result<CalibrationFit> {
  const n = samples.length;
  if (n < MIN_CALIBRATION_JOBS)
    return fail('calibration.tooFewJobs', undefined, { min: MIN_CALIBRATION_JOBS, count: n });
  const lnMin = Math.log(DIFFUSIVITY_FACTOR_LIMITS.min);
  const lnMax = Math.log(DIFFUSIVITY_FACTOR_LIMITS.max);
  let theta = 0;
  let sumJ2 = 0;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    let sumJr = 0;
    sumJ2 = 0;
    for (const s of samples) {
      const residual = s.measuredEcdMm - s.predictEcdMm(Math.exp(theta));
      const slope = (s.predictEcdMm(Math.exp(theta + STEP)) - s.predictEcdMm(Math.exp(theta - STEP))) / (2 * STEP);
      sumJr += slope * residual;
      sumJ2 += slope * slope;
    }
    if (!(sumJ2 > 0)) return fail('calibration.noSensitivity');
    const delta = sumJr / sumJ2;
    theta = Math.min(lnMax, Math.max(lnMin, theta + delta));
    if (Math.abs(delta) < 1e-10) break;
  }
  const factor = Math.exp(theta);
  if (theta <= lnMin || theta >= lnMax) {
    return fail('calibration.factorOutOfRange', undefined, {
      min: DIFFUSIVITY_FACTOR_LIMITS.min,
      max: DIFFUSIVITY_FACTOR_LIMITS.max,
    });
  }
  const residuals = samples.map((s) => {
    const predictedMm = s.predictEcdMm(factor);
    return { id: s.id, measuredMm: s.measuredEcdMm, predictedMm, residualMm: s.measuredEcdMm - predictedMm };
  });
  const sumSquares = residuals.reduce((sum, r) => sum + r.residualMm ** 2, 0);
  const halfWidth = tQuantile(0.975, n - 1) * Math.sqrt(sumSquares / (n - 1) / sumJ2);
  return ok({
    factor,
    interval95: { low: Math.exp(theta - halfWidth), high: Math.exp(theta + halfWidth) },
    jobCount: n,
    residuals,
    rmsResidualMm: Math.sqrt(sumSquares / n),
  });
}
