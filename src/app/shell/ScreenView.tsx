/**
 * Shows the routed screen, loading its chunk the first time it is opened. A lazily loaded
 * screen is shown only once its language's messages are all in (the first paint loads only
 * the first screen's part), so no screen ever shows a raw key.
 */
import { signal } from '@preact/signals';
import type { ComponentType } from 'preact';
import { useEffect, useRef, useState } from 'preact/hooks';
import { fullLocale, useT, withFullLocale } from '../../i18n/useT';
import DepthScreen from '../depth/Screen';
import { inNewTask } from '../ui/Deferred';
import { HOME, loaderOf, SCREEN_IDS, type ScreenId } from './screens';

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

/** Runs `run` when the browser has nothing else to do (Safari has no idle callback: a little later). */
function whenIdle(run: () => void): void {
  if (typeof requestIdleCallback === 'function') requestIdleCallback(run);
  else setTimeout(run, 300);
}

let prefetching = false;

/**
 * While the app is idle, the screens not opened yet are loaded one at a time (their files are
 * cached for offline use anyway), so a tap on the bar finds its screen ready: no fetching,
 * compiling or styling in the tap's task.
 */
function prefetchScreens(): void {
  if (prefetching) return;
  prefetching = true;
  const waiting = SCREEN_IDS.filter((id) => loaderOf(id));
  const next = () => {
    const id = waiting.shift();
    if (!id) return;
    if (loaded.peek()[id]) {
      next();
      return;
    }
    loaderOf(id)!()
      .then((mod) => {
        loaded.value = { ...loaded.peek(), [id]: mod.default };
      })
      .catch(() => {
        // Not cached yet or offline: it loads when opened, as without prefetching.
      })
      .finally(() => whenIdle(next));
  };
  whenIdle(next);
}

export function ScreenView({ id }: { id: ScreenId }) {
  const t = useT();
  // A new screen is drawn in the task after the old one is taken down, so a tap costs two short tasks, not one long one.
  const [shownId, setShownId] = useState(id);
  useEffect(() => (id === shownId ? undefined : inNewTask(() => setShownId(id))), [id, shownId]);
  // The first screen's messages are the locale's first part; every other screen waits for the rest.
  const Screen = shownId === HOME || fullLocale.value ? loaded.value[shownId] : undefined;
  const shownRef = useRef<ScreenId | null>(null);
  useEffect(() => {
    if (!Screen) {
      load(shownId);
      return;
    }
    // After a navigation (not the first paint), once the screen is on the page, move focus to its heading.
    if (shownRef.current !== null && shownRef.current !== shownId)
      document.querySelector<HTMLElement>('main h1')?.focus();
    shownRef.current = shownId;
  }, [shownId, Screen]);
  const wholeLocale = fullLocale.value;
  useEffect(() => {
    if (wholeLocale) prefetchScreens();
  }, [wholeLocale]);
  if (id !== shownId) return <p class="screen-loading" />;
  if (Screen) return <Screen />;
  return <p class="screen-loading">{failed.value[shownId] ? t('app.shell.loadFailed') : t('app.shell.loading')}</p>;
}
