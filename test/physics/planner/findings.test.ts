/**
 * Unreachable targets: which constraint binds, and whether the suggested change makes the plan
 * reachable when applied. Saturation limits are the Acm line of the Fe–Fe₃C diagram (steel.ts).
 */
import { describe, expect, it } from 'vitest';
import { createI18n, LANGUAGES, RESOURCES, warningMessage } from '../../../src/i18n/i18n';
import { planTwoStepCycle, type PlanResult } from '../../../src/physics/planner/planner';
import { WARNING_CODES, type Warning } from '../../../src/physics/result';
import { pinionRequest, pinionWith } from './fixtures';

function plan(request: unknown): PlanResult {
  const result = planTwoStepCycle(request);
  if (!result.ok) throw new Error(`${result.error.code} at ${result.error.field}`);
  return result.value;
}

const suggestion = (result: PlanResult, code: string) => result.suggestions.find((s) => s.code === code)?.params;

const pinion = pinionRequest();
const cases: Record<string, Record<string, unknown>> = {
  // Acm at 925 °C: 1.20 + (1.34 − 1.20)·25/50 = 1.27 %C.
  boostSoot: pinionWith({ boost: { temperatureC: 925, carbonPotentialPct: 1.4 } }),
  // The hardening soak at 830 °C holds the diffuse potential; Acm there is 1.02 %C.
  diffuseSoot: pinionWith({
    boost: { temperatureC: 925, carbonPotentialPct: 1.2 },
    diffuse: { temperatureC: 925, carbonPotentialPct: 1.1 },
    hardening: { temperatureC: 830, timeH: 0.5 },
  }),
  tooShallow: pinionWith({ targetEcdMm: { min: 3, max: 3.5 }, maxTotalH: 20 }),
  tooDeep: pinionWith({ targetEcdMm: { min: 0.05, max: 0.1 }, hardening: { temperatureC: 850, timeH: 2 } }),
  tooDeepWithoutHardening: pinionWith({
    hardening: undefined,
    boost: { temperatureC: 950, carbonPotentialPct: 1.1 },
    diffuse: { temperatureC: 950, carbonPotentialPct: 0.8 },
    targetEcdMm: { min: 0.01, max: 0.02 },
    targetSurfaceCarbonPct: { min: 0.5, max: 0.9 },
  }),
  surfaceHigh: pinionWith({ targetSurfaceCarbonPct: { min: 0.85, max: 0.95 } }),
  surfaceHighShortCycle: pinionWith({
    steel: { coreCarbonPct: 0.2 },
    hardening: undefined,
    diffuse: { temperatureC: 925, carbonPotentialPct: 0.95 },
    targetEcdMm: { min: 0.15, max: 0.2 },
    targetSurfaceCarbonPct: { min: 0.9, max: 0.94 },
  }),
  surfaceLow: pinionWith({ targetSurfaceCarbonPct: { min: 0.6, max: 0.7 } }),
};

