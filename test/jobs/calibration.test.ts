/**
 * Furnace calibration from the job log: synthetic logs whose "lab" depths come from the same
 * engine with a known diffusivity factor k, with and without lab scatter, across closed-form
 * and cycle jobs.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calibrateFurnace, calibrationSamples, furnacesWithLabDepth } from '../../src/jobs/calibration';
import type { JobInputs } from '../../src/jobs/inputs';
import type { Job } from '../../src/jobs/schema';
import {
  caseDepth,
  DIFFUSIVITY_MODELS,
  type DiffusivityModelId,
  mulberry32,
  type Recipe,
  runCycle,
  timeForCaseDepth,
} from '../../src/physics';
import { pinionDraft } from './helpers';

const SAE_8620 = { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 };
const normal = (u: () => number) => () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
const recipeOf = (file: string) => JSON.parse(readFileSync(`public/examples/${file}`, 'utf8')) as Recipe;

let serial = 0;
/** A stored job (ids and times made up in order, so newer jobs come later). */
function job(
  furnace: string,
  inputs: JobInputs,
  predictionExtra: Partial<Job['prediction']>,
  labEcdMm: number | undefined,
): Job {
  const n = serial++;
  const draft = pinionDraft({ furnace, inputs });
  return {
    ...draft,
    id: `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`,
    createdAt: new Date(Date.UTC(2025, 0, 1) + n * 3.6e6).toISOString(),
    updatedAt: new Date(Date.UTC(2025, 0, 1) + n * 3.6e6).toISOString(),
    shift: 'A',
    shiftDate: '2025-01-01',
    status: 'done',
    prediction: { ...draft.prediction!, ...predictionExtra },
    ...(labEcdMm === undefined ? {} : { lab: { ecdMm: labEcdMm } }),
  };
}

const depthInputs = (temperatureC: number, timeH: number, extra: Partial<JobInputs> = {}): JobInputs =>
  ({
    kind: 'depth',
    temperatureC,
    timeH,
    carbonPotentialPct: 0.9,
    coreCarbonPct: 0.2,
    composition: SAE_8620,
    ...extra,
  }) as JobInputs;

/** The ECD the engine gives for a depth request with D × k. */
function closedFormEcd(inputs: JobInputs, k: number, model?: DiffusivityModelId): number {
  const { kind: _kind, ...request } = inputs as Extract<JobInputs, { kind: 'depth' }>;
  const r = caseDepth({ ...request, diffusivityFactor: k, ...(model ? { model } : {}) });
  if (!r.ok) throw new Error(r.error.code);
  return r.value.effectiveCaseDepthMm;
}

function cycleEcd(recipe: Recipe, k: number): number {
  return runCycle(recipe, 1, {
    diffusivity: (tempK, carbonPct) => k * DIFFUSIVITY_MODELS.agren.diffusivity(tempK, carbonPct),
  }).effectiveCaseDepthMm;
}

/** Depth jobs at 900–950 °C for 3–10 h on `furnace`, lab = engine with D × kTrue, times (1 + relative scatter). */
function depthLog(
  furnace: string,
  kTrue: number,
  count: number,
  scatter: number,
  seed: number,
  model?: DiffusivityModelId,
): Job[] {
  const u = mulberry32(seed);
  const z = normal(u);
  return Array.from({ length: count }, () => {
    const inputs = depthInputs(Math.round(900 + 50 * u()), Math.round((3 + 7 * u()) * 10) / 10, model ? { model } : {});
    return job(furnace, inputs, {}, closedFormEcd(inputs, kTrue) * (1 + scatter * z()));
  });
}

