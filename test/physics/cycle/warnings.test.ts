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

  it('a carburizing atmosphere below the eutectoid warns, and no carbon goes in', () => {
    const result = runCycle(plainRecipe([soak(3, 650, 0.9)]));
    expect(codes(result.warnings)).toEqual(['safety.atmosphereBelowSafeTemperature@0']);
    expect(result.surfaceCarbonPct).toBe(0.2);
    expect(result.effectiveCaseDepthMm).toBe(0);
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
