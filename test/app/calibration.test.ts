/**
 * Furnace calibration in the app: the figures kept with the settings (checked on read), what
 * they mean for a calculation, the calibration view's cards, and every calculator's use of the factor.
 */
import { describe, expect, it } from 'vitest';
import { computeCycle } from '../../src/app/cycle/results';
import { DEFAULT_CYCLE_FORM } from '../../src/app/cycle/state';
import { depthLogEntry } from '../../src/app/depth/logEntry';
import { computeDepth } from '../../src/app/depth/results';
import { depthView } from '../../src/app/depth/rows';
import { DEFAULT_DEPTH_FORM } from '../../src/app/depth/state';
import { calibrationCards } from '../../src/app/log/calibration';
import { planRows } from '../../src/app/log/jobRows';
import {
  calibrationState,
  factorOf,
  readCalibrations,
  type StoredCalibration,
} from '../../src/app/settings/calibration';
import { makeShow } from '../../src/app/ui/show';
import { createI18n } from '../../src/i18n/i18n';
import { caseDepth, DIFFUSIVITY_MODELS, runCycle } from '../../src/physics';
import type { Job } from '../../src/jobs/schema';
import { pinionDraft } from '../jobs/helpers';

const t = createI18n('en').t;
const show = makeShow({ temperature: 'C', depth: 'mm', time: 'h' }, 'en');
const f1: StoredCalibration = {
  furnace: 'F1',
  factor: 1.21,
  low: 1.1,
  high: 1.33,
  jobCount: 5,
  rmsMm: 0.02,
  fittedAt: '2025-03-05T10:00:00.000Z',
  model: 'agren',
  apply: true,
};

describe('calibration figures kept with the settings', () => {
  it('keeps valid entries, one per furnace (the last), sorted; drops anything malformed', () => {
    const stored = [
      { ...f1, furnace: 'F2' },
      f1,
      { ...f1, factor: 1.25 },
      { ...f1, furnace: 'F3', factor: 0.05, low: 0.04 }, // outside 0.1–10
      { ...f1, furnace: 'F4', low: 1.3 }, // interval does not hold the factor
      { ...f1, furnace: 'F5', model: 'unknown' },
      { ...f1, furnace: '' },
      { ...f1, furnace: 'F6', jobCount: 2.5 },
      { ...f1, furnace: 'F7', fittedAt: 'yesterday' },
      { ...f1, furnace: 'F8', apply: 'yes' },
      null,
      'F9',
    ];
    expect(readCalibrations(stored).map((c) => [c.furnace, c.factor])).toEqual([
      ['F1', 1.25],
      ['F2', 1.21],
    ]);
    expect(readCalibrations({ F1: f1 })).toEqual([]);
    expect(readCalibrations([{ ...f1, extra: 'dropped' }])[0]).toEqual(f1);
  });

  it('says what the chosen furnace’s calibration means for a calculation with a given model', () => {
    const list = [f1, { ...f1, furnace: 'F2', apply: false }];
    expect(calibrationState(list, '', 'agren')).toEqual({ kind: 'none' });
    expect(calibrationState(list, 'F3', 'agren')).toEqual({ kind: 'uncalibrated', furnace: 'F3' });
    expect(calibrationState(list, 'F2', 'agren').kind).toBe('off');
    expect(calibrationState(list, 'F1', 'tibbetts').kind).toBe('otherModel');
    const applied = calibrationState(list, 'F1', 'agren');
    expect(applied.kind).toBe('applied');
    expect(factorOf(applied)).toBe(1.21);
    expect(factorOf(calibrationState(list, 'F1', 'tibbetts'))).toBe(1);
    expect(factorOf(calibrationState(list, 'F2', 'agren'))).toBe(1);
  });
});

