/**
 * Boost and diffuse times for a target effective case depth (ECD) and surface carbon, by root
 * finding on the cycle simulator.
 *
 * The unknowns are the carburizing time T (boost + diffuse) and the boost share f of it. ECD
 * rises with T and with f; the surface carbon left after the diffuse step rises with f. The search
 * walks the curve of constant ECD: for each f an inner solve finds T (ECD is nearly linear in √T,
 * so a √t-scaled step and Brent take three or four runs), and an outer Brent solve on f meets the
 * surface carbon. The ends of that curve (f = 0 and f at its limit, or where T hits a time limit)
 * bound the surface carbon any plan of that depth can leave, which tells what binds when the
 * target is out of reach.
 */
import { brentRoot } from '../rootFinding';
import type { TargetRange } from './readPlanRequest';
import type { Probe } from './planModel';

export interface SearchLimits {
  /** Boost + diffuse time allowed, h. */
  minCarburizeH: number;
  maxCarburizeH: number;
  /** Largest boost share of the carburizing time (the diffuse step keeps the rest). */
  maxBoostShare: number;
}

export interface PlanPoint {
  boostShare: number;
  carburizeH: number;
  probe: Probe;
}

export interface Aim {
  ecdMm: number;
  surfacePct: number;
}

export type SearchOutcome =
  /** Even the longest, richest plan stays shallower than the target. */
  | { kind: 'caseTooShallow'; point: PlanPoint }
  /** Even the shortest, leanest plan is deeper than the target. */
  | { kind: 'caseTooDeep'; point: PlanPoint }
  /**
   * A plan of the aimed depth; `surface` says whether the surface target lies inside the range
   * such plans can leave (`surfaceRangePct`); if not, the point is the nearest end of that range.
   */
  | {
      kind: 'depthMet';
      surface: 'met' | 'tooHigh' | 'tooLow';
      point: PlanPoint;
      aim: Aim;
      surfaceRangePct: TargetRange;
    };

/**
 * A solve stops once its value is this close to the aim: far inside what a hardness traverse or a
 * carbon analysis resolves (about 0.02–0.05 mm and 0.02 %C), and near the simulator's own accuracy.
 */
export const ECD_TOLERANCE = 2e-4; // relative to the aimed ECD
export const SURFACE_TOLERANCE_PCT = 5e-4;
/** Relative tolerance on √T, should the value tolerance not be met first. */
export const TIME_TOLERANCE = 1e-4;
/** Tolerance of the outer solve on 1 + f (Brent's tolerance is relative): f within about 1e-3. */
export const SHARE_TOLERANCE = 1e-3;
/** Largest factor between two trial values of √T before a bracket is found. */
const MAX_STEP_FACTOR = 4;
/** Trial steps go this much beyond the predicted root, so the root is bracketed, not crept up on from one side. */
const OVERSHOOT = 0.1;
const MAX_EXPANSIONS = 40;

export interface Solved {
  x: number;
  status: 'root' | 'belowRange' | 'aboveRange';
}

/**
 * Root of an increasing g on [lo, hi]: trial steps from `start`, first by `propose(x, g(x))`,
 * then by the secant through the last two trials, until the sign changes; then Brent on that
 * bracket. 'belowRange' when g(lo) > 0, 'aboveRange' when g(hi) < 0.
 */
export function solveIncreasing(
  g: (x: number) => number,
  start: number,
  propose: (x: number, gx: number) => number,
  lo: number,
  hi: number,
  relTol: number,
  valueTol: number,
): Solved {
  const clamp = (x: number) => Math.min(hi, Math.max(lo, x));
  let a = clamp(start);
  let ga = g(a);
  let before: { x: number; gx: number } | undefined;
  for (let i = 0; i < MAX_EXPANSIONS && Number.isFinite(ga) && Math.abs(ga) > valueTol; i++) {
    const up = ga < 0;
    const secant = before && before.gx !== ga ? a - (ga * (a - before.x)) / (ga - before.gx) : Number.NaN;
    const predicted = (up ? secant > a : secant < a) ? secant : propose(a, ga);
    const limited = Math.min(a * MAX_STEP_FACTOR, Math.max(a / MAX_STEP_FACTOR, a + (predicted - a) * (1 + OVERSHOOT)));
    let b = clamp(limited);
    if (!(b !== a)) b = up ? hi : lo;
    if (b === a) return { x: a, status: up ? 'aboveRange' : 'belowRange' };
    const gb = g(b);
    if (up !== gb < 0) {
      if (Math.abs(gb) <= valueTol) return { x: b, status: 'root' };
      const root = brentRoot(g, Math.min(a, b), Math.max(a, b), relTol, undefined, valueTol);
      return { x: root?.x ?? (Math.abs(ga) < Math.abs(gb) ? a : b), status: 'root' };
    }
    before = { x: a, gx: ga };
    a = b;
    ga = gb;
  }
  return { x: a, status: 'root' };
}

/** Probes by (boost share, carburizing time), each pair simulated once. */
function cached(probe: (boostShare: number, carburizeH: number) => Probe) {
  const seen = new Map<string, Probe>();
  return (boostShare: number, carburizeH: number): PlanPoint => {
    const key = `${boostShare}|${carburizeH}`;
    let result = seen.get(key);
    if (!result) {
      result = probe(boostShare, carburizeH);
      seen.set(key, result);
    }
    return { boostShare, carburizeH, probe: result };
  };
}

const middle = (low: number, high: number) => (low + high) / 2;

