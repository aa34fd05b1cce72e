/**
 * i18next set-up shared by the app and the CLI. All three locales are bundled:
 * the app must switch language offline, and the files are small.
 */
import i18next, { type i18n, type TFunction } from 'i18next';
import de from '../../locales/de/translation.json';
import en from '../../locales/en/translation.json';
import es from '../../locales/es/translation.json';
import type { InputError, Warning } from '../physics';
import { messageFigures, PHYSICS_MESSAGE_UNITS, wordError, wordWarning } from './wording';

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

/** The sentence for a physics error, figures in physics' units (°C, mm, h) and the locale's notation. */
export function errorMessage(t: TFunction, error: InputError, locale = 'en'): string {
  return wordError(t, error, messageFigures(PHYSICS_MESSAGE_UNITS, locale));
}

/** The sentence for a physics caution, figures in physics' units and the locale's notation. */
export function warningMessage(t: TFunction, warning: Warning, locale = 'en'): string {
  return wordWarning(t, warning, messageFigures(PHYSICS_MESSAGE_UNITS, locale));
}
