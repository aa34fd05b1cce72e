/**
 * The case-depth calculators behind the CLI's `depth`, `time` and `temperature`
 * commands and the app's first screen: validated requests in, typed results out.
 * Depths in mm, time in h, temperature in °C, carbon in wt% at this boundary; SI inside.
 */
import {
  atmosphereTemperatureWarning,
  modelRangeWarning,
  retainedAusteniteWarning,
  saturationWarnings,
  twoPhaseCoreWarning,
} from './cautions';
import { constantSurfaceDepth, constantSurfaceTime, diffusionLength } from './closedForm';
import { effectiveDiffusivity, MODEL_IDS, type DiffusivityModelId } from './diffusivity';
import { asQuenchedHardnessHrc } from './hardness';
import { fail, ok, type Result, type Warning } from './result';
import { brentRoot } from './rootFinding';
import { harrisTotalCaseDepthMm } from './rulesOfThumb';
import {
  alloyFactor,
  DEFAULT_ECD_THRESHOLD_PCT,
  hasAustenite,
  TOTAL_CASE_MARGIN_PCT,
  totalCaseThresholdPct,
  type Composition,
} from './steel';
import { depthBand, DEFAULT_TEMPERATURE_TOLERANCE_C, type DepthBand } from './uncertainty';
import { celsiusToKelvin, SECONDS_PER_HOUR } from './units';
import {
  asFields,
  checkCarbonPct,
  checkDepthMm,
  checkDiffusivityFactor,
  checkTemperatureC,
  checkTemperatureTolerance,
  checkTotalCaseMargin,
  checkTimeH,
  readChecked,
  readComposition,
  readModel,
  readOptionalNumber,
  type Fields,
} from './validate';

/** Temperatures searched when solving for temperature, °C: all above A1 (727 °C), so the answer always has austenite. */
export const TEMPERATURE_SEARCH_C = { min: 800, max: 1100 } as const;
/** Step for the "±10 °C changes the depth by …" figure, °C. */
export const SENSITIVITY_STEP_C = 10;

/** The steel and the carbon levels that define a case, read once from a request. */
export interface CaseSpec {
  /** Surface carbon held during the cycle, wt% (after the alloy factor when given as a potential). */
  surfaceCarbonPct: number;
  /** Atmosphere carbon potential, wt%, when the request gave one (or it follows from surface and alloy factor). */
  carbonPotentialPct: number;
  coreCarbonPct: number;
  thresholdCarbonPct: number;
  model: DiffusivityModelId;
  composition?: Composition;
  /** Gunnarson alloy factor applied between potential and surface carbon (1 for plain carbon). */
  alloyFactor: number;
  /** Furnace calibration factor on D (1 when uncalibrated). */
  diffusivityFactor: number;
  /** Furnace temperature tolerance for the uncertainty band, ±°C. */
  temperatureToleranceC: number;
  /** Total case ends this far above core carbon, %C. */
  totalCaseMarginPct: number;
}

export interface DepthFigures {
  effectiveCaseDepthMm: number;
  totalCaseDepthMm: number;
  sqrtDtMm: number;
  diffusivityM2PerS: number;
}

export interface CaseDepthResult extends DepthFigures {
  temperatureC: number;
  timeH: number;
  surfaceCarbonPct: number;
  carbonPotentialPct: number;
  coreCarbonPct: number;
  thresholdCarbonPct: number;
  totalCaseThresholdPct: number;
  alloyFactor: number;
  diffusivityFactor: number;
  model: DiffusivityModelId;
  /** Harris (1943) total case depth: surface at saturation, time at temperature. */
  harrisDepthMm: number;
  /** Effective case depth under each diffusivity model, and their range. */
  modelRangeMm: { min: number; max: number; byModel: Record<DiffusivityModelId, number> };
  /** Effective case depth with the temperature 10 °C lower and higher. */
  temperatureSensitivity: { stepC: number; minusMm: number; plusMm: number };
  /** Band on the effective case depth from model spread and furnace temperature tolerance. */
  uncertaintyMm: DepthBand;
  /** Indicative maximum as-quenched surface hardness, HRC. */
  surfaceHardnessHrc: number;
  warnings: Warning[];
}

