/** Which screen is shown: a hash route (#/depth), so every screen works from the precached index.html. */
import { signal } from '@preact/signals';
import { HOME, SCREEN_IDS, type ScreenId } from './screens';

export function screenFromHash(hash: string): ScreenId {
  const id = hash.replace(/^#\/?/, '').split(/[/?]/)[0];
  return (SCREEN_IDS as readonly string[]).includes(id ?? '') ? (id as ScreenId) : HOME;
}

/** The parts of the route after the screen id (#/log/job/abc → ['job', 'abc']), decoded. */
export function subPathFromHash(hash: string): string[] {
  const parts = hash.replace(/^#\/?/, '').split('?')[0]!.split('/').slice(1);
  return parts
    .filter((p) => p !== '')
    .map((p) => {
      try {
        return decodeURIComponent(p);
      } catch {
        return p;
      }
    });
}

export const hrefFor = (id: ScreenId, ...sub: string[]) => `#/${[id, ...sub.map(encodeURIComponent)].join('/')}`;

const initialHash = typeof location === 'undefined' ? '' : location.hash;

export const route = signal<ScreenId>(screenFromHash(initialHash));
/** Where inside the screen (e.g. one job of the log). */
export const subPath = signal<string[]>(subPathFromHash(initialHash));

export function followHash(): void {
  window.addEventListener('hashchange', () => {
    route.value = screenFromHash(location.hash);
    subPath.value = subPathFromHash(location.hash);
  });
}
