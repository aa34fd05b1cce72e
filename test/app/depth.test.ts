/** The depth screen's reading of the form: same figures as the physics request, errors placed on fields. */
import { describe, expect, it } from 'vitest';
import { computeDepth } from '../../src/app/depth/results';
import { DEFAULT_DEPTH_FORM, type DepthForm } from '../../src/app/depth/state';
import { field } from '../../src/app/ui/fieldText';
import { caseDepth, timeForCaseDepth, TOTAL_CASE_MARGIN_PCT } from '../../src/physics';

const settings = {
  model: 'agren' as const,
  ecdThresholdPct: 0.4,
  totalCaseMarginPct: TOTAL_CASE_MARGIN_PCT,
  temperatureToleranceC: 8,
};
const form = (changes: Partial<DepthForm>): DepthForm => ({ ...DEFAULT_DEPTH_FORM, ...changes });
const physicsRequest = {
  temperatureC: 925,
  timeH: 6,
  carbonPotentialPct: 0.9,
  coreCarbonPct: 0.2,
  thresholdCarbonPct: 0.4,
  model: 'agren',
  composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
  temperatureToleranceC: 8,
  totalCaseMarginPct: 0.05,
};

describe('computeDepth', () => {
  it('gives the same figures as the physics request for the default form (SAE 8620, 925 °C, 6 h)', () => {
    const out = computeDepth(DEFAULT_DEPTH_FORM, settings);
    const expected = caseDepth(physicsRequest);
    expect(expected.ok).toBe(true);
    expect(out.result?.figures).toEqual(expected.ok ? expected.value : undefined);
  });

  it('accepts a decimal comma and reads °F and minutes in their units (1697 °F = 925 °C, 360 min = 6 h)', () => {
    const out = computeDepth(
      form({ temperature: field('1697', 'F'), time: field('360', 'min'), carbon: field('0,9') }),
      settings,
    );
    const expected = caseDepth({ ...physicsRequest, temperatureC: ((1697 - 32) * 5) / 9 });
    expect(out.result?.figures.effectiveCaseDepthMm).toBeCloseTo(
      expected.ok ? expected.value.effectiveCaseDepthMm : Number.NaN,
      12,
    );
  });

  it('places a parse error on its field, and reports every unreadable field at once', () => {
    const out = computeDepth(form({ temperature: field('9x5', 'C'), carbon: field('') }), settings);
    expect(out.result).toBeUndefined();
    expect(out.errors.temperatureC?.code).toBe('number.invalid');
    expect(out.errors.carbonPotentialPct?.code).toBe('number.empty');
  });

  it('places range errors from physics on the field named by the error', () => {
    expect(computeDepth(form({ temperature: field('1300', 'C') }), settings).errors.temperatureC?.code).toBe(
      'temperature.outOfRange',
    );
    expect(computeDepth(form({ threshold: field('0.95') }), settings).errors.thresholdCarbonPct?.code).toBe(
      'threshold.outsideProfile',
    );
    expect(computeDepth(form({ carbon: field('0.1') }), settings).errors.carbonPotentialPct?.code).toBe(
      'carbon.surfaceNotAboveCore',
    );
    const custom = computeDepth(
      form({
        steel: {
          ...DEFAULT_DEPTH_FORM.steel,
          grade: 'custom',
          composition: { ...DEFAULT_DEPTH_FORM.steel.composition, Cr: field('12') },
        },
      }),
      settings,
    );
    expect(custom.errors['composition.Cr']?.code).toBe('composition.outOfRange');
  });

  it('solves for time with the target depth and uses the settings threshold when the field is empty', () => {
    const out = computeDepth(form({ solveFor: 'time', targetDepth: field('0.9', 'mm') }), {
      ...settings,
      ecdThresholdPct: 0.35,
    });
    const expected = timeForCaseDepth({
      ...physicsRequest,
      targetDepthMm: 0.9,
      thresholdCarbonPct: 0.35,
      timeH: undefined,
    });
    expect(out.result?.solveFor).toBe('time');
    expect(out.result?.figures.timeH).toBeCloseTo(expected.ok ? expected.value.timeH : Number.NaN, 12);
  });

  it('a wider total-case margin gives a shallower total case', () => {
    const narrow = computeDepth(DEFAULT_DEPTH_FORM, settings).result?.figures.totalCaseDepthMm ?? Number.NaN;
    const wide =
      computeDepth(DEFAULT_DEPTH_FORM, { ...settings, totalCaseMarginPct: 0.1 }).result?.figures.totalCaseDepthMm ??
      Number.NaN;
    expect(wide).toBeLessThan(narrow);
  });
});