export interface TimeResult extends CaseDepthResult {
  targetDepthMm: number;
  /** Time needed under each diffusivity model, and their range, h. */
  modelRangeH: { min: number; max: number };
}

export interface TemperatureResult extends CaseDepthResult {
  targetDepthMm: number;
  /** Temperature needed under each diffusivity model, and their range, °C (absent when a model cannot reach it). */
  modelRangeC?: { min: number; max: number };
}

/** Reads surface, core, threshold, model and composition, with their cross-checks. */
export function readCaseSpec(fields: Fields): Result<CaseSpec> {
  const model = readModel(fields);
  if (!model.ok) return model;
  const composition = readComposition(fields);
  if (!composition.ok) return composition;
  const factor = composition.value ? alloyFactor(composition.value) : 1;
  const core = readChecked(fields, 'coreCarbonPct', checkCarbonPct);
  if (!core.ok) return core;
  const given = readOptionalNumber(fields, 'surfaceCarbonPct');
  if (!given.ok) return given;
  const potential = readOptionalNumber(fields, 'carbonPotentialPct');
  if (!potential.ok) return potential;
  if (given.value === undefined && potential.value === undefined) return fail('field.missing', 'surfaceCarbonPct');
  if (potential.value !== undefined) {
    const checked = checkCarbonPct(potential.value, 'carbonPotentialPct');
    if (!checked.ok) return checked;
  }
  const surfaceField = given.value === undefined ? 'carbonPotentialPct' : 'surfaceCarbonPct';
  const surface = checkCarbonPct(given.value ?? potential.value! * factor, surfaceField);
  if (!surface.ok) return surface;
  // Without a stated potential, the one implied by the surface carbon feeds the soot caution.
  const potentialPct = potential.value ?? surface.value / factor;
  if (!(surface.value > core.value)) {
    return fail('carbon.surfaceNotAboveCore', surfaceField, { surfacePct: surface.value, corePct: core.value });
  }
  const threshold = readOptionalNumber(fields, 'thresholdCarbonPct');
  if (!threshold.ok) return threshold;
  const thresholdPct = threshold.value ?? DEFAULT_ECD_THRESHOLD_PCT;
  if (!(thresholdPct > core.value && thresholdPct < surface.value)) {
    return fail('threshold.outsideProfile', 'thresholdCarbonPct', {
      thresholdPct,
      corePct: core.value,
      surfacePct: surface.value,
    });
  }
  const factorField = readOptionalNumber(fields, 'diffusivityFactor');
  if (!factorField.ok) return factorField;
  const diffusivityFactor = checkDiffusivityFactor(factorField.value ?? 1, 'diffusivityFactor');
  if (!diffusivityFactor.ok) return diffusivityFactor;
  const tolerance = readOptionalNumber(fields, 'temperatureToleranceC');
  if (!tolerance.ok) return tolerance;
  const toleranceC = checkTemperatureTolerance(
    tolerance.value ?? DEFAULT_TEMPERATURE_TOLERANCE_C,
    'temperatureToleranceC',
  );
  if (!toleranceC.ok) return toleranceC;
  const margin = readOptionalNumber(fields, 'totalCaseMarginPct');
  if (!margin.ok) return margin;
  const marginPct = checkTotalCaseMargin(margin.value ?? TOTAL_CASE_MARGIN_PCT, 'totalCaseMarginPct');
  if (!marginPct.ok) return marginPct;
  return ok({
    totalCaseMarginPct: marginPct.value,
    diffusivityFactor: diffusivityFactor.value,
    temperatureToleranceC: toleranceC.value,
    surfaceCarbonPct: surface.value,
    carbonPotentialPct: potentialPct,
    coreCarbonPct: core.value,
    thresholdCarbonPct: thresholdPct,
    model: model.value,
    ...(composition.value ? { composition: composition.value } : {}),
    alloyFactor: factor,
  });
}

