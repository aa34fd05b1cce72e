import { describe, expect, it } from 'vitest';
import { erf, erfc, erfcinv, erfcx } from '../../src/physics/special';

// Abramowitz & Stegun, Handbook of Mathematical Functions (1964), Table 7.1: erf(x) to 10 places.
const AS_TABLE_7_1: [number, number][] = [
  [0.1, 0.112462916],
  [0.2, 0.2227025892],
  [0.5, 0.5204998778],
  [0.8, 0.7421009647],
  [1.0, 0.8427007929],
  [1.5, 0.9661051465],
  [2.0, 0.995322265],
];

describe('special functions against Abramowitz & Stegun Table 7.1', () => {
  it.each(AS_TABLE_7_1)('erf(%s) matches A&S Table 7.1', (x, value) => {
    expect(erf(x)).toBeCloseTo(value, 9);
  });
  it.each(AS_TABLE_7_1)('erfc(%s) = 1 − A&S Table 7.1 value', (x, value) => {
    expect(erfc(x)).toBeCloseTo(1 - value, 9);
  });
  it.each(AS_TABLE_7_1)('erfcinv inverts the A&S Table 7.1 value at x = %s', (x, value) => {
    expect(erfcinv(1 - value)).toBeCloseTo(x, 8);
  });
  it('erfcx(x) = exp(x²)·erfc(x) where both are finite, and stays finite at x = 30', () => {
    for (const x of [0, 0.5, 1, 2, 5]) expect(erfcx(x)).toBeCloseTo(Math.exp(x * x) * erfc(x), 10);
    // Asymptotic series erfcx(x) ≈ (1 − 1/(2x²) + 3/(4x⁴)) / (x√π) for large x (A&S 7.1.23).
    const x = 30;
    expect(erfcx(x)).toBeCloseTo((1 - 1 / (2 * x * x) + 3 / (4 * x ** 4)) / (x * Math.sqrt(Math.PI)), 10);
  });
});
