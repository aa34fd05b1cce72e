import { execFileSync, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { runCli } from '../src/cli';

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
        message: 'Temperature 1200 °C is outside 727–1150 °C.',
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
  it('runs as a process: `npm run casefront -- time` reads stdin and exits 0', () => {
    const run = spawnSync('npx', ['tsx', 'src/cli.ts', 'time'], {
      input: '{"temperatureC": 925, "targetDepthMm": 0.9, "surfaceCarbonPct": 0.9, "coreCarbonPct": 0.2}',
      encoding: 'utf8',
    });
    expect(run.status).toBe(0);
    expect(JSON.parse(run.stdout).timeH).toBeGreaterThan(6);
  });
});
