/**
 * App-wide settings: units, language, diffusivity model, case criterion, defaults for β and the
 * depth thresholds, theme, shift start times. Persisted; the language and theme are applied to the page here.
 */
import { computed, effect } from '@preact/signals';
import type { Language } from '../../i18n/i18n';
import { initialLanguage, language, startLanguage, switchLanguage } from '../../i18n/useT';
import {
  CASE_CRITERIA,
  checkBeta,
  checkCarbonPct,
  checkTemperatureTolerance,
  checkTotalCaseMargin,
  DEFAULT_BETA_M_PER_S,
  DEFAULT_BETA_RANGE_M_PER_S,
  DEFAULT_CASE_CRITERION,
  DEFAULT_ECD_THRESHOLD_PCT,
  DEFAULT_MODEL,
  DEFAULT_TEMPERATURE_TOLERANCE_C,
  isCaseCriterionId,
  type CaseCriterionId,
  type DiffusivityModelId,
  fail,
  isModelId,
  type Range,
  type Result,
  TOTAL_CASE_MARGIN_PCT,
} from '../../physics';
import { DEFAULT_SHIFT_CONFIG, type ShiftConfig } from '../../jobs/shiftNames';
import { field, readField, readTemperatureDifferenceC, type FieldText } from '../ui/fieldText';
import { persisted } from '../ui/persist';
import { displayUnits, type UnitOverrides, type UnitSystem } from '../ui/units';

export const THEMES = ['dark', 'light', 'contrast'] as const;
export type Theme = (typeof THEMES)[number];

/** β is typed in units of 10⁻⁷ m/s: the typical values are then 1–3. */
export const BETA_INPUT_SCALE = 1e-7;

export interface Settings {
  unitSystem: UnitSystem;
  overrides: UnitOverrides;
  language: string;
  model: string;
  beta: FieldText;
  /** The hardness the effective case depth stands for (an id of CASE_CRITERIA). */
  caseCriterion: string;
  ecdThreshold: FieldText;
  totalCaseMargin: FieldText;
  /** Furnace temperature tolerance for the likely range, typed in °C or °F (a difference). */
  temperatureTolerance: FieldText;
  /** Ends of the β range for the likely range of a cycle, in 10⁻⁷ m/s. */
  betaRangeMin: FieldText;
  betaRangeMax: FieldText;
  theme: string;
  /** Local start time of each shift, "HH:MM" (checked where it is used: the job log). */
  shiftStarts: ShiftConfig;
}

export const DEFAULT_SETTINGS: Settings = {
  unitSystem: 'metric',
  overrides: { temperature: 'auto', depth: 'auto', time: 'auto' },
  language: '',
  model: DEFAULT_MODEL,
  beta: field(String(DEFAULT_BETA_M_PER_S / BETA_INPUT_SCALE)),
  caseCriterion: DEFAULT_CASE_CRITERION,
  ecdThreshold: field(String(DEFAULT_ECD_THRESHOLD_PCT)),
  totalCaseMargin: field(String(TOTAL_CASE_MARGIN_PCT)),
  temperatureTolerance: field(String(DEFAULT_TEMPERATURE_TOLERANCE_C), 'C'),
  betaRangeMin: field(String(DEFAULT_BETA_RANGE_M_PER_S.min / BETA_INPUT_SCALE)),
  betaRangeMax: field(String(DEFAULT_BETA_RANGE_M_PER_S.max / BETA_INPUT_SCALE)),
  theme: 'dark',
  shiftStarts: DEFAULT_SHIFT_CONFIG,
};

export const settings = persisted<Settings>('settings', DEFAULT_SETTINGS);

/** Loads the first screen's messages in the stored language (or the browser's preference) before the first render. */
export function loadInitialLanguage(): Promise<void> {
  return startLanguage(initialLanguage(settings.value.language));
}

export async function setLanguage(lng: Language): Promise<void> {
  settings.value = { ...settings.value, language: lng };
  await switchLanguage(lng);
}

export const units = computed(() => displayUnits(settings.value.unitSystem, settings.value.overrides));

