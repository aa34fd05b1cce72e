/**
 * The lab result form: the traverse's depth in the user's depth unit, hardness in HRC or HV,
 * surface carbon, who measured and when. Numbers are read like every other field (decimal
 * comma or point) and checked here against the record's own bounds, so a slip is worded beside
 * its field with the allowed range before anything is stored.
 */
import { HARDNESS_LIMITS, HARDNESS_UNITS, localIsoDate, type HardnessUnit, type LabResult } from '../../jobs';
import { checkCarbonPct, checkDepthMm, fail, type InputError, type Result } from '../../physics';
import { field, readOptionalField, type FieldText } from '../ui/fieldText';
import { FieldReader } from '../ui/outcome';

export interface LabForm {
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

/** The form for a job's lab result (empty with today's date when there is none). */
export function labFormOf(lab: LabResult | undefined, today: Date = new Date()): LabForm {
  return {
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

/** A hardness within the record's plausible bounds for its unit (they catch slips, not judge parts). */
function checkLabHardness(value: number | undefined, unit: HardnessUnit, name: string): Result<number | undefined> {
  if (value === undefined) return { ok: true, value };
  const { min, max } = HARDNESS_LIMITS[unit];
  return value >= min && value <= max
    ? { ok: true, value }
    : fail('hardness.outsideScale', name, { value, unit, min, max });
}

function optional(
  value: number | undefined,
  check: (v: number, name: string) => Result<number>,
  name: string,
): Result<number | undefined> {
  return value === undefined ? { ok: true, value } : check(value, name);
}

/** The lab result to store, undefined when nothing was entered, or the fields' errors. */
export function readLabForm(form: LabForm): { lab?: LabResult | undefined; errors: Record<string, InputError> } {
  const read = new FieldReader();
  const typedEcd = readOptionalField(form.ecd, 'ecd', 'mm');
  const ecdMm = read.value(typedEcd.ok ? optional(typedEcd.value, checkDepthMm, 'ecd') : typedEcd);
  const typedSurface = readOptionalField(form.surfaceHardness, 'surfaceHardness');
  const surface = read.value(
    typedSurface.ok && isHardnessUnit(form.surfaceUnit)
      ? checkLabHardness(typedSurface.value, form.surfaceUnit, 'surfaceHardness')
      : typedSurface,
  );
  const typedCore = readOptionalField(form.coreHardness, 'coreHardness');
  const core = read.value(
    typedCore.ok && isHardnessUnit(form.coreUnit)
      ? checkLabHardness(typedCore.value, form.coreUnit, 'coreHardness')
      : typedCore,
  );
  const typedCarbon = readOptionalField(form.surfaceCarbon, 'surfaceCarbon');
  const surfaceCarbonPct = read.value(
    typedCarbon.ok ? optional(typedCarbon.value, checkCarbonPct, 'surfaceCarbon') : typedCarbon,
  );
  if (read.failed) return { errors: read.errors };
  const by = form.by.trim();
  const measured = ecdMm !== undefined || surface !== undefined || core !== undefined || surfaceCarbonPct !== undefined;
  if (!measured) return { lab: undefined, errors: {} };
  const lab: LabResult = {
    ...(ecdMm === undefined ? {} : { ecdMm }),
    ...(surface === undefined || !isHardnessUnit(form.surfaceUnit)
      ? {}
      : { surfaceHardness: { value: surface, unit: form.surfaceUnit } }),
    ...(core === undefined || !isHardnessUnit(form.coreUnit)
      ? {}
      : { coreHardness: { value: core, unit: form.coreUnit } }),
    ...(surfaceCarbonPct === undefined ? {} : { surfaceCarbonPct }),
    ...(by ? { by } : {}),
    ...(form.at ? { measuredAt: form.at } : {}),
  };
  return { lab, errors: {} };
}
