/**
 * One rule, one place: a limit changed in physics' table (physics/limits.ts) changes the CLI, the
 * job record's schema and the app's reading and messages together. The modules are loaded afresh
 * with the hottest carburizing temperature lowered from 1150 to 1000 °C and the step count from 50
 * to 8, and each layer is asked about the same inputs.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import type * as Limits from '../src/physics/limits';

const DEPTH = { temperatureC: 1050, timeH: 6, carbonPotentialPct: 0.9, coreCarbonPct: 0.2 };
const step = { durationH: 0.5, startTempC: 925, carbonPotentialPct: 0.9 };
const nineSteps = { steel: { coreCarbonPct: 0.2 }, steps: Array.from({ length: 9 }, () => step) };

/** Every layer, loaded with `changed` applied to the physics limits (none: as shipped). */
async function layers(changed?: (real: typeof Limits) => Record<string, unknown>) {
  vi.resetModules();
  if (changed) {
    vi.doMock('../src/physics/limits', async (importOriginal) => {
      const real = await importOriginal<typeof Limits>();
      return { ...real, ...changed(real) };
    });
  }
  const { runCli } = await import('../src/cli');
  const { JobInputsSchema } = await import('../src/jobs/inputs');
  const v = await import('valibot');
  const { computeDepth } = await import('../src/app/depth/results');
  const { DEFAULT_DEPTH_FORM } = await import('../src/app/depth/state');
  const { addStep, DEFAULT_CYCLE_FORM } = await import('../src/app/cycle/state');
  const { field } = await import('../src/app/ui/fieldText');
  const { wordError } = await import('../src/app/ui/fieldError');
  const { createI18n } = await import('../src/i18n/i18n');
  const settings = {
    model: 'agren' as const,
    ecdThresholdPct: 0.4,
    totalCaseMarginPct: 0.05,
    temperatureToleranceC: 8,
  };
  const app = computeDepth({ ...DEFAULT_DEPTH_FORM, temperature: field('1050', 'C') }, settings);
  const appError = app.errors.temperatureC;
  let cycle = DEFAULT_CYCLE_FORM;
  for (let i = 0; i < 60; i++) cycle = addStep(cycle);
  return {
    cli: runCli(['depth'], () => JSON.stringify(DEPTH)),
    cliSteps: runCli(['simulate'], () => JSON.stringify(nineSteps)),
    schema: v.safeParse(JobInputsSchema, { kind: 'depth', ...DEPTH }).success,
    schemaSteps: v.safeParse(JobInputsSchema, { kind: 'cycle', recipe: nineSteps }).success,
    appCode: appError?.code,
    appWords: appError
      ? wordError(createI18n('en').t, appError, { temperature: 'F', depth: 'in', time: 'h' }, 'en')
      : undefined,
    editorSteps: cycle.steps.length,
  };
}

afterEach(() => {
  vi.doUnmock('../src/physics/limits');
  vi.resetModules();
});

describe('a limit changed in the physics table changes every layer together', () => {
  it('as shipped: 1050 °C and nine steps are accepted by the CLI, the job schema and the app', async () => {
    const shipped = await layers();
    expect(shipped.cli.exitCode).toBe(0);
    expect(shipped.cliSteps.exitCode).toBe(0);
    expect(shipped.schema).toBe(true);
    expect(shipped.schemaSteps).toBe(true);
    expect(shipped.appCode).toBeUndefined();
    expect(shipped.editorSteps).toBe(50);
  });

  it('hottest temperature 1000 °C, at most 8 steps: the CLI, the job schema, the app and its words all follow', async () => {
    const lowered = await layers((real) => ({
      LIMITS: { ...real.LIMITS, temperature: { ...real.LIMITS.temperature, max: 1000 } },
      MAX_STEPS: 8,
    }));
    expect(lowered.cli.exitCode).toBe(1);
    expect(lowered.cli.output).toMatchObject({
      error: { code: 'temperature.outOfRange', message: 'Temperature 1050 °C: it must be between 727 °C and 1000 °C.' },
    });
    expect(lowered.schema).toBe(false);
    expect(lowered.appCode).toBe('temperature.outOfRange');
    // In the app's words, in °F for a US user: 1000 °C is 1832 °F.
    expect(lowered.appWords).toBe('Temperature 1922\u202f°F: it must be between 1340.6\u202f°F and 1832\u202f°F.');
    expect(lowered.cliSteps.output).toMatchObject({ error: { code: 'steps.tooMany', field: 'steps' } });
    expect(lowered.schemaSteps).toBe(false);
    expect(lowered.editorSteps).toBe(8);
  });
});
