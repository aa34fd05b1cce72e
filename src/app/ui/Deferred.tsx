/**
 * Work split into tasks, so that no single one keeps a slow phone from answering the next key.
 * `deferred(signal)` follows a signal one task later: a keystroke redraws its field at once, and
 * what it causes (the calculation and its results) is drawn in a task of its own. `<Deferred>`
 * draws a lower part of a screen after the parts above it, one part per task, so opening a screen
 * is several short tasks instead of one long one.
 */
import { effect, signal, type ReadonlySignal } from '@preact/signals';
import type { ComponentChildren } from 'preact';
import { useEffect, useState } from 'preact/hooks';

/** Runs `run` in a new task, after the browser has had the chance to handle input and draw. */
export function inNewTask(run: () => void): () => void {
  const timer = setTimeout(run, 0);
  return () => clearTimeout(timer);
}

/** `source`'s value, taken over in a new task after each change (several changes in one task are taken once). */
export function deferred<T>(source: ReadonlySignal<T>): ReadonlySignal<T> {
  let latest = source.peek();
  const shown = signal(latest);
  let queued = false;
  effect(() => {
    latest = source.value;
    if (queued) return;
    queued = true;
    inNewTask(() => {
      queued = false;
      shown.value = latest;
    });
  });
  return shown;
}

/** Parts waiting to be drawn, in the order they asked (document order): one is drawn per task. */
const waiting: (() => void)[] = [];
let draining = false;

function drawNext(): void {
  const next = waiting.shift();
  if (!next) {
    draining = false;
    return;
  }
  next();
  inNewTask(drawNext);
}

function queuePart(draw: () => void): () => void {
  waiting.push(draw);
  if (!draining) {
    draining = true;
    inNewTask(drawNext);
  }
  return () => {
    const at = waiting.indexOf(draw);
    if (at >= 0) waiting.splice(at, 1);
  };
}

/**
 * Draws its children in a later task than the rest of the screen (once drawn, they update like
 * any other part). Until then an empty block marked `data-deferred` holds the place.
 */
export function Deferred({ children }: { children: ComponentChildren }) {
  const [ready, setReady] = useState(false);
  useEffect(() => (ready ? undefined : queuePart(() => setReady(true))), [ready]);
  return ready ? <>{children}</> : <div class="deferred-part" data-deferred />;
}
