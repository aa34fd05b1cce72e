/**
 * Cycle planner: the demo pinion plan request (KR-2231, SAE 8620, ECD 0.75–1.00 mm, surface
 * 0.75–0.90 %C), as one full `plan` request, the way a supervisor waits on it. Also the cost and
 * accuracy of searching at the simulator's default resolution instead of the coarse one.
 */
import { readFileSync } from 'node:fs';
import { runCycle } from '../../src/physics/cycle/simulate';
import {
  planForTargets,
  planTwoStepCycle,
  SEARCH_RESOLUTION,
  VERIFY_RESOLUTION,
  type PlanResult,
} from '../../src/physics/planner/planner';
import { readPlanRequest } from '../../src/physics/planner/readPlanRequest';
import { medianMs } from './timing';

const pinionRequest: unknown = JSON.parse(
  readFileSync(new URL('../../public/examples/pinion-kr2231-plan.json', import.meta.url), 'utf8'),
);

/** Resolution of the converged reference run the plan is compared with (× finer grid and time steps). */
const REFERENCE_RESOLUTION = 32;
const RUNS = 50;

/** Plan's predicted ECD and surface carbon against a converged forward run of its recipe. */
function accuracy(plan: PlanResult) {
  const fine = runCycle(plan.recipe, REFERENCE_RESOLUTION);
  return {
    ecdErrorPct:
      (Math.abs(plan.predicted.effectiveCaseDepthMm - fine.effectiveCaseDepthMm) / fine.effectiveCaseDepthMm) * 100,
    surfaceErrorPct: Math.abs(plan.predicted.surfaceCarbonPct - fine.surfaceCarbonPct),
    aimMissMm: Math.abs(plan.predicted.effectiveCaseDepthMm - plan.aim!.effectiveCaseDepthMm),
    aimMissPct: Math.abs(plan.predicted.surfaceCarbonPct - plan.aim!.surfaceCarbonPct),
  };
}

export async function run(): Promise<Record<string, number>> {
  const request = readPlanRequest(pinionRequest);
  if (!request.ok) throw new Error(`bench plan request rejected: ${request.error.code}`);
  const result = planTwoStepCycle(pinionRequest);
  if (!result.ok || !result.value.reachable) throw new Error('bench plan request not reachable');
  const plan = result.value;
  const planMs = await medianMs(() => planTwoStepCycle(pinionRequest), RUNS, 5);
  const planSimulations = plan.simulations;
  const coarse = accuracy(plan);

  const fullOptions = { searchResolution: VERIFY_RESOLUTION };
  const full = planForTargets(request.value, fullOptions);
  const planFullSearchMs = await medianMs(() => planForTargets(request.value, fullOptions), RUNS, 5);
  const fullAccuracy = accuracy(full);

  console.log(
    `plan (demo pinion): median ${planMs.toFixed(3)} ms over ${RUNS} runs, ${planSimulations} simulator runs ` +
      `(search at resolution ${SEARCH_RESOLUTION}, check at ${VERIFY_RESOLUTION}); boost ${plan.boostH} h, diffuse ${plan.diffuseH} h, total ${plan.totalH} h`,
  );
  console.log(
    `  ECD ${plan.predicted.effectiveCaseDepthMm.toFixed(4)} mm (aim ${plan.aim!.effectiveCaseDepthMm}, off by ${coarse.aimMissMm.toFixed(5)} mm), ` +
      `surface ${plan.predicted.surfaceCarbonPct.toFixed(4)} %C (aim ${plan.aim!.surfaceCarbonPct.toFixed(4)}, off by ${coarse.aimMissPct.toFixed(5)} %C); ` +
      `against a ${REFERENCE_RESOLUTION}× finer run: ECD ${coarse.ecdErrorPct.toFixed(4)} %, surface ${coarse.surfaceErrorPct.toExponential(1)} %C`,
  );
  console.log(
    `  searching at resolution ${VERIFY_RESOLUTION} instead: median ${planFullSearchMs.toFixed(3)} ms, ${full.simulations} simulator runs; ` +
      `ECD off the aim by ${fullAccuracy.aimMissMm.toFixed(5)} mm, surface by ${fullAccuracy.aimMissPct.toFixed(5)} %C; ` +
      `against the finer run: ECD ${fullAccuracy.ecdErrorPct.toFixed(4)} %, surface ${fullAccuracy.surfaceErrorPct.toExponential(1)} %C`,
  );
  return {
    planMs,
    planSimulations,
    planEcdErrorPct: coarse.ecdErrorPct,
    planSurfaceErrorCarbonPct: coarse.surfaceErrorPct,
    planEcdAimMissMm: coarse.aimMissMm,
    planSurfaceAimMissCarbonPct: coarse.aimMissPct,
    planFullSearchMs,
    planFullSearchSimulations: full.simulations,
    planFullSearchEcdAimMissMm: fullAccuracy.aimMissMm,
  };
}
