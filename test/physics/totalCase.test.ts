import { describe, expect, it } from 'vitest';
import { caseDepth, totalCaseDepthForMarginMm, TOTAL_CASE_MARGIN_PCT } from '../../src/physics';

describe('total case depth for a chosen margin', () => {
  const r = caseDepth({ temperatureC: 925, timeH: 6, surfaceCarbonPct: 0.9, coreCarbonPct: 0.2 });
  if (!r.ok) throw new Error('expected a result');
  it('with the default margin (core + 0.05 %C, common practice) it equals caseDepth total case', () => {
    const total = totalCaseDepthForMarginMm(r.value, TOTAL_CASE_MARGIN_PCT);
    expect(total.ok && total.value).toBeCloseTo(r.value.totalCaseDepthMm, 12);
  });
  it('a wider margin is shallower; a margin outside the profile is a typed error', () => {
    const wide = totalCaseDepthForMarginMm(r.value, 0.1);
    expect(wide.ok && wide.value).toBeLessThan(r.value.totalCaseDepthMm);
    expect(totalCaseDepthForMarginMm(r.value, 0)).toMatchObject({ ok: false, error: { code: 'threshold.outsideProfile' } });
    expect(totalCaseDepthForMarginMm(r.value, 0.8)).toMatchObject({ ok: false, error: { code: 'threshold.outsideProfile' } });
  });
});
