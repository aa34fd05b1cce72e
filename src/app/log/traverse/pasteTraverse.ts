/**
 * A hardness tester's export, pasted or opened as a file, read into traverse points for a preview:
 * a depth column and a hardness column, separated by `;`, `,`, a tab or spaces, numbers with a
 * decimal comma or point. A header row names the columns and, where it says so, their units
 * ("Depth [µm]", "HV1"); what the file does not say is taken from the choices shown beside the
 * preview, never assumed in silence. Nothing here stores anything.
 */
import { convert, parseNumber, type HardnessUnit } from '../../../physics';

export type PasteDepthUnit = 'mm' | 'um' | 'in';
export const PASTE_DEPTH_UNITS: readonly PasteDepthUnit[] = ['mm', 'um', 'in'];

export type Separator = ';' | ',' | '\t' | ' ';

export interface PasteChoices {
  /** Depth unit when the header does not name one. */
  depthUnit: PasteDepthUnit;
  /** Hardness unit when the header does not name one. */
  hardnessUnit: HardnessUnit;
  /** Columns chosen by the person (0-based); absent: from the header, else the first two. */
  depthColumn?: number;
  hardnessColumn?: number;
}

export type RowProblem =
  | { code: 'notNumber'; column: 'depth' | 'hardness'; text: string }
  | { code: 'missingColumn'; column: 'depth' | 'hardness' };

export interface PasteRow {
  /** 1-based line number in the text. */
  line: number;
  depthMm?: number;
  value?: number;
  problem?: RowProblem;
}

export interface PastePreview {
  separator: Separator;
  /** Column names: the header's, or "1", "2", … without one. */
  columns: string[];
  hasHeader: boolean;
  depthColumn: number;
  hardnessColumn: number;
  /** The units used and whether the file said so. */
  depthUnit: PasteDepthUnit;
  depthUnitFromFile: boolean;
  hardnessUnit: HardnessUnit;
  hardnessUnitFromFile: boolean;
  rows: PasteRow[];
  /** Rows that read as a depth and a hardness. */
  points: { depthMm: number; value: number; unit: HardnessUnit }[];
}

const DEPTH_NAME = /depth|tiefe|abstand|distance|dist\b|prof|profundidad|\bx\b/iu;
const HARDNESS_NAME = /hard|härte|haerte|dureza|\bhv|\bhrc|vickers|rockwell|\bh\b/iu;

/**
 * The separator of the text: `;` or a tab when any line has one; else spaces when every line is
 * numbers between spaces (a decimal comma: "0,05 720"); else `,` when any line has one; else spaces.
 */
export function detectSeparator(lines: readonly string[]): Separator {
  if (lines.some((l) => l.includes(';'))) return ';';
  if (lines.some((l) => l.includes('\t'))) return '\t';
  const spaced = (l: string) => l.trim().split(/\s+/u);
  const numbersBetweenSpaces = lines
    .slice(1)
    .every((l) => spaced(l).length >= 2 && spaced(l).every((cell) => parseNumber(cell).ok));
  if (lines.length > 1 && numbersBetweenSpaces) return ' ';
  return lines.some((l) => l.includes(',')) ? ',' : ' ';
}

const split = (line: string, separator: Separator) =>
  (separator === ' ' ? line.trim().split(/\s+/u) : line.split(separator)).map((cell) =>
    cell.trim().replace(/^"(.*)"$/u, '$1'),
  );

const isNumber = (cell: string) => parseNumber(cell).ok;

/** The depth unit a header cell names, if any. */
function depthUnitIn(name: string): PasteDepthUnit | undefined {
  if (/µm|μm|\bum\b|micron|mikron/iu.test(name)) return 'um';
  if (/\bmm\b/iu.test(name)) return 'mm';
  if (/\bin\b|inch|zoll|pulg/iu.test(name)) return 'in';
  return undefined;
}

