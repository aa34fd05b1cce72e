import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { simulateCycle } from '../../src/physics/cycle/simulate';
import { STEEL_GRADES } from '../../src/physics/grades';
import { asQuenchedHardnessHrc, hvToHrc } from '../../src/physics/hardness';
import {
  DEFAULT_CORE_HARDNESS_HRC,
  indicativeHardnessBasis,
  indicativeHardnessHrc,
  type HardnessCurve,
} from '../../src/physics/indicativeHardness';
import type { SimulationResult } from '../../src/physics/cycle/recipe';

const pinion = JSON.parse(
  readFileSync(new URL('../../public/examples/pinion-kr2231-cycle.json', import.meta.url), 'utf8'),
) as { steel: Record<string, unknown> } & Record<string, unknown>;

function simulate(request: unknown): SimulationResult {
  const r = simulateCycle(request);
  if (!r.ok) throw new Error(`${r.error.code} at ${r.error.field}`);
  return r.value;
}

/** Depth where the sampled hardness first falls through `limitHrc`, by linear interpolation between profile points, mm. */
function hardnessCrossingMm(profile: SimulationResult['profile'], limitHrc: number): number {
  for (let i = 1; i < profile.length; i++) {
    const a = profile[i - 1]!;
    const b = profile[i]!;
    if (a.hardnessHrc > limitHrc && b.hardnessHrc <= limitHrc) {
      return a.depthMm + ((a.hardnessHrc - limitHrc) / (a.hardnessHrc - b.hardnessHrc)) * (b.depthMm - a.depthMm);
    }
  }
  return Number.NaN;
}

const sae8620: HardnessCurve = { coreCarbonPct: 0.2, coreHardnessHrc: 35, thresholdCarbonPct: 0.4, limitHrc: 52.375 };

describe('indicative hardness from carbon', () => {
  it('worked example by hand (8620, core 35 HRC at 0.20 %C, 550 HV ≈ 52.375 HRC at 0.40 %C): 0.30 %C → 35 + 17.375·0.5 = 43.69 HRC', () => {
    expect(indicativeHardnessHrc(0.3, sae8620)).toBeCloseTo(43.6875, 12);
  });
  it('worked example by hand: 0.50 %C → 35 + 17.375·1.5 = 61.06 HRC, under the ceiling 20 + 60·√0.5 = 62.43 HRC', () => {
    expect(indicativeHardnessHrc(0.5, sae8620)).toBeCloseTo(61.0625, 12);
  });
  it('meets the criterion exactly at the threshold carbon and the core hardness at core carbon', () => {
    expect(indicativeHardnessHrc(0.4, sae8620)).toBe(52.375);
    expect(indicativeHardnessHrc(0.2, sae8620)).toBe(35);
    expect(indicativeHardnessHrc(0.1, sae8620)).toBe(35);
  });
  it('follows the ceiling where the line would rise above it: 0.8 %C → 65 HRC', () => {
    expect(indicativeHardnessHrc(0.8, sae8620)).toBe(65);
  });

  const curves = fc
    .record({
      coreCarbonPct: fc.double({ min: 0.05, max: 0.35, noNaN: true }),
      gap: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
      coreHardnessHrc: fc.double({ min: 20, max: 50, noNaN: true }),
      limitHrc: fc.double({ min: 20, max: 68, noNaN: true }),
    })
    .map(({ coreCarbonPct, gap, coreHardnessHrc, limitHrc }) => ({
      coreCarbonPct,
      thresholdCarbonPct: coreCarbonPct + gap,
      coreHardnessHrc,
      limitHrc,
    }));
  const carbon = fc.double({ min: 0, max: 2.11, noNaN: true });

  it('never exceeds the fully martensitic ceiling (Just), for any anchors (property)', () => {
    fc.assert(
      fc.property(curves, carbon, (curve, c) => {
        expect(indicativeHardnessHrc(c, curve)).toBeLessThanOrEqual(asQuenchedHardnessHrc(c));
      }),
    );
  });
  it('never falls as carbon rises, for any anchors (property)', () => {
    fc.assert(
      fc.property(curves, carbon, carbon, (curve, a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        expect(indicativeHardnessHrc(lo, curve)).toBeLessThanOrEqual(indicativeHardnessHrc(hi, curve));
      }),
    );
  });
});

