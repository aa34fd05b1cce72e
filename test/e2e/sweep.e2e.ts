/**
 * The sweep: every screen and view in English, Spanish and German at 390 px, in the dark, light and
 * high-contrast themes, with long, realistic data (lab results, 40-character part numbers and work
 * orders, a 12-step cycle with long step names, a plan out of reach, lab traverses with a fitted plant
 * threshold, a learnt threshold applied, a plan that replaced the engineer's steps, the shop server set
 * up with a refused sign-in, the open dialogs). On each it fails on text that
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
import {
  APPLIED_THRESHOLD,
  CONFLICTED_JOB_ID,
  LONG_FURNACE,
  otherDeviceCopy,
  TRAVERSED_JOB_ID,
  traversedJobs,
} from './sweepData';

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

/** The lab form of the job with a traverse, then `then`. */
const labForm =
  (then?: (page: Page) => Promise<void>) =>
  async (page: Page): Promise<void> => {
    // After a reload the lab form opens again as it was left (its draft is kept).
    if ((await page.locator('#lab-add-point').count()) === 0)
      await clickFirst('section[aria-labelledby="job-lab"] .button')(page);
    await page.waitForSelector('#lab-add-point');
    if (then) await then(page);
  };

/** The hardness tester's export as a lab would paste it: long German headers, `;`, decimal commas, a summary line. */
const TESTER_FILE = [
  'Messpunkt Nr.;Abstand von der Oberfläche [mm];Härte HV1 (Prüfkraft 9,807 N)',
  ...[705, 690, 672, 650, 628, 604, 583, 562, 538, 515, 488, 460, 432, 410, 392, 378, 366, 360].map(
    (hv, i) => `${i + 1};${String((i + 1) / 10).replace('.', ',')};${hv}`,
  ),
  'CHD 550 HV1;0,85;',
].join('\r\n');

