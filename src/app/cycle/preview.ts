/**
 * PREVIEW ONLY, NOT THE CYCLE SOLVER. Until the numerical solver of src/physics/cycle
 * is merged, the cycle screen shows this closed-form estimate, and says so on screen:
 * the whole cycle is treated as ONE soak with a constant surface carbon, namely
 *  - at the temperature of the longest step that transfers carbon,
 *  - for the equivalent time of all transferring steps at that temperature (ramps included),
 *  - with the time-weighted mean carbon potential × the alloy factor as surface carbon.
 * It ignores β, the part's shape (except for the through-carburizing caution), the
 * boost/diffuse redistribution and any step without transfer. Same request and result
 * shapes as the solver (Recipe in, SimulationResult out).
 */
import {
  alloyFactor,
  asQuenchedHardnessHrc,
  atmosphereTemperatureWarning,
  constantSurfaceCarbon,
  constantSurfaceDepth,
  DEFAULT_ECD_THRESHOLD_PCT,
  DEFAULT_MODEL,
  effectiveDiffusivity,
  equivalentTimeH,
  fail,
  modelRangeWarning,
  ok,
  retainedAusteniteWarning,
  saturationWarnings,
  SECONDS_PER_HOUR,
  celsiusToKelvin,
  totalCaseThresholdPct,
  type Result,
  type Warning,
} from '../../physics';
import type { Recipe, SimulationResult } from '../../physics/cycle/recipe';
import { checkCarbonPct, checkTemperatureC, checkTimeH } from '../../physics/validate';

/** Points in the previewed profile. */
const PROFILE_POINTS = 41;

function checkRecipe(request: unknown): Result<Recipe> {
  const recipe = request as Recipe;
  if (typeof request !== 'object' || request === null || !Array.isArray(recipe.steps) || typeof recipe.steel !== 'object') {
    return fail('request.notObject');
  }
  if (recipe.steps.length === 0) return fail('field.missing', 'steps');
  for (const [i, s] of recipe.steps.entries()) {
    const checks = [
      checkTimeH(s.durationH, `steps.${i}.durationH`),
      checkTemperatureC(s.startTempC, `steps.${i}.startTempC`),
      checkTemperatureC(s.endTempC, `steps.${i}.endTempC`),
      ...(s.carbonPotentialPct === null ? [] : [checkCarbonPct(s.carbonPotentialPct, `steps.${i}.carbonPotentialPct`)]),
    ];
    const bad = checks.find((c) => !c.ok);
    if (bad) return bad as Result<Recipe>;
    if (s.betaMPerS !== undefined && !(s.betaMPerS > 0)) return fail('beta.notPositive', `steps.${i}.betaMPerS`, { value: s.betaMPerS });
  }
  const core = checkCarbonPct(recipe.steel.coreCarbonPct, 'steel.coreCarbonPct');
  return core.ok ? ok(recipe) : (core as Result<Recipe>);
}

/** The single-soak closed-form estimate described above. */
export function previewCycle(request: unknown): Result<SimulationResult> {
  const checked = checkRecipe(request);
  if (!checked.ok) return checked;
  const recipe = checked.value;
  const model = recipe.model ?? DEFAULT_MODEL;
  const corePct = recipe.steel.coreCarbonPct;
  const transfer = recipe.steps.map((s, index) => ({ ...s, index })).filter((s) => s.carbonPotentialPct !== null);
  if (transfer.length === 0) return fail('field.missing', 'steps.0.carbonPotentialPct');

  const longest = transfer.reduce((a, b) => (b.durationH > a.durationH ? b : a));
  const refTempC = (longest.startTempC + longest.endTempC) / 2;
  const transferH = transfer.reduce((sum, s) => sum + s.durationH, 0);
  const meanPotentialPct = transfer.reduce((sum, s) => sum + s.carbonPotentialPct! * s.durationH, 0) / transferH;
  const surfacePct = meanPotentialPct * (recipe.steel.composition ? alloyFactor(recipe.steel.composition) : 1);
  if (!(surfacePct > corePct)) {
    return fail('carbon.surfaceNotAboveCore', `steps.${longest.index}.carbonPotentialPct`, { surfacePct, corePct });
  }
  const thresholdPct = recipe.thresholdCarbonPct ?? DEFAULT_ECD_THRESHOLD_PCT;
  if (!(thresholdPct > corePct && thresholdPct < surfacePct)) {
    return fail('threshold.outsideProfile', 'thresholdCarbonPct', { thresholdPct, corePct, surfacePct });
  }

  let clockH = 0;
  const history = transfer.flatMap((s) => {
    const points = [
      { timeH: clockH, temperatureC: s.startTempC },
      { timeH: clockH + s.durationH, temperatureC: s.endTempC },
    ];
    clockH += s.durationH;
    return points;
  });
  const midPct = (surfacePct + corePct) / 2;
  const timeS = equivalentTimeH(history, refTempC, model, midPct) * SECONDS_PER_HOUR;
  const D = effectiveDiffusivity(model, celsiusToKelvin(refTempC), surfacePct, corePct);
  const depthMm = (cut: number) => constantSurfaceDepth(timeS, D, surfacePct, corePct, cut) * 1e3;
  const ecdMm = depthMm(thresholdPct);
  const totalMm = depthMm(totalCaseThresholdPct(corePct));

  const limitMm = recipe.shape?.kind === 'plate' ? recipe.shape.thicknessMm / 2 : recipe.shape?.kind === 'bar' ? recipe.shape.diameterMm / 2 : Infinity;
  const spanMm = Math.min(Math.max(1.6 * totalMm, 0.5), limitMm);
  const profile = Array.from({ length: PROFILE_POINTS }, (_, i) => {
    const x = (spanMm * i) / (PROFILE_POINTS - 1);
    const carbonPct = constantSurfaceCarbon(x * 1e-3, timeS, D, surfacePct, corePct);
    return { depthMm: x, carbonPct, hardnessHrc: asQuenchedHardnessHrc(carbonPct) };
  });

  const warnings: Warning[] = [
    ...recipe.steps.flatMap((s, stepIndex) =>
      s.carbonPotentialPct === null
        ? []
        : [
            ...saturationWarnings(Math.min(s.startTempC, s.endTempC), s.carbonPotentialPct, s.carbonPotentialPct).filter(
              (w) => w.code === 'saturation.potentialAboveAcm',
            ),
            ...atmosphereTemperatureWarning(Math.min(s.startTempC, s.endTempC)),
          ].map((w) => ({ ...w, stepIndex })),
    ),
    ...saturationWarnings(refTempC, surfacePct).filter((w) => w.code === 'saturation.surfaceAboveAcm'),
    ...retainedAusteniteWarning(surfacePct),
    ...modelRangeWarning(refTempC, midPct),
    ...(Number.isFinite(limitMm) && totalMm > limitMm / 3
      ? [{ code: 'shape.throughCarburizing' as const, params: { depthMm: Number(totalMm.toFixed(2)), limitMm: Number(limitMm.toFixed(2)) } }]
      : []),
  ];

  return ok({
    effectiveCaseDepthMm: ecdMm,
    totalCaseDepthMm: totalMm,
    surfaceCarbonPct: surfacePct,
    profile,
    surfaceHistory: [
      { timeH: 0, carbonPct: surfacePct },
      { timeH: clockH, carbonPct: surfacePct },
    ],
    warnings,
  });
}
