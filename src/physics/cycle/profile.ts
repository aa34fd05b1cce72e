/**
 * Reading depths and a sampled profile off a solved grid. The profile is piecewise linear
 * through the surface carbon at depth 0 and the cell centres, flat beyond the last centre
 * (the inner boundary is closed).
 */
import type { ProfilePoint } from './recipe';
import type { SolverRun } from './solver';

/** Points in the reported profile (100 intervals). */
export const PROFILE_POINTS = 101;
/** The profile reaches this far beyond the total case depth (×). */
export const PROFILE_DEPTH_FACTOR = 1.5;
/** Shallowest profile drawn, m, so a part with no case still shows its surface layer. */
export const MIN_PROFILE_DEPTH_M = 1e-4;

const depthAt = (run: SolverRun, node: number) => (node === 0 ? 0 : run.grid.centreDepthM[node - 1]!);
const carbonAt = (run: SolverRun, node: number) => (node === 0 ? run.surfaceCarbonPct : run.carbonPct[node - 1]!);

/**
 * Depth below which carbon stays under `thresholdPct`, m, by linear interpolation between
 * nodes. Taken from the deepest crossing, so a surface lowered by a diffuse step (or
 * decarburized) still reports the case beneath it; 0 when no node reaches the threshold,
 * the whole extent when the part is carburized through.
 */
export function depthToCarbonM(run: SolverRun, thresholdPct: number): number {
  const nodes = run.grid.cells + 1;
  let last = -1;
  for (let node = nodes - 1; node >= 0; node--) {
    if (carbonAt(run, node) >= thresholdPct) {
      last = node;
      break;
    }
  }
  if (last < 0) return 0;
  if (last === nodes - 1) return run.grid.extentM;
  const c0 = carbonAt(run, last);
  const c1 = carbonAt(run, last + 1);
  const x0 = depthAt(run, last);
  const x1 = depthAt(run, last + 1);
  return x0 + ((c0 - thresholdPct) / (c0 - c1)) * (x1 - x0);
}

/** Carbon at `depthM`, wt%, with the node search starting at `fromNode`; returns the node used. */
function interpolate(run: SolverRun, depthM: number, fromNode: number, out: { carbonPct: number }): number {
  const nodes = run.grid.cells + 1;
  let node = fromNode;
  while (node + 1 < nodes && depthAt(run, node + 1) < depthM) node++;
  if (node + 1 >= nodes) {
    out.carbonPct = carbonAt(run, nodes - 1);
    return node;
  }
  const x0 = depthAt(run, node);
  const x1 = depthAt(run, node + 1);
  const w = x1 > x0 ? Math.min(Math.max((depthM - x0) / (x1 - x0), 0), 1) : 0;
  out.carbonPct = carbonAt(run, node) + w * (carbonAt(run, node + 1) - carbonAt(run, node));
  return node;
}

/** `PROFILE_POINTS` evenly spaced points from the surface to `maxDepthM`, with hardness from carbon. */
export function sampleProfile(
  run: SolverRun,
  maxDepthM: number,
  hardnessHrc: (carbonPct: number) => number,
): ProfilePoint[] {
  const points: ProfilePoint[] = [];
  const value = { carbonPct: 0 };
  let node = 0;
  for (let k = 0; k < PROFILE_POINTS; k++) {
    const depthM = (maxDepthM * k) / (PROFILE_POINTS - 1);
    node = interpolate(run, depthM, node, value);
    points.push({
      depthMm: depthM * 1e3,
      carbonPct: value.carbonPct,
      hardnessHrc: hardnessHrc(value.carbonPct),
    });
  }
  return points;
}

/** How deep to draw the profile, m: past the total case, within the modelled part. */
export function profileDepthM(run: SolverRun, totalCaseDepthM: number): number {
  return Math.min(run.grid.extentM, Math.max(PROFILE_DEPTH_FACTOR * totalCaseDepthM, MIN_PROFILE_DEPTH_M));
}
