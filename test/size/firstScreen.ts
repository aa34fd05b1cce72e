/**
 * `npm run size`: gzip size of the JavaScript the first screen needs, read from the
 * build's manifest: the entry chunk and its static imports (lazy screens, the chart
 * and CSV are dynamic imports and not counted), plus the largest locale chunk, since
 * the first paint waits for one locale. Fails over the budget, or when code that only the
 * job log needs (its database, validation and CSV libraries) has slipped into the first screen,
 * read from the chunks' source maps. Run after `vite build`.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

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
// Locale chunks are named after their file (locales/<lang>/translation.json).
const localeFiles = Object.values(manifest)
  .map((c) => c.file)
  .filter((f) => /(^|\/)translation-[\w-]+\.js$/.test(f));
if (localeFiles.length === 0) throw new Error('no locale chunks found in the manifest');
const largestLocale = localeFiles.map((f) => ({ file: f, kb: gzipKb(f) })).sort((a, b) => b.kb - a.kb)[0];

/** Sources that belong in lazily loaded chunks only. */
const LAZY_ONLY = [/node_modules\/idb\//, /node_modules\/valibot\//, /node_modules\/papaparse\//, /src\/jobs\/(store|schema|migrations)/];
const misplaced = staticFiles.flatMap((file) => {
  const mapPath = join(dist, `${file}.map`);
  // Only bundler glue comes without a map; anything larger must be checkable.
  if (!existsSync(mapPath)) return gzipKb(file) < 1 ? [] : [`${file}: no source map to check`];
  const map = JSON.parse(readFileSync(mapPath, 'utf8')) as { sources: string[] };
  return map.sources.filter((source) => LAZY_ONLY.some((pattern) => pattern.test(source))).map((source) => `${file}: ${source}`);
});
if (misplaced.length > 0) {
  console.error(`code for lazy screens in the first screen:\n  ${misplaced.join('\n  ')}`);
  process.exit(1);
}

let total = 0;
for (const file of staticFiles) {
  const kb = gzipKb(file);
  total += kb;
  console.log(`  ${kb.toFixed(2).padStart(7)} kB  ${file}`);
}
if (largestLocale) {
  total += largestLocale.kb;
  console.log(`  ${largestLocale.kb.toFixed(2).padStart(7)} kB  ${largestLocale.file} (largest of ${localeFiles.length} locales)`);
}
console.log(`first-screen JavaScript: ${total.toFixed(2)} kB gzip (budget ${FIRST_SCREEN_BUDGET_KB} kB)`);
if (total > FIRST_SCREEN_BUDGET_KB) {
  console.error(`over budget by ${(total - FIRST_SCREEN_BUDGET_KB).toFixed(2)} kB`);
  process.exit(1);
}
