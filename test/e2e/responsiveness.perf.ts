/**
 * Keystrokes never wait: with Chromium's CPU slowed 4× (a mid-range phone) at 390 px, typing in
 * every calculator, switching screens and opening the calibration of a furnace with 30 cycle jobs
 * make no main-thread task over 50 ms (PerformanceObserver 'longtask'), and a first visit shows a
 * result within 1.5 s (the median of three first visits). The figures are printed.
 *
 * The page is driven with raw input (CDP key and mouse events at coordinates read before each
 * step), not with Playwright's actionability checks, whose selector engine runs on the page's main
 * thread and would be recorded as the app's own long tasks.
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, BrowserContext, CDPSession, Page } from 'playwright-core';
import { NO_VALUE } from '../../src/app/ui/format';
import { HEADER_SCREEN, HOME, NAV_SCREENS } from '../../src/app/shell/screens';
import { cycleJobsOnOneFurnace } from '../fixtures/cycleJobs';
import { BASE_URL, closeBrowser, launch, phoneContext, waitUntilOfflineReady } from './browser';
import { backupText, importFile } from './logData';

const THROTTLE = 4;
const LONG_TASK_MS = 50;
const FIRST_RESULT_MS = 1500;
const FIRST_VISITS = 3;

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

interface LongTask {
  phase: string;
  durationMs: number;
}

interface Keystroke {
  phase: string;
  /** keydown to the next paint (Event Timing), ms; absent when under 16 ms, which the API does not report. */
  durationMs: number;
}

interface Recorded {
  __longTasks: LongTask[];
  __keystrokes: Keystroke[];
  __keys: Record<string, number>;
  __phase: string;
}

/** Records every long task on the page and every keystroke slower than 16 ms to the next paint, tagged with the phase. */
async function record(page: Page): Promise<void> {
  await page.addInitScript(() => {
    const w = window as unknown as Recorded;
    w.__longTasks = [];
    w.__keystrokes = [];
    w.__keys = {};
    w.__phase = 'first visit';
    new PerformanceObserver((list) => {
      for (const entry of list.getEntries()) w.__longTasks.push({ phase: w.__phase, durationMs: entry.duration });
    }).observe({ type: 'longtask', buffered: true });
    new PerformanceObserver((list) => {
      for (const entry of list.getEntries())
        if (entry.name === 'keydown') w.__keystrokes.push({ phase: w.__phase, durationMs: entry.duration });
    }).observe({ type: 'event', durationThreshold: 16, buffered: true } as PerformanceObserverInit);
    addEventListener('keydown', () => (w.__keys[w.__phase] = (w.__keys[w.__phase] ?? 0) + 1), { capture: true });
  });
}

const setPhase = (page: Page, phase: string) =>
  page.evaluate((p) => ((window as unknown as Recorded).__phase = p), phase);

/** Settles: nothing marked updating, no part of the screen still waiting to be drawn, then the page idle. */
async function settle(page: Page): Promise<void> {
  await page.waitForFunction(() => !document.querySelector('[data-updating], [data-deferred], .screen-loading'));
  await page.evaluate(
    () =>
      new Promise<void>((resolve) =>
        requestAnimationFrame(() => setTimeout(() => requestIdleCallback(() => resolve(), { timeout: 2000 }), 50)),
      ),
  );
}

/** The centre of an element, read before the input is sent. */
async function centreOf(page: Page, selector: string): Promise<{ x: number; y: number }> {
  await page.waitForSelector(selector);
  const box = await page.locator(selector).first().boundingBox();
  assert.ok(box, `${selector} is on the page`);
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

/** A tap where a person would tap. */
async function tap(page: Page, selector: string): Promise<void> {
  await page
    .locator(selector)
    .first()
    .evaluate((el) => el.scrollIntoView({ block: 'center' }));
  const { x, y } = await centreOf(page, selector);
  await page.mouse.click(x, y);
}

/** Replaces a field's text one key at a time, as a person types (a short pause between keys), then settles. */
async function typeInto(page: Page, selector: string, text: string): Promise<void> {
  await tap(page, selector);
  await page.keyboard.press('ControlOrMeta+A');
  await page.keyboard.type(text, { delay: 120 });
  await settle(page);
}

async function slowed(context: BrowserContext, page: Page): Promise<CDPSession> {
  const cdp = await context.newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: THROTTLE });
  return cdp;
}

/** A first visit of a page (the files in the cache, as on a phone that has opened the app before): ms to the first result. */
async function firstVisit(page: Page): Promise<number> {
  await page.goto(`${BASE_URL}#/${HOME}`);
  await page.waitForFunction((none) => {
    const text = document.querySelector('.answer-value')?.textContent;
    return typeof text === 'string' && text !== none;
  }, NO_VALUE);
  return page.evaluate(() => performance.now());
}

