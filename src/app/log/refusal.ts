/** A refused edit in words: a stale one also names the fields changed meanwhile. */
import type { TFunction } from 'i18next';
import { describeJobsError, type JobsError } from '../../jobs';
import { fieldName } from './fieldNames';

/** The sentence for a refused edit; a stale one also names, in words, the fields changed meanwhile. */
export function staleSentence(t: TFunction, error: JobsError): string {
  const changed = (error.issues ?? []).filter((issue) => issue.problem === 'changedMeanwhile');
  const main = describeJobsError(t, { ...error, issues: [] });
  if (error.code !== 'record.stale' || changed.length === 0)
    return error.code === 'record.stale' ? main : describeJobsError(t, error);
  return `${main} ${t('app.log.detail.changedFields', { fields: changed.map((issue) => fieldName(t, issue.path)).join(', ') })}`;
}
