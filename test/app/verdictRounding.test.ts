/**
 * The lab depth inside or outside the predicted range is judged on the depths as the screen shows them
 * (issue 12, item 5): one rounding, `valueAsShown`, for the figures and the verdict, in mm and inches.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { comparisonRows } from '../../src/app/log/jobRows';
import { valueAsShown } from '../../src/app/ui/format';
import { makeShow } from '../../src/app/ui/show';
import type { DisplayUnits } from '../../src/app/ui/units';
import { createI18n } from '../../src/i18n/i18n';
import { ecdComparison, summarizeShift } from '../../src/jobs';
import type { Job } from '../../src/jobs/schema';

const MM: DisplayUnits = { temperature: 'C', depth: 'mm', time: 'h' };
const INCH: DisplayUnits = { temperature: 'F', depth: 'in', time: 'h' };
const LOCALES = ['en', 'es', 'de'] as const;

const base = demoJobs({ count: 1, end: new Date('2025-05-01T12:00:00Z'), seed: 11 })[0]!;
/** A job predicted 0.875 mm with the likely range `minMm`–`maxMm` and the lab's `lab`. */
const job = (minMm: number, maxMm: number, lab: Job['lab']): Job => ({
  ...base,
  id: crypto.randomUUID(),
  prediction: { ...base.prediction!, effectiveCaseDepthMm: 0.875, ecdBandMm: { minMm, maxMm } },
  lab,
});
const verdict = (j: Job, units: DisplayUnits) => ecdComparison(j, makeShow(units, 'en').depthAsShown)?.withinBand;

/** The number a shown depth such as "0,80 mm" or "0.031 in" reads as. */
const readShown = (text: string) => Number(text.replace(/\s*(mm|in)$/u, '').replace(',', '.'));

describe('valueAsShown: the number a shown result reads as', () => {
  it('boundary cases in mm (two decimals): 0.7996 → 0.80, 0.7949 → 0.79, and ties of the typed figure round up as shown', () => {
    expect(valueAsShown(0.7996, 'mm')).toBe(0.8);
    expect(valueAsShown(0.7949, 'mm')).toBe(0.79);
    // 0.815 and 1.005 are stored a hair below (0.81499…, 1.00499…) yet shown "0.82" and "1.01"; toFixed gave 0.81 and 1.00.
    expect(valueAsShown(0.815, 'mm')).toBe(0.82);
    expect(valueAsShown(1.005, 'mm')).toBe(1.01);
    expect(valueAsShown(0.745, 'mm')).toBe(0.75);
  });
  it('boundary cases in inches (three decimals): 0.0155 in → 0.016, 0.02995 → 0.030, 0.03949 → 0.039', () => {
    expect(valueAsShown(0.3937 / 25.4, 'in')).toBe(0.016); // 0.3937 mm = 0.0155 in exactly as typed
    expect(valueAsShown(0.02995, 'in')).toBe(0.03);
    expect(valueAsShown(0.03949, 'in')).toBe(0.039);
  });
  it('nothing finite comes out of a non-finite figure', () => {
    expect(valueAsShown(Number.NaN, 'mm')).toBeNaN();
    expect(valueAsShown(Number.POSITIVE_INFINITY, 'in')).toBeNaN();
  });
  it('is the figure show.depth writes, in mm and inches, in en, es and de (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.constantFrom(MM, INCH),
        fc.constantFrom(...LOCALES),
        (mm, units, locale) => {
          const show = makeShow(units, locale);
          expect(show.depthAsShown(mm)).toBe(readShown(show.depth(mm)));
        },
      ),
      { numRuns: 2000 },
    );
  });
  it('the tie cases of the property, one by one (shortest decimal form on a half): the verdict reads what is shown', () => {
    for (let i = 0; i < 1000; i++) {
      const mm = Number(`${Math.floor(i / 100)}.${String(i % 100).padStart(2, '0')}5`);
      for (const units of [MM, INCH]) {
        const show = makeShow(units, 'de');
        expect(show.depthAsShown(mm)).toBe(readShown(show.depth(mm)));
      }
    }
  });
});

