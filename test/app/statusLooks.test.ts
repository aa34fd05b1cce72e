/** Every job status looks different in every theme: its own colour (base.css) and its own shape (JobCard). */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { JOB_STATUSES } from '../../src/jobs/schema';

const css = readFileSync('src/app/ui/base.css', 'utf8');
const jobCard = readFileSync('src/app/log/JobCard.tsx', 'utf8');

/** The custom properties of one theme's block. */
function themeBlock(theme: string): string {
  const selector = theme === 'dark' ? ":root[data-theme='dark']" : `:root[data-theme='${theme}']`;
  const start = css.indexOf(selector);
  return css.slice(start, css.indexOf('}', start));
}

describe('status colours and shapes', () => {
  it.each(['dark', 'light', 'contrast'])('%s: five statuses, five different colours', (theme) => {
    const block = themeBlock(theme);
    const colours = JOB_STATUSES.map((s) => new RegExp(`--status-${s}:\\s*(#[0-9a-f]{6})`, 'iu').exec(block)?.[1]);
    expect(colours.every(Boolean), `every status has a colour in ${theme}`).toBe(true);
    expect(new Set(colours.map((c) => c!.toLowerCase())).size).toBe(JOB_STATUSES.length);
  });
  it('five statuses, five different shapes', () => {
    const shapes = JOB_STATUSES.map((s) => new RegExp(`\\b${s}: '([^']+)'`, 'u').exec(jobCard)?.[1]);
    expect(shapes.every(Boolean)).toBe(true);
    expect(new Set(shapes).size).toBe(JOB_STATUSES.length);
  });
});
