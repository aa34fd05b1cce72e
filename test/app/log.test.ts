/**
 * The log screens' logic without a browser: what a calculator hands to the log is a valid job,
 * the filter the log opens with, reading the job and lab forms, wording errors beside fields.
 */
import { describe, expect, it } from 'vitest';
import { cycleLogEntry } from '../../src/app/cycle/logEntry';
import { computeCycle } from '../../src/app/cycle/results';
import { DEFAULT_CYCLE_FORM } from '../../src/app/cycle/state';
import { depthLogEntry } from '../../src/app/depth/logEntry';
import { computeDepth } from '../../src/app/depth/results';
import { DEFAULT_DEPTH_FORM, type DepthForm } from '../../src/app/depth/state';
import { formatCalendarDate } from '../../src/app/log/dates';
import {
  currentShiftForm,
  filterForm,
  followCurrentShift,
  isCurrentShift,
  showCurrentShift,
  toJobFilter,
} from '../../src/app/log/filter';
import { changesOf, draftOf, EMPTY_JOB_FORM, missingFields, placeJobsError } from '../../src/app/log/jobForm';
import { labFieldOf, labFormOf, readLabForm } from '../../src/app/log/labForm';
import { appendLine } from '../../src/app/log/save/NoteForm';
import { recoveryNote } from '../../src/app/recovery/logNote';
import { computeRecovery } from '../../src/app/recovery/results';
import { DEFAULT_RECOVERY_FORM } from '../../src/app/recovery/state';
import { hrefFor, screenFromHash, subPathFromHash } from '../../src/app/shell/route';
import { CUSTOM_STEEL } from '../../src/app/fields/steel';
import { field } from '../../src/app/ui/fieldText';
import { makeShow } from '../../src/app/ui/show';
import { wordError } from '../../src/app/ui/fieldError';
import { APP_VERSION } from '../../src/app/version';
import { createI18n } from '../../src/i18n/i18n';
import { JobDraftSchema, JobSchema, OPEN_STATUSES } from '../../src/jobs';
import { TOTAL_CASE_MARGIN_PCT } from '../../src/physics';
import * as v from 'valibot';
import { readFileSync } from 'node:fs';
import { sourceFiles } from '../sourceFiles';

const settings = {
  model: 'agren' as const,
  ecdThresholdPct: 0.4,
  totalCaseMarginPct: TOTAL_CASE_MARGIN_PCT,
  temperatureToleranceC: 8,
};
const typed = { ...EMPTY_JOB_FORM, workOrder: 'WO-024117', partNumber: 'KR-2231', furnace: 'F1', operator: 'MK' };
const t = createI18n('en').t;

function depthEntry(changes: Partial<DepthForm>) {
  const form = { ...DEFAULT_DEPTH_FORM, ...changes };
  const outcome = computeDepth(form, settings);
  if (!outcome.result) throw new Error('the depth form should compute');
  return { entry: depthLogEntry(outcome.result, form.steel.grade), result: outcome.result };
}

describe('what the calculators hand to the log', () => {
  it.each(['depth', 'time', 'temperature'] as const)(
    'the depth screen solving for %s gives a draft the job schema accepts',
    (mode) => {
      const { entry, result } = depthEntry({ solveFor: mode });
      const draft = v.safeParse(JobDraftSchema, draftOf(typed, entry));
      expect(draft.success, JSON.stringify(!draft.success && draft.issues[0].path)).toBe(true);
      expect(entry.inputs.kind).toBe(mode);
      expect(entry.prediction.effectiveCaseDepthMm).toBe(result.figures.effectiveCaseDepthMm);
      expect(entry.prediction.ecdBandMm).toEqual({
        minMm: result.figures.uncertaintyMm.minMm,
        maxMm: result.figures.uncertaintyMm.maxMm,
      });
      expect(entry.prediction.appVersion).toBe(APP_VERSION);
      expect(entry.steel).toMatchObject({ gradeId: 'sae-8620', gradeName: 'SAE 8620', coreCarbonPct: 0.2 });
    },
  );

  it('the app version is the package version (set at build time)', async () => {
    const { version } = (await import('../../package.json')).default;
    expect(APP_VERSION).toBe(version);
  });

  it('records the request as sent: surface carbon when it was given, the answer of a time request in the prediction', () => {
    const { entry, result } = depthEntry({ solveFor: 'time', carbonSource: 'surface', carbon: field('0,8') });
    expect(entry.inputs).toMatchObject({ kind: 'time', surfaceCarbonPct: 0.8, temperatureC: 925, targetDepthMm: 0.9 });
    expect('carbonPotentialPct' in entry.inputs).toBe(false);
    expect(entry.prediction.timeH).toBe(result.figures.timeH);
  });

  it('a custom composition leaves the steel name to the person, and the draft needs it', () => {
    const steel = { ...DEFAULT_DEPTH_FORM.steel, grade: CUSTOM_STEEL };
    const { entry } = depthEntry({ steel });
    expect(entry.steel.gradeName).toBeUndefined();
    expect(missingFields(typed, true)).toEqual(['gradeName']);
    expect(v.safeParse(JobDraftSchema, draftOf({ ...typed, gradeName: ' EN 36 ' }, entry)).success).toBe(true);
    expect(v.safeParse(JobDraftSchema, draftOf(typed, entry)).success).toBe(false);
  });

  it('the cycle editor hands over its whole recipe and the simulated depths (no band)', () => {
    const outcome = computeCycle(DEFAULT_CYCLE_FORM, {
      model: 'agren',
      ecdThresholdPct: 0.4,
      totalCaseMarginPct: 0.05,
      betaMPerS: 1.5e-7,
    });
    expect(outcome.result).toBeDefined();
    const entry = cycleLogEntry(outcome.result!);
    expect(v.safeParse(JobDraftSchema, draftOf(typed, entry)).success).toBe(true);
    expect(entry.inputs).toEqual({ kind: 'cycle', recipe: outcome.result!.recipe });
    expect(entry.prediction.timeH).toBeCloseTo(6.5, 12); // 3.5 + 2 + 0.5 + 0.5 h of the default cycle
    expect(entry.prediction.ecdBandMm).toBeUndefined();
  });

  it('upset recovery words one line for a job’s notes, in the user’s units', () => {
    const outcome = computeRecovery(DEFAULT_RECOVERY_FORM, 'agren');
    const line = recoveryNote(outcome.result!, t, makeShow({ temperature: 'F', depth: 'mm', time: 'h' }, 'en'));
    expect(line).toMatch(
      /^Upset: 0\s?h 40\s?min on the clock counted as .* at 1697\s?°F; still needed at 1697\s?°F: \d+\s?h \d+\s?min\.$/u,
    );
    expect(appendLine('', line)).toBe(line);
    expect(appendLine('Coupon in basket 3.\n', line)).toBe(`Coupon in basket 3.\n${line}`);
  });
});

