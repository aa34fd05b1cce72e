/** The `plan` command of the CLI on the demo requests in public/examples/ (invented Kestrel Ridge scenario). */
import { describe, expect, it } from 'vitest';
import { roundOutput, runCli } from '../../../src/cli';
import { planTwoStepCycle } from '../../../src/physics/planner/planner';
import { pinionWith, readExample } from './fixtures';

interface Worded {
  code: string;
  params?: Record<string, unknown>;
  message: string;
}

describe('CLI `plan`', () => {
  it.each(['pinion-kr2231-plan.json', 'shaft-kr4410-plan.json'])(
    '%s: exit 0, reachable, the same plan as the physics call',
    (file) => {
      const { output, exitCode } = runCli(['plan', file], () => readExample(file));
      expect(exitCode).toBe(0);
      const direct = planTwoStepCycle(JSON.parse(readExample(file)));
      if (!direct.ok) throw new Error(direct.error.code);
      expect(output).toMatchObject({
        reachable: true,
        boostH: direct.value.boostH,
        diffuseH: direct.value.diffuseH,
        totalH: direct.value.totalH,
      });
      // The CLI prints the same figures, rounded by their units.
      expect((output as { predicted: unknown }).predicted).toEqual(roundOutput(direct.value.predicted));
    },
  );

  it('words the binding constraint and every suggestion in English', () => {
    const request = pinionWith({ targetSurfaceCarbonPct: { min: 0.85, max: 0.95 } });
    const { output, exitCode } = runCli(['plan'], () => JSON.stringify(request));
    expect(exitCode).toBe(0);
    const { reachable, binding, suggestions } = output as {
      reachable: boolean;
      binding: Worded;
      suggestions: Worded[];
    };
    expect(reachable).toBe(false);
    expect(binding.code).toBe('plan.surfaceCarbonTooHighForDiffusePotential');
    expect(binding.message).toMatch(
      /^Surface carbon of at least 0\.85 %C is above what the diffuse potential 0\.8 %C leaves/,
    );
    expect(suggestions.length).toBeGreaterThan(0);
    for (const s of suggestions) expect(s.message).toMatch(/^Raise the diffuse potential to about \d\.\d+ %C\.$/);
  });

  it('a bad request exits 1 with the field and an English message', () => {
    const { output, exitCode } = runCli(['plan'], () =>
      JSON.stringify(pinionWith({ targetEcdMm: { min: 1, max: 0.75 } })),
    );
    expect(exitCode).toBe(1);
    expect(output).toEqual({
      error: {
        code: 'range.minAboveMax',
        field: 'targetEcdMm.max',
        message: 'The lower limit 1 mm is above the upper limit 0.75 mm.',
      },
    });
  });
});
