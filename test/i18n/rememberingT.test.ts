/** The remembering translator gives what i18next gives, asks it once per key and options, and passes other forms through. */
import i18next, { type TFunction } from 'i18next';
import { describe, expect, it } from 'vitest';
import { rememberingT } from '../../src/i18n/useT';

async function translator(): Promise<{ t: TFunction; calls: string[] }> {
  const instance = i18next.createInstance();
  await instance.init({
    lng: 'en',
    resources: {
      en: {
        translation: {
          hello: 'Hello',
          greet: 'Hello {{name}}',
          item_one: '{{count}} item',
          item_other: '{{count}} items',
        },
      },
    },
    interpolation: { escapeValue: false },
  });
  const calls: string[] = [];
  const fixed = instance.getFixedT('en');
  const counting = ((key: unknown, ...rest: unknown[]) => {
    calls.push(String(key));
    return (fixed as unknown as (...args: unknown[]) => unknown)(key, ...rest);
  }) as unknown as TFunction;
  return { t: rememberingT(counting), calls };
}

describe('rememberingT', () => {
  it('gives the same texts as i18next, with plurals and interpolation', async () => {
    const { t } = await translator();
    expect(t('hello')).toBe('Hello');
    expect(t('greet', { name: 'Ana' })).toBe('Hello Ana');
    expect(t('greet', { name: 'Jo' })).toBe('Hello Jo');
    expect(t('item', { count: 1 })).toBe('1 item');
    expect(t('item', { count: 3 })).toBe('3 items');
  });

  it('asks i18next once per key and options', async () => {
    const { t, calls } = await translator();
    t('hello');
    t('hello');
    t('greet', { name: 'Ana' });
    t('greet', { name: 'Ana' });
    t('greet', { name: 'Jo' });
    expect(calls).toEqual(['hello', 'greet', 'greet']);
  });

  it('passes a list of keys through unremembered', async () => {
    const { t, calls } = await translator();
    expect(t(['missing', 'hello'])).toBe('Hello');
    expect(t(['missing', 'hello'])).toBe('Hello');
    expect(calls).toHaveLength(2);
  });
});
