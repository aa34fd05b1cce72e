/** Recipes and reference solutions shared by the cycle-solver tests. */
import besselj0 from '@stdlib/math-base-special-besselj0';
import besselj1 from '@stdlib/math-base-special-besselj1';
import type { PartShape, Recipe, RecipeStep } from '../../../src/physics/cycle/recipe';
import { findGrade } from '../../../src/physics/grades';
import { brentRoot } from '../../../src/physics/rootFinding';
import { erfcx } from '../../../src/physics/special';

/** A constant D, m²/s: Ågren's D near 0.5 %C at 925 °C has this order. */
export const CONSTANT_D = 2e-11;
export const constantDiffusivity = () => CONSTANT_D;

/** β so large the surface sits at the potential from the first instant, m/s. */
export const VERY_LARGE_BETA = 1;

export function soak(hours: number, tempC: number, potentialPct: number | null, betaMPerS = 1.5e-7): RecipeStep {
  return { durationH: hours, startTempC: tempC, endTempC: tempC, carbonPotentialPct: potentialPct, betaMPerS };
}

export function plainRecipe(steps: RecipeStep[], shape: PartShape = { kind: 'semi-infinite' }, corePct = 0.2): Recipe {
  return { steel: { coreCarbonPct: corePct }, model: 'agren', thresholdCarbonPct: 0.4, shape, steps };
}

const sae8620 = findGrade('sae-8620')!;

/** The three-step demo cycle on SAE 8620 (the bench cycle): boost, diffuse, drop to 850 °C. */
export function demoCycle(shape: PartShape = { kind: 'semi-infinite' }): Recipe {
  return {
    steel: { coreCarbonPct: 0.2, composition: sae8620.composition },
    model: 'agren',
    thresholdCarbonPct: 0.4,
    shape,
    steps: [soak(4, 925, 1.1), soak(2, 925, 0.8), soak(0.5, 850, 0.8)],
  };
}

/**
 * Plane sheet −l < x < l, initially C0, both faces held at C1 (Crank, The Mathematics of
 * Diffusion, 2nd ed., eq. 4.17), with x measured from a face: returns C at depth `depthM`.
 */
export function plateConstantSurface(
  depthM: number,
  timeS: number,
  D: number,
  halfThicknessM: number,
  c1: number,
  c0: number,
): number {
  const x = halfThicknessM - depthM;
  let sum = 0;
  for (let n = 0; n < 400; n++) {
    const k = 2 * n + 1;
    sum +=
      ((n % 2 ? -1 : 1) / k) *
      Math.exp((-D * k * k * Math.PI ** 2 * timeS) / (4 * halfThicknessM ** 2)) *
      Math.cos((k * Math.PI * x) / (2 * halfThicknessM));
  }
  return c0 + (c1 - c0) * (1 - (4 / Math.PI) * sum);
}

/** The first `count` positive roots of J0 (bracketed between the asymptotic estimates (n − 1/4)π ± 0.5). */
function besselJ0Roots(count: number): number[] {
  const roots: number[] = [];
  for (let n = 1; n <= count; n++) {
    const guess = (n - 0.25) * Math.PI;
    roots.push(brentRoot(besselj0, guess - 0.5, guess + 0.5, 1e-15)!.x);
  }
  return roots;
}
const J0_ROOTS = besselJ0Roots(200);

/**
 * Cylinder of radius a, initially C0, surface held at C1 (Crank, The Mathematics of
 * Diffusion, 2nd ed., eq. 5.22): returns C at depth `depthM` below the surface.
 */
export function cylinderConstantSurface(
  depthM: number,
  timeS: number,
  D: number,
  radiusM: number,
  c1: number,
  c0: number,
): number {
  const r = radiusM - depthM;
  let sum = 0;
  for (const root of J0_ROOTS) {
    const alpha = root / radiusM;
    sum += (Math.exp(-D * alpha * alpha * timeS) * besselj0(r * alpha)) / (alpha * besselj1(root));
  }
  return c0 + (c1 - c0) * (1 - (2 / radiusM) * sum);
}

/** Depth where a decreasing profile function crosses `thresholdPct`, m. */
export function crossingDepthM(profile: (depthM: number) => number, thresholdPct: number, maxDepthM: number): number {
  return brentRoot((x) => profile(x) - thresholdPct, 0, maxDepthM, 1e-13)!.x;
}

/**
 * Carbon taken up per unit area through a surface-transfer boundary, constant D (Crank, The
 * Mathematics of Diffusion, 2nd ed., §3.3.2): M_t = (Cp − C0)/h · [exp(h²Dt)·erfc(h√(Dt)) − 1 + 2h√(Dt/π)],
 * h = β/D; wt%·m.
 */
export function surfaceTransferUptake(
  timeS: number,
  D: number,
  betaMPerS: number,
  potentialPct: number,
  corePct: number,
): number {
  const h = betaMPerS / D;
  const s = h * Math.sqrt(D * timeS);
  return ((potentialPct - corePct) / h) * (erfcx(s) - 1 + (2 * s) / Math.sqrt(Math.PI));
}

/** Σ (C − C_core)·V over the grid: carbon taken up per unit surface area, wt%·m. */
export function gridUptake(
  run: { grid: { cells: number; volumeM: Float64Array }; carbonPct: Float64Array },
  corePct: number,
): number {
  let sum = 0;
  for (let i = 0; i < run.grid.cells; i++) sum += (run.carbonPct[i]! - corePct) * run.grid.volumeM[i]!;
  return sum;
}

export const relativeError = (value: number, reference: number) => Math.abs(value / reference - 1);
