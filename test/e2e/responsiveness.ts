/**
 * The responsiveness walk shared by the full measurement (`responsiveness.perf.ts`, `npm run test:perf`)
 * and its short variant in the browser tests (`responsiveness.e2e.ts`): with Chromium's CPU slowed 4×
 * (a mid-range phone) at 390 px, type in every calculator (depth, cycle step, planner, upset readings),
 * switch screens and open the calibration of a furnace with 30 cycle jobs, recording every main-thread
 * task over 50 ms (PerformanceObserver 'longtask') and every keystroke slower than 16 ms to the next paint.
 * Optionally a Chrome trace gives each main-thread task's CPU time (`tdur`, the thread's own time, which
 * includes the throttle's 4× but not the time spent waiting for a core other processes hold).
 *
 * The page is driven with raw input (CDP key and mouse events at coordinates read before each
 * step), not with Playwright's actionability checks, whose selector engine runs on the page's main
 * thread and would be recorded as the app's own long tasks.
 */
import assert from 'node:assert/strict';
import { cpus, loadavg } from 'node:os';
import type { Browser, BrowserContext, CDPSession, Page } from 'playwright-core';
import { NO_VALUE } from '../../src/app/ui/format';
import { HEADER_SCREEN, HOME, NAV_SCREENS } from '../../src/app/shell/screens';
import { cycleJobsOnOneFurnace } from '../fixtures/cycleJobs';
import { BASE_URL, phoneContext, waitUntilOfflineReady } from './browser';
import { backupText, importFile } from './logData';

export const THROTTLE = 4;
export const LONG_TASK_MS = 50;
export const FIRST_RESULT_MS = 1500;
export const FIRST_VISIT = 'first visit';
const PHASE_MARK = 'casefront-phase:';

/** What is typed in each calculator: the phase's name, the field, the text. */
export const TYPING = [
  { phase: 'typing: depth time', selector: '#depth-time', text: '7,25' },
  { phase: 'typing: depth temperature', selector: '#depth-temperature', text: '930' },
  { phase: 'typing: cycle step', selector: 'li.step >> nth=1 >> input[id$="-duration"]', text: '2,5' },
  { phase: 'typing: planner', selector: '#plan-ecd-max', text: '0,95' },
  { phase: 'typing: upset readings', selector: '#reading-1-temperature', text: '880' },
] as const;
export const SWITCHING = 'switching screens';
export const CALIBRATION = 'calibration, 30 cycle jobs';

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

/** One main-thread task of the trace: wall time and the thread's CPU time, ms. */
export interface TracedTask {
  phase: string;
  wallMs: number;
  cpuMs: number;
}

