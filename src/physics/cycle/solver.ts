/**
 * The cycle solver: ∂C/∂t = ∇·(D(C,T)∇C) by finite volumes, implicit in time, with the
 * surface flux J = β·(Cp_eff − Cs) and a closed inner boundary (symmetry plane, bar axis or
 * undisturbed far field).
 *
 * Time: variable-step BDF2 (second order and L-stable, so the stiff modes of the fine surface
 * cells decay instead of ringing as they do under Crank–Nicolson when steps grow long), started
 * at every recipe step by one backward-Euler step, since the surface condition may jump there.
 * D(C) at the new time level by Picard iteration: a predictor from D at the carbon
 * extrapolated linearly from the two previous levels, then corrections with D at the new carbon.
 * D at a face joins the two neighbouring half-cells in series; the surface half-cell joins 1/β
 * in series, so the surface carbon need not be a node. All arrays are allocated once per run;
 * the time loop allocates nothing.
 */
import type { DiffusivityTable } from './diffusivityTable';
import type { Grid } from './grid';
import type { ScheduledStep } from './timeSchedule';

/** Picard corrections after the predictor, per time step. */
export const PICARD_CORRECTIONS = 1;
/** Largest step ratio taken by BDF2: variable-step BDF2 is zero-stable below 1 + √2 (Grigorieff, 1983). */
export const MAX_BDF2_RATIO = 2.4;

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
  /**
   * Carbon taken up per unit surface area, wt%·m, accumulated from the surface flux alone with
   * the scheme's own time weights; equals Σ (C − C_core)·V when nothing leaks (mass balance).
   */
  fluxUptakePctM: number;
}

/** Arrays of one run, allocated once. */
class Workspace {
  /** Carbon at the new time level (the latest iterate), wt%. */
  readonly carbon: Float64Array;
  /** Carbon at the last completed level, and the one before it. */
  readonly level1: Float64Array;
  readonly level0: Float64Array;
  /** Carbon at which D is evaluated. */
  readonly evalCarbon: Float64Array;
  readonly resistance: Float64Array;
  readonly conductance: Float64Array;
  readonly sweep: Float64Array;
  surfacePct: number;
  /** Flux uptake at the latest level and the one before it, wt%·m. */
  uptake = 0;
  uptakeBefore = 0;
  /** The last step did nothing (no austenite): transfer and diffusion switch on now, a jump. */
  frozen = false;

