/**
 * Browser storage failures as typed job-log errors. A full disk shows up as a
 * QuotaExceededError on a request, on the transaction's abort, or thrown by the call itself.
 */
import { failWith, type JobsResult } from './result';

function errorName(error: unknown): string {
  if (typeof error === 'object' && error !== null && 'name' in error && typeof error.name === 'string')
    return error.name;
  return 'Error';
}

export function isQuotaError(error: unknown): boolean {
  // Old Firefox reported a full profile as NS_ERROR_DOM_QUOTA_REACHED.
  return ['QuotaExceededError', 'NS_ERROR_DOM_QUOTA_REACHED'].includes(errorName(error));
}

/**
 * PouchDB reports a failed IndexedDB transaction as its own error whose `reason` is the
 * browser's error name (`QuotaExceededError` for a full disk).
 */
function pouchReason(error: unknown): string | undefined {
  if (typeof error !== 'object' || error === null) return undefined;
  const { reason, message } = error as { reason?: unknown; message?: unknown };
  return [reason, message].find((text): text is string => typeof text === 'string' && /Quota/iu.test(text));
}

/** The typed failure for an error thrown or reported by IndexedDB or PouchDB. */
export function storageFailure<T = never>(error: unknown): JobsResult<T> {
  if (isQuotaError(error) || pouchReason(error) !== undefined) return failWith('storage.full');
  const name = errorName(error);
  if (name === 'InvalidStateError') return failWith('storage.closed');
  return failWith('storage.failed', { name });
}

/**
 * When a transaction aborts (a full disk at commit, say), its pending requests fail with a bare
 * AbortError; the real cause is the transaction's own error. Prefer whichever says "quota".
 */
export function rootCause(requestError: unknown, transactionError: unknown): unknown {
  if (isQuotaError(requestError)) return requestError;
  if (isQuotaError(transactionError)) return transactionError;
  return errorName(requestError) === 'AbortError' && transactionError !== undefined ? transactionError : requestError;
}
