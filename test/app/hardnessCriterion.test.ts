/** The case criterion setting on the screens: passed to the cycle, named beside every ECD, and the indicative curve's method worded. */
import { describe, expect, it } from 'vitest';
import { computeCycle } from '../../src/app/cycle/results';
import { DEFAULT_CYCLE_FORM } from '../../src/app/cycle/state';
import { cycleView } from '../../src/app/cycle/view';
import { makeShow } from '../../src/app/ui/show';
import { createI18n, LANGUAGES } from '../../src/i18n/i18n';
import { CASE_CRITERIA } from '../../src/physics';

const base = { model: 'agren' as const, ecdThresholdPct: 0.4, totalCaseMarginPct: 0.05, betaMPerS: 1.5e-7 };
const units = { temperature: 'C', depth: 'mm', time: 'h' } as const;

describe('case criterion on the cycle screen', () => {
  it('50 HRC (SAE J423) from the settings reaches the recipe and the curve', () => {
    const out = computeCycle(DEFAULT_CYCLE_FORM, { ...base, ecdHardnessLimit: CASE_CRITERIA['sae-j423'] });
    expect(out.result?.recipe.ecdHardnessLimit).toEqual({ value: 50, unit: 'HRC' });
    expect(out.result?.simulation.hardnessBasis.limitHrc).toBe(50);
  });

  it.each(LANGUAGES)(
    '%s: the ECD names the stand-in carbon and the limit; the method gives its anchors in words',
    (lng) => {
      const { t } = createI18n(lng);
      const locale = lng;
      const show = makeShow(units, locale);
      const result = computeCycle(DEFAULT_CYCLE_FORM, base).result!;
      const view = cycleView(result, t, show, units);
      const ecd = view.rows.find((r) => r.key === 'ecd')!.label;
      expect(ecd).toContain(show.carbon(0.4));
      expect(ecd).toContain(show.hardness({ value: 550, unit: 'HV' }));
      expect(view.hardnessMethod).toContain(show.hardness({ value: 52.375, unit: 'HRC' }, 1)); // 550 HV by the E140 rows
      expect(view.chart.labels.limit).toContain('550');
      for (const text of [ecd, view.hardnessMethod, view.chart.labels.limit]) {
        expect(text).not.toMatch(/{{|undefined|NaN|\d\.\d{4,}|\d,\d{4,}/);
      }
    },
  );

  it('names the grade whose typical core hardness the curve uses (the default form is SAE 8620: 35 HRC)', () => {
    const { t } = createI18n('en');
    const result = computeCycle(DEFAULT_CYCLE_FORM, base).result!;
    expect(result.recipe.steel.grade).toBe('sae-8620');
    const show = makeShow(units, 'en');
    const method = cycleView(result, t, show, units).hardnessMethod;
    const hrc = (value: number, digits?: number) => show.hardness({ value, unit: 'HRC' }, digits);
    expect(method).toContain(`core hardness ${hrc(35)} (typical of SAE 8620, common practice)`);
    expect(method).toContain(`limit ${show.hardness({ value: 550, unit: 'HV' })} (≈ ${hrc(52.4, 1)}) at`);
    expect(method).toContain(`threshold carbon ${show.carbon(0.4)}`);
  });
});
