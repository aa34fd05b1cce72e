import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DEFAULT_CYCLE_FORM } from '../../src/app/cycle/state';
import { mergeDefaults } from '../../src/app/ui/persist';
import { sourceFiles } from '../sourceFiles';

describe('stored UI state is validated against the defaults', () => {
  const defaults = { a: 1, b: { text: '925', unit: 'C' }, list: [{ x: 'a' }], flag: false };
  it('keeps stored values of the right type and fills the rest', () => {
    expect(mergeDefaults(defaults, { a: 2, b: { text: '900' }, flag: true })).toEqual({
      a: 2,
      b: { text: '900', unit: 'C' },
      list: [{ x: 'a' }],
      flag: true,
    });
  });
  it('drops values of the wrong type, non-finite numbers and unknown keys', () => {
    expect(mergeDefaults(defaults, { a: 'x', b: 5, list: 'no', flag: null, extra: 1 })).toEqual(defaults);
    expect(mergeDefaults({ n: 1 }, { n: Number.NaN })).toEqual({ n: 1 });
  });
  it('keeps a stored list of any length, each item merged over the first default item', () => {
    expect(mergeDefaults(defaults, { list: [{ x: 'b' }, { y: 1 }, 7] }).list).toEqual([{ x: 'b' }, { x: 'a' }]);
    expect(mergeDefaults(defaults, { list: [] }).list).toEqual([]);
  });
  it('garbage in storage gives the defaults', () => {
    for (const junk of [undefined, null, 42, 'text', []])
      expect(mergeDefaults(DEFAULT_CYCLE_FORM, junk)).toEqual(DEFAULT_CYCLE_FORM);
  });
});

describe('the stored keys are listed in the contributor guide', () => {
  it('every persisted(key) in the app is in DEVELOPERS.md, and the guide lists no key the app no longer has', () => {
    const keys = sourceFiles('src')
      .flatMap((file) => [...readFileSync(file, 'utf8').matchAll(/\bpersisted(?:<[^>]+>)?\(\s*'([^']+)'/gu)])
      .map((m) => `casefront.${m[1]!}`)
      .sort();
    expect(keys.length).toBeGreaterThan(8);
    const guide = readFileSync('DEVELOPERS.md', 'utf8');
    const listed = [...new Set([...guide.matchAll(/`(casefront\.[\w.]+)`/gu)].map((m) => m[1]!))].sort();
    expect(listed).toEqual(keys);
  });
});
