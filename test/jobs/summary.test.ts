import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import type { Job } from '../../src/jobs/schema';
import { ecdComparison, summarizeShift } from '../../src/jobs/summary';

const base = demoJobs({ count: 1, end: new Date('2025-05-01T12:00:00Z'), seed: 11 })[0]!;
const make = (overrides: Partial<Job>): Job => ({ ...base, id: crypto.randomUUID(), lab: undefined, ...overrides });
const { ecdBandMm: _band, ...bandless } = base.prediction!;
const predicted = (mm: number) => ({ ...bandless, effectiveCaseDepthMm: mm });

describe('shift summary', () => {
  const jobs = [
    make({ furnace: 'F2', status: 'done', prediction: predicted(0.85), lab: { ecdMm: 0.8 } }),
    make({ furnace: 'F1', status: 'done', prediction: predicted(1.35), lab: { ecdMm: 1.5 } }),
    make({ furnace: 'F1', status: 'inFurnace' }),
    make({ furnace: 'F3', status: 'onHold' }),
    make({ furnace: 'F1', status: 'planned' }),
    make({ furnace: 'F3', status: 'rejected', lab: { surfaceHardness: { value: 55, unit: 'HRC' } } }),
  ];
  const summary = summarizeShift(jobs);

  it('counts loads, lists furnaces once, and the open items (planned, in furnace, on hold)', () => {
    expect(summary.loads).toBe(6);
    expect(summary.furnaces).toEqual(['F1', 'F2', 'F3']);
    expect(summary.openItems.map((j) => j.status)).toEqual(['inFurnace', 'onHold', 'planned']);
    expect(summary.byStatus).toEqual({ planned: 1, inFurnace: 1, done: 2, onHold: 1, rejected: 1 });
  });

  it('pairs prediction and lab depth: difference = predicted − measured, % of measured', () => {
    expect(summary.ecdPairs).toHaveLength(2);
    const [a, b] = summary.ecdPairs;
    expect(a!.differenceMm).toBeCloseTo(0.05, 12);
    expect(a!.differencePct).toBeCloseTo(6.25, 10); // 0.05 / 0.80
    expect(b!.differenceMm).toBeCloseTo(-0.15, 12);
    expect(b!.differencePct).toBeCloseTo(-10, 10); // −0.15 / 1.50
    expect(summary.meanDifferenceMm).toBeCloseTo(-0.05, 12);
    expect(summary.meanAbsDifferencePct).toBeCloseTo(8.125, 10);
  });

  it('says whether the lab depth falls inside the predicted uncertainty band', () => {
    const banded = (measuredMm: number) =>
      ecdComparison(
        make({
          prediction: { ...predicted(0.85), ecdBandMm: { minMm: 0.78, maxMm: 0.93 } },
          lab: { ecdMm: measuredMm },
        }),
      );
    expect(banded(0.78)?.withinBand).toBe(true);
    expect(banded(0.93)?.withinBand).toBe(true);
    expect(banded(0.77)?.withinBand).toBe(false);
    expect(banded(0.95)?.withinBand).toBe(false);
    expect(ecdComparison(make({ prediction: predicted(0.85), lab: { ecdMm: 0.8 } }))).not.toHaveProperty('withinBand');
  });

  it('no pairs without both depths; an empty shift gives zeros and no means', () => {
    expect(ecdComparison(make({ prediction: undefined, lab: { ecdMm: 0.8 } }))).toBeUndefined();
    const empty = summarizeShift([]);
    expect(empty).toEqual({
      loads: 0,
      furnaces: [],
      byStatus: { planned: 0, inFurnace: 0, done: 0, onHold: 0, rejected: 0 },
      openItems: [],
      ecdPairs: [],
    });
  });
});
