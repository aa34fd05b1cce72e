/** The solver's building blocks: the grid, the diffusivity table and the time-step placement. */
import { describe, expect, it } from 'vitest';
import { DiffusivityTable } from '../../../src/physics/cycle/diffusivityTable';
import { buildGrid, WIDTH_STRETCH } from '../../../src/physics/cycle/grid';
import { scheduleTimeSteps } from '../../../src/physics/cycle/timeSchedule';
import { stepEndTimes } from '../../../src/physics/cycle/timeSteps';
import { DIFFUSIVITY_MODELS, MODEL_IDS } from '../../../src/physics/diffusivity';
import { EUTECTOID_TEMP_C } from '../../../src/physics/steel';
import { celsiusToKelvin } from '../../../src/physics/units';

describe('grid', () => {
  it('planar cells tile the extent, finest at the surface, widths growing by one ratio to the set stretch', () => {
    const grid = buildGrid(4e-3, 1);
    const widths = Array.from(grid.halfWidthM, (h) => 2 * h);
    expect(widths.reduce((a, b) => a + b, 0)).toBeCloseTo(4e-3, 15);
    expect(Array.from(grid.volumeM)).toEqual(widths.map((w) => expect.closeTo(w, 18)));
    expect(widths.at(-1)! / widths[0]!).toBeCloseTo(WIDTH_STRETCH, 6);
    for (let i = 1; i < grid.cells; i++) expect(grid.centreDepthM[i]!).toBeGreaterThan(grid.centreDepthM[i - 1]!);
    expect(Array.from(grid.faceArea).every((a) => a === 1)).toBe(true);
  });

  it('radial cells hold the annulus volume per unit surface, (R² − r²)/2R, and face areas r/R', () => {
    const radiusM = 5e-3;
    const whole = buildGrid(radiusM, 1, radiusM);
    expect(whole.volumeM.reduce((a, b) => a + b, 0)).toBeCloseTo(radiusM / 2, 15);
    expect(whole.faceArea[whole.cells]).toBe(0);
    const outer = buildGrid(2e-3, 1, radiusM);
    expect(outer.volumeM.reduce((a, b) => a + b, 0)).toBeCloseTo((radiusM ** 2 - 3e-3 ** 2) / (2 * radiusM), 15);
    expect(outer.faceArea[outer.cells]).toBeCloseTo(3 / 5, 12);
  });

  it('resolution 2 halves the surface cell and doubles the cells', () => {
    const base = buildGrid(1e-3, 1);
    const fine = buildGrid(1e-3, 2);
    expect(fine.cells).toBe(2 * base.cells);
    expect(fine.halfWidthM[0]! / base.halfWidthM[0]!).toBeCloseTo(0.5, 1);
  });
});

describe('diffusivity table', () => {
  it.each(MODEL_IDS)(
    '%s: tabulated D within 1e-4 of the published formula over 0.1–1.3 %C at 850, 925 and 1050 °C',
    (id) => {
      const model = DIFFUSIVITY_MODELS[id].diffusivity;
      const table = new DiffusivityTable(model, 0.1, 1.3, 1);
      for (const tempC of [850, 925, 1050]) {
        const tempK = celsiusToKelvin(tempC);
        table.setTemperature(tempK);
        for (let c = 0.1; c <= 1.3; c += 0.0137) expect(Math.abs(table.at(c) / model(tempK, c) - 1)).toBeLessThan(1e-4);
      }
    },
  );

  it('reads the end values outside its range and handles a single-value range', () => {
    const model = DIFFUSIVITY_MODELS.agren.diffusivity;
    const tempK = celsiusToKelvin(925);
    const table = new DiffusivityTable(model, 0.2, 1.0, 1);
    table.setTemperature(tempK);
    expect(table.at(-0.01)).toBe(model(tempK, 0.2));
    expect(table.at(1.5)).toBeCloseTo(model(tempK, 1.0), 20);
    const flat = new DiffusivityTable(model, 0.2, 0.2, 1);
    flat.setTemperature(tempK);
    expect(flat.at(0.7)).toBe(model(tempK, 0.2));
  });
});

describe('time steps', () => {
  it('a soak: geometric growth by the given ratio, ending exactly at the duration', () => {
    const ends = stepEndTimes(3600, 10, 1.2);
    expect(ends.at(-1)).toBe(3600);
    const dt = Array.from(ends, (t, j) => t - (j === 0 ? 0 : ends[j - 1]!));
    for (let j = 1; j < dt.length; j++) expect(dt[j]! / dt[j - 1]!).toBeCloseTo(1.2, 9);
  });

  it('a heat-up ramp from cold: one idle step up to the A1 crossing, then the steps of the austenite part', () => {
    const ramp = { durationH: 1, startTempC: 20, endTempC: 930, carbonPotentialPct: 1 };
    const [step] = scheduleTimeSteps(
      { steel: { coreCarbonPct: 0.2 }, steps: [ramp] },
      DIFFUSIVITY_MODELS.agren.diffusivity,
      1,
    ).steps;
    const crossingS = ((EUTECTOID_TEMP_C - 20) / (930 - 20)) * 3600;
    const ends = step!.endTimesS;
    expect(step!.austenite).toEqual({ fromS: ends[0], untilS: 3600 });
    expect(ends[0]).toBeCloseTo(crossingS, 9);
    expect(ends.at(-1)).toBe(3600);
    // After the crossing the steps grow from a small start, the first one the shortest.
    const dt = Array.from(ends, (t, j) => t - (j === 0 ? 0 : ends[j - 1]!));
    for (const step of dt) expect(step).toBeGreaterThan(0);
    expect(Math.min(...dt.slice(1))).toBe(dt[1]);
    expect(dt.at(-1)!).toBeGreaterThan(dt[1]!);
  });
  it('a cool-down through A1: the last active step ends on the crossing, one idle step after it', () => {
    const ramp = { durationH: 1, startTempC: 900, endTempC: 500, carbonPotentialPct: null };
    const [step] = scheduleTimeSteps(
      { steel: { coreCarbonPct: 0.2 }, steps: [ramp] },
      DIFFUSIVITY_MODELS.agren.diffusivity,
      1,
    ).steps;
    const crossingS = ((900 - EUTECTOID_TEMP_C) / 400) * 3600;
    const ends = step!.endTimesS;
    expect(step!.austenite!.untilS).toBeCloseTo(crossingS, 9);
    expect(ends.at(-2)).toBe(step!.austenite!.untilS);
    expect(ends.at(-1)).toBe(3600);
  });
  it('a soak at A1 or below has no austenite and one time step', () => {
    const soak = { durationH: 2, startTempC: EUTECTOID_TEMP_C, endTempC: EUTECTOID_TEMP_C, carbonPotentialPct: 1 };
    const [step] = scheduleTimeSteps(
      { steel: { coreCarbonPct: 0.2 }, steps: [soak] },
      DIFFUSIVITY_MODELS.agren.diffusivity,
      1,
    ).steps;
    expect(step!.austenite).toBeUndefined();
    expect(Array.from(step!.endTimesS)).toEqual([7200]);
  });
});
