/**
 * The app's language as a signal and a `useT()` hook bound to it. Each language comes in two
 * chunks split at build time (src/i18n/localeParts.ts): the first screen's messages, which the
 * first paint waits for, and the rest, loaded right after into the same namespace (both are
 * precached for offline use). Code that shows rest messages (the lazily loaded screens and
 * panels) waits for them with `withFullLocale`. Switching loads both parts first, then changes
 * the signal, so the current language never lacks a message once the start-up is over.
 */
import { computed, signal } from '@preact/signals';
import i18next, { type TFunction } from 'i18next';
import { isLanguage, LANGUAGES, type Language } from './i18n';
import type { LocalePart, Messages } from './localeParts';

type Loader = () => Promise<{ default: Messages }>;

// Literal specifiers, so the bundler makes one chunk per part (src/i18n/build/localeChunks.ts).
const LOADERS: Record<Language, Record<LocalePart, Loader>> = {
  en: {
    first: () => import('virtual:casefront-locale/en/first'),
    rest: () => import('virtual:casefront-locale/en/rest'),
  },
  es: {
    first: () => import('virtual:casefront-locale/es/first'),
    rest: () => import('virtual:casefront-locale/es/rest'),
  },
  de: {
    first: () => import('virtual:casefront-locale/de/first'),
    rest: () => import('virtual:casefront-locale/de/rest'),
  },
};

/** The browser's preferred language when we speak it, else English. */
export function preferredLanguage(candidates: readonly string[]): Language {
  for (const tag of candidates) {
    const base = tag.toLowerCase().split('-')[0];
    if (isLanguage(base)) return base;
  }
  return 'en';
}

/** Current language; only ever set to a language whose first part (at start-up) or both parts are loaded. */
export const language = signal<Language>('en');

/** The parts merged so far, as `<lang>/<part>`; useT reads it, so text re-renders when a part arrives. */
const loadedParts = signal<ReadonlySet<string>>(new Set());
const pending = new Map<string, Promise<void>>();

/** Whether every message of the current language is loaded. */
export const fullLocale = computed(() => loadedParts.value.has(`${language.value}/rest`));

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

/** Loads one part of a language into the instance, once; a failed load is tried again on the next call. */
function loadPart(lng: Language, part: LocalePart): Promise<void> {
  const id = `${lng}/${part}`;
  if (loadedParts.peek().has(id)) return Promise.resolve();
  let loading = pending.get(id);
  if (!loading) {
    loading = LOADERS[lng][part]()
      .then((messages) => {
        // Deep merge: the two parts share subtrees (app.band, app.log, …).
        instance.addResourceBundle(lng, 'translation', messages.default, true, false);
        loadedParts.value = new Set(loadedParts.peek()).add(id);
      })
      .finally(() => pending.delete(id));
    pending.set(id, loading);
  }
  return loading;
}

/**
 * Start-up: waits for the first screen's messages only, makes `lng` the language, and starts
 * loading the rest (awaited by whatever needs it, through `withFullLocale`).
 */
export async function startLanguage(lng: Language): Promise<void> {
  await loadPart(lng, 'first');
  language.value = lng;
  loadPart(lng, 'rest').catch(() => {
    // Offline before the cache was filled: a lazy screen asks again and shows "could not load".
  });
}

/** Loads both parts of a language (once) and then makes it the current language. */
export async function switchLanguage(lng: Language): Promise<void> {
  await Promise.all([loadPart(lng, 'first'), loadPart(lng, 'rest')]);
  language.value = lng;
}

/** Resolves once every message of the current language is loaded. */
export function fullLocaleLoaded(): Promise<void> {
  const lng = language.peek();
  return Promise.all([loadPart(lng, 'first'), loadPart(lng, 'rest')]).then(() => undefined);
}

/** A loader for code that shows messages outside the first part: resolves when both it and they are in. */
export function withFullLocale<T>(load: () => Promise<T>): () => Promise<T> {
  return () => Promise.all([load(), fullLocaleLoaded()]).then(([loaded]) => loaded);
}

/** The translate function for a language (for code outside components). */
export function tFor(lng: Language): TFunction {
  return fixed.get(lng)!;
}

/** Translate function of the current language; re-renders the caller when the language changes or a part arrives. */
export function useT(): TFunction {
  return currentTranslator.value.t;
}

/** Texts remembered per translator before the memory starts again (a session types many different figures). */
const REMEMBERED_TEXTS = 2000;

/**
 * The translator with each text remembered by its key and options: a screen asks for the same
 * words on every keystroke, and i18next resolves, nests and interpolates every call afresh.
 * A new one is made whenever the language changes or a part arrives, so nothing stale is kept.
 */
export function rememberingT(t: TFunction): TFunction {
  const texts = new Map<string, unknown>();
  const remembering = (key: unknown, options?: unknown, ...rest: unknown[]): unknown => {
    const call = t as unknown as (...args: unknown[]) => unknown;
    // Only the plain forms (a key, optionally with an options object of data) are remembered.
    if (typeof key !== 'string' || rest.length > 0 || (options !== undefined && typeof options !== 'object'))
      return call(key, options, ...rest);
    const id = options === undefined ? key : `${key}\u0000${JSON.stringify(options)}`;
    if (texts.has(id)) return texts.get(id);
    const text = call(key, options);
    if (texts.size >= REMEMBERED_TEXTS) texts.clear();
    texts.set(id, text);
    return text;
  };
  return remembering as unknown as TFunction;
}

/** A new value whenever the language changes or a part arrives, so reading it subscribes a component to both. */
const currentTranslator = computed(() => ({ t: rememberingT(tFor(language.value)), parts: loadedParts.value }));

export function initialLanguage(stored: unknown): Language {
  if (isLanguage(stored)) return stored;
  return typeof navigator === 'undefined'
    ? 'en'
    : preferredLanguage(navigator.languages.length > 0 ? navigator.languages : [navigator.language]);
}
