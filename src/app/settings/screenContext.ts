/** What every screen needs to word and format: translate, show in the user's units, word errors. */
import type { TFunction } from 'i18next';
import { useMemo } from 'preact/hooks';
import { language, useT } from '../../i18n/useT';
import type { InputError } from '../../physics';
import { units } from './state';
import { wordError } from '../ui/fieldError';
import { makeShow, type Show } from '../ui/show';
import type { DisplayUnits } from '../ui/units';

export interface ScreenContext {
  t: TFunction;
  locale: string;
  units: DisplayUnits;
  show: Show;
  word: (error: InputError | undefined) => string | undefined;
}

/** The same object while language and units stay, so screens can memoize on `show` and `word`. */
export function useScreenContext(): ScreenContext {
  const t = useT();
  const locale = language.value;
  const current = units.value;
  return useMemo(
    () => ({
      t,
      locale,
      units: current,
      show: makeShow(current, locale),
      word: (error) => (error ? wordError(t, error, current, locale) : undefined),
    }),
    [t, locale, current],
  );
}
