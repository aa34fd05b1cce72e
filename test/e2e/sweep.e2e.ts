/**
 * The sweep: every screen and view in English, Spanish and German at 390 px, in the dark, light and
 * high-contrast themes, with long, realistic data (lab results, 40-character part numbers and work
 * orders, a 12-step cycle with long step names, a plan out of reach). On each it fails on text that
 * overflows or is clipped, a point as the decimal mark in es/de or a comma in en, a figure with more
 * than 6 significant digits, a raw key or placeholder, and a page wider than the screen; and it
 * prints how many elements and screens it checked. Screenshots go to test-results/sweep/.
 */
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { movedTo, backupText, demoLog, importFile } from './logData';
import { BASE_URL, closeBrowser, launch, PHONE, phoneContext } from './browser';
import { sweepPage, type SweepReport } from './sweepCheck';
import { JOB_STATUSES, type Job } from '../../src/jobs/schema';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

const LANGUAGES = [
  ['en', 'en-US'],
  ['es', 'es-ES'],
  ['de', 'de-DE'],
] as const;
const THEMES = ['dark', 'light', 'contrast'] as const;

/** A 12-step cycle with step names as long as the field takes, as typed in the editor. */
function longCycleForm() {
  const names = [
    'Aufheizen auf Aufkohltemperatur',
    'Ausgleich Chargenkern 925 °C',
    'Aufkohlen hoher C-Pegel Teil 1',
    'Aufkohlen hoher C-Pegel Teil 2',
    'Diffusion niedriger C-Pegel',
    'Diffusion Zwischenstufe',
    'Absenken auf Härtetemperatur',
    'Halten vor dem Abschrecken',
    'Nachkohlen nach Störung Tür',
    'Diffusion Ausgleich',
    'Absenken zweite Stufe',
    'Halten Härtetemperatur Ende',
  ];
  const steps = names.map((label, i) => ({
    key: i + 1,
    label,
    duration: { text: i === 0 ? '1:30' : i % 3 === 0 ? '40 min' : '0,75', unit: 'h' },
    startTemp: { text: i === 0 ? '700' : i >= 6 ? '845' : '925', unit: 'C' },
    endTemp: { text: i >= 6 ? '845' : '925', unit: 'C' },
    neutral: i === 1,
    carbonPotential: { text: i < 4 ? '1,15' : '0,82', unit: '' },
    beta: { text: i === 2 ? '2,25' : '', unit: '' },
  }));
  return { steps, nextKey: 13 };
}

/** Targets out of reach: a 2.5 mm case and 1.0–1.05 %C at the surface in 20 h. */
const OUT_OF_REACH_PLAN = {
  ecdMin: { text: '2,5', unit: 'mm' },
  ecdMax: { text: '2,8', unit: 'mm' },
  surfaceMin: { text: '1,0', unit: '' },
  surfaceMax: { text: '1,05', unit: '' },
  boost: {
    temperature: { text: '930', unit: 'C' },
    carbonPotential: { text: '1,25', unit: '' },
    beta: { text: '1,5', unit: '' },
  },
};

/** The demo log with the longest texts the record takes in the jobs of the current shift. */
function longLog(): Job[] {
  const jobs = demoLog(60, 8, 5);
  const now = Date.now();
  return jobs.map((job, i) =>
    i >= jobs.length - 8
      ? {
          ...movedTo(job, now - (jobs.length - 1 - i) * 15 * 60_000),
          partNumber: `KR-2231-${'A'.repeat(8)}-GEAR-PINION-LH-${i}`.slice(0, 40),
          workOrder: `WO-2025-000${i}-REWORK-AFTER-HOLD-BATCH-`.slice(0, 40),
          furnace: 'F1 Mehrzweckkammerofen Halle 3 links',
          notes: `Tür 2 min offen bei 3 h 10 min; Probe nachgemessen. ${'Randhärte geprüft. '.repeat(6)}`,
          // Every status in the list, so each badge is seen in every theme.
          status: JOB_STATUSES[i % JOB_STATUSES.length]!,
        }
      : job,
  );
}

/**
 * Waits until the page has stopped changing for 400 ms (results from the worker, fits, lazily loaded
 * charts), at most 8 s: the checks must see what a person sees once it is all there.
 */
async function settled(page: Page): Promise<void> {
  // Work in progress says so (an "updating" mark, a busy region, "Opening…"): wait for it to end.
  await page
    .waitForFunction(
      () => document.querySelector('[data-updating], [aria-busy="true"], .screen-loading') === null,
      undefined,
      { timeout: 8000 },
    )
    .catch(() => undefined); // what is still busy after 8 s is checked as it stands
  await page.evaluate(
    () =>
      new Promise<void>((resolve) => {
        let timer = setTimeout(done, 400);
        const observer = new MutationObserver(() => {
          clearTimeout(timer);
          timer = setTimeout(done, 400);
        });
        const limit = setTimeout(done, 8000);
        observer.observe(document.body, { subtree: true, childList: true, characterData: true, attributes: true });
        function done() {
          observer.disconnect();
          clearTimeout(limit);
          resolve();
        }
      }),
  );
}

