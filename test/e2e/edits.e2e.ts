/**
 * Edits that used to lose data without a word, each reproduced as a person would: an edit form
 * left open while another tab changes the job's notes, a status tapped above an open edit form,
 * and half-typed edits and lab results across an update reload. Each failed before edits named the
 * revision they started from and drafts were kept per tab.
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, closeBrowser, launch, openScreen, phoneContext } from './browser';
import { backupText, demoLog, importFile, storedRecords } from './logData';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

/** A log of 20 demo jobs; returns the id of the newest open one, whose page is then shown. */
async function openJob(page: Page): Promise<{ id: string; notes: string }> {
  await openScreen(page, 'log');
  const jobs = demoLog(20, 3);
  await importFile(page, backupText(jobs));
  const job = [...jobs].sort((a, b) => (a.createdAt < b.createdAt ? 1 : -1))[0]!;
  await page.goto(`${BASE_URL}#/log/job/${job.id}`);
  await page.waitForSelector('button:has-text("Edit")');
  return { id: job.id, notes: job.notes };
}

const stored = async (page: Page, id: string) => (await storedRecords(page)).find((r) => r.id === id)!;

describe('edits never write old values over newer ones, and half-typed entries survive a reload', () => {
  it('an edit form left open while another tab adds to the notes keeps that tab’s notes', async () => {
    const { context, recorder } = await phoneContext(browser);
    const tab1 = await context.newPage();
    const { id } = await openJob(tab1);
    await tab1.click('button:has-text("Edit")');
    await tab1.fill('#job-edit-furnace', 'F3');

    const tab2 = await context.newPage();
    await tab2.goto(`${BASE_URL}#/log/job/${id}`);
    await tab2.click('button:has-text("Edit")');
    await tab2.fill('#job-edit-notes', 'Coupon moved to basket 2.');
    await tab2.click('button:has-text("Save changes")');
    await tab2.waitForSelector('.log-saved:has-text("Changes saved.")');

    // Tab 1 sees the new note arrive on its page behind the form, then saves its own change.
    await tab1.bringToFront();
    await tab1.click('button:has-text("Save changes")');
    await tab1.waitForSelector('.log-saved:has-text("Changes saved.")');
    const record = await stored(tab1, id);
    assert.equal(record.furnace, 'F3');
    assert.equal(record.notes, 'Coupon moved to basket 2.');

    // The same field changed in both: the second save is refused in words, the typed text kept.
    await tab1.click('button:has-text("Edit")');
    await tab1.fill('#job-edit-notes', 'Typed in tab 1.');
    await tab2.bringToFront();
    await tab2.click('button:has-text("Edit")');
    await tab2.fill('#job-edit-notes', 'Typed in tab 2.');
    await tab2.click('button:has-text("Save changes")');
    await tab2.waitForSelector('.log-saved:has-text("Changes saved.")');
    await tab1.bringToFront();
    await tab1.click('button:has-text("Save changes")');
    await tab1.waitForSelector('form.log-form .error-note');
    assert.match(
      (await tab1.textContent('form.log-form .error-note')) ?? '',
      /changed while you were editing it.*Changed meanwhile: Notes\./u,
    );
    assert.equal(await tab1.inputValue('#job-edit-notes'), 'Typed in tab 1.');
    assert.equal((await stored(tab1, id)).notes, 'Typed in tab 2.');
    // Moving onto the current version keeps what tab 1 typed; saving then goes through.
    await tab1.click('button:has-text("Edit the current version, keeping my entries")');
    assert.equal(await tab1.inputValue('#job-edit-notes'), 'Typed in tab 1.');
    await tab1.click('button:has-text("Save changes")');
    // The earlier "Changes saved." may still be on the page: the form closing is what says this save went in.
    await tab1.waitForSelector('#job-edit-notes', { state: 'detached' });
    await tab1.waitForSelector('.log-saved:has-text("Changes saved.")');
    assert.equal((await stored(tab1, id)).notes, 'Typed in tab 1.');
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('a status tapped above an open edit form stays when the form is saved', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    const { id } = await openJob(page);
    const before = String((await stored(page, id)).status);
    const target = before === 'inFurnace' ? 'Done' : 'In furnace';
    await page.click('button:has-text("Edit")');
    await page.fill('#job-edit-work-order', 'WO-EDITED');
    await page.locator('label.segment', { hasText: target }).click();
    await page.waitForSelector(`.log-saved:has-text("Status set to ${target}.")`);
    await page.click('button:has-text("Save changes")');
    await page.waitForSelector('.log-saved:has-text("Changes saved.")');
    const record = await stored(page, id);
    assert.equal(record.workOrder, 'WO-EDITED');
    assert.equal(record.status, target === 'Done' ? 'done' : 'inFurnace');
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });

  it('a half-typed edit and a half-typed lab result come back after a reload (as an update does)', async () => {
    const { context, recorder } = await phoneContext(browser);
    const page = await context.newPage();
    const { id } = await openJob(page);
    await page.click('button:has-text("Edit")');
    await page.fill('#job-edit-notes', 'Half a sentence about the quench');
    await page.reload();
    await page.waitForSelector('#job-edit-notes');
    assert.equal(await page.inputValue('#job-edit-notes'), 'Half a sentence about the quench');
    await page.click('button:has-text("Save changes")');
    await page.waitForSelector('.log-saved:has-text("Changes saved.")');
    assert.equal((await stored(page, id)).notes, 'Half a sentence about the quench');

    await page.click('button:has-text("lab result")');
    await page.fill('#lab-ecd', '0.83');
    await page.fill('#lab-by', 'QL');
    await page.reload();
    await page.waitForSelector('#lab-ecd');
    assert.equal(await page.inputValue('#lab-ecd'), '0.83');
    assert.equal(await page.inputValue('#lab-by'), 'QL');
    // Another tab of the same browser does not inherit this tab's draft.
    const other = await context.newPage();
    await other.goto(`${BASE_URL}#/log/job/${id}`);
    await other.waitForSelector('button:has-text("Edit")');
    assert.equal(await other.$('#lab-ecd'), null);
    await page.bringToFront();
    await page.click('button:has-text("Save lab result")');
    await page.waitForSelector('.log-saved:has-text("Lab result saved.")');
    assert.equal(((await stored(page, id)).lab as { ecdMm: number }).ecdMm, 0.83);
    assert.deepEqual(recorder.problems, []);
    await context.close();
  });
});
