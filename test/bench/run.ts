/**
 * `npm run bench`: runs every `test/bench/*.bench.ts` module in name order. Each module
 * exports `run(): Promise<Record<string, number>>`, printing its own lines as it goes;
 * the last line printed here is one JSON object merging every module's figures.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
const modules = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts') && (!only || f.includes(only)))
  .sort();

const figures: Record<string, number> = {};
for (const file of modules) {
  console.log(`# ${file}`);
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { run: () => Promise<Record<string, number>> };
  Object.assign(figures, await mod.run());
}
console.log(JSON.stringify(figures));
