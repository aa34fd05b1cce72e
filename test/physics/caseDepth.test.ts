import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createI18n, warningMessage } from '../../src/i18n/i18n';
import {
  caseDepth,
  TEMPERATURE_SEARCH_C,
  temperatureForCaseDepth,
  timeForCaseDepth,
} from '../../src/physics/caseDepth';
import { EUTECTOID_TEMP_C } from '../../src/physics/steel';
import type { Result } from '../../src/physics/result';
import pinion from '../../public/examples/pinion-kr2231-depth.json';

const value = <T>(r: Result<T>): T => {
  if (!r.ok) throw new Error(`expected ok, got ${r.error.code}`);
  return r.value;
};
const base = { temperatureC: 925, timeH: 6, surfaceCarbonPct: 0.9, coreCarbonPct: 0.2 };

describe('depth: the demo pinion KR-2231 (SAE 8620, 925 °C, 6 h, 0.90/0.20 %C)', () => {
  const r = value(caseDepth(pinion));
  it('effective case depth lies between 0.7 and 1.0 mm, with the three-model range around it', () => {
    expect(r.effectiveCaseDepthMm).toBeGreaterThan(0.7);
    expect(r.effectiveCaseDepthMm).toBeLessThan(1.0);
    expect(r.modelRangeMm.min).toBeLessThanOrEqual(r.effectiveCaseDepthMm);
    expect(r.modelRangeMm.max).toBeGreaterThanOrEqual(r.effectiveCaseDepthMm);
    expect(r.modelRangeMm.max - r.modelRangeMm.min).toBeGreaterThan(0);
  });
  it('regression pin (the same formula, evaluated by hand): ECD = 2√(Dt)·erfc⁻¹(θ), θ = 0.2/0.7, erfc⁻¹(θ) = 0.7549, √(Dt) = 0.5721 mm → 0.864 mm', () => {
    expect(r.sqrtDtMm).toBeCloseTo(0.5721, 4);
    expect(r.effectiveCaseDepthMm).toBeCloseTo(0.8637, 4);
  });
  it('total case (core + 0.05 %C, common practice) is deeper than ECD and within the Harris saturation bound', () => {
    expect(r.totalCaseThresholdPct).toBeCloseTo(0.25, 12);
    expect(r.totalCaseDepthMm).toBeGreaterThan(r.effectiveCaseDepthMm);
    expect(r.harrisDepthMm).toBeGreaterThan(r.totalCaseDepthMm * 0.8);
  });
  it('±10 °C brackets the depth', () => {
    expect(r.temperatureSensitivity.minusMm).toBeLessThan(r.effectiveCaseDepthMm);
    expect(r.temperatureSensitivity.plusMm).toBeGreaterThan(r.effectiveCaseDepthMm);
  });
  it('raises no caution at 0.90 %C and 925 °C', () => {
    expect(r.warnings).toEqual([]);
  });
});

