/**
 * The first paint waits only for the first part of the locale: with the rest held back 2 s,
 * the first screen and a lazily opened screen show no raw key, and Spanish still works offline.
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, closeBrowser, launch, phoneContext, waitUntilOfflineReady } from './browser';

const REST_CHUNK = /\/locale-rest-[\w-]+\.js$/u;
const RAW_KEY = /\b(app|errors|warnings|jobs)\.[\w.]+/u;

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

/**
 * Watches everything the page shows a person (its text and labelling attributes) from before
 * the app's first script, after every change, and keeps each raw key it ever sees. A string,
 * so the test runner's compiler adds nothing the page lacks.
 */
const WATCH_FOR_RAW_KEYS = `
  window.__rawKeys = [];
  new MutationObserver(() => {
    const labels = [...document.querySelectorAll('[aria-label], [title], [placeholder]')]
      .map((el) => ['aria-label', 'title', 'placeholder'].map((a) => el.getAttribute(a) ?? '').join(' '));
    const found = new RegExp(${JSON.stringify(RAW_KEY.source)}, 'u').exec([document.body?.innerText ?? '', ...labels].join('\\n'));
    if (found) window.__rawKeys.push(location.hash + ': ' + found[0]);
  }).observe(document, { subtree: true, childList: true, characterData: true, attributes: true });
`;

async function assertNoRawKey(page: Page, where: string): Promise<void> {
  assert.deepEqual(
    await page.evaluate(() => (window as unknown as { __rawKeys: string[] }).__rawKeys),
    [],
    `${where}: a raw translation key was shown`,
  );
}

describe('locale in two parts', () => {
  it('with the rest of the locale held back, no screen shows a raw key; then Spanish works offline', async () => {
    const { context, recorder } = await phoneContext(browser, 'es-ES');
    const rest = { requested: 0, served: 0 };
    await context.route(REST_CHUNK, async (route) => {
      rest.requested++;
      await new Promise((r) => setTimeout(r, 2000));
      rest.served++;
      await route.continue();
    });
    await context.addInitScript(WATCH_FOR_RAW_KEYS);
    const page = await context.newPage();
    await page.goto(`${BASE_URL}#/depth`);
    await page.waitForSelector('.answer-value');
    await page.fill('#depth-temperature', '9x5');
    await page.waitForSelector('#depth-temperature-error');
    assert.ok(
      rest.requested > 0 && rest.served === 0,
      'the first screen painted before the rest of the locale arrived',
    );
    assert.equal(await page.textContent('main h1'), 'Profundidad de capa');
    await assertNoRawKey(page, 'first screen');

    // A lazily loaded screen waits for the rest: meanwhile it says it is opening.
    await page.click('a[href="#/log"]');
    await page.waitForSelector('.screen-loading');
    await page.waitForFunction(() => document.querySelector('main h1')?.textContent === 'Registro de cargas');
    assert.notEqual(rest.served, 0, 'the rest of the locale came in before the log screen opened');
    await assertNoRawKey(page, 'log screen, while it opened and once open');

    await context.unrouteAll({ behavior: 'wait' }); // lets held-back requests (the worker's precache too) finish
    await waitUntilOfflineReady(page);
    await context.setOffline(true);
    await page.goto(`${BASE_URL}#/settings`);
    await page.reload();
    await page.waitForFunction(() => document.querySelector('main h1')?.textContent === 'Ajustes');
    await assertNoRawKey(page, 'settings offline');
    await page.click('a[href="#/depth"]');
    await page.waitForFunction(() => document.querySelector('main h1')?.textContent === 'Profundidad de capa');
    await assertNoRawKey(page, 'first screen offline');
    assert.deepEqual(
      recorder.problems.filter((p) => !p.includes('ERR_INTERNET_DISCONNECTED')),
      [],
    );
    await context.close();
  });
});
