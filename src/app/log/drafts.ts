/**
 * Half-typed edits of a job (the edit form, the lab result) kept per tab in sessionStorage, with
 * the revision and the copy of the job they started from, so an update reload reopens the form as
 * it was and the edit is still checked against the revision it began with.
 */
import type { Job } from '../../jobs';
import { mergeDefaults } from '../ui/persist';

export type DraftKind = 'edit' | 'lab';

export interface EditDraft<F> {
  baseRev: string;
  base: Job;
  form: F;
}

const key = (kind: DraftKind, jobId: string) => `casefront.draft.${kind}.${jobId}`;

function session(): Storage | undefined {
  try {
    return typeof sessionStorage === 'undefined' ? undefined : sessionStorage;
  } catch {
    return undefined; // storage blocked: the form still works, unsaved
  }
}

/** The draft of this tab for the job, its form laid over `emptyForm` (stored text is untrusted). */
export function readDraft<F>(kind: DraftKind, jobId: string, emptyForm: F): EditDraft<F> | undefined {
  try {
    const text = session()?.getItem(key(kind, jobId));
    if (!text) return undefined;
    const stored = JSON.parse(text) as Record<string, unknown>;
    const base = stored.base as Record<string, unknown> | null | undefined;
    if (typeof stored.baseRev !== 'string' || typeof base !== 'object' || base === null) return undefined;
    if (base.id !== jobId) return undefined;
    // The copy of the job is only compared with the form, never stored: its shape needs no check here.
    return { baseRev: stored.baseRev, base: base as unknown as Job, form: mergeDefaults(emptyForm, stored.form) };
  } catch {
    return undefined;
  }
}

export function writeDraft<F>(kind: DraftKind, jobId: string, draft: EditDraft<F>): void {
  try {
    session()?.setItem(key(kind, jobId), JSON.stringify(draft));
  } catch {
    // Full or blocked: the form keeps working; only a reload would lose it.
  }
}

export function clearDraft(kind: DraftKind, jobId: string): void {
  try {
    session()?.removeItem(key(kind, jobId));
  } catch {
    // Nothing to clear.
  }
}

export function hasDraft(kind: DraftKind, jobId: string): boolean {
  try {
    return session()?.getItem(key(kind, jobId)) != null;
  } catch {
    return false;
  }
}
