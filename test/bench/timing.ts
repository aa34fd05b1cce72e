/** Shared timing helpers for the benchmarks: medians of repeated runs after a warm-up. */
import { performance } from 'node:perf_hooks';

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Median wall time of `fn` in ms over `runs` runs, after `warmup` untimed runs. */
export async function medianMs(fn: () => unknown, runs = 20, warmup = 5): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    await fn();
    times.push(performance.now() - start);
  }
  return median(times);
}
