/**
 * The cycle solver: ∂C/∂t = ∇·(D(C,T)∇C) by finite volumes, implicit in time, with the
 * surface flux J = β·(Cp_eff − Cs) and a closed inner boundary (symmetry plane, bar axis or
 * undisturbed far field).
 *
 * Time: Crank–Nicolson, started after every jump of the surface condition by backward-Euler
 * sub-steps (Rannacher, Numer. Math. 43 (1984) 309) so the jump leaves no oscillation.
 * D is evaluated at the mid-step carbon by Picard iteration: a predictor with D(Cⁿ), then
 * corrections with D(θ·C* + (1 − θ)·Cⁿ). D at a face joins the two neighbouring half-cells in
 * series; the surface half-cell joins 1/β in series, so the surface carbon need not be a node.
 * All arrays are allocated once per run; the time loop allocates nothing.
 */
import type { DiffusivityTable } from './diffusivityTable';
import type { Grid } from './grid';
import { EUTECTOID_TEMP_K, type PlannedStep } from './plan';

/** Picard corrections after the predictor, per time step. */
export const PICARD_CORRECTIONS = 1;
/** Backward-Euler sub-steps replacing the first step after a jump (Rannacher start). */
export const DAMPED_SUBSTEPS = 2;
const CRANK_NICOLSON = 0.5;
const BACKWARD_EULER = 1;

export interface SolverRun {
  grid: Grid;
  /** Final carbon of each cell, wt%. */
  carbonPct: Float64Array;
  /** Final surface carbon, wt%. */
  surfaceCarbonPct: number;
  /** After every time step (and at time 0): time, furnace temperature, surface carbon, recipe step. */
  historyTimeS: Float64Array;
  historyTempK: Float64Array;
  historySurfacePct: Float64Array;
  historyStep: Int32Array;
  historyLength: number;
  /** ∫ J dt per unit surface area exactly as the scheme applied it, wt%·m. */
  fluxIntegralPctM: number;
}

/** Arrays of one run, allocated once. */
class Workspace {
  readonly carbon: Float64Array;
  readonly old: Float64Array;
  readonly evalCarbon: Float64Array;
  readonly resistance: Float64Array;
  readonly conductance: Float64Array;
  readonly scratch: Float64Array;
  surfacePct: number;

  constructor(
    readonly grid: Grid,
    readonly table: DiffusivityTable,
    corePct: number,
  ) {
    const n = grid.cells;
    this.carbon = new Float64Array(n).fill(corePct);
    this.old = new Float64Array(n);
    this.evalCarbon = new Float64Array(n);
    this.resistance = new Float64Array(n);
    this.conductance = new Float64Array(n + 1);
    this.scratch = new Float64Array(n);
    this.surfacePct = corePct;
  }
}

/**
 * Face conductances from D at `source` carbon: half-cell resistances (half-width / D) in
 * series between neighbours; at the surface 1/β in series with the first half-cell.
 */
function updateConductance(ws: Workspace, source: Float64Array, betaMPerS: number, transfer: boolean): void {
  const { resistance: r, conductance: g, table } = ws;
  const { halfWidthM, faceArea, cells: n } = ws.grid;
  for (let i = 0; i < n; i++) r[i] = halfWidthM[i]! / table.at(source[i]!);
  g[0] = transfer ? faceArea[0]! / (1 / betaMPerS + r[0]!) : 0;
  for (let i = 1; i < n; i++) g[i] = faceArea[i]! / (r[i - 1]! + r[i]!);
  g[n] = 0;
}

/**
 * Builds the θ-scheme rows for the current conductances and solves them into ws.carbon by
 * the Thomas algorithm (Gaussian elimination of a tridiagonal, diagonally dominant system),
 * the forward sweep fused with assembling the rows.
 */
function solveImplicit(ws: Workspace, dtS: number, theta: number, potentialPct: number): void {
  const { old, conductance: g, carbon: out, scratch } = ws;
  const { volumeM, cells: n } = ws.grid;
  const explicit = 1 - theta;
  const perDtS = 1 / dtS;
  // Surface row: its outer neighbour is the atmosphere, a known value.
  let west = g[0]!;
  let east = g[1]!;
  let c = old[0]!;
  let next = n > 1 ? old[1]! : c;
  let capacity = volumeM[0]! * perDtS;
  let inverse = 1 / (capacity + theta * (west + east));
  scratch[0] = -theta * east * inverse;
  out[0] = (capacity * c + explicit * (west * (potentialPct - c) + east * (next - c)) + theta * west * potentialPct) * inverse;
  for (let i = 1; i < n; i++) {
    const previous = c;
    c = next;
    next = i + 1 < n ? old[i + 1]! : c;
    west = east;
    east = g[i + 1]!;
    capacity = volumeM[i]! * perDtS;
    const rhs = capacity * c + explicit * (west * (previous - c) + east * (next - c));
    const lower = -theta * west;
    inverse = 1 / (capacity + theta * (west + east) - lower * scratch[i - 1]!);
    scratch[i] = -theta * east * inverse;
    out[i] = (rhs - lower * out[i - 1]!) * inverse;
  }
  for (let i = n - 2; i >= 0; i--) out[i] = out[i]! - scratch[i]! * out[i + 1]!;
}

