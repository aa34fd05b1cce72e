/**
 * The one form reader: every calculator's inputs are named by the request path physics reads, read
 * by the request's description (units converted, limits checked) and errors placed by that path.
 */
import { describe, expect, it } from 'vitest';
import { buildRecipe, cycleValues } from '../../src/app/cycle/results';
import { DEFAULT_CYCLE_FORM, updateStep } from '../../src/app/cycle/state';
import { computeDepth } from '../../src/app/depth/results';
import { DEFAULT_DEPTH_FORM } from '../../src/app/depth/state';
import { buildPlanRequest, planValues } from '../../src/app/plan/results';
import { DEFAULT_PLAN_FORM } from '../../src/app/plan/state';
import { computeRecovery } from '../../src/app/recovery/results';
import { DEFAULT_RECOVERY_FORM } from '../../src/app/recovery/state';
import { field } from '../../src/app/ui/fieldText';
import { orDefault, placeError, readForm } from '../../src/app/ui/readForm';
import {
  DEPTH_REQUEST,
  EQUIVALENT_TIME_REQUEST,
  LIMITS,
  PLAN_REQUEST,
  RECIPE_REQUEST,
  specAt,
  type FieldsSpec,
} from '../../src/physics';

const settings = { model: 'agren' as const, ecdThresholdPct: 0.4, totalCaseMarginPct: 0.05, betaMPerS: 1.5e-7 };

/** Every input path of a form names a number the request reads. */
function expectRequestPaths(spec: FieldsSpec, fields: ReadonlySet<string>) {
  expect(fields.size).toBeGreaterThan(3);
  for (const path of fields) expect(specAt(spec, path)?.type, path).toBe('number');
}

describe('inputs are named by the request path', () => {
  it('cycle editor, planner, depth and recovery: every input path is a number of the physics request', () => {
    expectRequestPaths(RECIPE_REQUEST, buildRecipe(DEFAULT_CYCLE_FORM, settings).fields);
    expectRequestPaths(PLAN_REQUEST, buildPlanRequest(DEFAULT_PLAN_FORM, settings).fields);
    expectRequestPaths(
      DEPTH_REQUEST,
      readForm(DEPTH_REQUEST, {
        temperatureC: DEFAULT_DEPTH_FORM.temperature,
        timeH: DEFAULT_DEPTH_FORM.time,
        coreCarbonPct: DEFAULT_DEPTH_FORM.steel.coreCarbon,
        carbonPotentialPct: DEFAULT_DEPTH_FORM.carbon,
        composition: DEFAULT_DEPTH_FORM.steel.composition,
      }).fields,
    );
    const recovery = readForm(EQUIVALENT_TIME_REQUEST, {
      history: DEFAULT_RECOVERY_FORM.readings.map((r) => ({ timeH: r.time, temperatureC: r.temperature })),
      setTemperatureC: DEFAULT_RECOVERY_FORM.setTemperature,
    });
    expectRequestPaths(EQUIVALENT_TIME_REQUEST, recovery.fields);
    expect([...recovery.fields]).toContain('history.1.temperatureC');
  });

  it('the plate thickness and bar diameter come from the one size input, at their own paths', () => {
    expect(readForm(RECIPE_REQUEST, cycleValues({ ...DEFAULT_CYCLE_FORM, shape: 'bar' }, settings)).fields).toContain(
      'shape.diameterMm',
    );
    expect(readForm(PLAN_REQUEST, planValues({ ...DEFAULT_PLAN_FORM, shape: 'plate' }, settings)).fields).toContain(
      'shape.thicknessMm',
    );
  });
});

describe('each input read by its description', () => {
  it('converts °F, minutes, inches and β in 10⁻⁷ m/s to the request units', () => {
    const form = updateStep(DEFAULT_CYCLE_FORM, 0, {
      startTemp: field('1697', 'F'),
      duration: field('1:30', 'h'),
      beta: field('2'),
    });
    const { recipe } = buildRecipe({ ...form, shape: 'bar', size: field('1', 'in') }, settings);
    expect(recipe?.steps[0]?.startTempC).toBeCloseTo(925, 9);
    expect(recipe?.steps[0]?.durationH).toBeCloseTo(1.5, 12);
    expect(recipe?.steps[0]?.betaMPerS).toBeCloseTo(2e-7, 20);
    expect(recipe?.shape).toEqual({ kind: 'bar', diameterMm: 25.4 });
    // A blank β is the settings' β.
    expect(recipe?.steps[1]?.betaMPerS).toBe(settings.betaMPerS);
  });

  it('checks every input against its physics limit and reports all of them at once', () => {
    let form = updateStep(DEFAULT_CYCLE_FORM, 0, { duration: field('2000', 'h') });
    form = updateStep(form, 2, { endTemp: field('1300', 'C'), carbonPotential: field('x') });
    const { errors, recipe } = buildRecipe(form, settings);
    expect(recipe).toBeUndefined();
    expect(errors['steps.0.durationH']).toMatchObject({ code: 'time.tooLong', params: { max: LIMITS.time.max } });
    expect(errors['steps.2.endTempC']?.code).toBe('temperature.outOfRange');
    expect(errors['steps.2.carbonPotentialPct']?.code).toBe('number.invalid');
  });

  it('a blank input the request needs is flagged beside it; one with a default takes the settings value', () => {
    const blank = computeDepth(
      { ...DEFAULT_DEPTH_FORM, temperature: field('', 'C') },
      { ...settings, temperatureToleranceC: 8 },
    );
    expect(blank.errors.temperatureC?.code).toBe('number.empty');
    const read = readForm(DEPTH_REQUEST, { thresholdCarbonPct: orDefault(field(''), 0.35) });
    expect(read.request.thresholdCarbonPct).toBe(0.35);
    expect(read.fields.has('thresholdCarbonPct')).toBe(true);
  });

  it('an error physics places on an input goes beside it; one on a path no input has is the general error', () => {
    const fields = new Set(['steps.0.durationH']);
    expect(placeError({ code: 'time.tooLong', field: 'steps.0.durationH' }, fields).errors).toHaveProperty(
      'steps.0.durationH',
    );
    expect(placeError({ code: 'time.tooLong', field: 'steps' }, fields).general?.field).toBe('steps');
    const recovery = computeRecovery(
      {
        ...DEFAULT_RECOVERY_FORM,
        readings: [DEFAULT_RECOVERY_FORM.readings[1]!, DEFAULT_RECOVERY_FORM.readings[0]!],
      },
      'agren',
    );
    expect(recovery.errors['history.1.timeH']?.code).toBe('history.notIncreasing');
  });
});
