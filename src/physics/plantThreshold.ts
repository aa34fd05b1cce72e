/**
 * The plant's own hardness limit in carbon: from the traverses of one steel grade in one furnace,
 * set beside the predicted carbon profiles of the same loads, the carbon at which that steel
 * reaches the case criterion there (the ECD threshold, 0.40 %C as a stand-in), fitted together with
 * the furnace's diffusion-speed factor k (D used = k × D of the model).
 *
 * Why both at once: the measured ECD alone cannot tell them apart (a deeper ECD is a faster
 * furnace or a lower threshold). Each traverse gives two depths: the ECD, where the hardness falls
 * to the limit (carbon = threshold c), and the case end, where it has come a fixed share of the way
 * down to the core (`caseEnd.ts`; with hardness taken as a straight line in carbon between core and
 * limit, as the app's indicative curve, carbon = core + f·(c − core)). k stretches every depth of a
 * load alike (for the closed form exactly by √k), so it is fixed by how deep the case ends; c moves
 * the ECD against the case end, so it is fixed by their ratio.
 *
 * Method: per load the residuals r = (ln ECD − ln x(c), ln caseEnd − ln x(core + f(c − core))) on
 * the load's predicted profile with D × k; both on ln depth, since lab scatter grows with depth (as
 * in `calibration.ts`). The two residuals of a load are correlated (a hotter load moves both), so
 * the fit is generalised least squares with their 2×2 covariance estimated from the residuals
 * themselves, refitted until it settles (Gauss–Newton on θ = ln k and c, numerical derivatives).
 * The 95 % intervals are ± t(0.975, n − 1)·se from the linearised covariance (Bates & Watts,
 * Nonlinear Regression Analysis and Its Applications, 1988), the one for k mapped back from θ.
 * `test/physics/plantThreshold.test.ts` measures how often they cover a known k and threshold.
 */
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { fail, ok, type Result } from './result';
import { CASE_END_FRACTION } from './traverse/caseEnd';
import { DIFFUSIVITY_FACTOR_LIMITS } from './validate';

export interface ThresholdSample {
  /** Job id, carried into the residuals. */
  id: string;
  measuredEcdMm: number;
  /** The traverse's case-end depth (`caseEndDepthMm`), mm. */
  measuredCaseEndMm: number;
  coreCarbonPct: number;
  /** The load's predicted carbon profile with D × factor: depth (mm) where carbon falls to a level, 0 if it never reaches it. */
  profile: (factor: number) => (carbonPct: number) => number;
}

export interface ThresholdResidual {
  id: string;
  measuredEcdMm: number;
  predictedEcdMm: number;
  measuredCaseEndMm: number;
  predictedCaseEndMm: number;
}

export interface PlantThresholdFit {
  /** Carbon at which the steel reaches the case criterion in this furnace, wt%. */
  thresholdCarbonPct: number;
  thresholdInterval95: { low: number; high: number };
  /** The furnace's diffusion-speed factor fitted with it. */
  factor: number;
  factorInterval95: { low: number; high: number };
  loadCount: number;
  caseEndFraction: number;
  residuals: ThresholdResidual[];
}

/** Fewest loads with an interval: four parameters (k, c and the residuals' spread) need more than three. */
export const MIN_THRESHOLD_LOADS = 4;
/** Thresholds the fit may return, wt%: above the core by this much, and at most this carbon. */
export const THRESHOLD_FIT_LIMITS = { aboveCorePct: 0.02, maxPct: 1 } as const;

const THETA_STEP = 1e-4;
const CARBON_STEP = 1e-4;
const MAX_ITERATIONS = 60;
/** Refits with the residual covariance re-estimated (it settles in two or three). */
const COVARIANCE_PASSES = 4;

type Vec2 = [number, number];
type Mat2 = [number, number, number, number]; // row-major a, b, c, d

const det = (m: Mat2) => m[0] * m[3] - m[1] * m[2];
function inverse(m: Mat2): Mat2 | undefined {
  const d = det(m);
  if (!(Math.abs(d) > 0) || !Number.isFinite(d)) return undefined;
  return [m[3] / d, -m[1] / d, -m[2] / d, m[0] / d];
}
const apply = (m: Mat2, v: Vec2): Vec2 => [m[0] * v[0] + m[1] * v[1], m[2] * v[0] + m[3] * v[1]];

