/** Plates (both faces carburized, symmetry plane) and round bars (radial finite volumes). */
import { describe, expect, it } from 'vitest';
import { runCycle, solveRecipe } from '../../../src/physics/cycle/simulate';
import { findGrade } from '../../../src/physics/grades';
import { alloyFactor } from '../../../src/physics/steel';
import { SECONDS_PER_HOUR } from '../../../src/physics/units';
import {
  CONSTANT_D,
  constantDiffusivity,
  crossingDepthM,
  cylinderConstantSurface,
  demoCycle,
  plainRecipe,
  plateConstantSurface,
  relativeError,
  soak,
  VERY_LARGE_BETA,
} from './fixtures';

const semiInfinite = runCycle(demoCycle());
const semiInfiniteExtentM = solveRecipe(demoCycle()).grid.extentM;

describe('plate', () => {
  it('a plate thick enough for its case gives the semi-infinite result (ECD within 0.1 %, surface within 0.001 %C)', () => {
    const shape = { kind: 'plate', thicknessMm: 8 } as const;
    // The half-thickness is inside the semi-infinite domain, so the symmetry plane is really modelled.
    expect(solveRecipe(demoCycle(shape)).grid.extentM).toBeLessThan(semiInfiniteExtentM);
    const plate = runCycle(demoCycle(shape));
    expect(relativeError(plate.effectiveCaseDepthMm, semiInfinite.effectiveCaseDepthMm)).toBeLessThan(0.001);
    expect(Math.abs(plate.surfaceCarbonPct - semiInfinite.surfaceCarbonPct)).toBeLessThan(0.001);
  });

  it('a 1 mm plate after 40 h reaches uniform carbon equal to Cp × alloy factor (SAE 8620)', () => {
    const composition = findGrade('sae-8620')!.composition;
    const recipe = {
      ...plainRecipe([soak(40, 925, 0.8)], { kind: 'plate', thicknessMm: 1 }),
      steel: { coreCarbonPct: 0.2, composition },
    };
    const run = solveRecipe(recipe);
    const effectivePotential = 0.8 * alloyFactor(composition);
    for (const c of run.carbonPct) expect(Math.abs(c - effectivePotential)).toBeLessThan(1e-4);
    expect(Math.abs(run.surfaceCarbonPct - effectivePotential)).toBeLessThan(1e-4);
    expect(runCycle(recipe).effectiveCaseDepthMm).toBe(0.5);
  });

  it('matches the plane-sheet series solution (Crank eq. 4.17), 2 mm plate, 6 h, constant D: profile within 0.001 %C', () => {
    const timeS = 6 * SECONDS_PER_HOUR;
    const result = runCycle(plainRecipe([soak(6, 925, 0.9, VERY_LARGE_BETA)], { kind: 'plate', thicknessMm: 2 }), 1, {
      diffusivity: constantDiffusivity,
    });
    for (const p of result.profile) {
      expect(
        Math.abs(p.carbonPct - plateConstantSurface(p.depthMm / 1e3, timeS, CONSTANT_D, 1e-3, 0.9, 0.2)),
      ).toBeLessThan(0.001);
    }
  });
});

describe('round bar', () => {
  it('a 1000 mm bar gives the semi-infinite result (ECD within 0.1 %)', () => {
    const bar = runCycle(demoCycle({ kind: 'bar', diameterMm: 1000 }));
    expect(relativeError(bar.effectiveCaseDepthMm, semiInfinite.effectiveCaseDepthMm)).toBeLessThan(0.001);
  });

  it('curvature: an 8 mm bar carburizes deeper than an 8 mm plate in the same cycle', () => {
    const bar = runCycle(demoCycle({ kind: 'bar', diameterMm: 8 }));
    const plate = runCycle(demoCycle({ kind: 'plate', thicknessMm: 8 }));
    expect(bar.effectiveCaseDepthMm).toBeGreaterThan(plate.effectiveCaseDepthMm * 1.03);
    expect(bar.totalCaseDepthMm).toBeGreaterThan(plate.totalCaseDepthMm * 1.03);
  });

  it.each([
    [4, 6],
    [2, 10],
    [6, 12],
  ])(
    'matches the cylinder series solution (Crank eq. 5.22), %s mm bar, %s h, constant D: profile within 0.002 %C, ECD within 0.5 %',
    (diameterMm, hours) => {
      const timeS = hours * SECONDS_PER_HOUR;
      const radiusM = diameterMm / 2e3;
      const reference = (depthM: number) => cylinderConstantSurface(depthM, timeS, CONSTANT_D, radiusM, 0.9, 0.2);
      const result = runCycle(plainRecipe([soak(hours, 925, 0.9, VERY_LARGE_BETA)], { kind: 'bar', diameterMm }), 1, {
        diffusivity: constantDiffusivity,
      });
      for (const p of result.profile) expect(Math.abs(p.carbonPct - reference(p.depthMm / 1e3))).toBeLessThan(0.002);
      const exactMm = reference(radiusM) >= 0.4 ? radiusM * 1e3 : crossingDepthM(reference, 0.4, radiusM) * 1e3;
      expect(relativeError(result.effectiveCaseDepthMm, exactMm)).toBeLessThan(0.005);
    },
  );
});
