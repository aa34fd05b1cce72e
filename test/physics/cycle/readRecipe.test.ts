/** Validating `simulate` requests: defaults, every error path, and a message for each code. */
import { describe, expect, it } from 'vitest';
import { createI18n, errorMessage, LANGUAGES, RESOURCES } from '../../../src/i18n/i18n';
import { DEFAULT_BETA_M_PER_S } from '../../../src/physics/cycle/recipe';
import { MAX_STEPS, readRecipe } from '../../../src/physics/cycle/readRecipe';
import { TEXT_LENGTH_LIMITS } from '../../../src/physics/limits';
import { simulateCycle } from '../../../src/physics/cycle/simulate';

const step = { durationH: 2, startTempC: 925, endTempC: 925, carbonPotentialPct: 0.9 };
const valid = { steel: { coreCarbonPct: 0.2 }, steps: [step] };

/** The valid request with one part replaced. */
const withSteps = (...steps: unknown[]) => ({ ...valid, steps });
const withStep = (patch: Record<string, unknown>) => withSteps(step, { ...step, ...patch });

describe('readRecipe: defaults', () => {
  it('fills model, threshold, shape, total-case margin, furnace factor 1, β and a soak end temperature', () => {
    const result = readRecipe({
      steel: { coreCarbonPct: '0,2' },
      steps: [{ durationH: 2, startTempC: 925, carbonPotentialPct: '0,9' }],
    });
    expect(result).toEqual({
      ok: true,
      value: {
        steel: { coreCarbonPct: 0.2 },
        model: 'agren',
        thresholdCarbonPct: 0.4,
        shape: { kind: 'semi-infinite' },
        totalCaseMarginPct: 0.05,
        diffusivityFactor: 1,
        steps: [
          { durationH: 2, startTempC: 925, endTempC: 925, carbonPotentialPct: 0.9, betaMPerS: DEFAULT_BETA_M_PER_S },
        ],
      },
    });
  });

  it('keeps names, labels and grade as text, neutral gas as null, and a cold ramp start', () => {
    const result = readRecipe({
      name: ' KR-2231 ',
      steel: { grade: 'SAE 8620', coreCarbonPct: 0.2, composition: { Cr: 0.5 } },
      model: 'tibbetts',
      thresholdCarbonPct: 0.35,
      shape: { kind: 'bar', diameterMm: '25,4' },
      steps: [{ label: 'heat-up', durationH: 1, startTempC: 20, endTempC: 900, carbonPotentialPct: null }, step],
    });
    if (!result.ok) throw new Error(result.error.code);
    expect(result.value.name).toBe('KR-2231');
    expect(result.value.steel).toEqual({
      grade: 'SAE 8620',
      coreCarbonPct: 0.2,
      composition: { Si: 0, Mn: 0, Cr: 0.5, Ni: 0, Mo: 0 },
    });
    expect(result.value.shape).toEqual({ kind: 'bar', diameterMm: 25.4 });
    expect(result.value.steps[0]).toMatchObject({ label: 'heat-up', startTempC: 20, carbonPotentialPct: null });
  });
});

