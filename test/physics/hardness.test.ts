import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  asQuenchedHardnessHrc,
  CASE_CRITERIA,
  hardnessIn,
  HARDNESS_SCALE_RANGE,
  hrcToHv,
  hvToHrc,
} from '../../src/physics/hardness';
import { checkHardness } from '../../src/physics/readHardness';

/** The rows DOMAIN §3.5 lists (ASTM E140 Table 1, values from memory, ±1 HV), written out here, not taken from the code. */
const E140_ROWS: [number, number][] = [
  [68, 940],
  [67, 900],
  [66, 865],
  [65, 832],
  [64, 800],
  [63, 772],
  [62, 746],
  [61, 720],
  [60, 697],
  [59, 674],
  [58, 653],
  [57, 633],
  [56, 613],
  [55, 595],
  [54, 577],
  [53, 560],
  [52, 544],
  [51, 528],
  [50, 513],
  [49, 498],
  [48, 484],
  [47, 471],
  [46, 458],
  [45, 446],
  [44, 434],
  [43, 423],
  [42, 412],
  [41, 402],
  [40, 392],
  [35, 345],
  [30, 302],
  [25, 266],
  [20, 238],
];

describe('Rockwell C ↔ Vickers (ASTM E140 Table 1 rows, from memory per DOMAIN §3.5)', () => {
  it.each(E140_ROWS)('%s HRC ↔ %s HV: ASTM E140 Table 1 row, from memory per DOMAIN §3.5', (hrc, hv) => {
    expect(hrcToHv(hrc)).toBe(hv);
    expect(hvToHrc(hv)).toBe(hrc);
  });
  it('550 HV ≈ 52.4 HRC and 50 HRC = 513 HV: the two case criteria are different limits (DOMAIN §3.5: 550 HV ≈ 52.3 HRC)', () => {
    // Between the rows 52 → 544 and 53 → 560: 52 + (550 − 544)/16 = 52.375.
    expect(hvToHrc(550)).toBeCloseTo(52.375, 12);
    expect(Math.abs(hvToHrc(550)! - 52.3)).toBeLessThan(0.1);
    expect(hardnessIn(CASE_CRITERIA['sae-j423'], 'HV')).toBe(513);
    expect(hardnessIn(CASE_CRITERIA['iso-18203'], 'HRC')).toBeGreaterThan(CASE_CRITERIA['sae-j423'].value);
  });
  it('regression pin (the code’s own linear rule): 37 HRC lies 2/5 of the way from 345 to 392 HV', () => {
    expect(hrcToHv(37)).toBeCloseTo(345 + (2 / 5) * (392 - 345), 12);
  });
  it('is monotone between rows and its inverse is exact (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 68, noNaN: true }),
        fc.double({ min: 20, max: 68, noNaN: true }),
        (a, b) => {
          const [lo, hi] = a < b ? [a, b] : [b, a];
          expect(hrcToHv(lo)!).toBeLessThanOrEqual(hrcToHv(hi)!);
          expect(hvToHrc(hrcToHv(a)!)).toBeCloseTo(a, 9);
        },
      ),
    );
  });
  it('has no HRC value below 238 HV or above 940 HV, and no HV value outside 20–68 HRC', () => {
    expect(hvToHrc(237)).toBeUndefined();
    expect(hvToHrc(941)).toBeUndefined();
    expect(hrcToHv(19.9)).toBeUndefined();
    expect(hrcToHv(68.1)).toBeUndefined();
  });
});

describe('hardness scales accepted as readings', () => {
  it('Vickers below the HRC table is still a valid reading (200 HV), but 35 HV suggests HRC', () => {
    expect(HARDNESS_SCALE_RANGE.HV.min).toBeLessThan(238);
    expect(checkHardness({ value: 200, unit: 'HV' }, 'value').ok).toBe(true);
    expect(checkHardness({ value: 35, unit: 'HV' }, 'value')).toEqual({
      ok: false,
      error: {
        code: 'hardness.outsideScaleOtherUnit',
        field: 'value',
        params: { value: 35, unit: 'HV', min: 80, max: 940, otherUnit: 'HRC' },
      },
    });
  });
  it('600 HRC suggests HV; 1200 HV fits no scale', () => {
    const hrc = checkHardness({ value: 600, unit: 'HRC' }, 'value');
    expect(!hrc.ok && hrc.error.params?.otherUnit).toBe('HV');
    const hv = checkHardness({ value: 1200, unit: 'HV' }, 'value');
    expect(!hv.ok && hv.error.code).toBe('hardness.outsideScale');
  });
});

describe('fully martensitic ceiling (Just 1969, from memory)', () => {
  it('HRC ≈ 20 + 60·√C: 0.25 %C → 50 HRC', () => {
    expect(asQuenchedHardnessHrc(0.25)).toBeCloseTo(50, 10);
  });
  it('levels off at 65 HRC at high carbon', () => {
    expect(asQuenchedHardnessHrc(0.8)).toBe(65);
    expect(asQuenchedHardnessHrc(1.2)).toBe(65);
  });
});
