import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { caseDepth, temperatureForCaseDepth, timeForCaseDepth } from '../../src/physics/caseDepth';
import { convertRequest } from '../../src/physics/conversions';
import { equivalentTime } from '../../src/physics/equivalentTime';
import { ERROR_CODES, type Result } from '../../src/physics/result';
import { allFinite } from './allFinite';

const base = { temperatureC: 925, timeH: 6, surfaceCarbonPct: 0.9, coreCarbonPct: 0.2 };
const history = [
  { timeH: 0, temperatureC: 925 },
  { timeH: 1, temperatureC: 925 },
];

const cases: [string, () => Result<unknown>, string, string?][] = [
  ['request is not an object', () => caseDepth('925'), 'request.notObject'],
  ['request is an array', () => caseDepth([925]), 'request.notObject'],
  ['missing time', () => caseDepth({ ...base, timeH: undefined }), 'field.missing', 'timeH'],
  ['time given as a word', () => caseDepth({ ...base, timeH: 'six' }), 'number.invalid', 'timeH'],
  ['time as an object', () => caseDepth({ ...base, timeH: { h: 6 } }), 'field.notNumber', 'timeH'],
  ['time ≤ 0', () => caseDepth({ ...base, timeH: 0 }), 'time.notPositive', 'timeH'],
  ['time over 1000 h', () => caseDepth({ ...base, timeH: 5000 }), 'time.tooLong', 'timeH'],
  // No austenite at or below A1 = 727 °C (Fe–Fe₃C eutectoid): every calculator refuses in words.
  ['depth at 700 °C', () => caseDepth({ ...base, temperatureC: 700 }), 'temperature.noAustenite', 'temperatureC'],
  [
    'depth at exactly 727 °C',
    () => caseDepth({ ...base, temperatureC: 727 }),
    'temperature.noAustenite',
    'temperatureC',
  ],
  ['depth at 20 °C', () => caseDepth({ ...base, temperatureC: 20 }), 'temperature.noAustenite', 'temperatureC'],
  [
    'time at 700 °C',
    () => timeForCaseDepth({ ...base, temperatureC: 700, targetDepthMm: 0.5 }),
    'temperature.noAustenite',
    'temperatureC',
  ],
  [
    'equivalent time with a set temperature of 720 °C',
    () => equivalentTime({ history, setTemperatureC: 720 }),
    'temperature.noAustenite',
    'setTemperatureC',
  ],
  [
    'temperature above 1150 °C',
    () => caseDepth({ ...base, temperatureC: 1200 }),
    'temperature.outOfRange',
    'temperatureC',
  ],
  ['temperature infinite', () => caseDepth({ ...base, temperatureC: Infinity }), 'field.notNumber', 'temperatureC'],
  ['negative core carbon', () => caseDepth({ ...base, coreCarbonPct: -0.1 }), 'carbon.negative', 'coreCarbonPct'],
  ['carbon above 2.11 %', () => caseDepth({ ...base, surfaceCarbonPct: 2.5 }), 'carbon.aboveMax', 'surfaceCarbonPct'],
  [
    'surface not above core',
    () => caseDepth({ ...base, surfaceCarbonPct: 0.2 }),
    'carbon.surfaceNotAboveCore',
    'surfaceCarbonPct',
  ],
  [
    'no surface carbon nor potential',
    () => caseDepth({ ...base, surfaceCarbonPct: undefined }),
    'field.missing',
    'surfaceCarbonPct',
  ],
  [
    'threshold above surface',
    () => caseDepth({ ...base, thresholdCarbonPct: 0.95 }),
    'threshold.outsideProfile',
    'thresholdCarbonPct',
  ],
  [
    'threshold below core',
    () => caseDepth({ ...base, thresholdCarbonPct: 0.1 }),
    'threshold.outsideProfile',
    'thresholdCarbonPct',
  ],
  [
    'diffusivity factor out of range',
    () => caseDepth({ ...base, diffusivityFactor: 0 }),
    'diffusivityFactor.outOfRange',
    'diffusivityFactor',
  ],
  [
    'temperature tolerance out of range',
    () => caseDepth({ ...base, temperatureToleranceC: -2 }),
    'temperatureTolerance.outOfRange',
    'temperatureToleranceC',
  ],
  [
    'total-case margin not above 0',
    () => caseDepth({ ...base, totalCaseMarginPct: 0 }),
    'totalCaseMargin.outOfRange',
    'totalCaseMarginPct',
  ],
  ['unknown model', () => caseDepth({ ...base, model: 'fick' }), 'model.unknown', 'model'],
  [
    'unknown element',
    () => caseDepth({ ...base, composition: { V: 0.1 } }),
    'composition.unknownElement',
    'composition.V',
  ],
  [
    'alloy content out of range',
    () => caseDepth({ ...base, composition: { Cr: 12 } }),
    'composition.outOfRange',
    'composition.Cr',
  ],
  ['target depth ≤ 0', () => timeForCaseDepth({ ...base, targetDepthMm: -1 }), 'depth.notPositive', 'targetDepthMm'],
  ['target depth over 10 mm', () => timeForCaseDepth({ ...base, targetDepthMm: 40 }), 'depth.tooDeep', 'targetDepthMm'],
  [
    'time solve over 1000 h',
    () => timeForCaseDepth({ ...base, temperatureC: 800, targetDepthMm: 9 }),
    'time.tooLong',
    'targetDepthMm',
  ],
  [
    'temperature unreachable (too hot needed)',
    () => temperatureForCaseDepth({ ...base, timeH: 0.5, targetDepthMm: 5 }),
    'solve.temperatureAboveRange',
  ],
  [
    'temperature unreachable (too cold needed)',
    () => temperatureForCaseDepth({ ...base, timeH: 100, targetDepthMm: 0.1 }),
    'solve.temperatureBelowRange',
  ],
  ['blank number text', () => caseDepth({ ...base, timeH: '  ' }), 'field.missing', 'timeH'],
  ['unknown unit', () => convertRequest({ value: 1, from: 'cubit' }), 'unit.unknown', 'from'],
  ['unit of another quantity', () => convertRequest({ value: 1, from: 'mm', to: 'h' }), 'unit.unknown', 'to'],
  ['below absolute zero', () => convertRequest({ value: -500, from: 'F', to: 'C' }), 'temperature.belowAbsoluteZero'],
  ['hardness off the table', () => convertRequest({ value: 70, from: 'HRC', to: 'HV' }), 'hardness.outOfTable'],
  [
    'history with one reading',
    () => equivalentTime({ history: history.slice(0, 1), setTemperatureC: 925 }),
    'history.tooShort',
    'history',
  ],
  [
    'history going back in time',
    () => equivalentTime({ history: [...history].reverse(), setTemperatureC: 925 }),
    'history.notIncreasing',
    'history.1.timeH',
  ],
  [
    'history reading too hot',
    () => equivalentTime({ history: [history[0], { timeH: 1, temperatureC: 1300 }], setTemperatureC: 925 }),
    'history.temperatureTooHigh',
    'history.1.temperatureC',
  ],
  [
    'history with no elapsed time',
    () => equivalentTime({ history: [history[0], history[0]], setTemperatureC: 925 }),
    'time.notPositive',
    'history',
  ],
  [
    'history entry not an object',
    () => equivalentTime({ history: [1, 2], setTemperatureC: 925 }),
    'request.notObject',
    'history.0',
  ],
  [
    'required soak ≤ 0',
    () => equivalentTime({ history, setTemperatureC: 925, requiredTimeH: 0 }),
    'time.notPositive',
    'requiredTimeH',
  ],
];