describe('indicative hardness anchors for a steel', () => {
  it('SAE 8620 core typically 30–40 HRC (DOMAIN §3.5, common practice); every grade’s typical core is softer than both criteria', () => {
    const sae = STEEL_GRADES.find((g) => g.id === 'sae-8620')!;
    expect(sae.typicalCoreHardnessHrc).toBeGreaterThanOrEqual(30);
    expect(sae.typicalCoreHardnessHrc).toBeLessThanOrEqual(40);
    for (const g of STEEL_GRADES) {
      expect(g.typicalCoreHardnessHrc).toBeLessThan(50);
      expect(g.typicalCoreHardnessHrc).toBeLessThanOrEqual(asQuenchedHardnessHrc(g.coreCarbonPct));
    }
  });
  it('takes the core hardness given, else the grade’s (by id or name), else the stated default', () => {
    const steel = { coreCarbonPct: 0.2 };
    const of = (s: object) => indicativeHardnessBasis({ steel: { ...steel, ...s }, thresholdCarbonPct: 0.4 }).basis;
    expect(of({ coreHardness: { value: 345, unit: 'HV' } })).toMatchObject({
      coreHardnessHrc: 35,
      coreSource: 'steel',
    });
    expect(of({ grade: 'SAE 4320' })).toMatchObject({ coreHardnessHrc: 40, coreSource: 'grade' });
    expect(of({ grade: 'sae-1018' })).toMatchObject({ coreHardnessHrc: 22, coreSource: 'grade' });
    expect(of({ grade: 'my own steel' })).toMatchObject({
      coreHardnessHrc: DEFAULT_CORE_HARDNESS_HRC,
      coreSource: 'default',
    });
  });
  it('550 HV becomes 52.375 HRC by the E140 rows; 50 HRC stays 50', () => {
    const steel = { coreCarbonPct: 0.2 };
    expect(indicativeHardnessBasis({ steel, thresholdCarbonPct: 0.4 }).basis.limitHrc).toBe(hvToHrc(550));
    expect(
      indicativeHardnessBasis({ steel, thresholdCarbonPct: 0.4, ecdHardnessLimit: { value: 50, unit: 'HRC' } }).basis
        .limitHrc,
    ).toBe(50);
  });
  it('a core harder than the ceiling at core carbon is lowered to it, with a caution', () => {
    // Ceiling at 0.20 %C: 20 + 60·√0.2 = 46.83 HRC.
    const r = indicativeHardnessBasis({
      steel: { coreCarbonPct: 0.2, coreHardness: { value: 48, unit: 'HRC' } },
      thresholdCarbonPct: 0.4,
    });
    expect(r.basis.coreHardnessHrc).toBeCloseTo(46.833, 3);
    expect(r.warnings).toEqual([
      { code: 'hardness.coreAboveCeiling', params: { coreHrc: 48, carbonPct: 0.2, ceilingHrc: 46.8 } },
    ]);
  });
  it('a threshold too low for the criterion is said: at 0.25 %C the ceiling is 50 HRC, below 550 HV ≈ 52.4 HRC', () => {
    const r = indicativeHardnessBasis({ steel: { coreCarbonPct: 0.15 }, thresholdCarbonPct: 0.25 });
    expect(r.warnings.map((w) => w.code)).toEqual(['hardness.limitAboveCeilingAtThreshold']);
    const j423 = indicativeHardnessBasis({
      steel: { coreCarbonPct: 0.15 },
      thresholdCarbonPct: 0.25,
      ecdHardnessLimit: { value: 50, unit: 'HRC' },
    });
    expect(j423.warnings).toEqual([]);
  });
});