/** The hardness unit a header cell names, if any ("HV1", "HV 0.5", "HRC"). */
function hardnessUnitIn(name: string): HardnessUnit | undefined {
  if (/\bhrc\b|rockwell\s*c/iu.test(name)) return 'HRC';
  if (/\bhv\s*\d*([.,]\d+)?\b|vickers/iu.test(name)) return 'HV';
  return undefined;
}

const pick = (names: readonly string[], pattern: RegExp, skip?: number) =>
  names.findIndex((name, i) => i !== skip && pattern.test(name));

/** Reads pasted text into a preview. */
export function readPaste(text: string, choices: PasteChoices): PastePreview {
  const numbered = text
    .split(/\r\n|\r|\n/u)
    .map((content, i) => ({ content, line: i + 1 }))
    .filter((l) => l.content.trim() !== '');
  const separator = detectSeparator(numbered.map((l) => l.content));
  const cells = numbered.map((l) => ({ line: l.line, cells: split(l.content, separator) }));
  const first = cells[0];
  const hasHeader = first !== undefined && !first.cells.every(isNumber);
  const data = hasHeader ? cells.slice(1) : cells;
  const width = Math.max(2, ...cells.map((c) => c.cells.length));
  const columns = hasHeader
    ? Array.from({ length: width }, (_, i) => first.cells[i] ?? String(i + 1))
    : Array.from({ length: width }, (_, i) => String(i + 1));

  const named = (pattern: RegExp, skip?: number) => (hasHeader ? pick(columns, pattern, skip) : -1);
  const headerDepth = named(DEPTH_NAME);
  const headerHardness = named(HARDNESS_NAME, headerDepth);
  const depthColumn = choices.depthColumn ?? (headerDepth >= 0 ? headerDepth : 0);
  const hardnessColumn = choices.hardnessColumn ?? (headerHardness >= 0 ? headerHardness : depthColumn === 0 ? 1 : 0);

  const fileDepthUnit = hasHeader ? depthUnitIn(columns[depthColumn] ?? '') : undefined;
  const fileHardnessUnit = hasHeader ? hardnessUnitIn(columns[hardnessColumn] ?? '') : undefined;
  const depthUnit = fileDepthUnit ?? choices.depthUnit;
  const hardnessUnit = fileHardnessUnit ?? choices.hardnessUnit;

  const rows: PasteRow[] = [];
  const points: PastePreview['points'] = [];
  for (const { line, cells: row } of data) {
    const depthText = row[depthColumn];
    const hardnessText = row[hardnessColumn];
    if (depthText === undefined || depthText === '') {
      rows.push({ line, problem: { code: 'missingColumn', column: 'depth' } });
      continue;
    }
    if (hardnessText === undefined || hardnessText === '') {
      rows.push({ line, problem: { code: 'missingColumn', column: 'hardness' } });
      continue;
    }
    const depth = parseNumber(depthText);
    if (!depth.ok) {
      rows.push({ line, problem: { code: 'notNumber', column: 'depth', text: depthText } });
      continue;
    }
    const hardness = parseNumber(hardnessText);
    if (!hardness.ok) {
      rows.push({ line, problem: { code: 'notNumber', column: 'hardness', text: hardnessText } });
      continue;
    }
    const mm = convert(depth.value, depthUnit, 'mm');
    // To 1 nm: µm and inch depths convert without a binary tail (50 µm is 0.05 mm, not 0.049999…).
    const depthMm = Number((mm.ok ? mm.value : depth.value).toFixed(6));
    rows.push({ line, depthMm, value: hardness.value });
    points.push({ depthMm, value: hardness.value, unit: hardnessUnit });
  }
  return {
    separator,
    columns,
    hasHeader,
    depthColumn,
    hardnessColumn,
    depthUnit,
    depthUnitFromFile: fileDepthUnit !== undefined,
    hardnessUnit,
    hardnessUnitFromFile: fileHardnessUnit !== undefined,
    rows,
    points,
  };
}
