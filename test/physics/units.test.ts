import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  carbonMoleFractionToWtPct,
  carbonWtPctToMoleFraction,
  convert,
  convertTemperature,
  convertTemperatureDifference,
  parseNumber,
  UNITS,
} from '../../src/physics/units';

const value = (r: ReturnType<typeof convert>) => (r.ok ? r.value : NaN);

describe('unit factors from NIST SP 811 (2008), Appendix B', () => {
  it('1 in = 25.4 mm exactly; 1 thou = 0.0254 mm; 1 µm = 0.001 mm', () => {
    expect(value(convert(1, 'in', 'mm'))).toBe(25.4);
    expect(value(convert(1, 'thou', 'mm'))).toBeCloseTo(0.0254, 15);
    expect(value(convert(1000, 'um', 'mm'))).toBeCloseTo(1, 15);
  });
  it('temperature: 0 °C = 32 °F = 273.15 K = 491.67 °R; 100 °C = 212 °F', () => {
    expect(convertTemperature(0, 'C', 'F')).toBeCloseTo(32, 12);
    expect(convertTemperature(0, 'C', 'K')).toBe(273.15);
    expect(convertTemperature(0, 'C', 'R')).toBeCloseTo(491.67, 10);
    expect(convertTemperature(100, 'C', 'F')).toBeCloseTo(212, 12);
    expect(convertTemperature(1700, 'F', 'C')).toBeCloseTo(926.6667, 4);
  });
  it('temperature differences scale without offset: 10 °C = 18 °F', () => {
    expect(convertTemperatureDifference(10, 'C', 'F')).toBeCloseTo(18, 12);
  });
  it('time: 1 h = 60 min = 3600 s', () => {
    expect(value(convert(1, 'h', 'min'))).toBe(60);
    expect(value(convert(1, 'h', 's'))).toBe(3600);
  });
  it('diffusivity: 1 cm²/s = 1e-4 m²/s = 3.6e5 mm²/h; 1 in²/h = 645.16 mm²/h', () => {
    expect(value(convert(1, 'cm2/s', 'm2/s'))).toBeCloseTo(1e-4, 18);
    expect(value(convert(1, 'cm2/s', 'mm2/h'))).toBeCloseTo(3.6e5, 6);
    expect(value(convert(1, 'in2/h', 'mm2/h'))).toBeCloseTo(645.16, 9);
  });
  it('every unit round-trips through every other unit of its quantity', () => {
    for (const units of Object.values(UNITS)) {
      for (const from of units) {
        for (const to of units) {
          fc.assert(
            fc.property(fc.double({ min: 1, max: 1e4, noNaN: true }), (v) => {
              const there = value(convert(v, from, to));
              expect(value(convert(there, to, from))).toBeCloseTo(v, 6);
            }),
            { numRuns: 20 },
          );
        }
      }
    }
  });
  it('refuses unknown units, mixed quantities and temperatures below absolute zero, by key', () => {
    expect(convert(1, 'furlong', 'mm')).toMatchObject({ ok: false, error: { code: 'unit.unknown', field: 'from' } });
    expect(convert(1, 'mm', 'h')).toMatchObject({ ok: false, error: { code: 'unit.unknown', field: 'to' } });
    expect(convert(-300, 'C', 'K')).toMatchObject({ ok: false, error: { code: 'temperature.belowAbsoluteZero' } });
  });
});

describe('carbon wt% ↔ mole fraction (M_C = 12.011, M_Fe = 55.845 g/mol)', () => {
  it('0.8 wt% C is x_C ≈ 0.0364 (hand calculation)', () => {
    // (0.8/12.011) / (0.8/12.011 + 99.2/55.845) = 0.066606 / 1.842936 = 0.036141
    expect(carbonWtPctToMoleFraction(0.8)).toBeCloseTo(0.036141, 5);
  });
  it('round-trips over 0–2.11 wt%', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2.11, noNaN: true }), (pct) => {
        expect(carbonMoleFractionToWtPct(carbonWtPctToMoleFraction(pct))).toBeCloseTo(pct, 12);
      }),
    );
  });
});

describe('parseNumber: shop-floor decimals', () => {
  it.each([
    ['0,8', 0.8],
    ['0.8', 0.8],
    [' 925 ', 925],
    [',5', 0.5],
    ['-3', -3],
    ['1,5e-7', 1.5e-7],
    ['\u22122,5', -2.5],
  ])('reads %j as %s', (text, expected) => {
    expect(parseNumber(text)).toEqual({ ok: true, value: expected });
  });
  it.each(['abc', '1,2,3', '1.2.3', '1 000', '0x10', 'Infinity', 'NaN', '1e999', '--1', '.', ','])(
    'refuses %j with number.invalid',
    (text) => {
      expect(parseNumber(text)).toMatchObject({ ok: false, error: { code: 'number.invalid' } });
    },
  );
  it('refuses blank text with number.empty', () => {
    expect(parseNumber('   ')).toMatchObject({ ok: false, error: { code: 'number.empty' } });
  });
  it('never throws and never returns a non-finite number, whatever the text', () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        const r = parseNumber(text);
        if (r.ok) expect(Number.isFinite(r.value)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
});