describe('calibration samples from the log', () => {
  it('takes only jobs of the furnace with a lab ECD, newest first, and says why others were skipped', () => {
    const f1 = depthLog('F1', 1, 3, 0, 1);
    const noLab = job('F1', depthInputs(925, 6), {}, undefined);
    const other = depthLog('F2', 1, 2, 0, 2);
    const noInputs = { ...job('F1', depthInputs(925, 6), {}, 0.9), inputs: undefined } as Job;
    const timeWithoutAnswer = job(
      'F1',
      { kind: 'time', temperatureC: 925, targetDepthMm: 0.9, carbonPotentialPct: 0.9, coreCarbonPct: 0.2 },
      { timeH: undefined },
      0.9,
    );
    const set = calibrationSamples([...f1, noLab, ...other, noInputs, timeWithoutAnswer], 'F1');
    expect(set.samples.map((s) => s.id)).toEqual(f1.map((j) => j.id).reverse());
    expect(set.skipped).toEqual([
      { id: timeWithoutAnswer.id, reason: 'noRunConditions' },
      { id: noInputs.id, reason: 'noInputs' },
    ]);
    expect(furnacesWithLabDepth([...f1, noLab, ...other])).toEqual(['F1', 'F2']);
  });

  it('a time request is re-run at the time it answered, a temperature request at its temperature', () => {
    const request = {
      temperatureC: 930,
      targetDepthMm: 1.1,
      carbonPotentialPct: 0.9,
      coreCarbonPct: 0.2,
      composition: SAE_8620,
    };
    const solved = timeForCaseDepth(request);
    if (!solved.ok) throw new Error(solved.error.code);
    const timeJob = job('F1', { kind: 'time', ...request }, { timeH: solved.value.timeH }, 1.1);
    const tempJob = job(
      'F1',
      {
        kind: 'temperature',
        timeH: solved.value.timeH,
        targetDepthMm: 1.1,
        carbonPotentialPct: 0.9,
        coreCarbonPct: 0.2,
        composition: SAE_8620,
      },
      { temperatureC: 930 },
      1.1,
    );
    const [a, b] = calibrationSamples([timeJob, tempJob], 'F1').samples;
    // With k = 1 both re-runs land on the depth the time was solved for.
    expect(a!.predictEcdMm(1)).toBeCloseTo(1.1, 9);
    expect(b!.predictEcdMm(1)).toBeCloseTo(1.1, 9);
    // Closed form: depth ∝ √(k·D·t) (Crank, eq. 3.13).
    expect(a!.predictEcdMm(1.21)).toBeCloseTo(1.1 * 1.1, 9);
  });

  it('a job planned with a calibration factor is re-run with the factor being fitted, not its own', () => {
    const inputs = depthInputs(925, 6, { diffusivityFactor: 1.3 });
    const [sample] = calibrationSamples([job('F1', inputs, {}, 0.9)], 'F1').samples;
    expect(sample!.predictEcdMm(1)).toBeCloseTo(closedFormEcd(depthInputs(925, 6), 1), 12);
  });
});