interface State {
  name: string;
  route: string;
  /** What to do once the screen is shown (open a panel, a form). */
  act?: (page: Page) => Promise<void>;
}

const clickFirst = (selector: string) => async (page: Page) => {
  await page.locator(selector).first().click();
};

const STATES: State[] = [
  { name: 'depth', route: 'depth' },
  { name: 'depth-time', route: 'depth', act: clickFirst('fieldset label.segment:nth-of-type(2)') },
  { name: 'depth-temperature', route: 'depth', act: clickFirst('fieldset label.segment:nth-of-type(3)') },
  { name: 'depth-save', route: 'depth', act: clickFirst('.log-action button') },
  { name: 'cycle', route: 'cycle' },
  { name: 'cycle-band', route: 'cycle', act: clickFirst('.cycle-band > button') },
  { name: 'plan', route: 'plan' },
  { name: 'recovery', route: 'recovery' },
  { name: 'log', route: 'log' },
  { name: 'log-job', route: 'log', act: clickFirst('a.job-card') },
  {
    name: 'log-job-lab',
    route: 'log',
    act: async (page) => {
      await clickFirst('a.job-card')(page);
      await clickFirst('section[aria-labelledby="job-lab"] .button')(page);
    },
  },
  {
    name: 'log-job-edit',
    route: 'log',
    act: async (page) => {
      await clickFirst('a.job-card')(page);
      await clickFirst('section[aria-labelledby="job-load"] .button')(page);
    },
  },
  { name: 'log-summary', route: 'log/summary' },
  { name: 'log-calibration', route: 'log/calibration' },
  { name: 'log-files', route: 'log/files' },
  { name: 'convert', route: 'convert' },
  { name: 'settings', route: 'settings' },
  { name: 'safety', route: 'safety' },
];

/** While working on one screen: CASEFRONT_SWEEP=log-summary,plan:de:contrast narrows the sweep (states:languages:themes). */
const [onlyStates, onlyLanguages, onlyThemes] = (process.env.CASEFRONT_SWEEP ?? '')
  .split(':')
  .map((part) => (part ? part.split(',') : undefined));
const chosen = <T extends string>(all: readonly T[], only: string[] | undefined) =>
  only ? all.filter((item) => only.includes(item)) : all;

describe('the sweep', () => {
  const totals = { elements: 0, screens: 0 };
  after(() => {
    console.log(
      `sweep: ${totals.screens} screens and views checked (${STATES.length} states in all; 3 languages × 3 themes), ${totals.elements} elements`,
    );
  });

  const states = STATES.filter((state) => !onlyStates || onlyStates.includes(state.name));
  for (const [language, locale] of LANGUAGES.filter(([l]) => chosen(['en', 'es', 'de'], onlyLanguages).includes(l))) {
    for (const theme of chosen(THEMES, onlyThemes)) {
      it(`${language}, ${theme}: no overflow, clipping, wrong decimal mark, long float or raw key on any screen`, async () => {
        mkdirSync('test-results/sweep', { recursive: true });
        const { context } = await phoneContext(browser, locale);
        // tsx names the sweep's inner functions with a helper the page does not have.
        await context.addInitScript('window.__name = (f) => f;');
        const settings = { language, theme, unitSystem: 'metric' };
        await context.addInitScript(
          ({ settings, cycle, plan }) => {
            if (localStorage.getItem('casefront.sweep') !== null) return; // seeded once; the app's writes stay
            localStorage.setItem('casefront.sweep', '1');
            localStorage.setItem('casefront.settings', JSON.stringify(settings));
            localStorage.setItem('casefront.form.cycle', JSON.stringify(cycle));
            localStorage.setItem('casefront.form.plan', JSON.stringify(plan));
          },
          { settings, cycle: longCycleForm(), plan: OUT_OF_REACH_PLAN },
        );
        const page = await context.newPage();
        await page.goto(BASE_URL);
        await page.waitForSelector('main h1');
        const report = await importFile(page, backupText(longLog()));
        assert.match(report, /\d/u, 'the long log was imported');
        const problems: string[] = [];
        for (const state of states) {
          await page.goto(`${BASE_URL}#/${state.route}`);
          await page.waitForSelector('main h1');
          await page.waitForLoadState('networkidle');
          if (state.act) await state.act(page);
          await settled(page);
          const result: SweepReport = await page.evaluate(sweepPage, { language, width: PHONE.width });
          totals.elements += result.elements;
          totals.screens += 1;
          problems.push(...result.problems.map((p) => `${language} ${theme} ${state.name}: ${p}`));
          if (theme === 'dark' || result.problems.length > 0) {
            await page.screenshot({
              path: `test-results/sweep/${language}-${theme}-${state.name}.png`,
              fullPage: true,
            });
          }
        }
        await context.close();
        // The same fault on many elements is one line, with how often it was seen.
        const counted = new Map<string, number>();
        for (const p of problems) counted.set(p, (counted.get(p) ?? 0) + 1);
        assert.deepEqual(
          [...counted].map(([p, n]) => (n > 1 ? `${p} (×${n})` : p)),
          [],
        );
      });
    }
  }
});
