/**
 * Unreachable targets: which constraint binds, and whether the suggested change makes the plan
 * reachable when applied. Saturation limits are the Acm line of the Fe–Fe₃C diagram (steel.ts).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createI18n, LANGUAGES, RESOURCES, warningMessage } from '../../../src/i18n/i18n';
import { planTwoStepCycle, type PlanResult } from '../../../src/physics/planner/planner';
import { WARNING_CODES, type Warning } from '../../../src/physics/result';
import { expectPossible, pinionRequest, pinionWith } from './fixtures';

function plan(request: unknown): PlanResult {
  const result = planTwoStepCycle(request);
  if (!result.ok) throw new Error(`${result.error.code} at ${result.error.field}`);
  return result.value;
}

const suggestion = (result: PlanResult, code: string) => result.suggestions.find((s) => s.code === code)?.params;

const pinion = pinionRequest();
const chromiumSteel = { coreCarbonPct: 0.2, composition: { Si: 0.25, Mn: 1.25, Cr: 1.15, Ni: 0, Mo: 0 } };
const cases: Record<string, Record<string, unknown>> = {
  // Acm at 925 °C: 1.20 + (1.34 − 1.20)·25/50 = 1.27 %C.
  boostSoot: pinionWith({ boost: { temperatureC: 925, carbonPotentialPct: 1.4 } }),
  // 20MnCr5 (alloy factor 1.1181): Cp 1.2 at 930 °C is below Acm 1.284 %C, the surface it draws (1.342 %C) is not.
  boostCarbides: pinionWith({
    steel: chromiumSteel,
    boost: { temperatureC: 930, carbonPotentialPct: 1.2 },
    diffuse: { temperatureC: 930, carbonPotentialPct: 0.7 },
  }),
  diffuseCarbides: pinionWith({
    steel: chromiumSteel,
    boost: { temperatureC: 925, carbonPotentialPct: 1.1 },
    diffuse: { temperatureC: 925, carbonPotentialPct: 1.0 },
    hardening: { temperatureC: 830, timeH: 0.5 },
  }),
  // The hardening soak at 830 °C holds the diffuse potential; Acm there is 1.02 %C.
  diffuseSoot: pinionWith({
    boost: { temperatureC: 925, carbonPotentialPct: 1.2 },
    diffuse: { temperatureC: 925, carbonPotentialPct: 1.1 },
    hardening: { temperatureC: 830, timeH: 0.5 },
  }),
  tooShallow: pinionWith({ targetEcdMm: { min: 3, max: 3.5 }, maxTotalH: 20 }),
  tooDeep: pinionWith({ targetEcdMm: { min: 0.05, max: 0.1 }, hardening: { temperatureC: 850, timeH: 2 } }),
  // A fast surface transfer (β = 1e-5 m/s), so D sets the depth even in the shortest cycle.
  tooDeepWithoutHardening: pinionWith({
    hardening: undefined,
    boost: { temperatureC: 1000, carbonPotentialPct: 1.1, betaMPerS: 1e-5 },
    diffuse: { temperatureC: 1000, carbonPotentialPct: 0.8, betaMPerS: 1e-5 },
    targetEcdMm: { min: 0.11, max: 0.13 },
    targetSurfaceCarbonPct: { min: 0.45, max: 0.9 },
  }),
  // With the usual β the shortest cycle's depth is set by the surface transfer: cooler steps go deeper, not shallower.
  tooDeepByTransfer: pinionWith({
    hardening: undefined,
    boost: { temperatureC: 1000, carbonPotentialPct: 1.1 },
    diffuse: { temperatureC: 1000, carbonPotentialPct: 0.8 },
    targetEcdMm: { min: 0.015, max: 0.025 },
    targetSurfaceCarbonPct: { min: 0.45, max: 0.9 },
  }),
  // Far too shallow for any cooler step the models cover: once answered with "lower by about 150 °C" (to about 800 °C).
  tooDeepBeyondModels: pinionWith({
    hardening: undefined,
    boost: { temperatureC: 950, carbonPotentialPct: 1.1 },
    diffuse: { temperatureC: 950, carbonPotentialPct: 0.8 },
    targetEcdMm: { min: 0.01, max: 0.02 },
    targetSurfaceCarbonPct: { min: 0.5, max: 0.9 },
  }),
  // 9.5 mm in 50 h at 850 °C with the boost at its richest: no temperature in the models' range, no time within 1000 h.
  outOfReach: pinionWith({
    boost: { temperatureC: 850, carbonPotentialPct: 1.04 },
    diffuse: { temperatureC: 850, carbonPotentialPct: 0.8 },
    targetEcdMm: { min: 9.5, max: 9.9 },
    maxTotalH: 50,
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
  it('boost potential above saturation: plan.boostPotentialAboveSaturation; lowering it to the suggested 1.23 % (1.27 / alloy factor 1.027 of SAE 8620) makes it reachable', () => {
    const result = plan(cases.boostSoot);
    expect(result.reachable).toBe(false);
    expect(result.binding).toEqual({
      code: 'plan.boostPotentialAboveSaturation',
      params: { potentialPct: 1.4, limitPct: 1.27, tempC: 925 },
    });
    expect(suggestion(result, 'plan.lowerBoostPotential')).toEqual({ potentialPct: 1.23 });
    expect(result.warnings.map((w) => w.code)).toContain('saturation.potentialAboveAcm');
    expect(plan(pinionWith({ boost: { temperatureC: 925, carbonPotentialPct: 1.23 } })).reachable).toBe(true);
  });

  it('diffuse potential above saturation at the hardening temperature: plan.diffusePotentialAboveSaturation', () => {
    const result = plan(cases.diffuseSoot);
    expect(result.reachable).toBe(false);
    expect(result.binding).toEqual({
      code: 'plan.diffusePotentialAboveSaturation',
      params: { potentialPct: 1.1, limitPct: 1.02, tempC: 830 },
    });
    // 1.02 / 1.027 = 0.993, rounded down.
    expect(suggestion(result, 'plan.lowerDiffusePotential')).toEqual({ potentialPct: 0.99 });
  });

  it('a chromium steel whose alloy factor lifts the boost surface above saturation: plan.boostSurfaceAboveSaturation, never reachable', () => {
    const result = plan(cases.boostCarbides);
    expect(result.reachable).toBe(false);
    expect(result.binding).toEqual({
      code: 'plan.boostSurfaceAboveSaturation',
      params: { potentialPct: 1.2, limitPct: 1.28, tempC: 930, surfacePct: 1.342 },
    });
    // 1.284 / 1.1181 = 1.148, rounded down; the boost stays richer than the diffuse step.
    expect(suggestion(result, 'plan.lowerBoostPotential')).toEqual({ potentialPct: 1.14 });
    expect(result.warnings.map((w) => w.code)).toContain('saturation.equilibriumAboveAcm');
    expect(plan({ ...cases.boostCarbides, boost: { temperatureC: 930, carbonPotentialPct: 1.14 } }).reachable).toBe(
      true,
    );
  });

  it('the same for the diffuse potential held at the hardening soak: plan.diffuseSurfaceAboveSaturation', () => {
    const result = plan(cases.diffuseCarbides);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.diffuseSurfaceAboveSaturation');
    expect(result.binding?.params).toMatchObject({ potentialPct: 1, limitPct: 1.02, tempC: 830, surfacePct: 1.118 });
    expect(suggestion(result, 'plan.lowerDiffusePotential')).toEqual({ potentialPct: 0.91 });
  });

  it('ECD out of reach in the time limit: plan.caseDepthNeedsMoreTime at the longest, richest plan; the suggested time or temperature makes it reachable', () => {
    const result = plan(cases.tooShallow);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.caseDepthNeedsMoreTime');
    expect(result.binding?.params).toMatchObject({ targetMm: 3, maxTotalH: 20 });
    expect(result.totalH).toBeLessThanOrEqual(20);
    expect(result.boostH / (result.boostH + result.diffuseH)).toBeCloseTo(0.9, 2);
    expect(result.predicted.effectiveCaseDepthMm).toBeLessThan(3);
    expect(suggestion(result, 'plan.raiseBoostPotential')).toEqual({
      maxPotentialPct: 1.23,
      limitPct: 1.27,
      tempC: 925,
    });
    const { totalH } = suggestion(result, 'plan.allowMoreTime') as { totalH: number };
    expect(plan({ ...cases.tooShallow, maxTotalH: totalH }).reachable).toBe(true);
    const { deltaC } = suggestion(result, 'plan.raiseTemperature') as { deltaC: number };
    // Within the models' range: 925 + ΔT ≤ 1050 °C.
    expect(925 + deltaC).toBeLessThanOrEqual(1050);
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

  it('the same without a hardening soak: cooler boost and diffuse steps are suggested instead, and applied they make it reachable', () => {
    const result = plan(cases.tooDeepWithoutHardening);
    expect(result.binding?.code).toBe('plan.caseDepthTooDeepForShortestCycle');
    expect(result.binding?.params).toMatchObject({ targetMm: 0.13, totalH: 0.1 });
    const { deltaC } = suggestion(result, 'plan.lowerTemperature') as { deltaC: number };
    expect(deltaC).toBeGreaterThan(0);
    expect(1000 - deltaC).toBeGreaterThanOrEqual(850);
    expect(suggestion(result, 'plan.shortenHardening')).toBeUndefined();
    const cooler = (step: { carbonPotentialPct: number }) => ({ ...step, temperatureC: 1000 - deltaC });
    const applied = { ...cases.tooDeepWithoutHardening };
    applied.boost = cooler(applied.boost as { carbonPotentialPct: number });
    applied.diffuse = cooler(applied.diffuse as { carbonPotentialPct: number });
    expect(plan(applied).reachable).toBe(true);
  });

  it('where cooler steps would go deeper (the surface transfer sets a short cycle’s depth), they are not suggested', () => {
    const result = plan(cases.tooDeepByTransfer);
    expect(result.binding?.code).toBe('plan.caseDepthTooDeepForShortestCycle');
    expect(suggestion(result, 'plan.lowerTemperature')).toBeUndefined();
    const cooler = plan({
      ...cases.tooDeepByTransfer,
      boost: { temperatureC: 950, carbonPotentialPct: 1.1 },
      diffuse: { temperatureC: 950, carbonPotentialPct: 0.8 },
    });
    expect(Number(cooler.binding?.params?.reachedMm)).toBeGreaterThan(Number(result.binding?.params?.reachedMm));
  });

  it('a change beyond the models’ range is never suggested: the target is out of reach, and the words say within what', () => {
    for (const request of [cases.tooDeepBeyondModels, cases.outOfReach]) {
      const result = plan(request);
      expect(result.reachable).toBe(false);
      expect(result.suggestions).toEqual([
        { code: 'plan.outOfReach', params: { minC: expect.any(Number), maxC: 1050, maxTotalH: 1000 } },
      ]);
    }
    // Boost 1.1 % on SAE 8620 (× 1.027) reaches saturation at 871 °C: cooler than that is not offered either.
    expect(suggestion(plan(cases.tooDeepBeyondModels), 'plan.outOfReach')).toMatchObject({ minC: 873 });
    expect(suggestion(plan(cases.outOfReach), 'plan.outOfReach')).toMatchObject({ minC: 850 });
  });

  it('surface target above what the diffuse potential leaves: plan.surfaceCarbonTooHighForDiffusePotential; the suggested potential makes it reachable', () => {
    const result = plan(cases.surfaceHigh);
    expect(result.reachable).toBe(false);
    expect(result.binding?.code).toBe('plan.surfaceCarbonTooHighForDiffusePotential');
    // Equilibrium surface: 0.80 × Gunnarson alloy factor of SAE 8620 (1.027) = 0.822 %C.
    expect(result.binding?.params).toMatchObject({ targetPct: 0.85, potentialPct: 0.8, equilibriumPct: 0.822 });
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

describe('property: suggestions for the demo pinion with any targets and steps stay possible', () => {
  it('each one, applied, is an accepted request inside the models’ range (850–1050 °C) with potentials below saturation', () => {
    const seen = new Set<string>();
    fc.assert(
      fc.property(
        fc.integer({ min: 850, max: 1050 }),
        fc.integer({ min: 850, max: 1050 }),
        fc.double({ min: 0.05, max: 6, noNaN: true }),
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.double({ min: 0.7, max: 1.0, noNaN: true }),
        (boostC, diffuseC, ecdMm, maxTotalH, surfacePct) => {
          const request = pinionWith({
            boost: { temperatureC: boostC, carbonPotentialPct: 1.1 },
            diffuse: { temperatureC: diffuseC, carbonPotentialPct: 0.8 },
            targetEcdMm: { min: ecdMm, max: ecdMm * 1.2 },
            targetSurfaceCarbonPct: { min: surfacePct, max: surfacePct + 0.05 },
            maxTotalH,
          });
          const result = plan(request);
          for (const s of result.suggestions) if (expectPossible(request, s)) seen.add(s.code);
        },
      ),
      { numRuns: 60, seed: 2231 },
    );
    // The runs met temperature and time suggestions, not only potentials.
    expect([...seen]).toEqual(expect.arrayContaining(['plan.raiseTemperature', 'plan.allowMoreTime']));
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
