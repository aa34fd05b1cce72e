/** The cycle editor's list operations, its recipe reading, and the solver behind the adapter. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { simulateCycle, type Recipe } from '../../src/physics';
import { buildRecipe, computeCycle } from '../../src/app/cycle/results';
import {
  addStep,
  DEFAULT_CYCLE_FORM,
  duplicateStep,
  MAX_STEPS,
  moveStep,
  removeStep,
  updateStep,
} from '../../src/app/cycle/state';
import { field } from '../../src/app/ui/fieldText';

const settings = { model: 'agren' as const, ecdThresholdPct: 0.4, totalCaseMarginPct: 0.05, betaMPerS: 1.5e-7 };

describe('cycle step list', () => {
  const f = DEFAULT_CYCLE_FORM;
  it('adds a step continuing from the last end temperature, with a new key', () => {
    const next = addStep(f);
    expect(next.steps).toHaveLength(f.steps.length + 1);
    expect(next.steps.at(-1)?.startTemp).toEqual(f.steps.at(-1)?.endTemp);
    expect(new Set(next.steps.map((s) => s.key)).size).toBe(next.steps.length);
  });
  it('duplicates after the original, removes, and never removes the last step', () => {
    const dup = duplicateStep(f, 0);
    expect(dup.steps[1]?.carbonPotential).toEqual(f.steps[0]?.carbonPotential);
    expect(dup.steps[1]?.key).not.toBe(f.steps[0]?.key);
    expect(removeStep(f, 0).steps.map((s) => s.key)).toEqual(f.steps.slice(1).map((s) => s.key));
    let one = f;
    while (one.steps.length > 1) one = removeStep(one, 0);
    expect(removeStep(one, 0).steps).toHaveLength(1);
  });
  it('moves steps within bounds and caps the count', () => {
    expect(moveStep(f, 0, 1).steps.map((s) => s.key)).toEqual([2, 1, 3, 4]);
    expect(moveStep(f, 0, -1)).toBe(f);
    let many = f;
    for (let i = 0; i < MAX_STEPS + 5; i++) many = addStep(many);
    expect(many.steps).toHaveLength(MAX_STEPS);
    expect(duplicateStep(many, 0)).toBe(many);
    // The editor's cap is the recipe's: as many steps as it offers, physics accepts.
    const short = { ...many, steps: many.steps.map((s) => ({ ...s, duration: field('0.1', 'h') })) };
    expect(computeCycle(short, settings).result?.recipe.steps).toHaveLength(MAX_STEPS);
  });
});

describe('recipe from the form', () => {
  it('reads units, neutral steps and the default β', () => {
    const form = updateStep(
      updateStep(DEFAULT_CYCLE_FORM, 0, { duration: field('210', 'min'), startTemp: field('1697', 'F') }),
      3,
      { neutral: true },
    );
    const { recipe } = buildRecipe(form, settings);
    expect(recipe?.steps[0]?.durationH).toBeCloseTo(3.5, 12);
    expect(recipe?.steps[0]?.startTempC).toBeCloseTo(925, 12);
    expect(recipe?.steps[3]?.carbonPotentialPct).toBeNull();
    expect(recipe?.steps[1]?.betaMPerS).toBe(1.5e-7);
  });
  it('places errors on the step field that caused them', () => {
    const bad = updateStep(DEFAULT_CYCLE_FORM, 1, { duration: field('zwei', 'h') });
    expect(computeCycle(bad, settings).errors['steps.1.durationH']?.code).toBe('duration.invalid');
    const hot = updateStep(DEFAULT_CYCLE_FORM, 2, { endTemp: field('1400', 'C') });
    expect(computeCycle(hot, settings).errors['steps.2.endTempC']?.code).toBe('temperature.outOfRange');
  });
});

describe('the cycle screen runs the cycle solver', () => {
  it('a cycle typed in shop units (min, °F) gives the answer the solver gives the same cycle written in SI', () => {
    // The demo pinion's boost/diffuse file, written independently of the form reader.
    const file = JSON.parse(readFileSync('public/examples/pinion-kr2231-cycle.json', 'utf8')) as Recipe;
    let form = removeStep(DEFAULT_CYCLE_FORM, 2);
    // 240 min = 4 h; 1697 °F = 925 °C exactly (°F = 1.8·°C + 32).
    form = updateStep(form, 0, {
      duration: field('240', 'min'),
      startTemp: field('1697', 'F'),
      endTemp: field('1697', 'F'),
    });
    form = updateStep(form, 2, { startTemp: field('850', 'C'), endTemp: field('850', 'C') });
    const out = computeCycle(form, settings);
    const recipe = out.result!.recipe;
    expect(recipe.steps).toHaveLength(file.steps.length);
    recipe.steps.forEach((step, i) => {
      const written = file.steps[i]!;
      expect(step.durationH).toBeCloseTo(written.durationH, 12);
      expect(step.startTempC).toBeCloseTo(written.startTempC, 9);
      expect(step.endTempC).toBeCloseTo(written.endTempC, 9);
      expect(step.carbonPotentialPct).toBe(written.carbonPotentialPct);
      expect(step.betaMPerS).toBe(written.betaMPerS);
    });
    expect(recipe.steel.coreCarbonPct).toBe(file.steel.coreCarbonPct);
    expect(recipe.steel.composition).toEqual(file.steel.composition);
    const direct = simulateCycle(file);
    if (!direct.ok) throw new Error(direct.error.code);
    expect(out.result!.simulation.effectiveCaseDepthMm).toBeCloseTo(direct.value.effectiveCaseDepthMm, 9);
    expect(out.result!.simulation.surfaceCarbonPct).toBeCloseTo(direct.value.surfaceCarbonPct, 9);
    // And the form's own default (a ramp to 845 °C instead) is a different cycle: the check can tell them apart.
    const defaultDepth = computeCycle(DEFAULT_CYCLE_FORM, settings).result!.simulation.effectiveCaseDepthMm;
    expect(Math.abs(defaultDepth - direct.value.effectiveCaseDepthMm)).toBeGreaterThan(0.005);
  });
  it('gives finite numbers and step-tagged cautions for the default boost/diffuse cycle', () => {
    const out = computeCycle(DEFAULT_CYCLE_FORM, settings);
    expect(out.result).toBeDefined();
    const sim = out.result!.simulation;
    expect(
      [
        sim.effectiveCaseDepthMm,
        sim.totalCaseDepthMm,
        ...sim.profile.flatMap((p) => [p.depthMm, p.carbonPct, p.hardnessHrc]),
      ].every(Number.isFinite),
    ).toBe(true);
    const tooRich = updateStep(DEFAULT_CYCLE_FORM, 0, { carbonPotential: field('1.5') });
    const warnings = computeCycle(tooRich, settings).result?.simulation.warnings ?? [];
    expect(warnings.some((w) => w.code === 'saturation.potentialAboveAcm' && w.stepIndex === 0)).toBe(true);
  });
});
