/**
 * Headless entry: `npm run casefront -- <command> [file]`.
 * Reads a JSON request from the file (or stdin), writes the JSON result to stdout;
 * on bad input writes `{"error": {"code", "message", "field"?}}` and exits 1.
 * Same engine as the app: it only parses, dispatches and words the messages.
 */
import { readFileSync } from 'node:fs';
import { createI18n, errorMessage, warningMessage } from './i18n/i18n';
import {
  caseDepth,
  convertRequest,
  equivalentTime,
  type InputError,
  OUTPUT_PRECISION,
  type OutputPrecision,
  planTwoStepCycle,
  roundForOutput,
  type Result,
  simulateCycle,
  temperatureForCaseDepth,
  timeForCaseDepth,
  traverse,
  type Warning,
} from './physics';

type Command = (request: unknown) => Result<object>;

/** Every command the CLI knows; later features register here. */
export const COMMANDS: Record<string, Command> = {
  depth: caseDepth,
  time: timeForCaseDepth,
  temperature: temperatureForCaseDepth,
  convert: convertRequest,
  'equivalent-time': equivalentTime,
  simulate: simulateCycle,
  plan: planTwoStepCycle,
  traverse,
};

const { t } = createI18n('en');

interface CliError {
  code: string;
  message: string;
  field?: string;
}

/** Result keys holding a list of cautions or findings, and keys holding a single one (the planner's `binding`). */
const WORDED_LISTS = new Set(['warnings', 'suggestions']);
const WORDED_ITEMS = new Set(['binding']);

/** Plain spaces in the CLI's sentences: the screen's narrow no-break space between figure and unit gets in the way of grep. */
const plainSpaces = (text: string) => text.replace(/\u202f/gu, ' ');

const worded = (w: Warning) => ({ ...w, message: plainSpaces(warningMessage(t, w)) });

/** Adds the English sentence to every warning and planner finding in a result, wherever it sits. */
function wordWarnings(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(wordWarnings);
  if (typeof value !== 'object' || value === null) return value;
  const entries = Object.entries(value).map(([key, v]) => {
    if (WORDED_LISTS.has(key) && Array.isArray(v)) return [key, (v as Warning[]).map(worded)];
    if (WORDED_ITEMS.has(key) && typeof v === 'object' && v !== null) return [key, worded(v as Warning)];
    return [key, wordWarnings(v)];
  });
  return Object.fromEntries(entries);
}

/**
 * Precision of the JSON output by the unit a key names (depthMm, carbonPct, tempC, timeH, hardnessHrc):
 * finer than any figure the trade reads, without floating noise (900.0000000000001). Keys without a
 * unit keep 6 significant digits; very small quantities (D, β) 4 significant.
 */
const PRECISION_BY_UNIT: readonly [RegExp, OutputPrecision][] = [
  [/Mm$/u, OUTPUT_PRECISION.mm],
  [/Pct$/u, OUTPUT_PRECISION.pct],
  [/(?:^|[a-z])C$/u, OUTPUT_PRECISION.C],
  [/(?:^|[a-z])H$/u, OUTPUT_PRECISION.h],
  [/Hrc$/u, OUTPUT_PRECISION.hrc],
  [/Hv$/u, OUTPUT_PRECISION.hv],
  [/(?:M2PerS|MPerS)$/u, OUTPUT_PRECISION.small],
];

const precisionOf = (key: string | undefined) =>
  key === undefined ? undefined : PRECISION_BY_UNIT.find(([pattern]) => pattern.test(key))?.[1];

function roundFor(key: string | undefined, value: number): number {
  if (value === 0) return value;
  return roundForOutput(value, precisionOf(key) ?? OUTPUT_PRECISION.plain);
}

/** Every number of a result rounded by the unit of its own key, or of the nearest enclosing key that names one. */
export function roundOutput(value: unknown, key?: string): unknown {
  if (typeof value === 'number') return roundFor(key, value);
  if (Array.isArray(value)) return value.map((item) => roundOutput(item, key));
  if (typeof value !== 'object' || value === null) return value;
  return Object.fromEntries(
    Object.entries(value).map(([k, v]) => [k, roundOutput(v, hasUnit(k) || key === undefined ? k : key)]),
  );
}

const hasUnit = (key: string) => precisionOf(key) !== undefined;

const inputError = (error: InputError): CliError => ({
  code: error.code,
  message: plainSpaces(errorMessage(t, error)),
  ...(error.field === undefined ? {} : { field: error.field }),
});

/** Runs one command on the request text; returns what to print and the exit code. */
export function runCli(
  args: readonly string[],
  readInput: (file?: string) => string,
): { output: object; exitCode: number } {
  const [name, file] = args;
  const command = name === undefined ? undefined : COMMANDS[name];
  if (!command) {
    const known = Object.keys(COMMANDS).join(', ');
    return {
      output: { error: { code: 'cli.unknownCommand', message: t('cli.unknownCommand', { name: name ?? '', known }) } },
      exitCode: 1,
    };
  }
  let text: string;
  try {
    text = readInput(file);
  } catch {
    return {
      output: { error: { code: 'cli.unreadable', message: t('cli.unreadable', { file: file ?? 'stdin' }) } },
      exitCode: 1,
    };
  }
  let request: unknown;
  try {
    request = JSON.parse(text);
  } catch {
    return { output: { error: { code: 'cli.invalidJson', message: t('cli.invalidJson') } }, exitCode: 1 };
  }
  const result = command(request);
  return result.ok
    ? { output: roundOutput(wordWarnings(result.value)) as object, exitCode: 0 }
    : { output: { error: inputError(result.error) }, exitCode: 1 };
}

const readInput = (file?: string) => readFileSync(file === undefined || file === '-' ? 0 : file, 'utf8');

if (process.argv[1] && /cli\.[tj]s$/.test(process.argv[1])) {
  const { output, exitCode } = runCli(process.argv.slice(2), readInput);
  process.stdout.write(`${JSON.stringify(output, null, 2)}\n`);
  process.exitCode = exitCode;
}
