/**
 * (Node tooling, outside the app and the log: it talks to the server's admin interface.)
 * Setting up the shop server (Apache CouchDB 3, or pouchdb-server for tests) over its HTTP API:
 * the plant database, who may read and write it (`_security`: members by role), the rules every
 * write must pass (the `validate_doc_update` design document) and the people, each a server user
 * with their roles. Run again at any time: what exists is updated, nothing is deleted.
 */
import { designDocument, ROLES, type Role } from '../jobs/designDoc';

export interface ShopPerson {
  name: string;
  password: string;
  roles: Role[];
}

export interface ShopSetup {
  /** The server's address, e.g. http://127.0.0.1:5984/ */
  url: string;
  admin: { name: string; password: string };
  database: string;
  people: ShopPerson[];
  /** pouchdb-server starts with no admin: create this one first. CouchDB 3 has one from its install. */
  createAdmin?: boolean;
  /** Load the rules design document (default true; see test/server/shopServer.ts for why tests may not). */
  rules?: boolean;
}

function authHeader(admin: ShopSetup['admin']): string {
  return `Basic ${Buffer.from(`${admin.name}:${admin.password}`).toString('base64')}`;
}

async function call(url: string, method: string, body: unknown, auth?: string): Promise<Response> {
  return fetch(url, {
    method,
    headers: { 'Content-Type': 'application/json', ...(auth ? { Authorization: auth } : {}) },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
}

async function expectOk(response: Response, what: string, allowed: number[] = []): Promise<void> {
  if (response.ok || allowed.includes(response.status)) return;
  throw new Error(`${what}: HTTP ${response.status} ${await response.text()}`);
}

/** Creates or updates a document, keeping its current revision. */
async function upsert(url: string, doc: Record<string, unknown>, auth: string): Promise<void> {
  const current = await call(url, 'GET', undefined, auth);
  const rev = current.ok ? ((await current.json()) as { _rev?: string })._rev : undefined;
  await expectOk(await call(url, 'PUT', { ...doc, ...(rev ? { _rev: rev } : {}) }, auth), `PUT ${url}`);
}

export async function setUpShop(setup: ShopSetup): Promise<void> {
  const base = setup.url.endsWith('/') ? setup.url : `${setup.url}/`;
  if (setup.createAdmin) {
    const response = await call(`${base}_config/admins/${setup.admin.name}`, 'PUT', setup.admin.password);
    // 401: an admin exists already (this is a second run); the credentials below must then be right.
    await expectOk(response, 'creating the server admin', [401]);
  }
  const auth = authHeader(setup.admin);
  const db = `${base}${encodeURIComponent(setup.database)}`;
  await expectOk(await call(db, 'PUT', undefined, auth), `creating ${setup.database}`, [412]);
  await expectOk(
    await call(
      `${db}/_security`,
      'PUT',
      { admins: { names: [], roles: [] }, members: { names: [], roles: [...ROLES] } },
      auth,
    ),
    'setting who may use the database',
  );
  if (setup.rules !== false) await upsert(`${db}/${designDocument()._id}`, designDocument(), auth);
  for (const person of setup.people) {
    await upsert(
      `${base}_users/org.couchdb.user:${encodeURIComponent(person.name)}`,
      {
        _id: `org.couchdb.user:${person.name}`,
        name: person.name,
        password: person.password,
        roles: person.roles,
        type: 'user',
      },
      auth,
    );
  }
}
