import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  addDays,
  DEFAULT_SHIFT_CONFIG,
  parseShiftConfig,
  shiftOf,
  SHIFT_IDS,
  type ShiftConfig,
} from '../../src/jobs/shift';

/** Local time on a date away from daylight-saving changes in the usual zones. */
const at = (day: number, hh: number, mm: number, month = 2, year = 2025) => new Date(year, month, day, hh, mm);

describe('shiftOf with the default hours (A 06–14, B 14–22, C 22–06; demo plant)', () => {
  it.each([
    [5, 5, 59, 'C', '2025-03-04'],
    [5, 6, 0, 'A', '2025-03-05'],
    [5, 13, 59, 'A', '2025-03-05'],
    [5, 14, 0, 'B', '2025-03-05'],
    [5, 21, 59, 'B', '2025-03-05'],
    [5, 22, 0, 'C', '2025-03-05'],
    [5, 23, 59, 'C', '2025-03-05'],
    [6, 0, 0, 'C', '2025-03-05'],
    [5, 2, 0, 'C', '2025-03-04'],
  ])('day %i %i:%i → shift %s of %s', (day, hh, mm, shift, shiftDate) => {
    expect(shiftOf(at(day, hh, mm))).toEqual({ shift, shiftDate });
  });

  it('a night shift crossing a month, a year and a leap day belongs to the day it started', () => {
    expect(shiftOf(new Date(2026, 0, 1, 0, 30))).toEqual({ shift: 'C', shiftDate: '2025-12-31' });
    expect(shiftOf(new Date(2024, 2, 1, 3, 0))).toEqual({ shift: 'C', shiftDate: '2024-02-29' });
    expect(shiftOf(new Date(2025, 2, 1, 3, 0))).toEqual({ shift: 'C', shiftDate: '2025-02-28' });
  });
});

describe('shiftOf with configured hours', () => {
  const late: ShiftConfig = { A: '07:00', B: '15:30', C: '23:30' };
  it.each([
    [6, 59, 'C', '2025-03-04'],
    [7, 0, 'A', '2025-03-05'],
    [15, 29, 'A', '2025-03-05'],
    [15, 30, 'B', '2025-03-05'],
    [23, 29, 'B', '2025-03-05'],
    [23, 30, 'C', '2025-03-05'],
    [0, 10, 'C', '2025-03-04'],
  ])('A 07:00, B 15:30, C 23:30: %i:%i → %s of %s', (hh, mm, shift, shiftDate) => {
    expect(shiftOf(at(5, hh, mm), late)).toEqual({ shift, shiftDate });
  });

  it('shifts that start at midnight never move to the day before', () => {
    const midnight: ShiftConfig = { A: '00:00', B: '08:00', C: '16:00' };
    expect(shiftOf(at(5, 0, 0), midnight)).toEqual({ shift: 'A', shiftDate: '2025-03-05' });
    expect(shiftOf(at(5, 23, 59), midnight)).toEqual({ shift: 'C', shiftDate: '2025-03-05' });
  });

  it('a plant whose shift A is the night shift: A runs 22:00–06:00 and is dated by its start', () => {
    const nightFirst: ShiftConfig = { A: '22:00', B: '06:00', C: '14:00' };
    expect(shiftOf(at(5, 23, 0), nightFirst)).toEqual({ shift: 'A', shiftDate: '2025-03-05' });
    expect(shiftOf(at(5, 5, 0), nightFirst)).toEqual({ shift: 'A', shiftDate: '2025-03-04' });
    expect(shiftOf(at(5, 6, 0), nightFirst)).toEqual({ shift: 'B', shiftDate: '2025-03-05' });
  });

  it('property: the shift found is the one whose start is the latest at or before the time, cyclically', () => {
    const clock = fc.integer({ min: 0, max: 1439 });
    const configs = fc
      .uniqueArray(clock, { minLength: 3, maxLength: 3 })
      .map(([a, b, c]) => ({ A: hhmm(a!), B: hhmm(b!), C: hhmm(c!) }));
    fc.assert(
      fc.property(configs, clock, (config, minute) => {
        const slot = shiftOf(at(5, Math.floor(minute / 60), minute % 60), config);
        const starts = SHIFT_IDS.map((id) => toMin(config[id]));
        const earliest = Math.min(...starts);
        // Distance back from the time to each start, going round the clock.
        const back = SHIFT_IDS.map((id) => (minute - toMin(config[id]) + 1440) % 1440);
        const expected = SHIFT_IDS[back.indexOf(Math.min(...back))];
        expect(slot.shift).toBe(expected);
        expect(slot.shiftDate).toBe(minute < earliest ? '2025-03-04' : '2025-03-05');
      }),
    );
  });
});

const hhmm = (m: number) => `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
const toMin = (s: string) => Number(s.slice(0, 2)) * 60 + Number(s.slice(3));

describe('parseShiftConfig', () => {
  it('accepts the default and three distinct HH:MM starts', () => {
    expect(parseShiftConfig(DEFAULT_SHIFT_CONFIG)).toEqual({ ok: true, value: DEFAULT_SHIFT_CONFIG });
    expect(parseShiftConfig({ A: '05:45', B: '13:45', C: '21:45' }).ok).toBe(true);
  });
  it.each([
    [{ A: '6:00', B: '14:00', C: '22:00' }, 'A'],
    [{ A: '06:00', B: '24:00', C: '22:00' }, 'B'],
    [{ A: '06:00', B: '14:60', C: '22:00' }, 'B'],
    [{ A: '06:00', B: '14:00' }, 'C'],
    [{ A: '06:00', B: '14:00', C: '22:00', D: '02:00' }, 'D'],
  ])('rejects %j, naming %s', (config, path) => {
    const result = parseShiftConfig(config);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe('shiftConfig.invalid');
      expect(result.error.issues?.[0]?.path).toBe(path);
    }
  });
  it('rejects two shifts starting at the same time', () => {
    const result = parseShiftConfig({ A: '06:00', B: '06:00', C: '22:00' });
    expect(result.ok).toBe(false);
  });
});

describe('addDays', () => {
  it('crosses months, years and leap days on the calendar', () => {
    expect(addDays('2025-03-01', -1)).toBe('2025-02-28');
    expect(addDays('2024-03-01', -1)).toBe('2024-02-29');
    expect(addDays('2025-12-31', 1)).toBe('2026-01-01');
    expect(addDays('2025-01-01', -1)).toBe('2024-12-31');
  });
});