/** Settings with the plant's database set up (no one signed in), as whoever installs the device types it. */
const shopSetUp = async (page: Page) => {
  await page.evaluate(() =>
    localStorage.setItem(
      'casefront.shop',
      JSON.stringify({ address: '/db/', database: 'kestrel-ridge-haerterei-halle-3-schichtbuch' }),
    ),
  );
  await page.reload();
  await page.waitForSelector('#shop-name');
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
  { name: 'log-job-traverse', route: `log/job/${TRAVERSED_JOB_ID}` },
  { name: 'log-job-traverse-lab', route: `log/job/${TRAVERSED_JOB_ID}`, act: labForm() },
  {
    name: 'log-job-paste',
    route: `log/job/${TRAVERSED_JOB_ID}`,
    act: labForm(async (page) => {
      await clickFirst('.traverse-actions button[aria-expanded="false"]')(page);
      await page.fill('#lab-paste-text', TESTER_FILE);
      await page.waitForSelector('.paste-preview');
    }),
  },
  {
    name: 'log-job-unit-refused',
    route: `log/job/${TRAVERSED_JOB_ID}`,
    // Readings in HV taken for HRC: refused with what they likely are.
    act: labForm(clickFirst('label.segment:has(input[name="lab-traverse-unit"][value="HRC"])')),
  },
  // The same load changed on another device: the values to pick from.
  {
    name: 'log-job-choices',
    route: `log/job/${CONFLICTED_JOB_ID}`,
    act: async (page) => {
      await page.waitForSelector('.open-choices');
    },
  },
  { name: 'log-filter', route: 'log', act: clickFirst('.log-filter summary') },
  { name: 'log-summary', route: 'log/summary' },
  { name: 'log-calibration', route: 'log/calibration' },
  { name: 'log-files', route: 'log/files' },
  { name: 'log-files-demo', route: 'log/files', act: clickFirst('section[aria-labelledby="files-demo"] .button') },
  { name: 'convert', route: 'convert' },
  { name: 'settings', route: 'settings' },
  { name: 'safety', route: 'safety' },
  // Last: with a server set up the log starts asking for it.
  { name: 'settings-shop', route: 'settings', act: shopSetUp },
  {
    name: 'settings-shop-refused',
    route: 'settings',
    act: async (page) => {
      await page.fill('#shop-name', 'schichtfuehrer-halle-3-frueh');
      await page.fill('#shop-password', 'not-the-password');
      await page.click('form.shop-sign-in button[type="submit"]');
      await page.waitForSelector('section.shop-server .error-note');
    },
  },
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
      `sweep: ${totals.screens} screens and views checked (${states.length} states × ${themes.length} themes in each language), ${totals.elements} elements`,
    );
  });

  const states = STATES.filter((state) => !onlyStates || onlyStates.includes(state.name));
  const themes = chosen(THEMES, onlyThemes);
  for (const [language, locale] of LANGUAGES.filter(([l]) => chosen(['en', 'es', 'de'], onlyLanguages).includes(l))) {
    it(`${language}, ${themes.join(', ')}: no overflow, clipping, wrong decimal mark, long float or raw key on any screen`, async () => {
      mkdirSync('test-results/sweep', { recursive: true });
      const { context } = await phoneContext(browser, locale);
      // tsx names the sweep's inner functions with a helper the page does not have.
      await context.addInitScript('window.__name = (f) => f;');
      const settings = { language, theme: themes[0], unitSystem: 'metric' };
      await context.addInitScript(
        ({ settings, cycle, plan, furnace, threshold }) => {
          if (localStorage.getItem('casefront.sweep') !== null) return; // seeded once; the app's writes stay
          localStorage.setItem('casefront.sweep', '1');
          localStorage.setItem('casefront.settings', JSON.stringify(settings));
          localStorage.setItem('casefront.form.cycle', JSON.stringify(cycle));
          localStorage.setItem('casefront.form.plan', JSON.stringify(plan));
          // A plan put its steps in the editor: the engineer's own can come back.
          localStorage.setItem('casefront.form.cycleReplaced', JSON.stringify({ form: cycle, active: true }));
          // The long-named furnace chosen, with its learnt threshold turned on.
          localStorage.setItem('casefront.furnace', JSON.stringify(furnace));
          localStorage.setItem('casefront.plantThresholds', JSON.stringify([threshold]));
        },
        {
          settings,
          cycle: longCycleForm(),
          plan: OUT_OF_REACH_PLAN,
          furnace: LONG_FURNACE,
          threshold: APPLIED_THRESHOLD,
        },
      );
      const page = await context.newPage();
      await page.goto(BASE_URL);
      await page.waitForSelector('main h1');
      const traversed = traversedJobs();
      const report = await importFile(page, backupText([...longLog(), ...traversed]));
      assert.match(report, /\d/u, 'the long log was imported');
      const other = otherDeviceCopy(traversed.find((job) => job.id === CONFLICTED_JOB_ID)!);
      assert.match(await importFile(page, backupText([other])), /\d/u, 'the other device’s file was read');
      const problems: string[] = [];
      const timing = process.env.CASEFRONT_SWEEP_TIMING === '1';
      for (const state of states) {
        const t0 = Date.now();
        const same = page.url() === `${BASE_URL}#/${state.route}`;
        await page.goto(`${BASE_URL}#/${state.route}`);
        // The same address again opens nothing anew: start the screen afresh.
        if (same) await page.reload();
        await page.waitForSelector('main h1');
        await page.waitForLoadState('networkidle');
        if (state.act) await state.act(page);
        await settled(page);
        const t1 = Date.now();
        // A theme sets colours only (base.css: custom properties under :root[data-theme]), so the screen
        // is shown once and checked under each theme's style, switched as the app switches it.
        for (const theme of themes) {
          await page.evaluate((name) => (document.documentElement.dataset.theme = name), theme);
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
        await page.evaluate((name) => (document.documentElement.dataset.theme = name), themes[0]);
        if (timing) console.log(`${language} ${state.name}: ${t1 - t0} ms to show, ${Date.now() - t1} ms to check`);
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
});
