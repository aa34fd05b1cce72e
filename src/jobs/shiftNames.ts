/**
 * The shift names and the default hours, apart from their validation (shift.ts), so the
 * settings can hold shift hours without bringing the validation library into the first screen.
 */
export const SHIFT_IDS = ['A', 'B', 'C'] as const;
export type ShiftId = (typeof SHIFT_IDS)[number];

/** Local start time of each shift, "HH:MM" (what a time input gives). */
export type ShiftConfig = Record<ShiftId, string>;

/** The demo plant's shifts: A 06–14, B 14–22, C 22–06. */
export const DEFAULT_SHIFT_CONFIG: ShiftConfig = { A: '06:00', B: '14:00', C: '22:00' };
