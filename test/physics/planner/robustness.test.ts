/** Wild `plan` requests: nothing throws, errors carry known codes, results hold only finite numbers and known codes. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_BOOST_SHARE, planTwoStepCycle, TIME_ROUNDING_H } from '../../../src/physics/planner/planner';
import { ERROR_CODES, WARNING_CODES } from '../../../src/physics/result';
import { allFinite } from '../allFinite';
import { expectPossible } from './fixtures';

const wildNumber = fc.oneof(
  fc.double(),
  fc.double({ min: -10, max: 2000, noNaN: true }),
  fc.constantFrom(
    0,
    -1,
    1e308,
    Number.MIN_VALUE,
    NaN,
    Infinity,
    -Infinity,
    '0,8',
    '925',
    '1e400',
    '',
    'abc',
    null,
    true,
  ),
  fc.object(),
);

const wildStep = fc.oneof(
  fc.record({ temperatureC: wildNumber, carbonPotentialPct: wildNumber, betaMPerS: wildNumber }, { requiredKeys: [] }),
  fc.anything(),
);
const wildRange = fc.oneof(fc.record({ min: wildNumber, max: wildNumber }, { requiredKeys: [] }), fc.anything());

const wildRequest = fc.record(
  {
    name: fc.anything(),
    steel: fc.oneof(
      fc.record({ coreCarbonPct: wildNumber, composition: fc.anything(), grade: fc.anything() }, { requiredKeys: [] }),
      fc.anything(),
    ),
    model: fc.oneof(fc.constantFrom('agren', 'tibbetts', 'wells-batz-mehl'), fc.string(), wildNumber),
    thresholdCarbonPct: wildNumber,
    shape: fc.anything(),
    boost: wildStep,
    diffuse: wildStep,
    hardening: fc.oneof(
      fc.constant(undefined),
      fc.record({ temperatureC: wildNumber, timeH: wildNumber }, { requiredKeys: [] }),
      fc.anything(),
    ),
    targetEcdMm: wildRange,
    targetSurfaceCarbonPct: wildRange,
    diffusivityFactor: wildNumber,
    maxTotalH: wildNumber,
  },
  { requiredKeys: [] },
);

/** Requests inside every accepted range (edges included), so they reach the search. */
const inRange = (min: number, max: number) => fc.double({ min, max, noNaN: true });
/** Carburizing temperatures accepted: above A1 (727 °C) up to 1150 °C. */
const aboveA1 = fc.double({ min: 727, max: 1150, minExcluded: true, noNaN: true });
const sortedPair = (min: number, max: number) =>
  fc.tuple(inRange(min, max), inRange(min, max)).map(([a, b]) => ({ min: Math.min(a, b), max: Math.max(a, b) }));
const validRequest = fc.record({
  steel: fc.record({
    coreCarbonPct: inRange(0, 0.35),
    composition: fc.option(
      fc.record({ Si: inRange(0, 10), Mn: inRange(0, 10), Cr: inRange(0, 10), Ni: inRange(0, 10), Mo: inRange(0, 10) }),
      { nil: undefined },
    ),
  }),
  model: fc.constantFrom('agren', 'tibbetts', 'wells-batz-mehl'),
  shape: fc.oneof(
    fc.constant({ kind: 'semi-infinite' }),
    fc.record({ kind: fc.constant('plate'), thicknessMm: inRange(0.1, 1000) }),
    fc.record({ kind: fc.constant('bar'), diameterMm: inRange(0.1, 1000) }),
  ),
  boost: fc.record({
    temperatureC: aboveA1,
    carbonPotentialPct: inRange(1, 2.11),
    betaMPerS: inRange(1e-12, 1e3),
  }),
  diffuse: fc.record({
    temperatureC: aboveA1,
    carbonPotentialPct: inRange(0, 0.99),
    betaMPerS: inRange(1e-12, 1e3),
  }),
  hardening: fc.option(fc.record({ temperatureC: inRange(0, 1150), timeH: inRange(0.01, 5) }), { nil: undefined }),
  targetEcdMm: sortedPair(0.001, 10),
  targetSurfaceCarbonPct: sortedPair(0.41, 2.11),
  diffusivityFactor: inRange(0.1, 10),
  maxTotalH: inRange(6, 1000),
});

describe('planTwoStepCycle on wild input', () => {
  it('never throws; errors carry known codes; results are finite', () => {
    fc.assert(
      fc.property(fc.oneof(wildRequest, fc.anything()), (request) => {
        const result = planTwoStepCycle(request);
        if (result.ok) expect(allFinite(result.value)).toBe(true);
        else expect(ERROR_CODES).toContain(result.error.code);
      }),
      { numRuns: 1000 },
    );
  });

  it('requests at the edges of every accepted range give a finite plan with known codes, within the time limit, or a typed error; every suggestion stays possible', () => {
    const checked = new Map<string, number>();
    fc.assert(
      fc.property(validRequest, (request) => {
        const result = planTwoStepCycle(request);
        if (!result.ok) {
          // Only the cross-checks can still reject these.
          expect([
            'threshold.notAboveCore',
            'threshold.outsideProfile',
            'depth.tooDeep',
            'solve.noConvergence',
          ]).toContain(result.error.code);
          return;
        }
        const v = result.value;
        expect(allFinite(v)).toBe(true);
        // The times are what the recipe runs: on the 0.001 h grid, summing to the total, the diffuse
        // step at least a tenth of the carburizing time (less the two roundings, and the step back
        // to stay within the limit), the whole within the limit.
        const onGrid = (h: number) => Math.abs(h / TIME_ROUNDING_H - Math.round(h / TIME_ROUNDING_H)) < 1e-6;
        expect(onGrid(v.boostH) && onGrid(v.diffuseH)).toBe(true);
        expect(v.diffuseH).toBeGreaterThanOrEqual(
          (1 - MAX_BOOST_SHARE) * (v.boostH + v.diffuseH) - 3 * TIME_ROUNDING_H,
        );
        expect(v.totalH).toBeCloseTo(v.boostH + v.diffuseH + v.hardeningH, 9);
        const stepH = (label: string) => v.recipe.steps.find((step) => step.label === label)?.durationH ?? 0;
        expect([stepH('boost'), stepH('diffuse')]).toEqual([v.boostH, v.diffuseH]);
        expect(v.totalH).toBeLessThanOrEqual(request.maxTotalH + 1e-9);
        for (const w of [...v.warnings, ...v.suggestions, ...(v.binding ? [v.binding] : [])])
          expect(WARNING_CODES).toContain(w.code);
        expect(v.reachable).toBe(v.binding === undefined);
        // Out of reach, something is always said: a possible change, or that none is (a final-check miss says to widen the targets).
        if (!v.reachable && v.binding?.code !== 'plan.missedInFinalCheck')
          expect(v.suggestions.length).toBeGreaterThan(0);
        for (const suggestion of v.suggestions)
          if (expectPossible(request, suggestion))
            checked.set(suggestion.code, (checked.get(suggestion.code) ?? 0) + 1);
      }),
      { numRuns: 300 },
    );
    // The property met suggestions of several kinds, so it had something to check.
    expect(checked.size).toBeGreaterThanOrEqual(3);
  });
});
