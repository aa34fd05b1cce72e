/**
 * The job record (record version 3): one load on one shift, from the plan to the lab's
 * traverse. The valibot schema is the single source: the TypeScript type is derived from it,
 * stored records are checked with it on read, and backup files on import.
 */
import * as v from 'valibot';
import { MAX_DEPTH_MM } from '../physics';
import {
  CarbonPctSchema,
  CompositionSchema,
  JobInputsSchema,
  ModelIdSchema,
  numberBetween,
  positiveNumber,
  textUpTo,
} from './inputs';
import { FURNACE_NAME_MAX, NOTES_MAX, SHORT_TEXT_MAX } from './limits';
import { SHIFT_IDS } from './shift';

/** Version of the record shape; also the IndexedDB version and the backup `version`. */
export const JOB_RECORD_VERSION = 3;

/** Status ids (English code; the words are under `jobs.status.` in the locales). */
export const JOB_STATUSES = ['planned', 'inFurnace', 'done', 'onHold', 'rejected'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];
/** Statuses a supervisor still has to follow up. */
export const OPEN_STATUSES: readonly JobStatus[] = ['planned', 'inFurnace', 'onHold'];

export const HARDNESS_UNITS = ['HRC', 'HV'] as const;
export type HardnessUnit = (typeof HARDNESS_UNITS)[number];

/** Plausible bounds, to catch slips (a depth typed as hardness), not to judge parts. */
export const HARDNESS_LIMITS = { HRC: { min: 0, max: 80 }, HV: { min: 1, max: 2000 } } as const;

export const TEXT_LIMITS = { short: SHORT_TEXT_MAX, notes: NOTES_MAX } as const;

/**
 * Whether `text` parses to an instant that Date.toISOString writes as `expected` (so 30 February
 * fails). Total: valibot runs every check of a pipe even after an earlier one failed.
 */
function sameInstantText(text: string, expected: string): boolean {
  const ms = Date.parse(text);
  return !Number.isNaN(ms) && new Date(ms).toISOString() === expected;
}

/** A UTC timestamp exactly as Date.toISOString writes it, so text order is time order. */
export const TimestampSchema = v.pipe(
  v.string(),
  v.regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/u),
  v.check((s) => sameInstantText(s, s)),
);

/** A calendar date "YYYY-MM-DD" that exists. */
export const CalendarDateSchema = v.pipe(
  v.string(),
  v.isoDate(),
  v.check((s) => sameInstantText(`${s}T00:00:00.000Z`, `${s}T00:00:00.000Z`)),
);

/** Operator initials: 1–4 letters of any alphabet (Ñ, Ö welcome), nothing else. */
export const InitialsSchema = v.pipe(v.string(), v.regex(/^\p{L}{1,4}$/u));

const requiredText = (max: number) => v.pipe(v.string(), v.minLength(1), v.maxLength(max));

export const SteelSchema = v.strictObject({
  /** Id from the grade list when picked from it (e.g. "sae-8620"). */
  gradeId: v.optional(textUpTo(TEXT_LIMITS.short)),
  /** Grade as the trade writes it (e.g. "SAE 8620"), also for grades not in the list. */
  gradeName: requiredText(TEXT_LIMITS.short),
  coreCarbonPct: CarbonPctSchema,
  composition: v.optional(CompositionSchema),
});

export const PredictionSchema = v.strictObject({
  effectiveCaseDepthMm: numberBetween(0, MAX_DEPTH_MM),
  totalCaseDepthMm: numberBetween(0, MAX_DEPTH_MM),
  surfaceCarbonPct: CarbonPctSchema,
  model: ModelIdSchema,
  /** Time at temperature the prediction holds for, h (for a time request: the answer). */
  timeH: v.optional(positiveNumber()),
  /** Temperature the prediction holds for, °C (for a temperature request: the answer). */
  temperatureC: v.optional(v.pipe(v.number(), v.finite())),
  /** Uncertainty band of the effective case depth (models × temperature tolerance × β), mm. */
  ecdBandMm: v.optional(
    v.pipe(
      v.strictObject({ minMm: numberBetween(0, MAX_DEPTH_MM), maxMm: numberBetween(0, MAX_DEPTH_MM) }),
      v.check((band) => band.minMm <= band.maxMm, 'the band minimum exceeds its maximum'),
    ),
  ),
  /** Version of the app that computed it, so a later model change can be traced. */
  appVersion: requiredText(TEXT_LIMITS.short),
});

export const HardnessSchema = v.pipe(
  v.strictObject({ value: v.pipe(v.number(), v.finite()), unit: v.picklist(HARDNESS_UNITS) }),
  v.check(
    (h) => h.value >= HARDNESS_LIMITS[h.unit].min && h.value <= HARDNESS_LIMITS[h.unit].max,
    'hardness outside the plausible range of its unit',
  ),
);

export const LabResultSchema = v.strictObject({
  ecdMm: v.optional(v.pipe(positiveNumber(), v.maxValue(MAX_DEPTH_MM))),
  surfaceHardness: v.optional(HardnessSchema),
  coreHardness: v.optional(HardnessSchema),
  surfaceCarbonPct: v.optional(CarbonPctSchema),
  /** Date (or moment) of the traverse. */
  measuredAt: v.optional(v.union([CalendarDateSchema, TimestampSchema])),
  by: v.optional(requiredText(TEXT_LIMITS.short)),
});

/** What a person enters or edits; the store adds id, timestamps and (by default) the shift. */
const editableEntries = {
  operator: InitialsSchema,
  furnace: requiredText(FURNACE_NAME_MAX),
  workOrder: textUpTo(TEXT_LIMITS.short),
  partNumber: requiredText(TEXT_LIMITS.short),
  steel: SteelSchema,
  inputs: v.optional(JobInputsSchema),
  prediction: v.optional(PredictionSchema),
  status: v.picklist(JOB_STATUSES),
  lab: v.optional(LabResultSchema),
  notes: textUpTo(TEXT_LIMITS.notes),
};

const shiftEntries = { shift: v.picklist(SHIFT_IDS), shiftDate: CalendarDateSchema };

export const JobSchema = v.strictObject({
  id: v.pipe(v.string(), v.uuid()),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
  ...shiftEntries,
  ...editableEntries,
});

export type Job = v.InferOutput<typeof JobSchema>;
export type Steel = v.InferOutput<typeof SteelSchema>;
export type Prediction = v.InferOutput<typeof PredictionSchema>;
export type LabResult = v.InferOutput<typeof LabResultSchema>;
export type Hardness = v.InferOutput<typeof HardnessSchema>;

/** A new job as entered; `shift`/`shiftDate` default to the shift of its creation time. */
export const JobDraftSchema = v.strictObject({
  ...editableEntries,
  shift: v.optional(shiftEntries.shift),
  shiftDate: v.optional(shiftEntries.shiftDate),
});
export type JobDraft = v.InferOutput<typeof JobDraftSchema>;

/** Fields an edit may change (id and createdAt never change; updatedAt is set by the store). */
export const JobChangesSchema = v.partial(v.strictObject({ ...editableEntries, ...shiftEntries }));
export type JobChanges = v.InferOutput<typeof JobChangesSchema>;
