/**
 * Durations as an operator types them: a plain number in the field's unit, a clock-style
 * "1:20", or parts with units in English, Spanish or German ("80 min", "80m", "1 h 20",
 * "1,5 h", "2 Std 10 Min", "1 hora 5 minutos"). Decimal comma or point throughout.
 */
import { fail, type Result } from './result';
import { convert, parseNumber, type TimeUnit } from './units';

type Part = 'h' | 'min' | 's';

/** Unit words by part, lower case; a trailing full stop is dropped before lookup ("Std.", "Min."). */
const UNIT_WORDS: Record<Part, readonly string[]> = {
  h: ['h', 'hr', 'hrs', 'hour', 'hours', 'std', 'stunde', 'stunden', 'hora', 'horas'],
  min: ['m', 'min', 'mins', 'minute', 'minutes', 'minuten', 'minuto', 'minutos'],
  s: ['s', 'sec', 'secs', 'second', 'seconds', 'sek', 'sekunde', 'sekunden', 'seg', 'segundo', 'segundos'],
};

const PART_ORDER: readonly Part[] = ['h', 'min', 's'];
const HOURS_PER: Record<Part, number> = { h: 1, min: 1 / 60, s: 1 / 3600 };

const partOfWord = (word: string): Part | undefined =>
  PART_ORDER.find((part) => UNIT_WORDS[part].includes(word.replace(/\.$/u, '')));

/** "h:mm" with minutes 00–59, e.g. "0:40", "12:05". */
const CLOCK = /^(\d+):([0-5]\d)$/u;
/** One part: a number, then optionally a unit word. */
const PART = /^(\d+(?:[.,]\d*)?|[.,]\d+)\s*(\p{L}+\.?)?\s*/u;

/** Hours in a text of parts, or undefined when it is not one. */
function partsToHours(text: string): number | undefined {
  let rest = text;
  let hours = 0;
  let last = -1;
  while (rest !== '') {
    const match = PART.exec(rest);
    if (!match) return undefined;
    const [whole, digits = '', word] = match;
    // A bare number after hours means minutes ("1 h 20"); anywhere else it is not a duration.
    const part = word === undefined ? (last === 0 ? 'min' : undefined) : partOfWord(word);
    const index = part === undefined ? -1 : PART_ORDER.indexOf(part);
    if (part === undefined || index <= last) return undefined;
    hours += Number(digits.replace(',', '.')) * HOURS_PER[part];
    last = index;
    rest = rest.slice(whole.length);
  }
  return last < 0 ? undefined : hours;
}

/**
 * A duration typed in a field whose unit is `unit`, returned in that unit. A plain number
 * is read as `parseNumber` reads it (its range is checked by the request that uses it).
 */
export function parseDuration(text: string, unit: TimeUnit): Result<number> {
  const plain = parseNumber(text);
  if (plain.ok || plain.error.code === 'number.empty') return plain;
  const typed = text.trim().toLowerCase().replace(/\s+/gu, ' ');
  const clock = CLOCK.exec(typed);
  const hours = clock ? Number(clock[1]) + Number(clock[2]) / 60 : partsToHours(typed);
  if (hours === undefined || !Number.isFinite(hours)) return fail('duration.invalid', undefined, { text: text.trim() });
  return convert(hours, 'h', unit);
}
