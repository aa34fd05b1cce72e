/**
 * The lab's traverse on a phone, in Chromium: points typed with Enter (depth suggested from the
 * last step, decimal comma), the ECD at the limit read back; the tester's file pasted, previewed
 * and used only when asked; a hardness implausible for its unit refused with the likely meaning;
 * saved, reloaded, and drawn over the job's prediction. Screenshots at 390 px in Spanish and German.
 */
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import type { Job } from '../../src/jobs/schema';
import { DEFAULT_SHIFT_CONFIG, shiftOf } from '../../src/jobs/shift';
import { caseDepth } from '../../src/physics';
import { runAxe } from './axe';
import { BASE_URL, closeBrowser, cspViolations, launch, phoneContext, smallTargets } from './browser';
import { backupText, importFile, storedRecords } from './logData';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

const JOB_ID = '6f0c2a1e-3b4d-4c5e-8f6a-7b8c9d0e1f30';

/** One pinion load (demo scenario) predicted by the depth calculator, not yet measured. */
function pinionLoad(now = new Date()): Job {
  const request = {
    temperatureC: 925,
    timeH: 6,
    carbonPotentialPct: 0.9,
    coreCarbonPct: 0.2,
    thresholdCarbonPct: 0.4,
    model: 'agren' as const,
  };
  const predicted = caseDepth(request);
  if (!predicted.ok) throw new Error('demo request rejected');
  const created = new Date(now.getTime() - 6 * 3.6e6);
  return {
    id: JOB_ID,
    createdAt: created.toISOString(),
    updatedAt: created.toISOString(),
    ...shiftOf(created, DEFAULT_SHIFT_CONFIG),
    operator: 'MK',
    furnace: 'F1',
    workOrder: 'WO-024130',
    partNumber: 'KR-2231',
    steel: { gradeId: 'sae-8620', gradeName: 'SAE 8620', coreCarbonPct: 0.2 },
    inputs: { kind: 'depth', ...request },
    prediction: {
      effectiveCaseDepthMm: predicted.value.effectiveCaseDepthMm,
      totalCaseDepthMm: predicted.value.totalCaseDepthMm,
      surfaceCarbonPct: predicted.value.surfaceCarbonPct,
      model: 'agren',
      timeH: 6,
      temperatureC: 925,
      appVersion: '0.1.0',
    },
    status: 'done',
    notes: '',
  };
}

/** A traverse in HV1 every 0.1 mm: crosses 550 HV between 0.8 mm (562) and 0.9 mm (538), so the ECD is 0.85 mm. */
const READINGS = [705, 690, 672, 650, 628, 604, 583, 562, 538, 515, 488, 460, 432, 410, 392, 378, 366, 360, 356, 354];

/** Waits until the input with this id has the focus (the app moves it after Enter). */
const focused = (page: Page, id: string) =>
  page.waitForFunction((want) => document.activeElement?.id === want, id, { polling: 50 });

async function openLabForm(page: Page, language: string) {
  await page.addInitScript((lang) => {
    localStorage.setItem('casefront.settings', JSON.stringify({ language: lang }));
  }, language);
  await page.goto(BASE_URL);
  await page.waitForSelector('main h1');
  await importFile(page, backupText([pinionLoad()]));
  await page.goto(`${BASE_URL}#/log/job/${JOB_ID}`);
  await page.click('section[aria-labelledby="job-lab"] .button-primary');
  await page.waitForSelector('#lab-add-point');
}

/** The same traverse as the tester's export: a header naming units, `;` between columns, decimal commas, a summary line. */
const TESTER_FILE = [
  'Nr.;Abstand [mm];Härte HV1',
  ...READINGS.map((hv, i) => `${i + 1};${String((i + 1) / 10).replace('.', ',')};${hv}`),
  'CHD;0,85;',
].join('\r\n');

