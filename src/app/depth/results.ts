/**
 * Reads the depth form into a physics request (°C, h, mm, %C) and calls the
 * closed-form calculators; results and errors come back as an Outcome.
 */
import { computed } from '@preact/signals';
import {
  caseDepth,
  DEPTH_REQUEST,
  TEMPERATURE_REQUEST,
  TIME_REQUEST,
  temperatureForCaseDepth,
  timeForCaseDepth,
  type CaseDepthResult,
  type Composition,
  type DiffusivityModelId,
  type Hardness,
  type TemperatureResult,
  type TimeResult,
} from '../../physics';
import {
  calibrations,
  calibrationState,
  chosenFurnace,
  factorOf,
  type CalibrationState,
} from '../settings/calibration';
import { defaults, model } from '../settings/state';
import { deferred } from '../ui/Deferred';
import { NO_ERRORS, type Outcome } from '../ui/outcome';
import { orDefault, placeError, readForm, required, type FormValues } from '../ui/readForm';
import { steelComposition } from '../fields/steel';
import { depthForm, type DepthForm, type SolveFor } from './state';

/** The request sent to physics (°C, h, mm, %C): what a saved job records as its inputs (physics `DEPTH_REQUEST` and its kin). */
export interface DepthRequest {
  temperatureC?: number;
  timeH?: number;
  targetDepthMm?: number;
  carbonPotentialPct?: number;
  surfaceCarbonPct?: number;
  coreCarbonPct: number;
  thresholdCarbonPct: number;
  model: DiffusivityModelId;
  composition: Composition;
  /** The chosen furnace's calibration factor on D, when one is applied. */
  diffusivityFactor?: number;
  temperatureToleranceC: number;
  totalCaseMarginPct: number;
}

interface Solved {
  request: DepthRequest;
  calibration: CalibrationState;
  /** The case criterion the threshold stands for (from the settings; not part of the request). */
  ecdHardnessLimit?: Hardness;
}

export type DepthResult =
  | ({ solveFor: 'depth'; figures: CaseDepthResult } & Solved)
  | ({ solveFor: 'time'; figures: TimeResult } & Solved)
  | ({ solveFor: 'temperature'; figures: TemperatureResult } & Solved);

export interface DepthDefaults {
  model: DiffusivityModelId;
  ecdThresholdPct: number;
  totalCaseMarginPct: number;
  temperatureToleranceC: number;
  /** The case criterion the threshold stands for. */
  ecdHardnessLimit?: Hardness;
  /** The chosen furnace's calibration (none: uncalibrated). */
  calibration?: CalibrationState;
}

export function solveFor(form: DepthForm): SolveFor {
  return form.solveFor === 'time' || form.solveFor === 'temperature' ? form.solveFor : 'depth';
}

/** The inputs each mode uses (the third is what it solves for). */
export function usesField(mode: SolveFor, name: 'temperature' | 'time' | 'targetDepth'): boolean {
  if (name === 'temperature') return mode !== 'temperature';
  if (name === 'time') return mode !== 'time';
  return mode !== 'depth';
}

const REQUEST_OF_MODE = { depth: DEPTH_REQUEST, time: TIME_REQUEST, temperature: TEMPERATURE_REQUEST } as const;

/** The request path of the carbon input: a surface carbon or a carbon potential, as the form says. */
export const carbonPath = (form: DepthForm) =>
  form.carbonSource === 'surface' ? 'surfaceCarbonPct' : 'carbonPotentialPct';

/** The form laid out as the request of its mode, with the settings for what the form does not hold. */
function depthValues(form: DepthForm, settings: DepthDefaults, factor: number): FormValues {
  const mode = solveFor(form);
  return {
    ...(usesField(mode, 'temperature') ? { temperatureC: form.temperature } : {}),
    ...(usesField(mode, 'time') ? { timeH: form.time } : {}),
    ...(usesField(mode, 'targetDepth') ? { targetDepthMm: form.targetDepth } : {}),
    model: settings.model,
    composition: steelComposition(form.steel),
    coreCarbonPct: form.steel.coreCarbon,
    // The request takes one of the two; the screen asks for the one its toggle names.
    [carbonPath(form)]: required(form.carbon),
    thresholdCarbonPct: orDefault(form.threshold, settings.ecdThresholdPct),
    ...(factor === 1 ? {} : { diffusivityFactor: factor }),
    temperatureToleranceC: settings.temperatureToleranceC,
    totalCaseMarginPct: settings.totalCaseMarginPct,
  };
}

export function computeDepth(form: DepthForm, settings: DepthDefaults): Outcome<DepthResult> {
  const mode = solveFor(form);
  const calibration = settings.calibration ?? { kind: 'none' };
  const read = readForm(REQUEST_OF_MODE[mode], depthValues(form, settings, factorOf(calibration)));
  if (Object.keys(read.errors).length > 0) return { errors: read.errors };
  // Laid out from the request's description and read by it: physics checks the rest.
  const request = read.request as unknown as DepthRequest;
  const calculated =
    mode === 'time'
      ? timeForCaseDepth(request)
      : mode === 'temperature'
        ? temperatureForCaseDepth(request)
        : caseDepth(request);
  if (!calculated.ok) return placeError(calculated.error, read.fields);
  const limit = settings.ecdHardnessLimit ? { ecdHardnessLimit: settings.ecdHardnessLimit } : {};
  return {
    errors: NO_ERRORS,
    result: { solveFor: mode, figures: calculated.value, request, calibration, ...limit } as DepthResult,
  };
}

/** The form as the results show it: one task behind the typing (ui/Deferred.tsx). */
export const shownDepthForm = deferred(depthForm);

export const depthOutcome = computed(() =>
  computeDepth(shownDepthForm.value, {
    model: model.value,
    ecdThresholdPct: defaults.value.ecdThresholdPct,
    totalCaseMarginPct: defaults.value.totalCaseMarginPct,
    temperatureToleranceC: defaults.value.temperatureToleranceC,
    ecdHardnessLimit: defaults.value.ecdHardnessLimit,
    calibration: calibrationState(calibrations.value, chosenFurnace.value, model.value),
  }),
);