/** Effective constant D for a spec (model at mean carbon, times the furnace factor), m²/s; 0 without austenite. */
function specDiffusivity(spec: CaseSpec, temperatureC: number, model: DiffusivityModelId): number {
  // The request was checked above A1; a band or sensitivity case that falls to A1 or below gets no case.
  if (!hasAustenite(temperatureC)) return 0;
  const D = effectiveDiffusivity(model, celsiusToKelvin(temperatureC), spec.surfaceCarbonPct, spec.coreCarbonPct);
  return spec.diffusivityFactor * D;
}

/** Effective and total case depth, √(Dt) and D for one model, temperature and time. */
export function depthFigures(spec: CaseSpec, temperatureC: number, timeH: number, model = spec.model): DepthFigures {
  const D = specDiffusivity(spec, temperatureC, model);
  const timeS = timeH * SECONDS_PER_HOUR;
  const totalThreshold = totalCaseThresholdPct(spec.coreCarbonPct, spec.totalCaseMarginPct);
  const depthMm = (thresholdPct: number) =>
    thresholdPct >= spec.surfaceCarbonPct
      ? 0
      : constantSurfaceDepth(timeS, D, spec.surfaceCarbonPct, spec.coreCarbonPct, thresholdPct) * 1e3;
  return {
    effectiveCaseDepthMm: depthMm(spec.thresholdCarbonPct),
    totalCaseDepthMm: depthMm(totalThreshold),
    sqrtDtMm: diffusionLength(D, timeS) * 1e3,
    diffusivityM2PerS: D,
  };
}

/** All figures for a valid spec at a temperature and time. */
export function evaluateCaseDepth(spec: CaseSpec, temperatureC: number, timeH: number): CaseDepthResult {
  const byModel = Object.fromEntries(
    MODEL_IDS.map((id) => [id, depthFigures(spec, temperatureC, timeH, id).effectiveCaseDepthMm]),
  ) as Record<DiffusivityModelId, number>;
  const depths = Object.values(byModel);
  const ecdAt = (tempC: number) => depthFigures(spec, tempC, timeH).effectiveCaseDepthMm;
  const meanCarbonPct = (spec.surfaceCarbonPct + spec.coreCarbonPct) / 2;
  return {
    ...depthFigures(spec, temperatureC, timeH),
    temperatureC,
    timeH,
    surfaceCarbonPct: spec.surfaceCarbonPct,
    carbonPotentialPct: spec.carbonPotentialPct,
    coreCarbonPct: spec.coreCarbonPct,
    thresholdCarbonPct: spec.thresholdCarbonPct,
    totalCaseThresholdPct: totalCaseThresholdPct(spec.coreCarbonPct, spec.totalCaseMarginPct),
    alloyFactor: spec.alloyFactor,
    diffusivityFactor: spec.diffusivityFactor,
    model: spec.model,
    harrisDepthMm: harrisTotalCaseDepthMm(timeH, temperatureC),
    modelRangeMm: { min: Math.min(...depths), max: Math.max(...depths), byModel },
    temperatureSensitivity: {
      stepC: SENSITIVITY_STEP_C,
      minusMm: ecdAt(temperatureC - SENSITIVITY_STEP_C),
      plusMm: ecdAt(temperatureC + SENSITIVITY_STEP_C),
    },
    uncertaintyMm: depthBand(
      (c) => depthFigures(spec, temperatureC + c.tempOffsetC, timeH, c.model).effectiveCaseDepthMm,
      spec.model,
      { temperatureToleranceC: spec.temperatureToleranceC },
    ),
    surfaceHardnessHrc: asQuenchedHardnessHrc(spec.surfaceCarbonPct),
    warnings: [
      ...saturationWarnings(temperatureC, spec.surfaceCarbonPct, spec.carbonPotentialPct),
      ...atmosphereTemperatureWarning(temperatureC),
      ...retainedAusteniteWarning(spec.surfaceCarbonPct),
      ...modelRangeWarning(temperatureC, meanCarbonPct),
      ...twoPhaseCoreWarning(temperatureC, spec.coreCarbonPct, spec.composition),
    ],
  };
}

type Check = (value: number, field: string) => Result<number>;

