/**
 * Text lengths of the job record, in a module of their own (no valibot) so the settings, loaded
 * with the first screen, check a furnace name by the same figure as the log.
 */

/** Longest short text of a job, characters: furnace, work order, part number, grade name, lab initials. */
export const SHORT_TEXT_MAX = 40;
/** Longest notes of a job, characters. */
export const NOTES_MAX = 4000;
/** A furnace's name is short text: the calibrations kept with the settings hold the same names. */
export const FURNACE_NAME_MAX = SHORT_TEXT_MAX;
