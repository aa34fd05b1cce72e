import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import type { Job } from '../../src/jobs/schema';
import { shiftOf, slotBefore } from '../../src/jobs/shift';
import { carriedOverLoads, ecdComparison, summarizeShift } from '../../src/jobs/summary';

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

  it('judges inside or outside on the depths as the screen rounds them', () => {
    const job = make({
      prediction: { ...predicted(0.85), ecdBandMm: { minMm: 0.7504, maxMm: 0.93 } },
      lab: { ecdMm: 0.7496 },
    });
    // Unrounded 0.7496 lies below 0.7504; both read 0.75 mm to two decimals.
    expect(ecdComparison(job)?.withinBand).toBe(false);
    const toHundredths = (mm: number) => Number(mm.toFixed(2));
    expect(ecdComparison(job, toHundredths)?.withinBand).toBe(true);
    expect(summarizeShift([job], [], toHundredths).ecdPairs[0]?.withinBand).toBe(true);
  });

  it('no pairs without both depths; an empty shift gives zeros and no means', () => {
    expect(ecdComparison(make({ prediction: undefined, lab: { ecdMm: 0.8 } }))).toBeUndefined();
    const empty = summarizeShift([]);
    expect(empty).toEqual({
      loads: 0,
      furnaces: [],
      byStatus: { planned: 0, inFurnace: 0, done: 0, onHold: 0, rejected: 0 },
      openItems: [],
      carriedOver: 0,
      ecdPairs: [],
    });
  });
});

describe('shift handover', () => {
  // Default hours: A 06–14, B 14–22, C 22–06. At 22:40 on 3 March shift C of 3 March is running.
  const at2240 = shiftOf(new Date(2026, 2, 3, 22, 40));
  const onShift = (shiftDate: string, shift: 'A' | 'B' | 'C', status: Job['status'], createdAt: string) =>
    make({ shiftDate, shift, status, createdAt });
  const leftByB = [
    onShift('2026-03-03', 'B', 'inFurnace', '2026-03-03T15:00:00Z'),
    onShift('2026-03-03', 'B', 'inFurnace', '2026-03-03T14:20:00Z'),
  ];
  const others = [
    onShift('2026-03-03', 'B', 'done', '2026-03-03T14:10:00Z'),
    onShift('2026-03-03', 'C', 'inFurnace', '2026-03-03T22:30:00Z'),
    onShift('2026-03-02', 'C', 'onHold', '2026-03-02T23:00:00Z'),
    onShift('2026-03-03', 'A', 'planned', '2026-03-03T07:00:00Z'),
  ];

  it('at 22:40 the two loads shift B left in the furnace head shift C’s open items, oldest first', () => {
    expect(at2240).toEqual({ shift: 'C', shiftDate: '2026-03-03' });
    const carried = carriedOverLoads([...others, ...leftByB], at2240);
    expect(carried.slice(0, 2)).toEqual([leftByB[1], leftByB[0]]);
    // Then what waits to go in, then what is held; nothing done and nothing of shift C itself.
    expect(carried.map((j) => `${j.shiftDate} ${j.shift} ${j.status}`)).toEqual([
      '2026-03-03 B inFurnace',
      '2026-03-03 B inFurnace',
      '2026-03-03 A planned',
      '2026-03-02 C onHold',
    ]);
    const summary = summarizeShift([others[1]!], carried);
    expect(summary.loads).toBe(1);
    expect(summary.carriedOver).toBe(4);
    expect(summary.openItems).toHaveLength(5);
    expect(summary.openItems[0]).toBe(leftByB[1]);
  });

  it('a shift that crosses midnight still follows the shifts of its start date', () => {
    // 02:00 on 4 March is shift C of 3 March: B of 3 March is before it, C of 3 March is not.
    const at0200 = shiftOf(new Date(2026, 2, 4, 2, 0));
    expect(carriedOverLoads([...leftByB, others[1]!], at0200)).toEqual([leftByB[1], leftByB[0]]);
    expect(slotBefore({ shift: 'C', shiftDate: '2026-03-03' }, at0200)).toBe(false);
    expect(slotBefore({ shift: 'C', shiftDate: '2026-03-02' }, at0200)).toBe(true);
  });

  it('orders shifts by their start hours, whatever their letters', () => {
    const config = { A: '22:00', B: '06:00', C: '14:00' };
    expect(slotBefore({ shift: 'B', shiftDate: '2026-03-03' }, { shift: 'A', shiftDate: '2026-03-03' }, config)).toBe(
      true,
    );
    expect(slotBefore({ shift: 'A', shiftDate: '2026-03-03' }, { shift: 'C', shiftDate: '2026-03-03' }, config)).toBe(
      false,
    );
  });
});
