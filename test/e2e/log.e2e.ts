/**
 * The job log in Chromium: saved from the depth screen and still there offline after reloads,
 * edited, with a lab result; two tabs saving at once; backup out, wipe, backup in, identical;
 * an imported note that is markup stays text; axe, touch targets and screenshots of the views.
 */
import assert from 'node:assert/strict';
import { mkdirSync, readFileSync } from 'node:fs';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { shiftOf } from '../../src/jobs/shift';
import { runAxe } from './axe';
import {
  BASE_URL,
  closeBrowser,
  cspViolations,
  foreignRequests,
  launch,
  openScreen,
  phoneContext,
  smallTargets,
  waitUntilOfflineReady,
} from './browser';
import { backupText, demoLog, importFile, importReport, movedTo, storedRecords, wipeLog } from './logData';

const { version } = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

/** Fills the "save to log" form of the screen shown and saves; returns the new job's id. */
async function saveToLog(page: Page, workOrder: string, furnace = 'F1', operator = 'mk'): Promise<string> {
  await page.click('#log-save button');
  await page.waitForSelector('#log-save-title');
  await page.fill('#log-save-work-order', workOrder);
  await page.fill('#log-save-part', 'KR-2231');
  await page.fill('#log-save-furnace', furnace);
  await page.fill('#log-save-operator', operator);
  await page.fill('#log-save-notes', 'Coupon in basket 3.');
  await page.click('form.log-form button[type=submit]');
  const link = page.locator('.log-saved a');
  await link.waitFor();
  return ((await link.getAttribute('href')) ?? '').split('/').pop()!;
}

const mainText = async (page: Page) => (await page.textContent('main')) ?? '';

