import { describe, expect, it } from 'vitest';
import {
  agrenDiffusivity,
  carbonDependence,
  DIFFUSIVITY_MODELS,
  modelSpread,
  effectiveDiffusivity,
  MODEL_IDS,
  tibbettsDiffusivity,
  wellsBatzMehlDiffusivity,
} from '../../src/physics/diffusivity';

const K = (c: number) => c + 273.15;

/** Largest |D_model / D_Ågren − 1| over a grid of temperatures (°C) and carbon (wt%). */
function worstDeviationFromAgren(
  model: (tK: number, c: number) => number,
  t0: number,
  t1: number,
  c0: number,
  c1: number,
) {
  let worst = 0;
  for (let t = t0; t <= t1; t += 5) {
    for (let c = c0; c <= c1 + 1e-9; c += 0.05)
      worst = Math.max(worst, Math.abs(model(K(t), c) / agrenDiffusivity(K(t), c) - 1));
  }
  return worst;
}

describe('diffusivity of carbon in austenite: the three published models check each other', () => {
  // Regression pins: each model's formula evaluated by hand (the same formula the code uses, not an outside
  // value). They catch a changed constant or unit slip; the cross-checks below compare the models.
  it('regression pin: Ågren (1986) evaluated by hand at 925 °C, 0.55 %C gives 1.515e-11 m²/s', () => {
    // x_C = 0.02507, y = 0.02572; prefactor 1.1745; exponent −(8.3463e-4 − 2.221e-4)·(17767 − 680.0)
    expect(agrenDiffusivity(K(925), 0.55)).toBeCloseTo(1.515e-11, 13);
  });
  it('regression pin: Tibbetts (1980) evaluated by hand at 925 °C, 0.55 %C gives 1.594e-11 m²/s', () => {
    // 0.47·e^(−0.88)·e^(−33370/(1.987·1198.15)) cm²/s
    expect(tibbettsDiffusivity(K(925), 0.55)).toBeCloseTo(1.594e-11, 13);
  });
  it('regression pin: Wells, Batz & Mehl (1950, from memory) evaluated by hand at 925 °C, 0.55 %C gives 1.497e-11 m²/s', () => {
    // (0.07 + 0.033)·e^(−32000/(1.987·1198.15)) cm²/s
    expect(wellsBatzMehlDiffusivity(K(925), 0.55)).toBeCloseTo(1.497e-11, 13);
  });
  it('Tibbetts (1980) and Wells–Batz–Mehl (1950) stay within 30 % of Ågren (1986) over 850–1050 °C and 0.1–1.2 %C', () => {
    // Measured worst cases: Tibbetts +26.3 %, Wells–Batz–Mehl −29.7 %, both at 850 °C and 1.2 %C.
    expect(worstDeviationFromAgren(tibbettsDiffusivity, 850, 1050, 0.1, 1.2)).toBeLessThan(0.3);
    expect(worstDeviationFromAgren(wellsBatzMehlDiffusivity, 850, 1050, 0.1, 1.2)).toBeLessThan(0.3);
  });
  it('over 900–950 °C and 0.2–0.9 %C: Tibbetts within 15 % of Ågren, Wells–Batz–Mehl within 17.5 %', () => {
    // Wells–Batz–Mehl as recalled rises only weakly with carbon: −16.9 % at 950 °C, 0.9 %C.
    expect(worstDeviationFromAgren(tibbettsDiffusivity, 900, 950, 0.2, 0.9)).toBeLessThan(0.15);
    expect(worstDeviationFromAgren(wellsBatzMehlDiffusivity, 900, 950, 0.2, 0.9)).toBeLessThan(0.175);
  });
  it('the pairwise spread is real: Tibbetts over Wells–Batz–Mehl reaches 1.8× at 850 °C, 1.2 %C', () => {
    const ratio = tibbettsDiffusivity(K(850), 1.2) / wellsBatzMehlDiffusivity(K(850), 1.2);
    expect(ratio).toBeGreaterThan(1.7);
    expect(ratio).toBeLessThan(1.9);
  });
  it('every model rises with temperature and with carbon over the working range', () => {
    for (const id of MODEL_IDS) {
      const d = DIFFUSIVITY_MODELS[id].diffusivity;
      for (let t = 850; t < 1050; t += 25) expect(d(K(t + 25), 0.5)).toBeGreaterThan(d(K(t), 0.5));
      for (let c = 0.1; c < 1.2; c += 0.1) expect(d(K(925), c + 0.1)).toBeGreaterThan(d(K(925), c));
    }
  });
  it('the spread the app states (modelSpread, on a 5 °C × 0.05 %C grid) is the spread on a 1 °C × 0.01 %C grid, to 0.1 %', () => {
    const spread = modelSpread();
    const fine = (model: (tK: number, c: number) => number) => {
      let min = Infinity;
      let max = -Infinity;
      for (let t = 850; t <= 1050; t += 1)
        for (let c = 0.1; c <= 1.2 + 1e-9; c += 0.01) {
          const relative = model(K(t), c) / agrenDiffusivity(K(t), c) - 1;
          min = Math.min(min, relative);
          max = Math.max(max, relative);
        }
      return { min, max };
    };
    for (const [id, model] of [
      ['tibbetts', tibbettsDiffusivity],
      ['wells-batz-mehl', wellsBatzMehlDiffusivity],
    ] as const) {
      expect(spread.relativeToAgren[id].min).toBeCloseTo(fine(model).min, 3);
      expect(spread.relativeToAgren[id].max).toBeCloseTo(fine(model).max, 3);
    }
    // Measured: Tibbetts −4.4 … +26.3 %, Wells–Batz–Mehl −29.7 … +26.9 %, at most 1.80× between models.
    expect(spread.relativeToAgren['wells-batz-mehl'].min).toBeCloseTo(-0.297, 3);
    expect(spread.maxRatio).toBeCloseTo(1.796, 3);
  });
  it('Wells–Batz–Mehl depends on carbon much less: D(1.0 %C)/D(0.1 %C) at 1000 °C is 1.71, against 2.36 (Ågren) and 2.48 (Tibbetts)', () => {
    // By hand: 0.13 / 0.076 = 1.711 (the quoted form), e^(−1.44 + 6600·0.9/(1.987·1273.15)) = 2.48 (Tibbetts);
    // Ågren's 2.357 is a regression pin of the code's own evaluation.
    expect(carbonDependence('wells-batz-mehl')).toBeCloseTo(0.13 / 0.076, 12);
    expect(carbonDependence('agren')).toBeCloseTo(2.357, 3);
    expect(carbonDependence('tibbetts')).toBeCloseTo(2.48, 2);
  });
  it('effective D is the model at the mean of surface and core carbon', () => {
    expect(effectiveDiffusivity('agren', K(925), 0.9, 0.2)).toBe(agrenDiffusivity(K(925), 0.55));
  });
});
