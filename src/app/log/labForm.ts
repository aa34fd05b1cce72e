/**
 * The lab result form: the traverse (points typed or pasted, one hardness unit), and the figures a
 * traverse does not give typed by hand: the ECD when there is no traverse or it has no single
 * crossing, the surface hardness without a traverse, the core hardness when the traverse has not
 * levelled off; then surface carbon, who measured and when. Numbers are read like every other field
 * (decimal comma or point) and checked before anything is stored: a depth and a carbon within the
 * bounds the record takes, a hardness within its scale or refused with the scale it fits ("did you
 * mean 35 HRC?") by the same physics check the traverse uses.
 */
import { HARDNESS_UNITS, localIsoDate, type HardnessUnit, type LabResult } from '../../jobs';
import {
  checkCarbonPct,
  checkDepthMm,
  checkHardness,
  fail,
  hardnessIn,
  type Hardness,
  type InputError,
  type Result,
} from '../../physics';
import { field, readOptionalField, type FieldText } from '../ui/fieldText';
import { FieldReader } from '../ui/outcome';
import {
  EMPTY_TRAVERSE_FORM,
  readTraverseForm,
  traverseFormOf,
  type TraverseForm,
  type TraverseOutcome,
} from './traverse/traverseForm';

export interface LabForm {
  traverse: TraverseForm;
  ecd: FieldText;
  surfaceHardness: FieldText;
  surfaceUnit: HardnessUnit;
  coreHardness: FieldText;
  coreUnit: HardnessUnit;
  surfaceCarbon: FieldText;
  by: string;
  at: string;
}

export const LAB_FIELDS = ['ecd', 'surfaceHardness', 'coreHardness', 'surfaceCarbon', 'by', 'at'] as const;

/** Schema names of the lab record → form fields. */
const SCHEMA_FIELDS: Record<string, string> = {
  traverse: 'points',
  ecdMm: 'ecd',
  surfaceHardness: 'surfaceHardness',
  coreHardness: 'coreHardness',
  surfaceCarbonPct: 'surfaceCarbon',
  by: 'by',
  measuredAt: 'at',
};

