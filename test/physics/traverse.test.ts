import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hrcToHv, hvToHrc, type HardnessUnit } from '../../src/physics/hardness';
import { ERROR_CODES, type Result } from '../../src/physics/result';
import { MAX_TRAVERSE_POINTS, readTraverse, type TraversePoint } from '../../src/physics/traverse/readTraverse';
import { analyseTraverse, traverse, type TraverseResult } from '../../src/physics/traverse/traverse';
import { allFinite } from './allFinite';

const HV = (depthMm: number, value: number): TraversePoint => ({ depthMm, value, unit: 'HV' });
const HRC = (depthMm: number, value: number): TraversePoint => ({ depthMm, value, unit: 'HRC' });
const codes = (r: TraverseResult) => r.warnings.map((w) => w.code);

function answer(request: unknown): TraverseResult {
  const r = traverse(request);
  if (!r.ok) throw new Error(`unexpected error ${r.error.code} at ${r.error.field}`);
  return r.value;
}

const caseInHv = [
  HV(0.05, 720),
  HV(0.2, 680),
  HV(0.4, 620),
  HV(0.6, 575),
  HV(0.8, 520),
  HV(1.0, 450),
  HV(1.2, 380),
  HV(1.4, 360),
  HV(1.6, 352),
  HV(1.8, 348),
];

const caseInHrc = [
  HRC(0.1, 62),
  HRC(0.3, 60),
  HRC(0.5, 56),
  HRC(0.7, 52),
  HRC(0.9, 48),
  HRC(1.1, 42),
  HRC(1.3, 37),
  HRC(1.5, 36),
  HRC(1.7, 36),
  HRC(1.9, 35),
];

describe('traverse: worked examples, answers by hand from the definition (ISO 18203 / SAE J423: linear between the bracketing points)', () => {
  it('worked example, 550 HV by default: 0.6 + (575 − 550)/(575 − 520)·0.2 = 0.6909 mm; core (360 + 352 + 348)/3 = 353.3 HV', () => {
    const r = answer({ points: caseInHv });
    expect(r.limit).toEqual({ value: 550, unit: 'HV' });
    expect(r.effectiveCaseDepthMm).toBe(0.691);
    expect(r.bracket).toEqual([HV(0.6, 575), HV(0.8, 520)]);
    expect(r.crossings).toBe(1);
    expect(r.surfaceHardness).toEqual({ value: 720, unit: 'HV' });
    expect(r.coreHardness).toEqual({ value: 353.3, unit: 'HV' });
    expect(r.warnings).toEqual([]);
  });

  it('worked example, 50 HRC (SAE J423) on HRC points: 0.7 + (52 − 50)/(52 − 48)·0.2 = 0.8 mm; core (36 + 36 + 35)/3 = 35.7 HRC', () => {
    const r = answer({ points: caseInHrc, limit: { value: 50, unit: 'HRC' } });
    expect(r.effectiveCaseDepthMm).toBe(0.8);
    expect(r.coreHardness).toEqual({ value: 35.7, unit: 'HRC' });
    expect(r.warnings).toEqual([]);
  });

  it('worked example, the same HRC points to 550 HV: 56 → 613 and 52 → 544 HV (E140 rows), 0.5 + (613 − 550)/(613 − 544)·0.2 = 0.6826 mm, shallower than to 50 HRC', () => {
    const r = answer({ points: caseInHrc });
    expect(r.effectiveCaseDepthMm).toBe(0.683);
    expect(r.bracket).toEqual([HRC(0.5, 56), HRC(0.7, 52)]);
    expect(r.warnings).toEqual([{ code: 'traverse.convertedApproximately', params: { from: 'HRC', to: 'HV' } }]);
    // The two criteria are different limits: the same traverse is 0.12 mm deeper to 50 HRC.
    expect(answer({ points: caseInHrc, limit: { value: 50, unit: 'HRC' } }).effectiveCaseDepthMm!).toBeGreaterThan(
      r.effectiveCaseDepthMm! + 0.1,
    );
  });

  it('worked example, mixed points under 50 HRC: 575 HV → 53 + 15/17 HRC, 498 HV → 49 HRC; 0.6 + 3.882/4.882·0.2 = 0.7590 mm', () => {
    const r = answer({
      points: [
        HRC(0.1, 61),
        HRC(0.4, 57),
        HV(0.6, 575),
        HV(0.8, 498),
        HV(1.0, 420),
        HV(1.2, 380),
        HV(1.4, 372),
        HV(1.6, 368),
      ],
      limit: { value: 50, unit: 'HRC' },
    });
    expect(r.effectiveCaseDepthMm).toBe(0.759);
    expect(r.surfaceHardness).toEqual({ value: 61, unit: 'HRC' });
    // Core points all in HV: reported in HV, (380 + 372 + 368)/3 = 373.3.
    expect(r.coreHardness).toEqual({ value: 373.3, unit: 'HV' });
    expect(codes(r)).toEqual(['traverse.convertedApproximately']);
  });

  it('worked example, a point below the HRC table under 50 HRC is crossed in HV: 52 HRC → 544 HV, limit 513 HV; 0.2 + (544 − 513)/(544 − 220)·0.1 = 0.2096 mm', () => {
    const r = answer({
      points: [HRC(0.1, 60), HRC(0.2, 52), HV(0.3, 220), HV(0.4, 200), HV(0.5, 195), HV(0.6, 190)],
      limit: { value: 50, unit: 'HRC' },
    });
    expect(r.effectiveCaseDepthMm).toBe(0.21);
    expect(r.warnings).toContainEqual({
      code: 'traverse.crossedInHv',
      params: { depthMm: 0.3, value: 220, limitHv: 513 },
    });
    // 200, 195, 190 HV are valid Vickers readings softer than any HRC value.
    expect(r.coreHardness).toEqual({ value: 195, unit: 'HV' });
  });

  it('a point exactly on the limit is where the hardness falls to it: 0.4 + (600 − 550)/(600 − 550)·0.2 = 0.6 mm', () => {
    expect(answer({ points: [HV(0.4, 600), HV(0.6, 550), HV(0.8, 500)] }).effectiveCaseDepthMm).toBe(0.6);
    expect(answer({ points: [HV(0.4, 600), HV(0.6, 550)] }).effectiveCaseDepthMm).toBe(0.6);
  });

  it('a point at depth 0 is the surface', () => {
    expect(answer({ points: [HV(0, 700), HV(0.5, 500)] }).effectiveCaseDepthMm).toBe(0.375); // 0 + 150/200·0.5
  });
});

