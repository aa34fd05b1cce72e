/**
 * The log as CSV for spreadsheets: one row per job, a header row of stable English column
 * names with the unit in the name, ISO 8601 dates, UTF-8 with a byte-order mark so
 * spreadsheet programs read accents right.
 *
 * Formula guard: a text cell that starts with =, +, -, @, tab or carriage return gets a
 * leading single quote, so a spreadsheet shows it as text instead of running it. Numbers are
 * written unguarded (a negative difference stays -0.05 and stays a number); they come from
 * validated numeric fields, never from text.
 */
import { OUTPUT_PRECISION, roundForOutput, type OutputPrecision } from '../physics';
import { ecdComparison } from './summary';
import type { Job } from './schema';

export type CsvCell = string | number | undefined;

export interface CsvColumn {
  header: string;
  value: (job: Job) => CsvCell;
}

export interface CsvOptions {
  /** ',' (default) or ';' for spreadsheets set up for decimal commas. */
  delimiter?: ',' | ';';
  /** '.' (default) or ',' (needs the ';' delimiter). */
  decimalMark?: '.' | ',';
  /** Byte-order mark first (default true). */
  byteOrderMark?: boolean;
}

const FORMULA_START = /^[=+\-@\t\r]/u;

/** A text cell made safe for spreadsheets. */
export function guardText(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

const closedForm = (job: Job) => (job.inputs && job.inputs.kind !== 'cycle' ? job.inputs : undefined);
const recipe = (job: Job) => (job.inputs?.kind === 'cycle' ? job.inputs.recipe : undefined);
const element = (name: 'Si' | 'Mn' | 'Cr' | 'Ni' | 'Mo') => (job: Job) => job.steel.composition?.[name];
const targetEcdMm = (job: Job) => {
  const request = closedForm(job);
  return request && 'targetDepthMm' in request ? request.targetDepthMm : undefined;
};
/** The prediction's temperature (the answer of a temperature request), else the one asked for. */
const temperatureC = (job: Job) => {
  const request = closedForm(job);
  return job.prediction?.temperatureC ?? (request && 'temperatureC' in request ? request.temperatureC : undefined);
};
/** The prediction's time (the answer of a time request), else the one asked for. */
const timeH = (job: Job) => {
  const request = closedForm(job);
  return job.prediction?.timeH ?? (request && 'timeH' in request ? request.timeH : undefined);
};

export const CSV_COLUMNS: readonly CsvColumn[] = [
  { header: 'id', value: (j) => j.id },
  { header: 'created_at', value: (j) => j.createdAt },
  { header: 'updated_at', value: (j) => j.updatedAt },
  { header: 'shift_date', value: (j) => j.shiftDate },
  { header: 'shift', value: (j) => j.shift },
  { header: 'operator', value: (j) => j.operator },
  { header: 'furnace', value: (j) => j.furnace },
  { header: 'work_order', value: (j) => j.workOrder },
  { header: 'part_number', value: (j) => j.partNumber },
  { header: 'status', value: (j) => j.status },
  { header: 'steel_grade', value: (j) => j.steel.gradeName },
  { header: 'steel_grade_id', value: (j) => j.steel.gradeId },
  { header: 'core_carbon_pct', value: (j) => j.steel.coreCarbonPct },
  { header: 'si_pct', value: element('Si') },
  { header: 'mn_pct', value: element('Mn') },
  { header: 'cr_pct', value: element('Cr') },
  { header: 'ni_pct', value: element('Ni') },
  { header: 'mo_pct', value: element('Mo') },
  { header: 'input_kind', value: (j) => j.inputs?.kind },
  { header: 'carbon_potential_pct', value: (j) => closedForm(j)?.carbonPotentialPct },
  { header: 'surface_carbon_set_pct', value: (j) => closedForm(j)?.surfaceCarbonPct },
  { header: 'diffusivity_factor', value: (j) => closedForm(j)?.diffusivityFactor },
  { header: 'target_ecd_mm', value: targetEcdMm },
  { header: 'cycle_steps', value: (j) => recipe(j)?.steps.length },
  { header: 'temperature_c', value: temperatureC },
  { header: 'time_h', value: timeH },
  { header: 'predicted_ecd_mm', value: (j) => j.prediction?.effectiveCaseDepthMm },
  { header: 'predicted_ecd_min_mm', value: (j) => j.prediction?.ecdBandMm?.minMm },
  { header: 'predicted_ecd_max_mm', value: (j) => j.prediction?.ecdBandMm?.maxMm },
  { header: 'predicted_total_case_mm', value: (j) => j.prediction?.totalCaseDepthMm },
  { header: 'predicted_surface_carbon_pct', value: (j) => j.prediction?.surfaceCarbonPct },
  { header: 'model', value: (j) => j.prediction?.model },
  { header: 'app_version', value: (j) => j.prediction?.appVersion },
  { header: 'measured_ecd_mm', value: (j) => j.lab?.ecdMm },
  { header: 'ecd_difference_mm', value: (j) => ecdComparison(j)?.differenceMm },
  { header: 'ecd_difference_pct', value: (j) => ecdComparison(j)?.differencePct },
  { header: 'surface_hardness', value: (j) => j.lab?.surfaceHardness?.value },
  { header: 'surface_hardness_unit', value: (j) => j.lab?.surfaceHardness?.unit },
  { header: 'core_hardness', value: (j) => j.lab?.coreHardness?.value },
  { header: 'core_hardness_unit', value: (j) => j.lab?.coreHardness?.unit },
  { header: 'measured_surface_carbon_pct', value: (j) => j.lab?.surfaceCarbonPct },
  { header: 'measured_at', value: (j) => j.lab?.measuredAt },
  { header: 'measured_by', value: (j) => j.lab?.by },
  { header: 'notes', value: (j) => j.notes },
];

/** How finely a column's numbers are written, by the unit its name ends in (no 0.30000000000000004). */
function precisionOfColumn(header: string): OutputPrecision {
  if (header.endsWith('_mm')) return OUTPUT_PRECISION.mm;
  if (header.endsWith('_pct')) return OUTPUT_PRECISION.pct;
  if (header.endsWith('_c')) return OUTPUT_PRECISION.C;
  if (header.endsWith('_h')) return OUTPUT_PRECISION.h;
  if (header.endsWith('hardness')) return OUTPUT_PRECISION.hrc;
  return OUTPUT_PRECISION.plain;
}

/** One row of cells as written: text guarded, numbers rounded by their column's unit, in the chosen decimal mark. */
export function csvRow(job: Job, decimalMark: '.' | ',' = '.'): string[] {
  return CSV_COLUMNS.map(({ header, value }) => {
    const cell = value(job);
    if (cell === undefined) return '';
    if (typeof cell === 'number') {
      const text = String(roundForOutput(cell, precisionOfColumn(header)));
      return decimalMark === ',' ? text.replace('.', ',') : text;
    }
    return guardText(cell);
  });
}

/** The CSV text for these jobs (papaparse is loaded only when an export is made). */
export async function jobsToCsv(jobs: readonly Job[], options: CsvOptions = {}): Promise<string> {
  const decimalMark = options.decimalMark ?? '.';
  const delimiter = options.delimiter ?? (decimalMark === ',' ? ';' : ',');
  if (decimalMark === delimiter) throw new RangeError('The decimal mark and the delimiter must differ.');
  const { default: Papa } = await import('papaparse');
  const text = Papa.unparse(
    { fields: CSV_COLUMNS.map((c) => c.header), data: jobs.map((job) => csvRow(job, decimalMark)) },
    { delimiter, newline: '\r\n', escapeFormulae: false },
  );
  return ((options.byteOrderMark ?? true) ? '\uFEFF' : '') + text;
}
