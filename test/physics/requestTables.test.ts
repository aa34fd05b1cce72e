/**
 * The request tables and limits physics publishes: every range written once with one unit per
 * error code, every number of a request checked against one of them, and the units of the
 * figures an error or a warning carries.
 */
import { describe, expect, it } from 'vitest';
import { checkLimit, LIMITS, withinLimit, type Limit } from '../../src/physics/limits';
import { paramUnit } from '../../src/physics/paramUnits';
import { readRequest, specAt, type FieldSpec, type FieldsSpec } from '../../src/physics/requestSpec';
import { CONVERT_REQUEST } from '../../src/physics/requestTables';
import { REQUESTS } from '../../src/physics/requests';

/** Every number spec of a request with its path. */
function numbers(spec: FieldsSpec, prefix = ''): [string, FieldSpec][] {
  return Object.entries(spec).flatMap(([name, field]): [string, FieldSpec][] => {
    const path = `${prefix}${name}`;
    if (field.type === 'number') return [[path, field]];
    if (field.type === 'object') return numbers(field.fields, `${path}.`);
    if (field.type === 'list' && field.item.type === 'object') return numbers(field.item.fields, `${path}.0.`);
    if (field.type === 'variant') return Object.values(field.options).flatMap((o) => numbers(o, `${path}.`));
    return [];
  });
}

describe('limits', () => {
  it('an error code used by several limits stands for one unit (its message is worded once)', () => {
    const unitOf = new Map<string, string>();
    for (const limit of Object.values(LIMITS) as Limit[]) {
      for (const code of [limit.below, limit.above]) {
        expect(unitOf.get(code) ?? limit.unit, code).toBe(limit.unit);
        unitOf.set(code, limit.unit);
      }
    }
    expect(unitOf.size).toBeGreaterThan(10);
  });

  it('an excluded end is refused with the code of its side; an included one is accepted', () => {
    expect(checkLimit(LIMITS.time, 0, 'timeH')).toMatchObject({ ok: false, error: { code: 'time.notPositive' } });
    expect(checkLimit(LIMITS.time, LIMITS.time.max, 'timeH').ok).toBe(true);
    expect(checkLimit(LIMITS.temperature, 727, 't')).toMatchObject({
      ok: false,
      error: { code: 'temperature.noAustenite', field: 't', params: { value: 727, min: 727, max: 1150 } },
    });
    expect(checkLimit(LIMITS.temperature, 1150.5, 't')).toMatchObject({ error: { code: 'temperature.outOfRange' } });
    expect(withinLimit(LIMITS.stepTemperature, 0)).toBe(true);
  });

  it('every number of every request but the convert value is checked against a limit', () => {
    const unlimited = Object.entries(REQUESTS).flatMap(([name, spec]) =>
      numbers(spec)
        .filter(([, field]) => field.type === 'number' && field.limit === undefined)
        .map(([path]) => `${name} ${path}`),
    );
    expect(unlimited).toEqual(['convert value']);
    expect(numbers(REQUESTS.plan).length).toBeGreaterThan(15);
  });
});

describe('reading by the description', () => {
  it('finds the description of a nested path: a step, a shape size, an alloying element', () => {
    expect(specAt(REQUESTS.simulate, 'steps.3.durationH')).toMatchObject({ type: 'number', limit: LIMITS.time });
    expect(specAt(REQUESTS.simulate, 'shape.diameterMm')).toMatchObject({ limit: LIMITS.shapeSize });
    expect(specAt(REQUESTS.simulate, 'steel.composition.Cr')).toMatchObject({ limit: LIMITS.alloyElement });
    expect(specAt(REQUESTS.simulate, 'steps.x.durationH')).toBeUndefined();
    expect(specAt(REQUESTS.depth, 'nothing')).toBeUndefined();
  });

  it('an item of a list is named in its error (`Reading {{index}}`), from 0 as the path counts', () => {
    const history = [
      { timeH: 0, temperatureC: 900 },
      { timeH: 1, temperatureC: 1400 },
    ];
    expect(readRequest(REQUESTS['equivalent-time'], { history, setTemperatureC: 925 })).toMatchObject({
      ok: false,
      error: { code: 'history.temperatureTooHigh', field: 'history.1.temperatureC', params: { index: 1, max: 1150 } },
    });
  });

  it('a choice not among its options is named in the error; one left out takes its default or is required', () => {
    expect(readRequest(CONVERT_REQUEST, { value: 1, from: 'furlong' })).toMatchObject({
      ok: false,
      error: { code: 'unit.unknown', field: 'from', params: { unit: 'furlong' } },
    });
    expect(readRequest(CONVERT_REQUEST, { value: 1 })).toMatchObject({
      ok: false,
      error: { code: 'field.missing', field: 'from' },
    });
  });
});

describe('the unit of each figure of an error or a warning', () => {
  it('a range error’s value, min and max take its limit’s unit; a time answer too long is in hours though placed on the depth', () => {
    expect(paramUnit('temperature.outOfRange', 'max', 'steps.0.startTempC')).toBe('C');
    expect(paramUnit('time.tooLong', 'value', 'targetDepthMm')).toBe('h');
    expect(paramUnit('temperatureTolerance.outOfRange', 'value')).toBe('dC');
    expect(paramUnit('composition.outOfRange', 'max', 'composition.Cr')).toBe('%');
  });
  it('other figures by their names, a change of temperature as a difference; a range of no one unit by its field', () => {
    expect(paramUnit('shape.throughCarburizing', 'depthMm')).toBe('mm');
    expect(paramUnit('plan.raiseTemperature', 'deltaC')).toBe('dC');
    expect(paramUnit('plan.outOfReach', 'maxTotalH')).toBe('h');
    expect(paramUnit('saturation.potentialAboveAcm', 'limitPct')).toBe('%C');
    expect(paramUnit('range.minAboveMax', 'min', 'targetEcdMm.max')).toBe('mm');
    expect(paramUnit('range.minAboveMax', 'min', 'betaRangeMax')).toBeUndefined();
    expect(paramUnit('hardness.outsideScale', 'value', 'steel.coreHardness.value')).toBeUndefined();
    expect(paramUnit('steps.tooMany', 'count')).toBeUndefined();
  });
});
