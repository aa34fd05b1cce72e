/**
 * Small UI state kept in localStorage so that neither a reload nor an app update
 * loses what was typed. Records belong to the job log, not here.
 * Stored values are untrusted: `mergeDefaults` keeps only what matches the defaults' shape.
 */
import { effect, signal, type Signal } from '@preact/signals';

const PREFIX = 'casefront.';

/**
 * The stored value laid over the defaults: a key survives only when its type
 * matches the default's; arrays keep their stored items when each item merges
 * over the default's first item (or is of the same primitive type).
 */
export function mergeDefaults<T>(defaults: T, stored: unknown): T {
  if (Array.isArray(defaults)) {
    if (!Array.isArray(stored)) return defaults;
    const template: unknown = defaults[0];
    if (template === undefined) return defaults; // nothing to check items against
    const items = stored.filter((item) => sameKind(template, item)).map((item) => mergeDefaults(template, item));
    return items as T;
  }
  if (isPlainObject(defaults)) {
    if (!isPlainObject(stored)) return defaults;
    const out: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(defaults)) {
      out[key] = key in stored ? mergeDefaults(value, stored[key]) : value;
    }
    return out as T;
  }
  return sameKind(defaults, stored) ? (stored as T) : defaults;
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function sameKind(a: unknown, b: unknown): boolean {
  if (Array.isArray(a)) return Array.isArray(b);
  if (isPlainObject(a)) return isPlainObject(b);
  return typeof a === typeof b && b !== null && !(typeof b === 'number' && !Number.isFinite(b));
}

function storage(): Storage | undefined {
  try {
    return typeof localStorage === 'undefined' ? undefined : localStorage;
  } catch {
    return undefined; // storage blocked (private mode, policy): the app still works, unsaved
  }
}

function read(key: string): unknown {
  try {
    const text = storage()?.getItem(PREFIX + key);
    return text == null ? undefined : JSON.parse(text);
  } catch {
    return undefined;
  }
}

function write(key: string, value: unknown): void {
  try {
    storage()?.setItem(PREFIX + key, JSON.stringify(value));
  } catch {
    // Quota or blocked storage: keep working in memory.
  }
}

/**
 * A signal restored from storage at start and saved on every change. `restore` checks the
 * stored value where merging over the defaults cannot (lists and maps of any length).
 */
export function persisted<T>(
  key: string,
  defaults: T,
  restore: (stored: unknown) => T = (stored) => mergeDefaults(defaults, stored),
): Signal<T> {
  const state = signal<T>(restore(read(key)));
  effect(() => write(key, state.value));
  return state;
}

/** Replaces some fields of an object signal. */
export function patch<T extends object>(state: Signal<T>, changes: Partial<T>): void {
  state.value = { ...state.value, ...changes };
}