describe('fitting a furnace', () => {
  it('recovers k = 1.18 exactly from a noise-free log of depth jobs', () => {
    const { fit } = calibrateFurnace(depthLog('F1', 1.18, 6, 0, 11), 'F1');
    if (!fit.ok) throw new Error(fit.error.code);
    expect(fit.value.factor).toBeCloseTo(1.18, 8);
    expect(fit.value.jobCount).toBe(6);
    expect(fit.value.rmsResidualMm).toBeLessThan(1e-8);
  });

  it('recovers k = 0.87 exactly from cycle jobs (the demo recipes) re-run by the simulator', () => {
    const recipes = [
      recipeOf('pinion-kr2231-cycle.json'),
      recipeOf('shaft-kr4410-cycle.json'),
      recipeOf('pin-kr0907-cycle.json'),
    ];
    const jobs = recipes.map((recipe) => job('F2', { kind: 'cycle', recipe }, {}, cycleEcd(recipe, 0.87)));
    const { fit } = calibrateFurnace(jobs, 'F2');
    if (!fit.ok) throw new Error(fit.error.code);
    expect(fit.value.factor).toBeCloseTo(0.87, 6);
    expect(fit.value.residuals.map((r) => Math.abs(r.residualMm))).toEqual([
      expect.any(Number),
      expect.any(Number),
      expect.any(Number),
    ]);
    expect(Math.max(...fit.value.residuals.map((r) => Math.abs(r.residualMm)))).toBeLessThan(1e-6);
  });

  it('with 4 % lab scatter on a mixed log of 14 jobs, k = 1.12 lies inside the 95 % interval', () => {
    const recipes = [recipeOf('pinion-kr2231-cycle.json'), recipeOf('shaft-kr4410-cycle.json')];
    const u = mulberry32(5);
    const z = normal(u);
    const cycles = recipes.map((recipe) =>
      job('F3', { kind: 'cycle', recipe }, {}, cycleEcd(recipe, 1.12) * (1 + 0.04 * z())),
    );
    const jobs = [...depthLog('F3', 1.12, 12, 0.04, 23), ...cycles];
    const { fit } = calibrateFurnace(jobs, 'F3');
    if (!fit.ok) throw new Error(fit.error.code);
    expect(fit.value.jobCount).toBe(14);
    expect(fit.value.interval95.low).toBeLessThan(1.12);
    expect(fit.value.interval95.high).toBeGreaterThan(1.12);
    expect(fit.value.interval95.high / fit.value.interval95.low).toBeLessThan(1.25);
    expect(fit.value.rmsResidualMm).toBeGreaterThan(0.005);
  });

  it('fits relative to the model asked for: a log made with Tibbetts and k = 0.9 gives 0.9 only when re-run with Tibbetts', () => {
    const jobs = depthLog('F1', 1, 5, 0, 3).map((j) => ({
      ...j,
      lab: { ecdMm: closedFormEcd(j.inputs!, 0.9, 'tibbetts') },
    }));
    const tibbetts = calibrateFurnace(jobs, 'F1', { model: 'tibbetts' }).fit;
    const agren = calibrateFurnace(jobs, 'F1', { model: 'agren' }).fit;
    if (!tibbetts.ok || !agren.ok) throw new Error('fit failed');
    expect(tibbetts.value.factor).toBeCloseTo(0.9, 8);
    expect(Math.abs(agren.value.factor - 0.9)).toBeGreaterThan(0.01);
  });

  it('uses only the newest `maxJobs` lab results', () => {
    const old = depthLog('F1', 0.7, 5, 0, 8);
    const recent = depthLog('F1', 1.2, 4, 0, 9);
    const { fit } = calibrateFurnace([...old, ...recent], 'F1', { maxJobs: 4 });
    if (!fit.ok) throw new Error(fit.error.code);
    expect(fit.value.factor).toBeCloseTo(1.2, 8);
  });

  it('a job whose inputs today’s checks refuse (2000 °C, 5000 h, 700 °C) is left out and listed, and the furnace still fits', () => {
    const good = depthLog('F1', 1.1, 5, 0, 12);
    const hot = job('F1', depthInputs(2000, 6), {}, 0.9);
    const long = job('F1', depthInputs(925, 5000), {}, 0.9);
    const noAustenite = job('F1', depthInputs(700, 6), {}, 0.2);
    const runaway = job('F1', { kind: 'cycle', recipe: { ...recipeOf('pin-kr0907-cycle.json'), steps: [] } }, {}, 0.5);
    const { fit, skipped } = calibrateFurnace([...good, hot, long, noAustenite, runaway], 'F1');
    if (!fit.ok) throw new Error(fit.error.code);
    expect(fit.value.factor).toBeCloseTo(1.1, 8);
    expect(fit.value.jobCount).toBe(5);
    expect(skipped).toEqual([
      { id: runaway.id, reason: 'invalidInputs' },
      { id: noAustenite.id, reason: 'invalidInputs' },
      { id: long.id, reason: 'invalidInputs' },
      { id: hot.id, reason: 'invalidInputs' },
    ]);
  });

  it('a cycle job that never reaches austenite gives no case: left out as such, not a broken fit', () => {
    const cold: Recipe = {
      ...recipeOf('pin-kr0907-cycle.json'),
      steps: [{ durationH: 4, startTempC: 20, endTempC: 700, carbonPotentialPct: null }],
    };
    const coldJob = job('F1', { kind: 'cycle', recipe: cold }, {}, 0.3);
    const { fit, skipped } = calibrateFurnace([...depthLog('F1', 0.9, 4, 0, 13), coldJob], 'F1');
    expect(fit.ok).toBe(true);
    expect(skipped).toEqual([{ id: coldJob.id, reason: 'noCase' }]);
  });

  it('too few lab results on the furnace give the typed error with the count', () => {
    const { fit } = calibrateFurnace([...depthLog('F1', 1, 2, 0, 4), ...depthLog('F2', 1, 5, 0, 4)], 'F1');
    expect(fit).toEqual({ ok: false, error: { code: 'calibration.tooFewJobs', params: { min: 3, count: 2 } } });
  });
});
