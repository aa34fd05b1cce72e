import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import preact from '@preact/preset-vite';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';
// With an extension, as Vite's config loader asks; TypeScript maps `.js` to the `.ts` source.
import { localeChunks } from './src/i18n/build/localeChunks.js';

/** The release recorded with every logged prediction (src/app/version.ts). */
const { version } = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };

function shopProxy() {
  const target = process.env.CASEFRONT_SHOP_URL;
  if (!target) return undefined;
  return { '/db/': { target, changeOrigin: true, rewrite: (path: string) => path.replace(/^\/db\//u, '/') } };
}

export default defineConfig({
  define: { __APP_VERSION__: JSON.stringify(version) },
  plugins: [
    preact(),
    // Each locale in two chunks: the first screen's messages and the rest (src/i18n/localeParts.ts).
    localeChunks(),
    // uPlot makes an Intl number format and a date format when its module loads: the first Intl
    // object of a page loads ICU's data, a 100 ms task on a 4× slowed CPU. Our axes format their
    // own figures (src/app/cycle/chart.ts) and have no time scale, so both are made only if used.
    {
      name: 'casefront-uplot-lazy-intl',
      transform(code: string, id: string) {
        if (!id.includes('/node_modules/uplot/dist/uPlot.esm.js')) return undefined;
        const lazy: [string, string][] = [
          [
            "const numFormatter = new Intl.NumberFormat(domEnv ? nav.language : 'en-US');",
            "let madeNumFormatter; const numFormatter = { format: (v) => (madeNumFormatter ??= new Intl.NumberFormat(domEnv ? nav.language : 'en-US')).format(v) };",
          ],
          [
            'const localTz = new Intl.DateTimeFormat().resolvedOptions().timeZone;',
            'let madeLocalTz; const localTz = () => (madeLocalTz ??= new Intl.DateTimeFormat().resolvedOptions().timeZone);',
          ],
          ['else if (tz == localTz)', 'else if (tz == localTz())'],
        ];
        return lazy.reduce((text, [eager, later]) => {
          if (!text.includes(eager)) throw new Error(`uPlot changed (${eager}): see vite.config.ts`);
          return text.replace(eager, later);
        }, code);
      },
    },
    // The dev server injects CSS as <style> tags; only there may styles be inline. The build keeps 'self'.
    {
      name: 'casefront-dev-inline-styles',
      apply: 'serve',
      transformIndexHtml: (html: string) => html.replace("style-src 'self'", "style-src 'self' 'unsafe-inline'"),
    },
    VitePWA({
      strategies: 'generateSW',
      // The update waits for the user's go-ahead (src/pwa/UpdatePrompt.tsx).
      registerType: 'prompt',
      // We register from our own module: no inline script, so the CSP stays 'self'.
      injectRegister: null,
      // The glob below already precaches the icons and the plugin adds the manifest itself.
      includeManifestIcons: false,
      manifest: {
        name: 'Casefront',
        short_name: 'Casefront',
        description: 'Offline carburizing calculator for the furnace floor.',
        lang: 'en',
        start_url: '.',
        scope: '.',
        display: 'standalone',
        // Phones turn: landscape is allowed, and the header and answer stop sticking when the height is short.
        orientation: 'any',
        background_color: '#101418',
        theme_color: '#101418',
        icons: [
          { src: 'icons/icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: 'icons/icon-512.png', sizes: '512x512', type: 'image/png' },
          { src: 'icons/maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
        ],
      },
      workbox: {
        // Every asset, the lazy screen chunks and the chart included, so the app works in airplane mode.
        globPatterns: ['**/*.{js,css,html,png,svg,json}'],
        navigateFallback: 'index.html',
        // The shop server sits under /db/ on the same origin: never answered from the app's cache.
        navigateFallbackDenylist: [/^\/db\//u],
        cleanupOutdatedCaches: true,
      },
    }),
  ],
  resolve: {
    // The furnace calibration's t quantile (stdlib) tests for generators with eval at load; the CSP refuses eval.
    alias: {
      '@stdlib/assert-has-generator-support': fileURLToPath(
        new URL('./src/app/shims/hasGeneratorSupport.cjs', import.meta.url),
      ),
    },
  },
  build: {
    target: 'es2022',
    sourcemap: true,
    manifest: true,
    rolldownOptions: {
      // The stdlib math packages are pure CommonJS functions: let unused ones (e.g. erfcx,
      // needed only by the mass-transfer solution) drop out of the first screen's bundle; JSON
      // (the locales, which the CLI set-up imports) is data, so it never rides along with the app's code.
      // Physics is pure by design, so modules of it that a screen does not use drop out as well.
      treeshake: {
        moduleSideEffects: (id: string) =>
          !id.includes('/node_modules/@stdlib/') && !id.endsWith('.json') && !id.includes('/src/physics/'),
      },
    },
  },
  // The physics worker (src/app/worker/) is a module worker: ES output, so it can share chunks and stay 'self' under the CSP.
  worker: { format: 'es' },
  // With CASEFRONT_SHOP_URL set (the browser tests, `npm run start:shop`), /db/ on the app's own origin
  // goes to that CouchDB-compatible server, as the production web server does (README).
  preview: { port: 4173, strictPort: true, proxy: shopProxy() },
  server: { proxy: shopProxy() },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
    // A guard against hangs, not a speed check: property tests run for seconds on a loaded 2-core machine.
    testTimeout: 60_000,
  },
});
