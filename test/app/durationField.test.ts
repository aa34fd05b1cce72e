import { describe, expect, it } from 'vitest';
import { displayText, field, readField } from '../../src/app/ui/fieldText';

describe('time fields take what operators type', () => {
  it.each([
    ['0:40', 'h', 40 / 60],
    ['40 min', 'h', 40 / 60],
    ['40m', 'h', 40 / 60],
    ['1 h 20', 'h', 80 / 60],
    ['1,5 h', 'h', 1.5],
    ['1:20', 'min', 80 / 60],
    ['0,667', 'h', 0.667],
  ])('"%s" typed in %s reads as %f h', (text, unit, hours) => {
    const r = readField(field(text, unit), 'time', 'h');
    expect(r.ok && r.value).toBeCloseTo(hours, 12);
  });

  it('a refused time names its field and keeps the text', () => {
    expect(readField(field('1:75', 'h'), 'timeH', 'h')).toEqual({
      ok: false,
      error: { code: 'duration.invalid', field: 'timeH', params: { text: '1:75' } },
    });
  });

  it('other fields still refuse units in the text', () => {
    expect(readField(field('40 min', 'mm'), 'depth', 'mm')).toMatchObject({
      ok: false,
      error: { code: 'number.invalid' },
    });
  });

  it('a time typed as h:mm in hours is shown converted when the unit setting is minutes', () => {
    expect(displayText(field('1:20', 'h'), 'min', 'de')).toBe('80');
  });
});