describe('the log filter', () => {
  it('opens on the shift running now, by the settings’ hours (default A 06–14, B 14–22, C 22–06)', () => {
    const form = currentShiftForm(new Date(2025, 2, 5, 2, 30));
    expect(form).toMatchObject({ fromDate: '2025-03-04', toDate: '2025-03-04', shift: 'C' });
    expect(isCurrentShift(form, new Date(2025, 2, 5, 2, 30))).toBe(true);
    expect(isCurrentShift({ ...form, text: 'oil' }, new Date(2025, 2, 5, 2, 30))).toBe(false);
    expect(toJobFilter(form)).toEqual({ fromDate: '2025-03-04', toDate: '2025-03-04', shift: 'C' });
  });

  it('an untouched filter moves on with the shift; one the person changed stays', () => {
    showCurrentShift(new Date(2025, 2, 5, 13, 50));
    expect(filterForm.value).toMatchObject({ shift: 'A', fromDate: '2025-03-05' });
    followCurrentShift(new Date(2025, 2, 5, 14, 10));
    expect(filterForm.value).toMatchObject({ shift: 'B', fromDate: '2025-03-05' });
    filterForm.value = { ...filterForm.value, furnace: 'F2' };
    followCurrentShift(new Date(2025, 2, 5, 22, 5));
    expect(filterForm.value).toMatchObject({ shift: 'B', furnace: 'F2' });
  });

  it('turns empty entries into no condition, "open" into the open statuses, and trims the words', () => {
    const empty = {
      fromDate: '',
      toDate: '',
      shift: '' as const,
      furnace: '',
      partNumber: '',
      status: '' as const,
      text: '  ',
    };
    expect(toJobFilter(empty)).toEqual({});
    expect(toJobFilter({ ...empty, status: 'open', furnace: 'F2', text: ' oil ' })).toEqual({
      status: OPEN_STATUSES,
      furnace: 'F2',
      text: 'oil',
    });
  });
});

