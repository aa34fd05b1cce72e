/**
 * D(C) at one temperature, tabulated over the carbon range a run can reach and read by
 * linear interpolation. The time loop needs D in every cell twice per time step; a soak
 * keeps its temperature, so the table is built once per soak instead of evaluating the
 * model (an exponential each) thousands of times. Carbon outside the range (a tiny
 * overshoot of the scheme) reads the end value.
 */
import type { DiffusivityFunction } from '../diffusivity';

/** Table intervals at resolution 1; relative error of D about (ΔC)²·|D''|/8D, below 1e-4 here. */
export const TABLE_INTERVALS = 64;

export class DiffusivityTable {
  readonly values: Float64Array;
  readonly intervals: number;
  /** Carbon at the first entry, wt%. */
  readonly minPct: number;
  /** Entries per wt% of carbon (0 when the range is a single value). */
  readonly perPct: number;
  private tempK = Number.NaN;

  constructor(
    private readonly diffusivity: DiffusivityFunction,
    minPct: number,
    maxPct: number,
    resolution: number,
  ) {
    this.intervals = Math.max(1, Math.round(TABLE_INTERVALS * resolution));
    this.values = new Float64Array(this.intervals + 1);
    this.minPct = minPct;
    this.perPct = maxPct > minPct ? this.intervals / (maxPct - minPct) : 0;
  }

  /** Makes the table hold D at `tempK`, rebuilding only when the temperature changed. */
  setTemperature(tempK: number): void {
    if (tempK === this.tempK) return;
    this.tempK = tempK;
    const step = this.perPct > 0 ? 1 / this.perPct : 0;
    for (let k = 0; k <= this.intervals; k++) this.values[k] = this.diffusivity(tempK, this.minPct + k * step);
  }

  /** D at `carbonPct`, m²/s, for the current temperature. */
  at(carbonPct: number): number {
    const last = this.intervals;
    let u = (carbonPct - this.minPct) * this.perPct;
    if (!(u > 0)) u = 0;
    else if (u > last) u = last;
    const k = u < last ? Math.floor(u) : last - 1;
    const v0 = this.values[k]!;
    return v0 + (u - k) * (this.values[k + 1]! - v0);
  }
}
