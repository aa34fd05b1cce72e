/**
 * Furnace calibration: a diffusivity factor k (D used = k × D of the model) fitted by
 * least squares on ln(effective case depth) to the lab results of one furnace.
 *
 * Lab scatter grows with depth (a 4 % scatter is 0.012 mm on a 0.3 mm pin, 0.06 mm on a 1.5 mm
 * shaft), so the residuals are taken on ln(ECD): equal in size for every job, which the interval
 * below assumes. On depth itself the deep jobs would dominate and the interval would be too
 * narrow (measured by the coverage test over 1000 synthetic logs with 4 % proportional scatter:
 * a nominal 95 % interval held 85.5 % of the time on depth, 95.2 % on ln(ECD); with a constant
 * 0.03 mm scatter 94.0 % and 96.3 %).
 * The fit runs on θ = ln k by Gauss–Newton with numerical derivatives, so any predictor
 * (closed form, where ln depth = ln k / 2 + const exactly, or the cycle simulator) can be
 * calibrated. The 95 % interval is θ ± t(0.975, n − 1)·se(θ), se from the residual variance
 * (linearized least squares: Bates & Watts, Nonlinear Regression Analysis and Its Applications,
 * 1988), mapped back to k; it is asymmetric in k because k > 0.
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
  const lnPredicted = (s: CalibrationSample, theta: number) => Math.log(s.predictEcdMm(Math.exp(theta)));
  let theta = 0;
  let sumJ2 = 0;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    let sumJr = 0;
    sumJ2 = 0;
    for (const s of samples) {
      const residual = Math.log(s.measuredEcdMm) - lnPredicted(s, theta);
      const slope = (lnPredicted(s, theta + STEP) - lnPredicted(s, theta - STEP)) / (2 * STEP);
      sumJr += slope * residual;
      sumJ2 += slope * slope;
    }
    // A job with no case (or no lab depth) has no logarithm: nothing to fit on.
    if (!(sumJ2 > 0) || !Number.isFinite(sumJr)) return fail('calibration.noSensitivity');
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
  const sumSquaresLn = residuals.reduce((sum, r) => sum + Math.log(r.measuredMm / r.predictedMm) ** 2, 0);
  const halfWidth = tQuantile(0.975, n - 1) * Math.sqrt(sumSquaresLn / (n - 1) / sumJ2);
  const sumSquaresMm = residuals.reduce((sum, r) => sum + r.residualMm ** 2, 0);
  return ok({
    factor,
    interval95: { low: Math.exp(theta - halfWidth), high: Math.exp(theta + halfWidth) },
    jobCount: n,
    residuals,
    rmsResidualMm: Math.sqrt(sumSquaresMm / n),
  });
}
