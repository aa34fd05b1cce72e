/**
 * The screens and how each is loaded: the first screen is in the entry chunk,
 * the others are separate chunks fetched when opened (all precached for offline use).
 */
import type { ComponentType } from 'preact';
import DepthScreen from '../depth/Screen';
import type { ScreenId } from './route';

type Loader = () => Promise<{ default: ComponentType }>;

export const LOADERS: Record<Exclude<ScreenId, 'depth'>, Loader> = {
  cycle: () => import('../cycle/Screen'),
  plan: () => import('../plan/Screen'),
  recovery: () => import('../recovery/Screen'),
  log: () => import('../log/Screen'),
  convert: () => import('../convert/Screen'),
  settings: () => import('../settings/Screen'),
  safety: () => import('../safety/Screen'),
};

export const FIRST_SCREEN = DepthScreen;

/** Screens in the bottom navigation, in order (safety sits in the header). */
export const NAV_SCREENS = [
  'depth',
  'cycle',
  'recovery',
  'log',
  'convert',
  'settings',
] as const satisfies readonly ScreenId[];

/** Screens reached from a navigation item rather than having one: planning is the cycle item's second view. */
const NAV_ITEM_OF: Partial<Record<ScreenId, (typeof NAV_SCREENS)[number]>> = { plan: 'cycle' };

/** The navigation item to mark as current for a screen. */
export const navItemOf = (id: ScreenId): ScreenId => NAV_ITEM_OF[id] ?? id;
