/**
 * Lab traverses for the sweep (demo plant, DOMAIN §5): pinion loads whose hardness was read from the
 * closed-form profile with a known diffusion speed and threshold, so the plant-threshold view has a
 * fit to show in the furnace with the long name, and a furnace with too few loads shows its refusal.
 * The newest load falls in the running shift, so the log opens on a job with a traverse.
 */
import { CASE_CRITERIA, depthFigures, hrcToHv, mulberry32, readCaseSpec } from '../../src/physics';
import { constantSurfaceCarbon } from '../../src/physics/closedForm';
import { indicativeHardnessHrc } from '../../src/physics/indicativeHardness';
import type { Job } from '../../src/jobs/schema';
import type { StoredThreshold } from '../../src/app/settings/plantThreshold';
import { movedTo } from './logData';

export const LONG_FURNACE = 'F1 Mehrzweckkammerofen Halle 3 links';
/** The newest traversed load, in the running shift. */
export const TRAVERSED_JOB_ID = '5a3e0c1d-7b2f-4e6a-9c8d-000000000000';
const TRUTH = { factor: 1.15, thresholdPct: 0.35 };
const COMPOSITION = { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 };

function traversedJob(
  n: number,
  furnace: string,
  temperatureC: number,
  timeH: number,
  createdMs: number,
  u: () => number,
): Job {
  const inputs = {
    kind: 'depth' as const,
    temperatureC,
    timeH,
    carbonPotentialPct: 0.9,
    coreCarbonPct: 0.2,
    composition: COMPOSITION,
  };
  const { kind: _kind, ...request } = inputs;
  const spec = readCaseSpec({ ...request, diffusivityFactor: TRUTH.factor });
  if (!spec.ok) throw new Error(spec.error.code);
  const { diffusivityM2PerS, totalCaseDepthMm, effectiveCaseDepthMm } = depthFigures(spec.value, temperatureC, timeH);
  const curve = { coreCarbonPct: 0.2, coreHardnessHrc: 35, thresholdCarbonPct: TRUTH.thresholdPct, limitHrc: 52.4 };
  const points = [];
  for (let d = 0.05; d <= 2.5 * totalCaseDepthMm; d += d < 1 - 1e-9 ? 0.05 : 0.1) {
    const carbon = constantSurfaceCarbon(d / 1e3, timeH * 3600, diffusivityM2PerS, spec.value.surfaceCarbonPct, 0.2);
    const hv = hrcToHv(indicativeHardnessHrc(carbon, curve))! + 10 * (u() - 0.5);
    points.push({ depthMm: Number(d.toFixed(3)), value: Math.round(hv), unit: 'HV' as const });
  }
  const created = new Date(createdMs).toISOString();
  return movedTo(
    {
      id: `5a3e0c1d-7b2f-4e6a-9c8d-${String(n).padStart(12, '0')}`,
      createdAt: created,
      updatedAt: created,
      shift: 'A',
      shiftDate: created.slice(0, 10),
      operator: 'MK',
      furnace,
      workOrder: `WO-2025-0241${n}-NACHMESSUNG-LABOR-QS-HALLE-3`.slice(0, 40),
      partNumber: `KR-2231-PINION-LH-TRAVERSE-ABSTAND-${n}`.slice(0, 40),
      steel: { gradeId: 'sae-8620', gradeName: 'SAE 8620', coreCarbonPct: 0.2, composition: COMPOSITION },
      inputs,
      prediction: {
        effectiveCaseDepthMm,
        totalCaseDepthMm,
        surfaceCarbonPct: spec.value.surfaceCarbonPct,
        model: 'agren',
        timeH,
        temperatureC,
        appVersion: '0.1.0',
      },
      status: 'done',
      notes: '',
      lab: { traverse: { points, limit: CASE_CRITERIA['iso-18203'] } },
    },
    createdMs,
  );
}

/** Seven traversed loads in the long-named furnace (the newest now) and two in F3 (too few to fit). */
export function traversedJobs(now = Date.now()): Job[] {
  const u = mulberry32(2231);
  const day = 24 * 3.6e6;
  const loads = Array.from({ length: 7 }, (_, i) =>
    traversedJob(i, LONG_FURNACE, 900 + 5 * i, 4 + 0.4 * i, i === 0 ? now + 5_000 : now - (i + 2) * day, u),
  );
  const few = [0, 1].map((i) => traversedJob(10 + i, 'F3', 925, 6, now - (20 + i) * day, u));
  return [...loads, ...few];
}

/** The load whose copy from another device differs (see `otherDeviceCopy`). */
export const CONFLICTED_JOB_ID = '5a3e0c1d-7b2f-4e6a-9c8d-000000000001';

/**
 * The same load as written on another device, read from its file (no change history): every field
 * that differs is kept both ways on the job until a person picks one.
 */
export function otherDeviceCopy(job: Job): Job {
  return {
    ...job,
    operator: '40711234',
    status: 'onHold',
    notes: 'Auf dem Bürorechner nachgetragen: Härteprüfung an Probe 2 wiederholt, Kern bei 2,4 mm gemessen.',
    lab: { ecdMm: 0.79, surfaceHardness: { value: 58.5, unit: 'HRC' }, by: 'Labor Halle 3 Frühschicht' },
  };
}

/** A learnt threshold for SAE 8620 in the long-named furnace, turned on: the cycle and planner say it is applied. */
export const APPLIED_THRESHOLD: StoredThreshold = {
  furnace: LONG_FURNACE,
  grade: 'sae-8620',
  thresholdPct: 0.3512,
  low: 0.3391,
  high: 0.3634,
  factor: 1.148,
  factorLow: 1.102,
  factorHigh: 1.196,
  loadCount: 7,
  fittedAt: '2026-11-30T09:12:00.000Z',
  model: 'agren',
  apply: true,
};