describe('the binding constraint of unreachable targets, one per code', () => {
  it('boost potential above saturation: plan.boostPotentialAboveSaturation; lowering it to the suggested 1.27 % makes it reachable', () => {
    const result = plan(cases.boostSoot);
    expect(result.reachable).toBe(false);
    expect(result.binding).toEqual({
      code: 'plan.boostPotentialAboveSaturation',
      params: { potentialPct: 1.4, limitPct: 1.27, tempC: 925 },
    });
    expect(suggestion(result, 'plan.lowerBoostPotential')).toEqual({ potentialPct: 1.27 });
    expect(result.warnings.map((w) => w.code)).toContain('saturation.potentialAboveAcm');
    expect(plan(pinionWith({ boost: { temperatureC: 925, carbonPotentialPct: 1.27 } })).reachable).toBe(true);
  });

  it('diffuse potential above saturation at the hardening temperature: plan.diffusePotentialAboveSaturation', () => {
    const result = plan(cases.diffuseSoot);
    expect(result.reachable).toBe(false);
    expect(result.binding).toEqual({
      code: 'plan.diffusePotentialAboveSaturation',
      params: { potentialPct: 1.1, limitPct: 1.02, tempC: 830 },
    });
    expect(suggestion(result, 'plan.lowerDiffusePotential')).toEqual({ potentialPct: 1.02 });
  });

  it('ECD out of reach in the time limit: plan.caseDepthNeedsMoreTime at the longest, richest plan; the suggested time or temperature makes it reachable', () => {
    const result = plan(cases.tooShallow);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.caseDepthNeedsMoreTime');
    expect(result.binding?.params).toMatchObject({ targetMm: 3, maxTotalH: 20 });
    expect(result.totalH).toBeLessThanOrEqual(20);
    expect(result.boostH / (result.boostH + result.diffuseH)).toBeCloseTo(0.9, 2);
    expect(result.predicted.effectiveCaseDepthMm).toBeLessThan(3);
    expect(suggestion(result, 'plan.raiseBoostPotential')).toEqual({ limitPct: 1.27, tempC: 925 });
    const { totalH } = suggestion(result, 'plan.allowMoreTime') as { totalH: number };
    expect(plan({ ...cases.tooShallow, maxTotalH: totalH }).reachable).toBe(true);
    const { deltaC } = suggestion(result, 'plan.raiseTemperature') as { deltaC: number };
    const hotter = {
      boost: { temperatureC: 925 + deltaC, carbonPotentialPct: 1.1 },
      diffuse: { temperatureC: 925 + deltaC, carbonPotentialPct: 0.8 },
    };
    expect(plan({ ...cases.tooShallow, ...hotter }).reachable).toBe(true);
  });

  it('ECD below what the shortest cycle gives: plan.caseDepthTooDeepForShortestCycle; the hardening soak is what to shorten', () => {
    const result = plan(cases.tooDeep);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.caseDepthTooDeepForShortestCycle');
    expect(result.binding?.params).toMatchObject({ targetMm: 0.1, totalH: 2.1 });
    expect(result.predicted.effectiveCaseDepthMm).toBeGreaterThan(0.1);
    expect(suggestion(result, 'plan.shortenHardening')).toEqual({ timeH: 2 });
    // The 2 h soak at 850 °C alone goes deeper than 0.1 mm, so cooler boost and diffuse steps would not help.
    expect(suggestion(result, 'plan.lowerTemperature')).toBeUndefined();
  });

  it('the same without a hardening soak: cooler boost and diffuse steps are suggested instead', () => {
    const result = plan(cases.tooDeepWithoutHardening);
    expect(result.binding?.code).toBe('plan.caseDepthTooDeepForShortestCycle');
    expect(result.binding?.params).toMatchObject({ targetMm: 0.02, totalH: 0.1 });
    expect(suggestion(result, 'plan.lowerTemperature')?.deltaC).toBeGreaterThan(0);
    expect(suggestion(result, 'plan.shortenHardening')).toBeUndefined();
  });

  it('surface target above what the diffuse potential leaves: plan.surfaceCarbonTooHighForDiffusePotential; the suggested potential makes it reachable', () => {
    const result = plan(cases.surfaceHigh);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.surfaceCarbonTooHighForDiffusePotential');
    // Equilibrium surface: 0.80 × Gunnarson alloy factor of SAE 8620 (0.974) = 0.779 %C.
    expect(result.binding?.params).toMatchObject({ targetPct: 0.85, potentialPct: 0.8, equilibriumPct: 0.779 });
    expect(result.predicted.surfaceCarbonPct).toBeCloseTo(result.surfaceRangePct!.max, 2);
    const { potentialPct } = suggestion(result, 'plan.raiseDiffusePotential') as { potentialPct: number };
    expect(potentialPct).toBeGreaterThan(0.8);
    expect(
      plan({ ...cases.surfaceHigh, diffuse: { temperatureC: 925, carbonPotentialPct: potentialPct } }).reachable,
    ).toBe(true);
  });

  it('surface target not reached in the short cycle a shallow case takes: plan.surfaceCarbonTooHighForCycleTime', () => {
    const result = plan(cases.surfaceHighShortCycle);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.surfaceCarbonTooHighForCycleTime');
    expect(result.binding?.params).toMatchObject({ targetPct: 0.9 });
    expect(result.surfaceRangePct!.max).toBeLessThan(0.9);
    expect(suggestion(result, 'plan.raiseBoostPotential')).toBeDefined();
    // The diffuse potential (0.95 on plain carbon steel) is not what binds: no suggestion to "raise" it below itself.
    expect(suggestion(result, 'plan.raiseDiffusePotential')).toBeUndefined();
  });

  it('surface target below what the diffuse potential leaves even without boost: plan.surfaceCarbonTooLowForDiffusePotential; the suggested potential makes it reachable', () => {
    const result = plan(cases.surfaceLow);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.surfaceCarbonTooLowForDiffusePotential');
    expect(result.binding?.params).toMatchObject({ targetPct: 0.7, potentialPct: 0.8 });
    expect(result.boostH).toBe(0);
    expect(result.recipe.steps.map((s) => s.label)).toEqual(['diffuse', 'hardening']);
    const { potentialPct } = suggestion(result, 'plan.lowerDiffusePotential') as { potentialPct: number };
    expect(potentialPct).toBeLessThan(0.8);
    expect(
      plan({ ...cases.surfaceLow, diffuse: { temperatureC: 925, carbonPotentialPct: potentialPct } }).reachable,
    ).toBe(true);
  });

  it('ECD target narrower than the search tolerance and the rounding of times to 0.001 h resolve: plan.missedInFinalCheck', () => {
    const result = plan(pinionWith({ targetEcdMm: { min: 0.874999, max: 0.875001 } }));
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.missedInFinalCheck');
    expect(Math.abs(result.predicted.effectiveCaseDepthMm - 0.875)).toBeGreaterThan(0.000001);
  });
});

