/**
 * Build-time (Node) Vite plugin: serves each locale file in two parts as virtual modules,
 * `virtual:casefront-locale/<lang>/first` and `…/rest` (split by src/i18n/localeParts.ts),
 * emitted as chunks named `locale-first-<lang>-[hash].js` and `locale-rest-<lang>-[hash].js`.
 * The project keeps one file per language; only the build splits it. Never imported by the app.
 */
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Plugin } from 'vite';
import { LOCALE_PARTS, pickLocalePart, type LocalePart, type Messages } from '../localeParts.js';

export const LOCALE_MODULE_PREFIX = 'virtual:casefront-locale/';
/** Resolved ids start with \0 so no other plugin treats them as files. */
const RESOLVED_PREFIX = '\0casefront-locale:';
const SPECIFIER = /^virtual:casefront-locale\/([a-z]{2,3}(?:-[A-Za-z0-9]+)*)\/(\w+)$/u;
const RESOLVED = /^\0casefront-locale:([^:]+):(\w+)$/u;
const LOCALE_FILE = /[\\/]locales[\\/][^\\/]+[\\/]translation\.json$/u;

const isPart = (value: string): value is LocalePart => (LOCALE_PARTS as readonly string[]).includes(value);

/** The chunk file name of a locale part (its own name, so the size check and a reader can find it). */
export const localeChunkFileName = (lang: string, part: LocalePart, assetsDir: string) =>
  `${assetsDir}/locale-${part}-${lang}-[hash].js`;

export function localeChunks(options: { localesDir?: string } = {}): Plugin {
  let localesDir = options.localesDir ?? resolve('locales');
  let assetsDir = 'assets';
  const fileOf = (lang: string) => resolve(localesDir, lang, 'translation.json');
  return {
    name: 'casefront-locale-chunks',
    configResolved(config) {
      localesDir = options.localesDir ?? resolve(config.root, 'locales');
      assetsDir = config.build.assetsDir;
    },
    resolveId(id) {
      const match = SPECIFIER.exec(id);
      if (!match) return null;
      const [, lang, part] = match as unknown as [string, string, string];
      if (!isPart(part)) throw new Error(`${id}: the parts of a locale are ${LOCALE_PARTS.join(', ')}`);
      if (!existsSync(fileOf(lang))) throw new Error(`${id}: no locale file locales/${lang}/translation.json`);
      return `${RESOLVED_PREFIX}${lang}:${part}`;
    },
    load(id) {
      const match = RESOLVED.exec(id);
      if (!match) return null;
      const [, lang, part] = match as unknown as [string, string, LocalePart];
      const file = fileOf(lang);
      this.addWatchFile(file);
      const messages = JSON.parse(readFileSync(file, 'utf8')) as Messages;
      return { code: `export default ${JSON.stringify(pickLocalePart(messages, part))};\n`, moduleSideEffects: false };
    },
    outputOptions(output) {
      const fallback = output.chunkFileNames ?? `${assetsDir}/[name]-[hash].js`;
      return {
        ...output,
        chunkFileNames: (chunk) => {
          const match = chunk.facadeModuleId ? RESOLVED.exec(chunk.facadeModuleId) : null;
          if (match) return localeChunkFileName(match[1]!, match[2] as LocalePart, assetsDir);
          return typeof fallback === 'function' ? fallback(chunk) : fallback;
        },
      };
    },
    // Dev server: an edited locale file reloads the page with both of its parts rebuilt.
    handleHotUpdate({ file, server }) {
      if (!LOCALE_FILE.test(file)) return;
      for (const [id, module] of server.moduleGraph.idToModuleMap) {
        if (id.startsWith(RESOLVED_PREFIX)) server.moduleGraph.invalidateModule(module);
      }
      server.ws.send({ type: 'full-reload' });
      return [];
    },
  };
}
