/**
 * Where the time steps of one recipe step fall. They grow geometrically from a small first
 * step, because diffusion after a change of the surface condition is fastest at first, and a
 * constant ratio Δt/t spreads the error evenly. On a ramp the growth runs in diffusion
 * progress ∫D dt rather than in clock time, so the steps crowd where the furnace is hot and
 * carbon moves, not where it is still heating up.
 */
import { EUTECTOID_TEMP_K, type DiffusivityFunction } from './plan';

/** Sub-intervals for ∫D dt over a ramp (D varies smoothly; trapezoids suffice). */
export const RAMP_SAMPLES = 64;

/**
 * Cumulative ∫D dt at RAMP_SAMPLES + 1 evenly spaced times of a linear ramp, m², with D at
 * `carbonPct`; zero below the eutectoid.
 */
export function rampProgress(
  durationS: number,
  startTempK: number,
  endTempK: number,
  diffusivity: DiffusivityFunction,
  carbonPct: number,
): Float64Array {
  const progress = new Float64Array(RAMP_SAMPLES + 1);
  const d = (k: number) => {
    const tempK = startTempK + ((endTempK - startTempK) * k) / RAMP_SAMPLES;
    return tempK > EUTECTOID_TEMP_K ? diffusivity(tempK, carbonPct) : 0;
  };
  const dtS = durationS / RAMP_SAMPLES;
  let previous = d(0);
  for (let k = 1; k <= RAMP_SAMPLES; k++) {
    const next = d(k);
    progress[k] = progress[k - 1]! + ((previous + next) / 2) * dtS;
    previous = next;
  }
  return progress;
}

/** Clock time at which a ramp's cumulative progress reaches `target`, s (linear within a sample). */
function timeAtProgress(progress: Float64Array, durationS: number, target: number, from: { k: number }): number {
  let k = from.k;
  while (k < RAMP_SAMPLES - 1 && progress[k + 1]! < target) k++;
  from.k = k;
  const p0 = progress[k]!;
  const p1 = progress[k + 1]!;
  const fraction = p1 > p0 ? Math.min(Math.max((target - p0) / (p1 - p0), 0), 1) : 1;
  return ((k + fraction) * durationS) / RAMP_SAMPLES;
}

/**
 * End times of `count` time steps over `durationS`, each `growth` times the one before; on a
 * ramp (`progress` given) the geometric spacing applies to ∫D dt. The last is exactly durationS.
 */
export function stepEndTimes(durationS: number, count: number, growth: number, progress?: Float64Array): Float64Array {
  const total = progress ? progress[RAMP_SAMPLES]! : durationS;
  const ends = new Float64Array(count);
  const cursor = { k: 0 };
  for (let j = 1; j <= count; j++) {
    const share = growth > 1 ? (growth ** j - 1) / (growth ** count - 1) : j / count;
    const target = share * total;
    ends[j - 1] =
      j === count
        ? durationS
        : !progress || !(total > 0)
          ? share * durationS
          : timeAtProgress(progress, durationS, target, cursor);
  }
  return ends;
}
