/** The physics worker's tasks and the newest-answer-wins store the screens read (inline here: Node has no Worker). */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { latestRun, runTask } from '../../src/app/worker/client';
import { runRequest } from '../../src/app/worker/tasks';
import { cycleDepthBand, planTwoStepCycle, readRecipe } from '../../src/physics';

const planRequest = JSON.parse(readFileSync('public/examples/pinion-kr2231-plan.json', 'utf8')) as Record<
  string,
  unknown
>;
const until = async (done: () => boolean) => {
  for (let i = 0; i < 500 && !done(); i++) await new Promise((r) => setTimeout(r, 5));
};

describe('physics worker tasks', () => {
  it('answer exactly what physics answers, with the time they took', async () => {
    const { output, ms } = await runTask('plan', planRequest);
    expect(output).toEqual(planTwoStepCycle(planRequest));
    expect(ms).toBeGreaterThan(0);
    const recipe = readRecipe(JSON.parse(readFileSync('public/examples/pinion-kr2231-cycle.json', 'utf8')));
    if (!recipe.ok) throw new Error(recipe.error.code);
    const band = await runTask('band', { recipe: recipe.value, options: { temperatureToleranceC: 5 } });
    expect(band.output).toEqual(cycleDepthBand(recipe.value, { temperatureToleranceC: 5 }));
  });

  it('a task that throws comes back as an error in words, not as a crash of the worker', () => {
    const reply = runRequest({ id: 7, task: 'band', input: null });
    expect(reply).toMatchObject({ id: 7, error: expect.stringMatching(/\w/u) });
  });
});

describe('the newest input wins', () => {
  it('while one input is computed, later ones replace each other; the last is computed next', async () => {
    const asked: number[] = [];
    const store = latestRun('plan', (input) => {
      asked.push(Number(input.timeLimitH));
      return JSON.stringify(input);
    });
    expect(store.updating.value).toBe(false);
    for (const timeLimitH of [20, 21, 22, 23]) store.run({ ...planRequest, timeLimitH });
    expect(store.updating.value).toBe(true);
    store.run({ ...planRequest, timeLimitH: 23 }); // the same input again: nothing new
    await until(() => !store.updating.value);
    const answer = store.answer.value;
    expect(answer && 'output' in answer && answer.input.timeLimitH).toBe(23);
    expect(answer && 'output' in answer && answer.output).toEqual(planTwoStepCycle({ ...planRequest, timeLimitH: 23 }));
    expect(asked).toEqual([20, 21, 22, 23, 23]);
  });

  it('keeps the last answer on show while the next is worked out', async () => {
    const store = latestRun('plan');
    store.run(planRequest);
    await until(() => !store.updating.value);
    const first = store.answer.value;
    store.run({ ...planRequest, timeLimitH: 30 });
    expect(store.updating.value).toBe(true);
    expect(store.answer.value).toBe(first);
    await until(() => !store.updating.value);
    expect(store.answer.value).not.toBe(first);
  });
});
