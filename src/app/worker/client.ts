/**
 * The screens' way to the physics worker: one module worker, started on first use, answering in
 * order. Where there is no Worker (Node), or the worker cannot start, the same tasks run inline.
 */
import { computed, signal, type ReadonlySignal } from '@preact/signals';
import { recordMeasure } from '../ui/timing';
import type { TaskInput, TaskName, TaskOutput, TaskReply, TaskRequest } from './tasks';

interface Pending {
  request: TaskRequest;
  resolve: (reply: TaskReply) => void;
}

let worker: Worker | null | undefined;
const pending = new Map<number, Pending>();
let nextId = 1;

const runInline = async (request: TaskRequest): Promise<TaskReply> => (await import('./tasks')).runRequest(request);

function startWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    const started = new Worker(new URL('./physics.worker.ts', import.meta.url), { type: 'module' });
    started.addEventListener('message', (event: MessageEvent<TaskReply>) => {
      pending.get(event.data.id)?.resolve(event.data);
      pending.delete(event.data.id);
    });
    // A worker that cannot load (its file missing from the cache): answer what it held here instead.
    started.addEventListener('error', () => {
      worker = null;
      for (const { request, resolve } of pending.values()) void runInline(request).then(resolve);
      pending.clear();
    });
    return started;
  } catch {
    return null;
  }
}

/** Runs one task off the main thread; resolves with its answer and the time it took to compute. */
export async function runTask<K extends TaskName>(
  task: K,
  input: TaskInput<K>,
): Promise<{ output: TaskOutput<K>; ms: number }> {
  const request: TaskRequest = { id: nextId++, task, input };
  worker ??= startWorker();
  const active = worker;
  const reply = active
    ? await new Promise<TaskReply>((resolve) => {
        pending.set(request.id, { request, resolve });
        active.postMessage(request);
      })
    : await runInline(request);
  if ('error' in reply) throw new Error(reply.error);
  return { output: reply.output as TaskOutput<K>, ms: reply.ms };
}

export type Answer<K extends TaskName> =
  { key: string; input: TaskInput<K>; output: TaskOutput<K> } | { key: string; input: TaskInput<K>; failed: true };

export interface LatestRun<K extends TaskName> {
  /** The latest answer, possibly for an earlier input: a screen keeps showing it while the next is worked out. */
  answer: ReadonlySignal<Answer<K> | undefined>;
  /** An input was asked for whose answer has not arrived yet. */
  updating: ReadonlySignal<boolean>;
  /** Asks for `input` (the same input again does nothing). Only the newest input waits while one runs. */
  run: (input: TaskInput<K>) => void;
}

/**
 * The answer to the newest input of a task, as signals. Typing faster than the worker answers
 * never queues up: while one input is computed, later ones replace each other, and the last is
 * computed next. Each answer's compute time is recorded as the User Timing measure `casefront:<task>`.
 */
export function latestRun<K extends TaskName>(
  task: K,
  /** What tells two inputs apart (default: their JSON text); a large input can name itself more cheaply. */
  keyOf: (input: TaskInput<K>) => string = (input) => JSON.stringify(input),
): LatestRun<K> {
  const answer = signal<Answer<K> | undefined>(undefined);
  const asked = signal<string | undefined>(undefined);
  let busy = false;
  let waiting: { key: string; input: TaskInput<K> } | undefined;

  const send = (key: string, input: TaskInput<K>) => {
    busy = true;
    runTask(task, input)
      .then(({ output, ms }) => {
        recordMeasure(task, ms);
        answer.value = { key, input, output };
      })
      .catch(() => {
        answer.value = { key, input, failed: true };
      })
      .finally(() => {
        busy = false;
        const next = waiting;
        waiting = undefined;
        if (next) send(next.key, next.input);
      });
  };

  return {
    answer,
    updating: computed(() => asked.value !== undefined && asked.value !== answer.value?.key),
    run: (input) => {
      const key = keyOf(input);
      if (key === asked.peek()) return;
      asked.value = key;
      if (busy) waiting = { key, input };
      else send(key, input);
    },
  };
}
