import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  constantSurfaceCarbon,
  constantSurfaceDepth,
  constantSurfaceTime,
  surfaceTransferCarbon,
  surfaceTransferDepth,
  surfaceTransferSurfaceCarbon,
} from '../../src/physics/closedForm';

const D = 1.5e-11; // m²/s, carbon in austenite near 925 °C
const hour = 3600;

describe('constant-surface solution (Crank, The Mathematics of Diffusion, eq. 3.13)', () => {
  it('holds the surface at Cs and the far field at C0', () => {
    expect(constantSurfaceCarbon(0, 6 * hour, D, 0.9, 0.2)).toBeCloseTo(0.9, 12);
    expect(constantSurfaceCarbon(0.01, 6 * hour, D, 0.9, 0.2)).toBeCloseTo(0.2, 12);
  });
  it('carbon at the computed depth equals the threshold', () => {
    const x = constantSurfaceDepth(6 * hour, D, 0.9, 0.2, 0.4);
    expect(constantSurfaceCarbon(x, 6 * hour, D, 0.9, 0.2)).toBeCloseTo(0.4, 12);
  });
  it('time(depth(t)) = t to 1e-9 relative', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 200, noNaN: true }), (timeH) => {
        const x = constantSurfaceDepth(timeH * hour, D, 0.9, 0.2, 0.4);
        expect(constantSurfaceTime(x, D, 0.9, 0.2, 0.4) / (timeH * hour)).toBeCloseTo(1, 9);
      }),
    );
  });
  it('4× time gives 2× depth (depth ∝ √t)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), (timeH) => {
        const ratio =
          constantSurfaceDepth(4 * timeH * hour, D, 0.9, 0.2, 0.4) /
          constantSurfaceDepth(timeH * hour, D, 0.9, 0.2, 0.4);
        expect(ratio).toBeCloseTo(2, 12);
      }),
    );
  });
});

describe('surface-transfer solution (Crank §3.3.2, eq. 3.35)', () => {
  it('tends to the constant-surface profile as β grows', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 3e-3, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        (x, timeH) => {
          const pinned = constantSurfaceCarbon(x, timeH * hour, D, 1.0, 0.2);
          expect(surfaceTransferCarbon(x, timeH * hour, D, 1e-2, 1.0, 0.2)).toBeCloseTo(pinned, 4);
        },
      ),
    );
  });
  it('the gap to the constant-surface profile shrinks monotonically as β grows', () => {
    const gap = (beta: number) =>
      constantSurfaceCarbon(0, 6 * hour, D, 1.0, 0.2) - surfaceTransferSurfaceCarbon(6 * hour, D, beta, 1.0, 0.2);
    const betas = [1e-8, 1e-7, 1e-6, 1e-5, 1e-4];
    for (let i = 1; i < betas.length; i++) expect(gap(betas[i]!)).toBeLessThan(gap(betas[i - 1]!));
    expect(gap(1e-4)).toBeLessThan(1e-3);
  });
  it('does not overflow where exp(h·x + h²·D·t) alone would (h√(Dt) ≈ 4e4)', () => {
    const c = surfaceTransferCarbon(1e-3, 100 * hour, D, 1, 1.0, 0.2);
    expect(Number.isFinite(c)).toBe(true);
    expect(c).toBeCloseTo(constantSurfaceCarbon(1e-3, 100 * hour, D, 1.0, 0.2), 6);
  });
  it('surface carbon for small h√(Dt) follows Cs − C0 ≈ (Cp − C0)·2h√(Dt/π) (series of erfcx, A&S 7.1.6)', () => {
    const beta = 1e-9;
    const hSqrtDt = (beta / D) * Math.sqrt(D * 60);
    const expected = 0.2 + 0.8 * ((2 * hSqrtDt) / Math.sqrt(Math.PI) - hSqrtDt ** 2);
    expect(surfaceTransferSurfaceCarbon(60, D, beta, 1.0, 0.2)).toBeCloseTo(expected, 8);
  });
  it('its depth is where its profile crosses the threshold, and shallower than the pinned-surface depth', () => {
    const x = surfaceTransferDepth(6 * hour, D, 1.5e-7, 1.0, 0.2, 0.4);
    expect(surfaceTransferCarbon(x, 6 * hour, D, 1.5e-7, 1.0, 0.2)).toBeCloseTo(0.4, 9);
    expect(x).toBeLessThan(constantSurfaceDepth(6 * hour, D, 1.0, 0.2, 0.4));
  });
  it('gives depth 0 while the surface is still below the threshold', () => {
    expect(surfaceTransferDepth(60, D, 1e-9, 1.0, 0.2, 0.4)).toBe(0);
  });
});
