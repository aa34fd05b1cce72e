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
  it('hardness is marked approximate: 58 HRC → 653 HV (ASTM E140 Table 1 row, from memory per DOMAIN §3.5)', () => {
    const r = convertRequest({ value: 58, from: 'HRC', to: 'HV' });
    expect(r.ok && r.value.approximate).toBe(true);
    expect(r.ok && r.value.values.HV).toBe(653);
  });
  it('refuses a hardness beyond the table and names its range: 230 HV is softer than 20 HRC', () => {
    const r = convertRequest({ value: 230, from: 'HV', to: 'HRC' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.error).toEqual({
      code: 'hardness.outOfTable',
      field: 'value',
      params: { value: 230, unit: 'HV', min: 238, max: 940 },
    });
  });
});
