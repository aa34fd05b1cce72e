/**
 * The register of approximate constants: every value the engine takes "from memory" or from
 * "common practice", once, with where it is used and how much a result depends on it. The app's
 * method notes and the README show it. The figures of `effect` were measured by moving the value
 * 10 % down and up in a reference case (test/physics/approximations.test.ts measures them again
 * and fails when they drift).
 */
import { DEFAULT_HISTORY_CARBON_PCT } from './requestTables';
import { STEEL_GRADES } from './grades';
import { MAX_AS_QUENCHED_HRC, RETAINED_AUSTENITE_CARBON_PCT } from './hardness';
import { DEFAULT_CORE_HARDNESS_HRC } from './indicativeHardness';
import { SAFE_ATMOSPHERE_MIN_TEMP_C } from './cautions';
import { DEFAULT_BETA_M_PER_S } from './cycle/recipe';
import { THROUGH_CARBURIZING_SHARE } from './cycle/warnings';
import {
  ACM_TABLE,
  ANDREWS_AC3,
  DEFAULT_ECD_THRESHOLD_PCT,
  EUTECTOID_TEMP_C,
  GUNNARSON_COEFFICIENTS,
  TOTAL_CASE_MARGIN_PCT,
} from './steel';
import { DEFAULT_BETA_RANGE_M_PER_S, DEFAULT_TEMPERATURE_TOLERANCE_C } from './uncertainty';

/** Units a register value is given in (the app formats each in the user's units where it can). */
export type ApproximationUnit = 'C' | 'deltaC' | 'pctC' | 'mPerS' | 'HRC' | 'share';

export type ApproximationValue =
  | { kind: 'number'; value: number; unit: ApproximationUnit }
  | { kind: 'range'; min: number; max: number; unit: ApproximationUnit }
  /** Named coefficients of a linear formula (per wt% of each element). */
  | { kind: 'coefficients'; terms: Readonly<Record<string, number>> }
  /** A published formula, written out in the words of each language. */
  | { kind: 'formula' };

/** The reference cases the sensitivities were measured on. */
export type ReferenceCase =
  /** `depth`: 20MnCr5 (Si 0.25, Mn 1.25, Cr 1.15), 930 °C, 8 h, Cp 0.85, core 0.20 %C. */
  | 'closedForm'
  /** `simulate`: the demo pinion cycle, public/examples/pinion-kr2231-cycle.json. */
  | 'demoCycle'
  /** `equivalent-time`: 40 min at 890 °C, set 925 °C (the README's example). */
  | 'recovery';

export type ApproximationEffect =
  /** A figure moves: relative change in % with the value 10 % lower and 10 % higher. */
  | {
      kind: 'result';
      result: 'ecd' | 'totalCase' | 'equivalentTime';
      reference: ReferenceCase;
      minusPct: number;
      plusPct: number;
    }
  /** Only whether a caution appears (and where the planner's suggestions stop). */
  | { kind: 'cautions' }
  /** Only the likely range shown beside a depth. */
  | { kind: 'likelyRange' }
  /** Only the indicative hardness or the HRC ↔ HV conversion. */
  | { kind: 'indicative' };

export interface Approximation {
  /** Stable id; its words are under `app.approximations.<id>` in the locales. */
  id: string;
  basis: 'fromMemory' | 'commonPractice';
  value: ApproximationValue;
  /** Where the code uses it (module and name), for contributors. */
  usedIn: string;
  effect: ApproximationEffect;
}

const coreHardnesses = [...STEEL_GRADES.map((g) => g.typicalCoreHardnessHrc), DEFAULT_CORE_HARDNESS_HRC];

const acmBetween = ACM_TABLE.filter(([tempC]) => tempC > EUTECTOID_TEMP_C && tempC < 1148).map(([, pct]) => pct);