describe('the cycle profile’s hardness agrees with the criterion', () => {
  const result = simulate(pinion);
  const step = result.profile[1]!.depthMm;

  it('demo pinion (SAE 8620, 550 HV): the hardness curve falls through 52.4 HRC at the predicted ECD, to within a tenth of a profile step', () => {
    const crossing = hardnessCrossingMm(result.profile, result.hardnessBasis.limitHrc);
    expect(Math.abs(crossing - result.effectiveCaseDepthMm)).toBeLessThan(0.1 * step);
  });
  it('demo pinion: the core reaches the grade’s typical 35 HRC (the ceiling alone gave 47 HRC)', () => {
    const deepest = result.profile.at(-1)!;
    expect(result.hardnessBasis).toMatchObject({ coreHardnessHrc: 35, coreSource: 'grade' });
    expect(deepest.hardnessHrc).toBeGreaterThanOrEqual(35);
    expect(deepest.hardnessHrc).toBeLessThan(35.5);
  });
  it('demo pinion: every profile point at or under the ceiling, and hardness follows carbon', () => {
    for (const p of result.profile) expect(p.hardnessHrc).toBeLessThanOrEqual(asQuenchedHardnessHrc(p.carbonPct));
    const byCarbon = [...result.profile].sort((a, b) => a.carbonPct - b.carbonPct);
    for (let i = 1; i < byCarbon.length; i++)
      expect(byCarbon[i]!.hardnessHrc).toBeGreaterThanOrEqual(byCarbon[i - 1]!.hardnessHrc);
  });
  it('to 50 HRC (SAE J423) with a core of 30 HRC given: the curve crosses 50 HRC at the ECD and ends at 30 HRC', () => {
    const r = simulate({
      ...pinion,
      steel: { ...pinion.steel, coreHardness: { value: 30, unit: 'HRC' } },
      ecdHardnessLimit: { value: 50, unit: 'HRC' },
    });
    expect(r.hardnessBasis).toMatchObject({ limitHrc: 50, coreHardnessHrc: 30, coreSource: 'steel' });
    expect(Math.abs(hardnessCrossingMm(r.profile, 50) - r.effectiveCaseDepthMm)).toBeLessThan(0.1 * step);
    expect(r.profile.at(-1)!.hardnessHrc).toBeLessThan(30.5);
  });
});

describe('cycle requests with hardness fields', () => {
  const fail = (request: object) => {
    const r = simulateCycle(request);
    return r.ok ? undefined : r.error;
  };
  it('refuses a core hardness not below the limit, on the field that caused it', () => {
    expect(fail({ ...pinion, steel: { ...pinion.steel, coreHardness: { value: 560, unit: 'HV' } } })).toMatchObject({
      code: 'hardness.coreNotBelowLimit',
      field: 'steel.coreHardness',
    });
    expect(fail({ ...pinion, ecdHardnessLimit: { value: 30, unit: 'HRC' } })).toMatchObject({
      code: 'hardness.coreNotBelowLimit',
      field: 'ecdHardnessLimit',
    });
  });
  it('refuses a limit or core the curve cannot draw in HRC (below 238 HV) and a wrong unit', () => {
    expect(fail({ ...pinion, ecdHardnessLimit: { value: 200, unit: 'HV' } })).toMatchObject({
      code: 'hardness.outsideScale',
      field: 'ecdHardnessLimit.value',
    });
    expect(fail({ ...pinion, steel: { ...pinion.steel, coreHardness: { value: 35, unit: 'HV' } } })).toMatchObject({
      code: 'hardness.outsideScaleOtherUnit',
      field: 'steel.coreHardness.value',
    });
    expect(fail({ ...pinion, ecdHardnessLimit: { value: 550, unit: 'HB' } })).toMatchObject({
      code: 'hardness.unknownUnit',
      field: 'ecdHardnessLimit.unit',
    });
  });
});