/** Root in f ∈ [fLow, fHigh] of an increasing h, solved on 1 + f so Brent's relative tolerance acts as an absolute one. */
function solveShare(h: (f: number) => number, fLow: number, fHigh: number, valueTol: number): number | undefined {
  // The ends map back exactly, so their cached runs are found again.
  const share = (x: number) => (x === 1 + fLow ? fLow : x === 1 + fHigh ? fHigh : x - 1);
  const root = brentRoot((x) => h(share(x)), 1 + fLow, 1 + fHigh, SHARE_TOLERANCE, undefined, valueTol);
  return root === undefined ? undefined : share(root.x);
}

export function searchPlan(
  probe: (boostShare: number, carburizeH: number) => Probe,
  limits: SearchLimits,
  targetEcdMm: TargetRange,
  targetSurfacePct: TargetRange,
): SearchOutcome {
  const at = cached(probe);
  const { minCarburizeH: minH, maxCarburizeH: maxH, maxBoostShare: maxShare } = limits;
  const deepest = at(maxShare, maxH);
  if (deepest.probe.ecdMm < targetEcdMm.min) return { kind: 'caseTooShallow', point: deepest };
  const shallowest = at(0, minH);
  if (shallowest.probe.ecdMm > targetEcdMm.max) return { kind: 'caseTooDeep', point: shallowest };
  // The middle of what is both wanted and reachable: the most room for scatter on either side.
  const ecdAim = middle(
    Math.max(targetEcdMm.min, shallowest.probe.ecdMm),
    Math.min(targetEcdMm.max, deepest.probe.ecdMm),
  );

  const ecdExcess = (p: PlanPoint) => p.probe.ecdMm - ecdAim;
  const ecdTol = ECD_TOLERANCE * ecdAim;
  /** Carburizing time for the aimed ECD at boost share f, searched in √T from a guess. */
  const timeFor = (f: number, guessH: number): Solved =>
    solveIncreasing(
      (s) => ecdExcess(at(f, s * s)),
      Math.sqrt(guessH),
      (s, excess) =>
        s * Math.min(MAX_STEP_FACTOR, Math.max(1 / MAX_STEP_FACTOR, ecdAim / Math.max(excess + ecdAim, 1e-9))),
      Math.sqrt(minH),
      Math.sqrt(maxH),
      TIME_TOLERANCE,
      ecdTol,
    );
  const pointAt = (f: number, guessH: number): PlanPoint => {
    const s = timeFor(f, guessH).x;
    return at(f, s * s);
  };

  // Ends of the constant-ECD curve: no boost, unless even the longest cycle then falls short…
  const noBoost = timeFor(0, Math.sqrt(minH * maxH));
  const low =
    noBoost.status === 'aboveRange'
      ? at(solveShare((f) => ecdExcess(at(f, maxH)), 0, maxShare, ecdTol) ?? maxShare, maxH)
      : at(0, noBoost.x * noBoost.x);
  // …and the most boost, unless even the shortest cycle then overshoots.
  const mostBoost = timeFor(maxShare, low.carburizeH);
  const high =
    mostBoost.status === 'belowRange'
      ? at(solveShare((f) => ecdExcess(at(f, minH)), 0, maxShare, ecdTol) ?? 0, minH)
      : at(maxShare, mostBoost.x * mostBoost.x);

  const lowPct = low.probe.surfacePct;
  const highPct = high.probe.surfacePct;
  const surfaceRangePct = { min: Math.min(lowPct, highPct), max: Math.max(lowPct, highPct) };
  const wantedLow = Math.max(targetSurfacePct.min, surfaceRangePct.min);
  const wantedHigh = Math.min(targetSurfacePct.max, surfaceRangePct.max);
  const depthMet = (surface: 'met' | 'tooHigh' | 'tooLow', point: PlanPoint, surfaceAim: number): SearchOutcome => ({
    kind: 'depthMet',
    surface,
    point,
    aim: { ecdMm: ecdAim, surfacePct: surfaceAim },
    surfaceRangePct,
  });
  if (wantedLow > wantedHigh) {
    const tooHigh = targetSurfacePct.min > surfaceRangePct.max;
    const nearest = highPct >= lowPct === tooHigh ? high : low;
    return depthMet(tooHigh ? 'tooHigh' : 'tooLow', nearest, tooHigh ? targetSurfacePct.min : targetSurfacePct.max);
  }
  // Not the reachable point nearest the drawing's middle: the ends of the reachable range are where a
  // plan degenerates (no boost, or the shortest diffuse, which the atmosphere's lag after a change of
  // potential makes unreliable), so the middle keeps room on every side.
  const surfaceAim = middle(wantedLow, wantedHigh);
  if (low.boostShare >= high.boostShare) return depthMet('met', low, surfaceAim);

  // Along the curve: T for each f, guessed by linear interpolation in √T between the ends.
  const sLow = Math.sqrt(low.carburizeH);
  const sHigh = Math.sqrt(high.carburizeH);
  const along = new Map<number, PlanPoint>([
    [low.boostShare, low],
    [high.boostShare, high],
  ]);
  const onCurve = (f: number): PlanPoint => {
    let point = along.get(f);
    if (!point) {
      const share = (f - low.boostShare) / (high.boostShare - low.boostShare);
      point = pointAt(f, (sLow + share * (sHigh - sLow)) ** 2);
      along.set(f, point);
    }
    return point;
  };
  const f = solveShare(
    (share) => onCurve(share).probe.surfacePct - surfaceAim,
    low.boostShare,
    high.boostShare,
    SURFACE_TOLERANCE_PCT,
  );
  const best =
    f === undefined
      ? [...along.values()].reduce((a, b) =>
          Math.abs(b.probe.surfacePct - surfaceAim) < Math.abs(a.probe.surfacePct - surfaceAim) ? b : a,
        )
      : onCurve(f);
  return depthMet('met', best, surfaceAim);
}