/** The form field of a stored-record problem such as `lab.surfaceHardness`. */
export function labFieldOf(path: string): string {
  const [, name] = path.split(/[.[]/u);
  return SCHEMA_FIELDS[name ?? ''] ?? 'lab';
}

const text = (value: number | undefined) => (value === undefined ? '' : String(value));
const isHardnessUnit = (unit: string): unit is HardnessUnit => (HARDNESS_UNITS as readonly string[]).includes(unit);

/** The form for a job's lab result (empty with today's date when there is none); depths shown in `depthUnit`. */
export function labFormOf(
  lab: LabResult | undefined,
  today: Date = new Date(),
  depthUnit = 'mm',
  locale = 'en',
): LabForm {
  return {
    traverse: lab?.traverse
      ? traverseFormOf(lab.traverse.points, depthUnit, locale, 'HV')
      : { ...EMPTY_TRAVERSE_FORM, rows: [] },
    ecd: field(text(lab?.ecdMm), 'mm'),
    surfaceHardness: field(text(lab?.surfaceHardness?.value)),
    surfaceUnit: lab?.surfaceHardness?.unit ?? 'HRC',
    coreHardness: field(text(lab?.coreHardness?.value)),
    coreUnit: lab?.coreHardness?.unit ?? 'HV',
    surfaceCarbon: field(text(lab?.surfaceCarbonPct)),
    by: lab?.by ?? '',
    at: lab?.measuredAt?.slice(0, 10) ?? localIsoDate(today),
  };
}

/** What a typed traverse leaves to be typed by hand. */
export interface TypedFields {
  ecd: boolean;
  surface: boolean;
  core: boolean;
}

export function typedFieldsOf(outcome: TraverseOutcome): TypedFields {
  const analysis = outcome.analysis;
  if (!analysis) return { ecd: true, surface: true, core: true };
  return { ecd: analysis.effectiveCaseDepthMm === null, surface: false, core: analysis.coreHardness === undefined };
}

function optional(
  value: number | undefined,
  check: (v: number, name: string) => Result<number>,
  name: string,
): Result<number | undefined> {
  return value === undefined ? { ok: true, value } : check(value, name);
}

/** An optional typed number, then checked: within the bounds the record takes, worded beside its field. */
function readChecked(
  value: FieldText,
  name: string,
  check: (v: number, name: string) => Result<number>,
  unit?: string,
) {
  const typed = readOptionalField(value, name, unit);
  return typed.ok ? optional(typed.value, check, name) : typed;
}

/** A typed hardness within its scale (else "did you mean … HRC?"); a core must also be softer than the limit. */
function readHardness(
  value: FieldText,
  unit: HardnessUnit,
  name: 'surfaceHardness' | 'coreHardness',
  limit: Hardness,
): Result<Hardness | undefined> {
  const read = readOptionalField(value, name);
  if (!read.ok || read.value === undefined) return read.ok ? { ok: true, value: undefined } : read;
  const checked = checkHardness({ value: read.value, unit }, name);
  if (!checked.ok || name === 'surfaceHardness') return checked;
  const coreHrc = hardnessIn(checked.value, 'HRC');
  const limitHrc = hardnessIn(limit, 'HRC');
  if (coreHrc !== undefined && limitHrc !== undefined && coreHrc >= limitHrc) {
    return fail('hardness.coreNotBelowLimit', name, {
      coreHrc: Number(coreHrc.toFixed(1)),
      limit: limit.value,
      limitUnit: limit.unit,
    });
  }
  return checked;
}

export interface LabRead {
  lab?: LabResult | undefined;
  errors: Record<string, InputError>;
  traverse: TraverseOutcome;
  typed: TypedFields;
}

/** The lab result to store (the traverse read at `limit`), undefined when nothing was entered, or the fields' errors. */
export function readLabForm(form: LabForm, limit: Hardness): LabRead {
  const traverse = readTraverseForm(form.traverse, limit);
  const typed = typedFieldsOf(traverse);
  const read = new FieldReader();
  const ecdMm = typed.ecd ? read.value(readChecked(form.ecd, 'ecd', checkDepthMm, 'mm')) : undefined;
  const surface =
    typed.surface && isHardnessUnit(form.surfaceUnit)
      ? read.value(readHardness(form.surfaceHardness, form.surfaceUnit, 'surfaceHardness', limit))
      : undefined;
  const core =
    typed.core && isHardnessUnit(form.coreUnit)
      ? read.value(readHardness(form.coreHardness, form.coreUnit, 'coreHardness', limit))
      : undefined;
  const surfaceCarbonPct = read.value(readChecked(form.surfaceCarbon, 'surfaceCarbon', checkCarbonPct));
  const errors = { ...traverse.errors, ...read.errors };
  if (Object.keys(errors).length > 0) return { errors, traverse, typed };
  const by = form.by.trim();
  const points = traverse.points;
  const measured =
    points !== undefined ||
    ecdMm !== undefined ||
    surface !== undefined ||
    core !== undefined ||
    surfaceCarbonPct !== undefined;
  if (!measured) return { lab: undefined, errors: {}, traverse, typed };
  const lab: LabResult = {
    ...(points ? { traverse: { points, limit } } : {}),
    ...(ecdMm === undefined ? {} : { ecdMm }),
    ...(surface === undefined ? {} : { surfaceHardness: surface }),
    ...(core === undefined ? {} : { coreHardness: core }),
    ...(surfaceCarbonPct === undefined ? {} : { surfaceCarbonPct }),
    ...(by ? { by } : {}),
    ...(form.at ? { measuredAt: form.at } : {}),
  };
  return { lab, errors: {}, traverse, typed };
}
