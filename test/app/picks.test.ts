/** Quick picks come from this device's own log: newest first, distinct, never the demo plant's on a fresh install. */
import { describe, expect, it } from 'vitest';
import { NO_PICKS, PICK_COUNT, picksFrom } from '../../src/app/log/picks';
import type { Job } from '../../src/jobs';

const job = (partNumber: string, furnace: string) => ({ partNumber, furnace }) as Job;

describe('quick picks from the log', () => {
  it('an empty log offers none', () => {
    expect(picksFrom([])).toEqual(NO_PICKS);
    expect(NO_PICKS).toEqual({ parts: [], furnaces: [] });
  });

  it('lists each value once, in the order of the jobs (newest first), without blanks', () => {
    const jobs = [job('P-7', 'Pit 2'), job(' P-9 ', 'Pit 2'), job('P-7', 'Batch 1'), job('', ' ')];
    expect(picksFrom(jobs)).toEqual({ parts: ['P-7', 'P-9'], furnaces: ['Pit 2', 'Batch 1'] });
  });

  it('offers at most one row of each', () => {
    const jobs = Array.from({ length: 20 }, (_, i) => job(`P-${i}`, `Oven ${i % 9}`));
    const picks = picksFrom(jobs);
    expect(picks.parts).toHaveLength(PICK_COUNT);
    expect(picks.parts[0]).toBe('P-0');
    expect(picks.furnaces).toEqual(['Oven 0', 'Oven 1', 'Oven 2', 'Oven 3', 'Oven 4', 'Oven 5']);
  });
});
