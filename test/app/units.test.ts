import { describe, expect, it } from 'vitest';
import { wordError } from '../../src/app/ui/fieldError';
import { displayText, field, readField } from '../../src/app/ui/fieldText';
import { displayUnits } from '../../src/app/ui/units';
import { createI18n } from '../../src/i18n/i18n';

const auto = { temperature: 'auto', depth: 'auto', time: 'auto' } as const;

describe('display units', () => {
  it('follow the unit system unless a quantity is overridden', () => {
    expect(displayUnits('metric', auto)).toEqual({ temperature: 'C', depth: 'mm', time: 'h' });
    expect(displayUnits('us', auto)).toEqual({ temperature: 'F', depth: 'in', time: 'h' });
    expect(displayUnits('us', { ...auto, temperature: 'C', time: 'min' })).toEqual({
      temperature: 'C',
      depth: 'in',
      time: 'min',
    });
  });
});

describe('typed values keep their unit (NIST SP 811 factors)', () => {
  it('reads a value typed in °F as °C, and in minutes as hours', () => {
    const t = readField(field('1700', 'F'), 'temperature', 'C');
    expect(t.ok && t.value).toBeCloseTo(926.6667, 4);
    const h = readField(field('90', 'min'), 'time', 'h');
    expect(h.ok && h.value).toBe(1.5);
  });
  it('shows a value typed in mm converted when inches are chosen, and as typed otherwise', () => {
    expect(displayText(field('0,9', 'mm'), 'mm', 'en')).toBe('0,9');
    expect(displayText(field('25.4', 'mm'), 'in', 'en')).toBe('1');
    expect(displayText(field('0.9', 'mm'), 'in', 'de')).toBe('0,0354');
    expect(displayText(field('abc', 'mm'), 'in', 'en')).toBe('abc');
  });
  it('a parse error names the form field', () => {
    const r = readField(field('1..2', 'C'), 'temperature', 'C');
    expect(r.ok ? undefined : r.error).toMatchObject({ code: 'number.invalid', field: 'temperature' });
  });
});

describe('errors worded in the chosen units', () => {
  const { t } = createI18n('en');
  it('a temperature range error is given in °F for a US user', () => {
    const message = wordError(
      t,
      { code: 'temperature.outOfRange', field: 'temperatureC', params: { value: 1200, min: 700, max: 1150 } },
      { temperature: 'F', depth: 'in', time: 'h' },
      'en',
    );
    expect(message).toBe('Temperature 2192\u202f°F: it must be between 1292\u202f°F and 2102\u202f°F.');
  });
  it('errors without unit-bearing figures use the physics message', () => {
    expect(wordError(t, { code: 'number.empty' }, { temperature: 'C', depth: 'mm', time: 'h' }, 'en')).toBe(
      'Enter a number.',
    );
  });
});
