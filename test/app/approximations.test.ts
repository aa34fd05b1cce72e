/** The register of approximate constants in words, in every language and unit system. */
import { describe, expect, it } from 'vitest';
import { approximationRows } from '../../src/app/safety/approximations';
import { makeShow } from '../../src/app/ui/show';
import { createI18n, LANGUAGES } from '../../src/i18n/i18n';
import { APPROXIMATIONS } from '../../src/physics';

const systems = {
  metric: { temperature: 'C', depth: 'mm', time: 'h' },
  us: { temperature: 'F', depth: 'in', time: 'h' },
} as const;

describe('the register of approximate values, worded', () => {
  it.each(LANGUAGES.flatMap((l) => (['metric', 'us'] as const).map((u) => [l, u] as const)))(
    '%s, %s: one row per entry, every figure with its unit, no raw key, placeholder, NaN or undefined',
    (language, system) => {
      const { t } = createI18n(language);
      const rows = approximationRows(t, makeShow(systems[system], language));
      expect(rows.map((r) => r.id)).toEqual(APPROXIMATIONS.map((a) => a.id));
      for (const row of rows) {
        for (const text of [row.name, row.value, row.basis, row.effect]) {
          expect(text.trim().length, row.id).toBeGreaterThan(0);
          expect(text).not.toMatch(/app\.approximations|\{\{|NaN|undefined|–$/u);
        }
      }
      const byId = Object.fromEntries(rows.map((r) => [r.id, r]));
      expect(byId.ecdThreshold!.value).toMatch(/%C$/u);
      expect(byId.safeAtmosphere!.value).toMatch(system === 'us' ? /1[\s.,]?400\s?°F$/u : /760\s?°C$/u);
      expect(byId.ecdThreshold!.effect).toMatch(/\+12[.,]0 %/u);
    },
  );

  it('English: the alloy factor’s coefficients as the code uses them, and the 20MnCr5 reference case', () => {
    const { t } = createI18n('en');
    const rows = approximationRows(t, makeShow(systems.metric, 'en'));
    const alloy = rows.find((r) => r.id === 'alloyFactor')!;
    expect(alloy.value).toBe('Si 0.055 · Mn −0.013 · Cr −0.040 · Ni 0.014 · Mo −0.013');
    expect(alloy.effect).toBe(
      'ECD −1.1 % / +1.1 % with the value 10 % lower / higher (20MnCr5 at 930\u202f°C, 8 h, carbon potential 0.85 %).',
    );
    expect(rows.find((r) => r.id === 'beta')!.value).toBe('1.5 ×10⁻⁷ m/s');
  });
});
