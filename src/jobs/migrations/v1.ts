/**
 * Record version 1, as the first release stored it, and its conversion to version 2 (then
 * checked as version 3 by `jobFromV2`, which changes no field).
 * Version 1 knew only the closed-form calculator, kept the prediction in flat fields,
 * spelled statuses in kebab case, called the initials `initials` and the part `part`,
 * kept the grade as one string and the lab's result as a single depth.
 * Kept for the upgrade of old databases; never written any more.
 */
import { findGrade } from '../../physics';
import type { Job } from '../schema';
import type { FieldIssue } from '../result';
import { jobFromV2 } from './v2';

export const V1_STATUSES = ['planned', 'in-furnace', 'done', 'on-hold', 'rejected'] as const;
export type V1Status = (typeof V1_STATUSES)[number];

export interface JobV1 {
  id: string;
  createdAt: string;
  updatedAt: string;
  shift: 'A' | 'B' | 'C';
  shiftDate: string;
  initials: string;
  furnace: string;
  workOrder: string;
  part: string;
  /** Grade id from the list or a free name. */
  grade: string;
  request: {
    mode: 'depth' | 'time' | 'temperature';
    temperatureC?: number;
    timeH?: number;
    targetDepthMm?: number;
    surfaceCarbonPct?: number;
    carbonPotentialPct?: number;
    coreCarbonPct: number;
    thresholdCarbonPct?: number;
    model?: string;
    composition?: { Si: number; Mn: number; Cr: number; Ni: number; Mo: number };
  };
  predictedEcdMm: number;
  predictedTotalCaseMm: number;
  predictedSurfaceCarbonPct: number;
  model: string;
  appVersion: string;
  status: V1Status;
  labEcdMm?: number;
  notes: string;
}

const V2_STATUS: Record<V1Status, Job['status']> = {
  planned: 'planned',
  'in-furnace': 'inFurnace',
  done: 'done',
  'on-hold': 'onHold',
  rejected: 'rejected',
};

const isV1Status = (status: unknown): status is V1Status => (V1_STATUSES as readonly unknown[]).includes(status);

const definedOnly = (obj: Record<string, unknown>) =>
  Object.fromEntries(Object.entries(obj).filter(([, value]) => value !== undefined));

const isRecord = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * One version-1 record as the current version, or the problems that stop it. Every v1 field has a
 * place in v2; a record that cannot convert is left as it was by the upgrade (reported on read).
 */
export function jobFromV1(raw: unknown): { ok: true; job: Job } | { ok: false; issues: FieldIssue[] } {
  if (!isRecord(raw) || !isRecord(raw.request)) {
    return { ok: false, issues: [{ path: 'request', problem: 'missing' }] };
  }
  const { mode, coreCarbonPct, composition, ...requestRest } = definedOnly(raw.request);
  const grade = typeof raw.grade === 'string' ? raw.grade : '';
  const listed = findGrade(grade);
  const candidate = {
    id: raw.id,
    createdAt: raw.createdAt,
    updatedAt: raw.updatedAt,
    shift: raw.shift,
    shiftDate: raw.shiftDate,
    operator: raw.initials,
    furnace: raw.furnace,
    workOrder: raw.workOrder,
    partNumber: raw.part,
    steel: {
      ...(listed ? { gradeId: listed.id } : {}),
      gradeName: listed ? listed.name : grade,
      coreCarbonPct,
      ...(composition === undefined ? {} : { composition }),
    },
    inputs: { kind: mode, coreCarbonPct, ...(composition === undefined ? {} : { composition }), ...requestRest },
    prediction: {
      effectiveCaseDepthMm: raw.predictedEcdMm,
      totalCaseDepthMm: raw.predictedTotalCaseMm,
      surfaceCarbonPct: raw.predictedSurfaceCarbonPct,
      model: raw.model,
      appVersion: raw.appVersion,
    },
    status: isV1Status(raw.status) ? V2_STATUS[raw.status] : raw.status,
    ...(raw.labEcdMm === undefined || raw.labEcdMm === null ? {} : { lab: { ecdMm: raw.labEcdMm } }),
    notes: raw.notes,
  };
  return jobFromV2(candidate);
}
