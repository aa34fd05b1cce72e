/**
 * Model-based property: any sequence of adds and edits (valid or not, on present or missing ids,
 * from the current revision or a stale one) leaves the store equal to a plain in-memory map updated by the same rules.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Job, JobChanges, JobDraft } from '../../src/jobs/schema';
import { shiftOf } from '../../src/jobs/shift';
import type { JobStore } from '../../src/jobs/store';
import { freshStore, pinionDraft } from './helpers';

interface Model {
  jobs: Map<string, Job>;
  /** Insertion order, so edits and deletes can pick "the k-th job". */
  ids: string[];
}
interface Real {
  store: JobStore;
  clockMs: number;
}

const tick = (real: Real, minutes: number) => new Date((real.clockMs += minutes * 60_000));

/** After every command the whole store must equal the model. */
async function expectStoreEqualsModel(model: Model, real: Real): Promise<void> {
  const byId = (a: { id: string }, b: { id: string }) => (a.id < b.id ? -1 : 1);
  const stored = await real.store.readAll();
  expect(stored.ok).toBe(true);
  if (!stored.ok) return;
  expect(stored.value.corrupt).toEqual([]);
  expect([...stored.value.jobs].sort(byId)).toEqual([...model.jobs.values()].sort(byId));
}

class Add implements fc.AsyncCommand<Model, Real> {
  constructor(
    readonly draft: JobDraft,
    readonly minutes: number,
  ) {}
  check = () => true;
  async run(model: Model, real: Real) {
    const now = tick(real, this.minutes);
    const result = await real.store.add(this.draft, { now });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const stamp = now.toISOString();
    const expected = { ...this.draft, id: result.value.id, createdAt: stamp, updatedAt: stamp, ...shiftOf(now) };
    expect(result.value).toEqual(expected);
    model.jobs.set(expected.id, expected);
    model.ids.push(expected.id);
    await expectStoreEqualsModel(model, real);
  }
  toString = () => `add(${this.draft.furnace}, ${this.draft.status}, +${this.minutes}min)`;
}

class Edit implements fc.AsyncCommand<Model, Real> {
  constructor(
    readonly pick: number,
    readonly changes: JobChanges,
    readonly minutes: number,
  ) {}
  check = (model: Readonly<Model>) => model.ids.length > 0;
  async run(model: Model, real: Real) {
    const id = model.ids[this.pick % model.ids.length]!;
    const now = tick(real, this.minutes);
    const result = await real.store.update(id, this.changes, { now });
    expect(result.ok).toBe(true);
    const old = model.jobs.get(id)!;
    const oldMs = Date.parse(old.updatedAt);
    const updatedAt = new Date(now.getTime() > oldMs ? now.getTime() : oldMs + 1).toISOString();
    model.jobs.set(id, { ...old, ...this.changes, updatedAt });
    await expectStoreEqualsModel(model, real);
  }
  toString = () => `edit(#${this.pick}, ${JSON.stringify(this.changes)}, ${this.minutes}min)`;
}

/** Operations that must fail and change nothing: a missing id, or an invalid entry. */
class Refused implements fc.AsyncCommand<Model, Real> {
  constructor(
    readonly kind: 'editMissing' | 'staleEdit' | 'badAdd' | 'badEdit',
    readonly pick: number,
  ) {}
  check = (model: Readonly<Model>) => (this.kind !== 'badEdit' && this.kind !== 'staleEdit') || model.ids.length > 0;
  async run(model: Model, real: Real) {
    const missing = crypto.randomUUID();
    const result =
      this.kind === 'editMissing'
        ? await real.store.update(missing, { notes: 'x' })
        : this.kind === 'staleEdit'
          ? await real.store.update(model.ids[this.pick % model.ids.length]!, { notes: 'x' }, { baseRev: '1-stale' })
          : this.kind === 'badAdd'
            ? await real.store.add(pinionDraft({ operator: 'TOOLONG' }))
            : await real.store.update(model.ids[this.pick % model.ids.length]!, { lab: { ecdMm: -1 } });
    expect(result.ok).toBe(false);
    await expectStoreEqualsModel(model, real);
  }
  toString = () => `refused(${this.kind})`;
}

const initials = fc.stringMatching(/^[A-Z]{1,4}$/u);
const text = fc.string({ maxLength: 30 }).map((s) => s.trim());
const status = fc.constantFrom<Job['status']>('planned', 'inFurnace', 'done', 'onHold', 'rejected');
const furnace = fc.constantFrom('F1', 'F2', 'F3');
const minutes = fc.integer({ min: -120, max: 600 });

const draft = fc
  .record({ operator: initials, furnace, status, notes: fc.string({ maxLength: 60 }), workOrder: text })
  .map((fields) => pinionDraft(fields));
const changes: fc.Arbitrary<JobChanges> = fc.record(
  {
    status,
    notes: fc.string({ maxLength: 60 }),
    furnace,
    operator: initials,
    lab: fc.record({ ecdMm: fc.double({ min: 0.05, max: 3, noNaN: true }) }),
  },
  { requiredKeys: [] },
);

const commands = fc.commands(
  [
    fc.tuple(draft, minutes).map(([d, m]) => new Add(d, m)),
    fc.tuple(fc.nat(), changes, minutes).map(([p, c, m]) => new Edit(p, c, m)),
    fc
      .tuple(fc.constantFrom<Refused['kind']>('editMissing', 'staleEdit', 'badAdd', 'badEdit'), fc.nat())
      .map(([k, p]) => new Refused(k, p)),
  ],
  { maxCommands: 40, size: 'max' },
);

describe('job store against an in-memory model', () => {
  it('property: any sequence of adds, edits and refused writes leaves the store equal to the model', async () => {
    await fc.assert(
      fc.asyncProperty(commands, async (cmds) => {
        const real: Real = { store: await freshStore(), clockMs: Date.parse('2025-03-05T05:00:00.000Z') };
        const model: Model = { jobs: new Map(), ids: [] };
        await fc.asyncModelRun(() => ({ model, real }), cmds);
        real.store.close();
      }),
      { numRuns: 60 },
    );
  });
});
