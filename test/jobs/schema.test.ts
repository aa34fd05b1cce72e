import fc from 'fast-check';
import * as v from 'valibot';
import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { JobInputsSchema } from '../../src/jobs/inputs';
import { InitialsSchema, JobSchema, LabResultSchema, TimestampSchema, type Job } from '../../src/jobs/schema';

const job: Job = demoJobs({ count: 1, end: new Date('2025-05-01T12:00:00Z'), seed: 3 })[0]!;
const ok = (schema: v.GenericSchema, value: unknown) => v.safeParse(schema, value).success;

describe('job record schema (version 2)', () => {
  it('operator: initials of 1–4 letters of any alphabet, or a badge number of up to 8 digits', () => {
    for (const good of ['M', 'MK', 'JRAT', 'ÑO', 'ÖZ', 'Ж', '4417', '00731', '12345678'])
      expect(ok(InitialsSchema, good), good).toBe(true);
    for (const bad of ['', 'ABCDE', 'M1', 'M K', 'M.', '<b>', '😀', '123456789', '44 17'])
      expect(ok(InitialsSchema, bad), bad).toBe(false);
  });

  it('timestamps are UTC as toISOString writes them, and real moments', () => {
    expect(ok(TimestampSchema, '2025-03-05T02:00:00.000Z')).toBe(true);
    for (const bad of [
      '2025-03-05T02:00:00Z',
      '2025-03-05T02:00:00.000+01:00',
      '2025-02-30T00:00:00.000Z',
      '2025-03-05',
      'now',
    ]) {
      expect(ok(TimestampSchema, bad), bad).toBe(false);
    }
  });

  it('the planned inputs are one of four kinds, each with its own required fields', () => {
    const spec = { coreCarbonPct: 0.2, carbonPotentialPct: 0.9 };
    expect(ok(JobInputsSchema, { kind: 'depth', temperatureC: 925, timeH: 6, ...spec })).toBe(true);
    expect(ok(JobInputsSchema, { kind: 'time', temperatureC: 925, targetDepthMm: 0.9, ...spec })).toBe(true);
    expect(ok(JobInputsSchema, { kind: 'temperature', timeH: 6, targetDepthMm: 0.9, ...spec })).toBe(true);
    expect(ok(JobInputsSchema, { kind: 'depth', temperatureC: 925, targetDepthMm: 0.9, ...spec })).toBe(false);
    expect(ok(JobInputsSchema, { kind: 'guess', ...spec })).toBe(false);
    // Furnace calibration and temperature tolerance, in the physics layer's accepted ranges.
    expect(
      ok(JobInputsSchema, {
        kind: 'depth',
        temperatureC: 925,
        timeH: 6,
        diffusivityFactor: 0.93,
        temperatureToleranceC: 8,
        ...spec,
      }),
    ).toBe(true);
    expect(ok(JobInputsSchema, { kind: 'depth', temperatureC: 925, timeH: 6, diffusivityFactor: 0, ...spec })).toBe(
      false,
    );
    expect(
      ok(JobInputsSchema, { kind: 'depth', temperatureC: 925, timeH: 6, temperatureToleranceC: 500, ...spec }),
    ).toBe(false);
    const recipe = {
      name: 'KR-4410 boost/diffuse',
      steel: { grade: '20MnCr5', coreCarbonPct: 0.2 },
      shape: { kind: 'bar', diameterMm: 38 },
      steps: [
        { label: 'boost', durationH: 5, startTempC: 940, endTempC: 940, carbonPotentialPct: 1.1 },
        { label: 'diffuse', durationH: 3, startTempC: 940, endTempC: 940, carbonPotentialPct: 0.8, betaMPerS: 1.5e-7 },
        { durationH: 1, startTempC: 940, endTempC: 850, carbonPotentialPct: null },
      ],
    };
    expect(ok(JobInputsSchema, { kind: 'cycle', recipe })).toBe(true);
    expect(ok(JobInputsSchema, { kind: 'cycle', recipe: { ...recipe, steps: [] } })).toBe(false);
    expect(ok(JobInputsSchema, { kind: 'cycle', recipe: { ...recipe, shape: { kind: 'bar' } } })).toBe(false);
  });

  it('lab results: hardness carries its unit and a plausible value; depth positive', () => {
    expect(
      ok(LabResultSchema, {
        ecdMm: 0.82,
        surfaceHardness: { value: 60, unit: 'HRC' },
        coreHardness: { value: 360, unit: 'HV' },
      }),
    ).toBe(true);
    expect(ok(LabResultSchema, { surfaceHardness: { value: 690, unit: 'HRC' } })).toBe(false);
    expect(ok(LabResultSchema, { surfaceHardness: { value: 60, unit: 'HB' } })).toBe(false);
    expect(ok(LabResultSchema, { ecdMm: 0 })).toBe(false);
    expect(ok(LabResultSchema, { measuredAt: '2025-03-06' })).toBe(true);
    expect(ok(LabResultSchema, { measuredAt: '2025-03-06T09:30:00.000Z' })).toBe(true);
    expect(ok(LabResultSchema, { measuredAt: 'Tuesday' })).toBe(false);
  });

  it('a prediction band must run from its minimum up to its maximum', () => {
    const withBand = (minMm: number, maxMm: number) => ({
      ...job,
      prediction: { ...job.prediction!, ecdBandMm: { minMm, maxMm } },
    });
    expect(ok(JobSchema, withBand(0.78, 0.93))).toBe(true);
    expect(ok(JobSchema, withBand(0.93, 0.78))).toBe(false);
  });

  it('rejects NaN and Infinity anywhere a number is stored', () => {
    expect(ok(JobSchema, job)).toBe(true);
    expect(ok(JobSchema, { ...job, prediction: { ...job.prediction!, effectiveCaseDepthMm: Number.NaN } })).toBe(false);
    expect(ok(JobSchema, { ...job, steel: { ...job.steel, coreCarbonPct: Number.POSITIVE_INFINITY } })).toBe(false);
  });

  it('property: validation never throws, whatever it is given (top level or in any field)', () => {
    const keys = Object.keys(job);
    fc.assert(
      fc.property(fc.anything(), fc.constantFrom(...keys), (junk, key) => {
        expect(() => v.safeParse(JobSchema, junk)).not.toThrow();
        expect(() => v.safeParse(JobSchema, { ...job, [key]: junk })).not.toThrow();
      }),
      { numRuns: 500 },
    );
  });
});
