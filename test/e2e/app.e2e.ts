/** The built app in Chromium: computing, editing a cycle, language, keyboard, touch targets, axe, CSP, origin. */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { formatQuantity } from '../../src/app/ui/format';
import { caseDepth } from '../../src/physics';
import { runAxe } from './axe';
import {
  BASE_URL,
  closeBrowser,
  cspViolations,
  foreignRequests,
  launch,
  openScreen,
  phoneContext,
  type Recorder,
  SCREENS,
  smallTargets,
} from './browser';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

async function freshPage(locale = 'en-US'): Promise<{ page: Page; recorder: Recorder; close: () => Promise<void> }> {
  const { context, recorder } = await phoneContext(browser, locale);
  const page = await context.newPage();
  return { page, recorder, close: () => context.close() };
}

/** The ECD the app should show for SAE 8620 at these conditions (same engine, English formatting). */
function expectedEcd(temperatureC: number, timeH: number, carbonPotentialPct: number): string {
  const r = caseDepth({
    temperatureC,
    timeH,
    carbonPotentialPct,
    coreCarbonPct: 0.2,
    thresholdCarbonPct: 0.4,
    model: 'agren',
    composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
  });
  assert.ok(r.ok);
  return formatQuantity(r.value.effectiveCaseDepthMm, 'mm', 'en');
}

const answer = (page: Page) => page.locator('.answer-value').first();

/** The answer once the results have caught up with the typing (they follow a task or two later), or whatever it shows after 2 s. */
async function answerOnceShown(page: Page, expected: string): Promise<string | null> {
  await page
    .waitForFunction((text) => document.querySelector('.answer-value')?.textContent === text, expected, {
      timeout: 2000,
    })
    .catch(() => undefined);
  return answer(page).textContent();
}

describe('case depth screen', () => {
  it('computes as you type, accepts a decimal comma, and words an invalid entry beside its field', async () => {
    const { page, recorder, close } = await freshPage();
    await openScreen(page, 'depth');
    assert.equal(await answer(page).textContent(), expectedEcd(925, 6, 0.9));
    await page.fill('#depth-time', '8');
    assert.equal(await answerOnceShown(page, expectedEcd(925, 8, 0.9)), expectedEcd(925, 8, 0.9));
    await page.fill('#depth-carbon', '0,85');
    assert.equal(await answerOnceShown(page, expectedEcd(925, 8, 0.85)), expectedEcd(925, 8, 0.85));
    await page.fill('#depth-temperature', '9x5');
    const error = page.locator('#depth-temperature-error');
    await error.waitFor();
    assert.match((await error.textContent()) ?? '', /“9x5” is not a number/);
    assert.equal(await page.getAttribute('#depth-temperature', 'aria-invalid'), 'true');
    assert.equal(await answerOnceShown(page, '–'), '–');
    await page.fill('#depth-temperature', '925');
    await error.waitFor({ state: 'detached' });
    assert.equal(await error.count(), 0);
    await page.locator('label.segment', { hasText: 'Time' }).first().click();
    const depthAnswer = await answer(page).textContent();
    await page.fill('#depth-target', '1.2');
    await page.waitForFunction((shown) => document.querySelector('.answer-value')?.textContent !== shown, depthAnswer);
    assert.match((await answer(page).textContent()) ?? '', /^\d+\s?h( \d+\s?min)?$/u);
    const body = (await page.textContent('main')) ?? '';
    assert.doesNotMatch(body, /NaN|Infinity/);
    assert.deepEqual(foreignRequests(recorder), []);
    assert.deepEqual(recorder.problems, []);
    await close();
  });
});

