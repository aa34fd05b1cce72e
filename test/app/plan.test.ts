/** The planner's reading of its form, its words, and a plan opened in the cycle editor. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildRecipe } from '../../src/app/cycle/results';
import { cycleFormOfRecipe } from '../../src/app/cycle/fromRecipe';
import { buildPlanRequest, computePlan } from '../../src/app/plan/results';
import { DEFAULT_PLAN_FORM, type PlanForm } from '../../src/app/plan/state';
import { planView } from '../../src/app/plan/view';
import type { CalibrationState, StoredCalibration } from '../../src/app/settings/calibration';
import { field } from '../../src/app/ui/fieldText';
import { makeShow } from '../../src/app/ui/show';
import { createI18n } from '../../src/i18n/i18n';
import { planTwoStepCycle, runCycle, type Recipe } from '../../src/physics';

const settings = { model: 'agren' as const, ecdThresholdPct: 0.4, totalCaseMarginPct: 0.05, betaMPerS: 1.5e-7 };
const form = (changes: Partial<PlanForm>): PlanForm => ({ ...DEFAULT_PLAN_FORM, ...changes });
const t = createI18n('en').t;
const metric = makeShow({ temperature: 'C', depth: 'mm', time: 'h' }, 'en');
const example = JSON.parse(readFileSync('public/examples/pinion-kr2231-plan.json', 'utf8')) as Record<string, unknown>;

const f1: StoredCalibration = {
  furnace: 'F1',
  factor: 1.2,
  low: 1.1,
  high: 1.3,
  jobCount: 7,
  rmsMm: 0.03,
  fittedAt: '2025-03-05T10:00:00.000Z',
  model: 'agren',
  apply: true,
};
const applied: CalibrationState = { kind: 'applied', furnace: 'F1', calibration: f1 };

describe('reading the planner form', () => {
  it('the default form is the demo pinion request of public/examples (SAE 8620, 925 °C, Cp 1.10 / 0.80, 850 °C 0.5 h, ECD 0.75–1.00 mm, 0.75–0.90 %C)', () => {
    const { request, errors } = buildPlanRequest(DEFAULT_PLAN_FORM, settings);
    expect(errors).toEqual({});
    const { name: _name, steel, ...rest } = example;
    expect(request).toMatchObject(rest);
    expect(request?.steel).toMatchObject({
      coreCarbonPct: (steel as { coreCarbonPct: number }).coreCarbonPct,
      composition: (steel as { composition: object }).composition,
    });
  });

  it('plans exactly what the physics plans for that request (reachable, the CLI figures of the README)', () => {
    const out = computePlan(DEFAULT_PLAN_FORM, settings);
    const direct = planTwoStepCycle(buildPlanRequest(DEFAULT_PLAN_FORM, settings).request);
    if (!out.result || !direct.ok) throw new Error('no plan');
    expect(out.result.plan).toEqual(direct.value);
    expect(out.result.plan.reachable).toBe(true);
    expect(out.result.plan.boostH).toBeCloseTo(3.868, 3);
    expect(out.result.plan.diffuseH).toBeCloseTo(1.073, 3);
  });

  it('reads °F, minutes and inches in their units', () => {
    const imperial = form({
      boost: { ...DEFAULT_PLAN_FORM.boost, temperature: field('1697', 'F') },
      hardeningTime: field('30', 'min'),
      ecdMin: field('0.0295', 'in'),
    });
    const { request } = buildPlanRequest(imperial, settings);
    expect((request?.boost as { temperatureC: number }).temperatureC).toBeCloseTo(925, 9);
    expect((request?.hardening as { timeH: number }).timeH).toBeCloseTo(0.5, 12);
    expect((request?.targetEcdMm as { min: number }).min).toBeCloseTo(0.7493, 12);
  });

  it('an empty β takes the settings’ β; a typed one is in 10⁻⁷ m/s; no hardening soak when unticked', () => {
    const { request } = buildPlanRequest(
      form({ diffuse: { ...DEFAULT_PLAN_FORM.diffuse, beta: field('2,5') }, hardening: false }),
      { ...settings, betaMPerS: 1e-7 },
    );
    expect((request?.boost as { betaMPerS: number }).betaMPerS).toBe(1e-7);
    expect((request?.diffuse as { betaMPerS: number }).betaMPerS).toBeCloseTo(2.5e-7, 20);
    expect(request).not.toHaveProperty('hardening');
  });

  it('places each error on the field that caused it', () => {
    expect(
      computePlan(form({ boost: { ...DEFAULT_PLAN_FORM.boost, temperature: field('9x5', 'C') } }), settings).errors[
        'boost.temperatureC'
      ]?.code,
    ).toBe('number.invalid');
    expect(
      computePlan(form({ boost: { ...DEFAULT_PLAN_FORM.boost, carbonPotential: field('0.7') } }), settings).errors[
        'boost.carbonPotentialPct'
      ]?.code,
    ).toBe('carbon.boostNotAboveDiffuse');
    expect(computePlan(form({ ecdMin: field('1.2', 'mm') }), settings).errors['targetEcdMm.max']?.code).toBe(
      'range.minAboveMax',
    );
    expect(
      computePlan(form({ hardeningTemp: field('1300', 'C') }), settings).errors['hardening.temperatureC']?.code,
    ).toBe('temperature.outOfRange');
    expect(
      computePlan(form({ shape: 'bar', size: field('1.5', 'mm') }), settings).errors['targetEcdMm.max']?.code,
    ).toBe('depth.tooDeep');
  });

  it('a furnace calibration goes into the request: D × 1.2 reaches the same depth sooner', () => {
    const plain = computePlan(DEFAULT_PLAN_FORM, settings).result!;
    const calibrated = computePlan(DEFAULT_PLAN_FORM, { ...settings, calibrationFor: () => applied }).result!;
    expect(calibrated.request.diffusivityFactor).toBe(1.2);
    expect(plain.request).not.toHaveProperty('diffusivityFactor');
    expect(calibrated.plan.totalH).toBeLessThan(plain.plan.totalH);
    expect(calibrated.calibration).toBe(applied);
  });
});

describe('the planner’s words', () => {
  it('a reachable plan: times in the user’s units, predictions, the reachable surface range, and the calibration in words', () => {
    const out = computePlan(DEFAULT_PLAN_FORM, { ...settings, calibrationFor: () => applied }).result!;
    const view = planView(out, t, makeShow({ temperature: 'C', depth: 'mm', time: 'min' }, 'en'));
    expect(view.reachable).toBe(true);
    expect(view.binding).toBeUndefined();
    const row = (key: string) => view.rows.find((r) => r.key === key);
    expect(row('boost')?.value).toMatch(/^\d+\s?min$/u);
    expect(row('total')?.main).toBe(true);
    expect(row('surfaceRange')?.value).toMatch(/^0\.\d\d–0\.\d\d\s?%C$/u);
    expect(row('calibration')?.value).toBe(
      'Depth correction for F1 from lab results: diffusion speed × 1.20 (1.00 = published model; 95 %: 1.10–1.30, 7 jobs)',
    );
    expect(view.answerNote).toBe('Corrected for F1: diffusion speed × 1.20 (1.00 = published model)');
  });

  it('targets out of reach: what binds and what would help, worded in the user’s units', () => {
    // Surface carbon 0.85–0.95 %C is above what the diffuse potential 0.8 % leaves (the README's example).
    const high = computePlan(form({ surfaceMin: field('0.85'), surfaceMax: field('0.95') }), settings).result!;
    const view = planView(high, t, metric);
    expect(view.reachable).toBe(false);
    expect(view.binding).toMatch(/diffuse potential 0.8\u202f%C/u);
    // The middle of the target, 0.90 %C, over the alloy factor of SAE 8620 (1.027), rounded up.
    expect(view.suggestions).toEqual(['Raise the diffuse potential to about 0.88\u202f%C.']);
    // A 5 mm case takes longer than the 100 h limit: the time binds, worded in minutes and inches when those are chosen.
    const deep = computePlan(form({ ecdMin: field('5', 'mm'), ecdMax: field('6', 'mm') }), settings).result!;
    const inches = planView(deep, t, makeShow({ temperature: 'F', depth: 'in', time: 'min' }, 'en'));
    expect(inches.binding).toMatch(
      /^An effective case depth of 0\.197\s?in is out of reach within 6000\s?min: .* reaches \d\.\d{3}\s?in\.$/u,
    );
    expect(inches.suggestions.some((s) => s.endsWith('°F (estimate).'))).toBe(true);
  });
});

describe('a plan opened in the cycle editor', () => {
  it('the editor’s form reads back to the planned recipe, and simulates to the planned ECD', () => {
    const out = computePlan(DEFAULT_PLAN_FORM, settings).result!;
    const recipe: Recipe = out.plan.recipe;
    const cycle = cycleFormOfRecipe(recipe, {
      steel: DEFAULT_PLAN_FORM.steel,
      model: '',
      threshold: field(''),
      size: DEFAULT_PLAN_FORM.size,
      defaultBetaMPerS: settings.betaMPerS,
      labelOf: (label) => t(`app.plan.steps.${label}`),
    });
    expect(cycle.steps.map((s) => s.label)).toEqual(['Boost', 'Diffuse', 'Hardening']);
    expect(cycle.steps.every((s) => s.beta.text === '')).toBe(true);
    const read = buildRecipe(cycle, settings).recipe!;
    expect(read.steps.map((s) => [s.durationH, s.startTempC, s.endTempC, s.carbonPotentialPct, s.betaMPerS])).toEqual(
      recipe.steps.map((s) => [s.durationH, s.startTempC, s.endTempC, s.carbonPotentialPct, s.betaMPerS]),
    );
    expect(runCycle(read).effectiveCaseDepthMm).toBeCloseTo(out.plan.predicted.effectiveCaseDepthMm, 12);
  });

  it('a β other than the settings’ default is kept, in 10⁻⁷ m/s', () => {
    const recipe = computePlan(DEFAULT_PLAN_FORM, settings).result!.plan.recipe;
    const cycle = cycleFormOfRecipe(recipe, {
      steel: DEFAULT_PLAN_FORM.steel,
      model: '',
      threshold: field(''),
      size: field('20', 'mm'),
      defaultBetaMPerS: 2e-7,
      labelOf: (l) => l,
    });
    expect(cycle.steps[0]?.beta.text).toBe('1.5');
  });
});
