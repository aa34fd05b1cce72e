/**
 * A shop network often serves the app over plain http from a LAN address, where the browser has no
 * `crypto.randomUUID` (secure contexts only). Saving a load and a lab result must still work, and a
 * badge number is accepted as the operator.
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser } from 'playwright-core';
import { closeBrowser, launch, openScreen, phoneContext } from './browser';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

describe('saving without crypto.randomUUID', () => {
  it('a load saved from the depth screen gets its id anyway, with a badge number for the operator', async () => {
    const { context, recorder } = await phoneContext(browser);
    await context.addInitScript(() => {
      // What an insecure context offers: getRandomValues, no randomUUID.
      Object.defineProperty(Crypto.prototype, 'randomUUID', { value: undefined, configurable: true });
    });
    const page = await context.newPage();
    await openScreen(page, 'depth');
    assert.equal(await page.evaluate(() => typeof crypto.randomUUID), 'undefined');
    await page.click('#log-save button');
    await page.waitForSelector('#log-save-title');
    await page.fill('#log-save-part', 'KR-2231');
    await page.fill('#log-save-furnace', 'F1');
    await page.fill('#log-save-operator', '4417');
    await page.click('form.log-form button[type=submit]');
    const link = page.locator('.log-saved a');
    await link.waitFor({ timeout: 10_000 });
    const id = ((await link.getAttribute('href')) ?? '').split('/').pop()!;
    assert.match(id, /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/u);
    await link.click();
    await page.waitForSelector('section[aria-labelledby="job-lab"]');
    assert.match((await page.textContent('main')) ?? '', /4417/u);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });
});
