/**
 * The register of approximate constants: every figure of `effect` measured again here by moving
 * the value 10 % down and up in its reference case, so the app and the README never show a figure
 * the code no longer gives. And every physics module that marks a value "from memory" or
 * "common practice" has its entry.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { APPROXIMATIONS, type ReferenceCase } from '../../src/physics/approximations';
import { caseDepth, type CaseDepthResult } from '../../src/physics/caseDepth';
import { constantSurfaceDepth } from '../../src/physics/closedForm';
import type { Recipe } from '../../src/physics/cycle/recipe';
import { runCycle } from '../../src/physics/cycle/simulate';
import { agrenDiffusivity } from '../../src/physics/diffusivity';
import { equivalentTime } from '../../src/physics/equivalentTime';
import type { Result } from '../../src/physics/result';
import { alloyFactor, type Composition } from '../../src/physics/steel';
import { celsiusToKelvin } from '../../src/physics/units';
import { sourceFiles } from '../sourceFiles';

const value = <T>(r: Result<T>): T => {
  if (!r.ok) throw new Error(r.error.code);
  return r.value;
};
const change = (moved: number, nominal: number) => 100 * (moved / nominal - 1);

/** The 20MnCr5 example: 930 °C, 8 h, Cp 0.85, core 0.20 %C. */
const composition: Composition = { Si: 0.25, Mn: 1.25, Cr: 1.15, Ni: 0, Mo: 0 };
const closedForm = { temperatureC: 930, timeH: 8, carbonPotentialPct: 0.85, coreCarbonPct: 0.2, composition };
const depth = (changes: object): CaseDepthResult => value(caseDepth({ ...closedForm, ...changes }));
const nominal = depth({});
const demoCycle = JSON.parse(readFileSync('public/examples/pinion-kr2231-cycle.json', 'utf8')) as Recipe;
const recovery = {
  history: [
    { timeH: 0, temperatureC: 890 },
    { timeH: 0.667, temperatureC: 890 },
  ],
  setTemperatureC: 925,
};

/** Each result-moving entry: its result with the value scaled by `scale`, and at scale 1. */
const MEASURE: Record<string, { reference: ReferenceCase; at: (scale: number) => number }> = {
  alloyFactor: {
    reference: 'closedForm',
    at: (s) =>
      depth({ carbonPotentialPct: undefined, surfaceCarbonPct: 0.85 * alloyFactor(composition) ** s })
        .effectiveCaseDepthMm,
  },
  gradeCompositions: {
    reference: 'closedForm',
    at: (s) => {
      const scaled = Object.fromEntries(Object.entries(composition).map(([e, pct]) => [e, pct * s]));
      return depth({ composition: scaled }).effectiveCaseDepthMm;
    },
  },
  ecdThreshold: { reference: 'closedForm', at: (s) => depth({ thresholdCarbonPct: 0.4 * s }).effectiveCaseDepthMm },
  totalCaseMargin: { reference: 'closedForm', at: (s) => depth({ totalCaseMarginPct: 0.05 * s }).totalCaseDepthMm },
  meanCarbonDiffusivity: {
    reference: 'closedForm',
    at: (s) => {
      const { surfaceCarbonPct: cs, coreCarbonPct: c0 } = nominal;
      const D = agrenDiffusivity(celsiusToKelvin(930), c0 + 0.5 * s * (cs - c0));
      return constantSurfaceDepth(8 * 3600, D, cs, c0, 0.4) * 1e3;
    },
  },
  wellsBatzMehl: { reference: 'closedForm', at: (s) => depth({ diffusivityFactor: s }).effectiveCaseDepthMm },
  beta: {
    reference: 'demoCycle',
    at: (s) =>
      runCycle({ ...demoCycle, steps: demoCycle.steps.map((step) => ({ ...step, betaMPerS: 1.5e-7 * s })) })
        .effectiveCaseDepthMm,
  },
  historyCarbon: {
    reference: 'recovery',
    at: (s) => value(equivalentTime({ ...recovery, carbonPct: 0.5 * s })).equivalentTimeH,
  },
};

describe('register of approximate constants', () => {
  const moving = APPROXIMATIONS.filter((a) => a.effect.kind === 'result');

  it('every entry that moves a figure has its measurement here, and no other', () => {
    expect(moving.map((a) => a.id).sort()).toEqual(Object.keys(MEASURE).sort());
  });

  it.each(moving.map((a) => [a.id, a] as const))('%s: ±10 % moves the result as recorded (to 0.01 %)', (id, a) => {
    if (a.effect.kind !== 'result') return;
    const { reference, at } = MEASURE[id]!;
    expect(a.effect.reference).toBe(reference);
    const base = at(1);
    expect(change(at(0.9), base)).toBeCloseTo(a.effect.minusPct, 2);
    expect(change(at(1.1), base)).toBeCloseTo(a.effect.plusPct, 2);
  });

  it('the nominal reference case is the issue’s 20MnCr5 example: surface 0.95 %C, ECD 1.08 mm', () => {
    expect(nominal.surfaceCarbonPct).toBeCloseTo(0.9504, 4);
    expect(nominal.effectiveCaseDepthMm).toBeCloseTo(1.0827, 4);
  });

  it('the README’s table shows the recorded figures', () => {
    const readme = readFileSync('README.md', 'utf8');
    const pct = (x: number) => `${x > 0 ? '+' : '−'}${Math.abs(x).toFixed(2)} %`;
    for (const a of moving) {
      if (a.effect.kind !== 'result') continue;
      expect(readme, a.id).toContain(`${pct(a.effect.minusPct)} / ${pct(a.effect.plusPct)}`);
    }
  });

  it('every physics module that marks a value "from memory" or "common practice" has an entry', () => {
    // Methods and rules with no value of their own, or values listed under the module that holds them.
    const noValue: Record<string, string> = {
      'src/physics/closedForm.ts': 'the √(Dt) rule is a method, not a value',
      'src/physics/conversions.ts': 'refers to the HRC ↔ HV table of hardness.ts',
      'src/physics/approximations.ts': 'the register itself',
      'src/physics/equivalentTime.ts':
        'the equivalent-time rule is a method; its default carbon is listed under requestTables.ts',
    };
    const marked = sourceFiles('src/physics').filter((file) =>
      /from memory|common practice/iu.test(readFileSync(file, 'utf8')),
    );
    expect(marked.length).toBeGreaterThan(8);
    const listed = new Set(APPROXIMATIONS.map((a) => `src/${a.usedIn.split(' ')[0]}`));
    expect(marked.filter((file) => !listed.has(file) && !(file in noValue))).toEqual([]);
  });
});
