/**
 * The settings read their values through the checks physics applies to the requests that carry
 * them, so a value the settings screen accepts is one every calculator accepts.
 */
import { describe, expect, it } from 'vitest';
import { depthOutcome } from '../../src/app/depth/results';
import { defaults, readMargin, readThreshold, readTolerance, settings } from '../../src/app/settings/state';
import { field } from '../../src/app/ui/fieldText';
import { caseDepth, simulateCycle } from '../../src/physics';

const depthRequest = {
  temperatureC: 925,
  timeH: 6,
  carbonPotentialPct: 0.9,
  coreCarbonPct: 0.2,
};
const cycleRequest = {
  steel: { coreCarbonPct: 0.2 },
  steps: [{ durationH: 4, startTempC: 925, carbonPotentialPct: 0.9 }],
};

describe('settings and physics agree on every total-case margin', () => {
  it.each(['1.5', '0', '-0.1', '1.0001'])('%s %%C: refused by the settings and by depth and cycle alike', (typed) => {
    const setting = readMargin(field(typed));
    const marginPct = Number(typed);
    const depth = caseDepth({ ...depthRequest, totalCaseMarginPct: marginPct });
    const cycle = simulateCycle({ ...cycleRequest, totalCaseMarginPct: marginPct });
    expect(setting.ok).toBe(false);
    expect(depth.ok).toBe(false);
    expect(cycle.ok).toBe(false);
    if (setting.ok || depth.ok || cycle.ok) return;
    expect(setting.error.code).toBe('totalCaseMargin.outOfRange');
    expect(depth.error.code).toBe(setting.error.code);
    expect(cycle.error.code).toBe(setting.error.code);
    expect(depth.error.params).toEqual(setting.error.params);
  });

  it.each(['0.05', '1', '0,3'])('%s %%C: accepted by the settings and by depth and cycle alike', (typed) => {
    const setting = readMargin(field(typed));
    if (!setting.ok) throw new Error(setting.error.code);
    expect(caseDepth({ ...depthRequest, totalCaseMarginPct: setting.value }).ok).toBe(true);
    expect(simulateCycle({ ...cycleRequest, totalCaseMarginPct: setting.value }).ok).toBe(true);
  });

  it('a 1.5 %C margin typed in the settings is flagged there and leaves the depth screen a result with the default margin', () => {
    const before = settings.value;
    settings.value = { ...before, totalCaseMargin: field('1.5') };
    try {
      expect(readMargin(settings.value.totalCaseMargin).ok).toBe(false);
      expect(defaults.value.totalCaseMarginPct).toBe(0.05);
      const outcome = depthOutcome.value;
      expect(outcome.general).toBeUndefined();
      expect(outcome.result?.request.totalCaseMarginPct).toBe(0.05);
    } finally {
      settings.value = before;
    }
  });
});

describe('the other settings use the request checks too', () => {
  it('an ECD threshold above the eutectic and a tolerance beyond ±50 °C are refused with the physics codes', () => {
    const threshold = readThreshold(field('2.5'));
    expect(threshold.ok || threshold.error.code).toBe('carbon.aboveMax');
    const tolerance = readTolerance(field('60', 'C'));
    expect(tolerance.ok || tolerance.error.code).toBe('temperatureTolerance.outOfRange');
    const depth = caseDepth({ ...depthRequest, temperatureToleranceC: 60 });
    expect(depth.ok || depth.error.code).toBe('temperatureTolerance.outOfRange');
  });
});
