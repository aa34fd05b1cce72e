/**
 * Whatever a request holds, what the CLI prints reads as words: every `message` (errors, cautions,
 * planner findings) has its placeholders filled, no `undefined`, NaN or Infinity, no figure with
 * more than 6 significant digits; every JSON number is rounded (no 900.0000000000001). The requests
 * are the shipped examples with one value broken at a time, at random.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { runCli } from '../src/cli';

const example = (name: string): unknown => JSON.parse(readFileSync(`public/examples/${name}.json`, 'utf8'));

const BASES: Record<string, unknown> = {
  depth: example('pinion-kr2231-depth'),
  time: { temperatureC: 925, targetDepthMm: 0.8, surfaceCarbonPct: 0.9, coreCarbonPct: 0.2 },
  temperature: { timeH: 6, targetDepthMm: 0.8, surfaceCarbonPct: 0.9, coreCarbonPct: 0.2 },
  convert: { value: 925, from: 'C', to: 'F' },
  'equivalent-time': {
    history: [
      { timeH: 0, temperatureC: 925 },
      { timeH: 0.5, temperatureC: 890 },
      { timeH: 1, temperatureC: 925 },
    ],
    setTemperatureC: 925,
    requiredTimeH: 2,
  },
  simulate: example('pinion-kr2231-cycle'),
  plan: example('pinion-kr2231-plan'),
  traverse: example('pinion-kr2231-traverse'),
};

/** Values a person, a spreadsheet or a broken script might leave in a field. */
const junk = fc.oneof(
  fc.constantFrom(
    null,
    '',
    'six',
    '0,8',
    '1e308',
    1e308,
    -1e308,
    0,
    -1,
    0.1 + 0.2,
    900.0000000000001,
    0.8763801039992863,
    5000,
    700,
    2.5,
    [],
    {},
    [1, 2],
    true,
    { kind: 'ring' },
    'plate',
  ),
  fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }),
  fc.string({ maxLength: 6 }),
);

/** Every path to a leaf (or an object) of a request. */
function paths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (typeof value !== 'object' || value === null) return [prefix];
  const own = Object.entries(value).flatMap(([key, v]) =>
    paths(v, [...prefix, Array.isArray(value) ? Number(key) : key]),
  );
  return prefix.length === 0 ? own : [prefix, ...own];
}

function replaced(value: unknown, path: readonly (string | number)[], next: unknown): unknown {
  if (path.length === 0) return next;
  const [head, ...rest] = path;
  if (Array.isArray(value)) {
    const copy: unknown[] = [...(value as unknown[])];
    copy[Number(head)] = replaced(copy[Number(head)], rest, next);
    return copy;
  }
  const entries = Object.entries(value as Record<string, unknown>);
  // `undefined` at a leaf: the field is left out.
  if (next === undefined && rest.length === 0)
    return Object.fromEntries(entries.filter(([key]) => key !== String(head)));
  return Object.fromEntries([
    ...entries.filter(([key]) => key !== String(head)),
    [String(head), replaced((value as Record<string, unknown>)[String(head)], rest, next)],
  ]);
}

/** Significant digits of an English figure as written ("0.8763801" → 7, "1150" → 3, "1,000,000" → 1). */
function significantDigits(written: string): number {
  const figure = written.replace(/,(?=\d{3}(?!\d))/gu, '');
  const digits = figure.replace(/[^\d]/gu, '').replace(/^0+/u, '');
  return figure.includes('.') || figure.includes(',') ? digits.length : digits.replace(/0+$/u, '').length;
}

/** What must never be printed, with where. */
function faults(output: unknown): string[] {
  const found: string[] = [];
  const visit = (node: unknown, key: string) => {
    if (typeof node === 'number') {
      // Rounded output: at most 4 decimals (mm, %C, h) or 6 significant digits, never float noise.
      const [mantissa = ''] = String(node).split('e');
      const decimals = mantissa.split('.')[1]?.length ?? 0;
      if (!Number.isFinite(node) || (significantDigits(mantissa) > 6 && decimals > 4))
        found.push(`${key}: unrounded ${node}`);
      return;
    }
    if (typeof node === 'string' && key.endsWith('message')) {
      if (/\{\{|\}\}/u.test(node)) found.push(`${key}: placeholder in "${node}"`);
      if (/\bundefined\b|\bNaN\b|Infinity|\[object|\bnull\b/u.test(node)) found.push(`${key}: "${node}"`);
      // What the person typed is quoted back as typed; every other figure went through the formatter.
      const figures = node.replace(/“[^”]*”/gu, '').match(/\d[\d.,]*\d|\d/gu) ?? [];
      for (const figure of figures) if (significantDigits(figure) > 6) found.push(`${key}: ${figure} in "${node}"`);
      return;
    }
    if (Array.isArray(node)) node.forEach((item, i) => visit(item, `${key}[${i}]`));
    else if (typeof node === 'object' && node !== null)
      for (const [k, v] of Object.entries(node)) visit(v, `${key}.${k}`);
  };
  visit(output, '');
  return found;
}

describe('the CLI words every outcome', () => {
  for (const [command, base] of Object.entries(BASES)) {
    it(`${command}: one broken value at a time never prints a placeholder, undefined, NaN or an unrounded figure`, () => {
      const all = paths(base);
      fc.assert(
        fc.property(fc.constantFrom(...all), fc.oneof(junk, fc.constant(undefined)), (path, value) => {
          const request = replaced(base, path, value);
          const { output } = runCli([command], () => JSON.stringify(request));
          expect(faults(output), `${command} with ${JSON.stringify(path)} = ${JSON.stringify(value)}`).toEqual([]);
        }),
        { numRuns: command === 'plan' || command === 'simulate' ? 60 : 200, seed: 13 },
      );
    });
  }

  it('the two cases the issue names: a composition that is no object, a shape without a kind', () => {
    const composition = runCli(['depth'], () => JSON.stringify({ ...(BASES.depth as object), composition: 5 }));
    const shape = runCli(['simulate'], () => JSON.stringify({ ...(BASES.simulate as object), shape: {} }));
    expect(faults(composition.output)).toEqual([]);
    expect(faults(shape.output)).toEqual([]);
    expect(JSON.stringify(composition.output)).toMatch(/alloy content as elements/u);
    expect(shape.output).toMatchObject({ error: { code: 'field.missing', field: 'shape.kind' } });
  });
});