/** Reads the two numbers a calculator request turns on, then the case spec (errors in that order). */
function readCalculatorRequest(
  request: unknown,
  first: [string, Check],
  second: [string, Check],
): Result<[number, number, CaseSpec]> {
  const fields = asFields(request);
  if (!fields.ok) return fields;
  const a = readChecked(fields.value, ...first);
  if (!a.ok) return a;
  const b = readChecked(fields.value, ...second);
  if (!b.ok) return b;
  const spec = readCaseSpec(fields.value);
  return spec.ok ? ok([a.value, b.value, spec.value]) : spec;
}

/** `depth`: case depths after `timeH` at `temperatureC`. */
export function caseDepth(request: unknown): Result<CaseDepthResult> {
  const read = readCalculatorRequest(request, ['temperatureC', checkTemperatureC], ['timeH', checkTimeH]);
  if (!read.ok) return read;
  const [temperatureC, timeH, spec] = read.value;
  return ok(evaluateCaseDepth(spec, temperatureC, timeH));
}

/** Time at temperature for the effective case depth to reach `depthMm`, h. */
export function timeForDepthH(spec: CaseSpec, temperatureC: number, depthMm: number, model = spec.model): number {
  const D = specDiffusivity(spec, temperatureC, model);
  const timeS = constantSurfaceTime(
    depthMm * 1e-3,
    D,
    spec.surfaceCarbonPct,
    spec.coreCarbonPct,
    spec.thresholdCarbonPct,
  );
  return timeS / SECONDS_PER_HOUR;
}

/** `time`: how long at `temperatureC` for an effective case depth of `targetDepthMm`. */
export function timeForCaseDepth(request: unknown): Result<TimeResult> {
  const read = readCalculatorRequest(request, ['temperatureC', checkTemperatureC], ['targetDepthMm', checkDepthMm]);
  if (!read.ok) return read;
  const [temperatureC, targetDepthMm, spec] = read.value;
  const timeH = timeForDepthH(spec, temperatureC, targetDepthMm);
  const checkedTime = checkTimeH(timeH, 'targetDepthMm');
  if (!checkedTime.ok) return checkedTime;
  const times = MODEL_IDS.map((id) => timeForDepthH(spec, temperatureC, targetDepthMm, id));
  return ok({
    ...evaluateCaseDepth(spec, temperatureC, timeH),
    targetDepthMm,
    modelRangeH: { min: Math.min(...times), max: Math.max(...times) },
  });
}

/**
 * Temperature in 800–1100 °C at which `timeH` gives the effective case depth `depthMm`,
 * by Brent's method on depth(T) − target (depth rises with T).
 */
export function temperatureForDepthC(
  spec: CaseSpec,
  timeH: number,
  depthMm: number,
  model = spec.model,
): Result<number> {
  const excess = (tempC: number) => depthFigures(spec, tempC, timeH, model).effectiveCaseDepthMm - depthMm;
  const { min, max } = TEMPERATURE_SEARCH_C;
  if (excess(max) < 0) return fail('solve.temperatureAboveRange', 'targetDepthMm', { minC: min, maxC: max });
  if (excess(min) > 0) return fail('solve.temperatureBelowRange', 'targetDepthMm', { minC: min, maxC: max });
  const root = brentRoot(excess, min, max, 1e-13);
  return root ? ok(root.x) : fail('solve.noConvergence', 'targetDepthMm');
}

/** `temperature`: which temperature gives `targetDepthMm` in `timeH`. */
export function temperatureForCaseDepth(request: unknown): Result<TemperatureResult> {
  const read = readCalculatorRequest(request, ['timeH', checkTimeH], ['targetDepthMm', checkDepthMm]);
  if (!read.ok) return read;
  const [timeH, targetDepthMm, spec] = read.value;
  const temperature = temperatureForDepthC(spec, timeH, targetDepthMm);
  if (!temperature.ok) return temperature;
  const temps = MODEL_IDS.map((id) => temperatureForDepthC(spec, timeH, targetDepthMm, id))
    .filter((r) => r.ok)
    .map((r) => r.value);
  return ok({
    ...evaluateCaseDepth(spec, temperature.value, timeH),
    targetDepthMm,
    ...(temps.length === MODEL_IDS.length ? { modelRangeC: { min: Math.min(...temps), max: Math.max(...temps) } } : {}),
  });
}
