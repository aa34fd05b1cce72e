/** The demo recipes in public/examples/ (invented Kestrel Ridge scenario): each parses, runs, and meets its drawing. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../../src/cli';
import { simulateCycle } from '../../../src/physics/cycle/simulate';

const read = (file: string) => readFileSync(new URL(`../../../public/examples/${file}`, import.meta.url), 'utf8');

/** File, ECD range on the drawing (mm), surface carbon range we aim for (%C). */
const examples: [string, [number, number], [number, number]][] = [
  ['pinion-kr2231-cycle.json', [0.75, 1.0], [0.7, 0.9]],
  ['shaft-kr4410-cycle.json', [1.2, 1.5], [0.65, 0.85]],
  ['pin-kr0907-cycle.json', [0.25, 0.4], [0.7, 0.9]],
];

describe('demo cycle recipes', () => {
  it.each(examples)(
    '%s: ECD within the drawing range, sensible surface carbon, no cautions',
    (file, [minMm, maxMm], [minPct, maxPct]) => {
      const result = simulateCycle(JSON.parse(read(file)));
      if (!result.ok) throw new Error(result.error.code);
      expect(result.value.effectiveCaseDepthMm).toBeGreaterThanOrEqual(minMm);
      expect(result.value.effectiveCaseDepthMm).toBeLessThanOrEqual(maxMm);
      expect(result.value.surfaceCarbonPct).toBeGreaterThanOrEqual(minPct);
      expect(result.value.surfaceCarbonPct).toBeLessThanOrEqual(maxPct);
      expect(result.value.warnings).toEqual([]);
      expect(result.value.profile).toHaveLength(101);
      expect(result.value.profile.at(-1)!.depthMm).toBeGreaterThan(result.value.totalCaseDepthMm);
    },
  );

  it('the CLI runs `simulate` on an example file and prints the same result, rounded to 0.1 µm', () => {
    const file = 'pinion-kr2231-cycle.json';
    const { output, exitCode } = runCli(['simulate', file], () => read(file));
    expect(exitCode).toBe(0);
    const direct = simulateCycle(JSON.parse(read(file)));
    if (!direct.ok) throw new Error(direct.error.code);
    expect((output as { effectiveCaseDepthMm: number }).effectiveCaseDepthMm).toBe(
      Number(direct.value.effectiveCaseDepthMm.toFixed(4)),
    );
  });

  it('the CLI words a bad recipe as an error with its field and exits 1', () => {
    const { output, exitCode } = runCli(['simulate'], () =>
      JSON.stringify({ steel: { coreCarbonPct: 0.2 }, steps: [] }),
    );
    expect(exitCode).toBe(1);
    expect(output).toEqual({
      error: { code: 'steps.empty', field: 'steps', message: 'Enter at least one step of the cycle.' },
    });
  });

  it('the CLI adds the English sentence to every cycle warning', () => {
    const request = {
      steel: { coreCarbonPct: 0.2 },
      steps: [{ durationH: 1, startTempC: 700, endTempC: 925, carbonPotentialPct: 0.9 }],
    };
    const { output } = runCli(['simulate'], () => JSON.stringify(request));
    const warnings = (output as { warnings: { code: string; message: string; stepIndex: number }[] }).warnings;
    expect(warnings[0]).toMatchObject({ code: 'safety.atmosphereBelowSafeTemperature', stepIndex: 0 });
    expect(warnings[0]!.message).toContain('760 °C');
  });
});
