/**
 * `npm run test:e2e`: serves the production build with `vite preview` on a free port
 * and runs test/e2e/*.e2e.ts with node's test runner in Debian's Chromium.
 * Without Chromium it prints why and skips, unless CASEFRONT_REQUIRE_BROWSER=1.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { startShopServer } from '../server/shopServer';
import { CHROMIUM_PATH, chromiumAvailable } from './browser';

const required = process.env.CASEFRONT_REQUIRE_BROWSER === '1';

if (!chromiumAvailable()) {
  const message = `e2e: no Chromium at ${CHROMIUM_PATH} (install Debian's chromium, or set CHROMIUM_PATH)`;
  if (required) {
    console.error(`${message}; CASEFRONT_REQUIRE_BROWSER=1, so this is a failure.`);
    process.exit(1);
  }
  console.log(`${message}: browser tests SKIPPED.`);
  process.exit(0);
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() =>
        typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port')),
      );
    });
  });
}

async function waitForServer(url: string, timeoutMs: number): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`preview server did not answer at ${url}`);
}

/** `--perf`: the throttled responsiveness measurements (`*.perf.ts`) instead of the browser tests. */
const SUFFIX = process.argv.includes('--perf') ? '.perf.ts' : '.e2e.ts';
/** Other arguments: run only the files whose name contains one of them (`npx tsx test/e2e/run.ts log`). */
const only = process.argv.slice(2).filter((arg) => !arg.startsWith('--'));

const vite = join('node_modules', 'vite', 'bin', 'vite.js');
if (!existsSync(join('dist', 'index.html'))) {
  console.log('e2e: no build found, running vite build');
  const build = spawnSync(process.execPath, [vite, 'build'], { stdio: 'inherit' });
  if (build.status !== 0) process.exit(build.status ?? 1);
}

// The shop server for the two-device tests: pouchdb-server on 127.0.0.1, set up as the README says.
// Without the rules document: pouchdb-server 4.2.0 drops replicated updates when it is loaded
// (test/server/shopServer.ts); the rules are tested on that server's direct writes in the unit tests.
const shop = await startShopServer({ rules: false });
const port = await freePort();
const url = `http://127.0.0.1:${port}/`;
const server: ChildProcess = spawn(
  process.execPath,
  [vite, 'preview', '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
  {
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, CASEFRONT_SHOP_URL: shop.url },
  },
);
let exitCode: number;
const started = Date.now();
try {
  await waitForServer(url, 20_000);
  const files = readdirSync(join('test', 'e2e'))
    .filter((f) => f.endsWith(SUFFIX) && (only.length === 0 || only.some((part) => f.includes(part))))
    .sort()
    .map((f) => join('test', 'e2e', f));
  const run = spawnSync(
    process.execPath,
    ['--import', 'tsx', '--test', '--test-concurrency=1', '--test-reporter=spec', ...files],
    {
      stdio: 'inherit',
      env: {
        ...process.env,
        CASEFRONT_URL: url,
        CASEFRONT_SHOP_URL: shop.url,
        CASEFRONT_SHOP_DB: shop.database,
        CASEFRONT_SHOP_ADMIN: `${shop.admin.name}:${shop.admin.password}`,
      },
    },
  );
  exitCode = run.status ?? 1;
  if (!shop.alive()) {
    console.error('e2e: the shop server died during the run');
    exitCode = exitCode || 1;
  }
} finally {
  server.kill();
  await shop.stop();
}
console.log(`e2e: finished in ${((Date.now() - started) / 1000).toFixed(1)} s`);
process.exit(exitCode);
