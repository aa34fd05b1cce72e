/**
 * The locale files are loaded in two parts (src/i18n/localeParts.ts): the parts of each file
 * are disjoint and together the whole file, and the first part holds every message the first
 * screen's code can ask for (read from the modules that load with src/app/main.tsx, following
 * static imports only: lazily loaded screens wait for the rest).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { localeChunks } from '../../src/i18n/build/localeChunks';
import { LANGUAGES, RESOURCES } from '../../src/i18n/i18n';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { FIRST_SCREEN_KEYS, isFirstScreenKey, pickLocalePart, type Messages } from '../../src/i18n/localeParts';
import { parseSource, staticImportGraph } from '../importGraph';
import { LEFT_TO_REST_READERS } from '../size/lazyOnly';
import { leafKeys, messagesOf, translationKeys, type KeyUse } from './translationKeys';

const ENTRY = 'src/app/main.tsx';

const sourceFiles = (dir: string): string[] =>
  readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/u.test(entry.name) ? [path] : [];
  });

/** The leaves of a tree with their messages, for comparing trees whatever their key order. */
const entries = (tree: Messages) =>
  leafKeys(tree).map((key) => [key, key.split('.').reduce<unknown>((n, k) => (n as Messages)[k], tree)] as const);

/** Both parts merged back, as the app does (deep). */
function merge(a: Messages, b: Messages): Messages {
  const out: Messages = { ...a };
  for (const [k, v] of Object.entries(b)) {
    const mine = out[k];
    out[k] = typeof mine === 'object' && typeof v === 'object' ? merge(mine, v) : v;
  }
  return out;
}

function expectSplit(messages: Messages, keys: readonly string[]) {
  const first = pickLocalePart(messages, 'first', keys);
  const rest = pickLocalePart(messages, 'rest', keys);
  const firstKeys = new Set(leafKeys(first).filter((k) => k !== ''));
  expect(
    leafKeys(rest).filter((k) => firstKeys.has(k)),
    'in both parts',
  ).toEqual([]);
  expect(new Map(entries(merge(first, rest)))).toEqual(new Map(entries(messages)));
}

describe('splitting a locale file in two parts', () => {
  it.each(LANGUAGES)('%s: the parts are disjoint and together are the whole file', (lng) => {
    expectSplit(RESOURCES[lng], FIRST_SCREEN_KEYS);
    const first = leafKeys(pickLocalePart(RESOURCES[lng], 'first'));
    expect(first.length).toBeGreaterThan(100);
    expect(first.length).toBeLessThan(leafKeys(RESOURCES[lng]).length / 2 + 100);
  });

  it('a path takes its subtree or its message with the plural forms, and nothing that merely starts alike', () => {
    const messages: Messages = { a: { b: { c: '1', d: '2' }, bc: '3', n_one: '4', n_other: '5', nx: '6' }, z: '7' };
    expect(pickLocalePart(messages, 'first', ['a.b', 'a.n'])).toEqual({
      a: { b: { c: '1', d: '2' }, n_one: '4', n_other: '5' },
    });
    expect(pickLocalePart(messages, 'rest', ['a.b', 'a.n'])).toEqual({ a: { bc: '3', nx: '6' }, z: '7' });
    expect(pickLocalePart(messages, 'first', ['a', '!a.b', '!a.n'])).toEqual({ a: { bc: '3', nx: '6' } });
    expect(isFirstScreenKey('a.b.c', ['a', '!a.b'])).toBe(false);
    expect(isFirstScreenKey('a.bc', ['a', '!a.b'])).toBe(true);
  });

  it('holds for any tree and any list of paths (property)', () => {
    const name = fc.constantFrom('a', 'b', 'c', 'a_one', 'a_other', 'bb');
    const tree = fc.letrec<{ node: Messages }>((tie) => ({
      node: fc.dictionary(name, fc.oneof({ depthSize: 'small' }, fc.string(), tie('node')), { minKeys: 1, maxKeys: 4 }),
    })).node;
    const paths = fc.array(
      fc.array(name, { minLength: 1, maxLength: 3 }).map((p) => p.join('.')),
      { maxLength: 5 },
    );
    fc.assert(fc.property(tree, paths, (messages, keys) => expectSplit(messages, keys)));
  });

  it('the build plugin serves each part of a locale as a module', async () => {
    const plugin = localeChunks();
    const call = (hook: unknown, ...args: unknown[]): unknown =>
      (hook as (this: unknown, ...a: unknown[]) => unknown).call({ addWatchFile: () => {} }, ...args);
    const id = call(plugin.resolveId, 'virtual:casefront-locale/es/first') as string;
    expect(typeof id).toBe('string');
    const loaded = call(plugin.load, id) as { code: string };
    const text = loaded.code.replace(/^export default /u, '').replace(/;\s*$/u, '');
    expect(JSON.parse(text)).toEqual(pickLocalePart(RESOURCES.es as Messages, 'first'));
    expect(call(plugin.resolveId, './other')).toBeNull();
    expect(() => call(plugin.resolveId, 'virtual:casefront-locale/xx/first')).toThrow(/no locale file/u);
    expect(() => call(plugin.resolveId, 'virtual:casefront-locale/es/middle')).toThrow(/parts of a locale/u);
  });
});