describe('the lab depth against the predicted range, as shown', () => {
  it('mm: a lab 0.7996 mm (shown 0.80 mm) is inside 0.80–1.00 mm; 0.7949 (0.79 mm) is outside', () => {
    expect(verdict(job(0.8, 1.0, { ecdMm: 0.7996 }), MM)).toBe(true);
    expect(verdict(job(0.8, 1.0, { ecdMm: 0.7949 }), MM)).toBe(false);
  });
  it('mm: at the top, 1.0049 mm (1.00 mm) is inside 0.80–1.00 mm; 1.005 mm (shown 1.01 mm) is outside', () => {
    expect(verdict(job(0.8, 1.0, { ecdMm: 1.0049 }), MM)).toBe(true);
    expect(verdict(job(0.8, 1.0, { ecdMm: 1.005 }), MM)).toBe(false);
  });
  it('mm: the range’s own ends are rounded too: a lab 0.80 mm is inside 0.8004–1.00 mm (shown 0.80–1.00 mm)', () => {
    expect(verdict(job(0.8004, 1.0, { ecdMm: 0.8 }), MM)).toBe(true);
  });
  it('mm: the ECD read from the lab’s traverse (0.7 + 0.2·10/20.08 = 0.7996 mm, by hand) is judged as shown: inside', () => {
    const traverse = {
      points: [
        { depthMm: 0.5, value: 600, unit: 'HV' as const },
        { depthMm: 0.7, value: 560, unit: 'HV' as const },
        { depthMm: 0.9, value: 539.92, unit: 'HV' as const },
      ],
      limit: { value: 550, unit: 'HV' as const },
    };
    const j = job(0.8, 1.0, { traverse, ecdMm: 0.5 }); // the typed figure stands only where the traverse gives none
    expect(ecdComparison(j)?.measuredMm).toBeCloseTo(0.7996, 4);
    expect(ecdComparison(j)?.withinBand).toBe(false); // unrounded it would be outside
    expect(verdict(j, MM)).toBe(true);
  });
  it('inches: 0.75–1.00 mm shows 0.030–0.039 in; a lab 0.7493 mm (0.0295 in, shown 0.030 in) is inside, 0.74 mm (0.029 in) outside', () => {
    const show = makeShow(INCH, 'en');
    expect(show.depthRange(0.75, 1.0)).toBe('0.030–0.039\u202fin');
    expect(show.depth(0.7493)).toBe('0.030\u202fin');
    expect(verdict(job(0.75, 1.0, { ecdMm: 0.7493 }), INCH)).toBe(true);
    expect(verdict(job(0.75, 1.0, { ecdMm: 0.74 }), INCH)).toBe(false);
  });
  it('inches: at the top, a lab 1.004 mm is shown 1.00 mm (inside 0.75–1.00 mm) and 0.040 in (1.004/25.4 = 0.03953: outside 0.030–0.039 in)', () => {
    expect(makeShow(INCH, 'en').depth(1.004)).toBe('0.040\u202fin');
    expect(verdict(job(0.75, 1.0, { ecdMm: 1.004 }), MM)).toBe(true);
    expect(verdict(job(0.75, 1.0, { ecdMm: 1.004 }), INCH)).toBe(false);
  });
  it('the verdict follows the unit, as the figures do: a lab 0.745 mm is shown 0.75 mm (inside 0.75–1.00 mm) and 0.029 in (outside 0.030–0.039 in)', () => {
    expect(verdict(job(0.75, 1.0, { ecdMm: 0.745 }), MM)).toBe(true);
    expect(verdict(job(0.75, 1.0, { ecdMm: 0.745 }), INCH)).toBe(false);
  });
  it('the job page and the shift summary say the same word, in en, es and de', () => {
    const inside = job(0.8, 1.0, { ecdMm: 0.7996 });
    const outside = job(0.8, 1.0, { ecdMm: 1.005 });
    for (const locale of LOCALES) {
      const { t } = createI18n(locale);
      const show = makeShow(MM, locale);
      const word = (j: Job) => comparisonRows(j, { t, show, locale }).find((r) => r.key === 'band')?.value;
      expect(word(inside)).toBe(t('app.log.compare.inside'));
      expect(word(outside)).toBe(t('app.log.compare.outside'));
      expect(t('app.log.compare.inside')).not.toBe(t('app.log.compare.outside'));
      const pairs = summarizeShift([inside, outside], [], show.depthAsShown).ecdPairs;
      expect(pairs.map((p) => p.withinBand)).toEqual([true, false]);
    }
  });
});