describe('the calculators with a calibrated furnace', () => {
  const depthSettings = {
    model: 'agren' as const,
    ecdThresholdPct: 0.4,
    totalCaseMarginPct: 0.05,
    temperatureToleranceC: 8,
  };

  it('depth: D × 1.21 gives √1.21 = 1.1 × the ECD (closed form, Crank eq. 3.13), and every row and the answer say so', () => {
    const plain = computeDepth(DEFAULT_DEPTH_FORM, depthSettings).result!;
    const out = computeDepth(DEFAULT_DEPTH_FORM, {
      ...depthSettings,
      calibration: calibrationState([f1], 'F1', 'agren'),
    }).result!;
    expect(out.figures.effectiveCaseDepthMm / plain.figures.effectiveCaseDepthMm).toBeCloseTo(1.1, 12);
    expect(out.request.diffusivityFactor).toBe(1.21);
    const view = depthView(out, t, show, 0.05);
    expect(view.rows[0]).toMatchObject({
      key: 'calibration',
      value:
        'Depth correction for F1 from lab results: diffusion speed × 1.21 (1.00 = published model; 95 %: 1.10–1.33, 5 jobs)',
    });
    expect(view.answerNote).toBe('Corrected for F1: diffusion speed × 1.21 (1.00 = published model)');
    const entry = depthLogEntry(out, 'sae-8620');
    expect(entry.furnace).toBe('F1');
    expect(entry.inputs).toMatchObject({ kind: 'depth', diffusivityFactor: 1.21, temperatureToleranceC: 8 });
    // The saved job shows the factor it was predicted with.
    expect(planRows(entry.steel, entry.inputs, { t, show, locale: 'en' }).find((r) => r.key === 'factor')?.value).toBe(
      'diffusion speed × 1.21 (1.00 = published model)',
    );
  });

  it('depth: a calibration turned off changes nothing but is named; no furnace, no words', () => {
    const plain = computeDepth(DEFAULT_DEPTH_FORM, depthSettings).result!;
    const off = computeDepth(DEFAULT_DEPTH_FORM, {
      ...depthSettings,
      calibration: calibrationState([{ ...f1, apply: false }], 'F1', 'agren'),
    }).result!;
    expect(off.figures).toEqual(plain.figures);
    expect(off.request).not.toHaveProperty('diffusivityFactor');
    expect(depthView(off, t, show, 0.05).rows[0]?.value).toMatch(
      /^F1 has a depth correction from lab results, but it is off/u,
    );
    expect(depthView(plain, t, show, 0.05).rows.some((r) => r.key === 'calibration')).toBe(false);
    expect(depthLogEntry(plain, 'sae-8620')).not.toHaveProperty('furnace');
  });

  it('depth: the furnace temperature tolerance from the settings sets the likely range, shown beside the ECD with its parts', () => {
    const wide = computeDepth(DEFAULT_DEPTH_FORM, { ...depthSettings, temperatureToleranceC: 15 }).result!;
    const narrow = computeDepth(DEFAULT_DEPTH_FORM, depthSettings).result!;
    expect(wide.figures.uncertaintyMm.temperatureToleranceC).toBe(15);
    expect(wide.figures.uncertaintyMm.maxMm - wide.figures.uncertaintyMm.minMm).toBeGreaterThan(
      narrow.figures.uncertaintyMm.maxMm - narrow.figures.uncertaintyMm.minMm,
    );
    const view = depthView(narrow, t, show, 0.05);
    const band = view.rows.find((r) => r.key === 'band')!;
    expect(band.value).toBe(show.depthRange(narrow.figures.uncertaintyMm.minMm, narrow.figures.uncertaintyMm.maxMm));
    expect(band.detail).toMatch(/^models .* · furnace ±8\s?°C: /u);
    expect(view.answerDetail).toBe(`likely ${band.value}`);
    // The same band the physics gives for this request.
    const direct = caseDepth({ ...narrow.request });
    expect(direct.ok && direct.value.uncertaintyMm).toEqual(narrow.figures.uncertaintyMm);
  });

  it('cycle: the recipe carries k and the simulation runs with the model’s D × k, for the form’s own model', () => {
    const settings = { model: 'agren' as const, ecdThresholdPct: 0.4, totalCaseMarginPct: 0.05, betaMPerS: 1.5e-7 };
    const out = computeCycle(DEFAULT_CYCLE_FORM, {
      ...settings,
      calibrationFor: (m) => calibrationState([f1], 'F1', m),
    }).result!;
    expect(out.recipe.diffusivityFactor).toBe(1.21);
    const { diffusivityFactor: _k, ...uncalibrated } = out.recipe;
    const direct = runCycle(uncalibrated, 1, {
      diffusivity: (tempK, carbonPct) => 1.21 * DIFFUSIVITY_MODELS.agren.diffusivity(tempK, carbonPct),
    });
    expect(out.simulation.effectiveCaseDepthMm).toBeCloseTo(direct.effectiveCaseDepthMm, 12);
    expect(out.calibration.kind).toBe('applied');
    const tibbetts = computeCycle(
      { ...DEFAULT_CYCLE_FORM, model: 'tibbetts' },
      { ...settings, calibrationFor: (m) => calibrationState([f1], 'F1', m) },
    ).result!;
    expect(tibbetts.calibration.kind).toBe('otherModel');
    expect(tibbetts.simulation.effectiveCaseDepthMm).toBeCloseTo(runCycle(tibbetts.recipe).effectiveCaseDepthMm, 12);
  });
});

