/** Cautions raised by the cycle simulator, each tied to its recipe step. */
import { describe, expect, it } from 'vitest';
import { createI18n, LANGUAGES, RESOURCES, warningMessage } from '../../../src/i18n/i18n';
import type { Recipe } from '../../../src/physics/cycle/recipe';
import { runCycle } from '../../../src/physics/cycle/simulate';
import type { Warning } from '../../../src/physics/result';
import { demoCycle, plainRecipe, soak } from './fixtures';

const codes = (warnings: Warning[]) => warnings.map((w) => `${w.code}@${w.stepIndex ?? '-'}`);

describe('cycle warnings', () => {
  it('the demo pinion cycle raises none', () => {
    expect(runCycle(demoCycle()).warnings).toEqual([]);
  });

  it('carbon potential above saturation (Acm 1.20 %C at 900 °C, Fe–Fe₃C diagram) warns at that step', () => {
    const warnings = runCycle(plainRecipe([soak(1, 900, 1.3), soak(1, 900, 0.8)])).warnings;
    expect(codes(warnings)).toContain('saturation.potentialAboveAcm@0');
    expect(codes(warnings)).not.toContain('saturation.potentialAboveAcm@1');
    expect(warnings.find((w) => w.code === 'saturation.potentialAboveAcm')?.params).toMatchObject({
      carbonPct: 1.3,
      limitPct: 1.2,
      tempC: 900,
    });
  });

  it('surface carbon above saturation warns at the step where it happens, not before, with the worst value', () => {
    // A long rich boost at 900 °C drives the surface past 1.20 %C; the diffuse step brings it down.
    const result = runCycle(plainRecipe([soak(0.05, 900, 0.8), soak(10, 900, 1.6, 1e-6), soak(3, 900, 0.7)]));
    expect(codes(result.warnings)).toContain('saturation.surfaceAboveAcm@1');
    expect(codes(result.warnings)).not.toContain('saturation.surfaceAboveAcm@0');
    const worst = result.warnings.find((w) => w.code === 'saturation.surfaceAboveAcm' && w.stepIndex === 1);
    expect(Number(worst?.params?.carbonPct)).toBeGreaterThan(1.2);
  });

  it('a carburizing atmosphere below 760 °C warns (safety); a neutral heat-up from cold does not', () => {
    const rampWithGas = runCycle(
      plainRecipe([{ durationH: 1, startTempC: 700, endTempC: 925, carbonPotentialPct: 0.9 }, soak(2, 925, 0.9)]),
    );
    expect(codes(rampWithGas.warnings)).toContain('safety.atmosphereBelowSafeTemperature@0');
    const neutralRamp = runCycle(
      plainRecipe([{ durationH: 1, startTempC: 20, endTempC: 925, carbonPotentialPct: null }, soak(2, 925, 0.9)]),
    );
    expect(codes(neutralRamp.warnings).filter((c) => c.startsWith('safety'))).toEqual([]);
  });

  it('a carburizing atmosphere below the eutectoid warns, says no carbon goes in, and none does', () => {
    const result = runCycle(plainRecipe([soak(3, 650, 0.9)]));
    expect(codes(result.warnings)).toEqual([
      'safety.atmosphereBelowSafeTemperature@0',
      'austenite.noneInStep@0',
      'hardening.noAustenite@0',
    ]);
    expect(result.surfaceCarbonPct).toBe(0.2);
    expect(result.effectiveCaseDepthMm).toBe(0);
  });

  it('a last (hardening) step ending at or below 727 °C: the part will not harden from there', () => {
    const result = runCycle(plainRecipe([soak(4, 925, 0.9), soak(0.5, 720, null)]));
    expect(result.warnings.filter((w) => w.code === 'hardening.noAustenite')).toEqual([
      { code: 'hardening.noAustenite', params: { tempC: 720, limitC: 727 }, stepIndex: 1 },
    ]);
    expect(codes(runCycle(plainRecipe([soak(4, 925, 0.9), soak(0.5, 850, 0.8)])).warnings)).toEqual([]);
  });

  it('carburizing in a step that stays between A1 and the core’s Ac3 (Andrews 1965) cautions a two-phase core; a heat-up through it does not', () => {
    // Plain 0.20 %C core: Ac3 = 910 − 203·√0.2 = 819 °C.
    const low = runCycle(plainRecipe([soak(4, 800, 0.9)]));
    expect(low.warnings.find((w) => w.code === 'austenite.twoPhaseCore')).toEqual({
      code: 'austenite.twoPhaseCore',
      params: { tempC: 800, ac3C: 819 },
      stepIndex: 0,
    });
    const heatUp = runCycle(
      plainRecipe([{ durationH: 1, startTempC: 760, endTempC: 925, carbonPotentialPct: 0.9 }, soak(3, 925, 0.9)]),
    );
    expect(codes(heatUp.warnings).filter((c) => c.startsWith('austenite'))).toEqual([]);
  });

  it('a potential the alloy factor lifts above saturation cautions before the surface gets there', () => {
    // 20MnCr5 (factor 1.1181) at 930 °C, Cp 1.2: it draws the surface to 1.342 %C against Acm 1.284 %C.
    const composition = { Si: 0.25, Mn: 1.25, Cr: 1.15, Ni: 0, Mo: 0 };
    const short: Recipe = { ...plainRecipe([soak(0.5, 930, 1.2)]), steel: { coreCarbonPct: 0.2, composition } };
    const result = runCycle(short);
    expect(result.surfaceCarbonPct).toBeLessThan(1.284);
    expect(result.warnings.find((w) => w.code === 'saturation.equilibriumAboveAcm')?.params).toEqual({
      potentialPct: 1.2,
      carbonPct: 1.342,
      limitPct: 1.28,
      tempC: 930,
    });
    const plain = runCycle(plainRecipe([soak(0.5, 930, 1.2)]));
    expect(codes(plain.warnings).filter((c) => c.startsWith('saturation'))).toEqual([]);
  });

  it('a case deeper than a third of the plate thickness or bar radius warns of through-carburizing', () => {
    const plate = runCycle(demoCycle({ kind: 'plate', thicknessMm: 3 }));
    expect(plate.warnings.find((w) => w.code === 'shape.throughCarburizing')?.params).toMatchObject({ limitMm: 3 });
    const bar = runCycle(demoCycle({ kind: 'bar', diameterMm: 6 }));
    expect(bar.warnings.find((w) => w.code === 'shape.throughCarburizing')?.params).toMatchObject({ limitMm: 3 });
    expect(codes(runCycle(demoCycle({ kind: 'plate', thicknessMm: 20 })).warnings)).toEqual([]);
  });

  it('a final surface above 0.9 %C warns of retained austenite (common practice)', () => {
    expect(codes(runCycle(plainRecipe([soak(6, 925, 1.05)])).warnings)).toContain('hardness.retainedAustenite@-');
  });

  it('a soak outside the range where the diffusivity models agree (850–1050 °C) says so', () => {
    expect(codes(runCycle(plainRecipe([soak(4, 1080, 1.0)])).warnings)).toContain('model.outsideCalibratedRange@0');
  });

  it.each(LANGUAGES)('every warning the simulator raised above has its own message in %s', (language) => {
    const { t } = createI18n(language);
    const recipes: Recipe[] = [
      plainRecipe([soak(0.05, 900, 0.8), soak(10, 900, 1.6, 1e-6), soak(3, 900, 0.7)]),
      plainRecipe([{ durationH: 1, startTempC: 700, endTempC: 1080, carbonPotentialPct: 1.5 }], {
        kind: 'bar',
        diameterMm: 2,
      }),
    ];
    const seen = new Set<string>();
    for (const recipe of recipes) {
      for (const warning of runCycle(recipe).warnings) {
        seen.add(warning.code);
        const own = warning.code
          .split('.')
          .reduce<unknown>(
            (node, key) => (node as Record<string, unknown> | undefined)?.[key],
            RESOURCES[language].warnings,
          );
        expect(typeof own, `${language} warnings.${warning.code}`).toBe('string');
        expect(warningMessage(t, warning)).not.toMatch(/\{\{/);
      }
    }
    expect(seen.size).toBeGreaterThanOrEqual(6);
  });
});
