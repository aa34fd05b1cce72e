import { describe, expect, it } from 'vitest';
import {
  ac3TempC,
  alloyFactor,
  austeniteSpan,
  EUTECTOID_TEMP_C,
  hasAustenite,
  saturationCarbonPct,
} from '../../src/physics/steel';
import { STEEL_GRADES } from '../../src/physics/grades';
import { TEMPERATURE_LIMITS_C } from '../../src/physics/validate';

describe('saturation of austenite (Acm)', () => {
  it('0.77 %C at 727 °C and 2.11 %C at 1148 °C (Fe–Fe₃C diagram eutectoid and eutectic points)', () => {
    expect(saturationCarbonPct(727)).toBe(0.77);
    expect(saturationCarbonPct(1148)).toBe(2.11);
  });
  it('interpolates the approximate table (from memory): 925 °C lies between 1.20 and 1.34 %C', () => {
    expect(saturationCarbonPct(925)).toBeCloseTo(1.27, 10);
  });
  it('is undefined where there is no austenite or beyond the accepted temperatures', () => {
    expect(saturationCarbonPct(700)).toBeUndefined();
    expect(saturationCarbonPct(1151)).toBeUndefined();
  });
  it('covers every accepted carburizing temperature, up to 1150 °C (held at the eutectic 2.11 %C above 1148 °C)', () => {
    for (let t: number = TEMPERATURE_LIMITS_C.min; t <= TEMPERATURE_LIMITS_C.max; t += 1)
      expect(saturationCarbonPct(t)).toBeGreaterThan(0);
    expect(saturationCarbonPct(1150)).toBe(2.11);
  });
  it('rises with temperature up to the eutectic', () => {
    for (let t = 727; t + 7 <= 1148; t += 7)
      expect(saturationCarbonPct(t + 7)!).toBeGreaterThan(saturationCarbonPct(t)!);
  });
});

// The alloy factor once had its sign inverted (chromium lowering the surface carbon); these check
// values are computed by hand from log10(%C_plain / %C_alloy) = 0.055·Si − 0.013·Mn − 0.040·Cr +
// 0.014·Ni − 0.013·Mo (Gunnarson 1963, from memory), not taken from the code.
// The grade list is nominal data recalled from the standards' ranges; these checks catch a slipped
// digit by what carburizing grades must be: low-carbon, austenitic above 850 °C, modestly alloyed.
describe('the steel-grade list', () => {
  it('holds the common carburizing grades, each once', () => {
    const names = STEEL_GRADES.map((g) => g.name);
    for (const name of [
      'SAE 1018',
      'SAE 1020',
      'SAE 4118',
      'SAE 4320',
      'SAE 4620',
      'SAE 8620',
      'SAE 8822',
      'SAE 9310',
      '16MnCr5',
      '20MnCr5',
      '18CrNiMo7-6',
      '20NiCrMo2-2',
    ])
      expect(names).toContain(name);
    expect(new Set(STEEL_GRADES.map((g) => g.id)).size).toBe(STEEL_GRADES.length);
  });
  it.each(STEEL_GRADES.map((g) => [g.name, g] as const))('%s is a carburizing grade', (_name, g) => {
    expect(g.coreCarbonPct).toBeGreaterThanOrEqual(0.08);
    expect(g.coreCarbonPct).toBeLessThanOrEqual(0.25);
    // Its core is all austenite at the usual carburizing temperatures.
    expect(ac3TempC(g.coreCarbonPct, g.composition)).toBeLessThan(850);
    const f = alloyFactor(g.composition);
    expect(f).toBeGreaterThan(0.9);
    expect(f).toBeLessThan(1.25);
    expect(g.typicalCoreHardnessHrc).toBeGreaterThanOrEqual(20);
    expect(g.typicalCoreHardnessHrc).toBeLessThanOrEqual(45);
  });
});

