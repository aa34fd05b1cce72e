/**
 * The traverse stored with a job: checked by the physics reader, its figures preferred over typed
 * ones by every reader (comparison, depth correction, export), and the job's predicted profile
 * drawn beneath it agreeing with the criterion at the predicted ECD.
 */
import { readFileSync } from 'node:fs';
import * as v from 'valibot';
import { describe, expect, it } from 'vitest';
import {
  calibrationSamples,
  ecdComparison,
  JobSchema,
  labFigures,
  measuredEcdMm,
  predictedProfile,
  type Job,
  type LabResult,
} from '../../src/jobs';
import { CASE_CRITERIA, hardnessIn, timeForCaseDepth, type Recipe } from '../../src/physics';
import { pinionDraft } from './helpers';

const ISO = CASE_CRITERIA['iso-18203'];

/** 0.2 mm 600 HV, 0.4 mm 500 HV: 550 HV is crossed half-way, at 0.3 mm (by hand); core 350 HV. */
const TRAVERSE = {
  points: [
    [0.2, 600],
    [0.4, 500],
    [0.6, 400],
    [0.8, 352],
    [1.0, 350],
    [1.2, 348],
  ].map(([depthMm, value]) => ({ depthMm: depthMm!, value: value!, unit: 'HV' as const })),
  limit: ISO,
};

function measuredJob(lab: LabResult, overrides: Partial<Job> = {}): Job {
  return {
    ...pinionDraft({ status: 'done' }),
    id: '00000000-0000-4000-8000-000000000001',
    createdAt: '2026-03-06T10:00:00.000Z',
    updatedAt: '2026-03-06T10:00:00.000Z',
    shift: 'A',
    shiftDate: '2026-03-06',
    lab,
    ...overrides,
  };
}

describe('the stored traverse', () => {
  it('is accepted with its limit, and refused by the physics reader’s own checks', () => {
    expect(v.safeParse(JobSchema, measuredJob({ traverse: TRAVERSE })).success).toBe(true);
    const unsorted = { ...TRAVERSE, points: [TRAVERSE.points[1]!, TRAVERSE.points[0]!] };
    const refused = v.safeParse(JobSchema, measuredJob({ traverse: unsorted }));
    expect(refused.success).toBe(false);
    expect(refused.issues?.[0]?.path?.map((p) => p.key)).toEqual(['lab', 'traverse']);
    const wrongScale = { ...TRAVERSE, points: TRAVERSE.points.map((p) => ({ ...p, unit: 'HRC' as const })) };
    expect(v.safeParse(JobSchema, measuredJob({ traverse: wrongScale })).success).toBe(false);
  });

  it('gives the ECD, surface and core hardness; a typed ECD counts only where the traverse has none', () => {
    const figures = labFigures({ traverse: TRAVERSE, ecdMm: 0.9 });
    expect(figures.ecdMm).toBeCloseTo(0.3, 12);
    expect(figures.surfaceHardness).toEqual({ value: 600, unit: 'HV' });
    expect(figures.coreHardness?.value).toBeCloseTo(350, 12);
    expect(figures.fromTraverse).toEqual({ ecd: true, surface: true, core: true });
    const soft = { ...TRAVERSE, points: TRAVERSE.points.map((p) => ({ ...p, value: Math.min(p.value, 540) })) };
    const judged = labFigures({ traverse: soft, ecdMm: 0.25 });
    expect(judged.ecdMm).toBe(0.25);
    expect(judged.fromTraverse.ecd).toBe(false);
    expect(labFigures({ ecdMm: 0.8 }).ecdMm).toBe(0.8);
    expect(labFigures(undefined)).toEqual({ fromTraverse: { ecd: false, surface: false, core: false } });
  });

  it('the comparison with the prediction and the depth correction use the traverse’s ECD', () => {
    const job = measuredJob({ traverse: TRAVERSE, ecdMm: 0.9 });
    expect(measuredEcdMm(job)).toBeCloseTo(0.3, 12);
    expect(ecdComparison(job)?.measuredMm).toBeCloseTo(0.3, 12);
    const [sample] = calibrationSamples([job], 'F1').samples;
    expect(sample?.measuredEcdMm).toBeCloseTo(0.3, 12);
  });
});

describe('the predicted profile beneath a traverse', () => {
  const recipe = JSON.parse(readFileSync('public/examples/pinion-kr2231-cycle.json', 'utf8')) as Recipe;
  const cycleJob = measuredJob({ traverse: TRAVERSE }, { inputs: { kind: 'cycle', recipe } });

  it.each([
    ['a closed-form job', measuredJob({ traverse: TRAVERSE })],
    ['a cycle job', cycleJob],
  ])('%s: the indicative hardness meets the limit at the predicted ECD and starts from the lab’s core', (_, job) => {
    const core = { value: 350, unit: 'HV' as const };
    const predicted = predictedProfile(job, { limit: ISO, coreHardness: core });
    if (typeof predicted === 'string') throw new Error(predicted);
    // Crossing of the drawn curve, by linear interpolation between its points (the definition of ECD).
    const hv = predicted.profile.map((p) => hardnessIn({ value: p.hardnessHrc, unit: 'HRC' }, 'HV')!);
    const k = hv.findIndex((h) => h <= ISO.value);
    const d0 = predicted.profile[k - 1]!.depthMm;
    const d1 = predicted.profile[k]!.depthMm;
    const crossing = d0 + ((hv[k - 1]! - ISO.value) / (hv[k - 1]! - hv[k]!)) * (d1 - d0);
    // The profile is sampled every 1/100 of its depth: the crossing agrees to a few µm.
    expect(Math.abs(crossing - predicted.effectiveCaseDepthMm)).toBeLessThan(0.005);
    expect(predicted.hardnessBasis.coreSource).toBe('steel');
    expect(hardnessIn({ value: predicted.hardnessBasis.coreHardnessHrc, unit: 'HRC' }, 'HV')).toBeCloseTo(350, 6);
  });

  it('a time request is drawn at the time it answered: its ECD is the depth it was asked for', () => {
    const job = measuredJob({ traverse: TRAVERSE });
    const { kind: _kind, ...request } = job.inputs as Extract<Job['inputs'], { kind: 'time' }>;
    const solved = timeForCaseDepth(request);
    if (!solved.ok) throw new Error(solved.error.code);
    const answered = { ...job, prediction: { ...job.prediction!, timeH: solved.value.timeH } };
    const predicted = predictedProfile(answered, { limit: ISO });
    if (typeof predicted === 'string') throw new Error(predicted);
    expect(predicted.effectiveCaseDepthMm).toBeCloseTo(request.targetDepthMm, 9);
  });

  it('a job without inputs has no profile, with the reason', () => {
    expect(predictedProfile(measuredJob({ traverse: TRAVERSE }, { inputs: undefined }), { limit: ISO })).toBe(
      'noInputs',
    );
  });
});
