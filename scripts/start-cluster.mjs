// `npm run start:cluster [-- --pgbouncer]`: Lamplight as an operator runs it, on this machine.
// Debian's nginx on 127.0.0.1:8080 (deploy/nginx.conf) in front of three server instances on one
// PostgreSQL (through PgBouncer with --pgbouncer), with demo data and the development inbox.
// nginx and pgbouncer are installed when missing and we are root.
import { spawn } from 'node:child_process';
import path from 'node:path';

import { bin, databaseUrl, ensureDebianPackage, ensureDependencies, jwtSecret, root, run, startDatabase } from './lib.mjs';

const withPgBouncer = process.argv.includes('--pgbouncer');
ensureDependencies();
ensureDebianPackage('/usr/sbin/nginx', 'nginx');
if (withPgBouncer) ensureDebianPackage('/usr/sbin/pgbouncer', 'pgbouncer');
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
  LAMPLIGHT_PUBLIC_URL: process.env.LAMPLIGHT_PUBLIC_URL ?? `http://${process.env.LAMPLIGHT_CLUSTER_LISTEN ?? '127.0.0.1:8080'}`,
  LAMPLIGHT_DEV_MAIL_DIR: process.env.LAMPLIGHT_DEV_MAIL_DIR ?? path.join(root, '.data', 'mail'),
  LAMPLIGHT_DEV_SMTP_PORT: smtpPort,
  SMTP_URL: process.env.SMTP_URL ?? `smtp://127.0.0.1:${smtpPort}`,
};

console.log('Demo accounts (invented people):');
run('node', ['dist/node/sync-server/src/seed.js'], { env });

const inbox = process.env.SMTP_URL ? null : spawn('node', ['dist/node/sync-server/src/dev-inbox/main.js'], { cwd: root, stdio: 'inherit', env });
const cluster = spawn('node', ['dist/node/scripts/ops/run-cluster.js', ...(withPgBouncer ? ['--pgbouncer'] : [])], { cwd: root, stdio: 'inherit', env });

// Ctrl-C reaches the children too (same process group); wait for the cluster to stop cleanly.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => [inbox, cluster].forEach((child) => child?.kill('SIGTERM')));
cluster.on('exit', (code) => {
  inbox?.kill('SIGTERM');
  console.log('PostgreSQL keeps running; stop it with: npm run db -- stop');
  process.exit(code ?? 0);
});