describe('alloy factor (Gunnarson 1963, from memory): the formula’s own check values', () => {
  const none = { Si: 0, Mn: 0, Cr: 0, Ni: 0, Mo: 0 };
  const factor = (id: string) => alloyFactor(STEEL_GRADES.find((g) => g.id === id)!.composition);
  it('is 1 for plain carbon steel', () => {
    expect(alloyFactor(none)).toBe(1);
  });
  it('1 % Si alone: 10^−0.055 = 0.881', () => {
    expect(alloyFactor({ ...none, Si: 1 })).toBeCloseTo(0.881, 3);
  });
  it('nominal 20MnCr5 (Si 0.25, Mn 1.25, Cr 1.15): 10^0.04850 = 1.1181', () => {
    expect(factor('20mncr5')).toBeCloseTo(1.1181, 4);
  });
  it('SAE 8620 (Si 0.25, Mn 0.8, Cr 0.5, Ni 0.55, Mo 0.2): 10^0.01155 = 1.0270', () => {
    expect(factor('sae-8620')).toBeCloseTo(1.027, 4);
  });
  it('SAE 4320 (Si 0.25, Mn 0.55, Cr 0.5, Ni 1.8, Mo 0.25): 10^−0.00855 = 0.9805', () => {
    expect(factor('sae-4320')).toBeCloseTo(0.9805, 4);
  });
  it('chromium, manganese and molybdenum raise the surface carbon; silicon and nickel lower it', () => {
    for (const raises of ['Cr', 'Mn', 'Mo'] as const) expect(alloyFactor({ ...none, [raises]: 1 })).toBeGreaterThan(1);
    for (const lowers of ['Si', 'Ni'] as const) expect(alloyFactor({ ...none, [lowers]: 1 })).toBeLessThan(1);
  });
  it('chromium-rich 20MnCr5 takes more carbon than nickel-rich SAE 4320 from the same atmosphere', () => {
    expect(factor('20mncr5')).toBeGreaterThan(factor('sae-4320'));
  });
});

describe('where austenite exists', () => {
  it('A1 = 727 °C (Fe–Fe₃C eutectoid): none at A1 itself, some just above', () => {
    expect(EUTECTOID_TEMP_C).toBe(727);
    expect(hasAustenite(727)).toBe(false);
    expect(hasAustenite(727.01)).toBe(true);
  });
  it('a heat-up ramp 20 → 927 °C crosses A1 at (727 − 20)/(927 − 20) of its time; a cool-down the other way round', () => {
    expect(austeniteSpan(20, 927)!.from).toBeCloseTo(707 / 907, 12);
    expect(austeniteSpan(20, 927)!.until).toBe(1);
    expect(austeniteSpan(927, 20)).toEqual({ from: 0, until: 1 - austeniteSpan(20, 927)!.from });
    expect(austeniteSpan(850, 930)).toEqual({ from: 0, until: 1 });
    expect(austeniteSpan(20, 727)).toBeUndefined();
    expect(austeniteSpan(700, 700)).toBeUndefined();
  });
  it('Ac3 (Andrews 1965, from memory) of plain 0.20 %C steel: 910 − 203·√0.2 = 819.2 °C; silicon raises it; nickel, manganese and chromium lower it', () => {
    expect(ac3TempC(0.2)).toBeCloseTo(819.2, 1);
    const none = { Si: 0, Mn: 0, Cr: 0, Ni: 0, Mo: 0 };
    expect(ac3TempC(0.2, { ...none, Si: 1 })).toBeCloseTo(819.2 + 44.7, 1);
    expect(ac3TempC(0.2, { ...none, Ni: 1 })).toBeCloseTo(819.2 - 15.2, 1);
    expect(ac3TempC(0.2, { ...none, Mn: 1 })).toBeCloseTo(819.2 - 30, 1);
    expect(ac3TempC(0.2, { ...none, Cr: 1 })).toBeCloseTo(819.2 - 11, 1);
    // 20MnCr5 core (C 0.20, Si 0.25, Mn 1.25, Cr 1.15): 819.2 + 11.2 − 37.5 − 12.7 = 780.2 °C.
    expect(ac3TempC(0.2, { ...none, Si: 0.25, Mn: 1.25, Cr: 1.15 })).toBeCloseTo(780.2, 1);
    expect(ac3TempC(0.8)).toBeLessThan(ac3TempC(0.2));
  });
});
