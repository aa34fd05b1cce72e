import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDuration } from '../../src/physics/duration';

const hours = (text: string) => {
  const r = parseDuration(text, 'h');
  return r.ok ? r.value : r.error.code;
};

describe('parseDuration: how operators type times', () => {
  it.each([
    ['0:40', 40 / 60],
    ['1:20', 80 / 60],
    ['12:05', 12 + 5 / 60],
    ['40 min', 40 / 60],
    ['40min', 40 / 60],
    ['40m', 40 / 60],
    ['40 Min.', 40 / 60],
    ['40 minutos', 40 / 60],
    ['1 h 20', 80 / 60],
    ['1h20', 80 / 60],
    ['1 h 20 min', 80 / 60],
    ['2 Std 10 Min', 2 + 10 / 60],
    ['2 Std. 10 Min.', 2 + 10 / 60],
    ['1 hora 5 minutos', 1 + 5 / 60],
    ['1,5 h', 1.5],
    ['1.5h', 1.5],
    ['1,5 Stunden', 1.5],
    ['90 s', 90 / 3600],
    ['1 h 0 min 36 s', 1.01],
  ])('"%s" is %f h', (text, expected) => {
    expect(hours(text)).toBeCloseTo(expected, 12);
  });

  it('a plain number is in the field’s unit, decimal comma or point', () => {
    expect(parseDuration('0,667', 'h')).toEqual({ ok: true, value: 0.667 });
    expect(parseDuration('40', 'min')).toEqual({ ok: true, value: 40 });
    expect(parseDuration('1.5', 'h')).toEqual({ ok: true, value: 1.5 });
  });

  it('a clock or unit text is converted to the field’s unit', () => {
    const r = parseDuration('1:20', 'min');
    expect(r.ok && r.value).toBeCloseTo(80, 12);
    const s = parseDuration('2 min', 's');
    expect(s.ok && s.value).toBeCloseTo(120, 12);
  });

  it.each(['1:75', '1:5', ':40', '40 km', 'min 40', '20 min 1 h', '1 h 2 h', '40 20', 'abc', '1,5,5 h', '-0:40'])(
    '"%s" is refused in words with the text kept',
    (text) => {
      const r = parseDuration(text, 'h');
      expect(r).toEqual({ ok: false, error: { code: 'duration.invalid', params: { text } } });
    },
  );

  it('empty stays "enter a number"', () => {
    expect(parseDuration('  ', 'h')).toMatchObject({ ok: false, error: { code: 'number.empty' } });
  });

  it('property: h:mm and "h h m min" read the same as the minutes they stand for', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 200 }), fc.integer({ min: 0, max: 59 }), (h, m) => {
        const clock = parseDuration(`${h}:${String(m).padStart(2, '0')}`, 'min');
        const parts = parseDuration(`${h} h ${m} min`, 'min');
        expect(clock.ok && parts.ok).toBe(true);
        if (clock.ok && parts.ok) {
          expect(clock.value).toBeCloseTo(h * 60 + m, 9);
          expect(parts.value).toBeCloseTo(h * 60 + m, 9);
        }
      }),
    );
  });
});
