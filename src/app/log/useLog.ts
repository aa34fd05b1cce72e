/** Reading the log from a view: reruns when its inputs change or the log changes (here or in another tab). */
import { useEffect, useState } from 'preact/hooks';
import type { JobsError, JobsResult, JobStore } from '../../jobs';
import { jobStore, logChanges } from './db';

export type Loaded<T> = { state: 'loading' } | { state: 'ready'; value: T } | { state: 'failed'; error: JobsError };

/** The latest answer of `read`; the previous answer stays on screen while a new one is read. */
export function useLogRead<T>(
  read: (store: JobStore) => Promise<JobsResult<T>>,
  inputs: readonly unknown[],
): Loaded<T> {
  const [loaded, setLoaded] = useState<Loaded<T>>({ state: 'loading' });
  const changes = logChanges.value;
  useEffect(() => {
    let current = true;
    void (async () => {
      const store = await jobStore();
      const result = store.ok ? await read(store.value) : store;
      if (current)
        setLoaded(result.ok ? { state: 'ready', value: result.value } : { state: 'failed', error: result.error });
    })();
    return () => {
      current = false;
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [changes, ...inputs]);
  return loaded;
}
