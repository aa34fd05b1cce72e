/** Validating `plan` requests: defaults, every error path with its field, and a message for each code. */
import { describe, expect, it } from 'vitest';
import { createI18n, errorMessage, LANGUAGES, RESOURCES } from '../../../src/i18n/i18n';
import { DEFAULT_BETA_M_PER_S } from '../../../src/physics/cycle/recipe';
import { planTwoStepCycle } from '../../../src/physics/planner/planner';
import { DEFAULT_MAX_TOTAL_H, readPlanRequest } from '../../../src/physics/planner/readPlanRequest';
import { ERROR_CODES } from '../../../src/physics/result';
import { pinionRequest, pinionWith } from './fixtures';

const minimal = {
  steel: { coreCarbonPct: '0,2' },
  boost: { temperatureC: 925, carbonPotentialPct: 1.1 },
  diffuse: { temperatureC: '925', carbonPotentialPct: '0,8' },
  targetEcdMm: { min: 0.75, max: 1 },
  targetSurfaceCarbonPct: { min: 0.75, max: 0.9 },
};

describe('readPlanRequest: defaults', () => {
  it('fills model, threshold, shape, total-case margin, β, calibration factor 1 and the time limit; no hardening step unless given', () => {
    const result = readPlanRequest(minimal);
    expect(result).toEqual({
      ok: true,
      value: {
        steel: { coreCarbonPct: 0.2 },
        model: 'agren',
        thresholdCarbonPct: 0.4,
        shape: { kind: 'semi-infinite' },
        boost: { temperatureC: 925, carbonPotentialPct: 1.1, betaMPerS: DEFAULT_BETA_M_PER_S },
        diffuse: { temperatureC: 925, carbonPotentialPct: 0.8, betaMPerS: DEFAULT_BETA_M_PER_S },
        targetEcdMm: { min: 0.75, max: 1 },
        targetSurfaceCarbonPct: { min: 0.75, max: 0.9 },
        diffusivityFactor: 1,
        totalCaseMarginPct: 0.05,
        maxTotalH: DEFAULT_MAX_TOTAL_H,
      },
    });
  });

  it('keeps the demo pinion request as given (name, grade, composition, hardening step)', () => {
    const result = readPlanRequest(pinionRequest());
    if (!result.ok) throw new Error(result.error.code);
    expect(result.value).toMatchObject({
      name: 'KR-2231 pinion, F1 boost/diffuse plan',
      steel: { grade: 'SAE 8620', coreCarbonPct: 0.2, composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 } },
      hardening: { temperatureC: 850, timeH: 0.5 },
    });
  });
});

