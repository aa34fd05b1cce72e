/**
 * A CouchDB-compatible shop server for tests and for trying the shared log: pouchdb-server (from
 * devDependencies) on 127.0.0.1, in memory, started in a fresh temporary folder (it writes its
 * config and log into the folder it runs in, and once an admin exists its "everyone is admin" mode
 * ends, so state must not leak between runs). Then set up as the README says: an admin, the plant
 * database, its members, the rules (`validate_doc_update`) and the people with their roles.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { setUpShop, type ShopPerson } from '../../src/server/shopSetup';

export interface ShopServer {
  /** e.g. http://127.0.0.1:5984/ */
  url: string;
  port: number;
  admin: { name: string; password: string };
  database: string;
  stop(): Promise<void>;
  /** Ends the server process and starts a new one on the same port (its memory is lost). */
  restart(): Promise<void>;
  /** Whether the process is still running (a dead server must fail the test, not hang it). */
  alive(): boolean;
}

export function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const server = createServer();
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? done(address.port) : fail(new Error('no port'))));
    });
  });
}

async function waitUntilUp(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    if (child.exitCode !== null) throw new Error(`the shop server exited with code ${child.exitCode}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`the shop server did not answer at ${url}`);
}

const BIN = resolve('node_modules', 'pouchdb-server', 'bin', 'pouchdb-server');

export const TEST_PEOPLE: ShopPerson[] = [
  { name: 'mk', password: 'furnace-1', roles: ['operator'] },
  { name: 'ql', password: 'traverse-1', roles: ['lab'] },
  { name: 'sv', password: 'release-1', roles: ['supervisor'] },
  { name: 'en', password: 'masters-1', roles: ['engineer'] },
];

export async function startShopServer(
  options: {
    port?: number;
    database?: string;
    people?: ShopPerson[];
    /**
     * Load the rules (validate_doc_update). Seen with pouchdb-server 4.2.0: with the design document
     * in place, a replicated update (`_bulk_docs` with `new_edits: false`) is answered 201 `[]` and not
     * stored, even for the admin; without it the same request stores revision 2. So the two-device
     * browser tests run without the rules, and the rules are tested on direct writes
     * (`test/jobs/shopServer.test.ts`), which that server does check. CouchDB 3 checks both.
     */
    rules?: boolean;
  } = {},
): Promise<ShopServer> {
  const port = options.port ?? (await freePort());
  const url = `http://127.0.0.1:${port}/`;
  const admin = { name: 'admin', password: 'shop-admin-1' };
  const database = options.database ?? 'plant-1';
  let folder = '';
  let child: ChildProcess | undefined;
  const start = async () => {
    folder = mkdtempSync(join(tmpdir(), 'casefront-shop-'));
    child = spawn(
      process.execPath,
      [BIN, '--host', '127.0.0.1', '--port', String(port), '--in-memory', '--no-stdout-logs'],
      {
        cwd: folder,
        stdio: ['ignore', 'ignore', 'inherit'],
      },
    );
    await waitUntilUp(url, child, 20_000);
    await setUpShop({
      url,
      admin,
      database,
      people: options.people ?? TEST_PEOPLE,
      createAdmin: true,
      rules: options.rules ?? true,
    });
  };
  const stop = async () => {
    const running = child;
    child = undefined;
    if (running?.exitCode === null) {
      await new Promise<void>((done) => {
        running.once('exit', () => done());
        running.kill();
      });
    }
    if (folder) rmSync(folder, { recursive: true, force: true });
  };
  await start();
  return {
    url,
    port,
    admin,
    database,
    stop,
    restart: async () => {
      await stop();
      await start();
    },
    alive: () => child?.exitCode === null,
  };
}