const median = (values: readonly number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length === 0 ? 0 : sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

describe('responsiveness with the CPU slowed 4×', () => {
  it('typing, switching screens and opening a calibration of 30 cycle jobs make no task over 50 ms; a first visit shows a result within 1.5 s', async () => {
    const { context } = await phoneContext(browser);
    // The log first (not slowed): 30 cycle jobs with lab results on one furnace.
    const setup = await context.newPage();
    await setup.goto(`${BASE_URL}#/log`);
    await waitUntilOfflineReady(setup);
    await importFile(setup, backupText(cycleJobsOnOneFurnace(30)));
    await setup.close();

    const firstResults: number[] = [];
    for (let visit = 1; visit < FIRST_VISITS; visit++) {
      const page = await context.newPage();
      await slowed(context, page);
      firstResults.push(await firstVisit(page));
      await page.close();
    }

    const page = await context.newPage();
    await record(page);
    const cdp = await slowed(context, page);
    firstResults.push(await firstVisit(page));
    await settle(page);

    await setPhase(page, 'typing: depth time');
    await typeInto(page, '#depth-time', '7,25');
    await setPhase(page, 'typing: depth temperature');
    await typeInto(page, '#depth-temperature', '930');

    await setPhase(page, 'switching screens');
    for (const screen of [...NAV_SCREENS.filter((s) => s.id !== HOME), HEADER_SCREEN]) {
      await tap(page, screen.id === HEADER_SCREEN.id ? '.safety-link' : `.bottom-nav a[href="#/${screen.id}"]`);
      await page.waitForFunction((id) => location.hash === `#/${id}`, screen.id);
      await settle(page);
    }

    await tap(page, `.bottom-nav a[href="#/cycle"]`);
    await page.waitForSelector('li.step');
    await settle(page);
    await setPhase(page, 'typing: cycle step');
    await typeInto(page, 'li.step >> nth=1 >> input[id$="-duration"]', '2,5');

    await setPhase(page, 'typing: planner');
    await tap(page, '.view-tabs a[href="#/plan"]');
    await page.waitForSelector('#plan-ecd-max');
    await settle(page);
    await typeInto(page, '#plan-ecd-max', '0,95');

    await setPhase(page, 'typing: upset readings');
    await tap(page, '.bottom-nav a[href="#/recovery"]');
    await page.waitForSelector('#reading-1-temperature');
    await settle(page);
    await typeInto(page, '#reading-1-temperature', '880');

    await setPhase(page, 'calibration, 30 cycle jobs');
    const opened = await page.evaluate(() => {
      location.hash = '#/log/calibration';
      return performance.now();
    });
    await page.waitForSelector('.calibration-card');
    const calibrationMs = (await page.evaluate(() => performance.now())) - opened;
    await settle(page);

    const recorded = await page.evaluate(() => {
      const w = window as unknown as Recorded;
      return { tasks: w.__longTasks, keystrokes: w.__keystrokes, keys: w.__keys };
    });
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
    await context.close();

    const firstResultMs = median(firstResults);
    const ms = (values: readonly number[]) => values.map((v) => v.toFixed(0)).join(', ');
    console.log(
      `4× slowed CPU, 390 px: first result after ${ms(firstResults)} ms, median ${firstResultMs.toFixed(0)} ms (limit ${FIRST_RESULT_MS}); calibration of 30 cycle jobs shown after ${calibrationMs.toFixed(0)} ms`,
    );
    const phases = [...new Set([...recorded.tasks.map((t) => t.phase), ...Object.keys(recorded.keys)])];
    for (const phase of ['first visit', ...phases.filter((p) => p !== 'first visit')]) {
      const tasks = recorded.tasks.filter((t) => t.phase === phase).map((t) => t.durationMs);
      const keys = recorded.keys[phase] ?? 0;
      const slowKeys = recorded.keystrokes.filter((k) => k.phase === phase).map((k) => k.durationMs);
      // Keystrokes the API did not report took under 16 ms; they count as 16 in the median.
      const keyMedian = median([...slowKeys, ...Array<number>(Math.max(0, keys - slowKeys.length)).fill(16)]);
      const keyText = keys
        ? `; ${keys} keystrokes, keydown to next paint median ${keyMedian <= 16 ? '≤ 16' : keyMedian.toFixed(0)} ms, max ${slowKeys.length ? Math.max(...slowKeys).toFixed(0) : '≤ 16'} ms`
        : '';
      console.log(
        `  ${phase}: ${tasks.length ? `${tasks.length} long tasks (${ms(tasks)} ms), median ${median(tasks).toFixed(0)} ms` : 'no long task'}${keyText}`,
      );
    }
    const afterLoad = recorded.tasks.filter((t) => t.phase !== 'first visit');
    console.log(
      `  longest task after the first visit: ${afterLoad.length ? Math.max(...afterLoad.map((t) => t.durationMs)).toFixed(0) : 'none over 50'} ms (limit ${LONG_TASK_MS})`,
    );
    assert.ok(firstResultMs <= FIRST_RESULT_MS, `first result after a median ${firstResultMs.toFixed(0)} ms`);
    assert.deepEqual(
      afterLoad.map((t) => `${t.phase}: ${t.durationMs.toFixed(0)} ms`),
      [],
      'no main-thread task over 50 ms',
    );
  });
});
