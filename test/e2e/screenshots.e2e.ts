/** Screenshots of every screen at 390×844 in English, Spanish and German, into test-results/ for review. */
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, describe, it } from 'node:test';
import type { Browser } from 'playwright-core';
import { closeBrowser, launch, openScreen, phoneContext, SCREENS } from './browser';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

describe('screenshots', () => {
  for (const [language, locale] of [
    ['en', 'en-US'],
    ['es', 'es-ES'],
    ['de', 'de-DE'],
  ] as const) {
    it(`every screen at 390×844 in ${language}, without horizontal overflow or a broken navigation label`, async () => {
      mkdirSync('test-results', { recursive: true });
      const { context } = await phoneContext(browser, locale);
      const page = await context.newPage();
      for (const id of SCREENS) {
        await openScreen(page, id);
        if (id === 'cycle') await page.waitForSelector('.profile-chart canvas');
        assert.equal(await page.evaluate(() => document.documentElement.lang), language);
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        assert.ok(overflow <= 0, `${language} ${id}: ${overflow} px wider than the screen`);
        // The current item's label is bold, so check on every screen: a label on two lines is a broken word.
        const wrapped = await page.evaluate(() =>
          [...document.querySelectorAll('.bottom-nav a > span')]
            .filter((span) => {
              // A range over the text has one box per line, even inside a flex item.
              const range = document.createRange();
              range.selectNodeContents(span);
              return new Set([...range.getClientRects()].map((r) => Math.round(r.top))).size > 1;
            })
            .map((span) => span.textContent),
        );
        assert.deepEqual(wrapped, [], `${language} ${id}: navigation labels on two lines`);
        await page.screenshot({ path: `test-results/${language}-${id}.png` });
        await page.screenshot({ path: `test-results/${language}-${id}-full.png`, fullPage: true });
      }
      await context.close();
    });
  }
});