describe('carbon potential and the alloy factor', () => {
  // The factor once ran the wrong way (0.894 for 20MnCr5); 1.1181 is the Gunnarson formula's own check value.
  it('a potential gives the surface carbon Cp × alloy factor: 20MnCr5 at Cp 0.85 takes 0.950 %C (factor 1.1181)', () => {
    const composition = { Cr: 1.15, Mn: 1.25, Si: 0.25 };
    const request = { temperatureC: 930, timeH: 8, carbonPotentialPct: 0.85, coreCarbonPct: 0.2, composition };
    const r = value(caseDepth(request));
    expect(r.alloyFactor).toBeCloseTo(1.1181, 4);
    expect(r.surfaceCarbonPct).toBeCloseTo(0.85 * r.alloyFactor, 12);
    expect(r.surfaceCarbonPct).toBeCloseTo(0.95, 2);
    // The same potential on plain carbon steel holds the surface at 0.85 %C: the chromium steel's case is deeper.
    const plain = value(caseDepth({ ...request, composition: undefined }));
    expect(r.effectiveCaseDepthMm).toBeGreaterThan(plain.effectiveCaseDepthMm);
  });
  it('a surface carbon given with a composition implies the potential surface / factor (it feeds the soot caution)', () => {
    const composition = { Cr: 1.15, Mn: 1.25, Si: 0.25 };
    const r = value(caseDepth({ ...base, surfaceCarbonPct: 0.95, composition }));
    expect(r.carbonPotentialPct).toBeCloseTo(0.95 / 1.1181, 4);
  });
  it('a chromium steel whose factor lifts Cp × factor above saturation gets the saturation caution, saying the line is for plain carbon steel', () => {
    // 20MnCr5 at 930 °C, Cp 1.2: surface 1.2 × 1.1181 = 1.342 %C against Acm 1.284 %C; the potential itself is below it.
    const composition = { Cr: 1.15, Mn: 1.25, Si: 0.25 };
    const request = { temperatureC: 930, timeH: 4, carbonPotentialPct: 1.2, coreCarbonPct: 0.2, composition };
    const codes = value(caseDepth(request)).warnings.map((w) => w.code);
    expect(codes).toContain('saturation.surfaceAboveAcm');
    expect(codes).not.toContain('saturation.potentialAboveAcm');
    expect(value(caseDepth({ ...request, composition: undefined })).warnings.map((w) => w.code)).not.toContain(
      'saturation.surfaceAboveAcm',
    );
    const { t } = createI18n('en');
    const caution = value(caseDepth(request)).warnings.find((w) => w.code === 'saturation.surfaceAboveAcm')!;
    expect(warningMessage(t, caution)).toMatch(/plain carbon steel; chromium steels form carbides at lower carbon/);
  });
  it('warns when the potential or the surface is above saturation (soot, carbides)', () => {
    const r = value(caseDepth({ ...base, temperatureC: 850, surfaceCarbonPct: 1.2 }));
    expect(r.warnings.map((w) => w.code)).toEqual(
      expect.arrayContaining([
        'saturation.potentialAboveAcm',
        'saturation.surfaceAboveAcm',
        'hardness.retainedAustenite',
      ]),
    );
  });
  it('cautions a carburizing atmosphere below 760 °C (common practice, NFPA 86)', () => {
    const r = value(caseDepth({ ...base, temperatureC: 740, surfaceCarbonPct: 0.7 }));
    expect(r.warnings.map((w) => w.code)).toContain('safety.atmosphereBelowSafeTemperature');
  });
});

const arbitraryCase = fc.record({
  temperatureC: fc.double({ min: 850, max: 1050, noNaN: true }),
  timeH: fc.double({ min: 0.5, max: 40, noNaN: true }),
  surfaceCarbonPct: fc.double({ min: 0.6, max: 1.2, noNaN: true }),
  coreCarbonPct: fc.double({ min: 0.1, max: 0.3, noNaN: true }),
});
const ecd = (req: object) => value(caseDepth(req)).effectiveCaseDepthMm;

describe('properties', () => {
  it('depth grows with time, temperature and surface carbon', () => {
    fc.assert(
      fc.property(arbitraryCase, (c) => {
        const d = ecd(c);
        expect(ecd({ ...c, timeH: c.timeH * 1.1 })).toBeGreaterThan(d);
        expect(ecd({ ...c, temperatureC: c.temperatureC + 5 })).toBeGreaterThan(d);
        expect(ecd({ ...c, surfaceCarbonPct: c.surfaceCarbonPct + 0.05 })).toBeGreaterThan(d);
      }),
    );
  });
  it('4× time gives 2× depth', () => {
    fc.assert(
      fc.property(arbitraryCase, (c) => {
        expect(ecd({ ...c, timeH: 4 * c.timeH }) / ecd(c)).toBeCloseTo(2, 10);
      }),
    );
  });
  it('time(depth(t)) = t to 1e-6 relative', () => {
    fc.assert(
      fc.property(arbitraryCase, (c) => {
        const { timeH, ...rest } = c;
        const solved = value(timeForCaseDepth({ ...rest, targetDepthMm: ecd(c) }));
        expect(Math.abs(solved.timeH / timeH - 1)).toBeLessThan(1e-6);
        expect(solved.modelRangeH.min).toBeLessThanOrEqual(solved.timeH * (1 + 1e-12));
        expect(solved.modelRangeH.max).toBeGreaterThanOrEqual(solved.timeH * (1 - 1e-12));
      }),
    );
  });
  it('temperature(depth(T)) = T to 1e-6 relative', () => {
    fc.assert(
      fc.property(
        arbitraryCase.filter((c) => c.temperatureC < 1095),
        (c) => {
          const { temperatureC, ...rest } = c;
          const solved = value(temperatureForCaseDepth({ ...rest, targetDepthMm: ecd(c) }));
          expect(Math.abs(solved.temperatureC / temperatureC - 1)).toBeLessThan(1e-6);
        },
      ),
    );
  });
});