describe('the calibration view', () => {
  let serial = 0;
  const job = (furnace: string, timeH: number, k: number): Job => {
    const n = serial++;
    const draft = pinionDraft({
      furnace,
      inputs: { kind: 'depth', temperatureC: 925, timeH, carbonPotentialPct: 0.9, coreCarbonPct: 0.2 },
    });
    const ecd = caseDepth({
      temperatureC: 925,
      timeH,
      carbonPotentialPct: 0.9,
      coreCarbonPct: 0.2,
      diffusivityFactor: k,
    });
    if (!ecd.ok) throw new Error(ecd.error.code);
    const at = new Date(Date.UTC(2025, 0, 1) + n * 3.6e6).toISOString();
    return {
      ...draft,
      id: `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`,
      createdAt: at,
      updatedAt: at,
      shift: 'A',
      shiftDate: '2025-01-01',
      lab: { ecdMm: ecd.value.effectiveCaseDepthMm },
    };
  };
  const now = new Date('2025-03-06T08:00:00.000Z');
  const jobs = [job('F1', 4, 1.21), job('F1', 6, 1.21), job('F1', 8, 1.21), job('F2', 6, 0.9)];

  it('one card per furnace with lab depths or stored figures; a fit to store, off until turned on', () => {
    const cards = calibrationCards(jobs, [{ ...f1, furnace: 'F3' }], 'agren', now);
    expect(cards.map((c) => c.furnace)).toEqual(['F1', 'F2', 'F3']);
    const [c1, c2, c3] = cards;
    expect(c1!.fresh).toMatchObject({
      furnace: 'F1',
      jobCount: 3,
      model: 'agren',
      apply: false,
      fittedAt: now.toISOString(),
    });
    expect(c1!.fresh!.factor).toBeCloseTo(1.21, 8);
    expect(c2!.calibration.fit).toEqual({
      ok: false,
      error: { code: 'calibration.tooFewJobs', params: { min: 3, count: 1 } },
    });
    expect(c2!.fresh).toBeUndefined();
    expect(c3!.stored?.furnace).toBe('F3');
    expect(c3!.stale).toBe(true);
  });

  it('stored figures are up to date while the fit is the same, out of date after a new lab result or for another model', () => {
    const fit = calibrationCards(jobs, [], 'agren', now)[0]!.fresh!;
    const kept = { ...fit, apply: true, fittedAt: '2025-03-01T08:00:00.000Z' };
    const same = calibrationCards(jobs, [kept], 'agren', now)[0]!;
    expect(same.stale).toBe(false);
    expect(same.fresh!.apply).toBe(true);
    expect(calibrationCards([...jobs, job('F1', 5, 1.3)], [kept], 'agren', now)[0]!.stale).toBe(true);
    expect(calibrationCards(jobs, [kept], 'tibbetts', now)[0]!.stale).toBe(true);
  });
});
