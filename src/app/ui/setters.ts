/**
 * One handler per field of an object signal, the same function on every render: a field given it
 * has the same props as before when another field changes, so a keystroke redraws only its own field.
 */
import type { Signal } from '@preact/signals';
import { patch } from './persist';

export function fieldSetters<T extends object>(state: Signal<T>): <K extends keyof T>(key: K) => (value: T[K]) => void {
  const made = new Map<keyof T, (value: never) => void>();
  return <K extends keyof T>(key: K) => {
    let set = made.get(key) as ((value: T[K]) => void) | undefined;
    if (!set) {
      set = (value: T[K]) => patch(state, { [key]: value } as unknown as Partial<T>);
      made.set(key, set);
    }
    return set;
  };
}
