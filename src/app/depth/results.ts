/**
 * Reads the depth form into a physics request (°C, h, mm, %C) and calls the
 * closed-form calculators; results and errors come back as an Outcome.
 */
import { computed } from '@preact/signals';
import {
  ALLOY_ELEMENTS,
  caseDepth,
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
import { readField, readOptionalField } from '../ui/fieldText';
import { deferred } from '../ui/Deferred';
import { FieldReader, NO_ERRORS, placeError, type Outcome } from '../ui/outcome';
import { readComposition } from '../fields/steel';
import { PHYSICS_UNITS } from '../ui/units';
import { depthForm, type DepthForm, type SolveFor } from './state';

/** The request sent to physics (°C, h, mm, %C): what a saved job records as its inputs. */
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

/** Physics request fields → form fields. */
const FIELD_MAP: Record<string, string> = {
  temperatureC: 'temperature',
  timeH: 'time',
  targetDepthMm: 'targetDepth',
  carbonPotentialPct: 'carbon',
  surfaceCarbonPct: 'carbon',
  coreCarbonPct: 'coreCarbon',
  thresholdCarbonPct: 'threshold',
};

const FORM_FIELDS = new Set([
  'temperature',
  'time',
  'targetDepth',
  'carbon',
  'coreCarbon',
  'threshold',
  ...ALLOY_ELEMENTS.map((e) => `composition.${e}`),
]);

export function solveFor(form: DepthForm): SolveFor {
  return form.solveFor === 'time' || form.solveFor === 'temperature' ? form.solveFor : 'depth';
}

/** The inputs each mode uses (the third is what it solves for). */
export function usesField(mode: SolveFor, name: 'temperature' | 'time' | 'targetDepth'): boolean {
  if (name === 'temperature') return mode !== 'temperature';
  if (name === 'time') return mode !== 'time';
  return mode !== 'depth';
}

export function computeDepth(form: DepthForm, settings: DepthDefaults): Outcome<DepthResult> {
  const mode = solveFor(form);
  const read = new FieldReader();
  const temperatureC = usesField(mode, 'temperature')
    ? read.value(readField(form.temperature, 'temperature', PHYSICS_UNITS.temperature))
    : undefined;
  const timeH = usesField(mode, 'time') ? read.value(readField(form.time, 'time', PHYSICS_UNITS.time)) : undefined;
  const targetDepthMm = usesField(mode, 'targetDepth')
    ? read.value(readField(form.targetDepth, 'targetDepth', PHYSICS_UNITS.depth))
    : undefined;
  const carbonPct = read.value(readField(form.carbon, 'carbon'));
  const corePct = read.value(readField(form.steel.coreCarbon, 'coreCarbon'));
  const thresholdPct = read.value(readOptionalField(form.threshold, 'threshold'));
  const composition = read.value(readComposition(form.steel));
  if (read.failed || corePct === undefined || carbonPct === undefined || composition === undefined)
    return { errors: read.errors };

  const calibration = settings.calibration ?? { kind: 'none' };
  const factor = factorOf(calibration);
  const request: DepthRequest = {
    ...(temperatureC === undefined ? {} : { temperatureC }),
    ...(timeH === undefined ? {} : { timeH }),
    ...(targetDepthMm === undefined ? {} : { targetDepthMm }),
    [form.carbonSource === 'surface' ? 'surfaceCarbonPct' : 'carbonPotentialPct']: carbonPct,
    coreCarbonPct: corePct,
    thresholdCarbonPct: thresholdPct ?? settings.ecdThresholdPct,
    model: settings.model,
    composition,
    ...(factor === 1 ? {} : { diffusivityFactor: factor }),
    temperatureToleranceC: settings.temperatureToleranceC,
    totalCaseMarginPct: settings.totalCaseMarginPct,
  };
  const calculated =
    mode === 'time'
      ? timeForCaseDepth(request)
      : mode === 'temperature'
        ? temperatureForCaseDepth(request)
        : caseDepth(request);
  if (!calculated.ok) return placeError(calculated.error, FIELD_MAP, FORM_FIELDS);
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