interface Evaluation {
  /** Per load: residual pair and Jacobian of the predicted ln depths (rows: ECD, case end; columns: θ, c). */
  residuals: Vec2[];
  jacobians: Mat2[];
  predicted: Vec2[];
}

export function fitPlantThreshold(
  samples: readonly ThresholdSample[],
  fraction = CASE_END_FRACTION,
): Result<PlantThresholdFit> {
  const n = samples.length;
  if (n < MIN_THRESHOLD_LOADS)
    return fail('plantThreshold.tooFewLoads', undefined, { min: MIN_THRESHOLD_LOADS, count: n });
  const thetaMin = Math.log(DIFFUSIVITY_FACTOR_LIMITS.min);
  const thetaMax = Math.log(DIFFUSIVITY_FACTOR_LIMITS.max);
  const carbonMin = Math.max(...samples.map((s) => s.coreCarbonPct)) + THRESHOLD_FIT_LIMITS.aboveCorePct;
  const carbonMax = THRESHOLD_FIT_LIMITS.maxPct;
  if (!(carbonMin < carbonMax)) return fail('plantThreshold.notIdentifiable');

  // A cycle run per load and factor is the cost; keep the profiles of the last few factors.
  const cache = new Map<number, ((c: number) => number)[]>();
  const profilesAt = (theta: number) => {
    let found = cache.get(theta);
    if (!found) {
      if (cache.size > 8) cache.clear();
      found = samples.map((s) => s.profile(Math.exp(theta)));
      cache.set(theta, found);
    }
    return found;
  };
  const lnDepths = (theta: number, c: number): Vec2[] | undefined => {
    const profiles = profilesAt(theta);
    const out: Vec2[] = [];
    for (let i = 0; i < n; i++) {
      const s = samples[i]!;
      const ecd = profiles[i]!(c);
      const end = profiles[i]!(s.coreCarbonPct + fraction * (c - s.coreCarbonPct));
      if (!(ecd > 0) || !(end > 0)) return undefined;
      out.push([Math.log(ecd), Math.log(end)]);
    }
    return out;
  };
  const measured: Vec2[] = samples.map((s) => [Math.log(s.measuredEcdMm), Math.log(s.measuredCaseEndMm)]);
  if (measured.some(([a, b]) => !Number.isFinite(a) || !Number.isFinite(b)))
    return fail('plantThreshold.notIdentifiable');

  const evaluate = (theta: number, c: number): Evaluation | undefined => {
    const base = lnDepths(theta, c);
    const tPlus = lnDepths(theta + THETA_STEP, c);
    const tMinus = lnDepths(theta - THETA_STEP, c);
    const cPlus = lnDepths(theta, c + CARBON_STEP);
    const cMinus = lnDepths(theta, c - CARBON_STEP);
    if (!base || !tPlus || !tMinus || !cPlus || !cMinus) return undefined;
    return {
      predicted: base,
      residuals: base.map((p, i) => [measured[i]![0] - p[0], measured[i]![1] - p[1]]),
      jacobians: base.map((_, i) => [
        (tPlus[i]![0] - tMinus[i]![0]) / (2 * THETA_STEP),
        (cPlus[i]![0] - cMinus[i]![0]) / (2 * CARBON_STEP),
        (tPlus[i]![1] - tMinus[i]![1]) / (2 * THETA_STEP),
        (cPlus[i]![1] - cMinus[i]![1]) / (2 * CARBON_STEP),
      ]),
    };
  };
  const objective = (e: Evaluation, weight: Mat2) =>
    e.residuals.reduce((sum, r) => {
      const w = apply(weight, r);
      return sum + r[0] * w[0] + r[1] * w[1];
    }, 0);
  /** Σ Jᵀ W J and Σ Jᵀ W r. */
  const normalEquations = (e: Evaluation, weight: Mat2): { a: Mat2; g: Vec2 } => {
    const a: Mat2 = [0, 0, 0, 0];
    const g: Vec2 = [0, 0];
    e.jacobians.forEach((j, i) => {
      // WJ, column by column.
      const wj0 = apply(weight, [j[0], j[2]]);
      const wj1 = apply(weight, [j[1], j[3]]);
      a[0] += j[0] * wj0[0] + j[2] * wj0[1];
      a[1] += j[0] * wj1[0] + j[2] * wj1[1];
      a[2] += j[1] * wj0[0] + j[3] * wj0[1];
      a[3] += j[1] * wj1[0] + j[3] * wj1[1];
      const r = e.residuals[i]!;
      g[0] += wj0[0] * r[0] + wj0[1] * r[1];
      g[1] += wj1[0] * r[0] + wj1[1] * r[1];
    });
    return { a, g };
  };
  /** The residuals' covariance over loads (a floor keeps it invertible when they vanish). */
  const residualCovariance = (e: Evaluation, dof: number): Mat2 => {
    const s: Mat2 = [1e-14, 0, 0, 1e-14];
    for (const r of e.residuals) {
      s[0] += (r[0] * r[0]) / dof;
      s[1] += (r[0] * r[1]) / dof;
      s[2] += (r[1] * r[0]) / dof;
      s[3] += (r[1] * r[1]) / dof;
    }
    return s;
  };

  let theta = 0;
  let c = Math.min(Math.max(0.4, carbonMin), carbonMax);
  let current = evaluate(theta, c);
  if (!current) return fail('plantThreshold.notIdentifiable');
  let weight: Mat2 = [1, 0, 0, 1];
  for (let pass = 0; pass < COVARIANCE_PASSES; pass++) {
    for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
      const { a, g } = normalEquations(current, weight);
      const inv = inverse(a);
      if (!inv) return fail('plantThreshold.notIdentifiable');
      const step = apply(inv, g);
      const before = objective(current, weight);
      let scale = 1;
      let accepted: { theta: number; c: number; e: Evaluation } | undefined;
      for (let halving = 0; halving < 30 && !accepted; halving++, scale /= 2) {
        const t = Math.min(thetaMax, Math.max(thetaMin, theta + scale * step[0]));
        const cc = Math.min(carbonMax, Math.max(carbonMin, c + scale * step[1]));
        const e = evaluate(t, cc);
        if (e && objective(e, weight) <= before) accepted = { theta: t, c: cc, e };
      }
      if (!accepted) break;
      const moved = Math.abs(accepted.theta - theta) + Math.abs(accepted.c - c);
      theta = accepted.theta;
      c = accepted.c;
      current = accepted.e;
      if (moved < 1e-10) break;
    }
    const w = inverse(residualCovariance(current, n));
    if (!w) return fail('plantThreshold.notIdentifiable');
    weight = w;
  }
  if (theta <= thetaMin || theta >= thetaMax) {
    return fail('plantThreshold.factorOutOfRange', undefined, {
      min: DIFFUSIVITY_FACTOR_LIMITS.min,
      max: DIFFUSIVITY_FACTOR_LIMITS.max,
    });
  }
  if (c <= carbonMin || c >= carbonMax) {
    return fail('plantThreshold.outOfRange', undefined, {
      minPct: Number(carbonMin.toFixed(2)),
      maxPct: carbonMax,
    });
  }
  const spread = inverse(residualCovariance(current, n - 1));
  const covariance = spread && inverse(normalEquations(current, spread).a);
  if (!covariance || !(covariance[0] > 0) || !(covariance[3] > 0)) return fail('plantThreshold.notIdentifiable');
  const t = tQuantile(0.975, n - 1);
  const thetaHalf = t * Math.sqrt(covariance[0]);
  const carbonHalf = t * Math.sqrt(covariance[3]);
  const fitted = current;
  return ok({
    thresholdCarbonPct: c,
    thresholdInterval95: { low: c - carbonHalf, high: c + carbonHalf },
    factor: Math.exp(theta),
    factorInterval95: { low: Math.exp(theta - thetaHalf), high: Math.exp(theta + thetaHalf) },
    loadCount: n,
    caseEndFraction: fraction,
    residuals: samples.map((s, i) => ({
      id: s.id,
      measuredEcdMm: s.measuredEcdMm,
      predictedEcdMm: Math.exp(fitted.predicted[i]![0]),
      measuredCaseEndMm: s.measuredCaseEndMm,
      predictedCaseEndMm: Math.exp(fitted.predicted[i]![1]),
    })),
  });
}
