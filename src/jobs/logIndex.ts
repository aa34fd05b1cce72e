/**
 * The log as the screens read it: every job of the database in memory, validated once when it
 * arrives (from this tab, another tab or the shop server), with its search text folded once. A
 * filter or a text search over a year of jobs is then one pass over an array, not a database read.
 * Documents that do not validate are kept aside as damaged, with the reason, never dropped.
 */
import * as v from 'valibot';
import type { Alternative } from './documents';
import { isJobDoc, versionsOf, type FieldVersions } from './documents';
import { issuesOf } from './issues';
import { compareNewestFirst, matchesFilter, searchableText, searchWords, type JobFilter } from './query';
import type { FieldIssue } from './result';
import { JobSchema, type Job } from './schema';
import type { StoredDoc } from './pouch';

/** A stored record that failed validation: its key, what is wrong, and where it came from. */
export interface CorruptRecord {
  key: string;
  issues: FieldIssue[];
  /** `migration`: left over from the earlier log; `stored`: a document in the log that does not validate. */
  source?: 'migration' | 'stored';
}

/** One job with what the screens need beside it: its revision (an edit starts from it) and open choices. */
export interface JobEntry {
  job: Job;
  rev: string;
  /** Fields changed on two devices, every value kept, until a person picks. */
  open: Record<string, Alternative[]>;
  versions: FieldVersions;
  changedBy?: string;
}

interface Indexed {
  entry: JobEntry;
  text: string;
}

export class LogIndex {
  readonly #jobs = new Map<string, Indexed>();
  readonly #corrupt = new Map<string, CorruptRecord>();
  /** Documents that arrived with conflicting revisions, still to be merged. */
  readonly conflicted = new Set<string>();
  #sorted: Indexed[] | undefined;

  /** Takes in one document as the database now holds it (deleted or absent: gone). */
  apply(id: string, doc: StoredDoc | undefined): void {
    this.#sorted = undefined;
    this.#jobs.delete(id);
    this.#corrupt.delete(id);
    this.conflicted.delete(id);
    if (!doc || doc._deleted || id.startsWith('_design/')) return;
    if (doc._conflicts && doc._conflicts.length > 0) this.conflicted.add(id);
    const parsed = isJobDoc(doc) ? v.safeParse(JobSchema, doc.job) : undefined;
    if (!parsed?.success) {
      const issues = parsed ? issuesOf(parsed.issues) : [{ path: 'job', problem: 'missing' as const }];
      this.#corrupt.set(id, { key: id, issues, source: 'stored' });
      return;
    }
    const job = parsed.output;
    const open = isJobDoc(doc) ? (doc.open ?? {}) : {};
    const entry: JobEntry = { job, rev: doc._rev ?? '', open, versions: versionsOf(doc as { versions?: unknown }) };
    if (typeof doc.changedBy === 'string' && doc.changedBy) entry.changedBy = doc.changedBy;
    this.#jobs.set(id, { entry, text: searchableText(job) });
  }

  get size(): number {
    return this.#jobs.size;
  }

  entry(id: string): JobEntry | undefined {
    return this.#jobs.get(id)?.entry;
  }

  corruptRecord(id: string): CorruptRecord | undefined {
    return this.#corrupt.get(id);
  }

  get corrupt(): CorruptRecord[] {
    return [...this.#corrupt.values()];
  }

  #newestFirst(): Indexed[] {
    this.#sorted ??= [...this.#jobs.values()].sort((a, b) => compareNewestFirst(a.entry.job, b.entry.job));
    return this.#sorted;
  }

  /** Jobs matching the filter, newest first. */
  list(filter: JobFilter): Job[] {
    const words = searchWords(filter.text);
    const jobs: Job[] = [];
    for (const { entry, text } of this.#newestFirst()) {
      if (matchesFilter(entry.job, filter, words, text)) jobs.push(entry.job);
    }
    return jobs;
  }
}
