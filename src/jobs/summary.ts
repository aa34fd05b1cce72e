/**
 * The supervisor's view of a shift: how many loads, which furnaces, what is still open,
 * and how each prediction compares with the lab's traverse. Pure functions over jobs.
 */
import { measuredEcdMm } from './labFigures';
import { OPEN_STATUSES, type Job, type JobStatus } from './schema';
import { DEFAULT_SHIFT_CONFIG, slotBefore, type ShiftConfig, type ShiftSlot } from './shift';

export interface EcdComparison {
  jobId: string;
  furnace: string;
  partNumber: string;
  predictedMm: number;
  measuredMm: number;
  /** Predicted − measured, mm: positive when the prediction was deeper than the lab found. */
  differenceMm: number;
  /** The difference as a share of the measured depth, %. */
  differencePct: number;
  /** Whether the lab depth lies inside the predicted uncertainty band (absent without a band). */
  withinBand?: boolean;
}

export interface ShiftSummary {
  loads: number;
  furnaces: string[];
  byStatus: Record<JobStatus, number>;
  /** Jobs still planned, in the furnace or on hold: those carried over from earlier shifts first. */
  openItems: Job[];
  /** How many of the open items an earlier shift left. */
  carriedOver: number;
  ecdPairs: EcdComparison[];
  /** Mean of the differences and of their absolute percentages; absent without pairs. */
  meanDifferenceMm?: number;
  meanAbsDifferencePct?: number;
}

/** A depth as a verdict compares it: the screens pass the rounding of the figures they show. */
export type DepthRounding = (mm: number) => number;
const asIs: DepthRounding = (mm) => mm;

/**
 * Prediction against the lab for one job, when both depths are known. Inside or outside the band is
 * judged on the depths as `round` gives them, so a lab depth shown as 0.75 mm is inside a band shown
 * as 0.75–1.00 mm.
 */
export function ecdComparison(job: Job, round: DepthRounding = asIs): EcdComparison | undefined {
  const predictedMm = job.prediction?.effectiveCaseDepthMm;
  const measuredMm = measuredEcdMm(job);
  if (predictedMm === undefined || measuredMm === undefined) return undefined;
  const differenceMm = predictedMm - measuredMm;
  const band = job.prediction?.ecdBandMm;
  return {
    jobId: job.id,
    furnace: job.furnace,
    partNumber: job.partNumber,
    predictedMm,
    measuredMm,
    differenceMm,
    differencePct: (differenceMm / measuredMm) * 100,
    ...(band ? { withinBand: round(measuredMm) >= round(band.minMm) && round(measuredMm) <= round(band.maxMm) } : {}),
  };
}

const mean = (values: readonly number[]) => values.reduce((sum, x) => sum + x, 0) / values.length;

/** Handover order: what is in a furnace first, then what waits to go in, then what is held; oldest first. */
const HANDOVER_ORDER: readonly JobStatus[] = ['inFurnace', 'planned', 'onHold'];

/**
 * The loads an earlier shift left open that the shift `slot` takes over, in handover order. A load
 * belongs to the shift it was entered in; it stays on every later shift's list until it is done,
 * released or rejected.
 */
export function carriedOverLoads(
  jobs: readonly Job[],
  slot: ShiftSlot,
  config: ShiftConfig = DEFAULT_SHIFT_CONFIG,
): Job[] {
  return jobs
    .filter((job) => OPEN_STATUSES.includes(job.status) && slotBefore(job, slot, config))
    .sort(
      (a, b) =>
        HANDOVER_ORDER.indexOf(a.status) - HANDOVER_ORDER.indexOf(b.status) || a.createdAt.localeCompare(b.createdAt),
    );
}

/** The summary of one shift's `jobs`; `carriedOver` (see carriedOverLoads) heads its open items. */
export function summarizeShift(
  jobs: readonly Job[],
  carriedOver: readonly Job[] = [],
  round: DepthRounding = asIs,
): ShiftSummary {
  const byStatus: Record<JobStatus, number> = { planned: 0, inFurnace: 0, done: 0, onHold: 0, rejected: 0 };
  for (const job of jobs) byStatus[job.status]++;
  const ecdPairs = jobs.map((job) => ecdComparison(job, round)).filter((pair): pair is EcdComparison => !!pair);
  return {
    loads: jobs.length,
    furnaces: [...new Set(jobs.map((job) => job.furnace))].sort(),
    byStatus,
    openItems: [...carriedOver, ...jobs.filter((job) => OPEN_STATUSES.includes(job.status))],
    carriedOver: carriedOver.length,
    ecdPairs,
    ...(ecdPairs.length > 0
      ? {
          meanDifferenceMm: mean(ecdPairs.map((p) => p.differenceMm)),
          meanAbsDifferencePct: mean(ecdPairs.map((p) => Math.abs(p.differencePct))),
        }
      : {}),
  };
}
