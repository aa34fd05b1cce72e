/**
 * i18next set-up shared by the app and the CLI. All three locales are bundled:
 * the app must switch language offline, and the files are small.
 */
import i18next, { type i18n, type TFunction } from 'i18next';
import de from '../../locales/de/translation.json';
import en from '../../locales/en/translation.json';
import es from '../../locales/es/translation.json';
import type { InputError, Warning } from '../physics';

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

/** The sentence for a physics error, in the instance's language. */
export function errorMessage(t: TFunction, error: InputError): string {
  return t(`errors.${error.code}`, error.params ?? {});
}

/** The sentence for a physics caution, in the instance's language. */
export function warningMessage(t: TFunction, warning: Warning): string {
  return t(`warnings.${warning.code}`, warning.params ?? {});
}