describe('cycle editor', () => {
  it('adds, duplicates, moves and removes steps; shows results, a lazily loaded chart and the same numbers as a table', async () => {
    const { page, recorder, close } = await freshPage();
    await openScreen(page, 'depth');
    assert.equal(
      recorder.requests.some((u) => /\/chart-[\w-]+\.js$/.test(u)),
      false,
      'chart code is not loaded by the first screen',
    );
    await page.click('a[href="#/cycle"]');
    await page.waitForSelector('.step');
    const steps = page.locator('li.step');
    assert.equal(await steps.count(), 4);
    await page.click('text=Add a step');
    assert.equal(await steps.count(), 5);
    await page.click('[aria-label="Duplicate step 1"]');
    assert.equal(await steps.count(), 6);
    await page.fill('li.step >> nth=0 >> textarea[id$="-label"]', 'boost');
    await page.click('[aria-label="Move step 1 down"]');
    assert.match((await steps.nth(1).locator('h3').textContent()) ?? '', /boost/);
    await page.click('[aria-label="Remove step 6"]');
    assert.equal(await steps.count(), 5);
    const before = await answer(page).textContent();
    await page.fill('li.step >> nth=1 >> input[id$="-duration"]', '5');
    // The results follow the typing a task or two later (ui/Deferred.tsx).
    await page.waitForFunction((shown) => document.querySelector('.answer-value')?.textContent !== shown, before);
    assert.notEqual(await answer(page).textContent(), before);
    assert.match((await answer(page).textContent()) ?? '', /mm$/);
    await page.waitForSelector('.profile-chart canvas');
    assert.ok(
      recorder.requests.some((u) => /\/chart-[\w-]+\.js$/.test(u)),
      'chart chunk loaded on demand',
    );
    // The profile's table (11 depths), then the surface carbon's (11 times).
    assert.equal(await page.locator('table.numbers').first().locator('tbody tr').count(), 11);
    assert.equal(await page.locator('table.numbers').nth(1).locator('tbody tr').count(), 11);
    // A duration field takes 1:20 or 80 min besides a number, and says so when the text is neither.
    await page.fill('li.step >> nth=2 >> input[id$="-duration"]', 'zwei');
    await page.waitForSelector('li.step >> nth=2 >> .field-error');
    assert.match((await page.locator('li.step >> nth=2 >> .field-error').textContent()) ?? '', /“zwei” is not a time/);
    assert.deepEqual(foreignRequests(recorder), []);
    assert.deepEqual(recorder.problems, []);
    await close();
  });
});

describe('languages', () => {
  it('switches to Spanish, formats numbers the Spanish way, and stays Spanish after a reload', async () => {
    const { page, close } = await freshPage();
    await openScreen(page, 'settings');
    await page.locator('label.segment', { hasText: 'Español' }).click();
    await page.waitForFunction(() => document.documentElement.lang === 'es');
    assert.equal(await page.textContent('main h1'), 'Ajustes');
    await page.reload();
    await page.waitForSelector('main h1');
    assert.equal(await page.evaluate(() => document.documentElement.lang), 'es');
    await page.click('a[href="#/depth"]');
    await page.waitForSelector('.answer-value');
    assert.equal(await page.textContent('main h1'), 'Profundidad de capa');
    assert.equal(await answer(page).textContent(), expectedEcd(925, 6, 0.9).replace('.', ','));
    assert.match((await page.textContent('.bottom-nav')) ?? '', /Ciclo.*Desvío.*Convertir.*Ajustes/);
    await close();
  });
});

describe('keyboard and touch', () => {
  it('every control on each screen is reached with Tab, in a visible order', async () => {
    const { page, close } = await freshPage();
    for (const id of ['depth', 'cycle', 'settings'] as const) {
      await openScreen(page, id);
      const controls: string[] = await page.evaluate(() =>
        [
          ...document.querySelectorAll<HTMLElement>(
            'input:not([type=radio]), select, button:not([disabled]), a[href], input[type=radio]:checked',
          ),
        ]
          .filter((el) => el.offsetParent !== null || getComputedStyle(el).position === 'fixed')
          .map(
            (el) =>
              el.id ||
              `${el.tagName}:${el.getAttribute('aria-label') ?? el.getAttribute('href') ?? el.getAttribute('name') ?? el.textContent}`,
          ),
      );
      const reached = new Set<string>();
      await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
      // Tab round the whole page once: until the first stop comes back (a time field is several stops).
      let first: string | undefined;
      for (let i = 0; i < controls.length * 4 + 10; i++) {
        await page.keyboard.press('Tab');
        const now = await page.evaluate(() => {
          const el = document.activeElement as HTMLElement;
          return (
            el.id ||
            `${el.tagName}:${el.getAttribute('aria-label') ?? el.getAttribute('href') ?? el.getAttribute('name') ?? el.textContent}`
          );
        });
        if (now === first) break;
        first ??= now;
        reached.add(now);
      }
      assert.deepEqual(
        controls.filter((c) => !reached.has(c)),
        [],
        `${id}: controls not reached by Tab`,
      );
    }
    await page.focus('a[href="#/convert"]');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => document.querySelector('main h1')?.textContent === 'Conversions');
    await page.waitForFunction(() => document.activeElement === document.querySelector('main h1'));
    await close();
  });

  it('touch targets are at least 48 px on every screen', async () => {
    const { page, close } = await freshPage();
    for (const id of SCREENS) {
      await openScreen(page, id);
      const small = await smallTargets(page);
      assert.deepEqual(small, [], `${id}: small targets`);
    }
    await close();
  });
});

