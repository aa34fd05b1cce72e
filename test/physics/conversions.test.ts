import { describe, expect, it } from 'vitest';
import { convertRequest } from '../../src/physics/conversions';

describe('convert request', () => {
  it('converts one value into every unit of its quantity (NIST SP 811 factors)', () => {
    const r = convertRequest({ value: 925, from: 'C' });
    expect(r.ok && r.value.values).toEqual({
      C: 925,
      F: expect.closeTo(1697, 9),
      K: 1198.15,
      R: expect.closeTo(2156.67, 9),
    });
  });
  it('converts to one unit when asked: 0.040 in = 1.016 mm', () => {
    const r = convertRequest({ value: '0,040', from: 'in', to: 'mm' });
    expect(r.ok && r.value.values.mm).toBeCloseTo(1.016, 12);
  });
  it('hardness is marked approximate (ASTM E140 values from memory)', () => {
    const r = convertRequest({ value: 58, from: 'HRC', to: 'HV' });
    expect(r.ok && r.value.approximate).toBe(true);
    expect(r.ok && r.value.values.HV).toBeCloseTo(595 + (3 / 5) * (697 - 595), 10);
  });
});
