/**
 * i18next set-up shared by the app and the CLI. All three locales are bundled:
 * the app must switch language offline, and the files are small.
 */
import i18next, { type i18n, type TFunction } from 'i18next';
import de from '../../locales/de/translation.json';
import en from '../../locales/en/translation.json';
import es from '../../locales/es/translation.json';
import {
  errorParamUnits,
  warningParamUnits,
  type InputError,
  type Params,
  type ParamUnits,
  type ValueUnit,
  type Warning,
} from '../physics';

export const LANGUAGES = ['en', 'es', 'de'] as const;
export type Language = (typeof LANGUAGES)[number];

export const RESOURCES = { en, es, de } as const;

export function isLanguage(value: unknown): value is Language {
  return typeof value === 'string' && (LANGUAGES as readonly string[]).includes(value);
}

/** A ready instance (synchronous init: resources are bundled). */
export function createI18n(language: Language = 'en'): i18n {
  const instance = i18next.createInstance();
  void instance.init({
    lng: language,
    fallbackLng: 'en',
    resources: Object.fromEntries(LANGUAGES.map((l) => [l, { translation: RESOURCES[l] }])),
    interpolation: { escapeValue: false },
    initAsync: false,
    returnNull: false,
  });
  return instance;
}

/** A figure of a message with its unit, as the reader is shown it (the message holds no unit). */
export type FigureFormatter = (value: number, unit: ValueUnit) => string;

const PHYSICS_SYMBOLS: Record<ValueUnit, string> = {
  C: '°C',
  dC: '°C',
  h: 'h',
  mm: 'mm',
  '%C': '%C',
  '%': '%',
  'm/s': 'm/s',
  ratio: '',
};

/** A figure in the unit physics gives it (the CLI's wording): six significant digits, then the unit. */
export const physicsFigure: FigureFormatter = (value, unit) => {
  const text = String(Number(value.toPrecision(6)));
  const symbol = PHYSICS_SYMBOLS[unit];
  return symbol === '' ? text : `${text} ${symbol}`;
};

/** The params with each figure that has a unit formatted with it. */
function withUnits(params: Params | undefined, units: ParamUnits, format: FigureFormatter): Params {
  const out: Params = { ...params };
  for (const [name, unit] of Object.entries(units)) {
    const raw = params?.[name];
    if (typeof raw === 'number' && Number.isFinite(raw)) out[name] = format(raw, unit);
  }
  return out;
}

/** The sentence for a physics error, in the instance's language, each figure with its unit (physics units by default). */
export function errorMessage(t: TFunction, error: InputError, format: FigureFormatter = physicsFigure): string {
  return t(`errors.${error.code}`, withUnits(error.params, errorParamUnits(error.code, error.field), format));
}

/** The sentence for a physics caution or finding, in the instance's language, each figure with its unit. */
export function warningMessage(t: TFunction, warning: Warning, format: FigureFormatter = physicsFigure): string {
  return t(`warnings.${warning.code}`, withUnits(warning.params, warningParamUnits(warning.code), format));
}