  constructor(
    readonly grid: Grid,
    readonly table: DiffusivityTable,
    corePct: number,
  ) {
    const n = grid.cells;
    this.carbon = new Float64Array(n).fill(corePct);
    this.level1 = new Float64Array(n);
    this.level0 = new Float64Array(n).fill(corePct);
    this.evalCarbon = new Float64Array(n);
    this.resistance = new Float64Array(n);
    this.conductance = new Float64Array(n + 1);
    this.sweep = new Float64Array(n);
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
 * Solves a0·V(Cⁿ⁺¹)/Δt + V(a1·Cⁿ + a2·Cⁿ⁻¹)/Δt = Σ face fluxes(Cⁿ⁺¹) into ws.carbon: the BDF2
 * rows (backward Euler when a2 = 0) assembled inside the forward sweep of the Thomas algorithm
 * (Gaussian elimination of a tridiagonal, diagonally dominant system; no pivoting needed).
 */
function solveLevel(ws: Workspace, dtS: number, a0: number, a1: number, a2: number, potentialPct: number): void {
  const { level1, level0, conductance: g, carbon: out, sweep } = ws;
  const { volumeM, cells: n } = ws.grid;
  const perDtS = 1 / dtS;
  let east = g[0]!;
  for (let i = 0; i < n; i++) {
    const west = east;
    east = g[i + 1]!;
    const capacity = volumeM[i]! * perDtS;
    let rhs = -capacity * (a1 * level1[i]! + a2 * level0[i]!);
    let pivot = a0 * capacity + west + east;
    if (i === 0) rhs += west * potentialPct;
    else {
      pivot -= west * sweep[i - 1]!;
      rhs += west * out[i - 1]!;
    }
    const inverse = 1 / pivot;
    sweep[i] = east * inverse;
    out[i] = rhs * inverse;
  }
  for (let i = n - 2; i >= 0; i--) out[i] = out[i]! + sweep[i]! * out[i + 1]!;
}

/**
 * One time step of length dtS; `ratio` is dtS over the previous step, or 0 to take a
 * backward-Euler step (a restart); `frozen` when the time step has no austenite. Leaves the
 * new level in ws.carbon.
 */
function advance(ws: Workspace, dtS: number, ratio: number, tempK: number, step: ScheduledStep, frozen: boolean): void {
  const { carbon, level1, level0, evalCarbon } = ws;
  level0.set(level1);
  level1.set(carbon);
  const uptakeN = ws.uptake;
  const uptakeNMinus1 = ws.uptakeBefore;
  ws.uptakeBefore = uptakeN;
  if (frozen) {
    ws.frozen = true;
    return;
  }
  if (ws.frozen) ratio = 0;
  ws.frozen = false;
  const transfer = step.effectivePotentialPct !== null;
  const potentialPct = step.effectivePotentialPct ?? 0;
  const n = ws.grid.cells;
  // Variable-step BDF2 coefficients (ω = Δtₙ/Δtₙ₋₁); ω = 0 gives backward Euler.
  const a0 = (1 + 2 * ratio) / (1 + ratio);
  const a1 = -(1 + ratio);
  const a2 = (ratio * ratio) / (1 + ratio);
  for (let i = 0; i < n; i++) evalCarbon[i] = level1[i]! + ratio * (level1[i]! - level0[i]!);
  ws.table.setTemperature(tempK);
  updateConductance(ws, evalCarbon, step.betaMPerS, transfer);
  solveLevel(ws, dtS, a0, a1, a2, potentialPct);
  for (let k = 0; k < PICARD_CORRECTIONS; k++) {
    updateConductance(ws, carbon, step.betaMPerS, transfer);
    solveLevel(ws, dtS, a0, a1, a2, potentialPct);
  }
  const c0 = carbon[0]!;
  const fluxPctMPerS = ws.conductance[0]! * (potentialPct - c0);
  // Surface carbon behind the first half-cell: Cs = C₀ + J·(h₀/2)/D₀, so that J = β·(Cp − Cs).
  ws.surfacePct = transfer ? c0 + fluxPctMPerS * ws.resistance[0]! : c0;
  // The scheme's row sum: a0·Mⁿ⁺¹ + a1·Mⁿ + a2·Mⁿ⁻¹ = Δt·Jⁿ⁺¹ (interior fluxes cancel, the inner face is closed).
  ws.uptake = (dtS * fluxPctMPerS - a1 * uptakeN - a2 * uptakeNMinus1) / a0;
}

/** Runs the scheduled steps (timeSchedule.ts) on `grid` from uniform core carbon. */
export function solveCycle(
  steps: readonly ScheduledStep[],
  grid: Grid,
  table: DiffusivityTable,
  corePct: number,
): SolverRun {
  const ws = new Workspace(grid, table, corePct);
  const size = 1 + steps.reduce((sum, s) => sum + s.endTimesS.length, 0);
  const historyTimeS = new Float64Array(size);
  const historyTempK = new Float64Array(size);
  const historySurfacePct = new Float64Array(size);
  const historyStep = new Int32Array(size);
  historyTempK[0] = steps[0]?.startTempK ?? 0;
  historySurfacePct[0] = corePct;
  let length = 1;
  let stepStartS = 0;
  for (let k = 0; k < steps.length; k++) {
    const step = steps[k]!;
    const ends = step.endTimesS;
    const rampKPerS = (step.endTempK - step.startTempK) / step.durationS;
    let previousDtS = 0;
    let localS = 0;
    for (let j = 0; j < ends.length; j++) {
      const endS = ends[j]!;
      const dtS = endS - localS;
      // Restart with backward Euler at each recipe step, and wherever the step ratio leaves BDF2's stable range.
      const ratio = j === 0 || dtS > MAX_BDF2_RATIO * previousDtS ? 0 : dtS / previousDtS;
      const tempK = step.startTempK + rampKPerS * endS;
      // The schedule puts a time step boundary on each edge of the austenite window.
      const hot = step.austenite;
      const frozen = !hot || endS <= hot.fromS || localS >= hot.untilS;
      advance(ws, dtS, ratio, tempK, step, frozen);
      localS = endS;
      previousDtS = dtS;
      historyTimeS[length] = stepStartS + endS;
      historyTempK[length] = tempK;
      historySurfacePct[length] = ws.surfacePct;
      historyStep[length] = k;
      length++;
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
    fluxUptakePctM: ws.uptake,
  };
}
