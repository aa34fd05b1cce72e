import { describe, expect, it } from 'vitest';
import { agrenDiffusivity, wellsBatzMehlDiffusivity } from '../../src/physics/diffusivity';
import { equivalentTime } from '../../src/physics/equivalentTime';
import type { Result } from '../../src/physics/result';

const value = <T>(r: Result<T>): T => {
  if (!r.ok) throw new Error(`expected ok, got ${r.error.code}`);
  return r.value;
};
const K = (c: number) => c + 273.15;

/** Independent reference: ∫ ratio(T(t)) dt over a linear ramp fromC → toC lasting durationH, by a 200 000-step midpoint rule. */
function midpointRampIntegral(ratio: (tempC: number) => number, fromC: number, toC: number, durationH: number): number {
  const n = 200_000;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += ratio(fromC + ((toC - fromC) * (i + 0.5)) / n);
  return (sum * durationH) / n;
}

describe('equivalent time t_eq = ∫ D(T(t))/D(T_set) dt', () => {
  it('a history at the set temperature is worth its clock time', () => {
    const r = value(
      equivalentTime({
        history: [
          { timeH: 0, temperatureC: 925 },
          { timeH: 3, temperatureC: 925 },
        ],
        setTemperatureC: 925,
      }),
    );
    expect(r.equivalentTimeH).toBeCloseTo(3, 12);
    expect(r.lostTimeH).toBeCloseTo(0, 12);
  });
  it('40 min at 890 °C is worth 40·D(890)/D(925) min at 925 °C; the extra soak makes up the rest', () => {
    const history = [
      { timeH: 0, temperatureC: 890 },
      { timeH: 40 / 60, temperatureC: 890 },
    ];
    const r = value(equivalentTime({ history, setTemperatureC: 925, requiredTimeH: 2, carbonPct: 0.5 }));
    const ratio = agrenDiffusivity(K(890), 0.5) / agrenDiffusivity(K(925), 0.5);
    expect(ratio).toBeGreaterThan(0.6);
    expect(ratio).toBeLessThan(0.7);
    expect(r.equivalentTimeH).toBeCloseTo((40 / 60) * ratio, 12);
    expect(r.extraTimeH).toBeCloseTo(2 - (40 / 60) * ratio, 12);
    expect(r.lostTimeH).toBeGreaterThan(0);
  });
  it('a linear ramp matches an independent 200 000-step midpoint integration of the Arrhenius ratio', () => {
    // Wells–Batz–Mehl is a pure Arrhenius law, so the ratio depends on T only.
    const ratio = (c: number) => wellsBatzMehlDiffusivity(K(c), 0.5) / wellsBatzMehlDiffusivity(K(925), 0.5);
    const reference = midpointRampIntegral(ratio, 850, 925, 1.5);
    const history = [
      { timeH: 0, temperatureC: 850 },
      { timeH: 1.5, temperatureC: 925 },
    ];
    const r = value(equivalentTime({ history, setTemperatureC: 925, model: 'wells-batz-mehl' }));
    expect(r.equivalentTimeH / reference).toBeCloseTo(1, 9);
  });
  it('time below 727 °C (no austenite) counts for nothing', () => {
    const cold = [
      { timeH: 0, temperatureC: 20 },
      { timeH: 2, temperatureC: 700 },
    ];
    expect(value(equivalentTime({ history: cold, setTemperatureC: 925 })).equivalentTimeH).toBe(0);
    // A ramp 20 → 925 °C over 2 h only counts its part above 727 °C, by the same midpoint check.
    const ratio = (c: number) => (c <= 727 ? 0 : agrenDiffusivity(K(c), 0.5) / agrenDiffusivity(K(925), 0.5));
    const reference = midpointRampIntegral(ratio, 20, 925, 2);
    const ramp = [
      { timeH: 0, temperatureC: 20 },
      { timeH: 2, temperatureC: 925 },
    ];
    expect(value(equivalentTime({ history: ramp, setTemperatureC: 925 })).equivalentTimeH / reference).toBeCloseTo(
      1,
      6,
    );
  });
  it('running hot gives negative lost time and no extra soak once the requirement is met', () => {
    const hot = [
      { timeH: 0, temperatureC: 940 },
      { timeH: 2, temperatureC: 940 },
    ];
    const r = value(equivalentTime({ history: hot, setTemperatureC: 925, requiredTimeH: 2 }));
    expect(r.lostTimeH).toBeLessThan(0);
    expect(r.extraTimeH).toBe(0);
  });
  it('accepts readings typed with a decimal comma', () => {
    const history = [
      { timeH: '0', temperatureC: '925' },
      { timeH: '1,5', temperatureC: '925' },
    ];
    expect(value(equivalentTime({ history, setTemperatureC: '925' })).elapsedH).toBe(1.5);
  });
});