/** One time step; returns ∫ J dt over it per unit surface area, wt%·m. */
function advance(ws: Workspace, dtS: number, theta: number, tempK: number, step: PlannedStep): number {
  if (tempK <= EUTECTOID_TEMP_K) return 0;
  const transfer = step.effectivePotentialPct !== null;
  const potentialPct = step.effectivePotentialPct ?? 0;
  const { carbon, old, evalCarbon } = ws;
  const n = ws.grid.cells;
  old.set(carbon);
  ws.table.setTemperature(tempK);
  updateConductance(ws, old, step.betaMPerS, transfer);
  solveImplicit(ws, dtS, theta, potentialPct);
  for (let k = 0; k < PICARD_CORRECTIONS; k++) {
    for (let i = 0; i < n; i++) evalCarbon[i] = theta * carbon[i]! + (1 - theta) * old[i]!;
    updateConductance(ws, evalCarbon, step.betaMPerS, transfer);
    solveImplicit(ws, dtS, theta, potentialPct);
  }
  const surfaceG = ws.conductance[0]!;
  const c0 = carbon[0]!;
  // Surface carbon behind the first half-cell: Cs = C₀ + J·(h₀/2)/D₀, so that J = β·(Cp − Cs).
  ws.surfacePct = transfer ? c0 + surfaceG * (potentialPct - c0) * ws.resistance[0]! : c0;
  return dtS * surfaceG * (potentialPct - (theta * c0 + (1 - theta) * old[0]!));
}

/** Number of history entries a plan produces (time 0 plus every time step). */
function historySize(steps: readonly PlannedStep[]): number {
  return 1 + steps.reduce((sum, s) => sum + s.timeSteps + (s.jumps ? DAMPED_SUBSTEPS - 1 : 0), 0);
}

/**
 * Runs the planned steps on `grid` from uniform core carbon. Time points within a step are
 * t = duration·(j/M)² after a jump (evenly spaced in √t, as diffusion from a jump evolves)
 * and evenly spaced otherwise.
 */
export function solveCycle(
  steps: readonly PlannedStep[],
  grid: Grid,
  table: DiffusivityTable,
  corePct: number,
): SolverRun {
  const ws = new Workspace(grid, table, corePct);
  const size = historySize(steps);
  const historyTimeS = new Float64Array(size);
  const historyTempK = new Float64Array(size);
  const historySurfacePct = new Float64Array(size);
  const historyStep = new Int32Array(size);
  historyTempK[0] = steps[0]?.startTempK ?? 0;
  historySurfacePct[0] = corePct;
  let length = 1;
  let fluxIntegral = 0;
  let stepStartS = 0;
  for (let k = 0; k < steps.length; k++) {
    const step = steps[k]!;
    const m = step.timeSteps;
    const rampKPerS = (step.endTempK - step.startTempK) / step.durationS;
    let localS = 0;
    for (let j = 1; j <= m; j++) {
      const fraction = j / m;
      const endS = step.durationS * (step.jumps ? fraction * fraction : fraction);
      const substeps = step.jumps && j === 1 ? DAMPED_SUBSTEPS : 1;
      const theta = substeps > 1 ? BACKWARD_EULER : CRANK_NICOLSON;
      const dtS = (endS - localS) / substeps;
      for (let s = 0; s < substeps; s++) {
        // D at the time the scheme weights: the mid-step for Crank–Nicolson, the end for Euler.
        const evalTempK = step.startTempK + rampKPerS * (localS + theta * dtS);
        fluxIntegral += advance(ws, dtS, theta, evalTempK, step);
        localS += dtS;
        historyTimeS[length] = stepStartS + localS;
        historyTempK[length] = step.startTempK + rampKPerS * localS;
        historySurfacePct[length] = ws.surfacePct;
        historyStep[length] = k;
        length++;
      }
      localS = endS;
    }
    stepStartS += step.durationS;
  }
  return {
    grid,
    carbonPct: ws.carbon,
    surfaceCarbonPct: ws.surfacePct,
    historyTimeS,
    historyTempK,
    historySurfacePct,
    historyStep,
    historyLength: length,
    fluxIntegralPctM: fluxIntegral,
  };
}