export const model = computed<DiffusivityModelId>(() =>
  isModelId(settings.value.model) ? settings.value.model : DEFAULT_MODEL,
);

export const caseCriterion = computed<CaseCriterionId>(() =>
  isCaseCriterionId(settings.value.caseCriterion) ? settings.value.caseCriterion : DEFAULT_CASE_CRITERION,
);

export const theme = computed<Theme>(() =>
  (THEMES as readonly string[]).includes(settings.value.theme) ? (settings.value.theme as Theme) : 'dark',
);

/** Default β in m/s, validated. */
export function readBeta(value: FieldText): Result<number> {
  const typed = readField(value, 'beta');
  return typed.ok ? checkBeta(typed.value * BETA_INPUT_SCALE, 'beta') : typed;
}

export function readThreshold(value: FieldText): Result<number> {
  const typed = readField(value, 'ecdThreshold');
  return typed.ok ? checkCarbonPct(typed.value, 'ecdThreshold') : typed;
}

/** Total-case margin above core carbon, %C, by the same check as every request that carries it. */
export function readMargin(value: FieldText): Result<number> {
  const typed = readField(value, 'totalCaseMargin');
  return typed.ok ? checkTotalCaseMargin(typed.value, 'totalCaseMargin') : typed;
}

/** Furnace temperature tolerance, ±°C. */
export function readTolerance(value: FieldText): Result<number> {
  const typed = readTemperatureDifferenceC(value, 'temperatureTolerance');
  return typed.ok ? checkTemperatureTolerance(typed.value, 'temperatureTolerance') : typed;
}

/** The β range, m/s: each end positive, the lower not above the upper (errors on `betaRangeMin` / `betaRangeMax`). */
export function readBetaRange(min: FieldText, max: FieldText): Result<Range> {
  const low = readField(min, 'betaRangeMin');
  if (!low.ok) return low;
  const lowM = checkBeta(low.value * BETA_INPUT_SCALE, 'betaRangeMin');
  if (!lowM.ok) return lowM;
  const high = readField(max, 'betaRangeMax');
  if (!high.ok) return high;
  const highM = checkBeta(high.value * BETA_INPUT_SCALE, 'betaRangeMax');
  if (!highM.ok) return highM;
  return lowM.value <= highM.value
    ? { ok: true, value: { min: lowM.value, max: highM.value } }
    : fail('range.minAboveMax', 'betaRangeMax', { min: low.value, max: high.value });
}

/** Settings read for use: invalid entries fall back to the defaults (and are flagged on the settings screen). */
export const defaults = computed(() => {
  const s = settings.value;
  const beta = readBeta(s.beta);
  const threshold = readThreshold(s.ecdThreshold);
  const margin = readMargin(s.totalCaseMargin);
  const tolerance = readTolerance(s.temperatureTolerance);
  const betaRange = readBetaRange(s.betaRangeMin, s.betaRangeMax);
  return {
    betaMPerS: beta.ok ? beta.value : DEFAULT_BETA_M_PER_S,
    ecdThresholdPct: threshold.ok ? threshold.value : DEFAULT_ECD_THRESHOLD_PCT,
    ecdHardnessLimit: CASE_CRITERIA[caseCriterion.value],
    totalCaseMarginPct: margin.ok ? margin.value : TOTAL_CASE_MARGIN_PCT,
    temperatureToleranceC: tolerance.ok ? tolerance.value : DEFAULT_TEMPERATURE_TOLERANCE_C,
    betaRangeMPerS: betaRange.ok ? betaRange.value : { ...DEFAULT_BETA_RANGE_M_PER_S },
  };
});

const THEME_COLOURS: Record<Theme, string> = { dark: '#101418', light: '#f4f3ee', contrast: '#000000' };

/** Applies language and theme to the document (browser only). */
export function applyToDocument(): void {
  effect(() => {
    document.documentElement.lang = language.value;
  });
  effect(() => {
    const current = theme.value;
    document.documentElement.dataset.theme = current;
    document.querySelector('meta[name="theme-color"]')?.setAttribute('content', THEME_COLOURS[current]);
  });
}