describe('findings are worded in every language', () => {
  const planCodes = WARNING_CODES.filter((code) => code.startsWith('plan.'));

  it('every plan code above was produced by a test case, binding or suggestion', () => {
    const produced = new Set<string>(['plan.missedInFinalCheck']);
    for (const request of Object.values(cases)) {
      const result = plan(request);
      for (const w of [result.binding!, ...result.suggestions]) produced.add(w.code);
    }
    for (const w of [...plan(cases.tooDeepWithoutHardening).suggestions]) produced.add(w.code);
    expect([...produced].sort()).toEqual([...planCodes].sort());
  });

  it.each(LANGUAGES)('%s: each binding and suggestion has its own message, every placeholder filled', (language) => {
    const { t } = createI18n(language);
    const findings: Warning[] = Object.values(cases).flatMap((request) => {
      const result = plan(request);
      return [result.binding!, ...result.suggestions];
    });
    for (const finding of findings) {
      const own = finding.code
        .split('.')
        .reduce<unknown>(
          (node, key) => (node as Record<string, unknown> | undefined)?.[key],
          RESOURCES[language].warnings,
        );
      expect(typeof own, `${language} warnings.${finding.code}`).toBe('string');
      const message = warningMessage(t, finding);
      expect(message).not.toMatch(/\{\{/);
      for (const value of Object.values(finding.params ?? {})) expect(message).toContain(String(value));
    }
  });

  it('the plan codes have messages in all three languages with the same placeholders', () => {
    for (const code of planCodes) {
      const placeholders = LANGUAGES.map((language) => {
        const text = code
          .split('.')
          .reduce<unknown>(
            (node, key) => (node as Record<string, unknown> | undefined)?.[key],
            RESOURCES[language].warnings,
          );
        expect(typeof text, `${language} warnings.${code}`).toBe('string');
        return [...(text as string).matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1]).sort();
      });
      expect(placeholders[1], `es ${code}`).toEqual(placeholders[0]);
      expect(placeholders[2], `de ${code}`).toEqual(placeholders[0]);
    }
  });
});

it('the pinion request itself is reachable (the cases above each change one thing)', () => {
  expect(plan(pinion).reachable).toBe(true);
});
