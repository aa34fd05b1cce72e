/**
 * Every screen once: its route id, how its code arrives, where the navigation offers it and its
 * icon. Routes, the bottom navigation, the header, the screen loader and the tests read this table;
 * a screen is added here and nowhere else in the shell.
 */
import type { ComponentType } from 'preact';

type Loader = () => Promise<{ default: ComponentType }>;

export interface ScreenEntry {
  id: string;
  /** `entry`: in the first bundle (the screen a fresh start opens); otherwise its own chunk, fetched when opened. */
  load: 'entry' | Loader;
  /** `bar`: an item of the bottom navigation; `header`: the link in the header; `{ within }`: a view of that bar item. */
  nav: 'bar' | 'header' | { within: string };
  /** A stroke path on a 24 × 24 grid, drawn beside the label (decorative: the label carries the meaning). */
  icon?: string;
}

export const SCREENS = [
  { id: 'depth', load: 'entry', nav: 'bar', icon: 'M3 5h18M3 9.5h18M3 14h12M3 18.5h6' },
  { id: 'cycle', load: () => import('../cycle/Screen'), nav: 'bar', icon: 'M2 19h3l3-12h5v5h4l2 7h3' },
  // Planning is the cycle item's second view, so the bar keeps six items that fit German labels at 360 px.
  { id: 'plan', load: () => import('../plan/Screen'), nav: { within: 'cycle' } },
  {
    id: 'recovery',
    load: () => import('../recovery/Screen'),
    nav: 'bar',
    icon: 'M12 7v5l3 3M4.5 12a7.5 7.5 0 1 0 2.2-5.3M4 3.5v4h4',
  },
  {
    id: 'log',
    load: () => import('../log/Screen'),
    nav: 'bar',
    icon: 'M9 3.5h6v3H9zM7 5H5v16h14V5h-2M8.5 11h7M8.5 15h7M8.5 19h4',
  },
  { id: 'convert', load: () => import('../convert/Screen'), nav: 'bar', icon: 'M4 8h14l-3-3M20 16H6l3 3' },
  {
    id: 'settings',
    load: () => import('../settings/Screen'),
    nav: 'bar',
    icon: 'M4 7h9M17 7h3M4 17h3M11 17h9M15 5v4M9 15v4',
  },
  {
    id: 'safety',
    load: () => import('../safety/Screen'),
    nav: 'header',
    icon: 'M12 3l9.5 17h-19zM12 10v4.5M12 17.2v.1',
  },
] as const satisfies readonly ScreenEntry[];

export type ScreenId = (typeof SCREENS)[number]['id'];
type Screen = (typeof SCREENS)[number];

export const SCREEN_IDS: readonly ScreenId[] = SCREENS.map((screen) => screen.id);

/** The screen a fresh start opens: the one in the first bundle. */
export const HOME = SCREENS.find((screen) => screen.load === 'entry')!.id;

export const screenOf = (id: ScreenId): ScreenEntry => SCREENS.find((screen) => screen.id === id)!;

/** Screens in the bottom navigation, in order. */
export const NAV_SCREENS = SCREENS.filter((screen): screen is Extract<Screen, { nav: 'bar' }> => screen.nav === 'bar');

/** The header's link (the safety notes, one tap away on every screen). */
export const HEADER_SCREEN = SCREENS.find((screen) => screen.nav === 'header')!;

/** The navigation item to mark as current for a screen (a view marks the item it belongs to). */
export function navItemOf(id: ScreenId): ScreenId {
  const nav = screenOf(id).nav;
  return typeof nav === 'object' ? (nav.within as ScreenId) : id;
}

/** How a screen that is not in the first bundle loads. */
export function loaderOf(id: ScreenId): Loader | undefined {
  const load = screenOf(id).load;
  return load === 'entry' ? undefined : load;
}
