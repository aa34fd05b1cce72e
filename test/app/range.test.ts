/** The likely-range settings (furnace temperature tolerance, β range), unit-aware warnings, and timing of a computation. */
import { describe, expect, it } from 'vitest';
import { defaults, readBetaRange, readTolerance, settings } from '../../src/app/settings/state';
import { field, readTemperatureDifferenceC, temperatureDifferenceText } from '../../src/app/ui/fieldText';
import { makeShow } from '../../src/app/ui/show';
import { timed } from '../../src/app/ui/timing';
import { wordWarning } from '../../src/app/ui/warningText';
import { createI18n, warningMessage } from '../../src/i18n/i18n';

describe('furnace temperature tolerance', () => {
  it('is a temperature difference: 14.4 °F is 8 °C (×5/9, no offset; NIST SP 811)', () => {
    expect(readTolerance(field('8', 'C'))).toEqual({ ok: true, value: 8 });
    const f = readTemperatureDifferenceC(field('14,4', 'F'), 'temperatureTolerance');
    expect(f.ok && f.value).toBeCloseTo(8, 12);
    expect(temperatureDifferenceText(field('8', 'C'), 'F', 'en')).toBe('14.4');
    expect(temperatureDifferenceText(field('8', 'C'), 'C', 'en')).toBe('8');
  });
  it('refuses text and tolerances beyond 0–50 °C, and the calculators then use the default ±8 °C', () => {
    expect(readTolerance(field('x', 'C'))).toMatchObject({
      ok: false,
      error: { code: 'number.invalid', field: 'temperatureTolerance' },
    });
    expect(readTolerance(field('60', 'C'))).toMatchObject({
      ok: false,
      error: { code: 'temperatureTolerance.outOfRange' },
    });
    const before = settings.value;
    settings.value = { ...before, temperatureTolerance: field('12', 'C') };
    expect(defaults.value.temperatureToleranceC).toBe(12);
    settings.value = { ...before, temperatureTolerance: field('-3', 'C') };
    expect(defaults.value.temperatureToleranceC).toBe(8);
    settings.value = before;
  });
});

describe('β range', () => {
  it('reads both ends in 10⁻⁷ m/s; the default is 1–3 ×10⁻⁷ m/s', () => {
    expect(readBetaRange(field('1'), field('3'))).toEqual({ ok: true, value: { min: 1e-7, max: 3e-7 } });
    expect(defaults.value.betaRangeMPerS).toEqual({ min: 1e-7, max: 3e-7 });
  });
  it('names the end at fault', () => {
    expect(readBetaRange(field('0'), field('3'))).toMatchObject({
      ok: false,
      error: { code: 'beta.notPositive', field: 'betaRangeMin' },
    });
    expect(readBetaRange(field('3'), field('1'))).toMatchObject({
      ok: false,
      error: { code: 'range.minAboveMax', field: 'betaRangeMax' },
    });
    expect(readBetaRange(field('1'), field(''))).toMatchObject({
      ok: false,
      error: { code: 'number.empty', field: 'betaRangeMax' },
    });
  });
});

describe('warnings in the user’s units', () => {
  const en = createI18n('en').t;
  const es = createI18n('es').t;
  it('converts every unit-bearing figure: hours to minutes, mm to inches, °C to °F (and a temperature change without offset)', () => {
    const us = makeShow({ temperature: 'F', depth: 'in', time: 'min' }, 'en');
    expect(wordWarning(en, { code: 'plan.allowMoreTime', params: { totalH: 12.5 } }, us)).toBe(
      'Allow about 750\u202fmin in total (estimate).',
    );
    expect(wordWarning(en, { code: 'plan.raiseTemperature', params: { deltaC: 10 } }, us)).toBe(
      'Raise the boost and diffuse temperatures by about 18\u202f°F (estimate).',
    );
    expect(wordWarning(en, { code: 'shape.throughCarburizing', params: { depthMm: 2.54, limitMm: 5.08 } }, us)).toBe(
      'The case reaches 0.1\u202fin, more than a third of the 0.2\u202fin available: risk of through-carburizing.',
    );
  });
  it('formats figures the user’s way (decimal comma in Spanish), in every message, the CLI’s way in physics units', () => {
    const show = makeShow({ temperature: 'C', depth: 'mm', time: 'h' }, 'es');
    expect(
      wordWarning(es, { code: 'plan.missedInFinalCheck', params: { ecdMm: 0.748, surfacePct: 0.905 } }, show),
    ).toMatch(/^La comprobación final del plan da 0,748\u202fmm y 0,905\u202f%C/u);
    const finding = { code: 'plan.lowerBoostPotential' as const, params: { potentialPct: 1.1500000000000001 } };
    expect(wordWarning(es, finding, show)).toMatch(/ 1,15\u202f%C\b/u);
    // Metric units and English: the same sentence as the CLI's.
    expect(wordWarning(en, finding, makeShow({ temperature: 'C', depth: 'mm', time: 'h' }, 'en'))).toBe(
      warningMessage(en, finding),
    );
  });
});

describe('timing a computation', () => {
  it('returns the result and records one User Timing measure, keeping the buffer short', () => {
    performance.clearMeasures('casefront:test');
    const work = { start: 0, end: 0 };
    const answer = timed('test', () => {
      work.start = performance.now();
      while (performance.now() - work.start < 3); // a computation of at least 3 ms
      work.end = performance.now();
      return 42;
    });
    expect(answer).toBe(42);
    const entries = performance.getEntriesByName('casefront:test');
    expect(entries).toHaveLength(1);
    // The measure spans the whole computation: it starts before it and ends after it.
    expect(entries[0]!.startTime).toBeLessThanOrEqual(work.start);
    expect(entries[0]!.startTime + entries[0]!.duration).toBeGreaterThanOrEqual(work.end);
    expect(entries[0]!.duration).toBeGreaterThanOrEqual(work.end - work.start);
    for (let i = 0; i < 120; i++) timed('test', () => i);
    expect(performance.getEntriesByName('casefront:test').length).toBeLessThanOrEqual(50);
  });
});
