/**
 * A learnt ECD threshold in the app: the figures kept with the settings (checked on read), applied
 * only when turned on, for its furnace, grade and model, only when no threshold is typed, together
 * with the diffusion speed fitted with it; and said on every result it changes.
 */
import { describe, expect, it } from 'vitest';
import { computeCycle, type CycleDefaults } from '../../src/app/cycle/results';
import { DEFAULT_CYCLE_FORM } from '../../src/app/cycle/state';
import { cycleView } from '../../src/app/cycle/view';
import { computePlan } from '../../src/app/plan/results';
import { DEFAULT_PLAN_FORM } from '../../src/app/plan/state';
import { planView } from '../../src/app/plan/view';
import { calibrationState, type StoredCalibration } from '../../src/app/settings/calibration';
import { appliedThreshold, readThresholds, type StoredThreshold } from '../../src/app/settings/plantThreshold';
import { field } from '../../src/app/ui/fieldText';
import { makeShow } from '../../src/app/ui/show';
import { createI18n } from '../../src/i18n/i18n';
import { runCycle } from '../../src/physics';

const t = createI18n('en').t;
const show = makeShow({ temperature: 'C', depth: 'mm', time: 'h' }, 'en');
const units = { temperature: 'C', depth: 'mm', time: 'h' } as const;

const learnt: StoredThreshold = {
  furnace: 'F1',
  grade: 'sae-8620',
  thresholdPct: 0.36,
  low: 0.34,
  high: 0.38,
  factor: 1.12,
  factorLow: 1.05,
  factorHigh: 1.2,
  loadCount: 12,
  fittedAt: '2026-12-01T10:00:00.000Z',
  model: 'agren',
  apply: true,
};
const correction: StoredCalibration = {
  furnace: 'F1',
  factor: 1.21,
  low: 1.1,
  high: 1.33,
  jobCount: 5,
  rmsMm: 0.02,
  fittedAt: '2026-12-01T10:00:00.000Z',
  model: 'agren',
  apply: true,
};

const settingsWith = (list: readonly StoredThreshold[]): CycleDefaults => ({
  model: 'agren',
  ecdThresholdPct: 0.4,
  totalCaseMarginPct: 0.05,
  betaMPerS: 1.5e-7,
  calibrationFor: (m, grade) => {
    const applied = appliedThreshold(list, 'F1', grade, m);
    return applied ? { kind: 'learnt', furnace: 'F1', learnt: applied } : calibrationState([correction], 'F1', m);
  },
});

describe('learnt thresholds kept with the settings', () => {
  it('keeps well-formed entries, one per furnace and grade, and drops the rest', () => {
    const older = { ...learnt, thresholdPct: 0.35, low: 0.33, high: 0.37 };
    expect(readThresholds([older, learnt, { ...learnt, grade: '' }, { ...learnt, low: 0.4 }, null])).toEqual([learnt]);
    expect(readThresholds('nonsense')).toEqual([]);
  });

  it('applies only when turned on, for its furnace, grade and model', () => {
    expect(appliedThreshold([learnt], 'F1', 'sae-8620', 'agren')).toEqual(learnt);
    expect(appliedThreshold([{ ...learnt, apply: false }], 'F1', 'sae-8620', 'agren')).toBeUndefined();
    expect(appliedThreshold([learnt], 'F2', 'sae-8620', 'agren')).toBeUndefined();
    expect(appliedThreshold([learnt], 'F1', '20mncr5', 'agren')).toBeUndefined();
    expect(appliedThreshold([learnt], 'F1', 'sae-8620', 'tibbetts')).toBeUndefined();
  });
});

describe('a cycle with a learnt threshold', () => {
  const form = { ...DEFAULT_CYCLE_FORM, steel: { ...DEFAULT_CYCLE_FORM.steel, grade: 'sae-8620' } };

  it('runs at the learnt threshold with its diffusion speed, in place of the depth correction, and says so', () => {
    const out = computeCycle(form, settingsWith([learnt])).result!;
    expect(out.recipe.thresholdCarbonPct).toBe(0.36);
    expect(out.recipe.diffusivityFactor).toBe(1.12);
    expect(out.simulation.effectiveCaseDepthMm).toBeCloseTo(runCycle(out.recipe).effectiveCaseDepthMm, 12);
    const view = cycleView(out, t, show, units);
    expect(view.rows[0]).toMatchObject({
      key: 'calibration',
      label: 'ECD threshold',
      value:
        'Learnt for SAE 8620 in F1 from 12 traverses: threshold 0.36\u202f%C (95 %: 0.34\u202f%C–0.38\u202f%C) with diffusion speed × 1.12 (1.00 = published model), in place of the stand-in and the depth correction.',
    });
    expect(view.answerNote).toBe('Threshold 0.36\u202f%C learnt for SAE 8620 in F1');
  });

  it('a typed threshold wins: the learnt one and its speed are not used, the depth correction is', () => {
    const out = computeCycle({ ...form, threshold: field('0,42') }, settingsWith([learnt])).result!;
    expect(out.recipe.thresholdCarbonPct).toBe(0.42);
    expect(out.recipe.diffusivityFactor).toBe(1.21);
    expect(out.calibration.kind).toBe('applied');
  });

  it('turned off, nothing changes but the depth correction', () => {
    const out = computeCycle(form, settingsWith([{ ...learnt, apply: false }])).result!;
    expect(out.recipe.thresholdCarbonPct).toBe(0.4);
    expect(out.calibration.kind).toBe('applied');
  });

  it('the planner plans at the learnt threshold and says so too', () => {
    const planForm = { ...DEFAULT_PLAN_FORM, steel: { ...DEFAULT_PLAN_FORM.steel, grade: 'sae-8620' } };
    const out = computePlan(planForm, settingsWith([learnt])).result!;
    expect(out.request).toMatchObject({ thresholdCarbonPct: 0.36, diffusivityFactor: 1.12 });
    expect(planView(out, t, show).rows[0]).toMatchObject({ key: 'calibration', label: 'ECD threshold' });
  });
});
