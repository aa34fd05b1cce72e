/** Closed-form calculator: one full `depth` request (three models, ±10 °C, cautions). */
import { caseDepth } from '../../src/physics/caseDepth';
import { medianMs } from './timing';

const pinion = {
  temperatureC: 925,
  timeH: 6,
  surfaceCarbonPct: 0.9,
  coreCarbonPct: 0.2,
  composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
};

export async function run(): Promise<Record<string, number>> {
  const depthRequestMs = await medianMs(() => caseDepth(pinion), 200, 50);
  console.log(`depth request (demo pinion): median ${depthRequestMs.toFixed(4)} ms over 200 runs`);
  return { depthRequestMs };
}
