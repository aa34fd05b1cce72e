/**
 * `npm run size`: gzip size of the JavaScript the first screen needs, read from the
 * build's manifest: the entry chunk and its static imports (lazy screens, the chart
 * and CSV are dynamic imports and not counted), plus the largest first part of a locale
 * (`locale-first-<lang>-*.js`), since the first paint waits for that part of one locale and
 * not for the rest (`locale-rest-<lang>-*.js`, listed but not counted). Fails over the budget,
 * when a locale chunk is a static import, or when code that only the job log needs (its database,
 * validation and CSV libraries) or the planner's and lab's readers (`lazyOnly.ts`) has slipped into the first screen, read from the chunks' source
 * maps. Run after `vite build`.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { LAZY_ONLY } from './lazyOnly';

/** Budget for the first screen's JavaScript, gzip, kB (1 kB = 1000 bytes). */
export const FIRST_SCREEN_BUDGET_KB = 60;

interface Chunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

const dist = process.argv[2] ?? 'dist';
const manifest = JSON.parse(readFileSync(join(dist, '.vite', 'manifest.json'), 'utf8')) as Record<string, Chunk>;
const gzipKb = (file: string) => gzipSync(readFileSync(join(dist, file)), { level: 9 }).length / 1000;

const entries = Object.entries(manifest).filter(([, c]) => c.isEntry);
if (entries.length !== 1) throw new Error(`expected one entry chunk, found ${entries.length}`);
const seen = new Set<string>();
const visit = (key: string) => {
  if (seen.has(key)) return;
  seen.add(key);
  for (const next of manifest[key]?.imports ?? []) visit(next);
};
visit(entries[0]![0]);

const staticFiles = [...seen].map((k) => manifest[k]!.file).filter((f) => f.endsWith('.js'));

// Locale chunks are named by src/i18n/build/localeChunks.ts: locale-<part>-<lang>-<hash>.js.
const LOCALE_CHUNK = /(?:^|\/)locale-(first|rest)-([\w-]+?)-[\w-]+\.js$/u;
const localeChunks = Object.values(manifest).flatMap((c) => {
  const match = LOCALE_CHUNK.exec(c.file);
  return match ? [{ file: c.file, part: match[1]!, lang: match[2]!, kb: gzipKb(c.file) }] : [];
});
const firstParts = localeChunks.filter((c) => c.part === 'first').sort((a, b) => b.kb - a.kb);
const restParts = localeChunks.filter((c) => c.part === 'rest').sort((a, b) => b.kb - a.kb);
if (firstParts.length === 0 || firstParts.length !== restParts.length) {
  throw new Error(`expected a first and a rest chunk per locale, found ${firstParts.length} and ${restParts.length}`);
}
const staticLocales = staticFiles.filter((f) => LOCALE_CHUNK.test(f));
if (staticLocales.length > 0) {
  console.error(
    `locale chunks loaded statically with the entry (they must be dynamic imports):\n  ${staticLocales.join('\n  ')}`,
  );
  process.exit(1);
}
const largestFirst = firstParts[0]!;

const misplaced = staticFiles.flatMap((file) => {
  const mapPath = join(dist, `${file}.map`);
  // Only bundler glue comes without a map; anything larger must be checkable.
  if (!existsSync(mapPath)) return gzipKb(file) < 1 ? [] : [`${file}: no source map to check`];
  const map = JSON.parse(readFileSync(mapPath, 'utf8')) as { sources: string[] };
  return map.sources
    .filter((source) => LAZY_ONLY.some((pattern) => pattern.test(source)))
    .map((source) => `${file}: ${source}`);
});
if (misplaced.length > 0) {
  console.error(`code for lazy screens in the first screen:\n  ${misplaced.join('\n  ')}`);
  process.exit(1);
}

const line = (kb: number, what: string) => console.log(`  ${kb.toFixed(2).padStart(7)} kB  ${what}`);
console.log('entry chunk and its static imports:');
let codeKb = 0;
for (const file of staticFiles) {
  const kb = gzipKb(file);
  codeKb += kb;
  line(kb, file);
}
line(codeKb, 'code subtotal');
console.log(
  `first part of the largest locale (${firstParts.map((c) => `${c.lang} ${c.kb.toFixed(2)}`).join(', ')} kB):`,
);
line(largestFirst.kb, largestFirst.file);
console.log('not counted: the rest of each locale, loaded after the first paint:');
for (const c of restParts) line(c.kb, c.file);
const total = codeKb + largestFirst.kb;
console.log(
  `first-screen JavaScript: ${total.toFixed(2)} kB gzip = code ${codeKb.toFixed(2)} + locale ${largestFirst.kb.toFixed(2)} (budget ${FIRST_SCREEN_BUDGET_KB} kB)`,
);
if (total > FIRST_SCREEN_BUDGET_KB) {
  console.error(`over budget by ${(total - FIRST_SCREEN_BUDGET_KB).toFixed(2)} kB`);
  process.exit(1);
}