async function typeTraverse(page: Page) {
  await page.click('#lab-add-point');
  await focused(page, 'lab-point-0-hardness');
  assert.equal(await page.inputValue('#lab-point-0-depth'), '0,05', 'the first depth offered: 0.05 mm');
  await page.fill('#lab-point-0-depth', '0,1');
  await page.fill('#lab-point-0-hardness', String(READINGS[0]));
  await page.press('#lab-point-0-hardness', 'Enter');
  await focused(page, 'lab-point-1-hardness');
  await page.fill('#lab-point-1-depth', '0,2');
  await page.fill('#lab-point-1-hardness', String(READINGS[1]));
  for (let i = 2; i < READINGS.length; i++) {
    await page.keyboard.press('Enter');
    await focused(page, `lab-point-${i}-hardness`);
    await page.keyboard.type(String(READINGS[i]));
  }
}

/** A result's value with the narrow space between number and unit read as a plain space. */
const resultValue = async (page: Page, key: string) =>
  ((await page.locator(`[data-result="${key}"] .result-value`).first().textContent()) ?? '').replace(/\u202f/gu, ' ');

async function expectNoAxeProblems(page: Page, what: string): Promise<void> {
  const { violations } = await runAxe(page);
  assert.deepEqual(
    violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id),
    [],
    what,
  );
}

const noOverflow = async (page: Page) =>
  assert.ok(
    (await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)) <= 0,
    'no horizontal overflow',
  );

