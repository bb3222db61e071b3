// `npm start`: from a fresh clone to a running Lamplight at http://127.0.0.1:8080/ with demo data,
// plus the development mail inbox that catches account e-mail (read it on Admin › Mail).
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

import { bin, databaseUrl, ensureDependencies, root, run, startDatabase } from './lib.mjs';

/** The token-signing secret: from the environment, else one generated once and kept in .data/. */
function jwtSecret() {
  if (process.env.LAMPLIGHT_JWT_SECRET) return process.env.LAMPLIGHT_JWT_SECRET;
  const file = path.join(root, '.data', 'jwt-secret');
  if (!existsSync(file)) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

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
run('node', ['dist/node/sync-server/src/demo/seed.js'], { env });

const children = [];
const inbox = process.env.SMTP_URL ? null : spawn('node', ['dist/node/sync-server/src/mail/dev-inbox-main.js'], { cwd: root, stdio: 'inherit', env });
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
