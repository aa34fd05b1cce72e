/**
 * The lab's traverse in the app: the tester's file read into a preview, the typed points read and
 * analysed with errors on the point that caused them, the next depth offered, the lab form's
 * figures from the traverse and its unit checks.
 */
import { describe, expect, it } from 'vitest';
import { comparisonRows } from '../../src/app/log/jobRows';
import { labFormOf, readLabForm } from '../../src/app/log/labForm';
import { makeShow } from '../../src/app/ui/show';
import { createI18n } from '../../src/i18n/i18n';
import type { Job } from '../../src/jobs';
import { readPaste } from '../../src/app/log/traverse/pasteTraverse';
import {
  nextRow,
  readTraverseForm,
  suggestedDepthMm,
  traverseFormOf,
  type TraverseForm,
} from '../../src/app/log/traverse/traverseForm';
import { field } from '../../src/app/ui/fieldText';
import { CASE_CRITERIA } from '../../src/physics';

const ISO = CASE_CRITERIA['iso-18203'];
const SAE = CASE_CRITERIA['sae-j423'];

const rows = (pairs: [string, string][], unit = 'mm') =>
  pairs.map(([depth, hardness]) => ({ depth: field(depth, unit), hardness, unit: '' as const }));

/** 0.2 mm 600 HV, 0.4 mm 500 HV: 550 HV is crossed half-way, at 0.3 mm (from the definition, by hand). */
const SIMPLE: TraverseForm = {
  unit: 'HV',
  rows: rows([
    ['0,2', '600'],
    ['0,4', '500'],
    ['0,6', '400'],
    ['0,8', '352'],
    ['1,0', '350'],
    ['1,2', '348'],
  ]),
};

describe('the tester’s file', () => {
  const choices = { depthUnit: 'mm' as const, hardnessUnit: 'HV' as const };

  it('`;` between columns, decimal commas, units named in the header, a summary line left out with its reason', () => {
    const preview = readPaste('Nr.;Tiefe [µm];Härte HV1\r\n1;50;712\n2;100;688,5\n\nMittel;;600\n', choices);
    expect(preview.separator).toBe(';');
    expect(preview.hasHeader).toBe(true);
    expect([preview.depthColumn, preview.hardnessColumn]).toEqual([1, 2]);
    expect(preview.depthUnit).toBe('um');
    expect(preview.depthUnitFromFile).toBe(true);
    expect(preview.hardnessUnitFromFile).toBe(true);
    // 50 µm = 0.05 mm (NIST SP 811).
    expect(preview.points).toEqual([
      { depthMm: 0.05, value: 712, unit: 'HV' },
      { depthMm: 0.1, value: 688.5, unit: 'HV' },
    ]);
    expect(preview.rows.at(-1)).toEqual({ line: 5, problem: { code: 'missingColumn', column: 'depth' } });
  });

  it('`,` between columns with decimal points; a tab; spaces with decimal commas; no header: the first two columns, units from the choices', () => {
    for (const text of ['0.1,58.5\n0.2,57', '0.1\t58.5\n0.2\t57', '0,1 58,5\n0,2 57']) {
      const preview = readPaste(text, { depthUnit: 'in', hardnessUnit: 'HRC' });
      expect(preview.hasHeader).toBe(false);
      expect(preview.depthUnitFromFile).toBe(false);
      expect(preview.hardnessUnit).toBe('HRC');
      // 0.1 in = 2.54 mm exactly (NIST SP 811).
      expect(preview.points.map((p) => [Number(p.depthMm.toFixed(6)), p.value, p.unit])).toEqual([
        [2.54, 58.5, 'HRC'],
        [5.08, 57, 'HRC'],
      ]);
    }
  });

  it('a cell that is no number is named with its line and column; columns can be chosen', () => {
    const preview = readPaste('depth;HRC\n0,1;60\n0,2;6O\n', choices);
    expect(preview.hardnessUnit).toBe('HRC');
    expect(preview.rows[1]).toEqual({ line: 3, problem: { code: 'notNumber', column: 'hardness', text: '6O' } });
    const swapped = readPaste('1;0,1;700\n2;0,2;650', { ...choices, depthColumn: 1, hardnessColumn: 2 });
    expect(swapped.points.map((p) => p.depthMm)).toEqual([0.1, 0.2]);
  });
});