describe('the first part holds what the first screen asks for', () => {
  const modules = staticImportGraph(ENTRY).filter((path) => /\.tsx?$/u.test(path));
  const scanned = modules.map((path) => translationKeys(parseSource(path)));
  const uses: KeyUse[] = scanned.flatMap((s) => s.uses);
  const english = leafKeys(RESOURCES.en);

  it('the key scanner reads literal keys, keys kept as data and template heads, and reports keys it cannot read', () => {
    const sample = parseSource(
      'sample.tsx',
      "const a = t('app.x.y'); const b = t(`app.models.${m}`); const c = { label: 'errors.z' }; t(key); t(`${ns}.k`); t(ok ? 'app.p' : 'app.q');",
    );
    const found = translationKeys(sample);
    expect(found.uses.map((u) => `${u.kind} ${u.key}`)).toEqual([
      'key app.x.y',
      'prefix app.models.',
      'key errors.z',
      'key app.p',
      'key app.q',
    ]);
    expect(found.unreadable.map((u) => u.split(': ')[1])).toEqual(['t(key)', 't(`${ns}.k`)']);
  });

  it('follows static imports from the entry, not import() or import type', () => {
    expect(modules).toContain('src/app/depth/Screen.tsx');
    expect(modules).toContain('src/app/shell/Header.tsx');
    expect(modules).toContain('src/i18n/useT.ts');
    for (const lazy of [
      'src/app/cycle/Screen.tsx',
      'src/app/settings/Screen.tsx',
      'src/app/log/save/SaveForm.tsx',
      'src/app/cycle/chart.ts',
    ]) {
      expect(modules).not.toContain(lazy);
    }
    expect(uses.length).toBeGreaterThan(80);
  });

  it('every t() in those modules has a key the check can read', () => {
    expect(scanned.flatMap((s) => s.unreadable)).toEqual([]);
  });

  /** Paths left to the rest inside a first-part subtree: codes only lazily loaded readers write. */
  const leftToRest = FIRST_SCREEN_KEYS.filter((key) => key.startsWith('!')).map((key) => key.slice(1));

  it('codes whose words are left to the rest are written only by readers the first screen does not load', () => {
    const codes = leftToRest.map((path) => path.slice(path.indexOf('.') + 1));
    const literal = new RegExp(`['"\`](?:${codes.join('|')})\\.`, 'u');
    // result.ts lists every code (for its type) and paramUnits.ts gives their params' units: neither writes one.
    const writers = sourceFiles('src')
      .filter((path) => !/physics\/(result|paramUnits)\.ts$/u.test(path))
      .filter((path) => literal.test(readFileSync(path, 'utf8')));
    expect(writers.length).toBeGreaterThan(2);
    expect(writers.filter((path) => !LEFT_TO_REST_READERS.some((reader) => reader.test(path)))).toEqual([]);
  });

  it.each(LANGUAGES)(
    '%s: every key (and every key a template can build) asked for there is in the first part',
    (lng) => {
      const first = new Set(leafKeys(pickLocalePart(RESOURCES[lng], 'first')));
      const problems = uses.flatMap((use) => {
        const messages = messagesOf(use, english).filter(
          (m) => !leftToRest.some((path) => m.startsWith(`${path}.`) && !use.key.startsWith(path)),
        );
        if (messages.length === 0) return [`${use.where}: ${use.key} names no message`];
        const missing = messages.filter((m) => !first.has(m));
        return missing.length > 0
          ? [
              `${use.where}: ${use.key} → not in the first part: ${missing.slice(0, 3).join(', ')}${missing.length > 3 ? ', …' : ''}`,
            ]
          : [];
      });
      expect(problems).toEqual([]);
    },
  );

  it('every entry of FIRST_SCREEN_KEYS names messages that code asks for (the first part stays small)', () => {
    const asked = new Set(uses.flatMap((use) => messagesOf(use, english)));
    const stale = FIRST_SCREEN_KEYS.filter((key) => !key.startsWith('!')).filter((key) => {
      const named = messagesOf({ key, kind: 'key' }, english);
      return named.length === 0 || !named.some((m) => asked.has(m));
    });
    expect(stale).toEqual([]);
  });

  it.each(LANGUAGES)('%s: a first-part message nests no message of the rest ($t)', (lng) => {
    const first = pickLocalePart(RESOURCES[lng], 'first');
    const firstKeys = new Set(leafKeys(first));
    const nested = entries(first).flatMap(([key, text]) =>
      [...String(text).matchAll(/\$t\(([\w.]+)/gu)].map((m) => [key, m[1]!] as const),
    );
    expect(nested.filter(([, target]) => !firstKeys.has(target))).toEqual([]);
  });
});
