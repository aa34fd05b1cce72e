/** Which screen is shown: a hash route (#/depth), so every screen works from the precached index.html. */
import { signal } from '@preact/signals';

export const SCREEN_IDS = ['depth', 'cycle', 'recovery', 'convert', 'settings', 'safety'] as const;
export type ScreenId = (typeof SCREEN_IDS)[number];

export const HOME: ScreenId = 'depth';

export function screenFromHash(hash: string): ScreenId {
  const id = hash.replace(/^#\/?/, '').split(/[/?]/)[0];
  return (SCREEN_IDS as readonly string[]).includes(id ?? '') ? (id as ScreenId) : HOME;
}

export const hrefFor = (id: ScreenId) => `#/${id}`;

export const route = signal<ScreenId>(typeof location === 'undefined' ? HOME : screenFromHash(location.hash));

export function followHash(): void {
  window.addEventListener('hashchange', () => {
    route.value = screenFromHash(location.hash);
  });
}
