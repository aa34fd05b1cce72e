/**
 * Charts a gloved hand can read: ticks in the page's notation, values on tap, a table beside each;
 * the planner draws its cycle too; the app turns to landscape and stays usable; the sticky answer
 * never covers the field being typed in.
 */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, closeBrowser, launch, openScreen, phoneContext } from './browser';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

async function german(): Promise<{ page: Page; close: () => Promise<void> }> {
  const { context } = await phoneContext(browser, 'de-DE');
  await context.addInitScript(() =>
    localStorage.setItem('casefront.settings', JSON.stringify({ language: 'de', theme: 'dark' })),
  );
  const page = await context.newPage();
  return { page, close: () => context.close() };
}

/** Taps the plot of the n-th chart at `share` of its width and returns the line under it. */
async function tapChart(page: Page, n: number, share: number): Promise<string> {
  const figure = page.locator('figure.chart').nth(n);
  const over = figure.locator('.u-over');
  await over.waitFor();
  await over.scrollIntoViewIfNeeded();
  const box = (await over.boundingBox())!;
  await page.touchscreen.tap(box.x + box.width * share, box.y + box.height / 2);
  await page.waitForTimeout(150);
  return (await figure.locator('.chart-readout').textContent()) ?? '';
}

describe('charts', () => {
  it('cycle: values on tap in German notation, both charts with a table each', async () => {
    const { page, close } = await german();
    await openScreen(page, 'cycle');
    await page.waitForSelector('figure.chart >> nth=1 >> canvas');
    assert.match(await tapChart(page, 0, 0.3), /^Bei \d+,\d{2}\s?mm: \d,\d{2}\s?%C, \d+\s?HRC/u);
    assert.match(await tapChart(page, 1, 0.5), /^Nach \d+\s?h( \d+\s?min)?: Rand \d,\d{2}\s?%C$/u);
    assert.equal(await page.locator('figure.chart').count(), 2);
    assert.equal(
      await page.locator('figure.chart + p + .table-wrap table, figure.chart + .table-wrap table').count(),
      2,
      'a table beside each chart',
    );
    await close();
  });

  it('planner: the planned cycle is drawn, profile and surface carbon, with their tables', async () => {
    const { page, close } = await german();
    await openScreen(page, 'plan');
    await page.waitForSelector('figure.chart >> nth=1 >> canvas');
    assert.equal(await page.locator('figure.chart').count(), 2);
    assert.match(await tapChart(page, 0, 0.5), /^Bei \d+,\d{2}\s?mm:/u);
    await close();
  });
});

describe('a phone on its side', () => {
  it('the installed app may turn (manifest), and in landscape the content keeps most of the height', async () => {
    const manifest = JSON.parse(readFileSync('dist/manifest.webmanifest', 'utf8')) as { orientation?: string };
    assert.notEqual(manifest.orientation, 'portrait');
    const { context } = await phoneContext(browser);
    const page = await context.newPage();
    await page.setViewportSize({ width: 844, height: 390 });
    await page.goto(`${BASE_URL}#/depth`);
    await page.waitForSelector('main h1');
    await page.evaluate(() => window.scrollTo(0, 600));
    // What stays on screen while scrolling: only the bottom navigation.
    const covered = await page.evaluate(() => {
      const fixed = [...document.querySelectorAll<HTMLElement>('.top, .answer, .bottom-nav')].filter((el) => {
        const position = getComputedStyle(el).position;
        return position === 'fixed' || position === 'sticky';
      });
      return fixed.reduce((sum, el) => {
        const r = el.getBoundingClientRect();
        return r.bottom > 0 && r.top < innerHeight ? sum + Math.min(r.bottom, innerHeight) - Math.max(r.top, 0) : sum;
      }, 0);
    });
    assert.ok(390 - covered >= 300, `${390 - covered} px of 390 px left for content`);
    assert.ok((await page.evaluate(() => document.documentElement.scrollWidth)) <= 844);
    await context.close();
  });
});

describe('the sticky answer', () => {
  it('a field focused where the answer sticks is scrolled into the clear, on every calculator', async () => {
    const { context } = await phoneContext(browser);
    const page = await context.newPage();
    for (const [route, field] of [
      ['depth', '#depth-carbon'],
      ['cycle', '#step-2-duration'],
      ['plan', '#plan-surface-max'],
      ['recovery', '#recovery-required'],
    ] as const) {
      await openScreen(page, route);
      // Scroll the page so the field sits just under the header: where the sticky answer is.
      await page.evaluate((selector) => {
        const el = document.querySelector(selector)!;
        window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 70);
      }, field);
      await page.focus(field);
      await page.waitForTimeout(400);
      // Nothing lies over the middle of the field.
      const uncovered = await page.evaluate((selector) => {
        const input = document.querySelector(selector)!;
        const r = input.getBoundingClientRect();
        const hit = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
        return hit === input || input.contains(hit);
      }, field);
      assert.ok(uncovered, `${route}: ${field} is covered by something once focused`);
    }
    await context.close();
  });
});
