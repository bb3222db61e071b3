// `npm start`: from a fresh clone to a running Lamplight at http://127.0.0.1:8080/ with demo data,
// plus the development mail inbox that catches account e-mail (read it on Admin › Mail).
import { spawn } from 'node:child_process';
import path from 'node:path';

import { bin, databaseUrl, ensureDependencies, jwtSecret, root, run, startDatabase } from './lib.mjs';

ensureDependencies();
startDatabase();

console.log('Building the server and the app (production)…');
run(bin('tsc'), ['-p', 'sync-server/tsconfig.json']);
run(bin('ng'), ['build', '--configuration', 'production']);

const smtpPort = process.env.LAMPLIGHT_DEV_SMTP_PORT ?? '2525';
const env = {
  ...process.env,
  DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl('lamplight'),
  LAMPLIGHT_APP_DIR: path.join(root, 'dist/app/browser'),
  LAMPLIGHT_JWT_SECRET: jwtSecret(),
  LAMPLIGHT_DEV_MAIL_DIR: process.env.LAMPLIGHT_DEV_MAIL_DIR ?? path.join(root, '.data', 'mail'),
  LAMPLIGHT_DEV_SMTP_PORT: smtpPort,
  SMTP_URL: process.env.SMTP_URL ?? `smtp://127.0.0.1:${smtpPort}`,
};

console.log('Demo accounts (invented people):');
run('node', ['dist/node/sync-server/src/seed.js'], { env });

const children = [];
const inbox = process.env.SMTP_URL ? null : spawn('node', ['dist/node/sync-server/src/dev-inbox/main.js'], { cwd: root, stdio: 'inherit', env });
if (inbox) children.push(inbox);
const server = spawn('node', ['dist/node/sync-server/src/main.js'], { cwd: root, stdio: 'inherit', env });
children.push(server);

// Ctrl-C reaches the children too (same process group); wait for the server to close cleanly.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => children.forEach((child) => child.kill('SIGTERM')));
server.on('exit', (code) => {
  inbox?.kill('SIGTERM');
  console.log('PostgreSQL keeps running; stop it with: npm run db -- stop');
  process.exit(code ?? 0);
});
