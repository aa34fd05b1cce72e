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
import { checkLimit, LIMITS } from './limits';
import { readFields, readRequest, type ReadOf } from './requestSpec';
import { DEPTH_REQUEST, TEMPERATURE_REQUEST, TIME_REQUEST } from './requestTables';
import { alloyFactor, hasAustenite, totalCaseThresholdPct, type Composition } from './steel';
import { depthBand, type DepthBand } from './uncertainty';
import { celsiusToKelvin, SECONDS_PER_HOUR } from './units';
import type { Fields } from './validate';

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

/** The fields every closed-form request shares, as read from its description (requestTables.ts). */
type CaseFields = ReadOf<typeof DEPTH_REQUEST>;

/** The cross-checks of the case fields: one carbon source given, the surface above core, the threshold between. */
function caseSpecOf(f: Omit<CaseFields, 'temperatureC' | 'timeH'>): Result<CaseSpec> {
  const factor = f.composition ? alloyFactor(f.composition) : 1;
  const given = f.surfaceCarbonPct;
  const potential = f.carbonPotentialPct;
  if (given === undefined && potential === undefined) return fail('field.missing', 'surfaceCarbonPct');
  const surfaceField = given === undefined ? 'carbonPotentialPct' : 'surfaceCarbonPct';
  // A potential is read in range; the surface it gives on this steel must be too.
  const surface = checkLimit(LIMITS.carbon, given ?? potential! * factor, surfaceField);
  if (!surface.ok) return surface;
  // Without a stated potential, the one implied by the surface carbon feeds the soot caution.
  const potentialPct = potential ?? surface.value / factor;
  const core = f.coreCarbonPct;
  if (!(surface.value > core)) {
    return fail('carbon.surfaceNotAboveCore', surfaceField, { surfacePct: surface.value, corePct: core });
  }
  const thresholdPct = f.thresholdCarbonPct;
  if (!(thresholdPct > core && thresholdPct < surface.value)) {
    return fail('threshold.outsideProfile', 'thresholdCarbonPct', {
      thresholdPct,
      corePct: core,
      surfacePct: surface.value,
    });
  }
  return ok({
    totalCaseMarginPct: f.totalCaseMarginPct,
    diffusivityFactor: f.diffusivityFactor,
    temperatureToleranceC: f.temperatureToleranceC,
    surfaceCarbonPct: surface.value,
    carbonPotentialPct: potentialPct,
    coreCarbonPct: core,
    thresholdCarbonPct: thresholdPct,
    model: f.model,
    ...(f.composition ? { composition: f.composition } : {}),
    alloyFactor: factor,
  });
}

/** Reads surface, core, threshold, model, composition and the furnace fields of a closed-form request, with their cross-checks. */
export function readCaseSpec(fields: Fields): Result<CaseSpec> {
  const { temperatureC: _t, timeH: _h, ...caseFields } = DEPTH_REQUEST;
  const read = readFields(caseFields, fields);
  return read.ok ? caseSpecOf(read.value as Omit<CaseFields, 'temperatureC' | 'timeH'>) : read;
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

/** A closed-form request read by its description, then its case spec. */
function readCalculatorRequest<F extends typeof DEPTH_REQUEST | typeof TIME_REQUEST | typeof TEMPERATURE_REQUEST>(
  spec: F,
  request: unknown,
): Result<[ReadOf<F>, CaseSpec]> {
  const read = readRequest(spec, request);
  if (!read.ok) return read;
  const caseSpec = caseSpecOf(read.value as unknown as CaseFields);
  return caseSpec.ok ? ok([read.value, caseSpec.value]) : caseSpec;
}

/** `depth`: case depths after `timeH` at `temperatureC`. */
export function caseDepth(request: unknown): Result<CaseDepthResult> {
  const read = readCalculatorRequest(DEPTH_REQUEST, request);
  if (!read.ok) return read;
  const [{ temperatureC, timeH }, spec] = read.value;
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
  const read = readCalculatorRequest(TIME_REQUEST, request);
  if (!read.ok) return read;
  const [{ temperatureC, targetDepthMm }, spec] = read.value;
  const timeH = timeForDepthH(spec, temperatureC, targetDepthMm);
  const checkedTime = checkLimit(LIMITS.time, timeH, 'targetDepthMm');
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
  const read = readCalculatorRequest(TEMPERATURE_REQUEST, request);
  if (!read.ok) return read;
  const [{ timeH, targetDepthMm }, spec] = read.value;
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
