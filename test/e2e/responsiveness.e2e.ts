/**
 * The short variant of `npm run test:perf` in every browser-test run: the same walk (responsiveness.ts)
 * with the CPU slowed 4× at 390 px, one first visit instead of three and a Chrome trace, so that each run
 * prints the figures (long tasks per phase with their median, keystrokes to the next paint, and each
 * task's CPU time from the trace). Wall-clock limits are the full run's business: here they would follow
 * the machine's load. This asserts what the load cannot change: every phase was walked and recorded,
 * each keystroke reached the page and its field, the trace holds every phase's tasks on the page's main
 * thread, and the physics worker did the likely range, the planning and the calibration fits. No bound
 * on CPU per task either: at 4× it includes the throttle's own share, which grows with the load (the
 * largest task after the first visit: at most 49 ms of CPU in an earlier measurement, 99 ms at load 11.6).
 */
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser } from 'playwright-core';
import { closeBrowser, launch } from './browser';
import { CALIBRATION, FIRST_VISIT, measureResponsiveness, PHASES, printFigures, TYPING } from './responsiveness';

let browser: Browser;
before(async () => {
  browser = await launch();
});
after(() => closeBrowser(browser));

describe('responsiveness, short: the throttled figures printed', () => {
  it('walks every calculator, the screens and a calibration of 30 cycle jobs slowed 4×, traced, and prints the figures', async () => {
    const figures = await measureResponsiveness(browser, { firstVisits: 1, trace: true });
    printFigures(figures);
    assert.deepEqual(figures.observed, { longtask: true, event: true }, 'the browser reports long tasks and events');
    for (const { phase, text } of TYPING)
      assert.ok((figures.keys[phase] ?? 0) >= text.length, `${phase}: ${figures.keys[phase] ?? 0} keydowns counted`);
    assert.deepEqual(
      figures.tracedPhases,
      [...PHASES.filter((p) => p !== FIRST_VISIT), 'done'],
      'every phase is marked in the trace',
    );
    for (const phase of PHASES) {
      const tasks = figures.traced!.filter((t) => t.phase === phase);
      assert.ok(tasks.length > 0, `${phase}: main-thread tasks in the trace`);
    }
    // The heavy physics ran in the module worker: it was started, and it worked while the likely range,
    // the planner and the calibration were worked out (120 simulator runs cannot take under 5 ms).
    assert.ok(
      figures.workers.some((url) => url.includes('physics.worker')),
      `workers: ${figures.workers.join(', ')}`,
    );
    const workerCpu = (phase: string) =>
      figures.tracedWorker!.filter((t) => t.phase === phase).reduce((sum, t) => sum + t.cpuMs, 0);
    for (const phase of [TYPING[2].phase, TYPING[3].phase])
      assert.ok(workerCpu(phase) > 0, `${phase}: the worker worked`);
    assert.ok(workerCpu(CALIBRATION) > 5, `calibration: ${workerCpu(CALIBRATION).toFixed(1)} ms CPU in the worker`);
  });
});
