import * as v from 'valibot';
import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { JobSchema } from '../../src/jobs/schema';
import { summarizeShift } from '../../src/jobs/summary';

const END = new Date('2025-06-30T12:00:00.000Z');

describe('demo log (invented plant: furnaces F1–F3, parts KR-2231, KR-4410, KR-0907)', () => {
  const jobs = demoJobs({ count: 2000, end: END, seed: 42 });

  it('every record is valid and ids are unique', () => {
    for (const job of jobs) expect(v.safeParse(JobSchema, job).success).toBe(true);
    expect(new Set(jobs.map((j) => j.id)).size).toBe(jobs.length);
  });

  it('is the same for the same seed and differs for another', () => {
    expect(demoJobs({ count: 50, end: END, seed: 42 })).toEqual(demoJobs({ count: 50, end: END, seed: 42 }));
    expect(demoJobs({ count: 50, end: END, seed: 43 })).not.toEqual(demoJobs({ count: 50, end: END, seed: 42 }));
  });

  it('uses only the scenario furnaces and parts, over the year before the end', () => {
    expect(new Set(jobs.map((j) => j.furnace))).toEqual(new Set(['F1', 'F2', 'F3']));
    expect(new Set(jobs.map((j) => j.partNumber))).toEqual(new Set(['KR-2231', 'KR-4410', 'KR-0907']));
    const first = Date.parse(jobs[0]!.createdAt);
    expect(END.getTime() - first).toBeLessThan(366 * 24 * 3600e3);
    expect(END.getTime() - first).toBeGreaterThan(360 * 24 * 3600e3);
  });

  it('predictions meet the drawing ranges (physics engine, time for the mid-range ECD)', () => {
    // Ranges from the scenario: KR-2231 0.75–1.00, KR-4410 1.2–1.5, KR-0907 0.25–0.40 mm.
    const range = { 'KR-2231': [0.75, 1.0], 'KR-4410': [1.2, 1.5], 'KR-0907': [0.25, 0.4] } as Record<
      string,
      [number, number]
    >;
    for (const job of jobs) {
      const [min, max] = range[job.partNumber]!;
      expect(job.prediction!.effectiveCaseDepthMm).toBeGreaterThanOrEqual(min);
      expect(job.prediction!.effectiveCaseDepthMm).toBeLessThanOrEqual(max);
    }
  });

  it('has lab results to compare: most done loads measured, within ±12 % of the prediction (invented offset and scatter)', () => {
    const summary = summarizeShift(jobs);
    expect(summary.ecdPairs.length).toBeGreaterThan(jobs.length * 0.5);
    for (const pair of summary.ecdPairs) expect(Math.abs(pair.differencePct)).toBeLessThan(12);
  });
});
