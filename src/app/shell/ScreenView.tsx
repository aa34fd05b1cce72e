/**
 * Shows the routed screen, loading its chunk the first time it is opened. A lazily loaded
 * screen is shown only once its language's messages are all in (the first paint loads only
 * the first screen's part), so no screen ever shows a raw key.
 */
import { signal } from '@preact/signals';
import type { ComponentType } from 'preact';
import { useEffect, useRef } from 'preact/hooks';
import { fullLocale, useT, withFullLocale } from '../../i18n/useT';
import DepthScreen from '../depth/Screen';
import { HOME, loaderOf, type ScreenId } from './screens';

/** The first bundle's screen (the table's `entry`); every other screen arrives as its chunk. */
const loaded = signal<Partial<Record<ScreenId, ComponentType>>>({ [HOME]: DepthScreen });
const failed = signal<Partial<Record<ScreenId, boolean>>>({});

function load(id: ScreenId): void {
  const loader = loaderOf(id);
  if (!loader) return;
  withFullLocale(loader)()
    .then((mod) => {
      loaded.value = { ...loaded.value, [id]: mod.default };
    })
    .catch(() => {
      failed.value = { ...failed.value, [id]: true };
    });
}

export function ScreenView({ id }: { id: ScreenId }) {
  const t = useT();
  // The first screen's messages are the locale's first part; every other screen waits for the rest.
  const Screen = id === HOME || fullLocale.value ? loaded.value[id] : undefined;
  const shownRef = useRef<ScreenId | null>(null);
  useEffect(() => {
    if (!Screen) {
      load(id);
      return;
    }
    // After a navigation (not the first paint), once the screen is on the page, move focus to its heading.
    if (shownRef.current !== null && shownRef.current !== id) document.querySelector<HTMLElement>('main h1')?.focus();
    shownRef.current = id;
  }, [id, Screen]);
  if (Screen) return <Screen />;
  return <p class="screen-loading">{failed.value[id] ? t('app.shell.loadFailed') : t('app.shell.loading')}</p>;
}