describe('every error path returns its key and field', () => {
  it.each(cases)('%s', (_, run, code, field) => {
    const r = run();
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.code).toBe(code);
    if (field !== undefined) expect(r.error.field).toBe(field);
    expect(ERROR_CODES).toContain(r.error.code);
  });
});

const wildNumber = fc.oneof(
  fc.double(),
  fc.integer(),
  fc.constantFrom(0, -1, 1e308, -1e308, Number.MIN_VALUE, NaN, Infinity, -Infinity),
  fc.string(),
  fc.constantFrom('0,8', '925', '1e400', '-0', ''),
  fc.constant(null),
  fc.constant(undefined),
  fc.boolean(),
  fc.object(),
);
const wildRequest = fc.record(
  {
    temperatureC: wildNumber,
    timeH: wildNumber,
    targetDepthMm: wildNumber,
    surfaceCarbonPct: wildNumber,
    carbonPotentialPct: wildNumber,
    coreCarbonPct: wildNumber,
    thresholdCarbonPct: wildNumber,
    diffusivityFactor: wildNumber,
    temperatureToleranceC: wildNumber,
    totalCaseMarginPct: wildNumber,
    model: fc.oneof(fc.constantFrom('agren', 'tibbetts', 'wells-batz-mehl'), fc.string(), wildNumber),
    composition: fc.oneof(
      fc.constant(undefined),
      fc.dictionary(fc.constantFrom('Si', 'Mn', 'Cr', 'Ni', 'Mo', 'X'), wildNumber),
    ),
    value: wildNumber,
    from: fc.oneof(fc.constantFrom('C', 'F', 'mm', 'in', 'HRC', 'HV', 'm2/s'), fc.string()),
    to: fc.oneof(fc.constantFrom('K', 'R', 'thou', 'HV', 'HRC', 'in2/h'), fc.string()),
    setTemperatureC: wildNumber,
    requiredTimeH: wildNumber,
    history: fc.oneof(fc.array(fc.record({ timeH: wildNumber, temperatureC: wildNumber })), wildNumber),
  },
  { requiredKeys: [] },
);

describe('wild input never throws and never yields NaN or Infinity', () => {
  const entries = { caseDepth, timeForCaseDepth, temperatureForCaseDepth, convertRequest, equivalentTime };
  it.each(Object.entries(entries))('%s', (_, run) => {
    fc.assert(
      fc.property(fc.oneof(wildRequest, wildNumber, fc.array(wildNumber)), (request) => {
        const r = run(request);
        if (r.ok) expect(allFinite(r.value)).toBe(true);
        else expect(ERROR_CODES).toContain(r.error.code);
      }),
      { numRuns: 1500 },
    );
  });
});

describe('a refused value is quoted as the user gave it, never as "[object Object]"', () => {
  it('an object where a unit or model name belongs is shown as JSON', () => {
    expect(convertRequest({ value: 1, from: { unit: 'C' } })).toMatchObject({
      ok: false,
      error: { code: 'unit.unknown', params: { unit: '{"unit":"C"}' } },
    });
    expect(caseDepth({ ...base, model: ['agren'] })).toMatchObject({
      ok: false,
      error: { code: 'model.unknown', params: { model: '["agren"]' } },
    });
  });

  it('a long value is cut to 40 characters', () => {
    const r = convertRequest({ value: 1, from: 'x'.repeat(100) });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.params?.unit).toBe(`${'x'.repeat(39)}…`);
  });
});
