/**
 * `npm run shop:setup -- --url https://shop.example/db/ --admin admin:secret --database plant-1
 *   --person mk:password:operator --person sv:password:supervisor`
 * Sets up (or updates) the plant's database on a CouchDB 3 server as the README describes: the
 * database, its members by role, the rules, and the people. Run it again to add people or to load
 * newer rules; nothing is deleted.
 */
import { ROLES, type Role } from '../jobs/designDoc';
import { setUpShop, type ShopPerson } from './shopSetup';

function fail(message: string): never {
  console.error(`shop:setup: ${message}`);
  process.exit(2);
}

const args = process.argv.slice(2);
const value = (flag: string): string[] =>
  args.flatMap((arg, i) => (arg === flag && args[i + 1] !== undefined ? [args[i + 1]!] : []));

const url = value('--url')[0] ?? fail('--url is required (the server, e.g. http://127.0.0.1:5984/)');
const [adminName, ...adminRest] = (value('--admin')[0] ?? fail('--admin name:password is required')).split(':');
const database = value('--database')[0] ?? fail('--database is required (e.g. plant-1)');
const people: ShopPerson[] = value('--person').map((text) => {
  const [name, password, ...roles] = text.split(':');
  if (!name || !password || roles.length === 0) fail(`--person ${text}: write name:password:role[:role]`);
  const unknown = roles.filter((role) => !(ROLES as readonly string[]).includes(role));
  if (unknown.length > 0) fail(`--person ${name}: unknown role ${unknown.join(', ')} (roles: ${ROLES.join(', ')})`);
  return { name, password, roles: roles as Role[] };
});

await setUpShop({ url, admin: { name: adminName ?? '', password: adminRest.join(':') }, database, people });
console.log(`shop:setup: ${database} on ${url} is ready (rules loaded, ${people.length} people).`);