describe('traverse: no single answer', () => {
  it('never falls to the limit: no ECD, no core, says so', () => {
    const r = answer({ points: [HV(0.1, 700), HV(0.3, 650), HV(0.5, 600)] });
    expect(r.effectiveCaseDepthMm).toBeNull();
    expect(r.bracket).toBeNull();
    expect(r.crossings).toBe(0);
    expect(r.coreHardness).toBeUndefined();
    expect(r.warnings).toEqual([
      { code: 'traverse.neverReachesLimit', params: { depthMm: 0.5, limit: 550, limitUnit: 'HV' } },
      { code: 'traverse.coreNotReached', params: { count: 3 } },
    ]);
  });

  it('starts at or below the limit: no ECD; a part that never hardened still has a core', () => {
    const r = answer({ points: [HV(0.1, 500), HV(0.3, 420), HV(0.5, 360), HV(0.7, 355), HV(0.9, 352)] });
    expect(r.effectiveCaseDepthMm).toBeNull();
    expect(r.crossings).toBe(0);
    expect(r.warnings).toEqual([
      { code: 'traverse.startsBelowLimit', params: { value: 500, unit: 'HV', limit: 550, limitUnit: 'HV' } },
    ]);
    expect(r.coreHardness).toEqual({ value: 355.7, unit: 'HV' });
  });

  it('a soft surface that rises above the limit and falls again: starts below and crosses twice', () => {
    const r = answer({ points: [HV(0.03, 530), HV(0.1, 610), HV(0.3, 580), HV(0.5, 500), HV(0.7, 400)] });
    expect(r.effectiveCaseDepthMm).toBeNull();
    expect(r.crossings).toBe(2);
    expect(codes(r)).toEqual(['traverse.startsBelowLimit', 'traverse.multipleCrossings', 'traverse.coreNotReached']);
  });

  it('crosses more than once: no ECD, the number of crossings given', () => {
    const r = answer({ points: [HV(0.1, 650), HV(0.3, 540), HV(0.5, 560), HV(0.7, 480), HV(0.9, 470), HV(1.1, 465)] });
    expect(r.effectiveCaseDepthMm).toBeNull();
    expect(r.bracket).toBeNull();
    expect(r.crossings).toBe(3);
    expect(r.warnings[0]).toEqual({
      code: 'traverse.multipleCrossings',
      params: { crossings: 3, limit: 550, limitUnit: 'HV' },
    });
  });

  it('core not levelled off: the deepest three points spread 25 HV (> 20): no core hardness', () => {
    const r = answer({ points: [HV(0.2, 650), HV(0.6, 520), HV(1.0, 420), HV(1.2, 400), HV(1.4, 395)] });
    expect(r.effectiveCaseDepthMm).not.toBeNull();
    expect(r.coreHardness).toBeUndefined();
    expect(r.warnings).toEqual([
      { code: 'traverse.coreNotLevelled', params: { count: 3, spread: 25, tolerance: 20, unit: 'HV' } },
    ]);
  });

  it('core from only two points below the limit is not read', () => {
    const r = answer({ points: [HV(0.2, 650), HV(0.4, 600), HV(0.6, 400), HV(0.8, 395)] });
    expect(codes(r)).toEqual(['traverse.coreNotReached']);
  });
});