const errorCases: [string, unknown, string, string | undefined][] = [
  ['request not an object', 'plan', 'request.notObject', undefined],
  ['steel missing', { ...minimal, steel: undefined }, 'field.missing', 'steel'],
  ['core carbon negative', { ...minimal, steel: { coreCarbonPct: -1 } }, 'carbon.negative', 'steel.coreCarbonPct'],
  ['unknown model', { ...minimal, model: 'guess' }, 'model.unknown', 'model'],
  ['threshold not above core', { ...minimal, thresholdCarbonPct: 0.1 }, 'threshold.notAboveCore', 'thresholdCarbonPct'],
  ['unknown shape', { ...minimal, shape: { kind: 'cone' } }, 'shape.unknown', 'shape.kind'],
  ['boost missing', { ...minimal, boost: undefined }, 'field.missing', 'boost'],
  ['boost not an object', { ...minimal, boost: 925 }, 'request.notObject', 'boost'],
  [
    'boost temperature missing',
    { ...minimal, boost: { carbonPotentialPct: 1.1 } },
    'field.missing',
    'boost.temperatureC',
  ],
  [
    'boost temperature out of range',
    { ...minimal, boost: { temperatureC: 1300, carbonPotentialPct: 1.1 } },
    'temperature.outOfRange',
    'boost.temperatureC',
  ],
  [
    'boost potential not a number',
    { ...minimal, boost: { temperatureC: 925, carbonPotentialPct: 'rich' } },
    'number.invalid',
    'boost.carbonPotentialPct',
  ],
  [
    'boost potential above 2.11 %C',
    { ...minimal, boost: { temperatureC: 925, carbonPotentialPct: 3 } },
    'carbon.aboveMax',
    'boost.carbonPotentialPct',
  ],
  [
    'diffuse β not positive',
    { ...minimal, diffuse: { temperatureC: 925, carbonPotentialPct: 0.8, betaMPerS: 0 } },
    'beta.notPositive',
    'diffuse.betaMPerS',
  ],
  [
    'diffuse potential negative',
    { ...minimal, diffuse: { temperatureC: 925, carbonPotentialPct: -0.8 } },
    'carbon.negative',
    'diffuse.carbonPotentialPct',
  ],
  [
    'boost not richer than diffuse',
    { ...minimal, boost: { temperatureC: 925, carbonPotentialPct: 0.8 } },
    'carbon.boostNotAboveDiffuse',
    'boost.carbonPotentialPct',
  ],
  [
    'hardening temperature out of range',
    { ...minimal, hardening: { temperatureC: 1200, timeH: 0.5 } },
    'temperature.outOfRange',
    'hardening.temperatureC',
  ],
  [
    'boost at 720 °C: no austenite',
    { ...minimal, boost: { temperatureC: 720, carbonPotentialPct: 1.1 } },
    'temperature.noAustenite',
    'boost.temperatureC',
  ],
  [
    'hardening time not positive',
    { ...minimal, hardening: { temperatureC: 850, timeH: 0 } },
    'time.notPositive',
    'hardening.timeH',
  ],
  ['hardening not an object', { ...minimal, hardening: [850] }, 'request.notObject', 'hardening'],
  ['ECD target missing', { ...minimal, targetEcdMm: undefined }, 'field.missing', 'targetEcdMm'],
  ['ECD target min missing', { ...minimal, targetEcdMm: { max: 1 } }, 'field.missing', 'targetEcdMm.min'],
  [
    'ECD target min not positive',
    { ...minimal, targetEcdMm: { min: 0, max: 1 } },
    'depth.notPositive',
    'targetEcdMm.min',
  ],
  ['ECD target max too deep', { ...minimal, targetEcdMm: { min: 1, max: 40 } }, 'depth.tooDeep', 'targetEcdMm.max'],
  [
    'ECD target min above max',
    { ...minimal, targetEcdMm: { min: 1, max: 0.75 } },
    'range.minAboveMax',
    'targetEcdMm.max',
  ],
  [
    'ECD target beyond half the plate',
    { ...minimal, shape: { kind: 'plate', thicknessMm: 1.5 } },
    'depth.tooDeep',
    'targetEcdMm.max',
  ],
  [
    'surface target min above max',
    { ...minimal, targetSurfaceCarbonPct: { min: 0.9, max: 0.8 } },
    'range.minAboveMax',
    'targetSurfaceCarbonPct.max',
  ],
  [
    'surface target above 2.11 %C',
    { ...minimal, targetSurfaceCarbonPct: { min: 0.8, max: 2.5 } },
    'carbon.aboveMax',
    'targetSurfaceCarbonPct.max',
  ],
  [
    'surface target not above the ECD threshold',
    { ...minimal, targetSurfaceCarbonPct: { min: 0.4, max: 0.8 } },
    'threshold.outsideProfile',
    'targetSurfaceCarbonPct.min',
  ],
  [
    'calibration factor out of range',
    { ...minimal, diffusivityFactor: 20 },
    'diffusivityFactor.outOfRange',
    'diffusivityFactor',
  ],
  ['time limit over 1000 h', { ...minimal, maxTotalH: 2000 }, 'time.tooLong', 'maxTotalH'],
  [
    'time limit no longer than the hardening soak',
    { ...minimal, hardening: { temperatureC: 850, timeH: 4 }, maxTotalH: 4 },
    'time.limitTooShort',
    'maxTotalH',
  ],
];

describe('readPlanRequest: every error path returns its key and field', () => {
  it.each(errorCases)('%s', (_, request, code, field) => {
    for (const result of [readPlanRequest(request), planTwoStepCycle(request)]) {
      expect(result.ok).toBe(false);
      if (result.ok) return;
      expect(result.error.code).toBe(code);
      expect(result.error.field).toBe(field);
      expect(ERROR_CODES).toContain(result.error.code);
    }
  });

  it('accepts a hardening soak without austenite (600 °C): the forward run cautions it, it is not an input error', () => {
    expect(readPlanRequest({ ...minimal, hardening: { temperatureC: 600, timeH: 0.5 } }).ok).toBe(true);
  });

  it('accepts a target range of a single value (min = max)', () => {
    expect(readPlanRequest(pinionWith({ targetEcdMm: { min: 0.9, max: 0.9 } })).ok).toBe(true);
  });

  it.each(LANGUAGES)(
    'every error above has its own message in %s (no fallback, no placeholder left unfilled)',
    (language) => {
      const { t } = createI18n(language);
      for (const [, request] of errorCases) {
        const result = readPlanRequest(request);
        if (result.ok) throw new Error('expected an error');
        const own = result.error.code
          .split('.')
          .reduce<unknown>(
            (node, key) => (node as Record<string, unknown> | undefined)?.[key],
            RESOURCES[language].errors,
          );
        expect(typeof own, `${language} errors.${result.error.code}`).toBe('string');
        expect(errorMessage(t, result.error)).not.toMatch(/\{\{/);
      }
    },
  );
});