describe('accessibility (axe-core)', () => {
  it('no serious or critical violation on any screen: English and Spanish, dark, light and high-contrast themes', async () => {
    const lines: string[] = [];
    const runs = [
      ['en-US', 'dark'],
      ['es-ES', 'dark'],
      ['en-US', 'light'],
      ['en-US', 'contrast'],
    ] as const;
    for (const [locale, theme] of runs) {
      const { page, close } = await freshPage(locale);
      await page.addInitScript(
        (th) => localStorage.setItem('casefront.settings', JSON.stringify({ theme: th })),
        theme,
      );
      for (const id of SCREENS) {
        await openScreen(page, id);
        if (id === 'cycle') await page.waitForSelector('.profile-chart canvas');
        const { violations } = await runAxe(page);
        const bad = violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
        assert.equal(await page.evaluate(() => document.documentElement.dataset.theme), theme);
        lines.push(
          `${locale} ${theme} ${id}: ${violations.length} violation(s)${violations.length ? ` [${violations.map((v) => `${v.id}/${v.impact}`).join(', ')}]` : ''}`,
        );
        assert.deepEqual(bad, [], `${locale} ${theme} ${id}`);
      }
      await close();
    }
    console.log(`axe: ${lines.join('; ')}`);
  });
});

describe('content security policy and origin', () => {
  it('the CSP allows only self: no inline script, no violation reported, no request leaves the origin', async () => {
    const html = readFileSync('dist/index.html', 'utf8');
    // The page source is formatted by prettier, so the attributes may sit on separate lines.
    const csp = /http-equiv="Content-Security-Policy"\s+content="([^"]+)"/u.exec(html)?.[1] ?? '';
    assert.match(csp, /default-src 'self'/);
    assert.match(csp, /script-src 'self'(;|$)/);
    assert.match(csp, /style-src 'self'(;|$)/);
    assert.doesNotMatch(csp, /unsafe-inline|unsafe-eval|https?:/);
    assert.doesNotMatch(html, /<script(?![^>]*\bsrc=)[^>]*>/, 'no inline <script> in the built page');

    const { page, recorder, close } = await freshPage();
    for (const id of SCREENS) {
      await openScreen(page, id);
      if (id === 'cycle') await page.waitForSelector('.profile-chart canvas');
      assert.equal(await page.locator('script:not([src])').count(), 0);
      // Our markup has no style attributes (uPlot sizes its canvas through the CSSOM, which the CSP allows).
      const styled = await page.evaluate(
        () => [...document.querySelectorAll('[style]')].filter((el) => !el.closest('.profile-chart')).length,
      );
      assert.equal(styled, 0, `${id}: no inline style attribute in our markup`);
    }
    await page.evaluate(() => navigator.serviceWorker.ready);
    assert.deepEqual(await cspViolations(page), []);
    assert.deepEqual(foreignRequests(recorder), []);
    assert.ok(recorder.requests.length > 5);
    assert.deepEqual(
      recorder.problems.filter((p) => /Content Security Policy|Refused/.test(p)),
      [],
    );
    assert.ok(recorder.requests.every((u) => u.startsWith(new URL(BASE_URL).origin)));
    await close();
  });
});
