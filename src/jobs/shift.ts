/**
 * Shifts: which shift a moment belongs to, in the device's local time.
 * Each shift runs from its start to the next shift's start; a shift that crosses
 * midnight belongs to the date it started (02:00 on the 5th is shift C of the 4th).
 */
import * as v from 'valibot';
import { failWith, succeed, type JobsResult } from './result';
import { issuesOf } from './issues';
import { SHIFT_IDS, DEFAULT_SHIFT_CONFIG, type ShiftConfig, type ShiftId } from './shiftNames';

export { SHIFT_IDS, DEFAULT_SHIFT_CONFIG, type ShiftConfig, type ShiftId } from './shiftNames';

const ClockTime = v.pipe(v.string(), v.regex(/^(?:[01]\d|2[0-3]):[0-5]\d$/u));

export const ShiftConfigSchema = v.pipe(
  v.strictObject({ A: ClockTime, B: ClockTime, C: ClockTime }),
  v.check((c) => new Set([c.A, c.B, c.C]).size === 3, 'starts must differ'),
);

/** Checks a configuration from settings; three distinct "HH:MM" starts. */
export function parseShiftConfig(input: unknown): JobsResult<ShiftConfig> {
  const parsed = v.safeParse(ShiftConfigSchema, input);
  return parsed.success ? succeed(parsed.output) : failWith('shiftConfig.invalid', undefined, issuesOf(parsed.issues));
}

/** A calendar date "YYYY-MM-DD". */
export type IsoDate = string;

export interface ShiftSlot {
  shift: ShiftId;
  /** Local calendar date on which this shift started. */
  shiftDate: IsoDate;
}

const minutesOf = (hhmm: string): number => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5));

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

/** The local calendar date of a Date, "YYYY-MM-DD". */
export function localIsoDate(date: Date): IsoDate {
  return `${pad(date.getFullYear(), 4)}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/** The calendar date `days` after a "YYYY-MM-DD" date (negative for before). */
export function addDays(isoDate: IsoDate, days: number): IsoDate {
  const [y, m, d] = isoDate.split('-').map(Number) as [number, number, number];
  const shifted = new Date(Date.UTC(y, m - 1, d + days));
  return `${pad(shifted.getUTCFullYear(), 4)}-${pad(shifted.getUTCMonth() + 1)}-${pad(shifted.getUTCDate())}`;
}

/**
 * The shift a moment falls in and the date that shift started, in local time.
 * `config` must be valid (see parseShiftConfig); the default is A 06–14, B 14–22, C 22–06.
 */
export function shiftOf(date: Date, config: ShiftConfig = DEFAULT_SHIFT_CONFIG): ShiftSlot {
  const nowMin = date.getHours() * 60 + date.getMinutes();
  const starts = SHIFT_IDS.map((shift) => ({ shift, startMin: minutesOf(config[shift]) })).sort(
    (a, b) => a.startMin - b.startMin,
  );
  const today = [...starts].reverse().find((s) => s.startMin <= nowMin);
  if (today) return { shift: today.shift, shiftDate: localIsoDate(date) };
  // Before the day's first start: still in the shift that began last night.
  const lastNight = starts[starts.length - 1]!;
  return { shift: lastNight.shift, shiftDate: addDays(localIsoDate(date), -1) };
}

/** A shift's place in time: its start date, then its start hour within that day. */
function slotKey(slot: ShiftSlot, config: ShiftConfig): string {
  const rank = [...SHIFT_IDS].sort((a, b) => minutesOf(config[a]) - minutesOf(config[b])).indexOf(slot.shift);
  return `${slot.shiftDate}#${String(rank)}`;
}

/** Whether shift slot `a` started before slot `b`. */
export function slotBefore(a: ShiftSlot, b: ShiftSlot, config: ShiftConfig = DEFAULT_SHIFT_CONFIG): boolean {
  return slotKey(a, config) < slotKey(b, config);
}
