import { execFileSync, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { roundOutput, runCli } from '../src/cli';

const from = (text: string) => () => text;

describe('CLI (runCli)', () => {
  it('depth: demo pinion gives ECD within 0.7–1.0 mm and the three-model range', () => {
    const { output, exitCode } = runCli(['depth', 'public/examples/pinion-kr2231-depth.json'], (file) =>
      execFileSync('cat', [file!], { encoding: 'utf8' }),
    );
    expect(exitCode).toBe(0);
    const r = output as { effectiveCaseDepthMm: number; modelRangeMm: { min: number; max: number } };
    expect(r.effectiveCaseDepthMm).toBeGreaterThan(0.7);
    expect(r.effectiveCaseDepthMm).toBeLessThan(1.0);
    expect(r.modelRangeMm.min).toBeLessThan(r.modelRangeMm.max);
  });
  it('bad input: exit 1 with code, English message and field', () => {
    const { output, exitCode } = runCli(['depth'], from('{"temperatureC": 1200, "timeH": 6}'));
    expect(exitCode).toBe(1);
    expect(output).toEqual({
      error: {
        code: 'temperature.outOfRange',
        field: 'temperatureC',
        message: 'Temperature 1200 °C: it must be between 727 °C and 1150 °C.',
      },
    });
  });
  it('a depth request at 700 °C: exit 1 and the plain "no austenite" message', () => {
    const { output, exitCode } = runCli(
      ['depth'],
      from('{"temperatureC": 700, "timeH": 6, "carbonPotentialPct": 0.85, "coreCarbonPct": 0.2}'),
    );
    expect(exitCode).toBe(1);
    expect(output).toEqual({
      error: {
        code: 'temperature.noAustenite',
        field: 'temperatureC',
        message:
          'At 700 °C there is no austenite (none at or below 727 °C): carbon does not go in. Raise the temperature.',
      },
    });
  });
  it('words every warning in English', () => {
    const { output } = runCli(
      ['depth'],
      from('{"temperatureC": 850, "timeH": 4, "surfaceCarbonPct": 1.2, "coreCarbonPct": 0.2}'),
    );
    const warnings = (output as { warnings: { code: string; message: string }[] }).warnings;
    expect(warnings.length).toBeGreaterThan(0);
    for (const w of warnings) expect(w.message).toMatch(/saturation|retained austenite/);
  });
  it('refuses malformed JSON and unknown commands with exit 1', () => {
    expect(runCli(['depth'], from('{temperature'))).toMatchObject({
      exitCode: 1,
      output: { error: { code: 'cli.invalidJson' } },
    });
    expect(runCli(['sing'], from('{}'))).toMatchObject({
      exitCode: 1,
      output: { error: { code: 'cli.unknownCommand' } },
    });
  });
  it('traverse: the demo pinion coupon (README example) to 550 HV, by hand 0.8 + (566 − 550)/(566 − 545)·0.1 = 0.876 mm', () => {
    const { output, exitCode } = runCli(['traverse', 'public/examples/pinion-kr2231-traverse.json'], (file) =>
      execFileSync('cat', [file!], { encoding: 'utf8' }),
    );
    expect(exitCode).toBe(0);
    expect(output).toMatchObject({
      effectiveCaseDepthMm: 0.876,
      limit: { value: 550, unit: 'HV' },
      surfaceHardness: { value: 712, unit: 'HV' },
      coreHardness: { value: 366.7, unit: 'HV' }, // (372 + 366 + 362)/3
      crossings: 1,
      warnings: [],
    });
  });
  it('traverse: warnings and errors are whole English sentences naming the point', () => {
    const never = runCli(
      ['traverse'],
      from('{"points":[{"depthMm":0.1,"value":62,"unit":"HRC"},{"depthMm":0.3,"value":600,"unit":"HV"}]}'),
    );
    const messages = (never.output as { warnings: { message: string }[] }).warnings.map((w) => w.message);
    expect(messages).toEqual([
      'Points in HRC were converted to HV with the ASTM E140 table to compare them with the limit: approximate; use the standard’s tables for acceptance.',
      'The hardness stays above the limit 550 HV down to the deepest point (0.3 mm): no effective case depth. Measure deeper.',
      'Fewer than 3 points below the limit at the deep end: no core hardness. Measure deeper.',
    ]);
    const bad = runCli(
      ['traverse'],
      from('{"points":[{"depthMm":0.1,"value":700,"unit":"HV"},{"depthMm":0.3,"value":35,"unit":"HV"}]}'),
    );
    expect(bad).toEqual({
      exitCode: 1,
      output: {
        error: {
          code: 'hardness.outsideScaleOtherUnit',
          field: 'points.1.value',
          message: '35 HV is outside 80–940 HV. Did you mean 35 HRC?',
        },
      },
    });
  });
  it('runs as a process: `npm run casefront -- time` reads stdin and exits 0', () => {
    const run = spawnSync('npx', ['tsx', 'src/cli.ts', 'time'], {
      input: '{"temperatureC": 925, "targetDepthMm": 0.9, "surfaceCarbonPct": 0.9, "coreCarbonPct": 0.2}',
      encoding: 'utf8',
    });
    expect(run.status).toBe(0);
    expect(JSON.parse(run.stdout).timeH).toBeGreaterThan(6);
  });
});

describe('CLI numbers: rounded by the unit their key names, still numbers', () => {
  it('drops floating noise and keeps the digits the trade reads', () => {
    expect(
      roundOutput({
        temperatureC: 900.0000000000001,
        effectiveCaseDepthMm: 0.8637132313104543,
        surfaceCarbonPct: 0.8763801039992863,
        timeH: 5.816666666666666,
        diffusivityM2PerS: 1.515173095455378e-11,
        alloyFactor: 1.1180929847,
        hardnessHrc: 58.2637,
      }),
    ).toEqual({
      temperatureC: 900,
      effectiveCaseDepthMm: 0.8637,
      surfaceCarbonPct: 0.8764,
      timeH: 5.8167,
      diffusivityM2PerS: 1.515e-11,
      alloyFactor: 1.11809,
      hardnessHrc: 58.3,
    });
  });
  it('a nested min/max takes the unit of the key that holds it', () => {
    expect(roundOutput({ modelRangeC: { min: 912.123456, max: 930.98765 }, bandMm: [0.812345, 0.9] })).toEqual({
      modelRangeC: { min: 912.12, max: 930.99 },
      bandMm: [0.8123, 0.9],
    });
  });
  it('every number of a real cycle run is short (no 16-digit floats)', () => {
    const { output } = runCli(['simulate', 'public/examples/pinion-kr2231-cycle.json'], (file) =>
      execFileSync('cat', [file!], { encoding: 'utf8' }),
    );
    const numbers = JSON.stringify(output).match(/-?\d+\.\d+(?:e-?\d+)?/g) ?? [];
    expect(numbers.length).toBeGreaterThan(50);
    for (const n of numbers) expect(n.replace(/e.*$/, '').replace(/^-?\d+\./, '').length).toBeLessThanOrEqual(6);
  });
});
