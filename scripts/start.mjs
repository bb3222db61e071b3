// `npm start`: from a fresh clone to a running Lamplight at http://127.0.0.1:8080/ with demo data.
import { spawn } from 'node:child_process';
import path from 'node:path';

import { bin, databaseUrl, ensureDependencies, root, run, startDatabase } from './lib.mjs';

ensureDependencies();
startDatabase();

console.log('Building the server and the app (production)…');
run(bin('tsc'), ['-p', 'sync-server/tsconfig.json']);
run(bin('ng'), ['build', '--configuration', 'production']);

const env = {
  ...process.env,
  DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl('lamplight'),
  LAMPLIGHT_APP_DIR: path.join(root, 'dist/app/browser'),
};

console.log('Demo accounts (invented people):');
run('node', ['dist/node/sync-server/src/seed.js'], { env });

const server = spawn('node', ['dist/node/sync-server/src/main.js'], { cwd: root, stdio: 'inherit', env });
// Ctrl-C reaches the server too (same process group); wait for it to close cleanly.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => server.kill('SIGTERM'));
server.on('exit', (code) => {
  console.log('PostgreSQL keeps running; stop it with: npm run db -- stop');
  process.exit(code ?? 0);
});