export interface Figures {
  /** ms from navigation to the first result, per first visit. */
  firstResults: number[];
  calibrationMs: number;
  longTasks: LongTask[];
  keystrokes: Keystroke[];
  /** keydown events counted per phase. */
  keys: Record<string, number>;
  /** Whether the browser offers the long-task and event-timing entries the figures come from. */
  observed: { longtask: boolean; event: boolean };
  /** The scripts of the workers the measured page started. */
  workers: string[];
  /** Every main-thread task of the measured page, by phase (when traced). */
  traced?: TracedTask[];
  /** Every task of the page's dedicated workers, by phase (when traced). */
  tracedWorker?: TracedTask[];
  /** Phases whose start mark was found in the trace. */
  tracedPhases?: string[];
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

/** Starts a phase: tags what the page records from now on, and marks the trace (User Timing) where it starts. */
const setPhase = (page: Page, phase: string) =>
  page.evaluate(
    ([p, mark]) => {
      (window as unknown as Recorded).__phase = p;
      performance.mark(mark + p);
    },
    [phase, PHASE_MARK] as const,
  );

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
async function typeInto(page: Page, phase: (typeof TYPING)[number]['phase']): Promise<void> {
  const { selector, text } = TYPING.find((t) => t.phase === phase)!;
  await setPhase(page, phase);
  await tap(page, selector);
  await page.keyboard.press('ControlOrMeta+A');
  await page.keyboard.type(text, { delay: 120 });
  await settle(page);
  assert.equal(await page.locator(selector).first().inputValue(), text, `${phase}: the field reads what was typed`);
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

interface TraceEvent {
  name: string;
  ph: string;
  pid: number;
  tid: number;
  ts: number;
  dur?: number;
  tdur?: number;
  args?: { name?: string };
}

/** The measured page's main-thread and worker tasks, each put in the phase whose mark precedes it. */
function tracedTasks(trace: Buffer): { tasks: TracedTask[]; worker: TracedTask[]; phases: string[] } {
  const events = (JSON.parse(trace.toString('utf8')) as { traceEvents: TraceEvent[] }).traceEvents;
  const marks = events
    .filter((e) => e.name.startsWith(PHASE_MARK) && (e.ph === 'R' || e.ph === 'I' || e.ph === 'n' || e.ph === 'b'))
    .sort((a, b) => a.ts - b.ts);
  // The page's main thread is the renderer's main thread of the process that wrote the marks.
  const pid = marks[0]?.pid;
  const threads = (name: string) =>
    new Set(
      events
        .filter((e) => e.ph === 'M' && e.name === 'thread_name' && e.pid === pid && e.args?.name === name)
        .map((e) => e.tid),
    );
  const main = threads('CrRendererMain');
  const workers = threads('DedicatedWorker thread');
  const phaseAt = (ts: number) => {
    let phase = FIRST_VISIT;
    for (const mark of marks) if (mark.ts <= ts) phase = mark.name.slice(PHASE_MARK.length);
    return phase;
  };
  const tasksOn = (tids: Set<number>) =>
    events
      .filter((e) => e.ph === 'X' && e.name === 'RunTask' && e.pid === pid && tids.has(e.tid))
      .map((e) => ({ phase: phaseAt(e.ts), wallMs: (e.dur ?? 0) / 1000, cpuMs: (e.tdur ?? 0) / 1000 }));
  return {
    tasks: tasksOn(main),
    worker: tasksOn(workers),
    phases: [...new Set(marks.map((m) => m.name.slice(PHASE_MARK.length)))],
  };
}

/**
 * The walk: the log gets 30 cycle jobs with lab results on one furnace (not slowed), then `firstVisits`
 * first visits are timed and the last is walked through, slowed 4×. With `trace`, the walk is traced.
 */
export async function measureResponsiveness(
  browser: Browser,
  { firstVisits, trace }: { firstVisits: number; trace: boolean },
): Promise<Figures> {
  const { context } = await phoneContext(browser);
  const setup = await context.newPage();
  await setup.goto(`${BASE_URL}#/log`);
  await waitUntilOfflineReady(setup);
  await importFile(setup, backupText(cycleJobsOnOneFurnace(30)));
  await setup.close();

  const firstResults: number[] = [];
  for (let visit = 1; visit < firstVisits; visit++) {
    const page = await context.newPage();
    await slowed(context, page);
    firstResults.push(await firstVisit(page));
    await page.close();
  }

  const page = await context.newPage();
  const workers: string[] = [];
  page.on('worker', (worker) => workers.push(new URL(worker.url()).pathname));
  await record(page);
  const cdp = await slowed(context, page);
  if (trace)
    await browser.startTracing(page, {
      categories: ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'blink.user_timing'],
    });
  firstResults.push(await firstVisit(page));
  // Playwright's own script for locating elements is compiled on the page's thread when first used: now, not while typing.
  await page.locator('main').evaluate(() => undefined);
  await settle(page);

  await typeInto(page, 'typing: depth time');
  await typeInto(page, 'typing: depth temperature');

  await setPhase(page, SWITCHING);
  for (const screen of [...NAV_SCREENS.filter((s) => s.id !== HOME), HEADER_SCREEN]) {
    await tap(page, screen.id === HEADER_SCREEN.id ? '.safety-link' : `.bottom-nav a[href="#/${screen.id}"]`);
    await page.waitForFunction((id) => location.hash === `#/${id}`, screen.id);
    await settle(page);
  }

  await setPhase(page, 'opening the cycle editor');
  await tap(page, `.bottom-nav a[href="#/cycle"]`);
  await page.waitForSelector('li.step');
  await settle(page);
  // With the likely range open, every change of the cycle is also run 23 times more in the worker.
  await tap(page, '#cycle-band > button');
  await page.waitForSelector('#cycle-band dl.results');
  await settle(page);
  await typeInto(page, 'typing: cycle step');

  await setPhase(page, 'opening the planner');
  await tap(page, '.view-tabs a[href="#/plan"]');
  await page.waitForSelector('#plan-ecd-max');
  await settle(page);
  await typeInto(page, 'typing: planner');

  await setPhase(page, 'opening upset recovery');
  await tap(page, '.bottom-nav a[href="#/recovery"]');
  await page.waitForSelector('#reading-1-temperature');
  await settle(page);
  await typeInto(page, 'typing: upset readings');

  await setPhase(page, CALIBRATION);
  const opened = await page.evaluate(() => {
    location.hash = '#/log/calibration';
    return performance.now();
  });
  await page.waitForSelector('.calibration-card');
  const calibrationMs = (await page.evaluate(() => performance.now())) - opened;
  await settle(page);
  await setPhase(page, 'done');

  const recorded = await page.evaluate(() => {
    const w = window as unknown as Recorded;
    return {
      longTasks: w.__longTasks,
      keystrokes: w.__keystrokes,
      keys: w.__keys,
      observed: {
        longtask: PerformanceObserver.supportedEntryTypes.includes('longtask'),
        event: PerformanceObserver.supportedEntryTypes.includes('event'),
      },
    };
  });
  const traced = trace ? tracedTasks(await browser.stopTracing()) : undefined;
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
  await context.close();
  return {
    firstResults,
    calibrationMs,
    ...recorded,
    workers,
    ...(traced
      ? {
          traced: traced.tasks.filter((t) => t.phase !== 'done'),
          tracedWorker: traced.worker.filter((t) => t.phase !== 'done'),
          tracedPhases: traced.phases,
        }
      : {}),
  };
}

export const median = (values: readonly number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length === 0 ? 0 : sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

const ms = (values: readonly number[]) => values.map((v) => v.toFixed(0)).join(', ');

/** The phases in the order they were walked. */
export const PHASES = [
  FIRST_VISIT,
  TYPING[0].phase,
  TYPING[1].phase,
  SWITCHING,
  'opening the cycle editor',
  TYPING[2].phase,
  'opening the planner',
  TYPING[3].phase,
  'opening upset recovery',
  TYPING[4].phase,
  CALIBRATION,
];

/** Prints the figures: the machine's load, first results, then per phase long tasks, keystrokes and (traced) CPU per task. */
export function printFigures(figures: Figures): void {
  // Chromium's slowdown multiplies whatever else the machine is doing: the load goes with the figures.
  console.log(
    `machine: ${cpus().length} cores, load average ${loadavg()
      .map((l) => l.toFixed(1))
      .join(' ')}`,
  );
  const firstResultMs = median(figures.firstResults);
  console.log(
    `${THROTTLE}× slowed CPU, 390 px: first result after ${ms(figures.firstResults)} ms, median ${firstResultMs.toFixed(0)} ms (limit ${FIRST_RESULT_MS}); calibration of 30 cycle jobs shown after ${figures.calibrationMs.toFixed(0)} ms`,
  );
  for (const phase of PHASES) {
    const tasks = figures.longTasks.filter((t) => t.phase === phase).map((t) => t.durationMs);
    const keys = figures.keys[phase] ?? 0;
    const slowKeys = figures.keystrokes.filter((k) => k.phase === phase).map((k) => k.durationMs);
    // Keystrokes the API did not report took under 16 ms; they count as 16 in the median.
    const keyMedian = median([...slowKeys, ...Array<number>(Math.max(0, keys - slowKeys.length)).fill(16)]);
    const keyText = keys
      ? `; ${keys} keystrokes, keydown to next paint median ${keyMedian <= 16 ? '≤ 16' : keyMedian.toFixed(0)} ms, max ${slowKeys.length ? Math.max(...slowKeys).toFixed(0) : '≤ 16'} ms`
      : '';
    let traceText = '';
    if (figures.traced) {
      const traced = figures.traced.filter((t) => t.phase === phase);
      const cpu = traced.map((t) => t.cpuMs);
      const long = traced.filter((t) => t.wallMs > LONG_TASK_MS);
      const inWorker = (figures.tracedWorker ?? []).filter((t) => t.phase === phase);
      const workerCpu = inWorker.reduce((sum, t) => sum + t.cpuMs, 0);
      traceText = `; trace: ${traced.length} tasks, CPU per task max ${cpu.length ? Math.max(...cpu).toFixed(1) : '0'} ms${long.length ? `, tasks over ${LONG_TASK_MS} ms wall ${ms(long.map((t) => t.wallMs))} ms with CPU ${ms(long.map((t) => t.cpuMs))} ms (median ${median(long.map((t) => t.cpuMs)).toFixed(0)})` : ''}${workerCpu ? `; physics worker ${workerCpu.toFixed(0)} ms CPU in ${inWorker.length} tasks` : ''}`;
    }
    console.log(
      `  ${phase}: ${tasks.length ? `${tasks.length} long tasks (${ms(tasks)} ms), median ${median(tasks).toFixed(0)} ms` : 'no long task'}${keyText}${traceText}`,
    );
  }
  const afterLoad = figures.longTasks.filter((t) => t.phase !== FIRST_VISIT);
  console.log(
    `  longest task after the first visit: ${afterLoad.length ? Math.max(...afterLoad.map((t) => t.durationMs)).toFixed(0) : `none over ${LONG_TASK_MS}`} ms (limit ${LONG_TASK_MS})`,
  );
  if (figures.traced) {
    const afterLoadCpu = figures.traced.filter((t) => t.phase !== FIRST_VISIT).map((t) => t.cpuMs);
    console.log(
      `  most CPU in one task after the first visit (trace): ${afterLoadCpu.length ? Math.max(...afterLoadCpu).toFixed(1) : '0'} ms`,
    );
  }
}
