/** The screens table: one entry per screen, which routes, navigation, loading and the tests all read. */
import { describe, expect, it } from 'vitest';
import { hrefFor, screenFromHash } from '../../src/app/shell/route';
import { HEADER_SCREEN, HOME, NAV_SCREENS, navItemOf, SCREEN_IDS, SCREENS } from '../../src/app/shell/screens';
import { importsOf, parseSource, staticImportGraph } from '../importGraph';

describe('screens table', () => {
  it('names each screen once, and every id is a route of its own', () => {
    expect(new Set(SCREEN_IDS).size).toBe(SCREENS.length);
    for (const id of SCREEN_IDS) expect(screenFromHash(hrefFor(id))).toBe(id);
    expect(screenFromHash('#/no-such-screen')).toBe(HOME);
  });

  it('every screen is reachable: a bar item, the header link, or a view of a bar item', () => {
    const bar = NAV_SCREENS.map((screen) => screen.id);
    expect(bar).toEqual(['depth', 'cycle', 'recovery', 'log', 'convert', 'settings']);
    expect(HEADER_SCREEN.id).toBe('safety');
    for (const screen of SCREENS) {
      if (typeof screen.nav === 'object') expect(bar).toContain(screen.nav.within);
      else expect(screen.icon).toMatch(/^M[\d .,hvlzmMHVLZacA-]+$/u);
    }
    expect(navItemOf('plan')).toBe('cycle');
    expect(navItemOf('log')).toBe('log');
  });

  it('only the entry screen loads with the first bundle; every other one is its own chunk', () => {
    const entries = SCREENS.filter((screen) => screen.load === 'entry');
    expect(entries.map((screen) => screen.id)).toEqual([HOME]);
    const firstBundle = staticImportGraph('src/app/main.tsx');
    const screenModules = firstBundle.filter((path) => /^src\/app\/[a-z]+\/Screen\.tsx$/u.test(path));
    expect(screenModules).toEqual([`src/app/${HOME}/Screen.tsx`]);
    // The table reaches every other screen through import() only.
    const lazy = importsOf(parseSource('src/app/shell/screens.ts'))
      .filter((ref) => ref.kind === 'dynamic')
      .map((ref) => ref.specifier);
    expect(lazy).toEqual(SCREENS.filter((screen) => screen.load !== 'entry').map((screen) => `../${screen.id}/Screen`));
  });
});
