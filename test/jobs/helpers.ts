/** Shared set-up for the job log tests: a fresh database per test and a valid demo-plant job. */
import 'fake-indexeddb/auto';
import { expect } from 'vitest';
import { memoryPouch } from '../memoryPouch';
import type { JobDraft } from '../../src/jobs/schema';
import { openJobStore, type JobStore } from '../../src/jobs/store';
import type { JobsResult } from '../../src/jobs/result';

export function uniqueDbName(): string {
  return `test-${crypto.randomUUID()}`;
}

export function unwrap<T>(result: JobsResult<T>): T {
  if (!result.ok) throw new Error(`expected success, got ${JSON.stringify(result.error)}`);
  return result.value;
}

/** A store on a fresh in-memory database; `legacyName` is the earlier IndexedDB log to move in. */
export async function freshStore(name = uniqueDbName(), legacyName: string | false = false): Promise<JobStore> {
  return unwrap(await openJobStore({ name, pouch: memoryPouch, legacyName }));
}

/** A pinion load on F1 (demo scenario), closed-form time request. */
export function pinionDraft(overrides: Partial<JobDraft> = {}): JobDraft {
  return {
    operator: 'MK',
    furnace: 'F1',
    workOrder: 'WO-024117',
    partNumber: 'KR-2231',
    steel: {
      gradeId: 'sae-8620',
      gradeName: 'SAE 8620',
      coreCarbonPct: 0.2,
      composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
    },
    inputs: {
      kind: 'time',
      temperatureC: 925,
      targetDepthMm: 0.875,
      carbonPotentialPct: 0.9,
      coreCarbonPct: 0.2,
      composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
    },
    prediction: {
      effectiveCaseDepthMm: 0.875,
      totalCaseDepthMm: 1.31,
      surfaceCarbonPct: 0.84,
      model: 'agren',
      timeH: 6.4,
      temperatureC: 925,
      appVersion: '0.1.0',
    },
    status: 'planned',
    notes: '',
    ...overrides,
  };
}

/** Records as stored, sorted by id, for before/after comparisons. */
export async function snapshot(store: JobStore): Promise<unknown[]> {
  const all = unwrap(await store.readAll());
  expect(all.corrupt).toEqual([]);
  return [...all.jobs].sort((a, b) => (a.id < b.id ? -1 : 1));
}
