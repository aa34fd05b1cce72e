/**
 * Closed-form solutions of Fick's second law for a semi-infinite part with constant D.
 * SI units throughout: depth in m, time in s, D in m²/s, carbon in wt%.
 * Domain: D > 0, t > 0, Cs > C0; callers validate user input first (see caseDepth.ts).
 */
import { brentRoot } from './rootFinding';
import { erfc, erfcinv, erfcx } from './special';

/** Characteristic diffusion length √(D·t), m: depth scales with √t (common practice). */
export function diffusionLength(diffusivityM2PerS: number, timeS: number): number {
  return Math.sqrt(diffusivityM2PerS * timeS);
}

/**
 * Carbon at depth x for a surface held at Cs from t = 0 (Crank, The Mathematics of
 * Diffusion, 2nd ed., eq. 3.13): C = Cs − (Cs − C0)·erf(x / 2√(Dt)), wt%.
 */
export function constantSurfaceCarbon(
  depthM: number,
  timeS: number,
  diffusivityM2PerS: number,
  surfaceCarbonPct: number,
  coreCarbonPct: number,
): number {
  const u = depthM / (2 * diffusionLength(diffusivityM2PerS, timeS));
  return coreCarbonPct + (surfaceCarbonPct - coreCarbonPct) * erfc(u);
}

/** Fraction θ = (Cx − C0)/(Cs − C0) of the carbon rise that marks a depth. */
export function thresholdFraction(thresholdCarbonPct: number, surfaceCarbonPct: number, coreCarbonPct: number): number {
  return (thresholdCarbonPct - coreCarbonPct) / (surfaceCarbonPct - coreCarbonPct);
}

/** Depth where carbon falls to Cx under a constant surface: x = 2√(Dt)·erfc⁻¹(θ), m. */
export function constantSurfaceDepth(
  timeS: number,
  diffusivityM2PerS: number,
  surfaceCarbonPct: number,
  coreCarbonPct: number,
  thresholdCarbonPct: number,
): number {
  const theta = thresholdFraction(thresholdCarbonPct, surfaceCarbonPct, coreCarbonPct);
  return 2 * diffusionLength(diffusivityM2PerS, timeS) * erfcinv(theta);
}

/** Time for carbon Cx to reach depth x under a constant surface: t = [x / 2erfc⁻¹(θ)]² / D, s. */
export function constantSurfaceTime(
  depthM: number,
  diffusivityM2PerS: number,
  surfaceCarbonPct: number,
  coreCarbonPct: number,
  thresholdCarbonPct: number,
): number {
  const theta = thresholdFraction(thresholdCarbonPct, surfaceCarbonPct, coreCarbonPct);
  return (depthM / (2 * erfcinv(theta))) ** 2 / diffusivityM2PerS;
}

/**
 * Carbon at depth x with surface mass transfer J = β·(Cp − Cs): the "surface
 * evaporation" solution of Crank, The Mathematics of Diffusion, 2nd ed., §3.3.2, eq. 3.35,
 * with h = β/D, u = x/2√(Dt):
 * C = C0 + (Cp − C0)·[erfc(u) − exp(h·x + h²·D·t)·erfc(u + h√(Dt))].
 * The second term is evaluated as exp(−u²)·erfcx(u + h√(Dt)), which cannot overflow.
 */
export function surfaceTransferCarbon(
  depthM: number,
  timeS: number,
  diffusivityM2PerS: number,
  betaMPerS: number,
  carbonPotentialPct: number,
  coreCarbonPct: number,
): number {
  const sqrtDt = diffusionLength(diffusivityM2PerS, timeS);
  const u = depthM / (2 * sqrtDt);
  const hSqrtDt = (betaMPerS / diffusivityM2PerS) * sqrtDt;
  const fraction = erfc(u) - Math.exp(-u * u) * erfcx(u + hSqrtDt);
  return coreCarbonPct + (carbonPotentialPct - coreCarbonPct) * fraction;
}

/** Surface carbon after time t with surface mass transfer (Crank §3.3.2 at x = 0), wt%. */
export function surfaceTransferSurfaceCarbon(
  timeS: number,
  diffusivityM2PerS: number,
  betaMPerS: number,
  carbonPotentialPct: number,
  coreCarbonPct: number,
): number {
  return surfaceTransferCarbon(0, timeS, diffusivityM2PerS, betaMPerS, carbonPotentialPct, coreCarbonPct);
}

/**
 * Depth where the surface-transfer profile falls to Cx, m; 0 when even the surface
 * has not reached Cx yet. Found with Brent's method, since the profile decreases with depth.
 */
export function surfaceTransferDepth(
  timeS: number,
  diffusivityM2PerS: number,
  betaMPerS: number,
  carbonPotentialPct: number,
  coreCarbonPct: number,
  thresholdCarbonPct: number,
): number {
  const excess = (x: number) =>
    surfaceTransferCarbon(x, timeS, diffusivityM2PerS, betaMPerS, carbonPotentialPct, coreCarbonPct) -
    thresholdCarbonPct;
  if (excess(0) <= 0) return 0;
  // Beyond 30·√(Dt) erfc(u) underflows to zero, so the crossing lies below it.
  const upper = 30 * diffusionLength(diffusivityM2PerS, timeS);
  return brentRoot(excess, 0, upper, 1e-13)?.x ?? 0;
}