const errorCases: [string, unknown, string, string | undefined][] = [
  ['request not an object', [1, 2], 'request.notObject', undefined],
  ['steel missing', { steps: [step] }, 'field.missing', 'steel'],
  [
    'total-case margin above 1 %C',
    { ...valid, totalCaseMarginPct: 1.5 },
    'totalCaseMargin.outOfRange',
    'totalCaseMarginPct',
  ],
  ['steel not an object', { ...valid, steel: 3 }, 'request.notObject', 'steel'],
  ['core carbon missing', { ...valid, steel: {} }, 'field.missing', 'steel.coreCarbonPct'],
  ['core carbon negative', { ...valid, steel: { coreCarbonPct: -0.1 } }, 'carbon.negative', 'steel.coreCarbonPct'],
  ['core carbon not a number', { ...valid, steel: { coreCarbonPct: 'x' } }, 'number.invalid', 'steel.coreCarbonPct'],
  [
    'unknown alloy element',
    { ...valid, steel: { coreCarbonPct: 0.2, composition: { W: 1 } } },
    'composition.unknownElement',
    'steel.composition.W',
  ],
  [
    'alloy content out of range',
    { ...valid, steel: { coreCarbonPct: 0.2, composition: { Cr: 50 } } },
    'composition.outOfRange',
    'steel.composition.Cr',
  ],
  ['unknown model', { ...valid, model: 'guess' }, 'model.unknown', 'model'],
  ['threshold at core carbon', { ...valid, thresholdCarbonPct: 0.2 }, 'threshold.notAboveCore', 'thresholdCarbonPct'],
  ['threshold above 2.11 %C', { ...valid, thresholdCarbonPct: 3 }, 'carbon.aboveMax', 'thresholdCarbonPct'],
  ['shape kind unknown', { ...valid, shape: { kind: 'sphere' } }, 'shape.unknown', 'shape.kind'],
  ['shape not an object', { ...valid, shape: 'plate' }, 'shape.unknown', 'shape.kind'],
  [
    'plate thickness zero',
    { ...valid, shape: { kind: 'plate', thicknessMm: 0 } },
    'shape.sizeOutOfRange',
    'shape.thicknessMm',
  ],
  ['bar diameter missing', { ...valid, shape: { kind: 'bar' } }, 'field.missing', 'shape.diameterMm'],
  [
    'bar diameter too large',
    { ...valid, shape: { kind: 'bar', diameterMm: 5000 } },
    'shape.sizeOutOfRange',
    'shape.diameterMm',
  ],
  ['steps missing', { steel: valid.steel }, 'steps.empty', 'steps'],
  ['steps empty', withSteps(), 'steps.empty', 'steps'],
  ['steps not an array', { ...valid, steps: { 0: step } }, 'steps.empty', 'steps'],
  ['too many steps', withSteps(...Array.from({ length: MAX_STEPS + 1 }, () => step)), 'steps.tooMany', 'steps'],
  ['a step not an object', withSteps(step, 'soak'), 'request.notObject', 'steps.1'],
  ['duration zero', withStep({ durationH: 0 }), 'time.notPositive', 'steps.1.durationH'],
  ['duration too long', withStep({ durationH: 2000 }), 'time.tooLong', 'steps.1.durationH'],
  [
    'cycle too long in total',
    withSteps(...Array.from({ length: 3 }, () => ({ ...step, durationH: 400 }))),
    'time.tooLong',
    'steps',
  ],
  ['start temperature too hot', withStep({ startTempC: 1200 }), 'temperature.outOfRange', 'steps.1.startTempC'],
  [
    'a step label longer than the record keeps',
    withStep({ label: 'x'.repeat(TEXT_LENGTH_LIMITS.label + 1) }),
    'text.tooLong',
    'steps.1.label',
  ],
  [
    'a name longer than the record keeps',
    { ...valid, name: 'n'.repeat(TEXT_LENGTH_LIMITS.name + 1) },
    'text.tooLong',
    'name',
  ],
  ['end temperature below 0 °C', withStep({ endTempC: -5 }), 'temperature.outOfRange', 'steps.1.endTempC'],
  ['start temperature missing', withStep({ startTempC: undefined }), 'field.missing', 'steps.1.startTempC'],
  [
    'carbon potential missing',
    withStep({ carbonPotentialPct: undefined }),
    'field.missing',
    'steps.1.carbonPotentialPct',
  ],
  [
    'carbon potential above 2.11 %C',
    withStep({ carbonPotentialPct: 3 }),
    'carbon.aboveMax',
    'steps.1.carbonPotentialPct',
  ],
  [
    'carbon potential as text',
    withStep({ carbonPotentialPct: 'rich' }),
    'number.invalid',
    'steps.1.carbonPotentialPct',
  ],
  [
    'carbon potential as boolean',
    withStep({ carbonPotentialPct: true }),
    'field.notNumber',
    'steps.1.carbonPotentialPct',
  ],
  ['β zero', withStep({ betaMPerS: 0 }), 'beta.notPositive', 'steps.1.betaMPerS'],
  ['duration infinite', withStep({ durationH: Number.POSITIVE_INFINITY }), 'field.notNumber', 'steps.1.durationH'],
];

describe('total-case margin', () => {
  it('a wider margin above core gives a shallower total case and leaves the ECD alone', () => {
    const standard = simulateCycle(valid);
    const wide = simulateCycle({ ...valid, totalCaseMarginPct: 0.1 });
    if (!standard.ok || !wide.ok) throw new Error('expected results');
    expect(wide.value.totalCaseDepthMm).toBeLessThan(standard.value.totalCaseDepthMm);
    expect(wide.value.effectiveCaseDepthMm).toBe(standard.value.effectiveCaseDepthMm);
  });
});

describe('readRecipe and simulateCycle: each bad input returns its code and field', () => {
  it.each(errorCases)('%s', (_, request, code, field) => {
    for (const result of [readRecipe(request), simulateCycle(request)]) {
      expect(result.ok).toBe(false);
      if (result.ok) return;
      expect(result.error.code).toBe(code);
      expect(result.error.field).toBe(field);
    }
  });

  it.each(LANGUAGES)(
    'every error above has its own message in %s (no fallback, no placeholder left unfilled)',
    (language) => {
      const { t } = createI18n(language);
      for (const [, request] of errorCases) {
        const result = readRecipe(request);
        if (result.ok) throw new Error('expected an error');
        const own = result.error.code
          .split('.')
          .reduce<unknown>(
            (node, key) => (node as Record<string, unknown> | undefined)?.[key],
            RESOURCES[language].errors,
          );
        expect(typeof own, `${language} errors.${result.error.code}`).toBe('string');
        const message = errorMessage(t, result.error);
        expect(message).not.toBe(`errors.${result.error.code}`);
        expect(message).not.toMatch(/\{\{/);
      }
    },
  );
});
