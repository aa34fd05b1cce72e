/**
 * Shared set-up for the browser tests: Debian's Chromium driven by playwright-core,
 * a page that records every request, console error and CSP violation.
 */
import { existsSync } from 'node:fs';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { SCREEN_IDS } from '../../src/app/shell/screens';

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export const BASE_URL = process.env.CASEFRONT_URL ?? 'http://localhost:4173/';

export const PHONE = { width: 390, height: 844 };

export function chromiumAvailable(): boolean {
  return existsSync(CHROMIUM_PATH);
}

export function launch(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--no-first-run',
      '--disable-sync',
    ],
  });
}

export interface Recorder {
  requests: string[];
  problems: string[];
}

/** A phone-sized context whose pages record requests, console errors and CSP violations. */
export async function phoneContext(
  browser: Browser,
  locale = 'en-US',
): Promise<{ context: BrowserContext; recorder: Recorder }> {
  const context = await browser.newContext({
    viewport: PHONE,
    deviceScaleFactor: 1,
    locale,
    hasTouch: true,
    isMobile: true,
  });
  const recorder: Recorder = { requests: [], problems: [] };
  context.on('request', (request) => recorder.requests.push(request.url()));
  // Runs before any page script; a violation event is recorded on the window for the test to read.
  await context.addInitScript(() => {
    const w = window as unknown as { __cspViolations: string[] };
    w.__cspViolations = [];
    document.addEventListener('securitypolicyviolation', (e) =>
      w.__cspViolations.push(`${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  context.on('page', (page) => watchPage(page, recorder));
  return { context, recorder };
}

function watchPage(page: Page, recorder: Recorder): void {
  page.on('console', (message) => {
    if (message.type() === 'error') recorder.problems.push(`console: ${message.text()}`);
  });
  page.on('pageerror', (error) => recorder.problems.push(`page error: ${error.message}`));
}

/** Closes the shared browser; `undefined` when launching it failed, so the failure itself is what is reported. */
export async function closeBrowser(browser: Browser | undefined): Promise<void> {
  await browser?.close();
}

export async function cspViolations(page: Page): Promise<string[]> {
  return page.evaluate(() => (window as unknown as { __cspViolations?: string[] }).__cspViolations ?? []);
}

/** Opens a screen by its route and waits for its heading and every part drawn after it (ui/Deferred.tsx). */
export async function openScreen(page: Page, id: string): Promise<void> {
  await page.goto(`${BASE_URL}#/${id}`);
  await page.waitForSelector('main h1');
  await page.waitForFunction(() => !document.querySelector('[data-deferred]'));
}

/** Every request stayed on the app's own origin (data: and blob: URLs are local). */
export function foreignRequests(recorder: Recorder): string[] {
  const origin = new URL(BASE_URL).origin;
  return recorder.requests.filter(
    (url) => !url.startsWith('data:') && !url.startsWith('blob:') && new URL(url).origin !== origin,
  );
}

/** Every screen's id, from the app's own screens table. */
export const SCREENS = SCREEN_IDS;

/** Waits until the service worker has cached the app (the header says "ready offline"). */
export async function waitUntilOfflineReady(page: Page): Promise<void> {
  await page.evaluate(() => navigator.serviceWorker.ready);
  await page.waitForSelector('[data-offline-state="ready"]');
}

/** Visible touch targets smaller than 48 px (the header, the bottom bar, inputs, buttons, links drawn as buttons). */
export async function smallTargets(page: Page, extraSelectors = ''): Promise<string[]> {
  return page.evaluate((extra) => {
    const selector = `button, .bottom-nav a, .safety-link, .field-box, label.segment, label.check${extra ? `, ${extra}` : ''}`;
    return [...document.querySelectorAll<HTMLElement>(selector)]
      .filter((el) => el.offsetParent !== null || getComputedStyle(el).position === 'fixed')
      .map((el) => ({ what: el.className || el.tagName, rect: el.getBoundingClientRect() }))
      .filter(({ rect }) => rect.height < 47.5 || rect.width < 47.5)
      .map(({ what, rect }) => `${what} ${Math.round(rect.width)}×${Math.round(rect.height)}`);
  }, extraSelectors);
}
