import { describe, expect, it } from 'vitest';
import { harrisTotalCaseDepthIn, harrisTotalCaseDepthMm } from '../../src/physics/rulesOfThumb';

describe('Harris (1943) total case depth against its published table', () => {
  // 1-hour row of the Harris table as reproduced in heat-treating handbooks, inches.
  it.each([
    [1600, 0.018],
    [1650, 0.021],
    [1700, 0.025],
    [1750, 0.029],
    [1800, 0.034],
  ])('1 h at %s °F gives %s in (Harris table)', (tempF, depthIn) => {
    expect(harrisTotalCaseDepthIn(1, tempF)).toBeCloseTo(depthIn, 3);
  });
  it.each([
    [4, 0.05],
    [16, 0.1],
  ])('%s h at 1700 °F gives %s in (Harris table)', (timeH, depthIn) => {
    expect(harrisTotalCaseDepthIn(timeH, 1700)).toBeCloseTo(depthIn, 3);
  });
  it('metric form d(mm) = 802.6·√t / 10^(3722/T_K) agrees with the inch form', () => {
    for (const tempC of [850, 900, 925, 950, 1000]) {
      const metric = (802.6 * Math.sqrt(6)) / 10 ** (3722 / (tempC + 273.15));
      expect(harrisTotalCaseDepthMm(6, tempC) / metric).toBeCloseTo(1, 3);
    }
  });
  it('twice the depth needs four times the time (common practice: depth ∝ √t)', () => {
    expect(harrisTotalCaseDepthMm(16, 925) / harrisTotalCaseDepthMm(4, 925)).toBeCloseTo(2, 12);
  });
});
