/**
 * The shop server as the README sets it up, on a real CouchDB-compatible server (pouchdb-server on
 * 127.0.0.1, in memory, fresh folder): people sign in with their own name and password (CouchDB
 * session), the rules refuse what their role may not do, and nothing refused is stored.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startShopServer, TEST_PEOPLE, type ShopServer } from '../server/shopServer';

let server: ShopServer;
beforeAll(async () => {
  server = await startShopServer();
}, 60_000);
afterAll(() => server.stop());

/** Signs in as a person; returns the session cookie. */
async function signIn(name: string, password: string): Promise<{ status: number; cookie: string }> {
  const response = await fetch(`${server.url}_session`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ name, password }),
  });
  return { status: response.status, cookie: (response.headers.get('set-cookie') ?? '').split(';')[0]! };
}

async function put(
  cookie: string,
  doc: Record<string, unknown>,
): Promise<{ status: number; body: Record<string, unknown> }> {
  const response = await fetch(`${server.url}${server.database}/${encodeURIComponent(String(doc._id))}`, {
    method: 'PUT',
    headers: { 'Content-Type': 'application/json', Cookie: cookie },
    body: JSON.stringify(doc),
  });
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}

const person = (name: string) => TEST_PEOPLE.find((p) => p.name === name)!;

describe('the shop server (pouchdb-server, set up by the set-up script)', () => {
  it('a wrong password is refused; the right one gives a session with the person’s roles', async () => {
    expect((await signIn('mk', 'not-the-password')).status).toBe(401);
    const { status, cookie } = await signIn('mk', person('mk').password);
    expect(status).toBe(200);
    const session = (await (await fetch(`${server.url}_session`, { headers: { Cookie: cookie } })).json()) as {
      userCtx: { name: string; roles: string[] };
    };
    expect(session.userCtx).toMatchObject({ name: 'mk', roles: ['operator'] });
  });

  it('an operator logs a load; putting it on hold is refused and nothing changes; the supervisor may', async () => {
    const operator = (await signIn('mk', person('mk').password)).cookie;
    const doc = { _id: crypto.randomUUID(), type: 'job', job: { status: 'done' }, versions: {}, changedBy: 'mk' };
    const created = await put(operator, doc);
    expect(created.status).toBe(201);
    const held = await put(operator, { ...doc, _rev: created.body.rev, job: { status: 'onHold' } });
    expect(held).toMatchObject({ status: 403, body: { error: 'forbidden', reason: 'supervisorOnly' } });
    const supervisor = (await signIn('sv', person('sv').password)).cookie;
    const byOther = await put(supervisor, {
      ...doc,
      _rev: created.body.rev,
      job: { status: 'onHold' },
      changedBy: 'mk',
    });
    expect(byOther).toMatchObject({ status: 403, body: { reason: 'changedByNotYou' } });
    const ok = await put(supervisor, { ...doc, _rev: created.body.rev, job: { status: 'onHold' }, changedBy: 'sv' });
    expect(ok.status).toBe(201);
    const deleted = await fetch(`${server.url}${server.database}/${doc._id}?rev=${String(ok.body.rev)}`, {
      method: 'DELETE',
      headers: { Cookie: supervisor },
    });
    expect(deleted.status).toBe(403);
  });

  it('without a session nothing can be read or written', async () => {
    expect((await fetch(`${server.url}${server.database}/_all_docs`)).status).toBe(401);
  });
});