const base = caseInHv;
const bad: [string, unknown, string, string?][] = [
  ['request is not an object', 'points', 'request.notObject'],
  ['no points', {}, 'field.missing', 'points'],
  ['points not a list', { points: { depthMm: 0.1 } }, 'field.missing', 'points'],
  ['one point', { points: [HV(0.1, 700)] }, 'traverse.tooFewPoints', 'points'],
  [
    'too many points',
    { points: Array.from({ length: MAX_TRAVERSE_POINTS + 1 }, (_, i) => HV(i * 0.01, 700)) },
    'traverse.tooManyPoints',
    'points',
  ],
  ['a point that is a number', { points: [HV(0.1, 700), 0.3] }, 'traverse.pointNotObject', 'points.1'],
  ['negative depth', { points: [HV(-0.05, 700), ...base] }, 'traverse.depthNegative', 'points.0.depthMm'],
  [
    'repeated depth',
    { points: [HV(0.1, 700), HV(0.2, 650), HV(0.2, 640)] },
    'traverse.depthRepeated',
    'points.2.depthMm',
  ],
  [
    'unsorted depths',
    { points: [HV(0.1, 700), HV(0.2, 650), HV(0.4, 600), HV(0.3, 620)] },
    'traverse.depthNotIncreasing',
    'points.3.depthMm',
  ],
  [
    'depth beyond 50 mm (a µm figure typed as mm)',
    { points: [HV(0.1, 700), HV(250, 400)] },
    'depth.tooDeep',
    'points.1.depthMm',
  ],
  [
    'depth not a number',
    { points: [HV(0.1, 700), { depthMm: 'deep', value: 400, unit: 'HV' }] },
    'number.invalid',
    'points.1.depthMm',
  ],
  ['depth missing', { points: [HV(0.1, 700), { value: 400, unit: 'HV' }] }, 'field.missing', 'points.1.depthMm'],
  ['unit missing', { points: [HV(0.1, 700), { depthMm: 0.3, value: 400 }] }, 'field.missing', 'points.1.unit'],
  [
    'unknown unit',
    { points: [HV(0.1, 700), { depthMm: 0.3, value: 40, unit: 'HB' }] },
    'hardness.unknownUnit',
    'points.1.unit',
  ],
  ['hardness missing', { points: [HV(0.1, 700), { depthMm: 0.3, unit: 'HV' }] }, 'field.missing', 'points.1.value'],
  [
    '35 typed under HV (likely HRC)',
    { points: [HV(0.1, 700), HV(0.3, 600), HV(0.5, 35)] },
    'hardness.outsideScaleOtherUnit',
    'points.2.value',
  ],
  [
    '72 HRC, above the Rockwell C rows',
    { points: [HRC(0.1, 72), HRC(0.3, 50)] },
    'hardness.outsideScale',
    'points.0.value',
  ],
  [
    '15 HRC, below the Rockwell C rows',
    { points: [HRC(0.1, 60), HRC(0.3, 15)] },
    'hardness.outsideScale',
    'points.1.value',
  ],
  ['1000 HV, above the table', { points: [HV(0.1, 1000), HV(0.3, 500)] }, 'hardness.outsideScale', 'points.0.value'],
  ['limit not an object', { points: base, limit: 550 }, 'hardness.notObject', 'limit'],
  [
    'limit in an unknown unit',
    { points: base, limit: { value: 550, unit: 'HK' } },
    'hardness.unknownUnit',
    'limit.unit',
  ],
  [
    'limit outside its scale',
    { points: base, limit: { value: 10, unit: 'HRC' } },
    'hardness.outsideScale',
    'limit.value',
  ],
];

