/**
 * The app's language as a signal and a `useT()` hook bound to it. The app loads
 * only the locale it shows (each is its own small chunk, all precached for offline
 * use); switching loads the next one first, then changes the signal.
 */
import { signal } from '@preact/signals';
import i18next, { type TFunction } from 'i18next';
import { isLanguage, LANGUAGES, type Language } from './i18n';

type Resources = Record<string, unknown>;

const LOADERS: Record<Language, () => Promise<{ default: Resources }>> = {
  en: () => import('../../locales/en/translation.json'),
  es: () => import('../../locales/es/translation.json'),
  de: () => import('../../locales/de/translation.json'),
};

/** The browser's preferred language when we speak it, else English. */
export function preferredLanguage(candidates: readonly string[]): Language {
  for (const tag of candidates) {
    const base = tag.toLowerCase().split('-')[0];
    if (isLanguage(base)) return base;
  }
  return 'en';
}

/** Current language; only ever set to a language whose locale is loaded. */
export const language = signal<Language>('en');

const instance = i18next.createInstance();
void instance.init({
  lng: 'en',
  fallbackLng: false, // keys are identical in every locale (tested), so no fallback bundle is loaded
  resources: {},
  partialBundledLanguages: true,
  interpolation: { escapeValue: false },
  initAsync: false,
  returnNull: false,
});

const fixed = new Map<Language, TFunction>(LANGUAGES.map((l) => [l, instance.getFixedT(l)]));

/** Loads a locale's messages (once) and makes it the current language. */
export async function switchLanguage(lng: Language): Promise<void> {
  if (!instance.hasResourceBundle(lng, 'translation')) {
    const messages = await LOADERS[lng]();
    instance.addResourceBundle(lng, 'translation', messages.default);
  }
  language.value = lng;
}

/** The translate function for a language (for code outside components). */
export function tFor(lng: Language): TFunction {
  return fixed.get(lng)!;
}

/** Translate function of the current language; re-renders the caller when the language changes. */
export function useT(): TFunction {
  return tFor(language.value);
}

export function initialLanguage(stored: unknown): Language {
  if (isLanguage(stored)) return stored;
  return typeof navigator === 'undefined' ? 'en' : preferredLanguage(navigator.languages ?? [navigator.language]);
}