describe('total-case margin', () => {
  it('defaults to core + 0.05 %C (common practice); a wider margin gives a shallower total case', () => {
    const standard = value(caseDepth(base));
    const wide = value(caseDepth({ ...base, totalCaseMarginPct: 0.1 }));
    expect(standard.totalCaseThresholdPct).toBeCloseTo(0.25, 12);
    expect(wide.totalCaseThresholdPct).toBeCloseTo(0.3, 12);
    expect(wide.totalCaseDepthMm).toBeLessThan(standard.totalCaseDepthMm);
    expect(wide.effectiveCaseDepthMm).toBe(standard.effectiveCaseDepthMm);
  });
  it('a margin reaching the surface carbon leaves no total case', () => {
    expect(value(caseDepth({ ...base, totalCaseMarginPct: 0.8 })).totalCaseDepthMm).toBe(0);
  });
});

describe('furnace calibration factor on D', () => {
  it('a factor k scales the closed-form depth by √k', () => {
    const plain = ecd(base);
    expect(ecd({ ...base, diffusivityFactor: 1.21 }) / plain).toBeCloseTo(1.1, 12);
    expect(value(caseDepth({ ...base, diffusivityFactor: 1.21 })).diffusivityFactor).toBe(1.21);
  });
});

describe('no austenite, no answer (A1 = 727 °C, Fe–Fe₃C eutectoid)', () => {
  it.each([700, 727, 500])('depth at %s °C is refused in words, not answered', (temperatureC) => {
    expect(caseDepth({ ...base, temperatureC })).toMatchObject({
      ok: false,
      error: { code: 'temperature.noAustenite', field: 'temperatureC', params: { value: temperatureC, min: 727 } },
    });
  });
  it('the temperature solve searches above A1 only, so its answer always has austenite', () => {
    expect(TEMPERATURE_SEARCH_C.min).toBeGreaterThan(EUTECTOID_TEMP_C);
    fc.assert(
      fc.property(arbitraryCase, (c) => {
        const { temperatureC: _, ...rest } = c;
        const solved = temperatureForCaseDepth({ ...rest, targetDepthMm: ecd(c) * 0.2 });
        if (solved.ok) expect(solved.value.temperatureC).toBeGreaterThan(EUTECTOID_TEMP_C);
        else expect(solved.error.code).toBe('solve.temperatureBelowRange');
      }),
      { numRuns: 50 },
    );
  });
  it('just above A1 the cooler band and ±10 °C cases fall to no austenite: depth 0, not a depth from the models', () => {
    const r = value(caseDepth({ ...base, temperatureC: 732 }));
    expect(r.temperatureSensitivity.minusMm).toBe(0);
    expect(r.uncertaintyMm.minMm).toBe(0);
    expect(r.effectiveCaseDepthMm).toBeGreaterThan(0);
  });
  it('between A1 and the core’s Ac3 (Andrews 1965: 819 °C for plain 0.20 %C) carburizing gets the two-phase caution', () => {
    const codes = (temperatureC: number) => value(caseDepth({ ...base, temperatureC })).warnings.map((w) => w.code);
    expect(codes(800)).toContain('austenite.twoPhaseCore');
    expect(codes(825)).not.toContain('austenite.twoPhaseCore');
    const caution = value(caseDepth({ ...base, temperatureC: 800 })).warnings.find(
      (w) => w.code === 'austenite.twoPhaseCore',
    );
    expect(caution?.params).toEqual({ tempC: 800, ac3C: 819 });
  });
});

describe('temperature solve: nothing in 800–1100 °C reaches the target', () => {
  it('too deep for the time: says more time is needed', () => {
    const r = temperatureForCaseDepth({ ...base, timeH: 1, targetDepthMm: 3 });
    expect(r).toMatchObject({ ok: false, error: { code: 'solve.temperatureAboveRange', field: 'targetDepthMm' } });
  });
  it('too shallow for the time: says to shorten it', () => {
    const r = temperatureForCaseDepth({ ...base, timeH: 40, targetDepthMm: 0.2 });
    expect(r).toMatchObject({ ok: false, error: { code: 'solve.temperatureBelowRange' } });
  });
});
