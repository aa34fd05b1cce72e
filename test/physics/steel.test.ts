import { describe, expect, it } from 'vitest';
import { alloyFactor, saturationCarbonPct } from '../../src/physics/steel';
import { STEEL_GRADES } from '../../src/physics/grades';

describe('saturation of austenite (Acm)', () => {
  it('0.77 %C at 727 °C and 2.11 %C at 1148 °C (Fe–Fe₃C diagram eutectoid and eutectic points)', () => {
    expect(saturationCarbonPct(727)).toBe(0.77);
    expect(saturationCarbonPct(1148)).toBe(2.11);
  });
  it('interpolates the approximate table (from memory): 925 °C lies between 1.20 and 1.34 %C', () => {
    expect(saturationCarbonPct(925)).toBeCloseTo(1.27, 10);
  });
  it('is undefined where there is no austenite or beyond the table', () => {
    expect(saturationCarbonPct(700)).toBeUndefined();
    expect(saturationCarbonPct(1200)).toBeUndefined();
  });
  it('rises with temperature', () => {
    for (let t = 727; t + 7 <= 1148; t += 7)
      expect(saturationCarbonPct(t + 7)!).toBeGreaterThan(saturationCarbonPct(t)!);
  });
});

describe('alloy factor (Gunnarson 1963, from memory)', () => {
  it('is 1 for plain carbon steel', () => {
    expect(alloyFactor({ Si: 0, Mn: 0, Cr: 0, Ni: 0, Mo: 0 })).toBe(1);
  });
  it('SAE 8620 nominal: 10^(0.055·0.25 − 0.013·0.8 − 0.040·0.5 + 0.014·0.55 − 0.013·0.2) = 0.9738', () => {
    expect(alloyFactor({ Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 })).toBeCloseTo(0.97376, 5);
  });
  it('chromium lowers and silicon raises the surface carbon', () => {
    expect(alloyFactor({ Si: 0, Mn: 0, Cr: 1, Ni: 0, Mo: 0 })).toBeLessThan(1);
    expect(alloyFactor({ Si: 1, Mn: 0, Cr: 0, Ni: 0, Mo: 0 })).toBeGreaterThan(1);
  });
  it('chromium-rich 20MnCr5 takes less carbon than SAE 8620 from the same atmosphere (0.894 vs 0.974)', () => {
    const factor = (id: string) => alloyFactor(STEEL_GRADES.find((g) => g.id === id)!.composition);
    expect(factor('20mncr5')).toBeCloseTo(0.8943, 4);
    expect(factor('20mncr5')).toBeLessThan(factor('sae-8620'));
  });
});
