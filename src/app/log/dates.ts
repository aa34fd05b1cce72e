/** Dates and clock times of the log in the user's language (calendar dates are zone-free, times are local). */
import { NO_VALUE } from '../ui/format';

const cache = new Map<string, Intl.DateTimeFormat>();

function dateFormat(locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale}|${JSON.stringify(options)}`;
  let format = cache.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat(locale, options);
    cache.set(key, format);
  }
  return format;
}

/** A calendar date "2025-03-05" as e.g. "Wed, 5 Mar 2025". */
export function formatCalendarDate(isoDate: string, locale: string): string {
  const ms = Date.parse(`${isoDate}T00:00:00.000Z`);
  if (Number.isNaN(ms)) return NO_VALUE;
  return dateFormat(locale, {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(ms);
}

/** A timestamp's local clock time, e.g. "14:32". */
export function formatClockTime(isoTimestamp: string, locale: string): string {
  const ms = Date.parse(isoTimestamp);
  return Number.isNaN(ms) ? NO_VALUE : dateFormat(locale, { hour: '2-digit', minute: '2-digit' }).format(ms);
}

/** A timestamp or a calendar date, local, e.g. "5 Mar 2025, 14:32". */
export function formatMoment(iso: string, locale: string): string {
  if (/^\d{4}-\d{2}-\d{2}$/u.test(iso)) return formatCalendarDate(iso, locale);
  const ms = Date.parse(iso);
  return Number.isNaN(ms) ? NO_VALUE : dateFormat(locale, { dateStyle: 'medium', timeStyle: 'short' }).format(ms);
}