describe('traverse: bad input is a typed error naming the point', () => {
  it.each(bad)('%s', (_, request, code, field) => {
    const r = traverse(request);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.code).toBe(code);
    expect(r.error.field).toBe(field);
    expect((ERROR_CODES as readonly string[]).includes(r.error.code)).toBe(true);
  });

  it('the repeated and unsorted depth errors name both points (1-based, as a person counts)', () => {
    const r = traverse({ points: [HV(0.1, 700), HV(0.2, 650), HV(0.4, 600), HV(0.3, 620)] });
    expect(!r.ok && r.error.params).toEqual({ point: 4, value: 0.3, previousPoint: 3, previous: 0.4 });
  });

  it('reads depths and hardness typed with a decimal comma', () => {
    const r = traverse({
      points: [
        { depthMm: '0,1', value: '700', unit: 'HV' },
        { depthMm: '0,5', value: '500', unit: 'HV' },
      ],
    });
    expect(r.ok && r.value.effectiveCaseDepthMm).toBe(0.4); // 0.1 + 150/200·0.4
  });

  it('wild input never throws and never returns a non-finite number (property)', () => {
    const point = fc.record({
      depthMm: fc.oneof(fc.double(), fc.constantFrom('0,3', 'x', null)),
      value: fc.oneof(fc.double(), fc.integer({ min: 0, max: 1000 })),
      unit: fc.constantFrom('HV', 'HRC', 'HB', undefined),
    });
    fc.assert(
      fc.property(fc.array(point, { maxLength: 12 }), (points) => {
        const r: Result<TraverseResult> = traverse({ points });
        if (r.ok) expect(allFinite({ ...r.value, effectiveCaseDepthMm: r.value.effectiveCaseDepthMm ?? 0 })).toBe(true);
        else expect((ERROR_CODES as readonly string[]).includes(r.error.code)).toBe(true);
      }),
    );
  });
});

/** A traverse falling through 550 HV once: hardness strictly falling with depth, some points written in HRC. */
const cleanTraverse = fc
  .record({
    n: fc.integer({ min: 2, max: 12 }),
    steps: fc.array(fc.double({ min: 0.01, max: 0.5, noNaN: true }), { minLength: 12, maxLength: 12 }),
    drops: fc.array(fc.double({ min: 1, max: 60, noNaN: true }), { minLength: 12, maxLength: 12 }),
    units: fc.array(fc.constantFrom<HardnessUnit>('HV', 'HRC'), { minLength: 12, maxLength: 12 }),
    crossing: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
  })
  .map(({ n, steps, drops, units, crossing }) => {
    // Hardness in HV, falling from the surface; shifted so that 550 HV lies between points k and k+1.
    const hv: number[] = [0];
    for (let i = 1; i < n; i++) hv.push(hv[i - 1]! - drops[i]!);
    const k = Math.min(n - 2, Math.floor(crossing * (n - 1)));
    const shift = 550 - (hv[k]! + crossing * (hv[k + 1]! - hv[k]!)) + 1e-6;
    let depth = 0;
    return hv.map((h, i): TraversePoint => {
      depth += steps[i]!;
      const value = Math.min(Math.max(h + shift, 240), 930);
      return units[i] === 'HRC' ? HRC(depth, hvToHrc(value)!) : HV(depth, value);
    });
  })
  .filter((points) => analyseTraverse({ points, limit: { value: 550, unit: 'HV' } }).effectiveCaseDepthMm !== null);

describe('traverse: properties', () => {
  it('adding a point exactly on the interpolated line between the bracketing points leaves the ECD unchanged', () => {
    const limit = { value: 550, unit: 'HV' } as const;
    const inHv = (p: TraversePoint) => (p.unit === 'HV' ? p.value : hrcToHv(p.value)!);
    fc.assert(
      fc.property(cleanTraverse, fc.double({ min: 0.001, max: 0.999, noNaN: true }), (points, u) => {
        const before = analyseTraverse({ points, limit });
        const [upper, lower] = before.bracket!;
        const depthMm = upper.depthMm + u * (lower.depthMm - upper.depthMm);
        const value = inHv(upper) + u * (inHv(lower) - inHv(upper));
        const at = points.indexOf(lower);
        const more = [...points.slice(0, at), HV(depthMm, value), ...points.slice(at)];
        const after = analyseTraverse({ points: more, limit });
        expect(after.effectiveCaseDepthMm).toBeCloseTo(before.effectiveCaseDepthMm!, 9);
        expect(after.crossings).toBe(1);
      }),
    );
  });

  it('the ECD lies inside its bracket, at or above the upper point and at or below the lower one', () => {
    fc.assert(
      fc.property(cleanTraverse, (points) => {
        const r = analyseTraverse({ points, limit: { value: 550, unit: 'HV' } });
        const [upper, lower] = r.bracket!;
        expect(r.effectiveCaseDepthMm!).toBeGreaterThanOrEqual(upper.depthMm);
        expect(r.effectiveCaseDepthMm!).toBeLessThanOrEqual(lower.depthMm);
      }),
    );
  });
});

describe('traverse: the reader', () => {
  it('fills in 550 HV (ISO 18203) when no limit is given', () => {
    const r = readTraverse({ points: base });
    expect(r.ok && r.value.limit).toEqual({ value: 550, unit: 'HV' });
  });
});