describe('the lab’s traverse', () => {
  for (const [language, locale, ecdText, refusal] of [
    ['es', 'es-ES', '0,85 mm', /705 HRC.*¿Quería decir 705 HV\?/u],
    ['de', 'de-DE', '0,85 mm', /705 HRC.*Ist 705 HV gemeint\?/u],
  ] as const) {
    it(`typed point by point with Enter at 390 px (${language}): depths suggested, the ECD at 550 HV, a wrong unit refused, saved with the job and drawn over the prediction`, async () => {
      mkdirSync('test-results', { recursive: true });
      const { context, recorder } = await phoneContext(browser, locale);
      const page = await context.newPage();
      await openLabForm(page, language);
      await typeTraverse(page);
      // Each new point's depth was the last plus the last step: 0.3 mm, 0.4 mm … 2.0 mm.
      assert.equal(await page.inputValue('#lab-point-2-depth'), '0,3');
      assert.equal(await page.inputValue('#lab-point-19-depth'), '2');
      assert.equal(await resultValue(page, 'traverseEcd'), ecdText);
      assert.match(await resultValue(page, 'traverseCore'), /^35\d HV$/u);
      await page.waitForSelector('.traverse-figures canvas');
      await page.screenshot({ path: `test-results/${language}-lab-traverse.png`, fullPage: true });
      await page.locator('.traverse-figures').screenshot({ path: `test-results/${language}-lab-chart.png` });
      await expectNoAxeProblems(page, `${language} lab form with a traverse`);
      assert.deepEqual(await smallTargets(page), []);
      await noOverflow(page);

      // The same numbers under HRC are refused at the first point, with the likely meaning.
      await page.click('label.segment:has(input[name="lab-traverse-unit"][value="HRC"])');
      const error = page.locator('[data-point="1"] .field-error');
      await error.waitFor();
      assert.match((await error.textContent()) ?? '', refusal);
      assert.equal(await page.locator('[data-result="traverseEcd"]').count(), 0, 'no ECD from a refused traverse');
      await page.screenshot({ path: `test-results/${language}-lab-unit-refused.png` });
      await page.click('label.segment:has(input[name="lab-traverse-unit"][value="HV"])');
      await error.waitFor({ state: 'detached' });

      await page.click('form.log-form button[type="submit"]');
      await page.waitForSelector('section[aria-labelledby="job-lab"] [data-result="ecd"]');
      const stored = (await storedRecords(page)).find((r) => r.id === JOB_ID) as Job | undefined;
      const lab = stored?.lab;
      assert.ok(lab?.traverse, 'the traverse is stored with the job');
      assert.equal(lab.traverse.points.length, READINGS.length);
      assert.deepEqual(lab.traverse.limit, { value: 550, unit: 'HV' });
      assert.equal(lab.ecdMm, undefined, 'the ECD is the traverse’s, not stored again');
      await page.reload();
      await page.waitForSelector('section[aria-labelledby="job-lab"] .traverse-figures canvas');
      assert.equal(await resultValue(page, 'ecd'), ecdText);
      await page.screenshot({ path: `test-results/${language}-log-job-traverse.png`, fullPage: true });
      await page
        .locator('section[aria-labelledby="job-lab"]')
        .screenshot({ path: `test-results/${language}-log-job-lab.png` });
      await expectNoAxeProblems(page, `${language} job page with a traverse`);
      await noOverflow(page);
      assert.deepEqual(await cspViolations(page), []);
      assert.deepEqual(recorder.problems, []);
      await context.close();
    });
  }

  it('the tester’s file pasted: a preview with the units the file names, nothing stored until saved, the lines left out named', async () => {
    const { context, recorder } = await phoneContext(browser, 'de-DE');
    const page = await context.newPage();
    await openLabForm(page, 'de');
    await page.click('button[aria-expanded="false"]:has-text("einfügen")');
    await page.fill('#lab-paste-text', TESTER_FILE);
    await page.waitForSelector('.paste-preview');
    assert.equal(await page.textContent('.paste-preview h5'), `Vorschau: ${READINGS.length} Messpunkte`);
    assert.match((await page.textContent('[data-paste-unit="depth"]')) ?? '', /Abstand in mm \(laut Datei\)/u);
    assert.match((await page.textContent('[data-paste-unit="hardness"]')) ?? '', /Härte in HV \(laut Datei\)/u);
    assert.equal(await page.locator('.paste-table tbody tr').count(), READINGS.length);
    assert.match((await page.textContent('.paste-skipped')) ?? '', /Zeile 22: kein Wert für Härte/u);
    await page.locator('.paste-panel').screenshot({ path: 'test-results/de-lab-paste-preview.png' });
    assert.equal(await page.locator('#lab-point-0-depth').count(), 0, 'nothing used before asked');
    const before = (await storedRecords(page)).find((r) => r.id === JOB_ID) as Job | undefined;
    assert.equal(before?.lab, undefined);

    await page.click('.paste-panel .button-primary');
    await page.waitForSelector('#lab-point-19-hardness');
    assert.equal(await resultValue(page, 'traverseEcd'), '0,85 mm');
    const notYet = (await storedRecords(page)).find((r) => r.id === JOB_ID) as Job | undefined;
    assert.equal(notYet?.lab, undefined, 'nothing stored until the lab result is saved');
    // Typed points survive a reload: the form opens again as it was.
    await page.reload();
    await page.waitForSelector('#lab-point-19-hardness');
    assert.equal(await page.inputValue('#lab-point-19-hardness'), '354');
    await page.click('form.log-form button[type="submit"]');
    await page.waitForSelector('section[aria-labelledby="job-lab"] [data-result="ecd"]');
    const saved = (await storedRecords(page)).find((r) => r.id === JOB_ID) as Job | undefined;
    assert.equal(saved?.lab?.traverse?.points[19]?.depthMm, 2);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('a core hardness typed as 35 under HV is refused with “did you mean 35 HRC?”, and nothing is saved', async () => {
    const { context, recorder } = await phoneContext(browser, 'en-US');
    const page = await context.newPage();
    await openLabForm(page, 'en');
    await page.fill('#lab-ecd', '0.84');
    await page.fill('#lab-core-hardness', '35');
    const error = page.locator('#lab-core-hardness-error');
    await error.waitFor();
    assert.equal(await error.textContent(), '35 HV is outside 80–940 HV. Did you mean 35 HRC?');
    await page.click('form.log-form button[type="submit"]');
    assert.equal(await page.locator('form.log-form').count(), 1, 'the form stays open with what was typed');
    const stored = (await storedRecords(page)).find((r) => r.id === JOB_ID) as Job | undefined;
    assert.equal(stored?.lab, undefined);
    await page.click('label.segment:has(input[name="lab-core-unit"][value="HRC"])');
    await error.waitFor({ state: 'detached' });
    await page.click('form.log-form button[type="submit"]');
    await page.waitForSelector('section[aria-labelledby="job-lab"] [data-result="coreHardness"]');
    assert.equal(await resultValue(page, 'coreHardness'), '35.0 HRC');
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });
});