describe('typing the traverse', () => {
  it('offers the last depth plus the last step, 0.05 mm while there is one point, in the user’s unit', () => {
    expect(suggestedDepthMm([])).toBe(0.05);
    expect(suggestedDepthMm(rows([['0,1', '700']]))).toBeCloseTo(0.15, 12);
    expect(
      suggestedDepthMm(
        rows([
          ['0,1', '700'],
          ['0,25', '650'],
        ]),
      ),
    ).toBeCloseTo(0.4, 12);
    // 0.004 in then 0.008 in: next 0.012 in.
    const inches = rows(
      [
        ['0.004', '700'],
        ['0.008', '650'],
      ],
      'in',
    );
    expect(nextRow(inches, 'in', 'en').depth).toEqual({ text: '0.012', unit: 'in' });
    expect(nextRow(rows([['0,1', '700']]), 'mm', 'de').depth.text).toBe('0,15');
  });

  it('reads the ECD at the limit by linear interpolation (0.3 mm, by hand), blank rows skipped', () => {
    const out = readTraverseForm(
      { ...SIMPLE, rows: [...SIMPLE.rows, { depth: field(''), hardness: '', unit: '' }] },
      ISO,
    );
    expect(out.errors).toEqual({});
    expect(out.analysis?.effectiveCaseDepthMm).toBeCloseTo(0.3, 12);
    expect(out.analysis?.coreHardness?.value).toBeCloseTo(350, 12);
  });

  it('puts a physics refusal on the row and input it came from, past blank rows: 705 under HRC, did you mean HV', () => {
    const form: TraverseForm = {
      unit: 'HRC',
      rows: [
        { depth: field(''), hardness: '', unit: '' },
        ...rows([
          ['0,1', '705'],
          ['0,2', '690'],
        ]),
      ],
    };
    const out = readTraverseForm(form, SAE);
    expect(out.errors).toEqual({
      'points.1.hardness': expect.objectContaining({
        code: 'hardness.outsideScaleOtherUnit',
        params: expect.objectContaining({ value: 705, unit: 'HRC', otherUnit: 'HV' }),
      }),
    });
    const unsorted = readTraverseForm(
      {
        unit: 'HV',
        rows: rows([
          ['0,4', '600'],
          ['0,2', '500'],
        ]),
      },
      ISO,
    );
    expect(Object.keys(unsorted.errors)).toEqual(['points.1.depth']);
    expect(readTraverseForm({ unit: 'HV', rows: rows([['0,4', 'x']]) }, ISO).errors['points.0.hardness']?.code).toBe(
      'number.invalid',
    );
  });

  it('a stored traverse comes back into the form as it was, depths in the user’s unit', () => {
    const points = [
      { depthMm: 0.254, value: 60, unit: 'HRC' as const },
      { depthMm: 0.508, value: 480, unit: 'HV' as const },
    ];
    const form = traverseFormOf(points, 'in', 'en', 'HV');
    expect(form.unit).toBe('HRC');
    expect(form.rows).toEqual([
      { depth: { text: '0.01', unit: 'in' }, hardness: '60', unit: '' },
      { depth: { text: '0.02', unit: 'in' }, hardness: '480', unit: 'HV' },
    ]);
    expect(readTraverseForm(form, SAE).points).toEqual([
      { depthMm: expect.closeTo(0.254, 12), value: 60, unit: 'HRC' },
      { depthMm: expect.closeTo(0.508, 12), value: 480, unit: 'HV' },
    ]);
  });
});

describe('the lab form', () => {
  const empty = labFormOf(undefined, new Date(2026, 2, 6));

  it('stores the traverse with its limit; the ECD, surface and core come from it, a typed ECD is not kept', () => {
    const read = readLabForm({ ...empty, traverse: SIMPLE, ecd: field('0,9', 'mm') }, ISO);
    expect(read.errors).toEqual({});
    expect(read.typed).toEqual({ ecd: false, surface: false, core: false });
    expect(read.lab).toEqual({
      traverse: { points: read.traverse.points, limit: ISO },
      measuredAt: '2026-03-06',
    });
  });

  it('refuses a core of 35 under HV with the likely meaning, and a core as hard as the limit', () => {
    const slip = readLabForm({ ...empty, coreHardness: field('35'), coreUnit: 'HV' }, ISO);
    expect(slip.lab).toBeUndefined();
    expect(slip.errors.coreHardness).toMatchObject({
      code: 'hardness.outsideScaleOtherUnit',
      params: { value: 35, unit: 'HV', otherUnit: 'HRC' },
    });
    expect(readLabForm({ ...empty, coreHardness: field('35'), coreUnit: 'HRC' }, ISO).errors).toEqual({});
    // 56 HRC ≈ 613 HV (ASTM E140): not softer than 550 HV.
    expect(readLabForm({ ...empty, coreHardness: field('56'), coreUnit: 'HRC' }, ISO).errors.coreHardness?.code).toBe(
      'hardness.coreNotBelowLimit',
    );
    expect(
      readLabForm({ ...empty, surfaceHardness: field('720'), surfaceUnit: 'HRC' }, ISO).errors.surfaceHardness?.code,
    ).toBe('hardness.outsideScaleOtherUnit');
  });

  it('a traverse that never levels off leaves the core to be typed; one with no single crossing, the ECD', () => {
    const shallow: TraverseForm = { unit: 'HV', rows: SIMPLE.rows.slice(0, 3) };
    const read = readLabForm({ ...empty, traverse: shallow, coreHardness: field('340'), coreUnit: 'HV' }, ISO);
    expect(read.typed).toEqual({ ecd: false, surface: false, core: true });
    expect(read.lab?.coreHardness).toEqual({ value: 340, unit: 'HV' });
    const soft: TraverseForm = {
      unit: 'HV',
      rows: rows([
        ['0,1', '500'],
        ['0,3', '450'],
      ]),
    };
    const judged = readLabForm({ ...empty, traverse: soft, ecd: field('0,05', 'mm') }, ISO);
    expect(judged.typed.ecd).toBe(true);
    expect(judged.lab?.ecdMm).toBe(0.05);
  });
});

describe('the range verdict on the job page', () => {
  const t = createI18n('en').t;
  const job = {
    id: '00000000-0000-4000-8000-000000000009',
    prediction: {
      effectiveCaseDepthMm: 0.85,
      totalCaseDepthMm: 1.3,
      surfaceCarbonPct: 0.8,
      model: 'agren',
      ecdBandMm: { minMm: 0.7504, maxMm: 0.93 },
      appVersion: '0.1.0',
    },
    lab: { ecdMm: 0.7496 },
  } as unknown as Job;

  it('reads inside when the lab depth and the band’s end show the same figure (0.75 mm, 0.030 in)', () => {
    for (const depth of ['mm', 'in'] as const) {
      const show = makeShow({ temperature: 'C', depth, time: 'h' }, 'en');
      const rows = comparisonRows(job, { t, show, locale: 'en' });
      expect(rows.find((r) => r.key === 'band')?.value).toBe(t('app.log.compare.inside'));
    }
  });
});