describe('job log', () => {
  it('a load saved from the depth screen survives reloads and airplane mode; edited, with a lab result, it is all there', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    await openScreen(page, 'depth');
    await waitUntilOfflineReady(page);
    const predicted = await page.textContent('.answer-value');
    const id = await saveToLog(page, 'WO-E2E-1');
    assert.match((await page.textContent('.log-saved')) ?? '', /^Saved to the log: Shift [ABC], /);

    await page.reload();
    await context.setOffline(true);
    await page.reload();
    await page.click('a[href="#/log"]');
    const card = page.locator(`a.job-card[data-job="${id}"]`);
    await card.waitFor();
    assert.match((await card.textContent()) ?? '', /WO-E2E-1.*Planned.*KR-2231 · F1 · MK/u);
    await card.click();
    await page.waitForSelector('text=Job WO-E2E-1');

    await page.click('button:has-text("Edit")');
    await page.fill('#job-edit-notes', 'Coupon in basket 3.\nLoad 20 min late.');
    // The quick picks offer what this device's log holds: the furnace just logged.
    await page.waitForSelector('.field:has(#job-edit-furnace) .quick-pick:has-text("F1")');
    await page.fill('#job-edit-furnace', 'F2');
    await page.click('button:has-text("Save changes")');
    await page.waitForSelector('.log-saved:has-text("Changes saved.")');
    await page.locator('label.segment', { hasText: 'In furnace' }).click();
    await page.waitForSelector('.log-saved:has-text("Status set to In furnace.")');
    await page.click('button:has-text("Record lab result")');
    await page.fill('#lab-ecd', '0,86');
    await page.fill('#lab-surface-hardness', '61');
    await page.fill('#lab-core-hardness', '360');
    await page.fill('#lab-by', 'QL');
    await page.click('button:has-text("Save lab result")');
    await page.waitForSelector('.log-saved:has-text("Lab result saved.")');

    // An upset worked out on the recovery screen goes into the notes of this open job.
    await page.click('a[href="#/recovery"]');
    await page.click('#log-note button');
    await page.waitForSelector('#log-note-job');
    assert.equal(await page.inputValue('#log-note-job'), id);
    await page.click('form.log-form button[type=submit]');
    await page.waitForSelector('.log-saved:has-text("Added to the notes of WO-E2E-1")');

    await page.goto(`${BASE_URL}#/log/job/${id}`);
    await page.reload();
    await page.waitForSelector('text=Job WO-E2E-1');
    const text = await mainText(page);
    for (const expected of [
      'In furnace · KR-2231 · F2',
      'Load 20 min late.\nUpset: 0 h 40 min on the clock counted as',
      'Measured ECD0.86 mm',
      'Surface hardness61.0 HRC',
      'Core hardness360 HV',
      'Measured byQL',
      `Predicted ECD${predicted}`,
      `Casefront ${version}`,
    ]) {
      assert.ok(
        text.replace(/\u202f/gu, ' ').includes(expected.replace(/\u202f/gu, ' ')),
        `job page shows "${expected}"`,
      );
    }
    assert.match(
      text,
      /Predicted − measured[−+]?\d\.\d\d\smm[−+]?\d+\.\d\s%Measured ECD in the predicted range(Inside|Outside)/u,
    );

    const [record] = await storedRecords(page);
    assert.ok(record);
    const created = new Date(String(record.createdAt));
    assert.deepEqual({ shift: record.shift, shiftDate: record.shiftDate }, shiftOf(created));
    assert.equal((record.inputs as { kind: string }).kind, 'depth');
    const prediction = record.prediction as {
      appVersion: string;
      ecdBandMm?: { minMm: number; maxMm: number };
      model: string;
    };
    assert.equal(prediction.appVersion, version);
    assert.ok(prediction.ecdBandMm && prediction.ecdBandMm.minMm < prediction.ecdBandMm.maxMm);
    const { measuredAt, ...lab } = record.lab as { measuredAt: string };
    assert.deepEqual(lab, {
      ecdMm: 0.86,
      surfaceHardness: { value: 61, unit: 'HRC' },
      coreHardness: { value: 360, unit: 'HV' },
      by: 'QL',
    });
    assert.match(measuredAt, /^\d{4}-\d{2}-\d{2}$/u);
    assert.ok(
      ['granted', 'denied', 'unsupported'].includes(
        (await page.getAttribute('.log-persistence', 'data-persistence')) ?? '',
      ),
    );
    assert.deepEqual(foreignRequests(recorder), []);
    assert.deepEqual(
      recorder.problems.filter((p) => !p.includes('ERR_INTERNET_DISCONNECTED')),
      [],
    );
    await context.close();
  });

  it('a fresh install offers no demo part or furnace; demo data comes only from the files view, confirmed', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    const demoNames = /\bKR-\d{4}\b|\bF[1-3]\b/u;
    await openScreen(page, 'depth');
    await page.click('#log-save button');
    await page.waitForSelector('#log-save-title');
    assert.equal(await page.locator('.quick-pick').count(), 0, 'an empty log has no quick picks');
    assert.doesNotMatch(await mainText(page), demoNames);
    await page.fill('#log-save-work-order', 'WO-OWN-1');
    await page.fill('#log-save-part', 'P-100');
    await page.fill('#log-save-furnace', 'Pit 2');
    await page.fill('#log-save-operator', 'MK');
    await page.click('form.log-form button[type=submit]');
    await page.locator('.log-saved a').waitFor();
    for (const view of ['log', 'log/summary', 'log/calibration', 'log/files']) {
      await page.goto(`${BASE_URL}#/${view}`);
      await page.waitForFunction(() => !document.querySelector('.screen-loading') && document.querySelector('main h1'));
      await page.waitForTimeout(200); // the view's read of the log
      assert.doesNotMatch(await mainText(page), demoNames, `#/${view} names nothing of the demo plant`);
    }
    assert.equal(await page.locator('#log-furnace option', { hasText: /^F[1-3]$/u }).count(), 0);

    // The one way in: load, confirm (cancel first changes nothing).
    await page.click('button:has-text("Load demo data")');
    await page.click('section:has(#files-demo) button:has-text("Cancel")');
    assert.equal((await storedRecords(page)).length, 1);
    await page.click('button:has-text("Load demo data")');
    await page.click('button:has-text("Yes, add the demo jobs")');
    await page.waitForSelector('section:has(#files-demo) .log-saved:has-text("200 demo jobs are in the log.")');
    assert.equal((await storedRecords(page)).length, 201);

    // Quick picks come from this device's log, now demo jobs included.
    await openScreen(page, 'depth');
    await page.click('#log-save button');
    await page.waitForSelector('#log-save-title');
    await page.waitForSelector('.field:has(#log-save-furnace) .quick-pick:has-text("Pit 2")');
    assert.ok(await page.locator('.field:has(#log-save-part) .quick-pick', { hasText: /^KR-\d{4}$/u }).count());
    assert.deepEqual(foreignRequests(recorder), []);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('two tabs saving at the same moment, then editing one job at once, lose nothing', async () => {
    const { context, recorder } = await phoneContext(browser);
    const [tab1, tab2] = [await context.newPage(), await context.newPage()];
    await openScreen(tab1, 'depth');
    await openScreen(tab2, 'cycle');
    await tab2.waitForSelector('.profile-chart canvas');
    for (const [tab, workOrder] of [
      [tab1, 'WO-TAB-1'],
      [tab2, 'WO-TAB-2'],
    ] as const) {
      await tab.click('#log-save button');
      await tab.waitForSelector('#log-save-title');
      await tab.fill('#log-save-work-order', workOrder);
      await tab.fill('#log-save-part', 'KR-4410');
      await tab.fill('#log-save-furnace', 'F2');
      await tab.fill('#log-save-operator', 'JR');
    }
    // Both submitted in the same moment (a click in the tab behind would wait for its throttled frames).
    const submit = (tab: Page) => tab.$eval('form.log-form', (form) => (form as HTMLFormElement).requestSubmit());
    await Promise.all([submit(tab1), submit(tab2)]);
    await Promise.all([tab1.waitForSelector('.log-saved'), tab2.waitForSelector('.log-saved')]);
    const records = await storedRecords(tab1);
    assert.deepEqual(records.map((r) => r.workOrder).sort(), ['WO-TAB-1', 'WO-TAB-2']);
    assert.deepEqual(records.map((r) => (r.inputs as { kind: string }).kind).sort(), ['cycle', 'depth']);

    // Both tabs' lists show both jobs (the other tab's save arrives without a reload).
    for (const tab of [tab1, tab2]) {
      await tab.bringToFront();
      await tab.click('a[href="#/log"]');
      await tab.waitForFunction(() => document.querySelectorAll('a.job-card').length === 2, undefined, {
        polling: 100,
      });
    }
    const id = String(records[0]!.id);
    for (const tab of [tab1, tab2]) {
      await tab.goto(`${BASE_URL}#/log/job/${id}`);
      await tab.waitForSelector('button:has-text("Record lab result")');
    }
    await tab2.click('button:has-text("Record lab result")');
    await tab2.fill('#lab-ecd', '1,31');
    await Promise.all([
      tab1.$eval('input[name="job-status"][value="done"]', (radio) => (radio as HTMLInputElement).click()),
      submit(tab2),
    ]);
    await tab1.waitForSelector('.log-saved');
    await tab2.waitForSelector('.log-saved');
    const edited = (await storedRecords(tab1)).find((r) => r.id === id);
    assert.equal(edited?.status, 'done');
    assert.equal((edited.lab as { ecdMm: number }).ecdMm, 1.31);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('backup out, log wiped, backup in: every record identical; CSV downloads too; a bad file changes nothing', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    await openScreen(page, 'log');
    assert.equal(await importFile(page, backupText(demoLog(40, 5))), importReport(40, 0, 0));
    const before = await storedRecords(page);
    assert.equal(before.length, 40);

    const [backup] = await Promise.all([
      page.waitForEvent('download'),
      page.click('button:has-text("Download backup (JSON)")'),
    ]);
    assert.match(backup.suggestedFilename(), /^casefront-job-log-\d{4}-\d{2}-\d{2}\.json$/u);
    const backupJson = readFileSync(await backup.path(), 'utf8');
    assert.equal((JSON.parse(backupJson) as { jobs: unknown[] }).jobs.length, 40);
    const [csv] = await Promise.all([
      page.waitForEvent('download'),
      page.click('button:has-text("Download for spreadsheets (CSV)")'),
    ]);
    const csvText = readFileSync(await csv.path(), 'utf8');
    assert.ok(csvText.startsWith('\uFEFFid,created_at,updated_at,shift_date,shift,operator,furnace'));
    assert.equal(csvText.trim().split('\r\n').length, 41);
    assert.match(await mainText(page), /40 jobs written to casefront-job-log-[\d-]+\.csv\./u);

    await wipeLog(page);
    await page.reload();
    await page.waitForSelector('#files-import-input');
    assert.deepEqual(await storedRecords(page), []);
    assert.equal(await importFile(page, backupJson), importReport(40, 0, 0));
    assert.deepEqual(await storedRecords(page), before);
    assert.equal(await importFile(page, backupJson), importReport(0, 0, 40));

    const broken = JSON.parse(backupJson) as { jobs: Record<string, unknown>[] };
    broken.jobs[3]!.operator = 'M1';
    broken.jobs[0]!.notes = 'changed';
    const message = await importFile(page, JSON.stringify(broken));
    assert.match(
      message,
      /^Nothing was imported: the file has a problem\. jobs\[3\]\.operator: not in the expected format\. Write initials of 1 to 4 letters \(MK\) or a badge number of up to 8 digits\.$/u,
    );
    assert.match(await importFile(page, 'not json at all'), /not JSON/u);
    assert.deepEqual(await storedRecords(page), before);
    assert.deepEqual(await cspViolations(page), []);
    assert.deepEqual(foreignRequests(recorder), []);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('at 22:40 the loads shift B left in the furnace head shift C’s list and summary', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    // Shift C (22–06, the default hours) of 3 March has just begun, in the browser's own time.
    await page.clock.setFixedTime(new Date(2026, 2, 3, 22, 40));
    await openScreen(page, 'log');
    const [inB1, inB2, doneB] = demoLog(3, 0).map((job, i) =>
      movedTo(
        { ...job, status: i < 2 ? 'inFurnace' : 'done', workOrder: `WO-HAND-${String(i + 1)}` },
        new Date(2026, 2, 3, 15 + i, 0).getTime(),
      ),
    );
    assert.match(await importFile(page, backupText([inB1!, inB2!, doneB!])), /3/);

    await page.goto(`${BASE_URL}#/log`);
    const carried = page.locator('section.carried-over .job-card-title');
    await carried.first().waitFor();
    assert.deepEqual(await carried.allTextContents(), ['WO-HAND-1', 'WO-HAND-2']);
    assert.match((await page.textContent('.log-count')) ?? '', /^0 jobs/);

    await page.goto(`${BASE_URL}#/log/summary`);
    await page.locator('section.carried-over').waitFor();
    const openTile = page.locator('.tile', { hasText: 'open' }).locator('.tile-value');
    assert.equal(await openTile.textContent(), '2');
    assert.doesNotMatch(await mainText(page), /Nothing open/);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('a full device: saving and importing are refused in plain words, nothing is stored, nothing typed is lost', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    await openScreen(page, 'depth');
    await page.evaluate(() => navigator.serviceWorker.ready);
    // Chromium's own quota override: the origin may store barely more than it already does.
    // (Chromium applies it when the database is opened, so it is set before the log is first used.)
    const cdp = await context.newCDPSession(page);
    const origin = new URL(BASE_URL).origin;
    const { usage } = await page.evaluate(() => navigator.storage.estimate());
    await cdp.send('Storage.overrideQuotaForOrigin', { origin, quotaSize: (usage ?? 0) + 2000 });
    const full =
      'The device storage is full. Nothing was saved. Free some space or export and remove old jobs, then try again.';

    await page.click('#log-save button');
    await page.fill('#log-save-work-order', 'WO-FULL-1');
    await page.fill('#log-save-part', 'KR-0907');
    await page.fill('#log-save-furnace', 'F3');
    await page.fill('#log-save-operator', 'LS');
    await page.click('form.log-form button[type=submit]');
    await page.waitForSelector('form.log-form .error-note');
    assert.equal(await page.textContent('form.log-form .error-note'), full);
    assert.equal(await page.inputValue('#log-save-work-order'), 'WO-FULL-1');
    assert.deepEqual(await storedRecords(page), []);
    assert.equal(await importFile(page, backupText(demoLog(200, 0))), full);
    assert.deepEqual(await storedRecords(page), []);

    // Space again: the same form saves, with what was typed.
    await cdp.send('Storage.overrideQuotaForOrigin', { origin });
    await page.goto(`${BASE_URL}#/depth`);
    await page.click('#log-save button');
    assert.equal(await page.inputValue('#log-save-work-order'), 'WO-FULL-1');
    await page.click('form.log-form button[type=submit]');
    await page.waitForSelector('.log-saved');
    assert.deepEqual(
      (await storedRecords(page)).map((r) => r.workOrder),
      ['WO-FULL-1'],
    );
    // PouchDB itself logs the failed transaction it reports; the app words it (checked above).
    assert.deepEqual(
      recorder.problems.filter((p) => !p.includes('Database has a global failure QuotaExceededError')),
      [],
    );
    await context.close();
  });

  it('an imported note written as markup is shown as text: no script runs, no request is made', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    const dialogs: string[] = [];
    page.on('dialog', (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    await openScreen(page, 'log');
    const [plain, second] = demoLog(2, 2);
    const note = '<img src=x onerror=alert(1)>';
    const hostile = [
      { ...plain!, notes: note, status: 'planned' as const },
      {
        ...second!,
        workOrder: '<img src=x onerror=window.__xss=1>',
        partNumber: '<b onmouseover=alert(2)>KR</b>',
        notes: '<script>window.__xss=2</script>',
        status: 'onHold' as const,
      },
    ];
    assert.match(await importFile(page, backupText(hostile)), /2 added/u);
    const requestsBefore = recorder.requests.length;
    for (const route of ['#/log', `#/log/job/${hostile[0]!.id}`, `#/log/job/${hostile[1]!.id}`, '#/log/summary']) {
      await page.goto(`${BASE_URL}${route}`);
      await page.waitForSelector('main h1');
      await page.waitForFunction(() => !document.querySelector('.screen-loading'));
      await page.hover('main').catch(() => undefined);
    }
    await page.goto(`${BASE_URL}#/log/job/${hostile[0]!.id}`);
    await page.waitForSelector('.job-notes');
    // Nothing ran and nothing was fetched (an <img src=x> made from the note would request /x).
    const later = recorder.requests.slice(requestsBefore);
    assert.deepEqual(
      later.filter((u) => u.endsWith('/x') || !u.startsWith(new URL(BASE_URL).origin)),
      [],
    );
    assert.deepEqual(dialogs, []);
    assert.equal(await page.evaluate(() => (window as unknown as { __xss?: unknown }).__xss), undefined);
    assert.equal(await page.locator('main img, main script, main b').count(), 0);
    // The text is shown exactly as written.
    assert.equal(await page.textContent('.job-notes-text'), note);
    await page.goto(`${BASE_URL}#/log/job/${hostile[1]!.id}`);
    await page.waitForSelector('.job-notes-text');
    assert.equal(await page.textContent('main h1'), 'Job <img src=x onerror=window.__xss=1>');
    assert.equal(await page.textContent('.job-notes-text'), '<script>window.__xss=2</script>');
    assert.equal(await page.locator('main img, main script, main b').count(), 0);
    assert.deepEqual(await cspViolations(page), []);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });
});

describe('job log views: accessibility, touch targets, screenshots', () => {
  for (const [language, locale, theme] of [
    ['en', 'en-US', 'dark'],
    ['es', 'es-ES', 'dark'],
    ['en', 'en-US', 'light'],
    ['en', 'en-US', 'contrast'],
  ] as const) {
    const shots = theme === 'dark';
    it(`list, filter, job, lab form, summary, calibration, files and the save form in ${language}, ${theme}: axe, 48 px targets, no overflow${shots ? ', screenshots' : ''}`, async () => {
      mkdirSync('test-results', { recursive: true });
      const { context, recorder } = await phoneContext(browser, locale);
      const page = await context.newPage();
      await page.addInitScript(
        (th) => localStorage.setItem('casefront.settings', JSON.stringify({ theme: th })),
        theme,
      );
      await openScreen(page, 'log');
      const jobs = demoLog(60, 6, 3);
      await importFile(page, backupText(jobs));
      const measured = jobs
        .filter((j) => j.lab?.ecdMm !== undefined)
        .sort((a, b) => (a.createdAt < b.createdAt ? 1 : -1))[0]!;
      const lines: string[] = [];
      const check = async (name: string, fullPage = false) => {
        assert.equal(await page.evaluate(() => document.documentElement.lang), language);
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        assert.ok(overflow <= 0, `${language} ${name}: ${overflow} px wider than the screen`);
        assert.deepEqual(
          await smallTargets(page, '.job-card, .view-tabs a, .back-link, .disclosure > summary, .quick-pick'),
          [],
          `${language} ${name}: small targets`,
        );
        const { violations } = await runAxe(page);
        lines.push(
          `${name}: ${violations.length}${violations.length ? ` [${violations.map((v) => `${v.id}/${v.impact}`).join(', ')}]` : ''}`,
        );
        assert.deepEqual(
          violations.filter((v) => v.impact === 'serious' || v.impact === 'critical'),
          [],
          `${language} ${theme} ${name}`,
        );
        if (shots) await page.screenshot({ path: `test-results/${language}-log-${name}.png`, fullPage });
      };
      await page.goto(`${BASE_URL}#/log`);
      await page.waitForSelector('a.job-card');
      await check('list');
      await page.click('.disclosure > summary');
      await check('filter', true);
      await page.goto(`${BASE_URL}#/log/job/${measured.id}`);
      await page.waitForSelector('.job-notes');
      await check('job', true);
      await page.click('section[aria-labelledby="job-lab"] button');
      await page.waitForSelector('#lab-ecd');
      await check('lab', true);
      await page.goto(`${BASE_URL}#/log/summary`);
      await page.waitForSelector('table.pairs');
      await check('summary', true);
      await page.goto(`${BASE_URL}#/log/calibration`);
      await page.waitForSelector('.calibration-card');
      await check('calibration', true);
      await page.goto(`${BASE_URL}#/log/files`);
      await page.waitForSelector('#files-import-input');
      await check('files');
      await page.goto(`${BASE_URL}#/depth`);
      await page.click('#log-save button');
      await page.waitForSelector('#log-save-title');
      // The form's fields in view, below the sticky answer.
      await page.evaluate(() =>
        window.scrollTo(
          0,
          document.querySelector('#log-save-title')!.getBoundingClientRect().top + window.scrollY - 150,
        ),
      );
      await check('save');
      console.log(`axe ${language} ${theme}: ${lines.join('; ')}`);
      assert.deepEqual(foreignRequests(recorder), []);
      assert.deepEqual(recorder.problems, []);
      await context.close();
    });
  }
});