export const APPROXIMATIONS: readonly Approximation[] = [
  {
    id: 'alloyFactor',
    basis: 'fromMemory',
    value: { kind: 'coefficients', terms: GUNNARSON_COEFFICIENTS },
    usedIn: 'physics/steel.ts GUNNARSON_COEFFICIENTS, alloyFactor',
    effect: { kind: 'result', result: 'ecd', reference: 'closedForm', minusPct: -1.06, plusPct: 1.06 },
  },
  {
    id: 'gradeCompositions',
    basis: 'fromMemory',
    value: { kind: 'formula' },
    usedIn: 'physics/grades.ts STEEL_GRADES',
    effect: { kind: 'result', result: 'ecd', reference: 'closedForm', minusPct: -1.06, plusPct: 1.06 },
  },
  {
    id: 'ecdThreshold',
    basis: 'commonPractice',
    value: { kind: 'number', value: DEFAULT_ECD_THRESHOLD_PCT, unit: 'pctC' },
    usedIn: 'physics/steel.ts DEFAULT_ECD_THRESHOLD_PCT',
    effect: { kind: 'result', result: 'ecd', reference: 'closedForm', minusPct: 12.03, plusPct: -10.47 },
  },
  {
    id: 'totalCaseMargin',
    basis: 'commonPractice',
    value: { kind: 'number', value: TOTAL_CASE_MARGIN_PCT, unit: 'pctC' },
    usedIn: 'physics/steel.ts TOTAL_CASE_MARGIN_PCT',
    effect: { kind: 'result', result: 'totalCase', reference: 'closedForm', minusPct: 2.56, plusPct: -2.35 },
  },
  {
    id: 'meanCarbonDiffusivity',
    basis: 'commonPractice',
    value: { kind: 'number', value: 0.5, unit: 'share' },
    usedIn: 'physics/diffusivity.ts effectiveDiffusivity',
    effect: { kind: 'result', result: 'ecd', reference: 'closedForm', minusPct: -1.9, plusPct: 1.93 },
  },
  {
    id: 'wellsBatzMehl',
    basis: 'fromMemory',
    value: { kind: 'formula' },
    usedIn: 'physics/diffusivity.ts wellsBatzMehlDiffusivity',
    // D ± 10 % of the chosen model; the same for any model.
    effect: { kind: 'result', result: 'ecd', reference: 'closedForm', minusPct: -5.13, plusPct: 4.88 },
  },
  {
    id: 'beta',
    basis: 'fromMemory',
    value: { kind: 'number', value: DEFAULT_BETA_M_PER_S, unit: 'mPerS' },
    usedIn: 'physics/cycle/recipe.ts DEFAULT_BETA_M_PER_S',
    effect: { kind: 'result', result: 'ecd', reference: 'demoCycle', minusPct: -1.43, plusPct: 1.21 },
  },
  {
    id: 'historyCarbon',
    basis: 'commonPractice',
    value: { kind: 'number', value: DEFAULT_HISTORY_CARBON_PCT, unit: 'pctC' },
    usedIn: 'physics/requestTables.ts DEFAULT_HISTORY_CARBON_PCT',
    effect: { kind: 'result', result: 'equivalentTime', reference: 'recovery', minusPct: -0.19, plusPct: 0.19 },
  },
  {
    id: 'betaRange',
    basis: 'fromMemory',
    value: { kind: 'range', min: DEFAULT_BETA_RANGE_M_PER_S.min, max: DEFAULT_BETA_RANGE_M_PER_S.max, unit: 'mPerS' },
    usedIn: 'physics/uncertainty.ts DEFAULT_BETA_RANGE_M_PER_S',
    effect: { kind: 'likelyRange' },
  },
  {
    id: 'temperatureTolerance',
    basis: 'commonPractice',
    value: { kind: 'number', value: DEFAULT_TEMPERATURE_TOLERANCE_C, unit: 'deltaC' },
    usedIn: 'physics/uncertainty.ts DEFAULT_TEMPERATURE_TOLERANCE_C',
    effect: { kind: 'likelyRange' },
  },
  {
    id: 'saturationLine',
    basis: 'fromMemory',
    value: { kind: 'range', min: Math.min(...acmBetween), max: Math.max(...acmBetween), unit: 'pctC' },
    usedIn: 'physics/steel.ts ACM_TABLE',
    effect: { kind: 'cautions' },
  },
  {
    id: 'ac3',
    basis: 'fromMemory',
    value: { kind: 'coefficients', terms: { ...ANDREWS_AC3.elements, '√C': ANDREWS_AC3.sqrtCarbon } },
    usedIn: 'physics/steel.ts ANDREWS_AC3, ac3TempC',
    effect: { kind: 'cautions' },
  },
  {
    id: 'safeAtmosphere',
    basis: 'commonPractice',
    value: { kind: 'number', value: SAFE_ATMOSPHERE_MIN_TEMP_C, unit: 'C' },
    usedIn: 'physics/cautions.ts SAFE_ATMOSPHERE_MIN_TEMP_C',
    effect: { kind: 'cautions' },
  },
  {
    id: 'throughCarburizing',
    basis: 'commonPractice',
    value: { kind: 'number', value: THROUGH_CARBURIZING_SHARE, unit: 'share' },
    usedIn: 'physics/cycle/warnings.ts THROUGH_CARBURIZING_SHARE',
    effect: { kind: 'cautions' },
  },
  {
    id: 'retainedAustenite',
    basis: 'commonPractice',
    value: { kind: 'number', value: RETAINED_AUSTENITE_CARBON_PCT, unit: 'pctC' },
    usedIn: 'physics/hardness.ts RETAINED_AUSTENITE_CARBON_PCT',
    effect: { kind: 'cautions' },
  },
  {
    id: 'asQuenchedHardness',
    basis: 'fromMemory',
    value: { kind: 'number', value: MAX_AS_QUENCHED_HRC, unit: 'HRC' },
    usedIn: 'physics/hardness.ts asQuenchedHardnessHrc',
    effect: { kind: 'indicative' },
  },
  {
    id: 'typicalCoreHardness',
    basis: 'commonPractice',
    value: { kind: 'range', min: Math.min(...coreHardnesses), max: Math.max(...coreHardnesses), unit: 'HRC' },
    usedIn: 'physics/indicativeHardness.ts DEFAULT_CORE_HARDNESS_HRC, physics/grades.ts typicalCoreHardnessHrc',
    effect: { kind: 'indicative' },
  },
  {
    id: 'hardnessTable',
    basis: 'fromMemory',
    value: { kind: 'formula' },
    usedIn: 'physics/hardness.ts (HRC ↔ HV table)',
    effect: { kind: 'indicative' },
  },
];
