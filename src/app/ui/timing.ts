/**
 * Runs a computation and records how long it took as a User Timing measure named
 * `casefront:<name>` (the browser tests read them to report what a plan or a band costs).
 */
const KEPT_MEASURES = 50;

export function timed<T>(name: string, work: () => T): T {
  const start = performance.now();
  try {
    return work();
  } finally {
    const entry = `casefront:${name}`;
    // Computing as you type adds one measure per keystroke: keep the buffer small.
    if (performance.getEntriesByName(entry).length >= KEPT_MEASURES) performance.clearMeasures(entry);
    performance.measure(entry, { start, end: performance.now() });
  }
}

/** Records a computation timed elsewhere (in the worker) as the measure `casefront:<name>`, ending now. */
export function recordMeasure(name: string, durationMs: number): void {
  const entry = `casefront:${name}`;
  if (performance.getEntriesByName(entry).length >= KEPT_MEASURES) performance.clearMeasures(entry);
  const end = performance.now();
  performance.measure(entry, { start: Math.max(0, end - durationMs), end });
}
