/**
 * `npm run start:shop`: `npm start` with a shop server beside it, for trying the shared log on one
 * machine: pouchdb-server on 127.0.0.1 (in memory: gone when stopped), set up with the rules and
 * four people (printed), and the built app served with /db/ proxied to it. Two browser profiles
 * (or a phone on the same network, with --host) are then two devices.
 */
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { startShopServer, TEST_PEOPLE } from './shopServer';

const shop = await startShopServer();
console.log(`shop server: ${shop.url} (database ${shop.database}, admin ${shop.admin.name} / ${shop.admin.password})`);
for (const person of TEST_PEOPLE) console.log(`  user ${person.name} / ${person.password}: ${person.roles.join(', ')}`);
console.log('In the app: Settings → Shop server, plant database "plant-1", sign in as one of them.');
const vite = join('node_modules', 'vite', 'bin', 'vite.js');
const env = { ...process.env, CASEFRONT_SHOP_URL: shop.url };
const build = spawn(process.execPath, [vite, 'build'], { stdio: 'inherit', env });
build.on('exit', (code) => {
  if (code !== 0) process.exit(code ?? 1);
  const preview = spawn(process.execPath, [vite, 'preview', ...process.argv.slice(2)], { stdio: 'inherit', env });
  const stop = () => {
    preview.kill();
    void shop.stop().then(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
});