describe('job and lab forms', () => {
  const job = v.parse(JobSchema, {
    ...draftOf(typed, depthEntry({}).entry),
    id: '0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b',
    createdAt: '2025-03-05T14:30:00.000Z',
    updatedAt: '2025-03-05T14:30:00.000Z',
    shift: 'B',
    shiftDate: '2025-03-05',
  });

  it('an edit sends only the fields that changed', () => {
    expect(changesOf(job, { ...typed, gradeName: 'SAE 8620', notes: 'Door opened at 3 h.' })).toEqual({
      notes: 'Door opened at 3 h.',
    });
    expect(changesOf(job, { ...typed, gradeName: 'SAE 8620' })).toEqual({});
  });

  it('required fields left empty are named before anything is stored', () => {
    expect(missingFields({ ...EMPTY_JOB_FORM, furnace: ' ' }, false)).toEqual(['partNumber', 'furnace', 'operator']);
  });

  it('the store’s problems are placed beside their fields, named by the label', () => {
    const placed = placeJobsError(
      t,
      {
        code: 'record.invalid',
        issues: [
          { path: 'operator', problem: 'badFormat' },
          { path: 'steel.gradeName', problem: 'tooLong', params: { expected: '<=40' } },
        ],
      },
      (f) => ({ operator: 'Operator initials', gradeName: 'Steel grade' })[f],
    );
    expect(placed.fields).toEqual({
      operator: 'Operator initials: not in the expected format.',
      gradeName: 'Steel grade: too long (length <=40).',
    });
    expect(placed.general).toBe('The job was not saved: some entries need correcting.');
    const unplaced = placeJobsError(
      t,
      {
        code: 'record.invalid',
        issues: [{ path: 'inputs.kind', problem: 'notOneOf', params: { expected: '"depth"' } }],
      },
      () => undefined,
    );
    expect(unplaced.general).toContain('inputs.kind');
  });

  it('the lab depth is typed in the user’s unit and stored in mm (0.034 in = 0.8636 mm, NIST SP 811)', () => {
    const form = {
      ...labFormOf(undefined, new Date(2025, 2, 6)),
      ecd: field('0,034', 'in'),
      surfaceHardness: field('60,5'),
      coreHardness: field('350'),
      coreUnit: 'HV' as const,
      by: ' QL ',
    };
    const { lab, errors } = readLabForm(form);
    expect(errors).toEqual({});
    expect(lab?.ecdMm).toBeCloseTo(0.8636, 12);
    expect(lab).toMatchObject({
      surfaceHardness: { value: 60.5, unit: 'HRC' },
      coreHardness: { value: 350, unit: 'HV' },
      by: 'QL',
      measuredAt: '2025-03-06',
    });
    expect(lab?.surfaceCarbonPct).toBeUndefined();
  });

  it('an empty lab form removes the result; an unreadable number is an error on its field', () => {
    expect(readLabForm(labFormOf(undefined)).lab).toBeUndefined();
    const bad = readLabForm({ ...labFormOf(undefined), surfaceCarbon: field('0.8x') });
    expect(bad.lab).toBeUndefined();
    expect(bad.errors.surfaceCarbon?.code).toBe('number.invalid');
    expect(labFieldOf('lab.surfaceHardness')).toBe('surfaceHardness');
    expect(labFieldOf('lab.measuredAt')).toBe('at');
  });

  it('a lab value out of bounds is worded beside its field with the allowed range and unit, before any store', () => {
    const es = createI18n('es').t;
    const bad = readLabForm({
      ...labFormOf(undefined),
      ecd: field('0', 'mm'),
      surfaceHardness: field('85'),
      coreHardness: field('366,7'),
      surfaceCarbon: field('2,5'),
    });
    expect(bad.lab).toBeUndefined();
    const metric = { temperature: 'C', depth: 'mm', time: 'h' } as const;
    expect(wordError(t, bad.errors.ecd!, metric, 'en')).toBe('Depth must be more than zero.');
    expect(wordError(t, bad.errors.surfaceHardness!, metric, 'en')).toBe(
      '85 HRC is outside 0–80 HRC; check the entry.',
    );
    expect(bad.errors.coreHardness).toBeUndefined();
    expect(wordError(es, bad.errors.surfaceCarbon!, metric, 'es')).toBe(
      'El carbono 2,5\u202f%C supera 2,11\u202f%C, lo máximo que admite la austenita.',
    );
    const deep = readLabForm({ ...labFormOf(undefined), ecd: field('0,5', 'in') });
    expect(wordError(t, deep.errors.ecd!, { ...metric, depth: 'in' }, 'en')).toBe(
      'Depth 0.5\u202fin is deeper than 0.394\u202fin; check the entry.',
    );
  });

  it('a stored lab result comes back into the form as it was', () => {
    const lab = {
      ecdMm: 0.85,
      surfaceHardness: { value: 61, unit: 'HRC' as const },
      measuredAt: '2025-03-06T10:00:00.000Z',
      by: 'QL',
    };
    expect(readLabForm(labFormOf(lab)).lab).toEqual({ ...lab, measuredAt: '2025-03-06' });
  });
});

describe('routes and dates', () => {
  it('a job page has its own address', () => {
    const href = hrefFor('log', 'job', '0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b');
    expect(href).toBe('#/log/job/0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b');
    expect(screenFromHash(href)).toBe('log');
    expect(subPathFromHash(href)).toEqual(['job', '0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b']);
    expect(subPathFromHash('#/log')).toEqual([]);
    expect(subPathFromHash('#/log/%E0')).toEqual(['%E0']);
  });

  it('a shift date is the same calendar day in every time zone and language', () => {
    expect(formatCalendarDate('2025-03-05', 'en')).toBe('Wed, Mar 5, 2025');
    expect(formatCalendarDate('2025-03-05', 'es')).toMatch(/5 mar 2025/u);
    expect(formatCalendarDate('nonsense', 'en')).toBe('–');
  });
});

describe('text stays text', () => {
  it('no code in the app writes markup from strings (notes and imported text are rendered by Preact, escaped)', () => {
    const files = [...sourceFiles('src/app'), ...sourceFiles('src/pwa')];
    expect(files.length).toBeGreaterThan(40);
    const offenders = files.filter((file) =>
      /dangerouslySetInnerHTML|\.innerHTML\b|\.outerHTML\b|insertAdjacentHTML|document\.write/u.test(
        readFileSync(file, 'utf8'),
      ),
    );
    expect(offenders).toEqual([]);
  });
});
