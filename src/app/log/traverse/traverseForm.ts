/**
 * The traverse as typed on the job's lab form: one hardness unit for the whole traverse, and a
 * list of points, each a depth (in the user's depth unit, decimal comma or point) and a hardness.
 * Read into the physics `traverse` request and analysed as the points are typed; the errors come
 * back on the point and the field that caused them (`points.3.hardness`).
 */
import {
  analyseTraverse,
  caseEndDepthMm,
  convert,
  parseNumber,
  readTraverse,
  type Hardness,
  type HardnessUnit,
  type InputError,
  type TraversePoint,
  type TraverseResult,
} from '../../../physics';
import { field, readField, type FieldText } from '../../ui/fieldText';
import { formatInput } from '../../ui/format';

export interface TraverseRow {
  depth: FieldText;
  hardness: string;
  /** '' for the traverse's unit; another unit only for a point of a stored or imported traverse with mixed units. */
  unit: '' | HardnessUnit;
}

export interface TraverseForm {
  unit: HardnessUnit;
  rows: TraverseRow[];
}

/** First depth offered, and the step while there is only one point: 0.05 mm (the usual near-surface spacing, common practice). */
export const FIRST_STEP_MM = 0.05;

export const emptyRow = (depth: FieldText): TraverseRow => ({ depth, hardness: '', unit: '' });

export const EMPTY_TRAVERSE_FORM: TraverseForm = { unit: 'HV', rows: [] };

const isBlank = (row: TraverseRow) => row.depth.text.trim() === '' && row.hardness.trim() === '';

/** The field name of a row's input, as errors are placed. */
export const rowField = (index: number, name: 'depth' | 'hardness') => `points.${index}.${name}`;

/**
 * The depth to offer for the next point, in `unit`: the last depth plus the last step (the
 * previous two points' spacing), or plus FIRST_STEP_MM while there is only one. Undefined when
 * the last depth cannot be read.
 */
export function suggestedDepthMm(rows: readonly TraverseRow[]): number | undefined {
  const depths: number[] = [];
  for (const row of rows) {
    if (row.depth.text.trim() === '') continue;
    const read = readField(row.depth, 'depth', 'mm');
    if (!read.ok) return undefined;
    depths.push(read.value);
  }
  const last = depths[depths.length - 1];
  if (last === undefined) return FIRST_STEP_MM;
  const previous = depths[depths.length - 2];
  const step = previous !== undefined && last > previous ? last - previous : FIRST_STEP_MM;
  return last + step;
}

/** The next row, its depth suggested in the user's depth unit (as text they may overwrite). */
export function nextRow(rows: readonly TraverseRow[], depthUnit: string, locale: string): TraverseRow {
  const mm = suggestedDepthMm(rows);
  if (mm === undefined) return emptyRow(field('', depthUnit));
  const converted = convert(mm, 'mm', depthUnit);
  return emptyRow(field(converted.ok ? formatInput(converted.value, depthUnit, locale) : '', depthUnit));
}

export interface TraverseOutcome {
  /** Errors by field (`points.3.depth`, `points.3.hardness`, `points`). */
  errors: Record<string, InputError>;
  /** The points as read (mm), when every row reads. */
  points?: TraversePoint[];
  analysis?: TraverseResult;
  /** Where the traverse has come a quarter of the way down to its core (the plant threshold's second depth). */
  caseEndMm?: number;
}

/** Physics fields of a point → the row's input. */
const FORM_FIELD: Record<string, 'depth' | 'hardness'> = { depthMm: 'depth', value: 'hardness', unit: 'hardness' };

/** Reads and analyses the typed traverse at `limit`; blank rows are skipped, an empty list is no traverse. */
export function readTraverseForm(form: TraverseForm, limit: Hardness): TraverseOutcome {
  const errors: Record<string, InputError> = {};
  const raw: { depthMm: number; value: number; unit: HardnessUnit }[] = [];
  const rowOf: number[] = [];
  form.rows.forEach((row, index) => {
    if (isBlank(row)) return;
    const depth = readField(row.depth, rowField(index, 'depth'), 'mm');
    const hardness = parseNumber(row.hardness);
    if (!depth.ok) errors[rowField(index, 'depth')] = depth.error;
    if (!hardness.ok) errors[rowField(index, 'hardness')] = { ...hardness.error, field: rowField(index, 'hardness') };
    if (depth.ok && hardness.ok) {
      raw.push({ depthMm: depth.value, value: hardness.value, unit: row.unit || form.unit });
      rowOf.push(index);
    }
  });
  if (Object.keys(errors).length > 0) return { errors };
  if (raw.length === 0) return { errors: {} };
  const read = readTraverse({ points: raw, limit });
  if (!read.ok) {
    // `points.2.value` of the request → the row it came from.
    const match = /^points\.(\d+)\.(\w+)$/u.exec(read.error.field ?? '');
    const row = match ? rowOf[Number(match[1])] : undefined;
    const name = match ? FORM_FIELD[match[2]!] : undefined;
    const key = row !== undefined && name ? rowField(row, name) : 'points';
    return { errors: { [key]: { ...read.error, field: key } } };
  }
  const analysis = analyseTraverse(read.value);
  const caseEndMm = caseEndDepthMm(read.value.points, analysis);
  return {
    errors: {},
    points: read.value.points,
    analysis,
    ...(caseEndMm === undefined ? {} : { caseEndMm }),
  };
}

/** A stored traverse back into the form, depths shown in `depthUnit`. */
export function traverseFormOf(
  points: readonly TraversePoint[] | undefined,
  depthUnit: string,
  locale: string,
  fallbackUnit: HardnessUnit,
): TraverseForm {
  if (!points || points.length === 0) return { unit: fallbackUnit, rows: [] };
  const unit = points[0]!.unit;
  return {
    unit,
    rows: points.map((p) => {
      const depth = convert(p.depthMm, 'mm', depthUnit);
      return {
        depth: depth.ok
          ? field(formatInput(depth.value, depthUnit, locale), depthUnit)
          : field(String(p.depthMm), 'mm'),
        hardness: formatInput(p.value, '', locale),
        unit: p.unit === unit ? '' : p.unit,
      };
    }),
  };
}
