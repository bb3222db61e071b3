// `npm start`: from a fresh clone to a running Lamplight at http://127.0.0.1:8080/ with demo data,
// plus the development mail inbox that catches account e-mail (read it on Admin › Mail) and the
// local library catalogue (SRU, invented records) that "Fill in from the catalogue" asks.
// `npm run start:cluster` (`--cluster [--pgbouncer]`): the same, served as an operator runs it:
// Debian's nginx on 127.0.0.1:8080 (deploy/nginx.conf) in front of three server instances
// (scripts/ops/run-cluster.ts), through PgBouncer with --pgbouncer. nginx and pgbouncer are
// installed when missing and we are root.
import { spawn } from 'node:child_process';
import path from 'node:path';

import { bin, databaseUrl, ensureDebianPackage, ensureDependencies, jwtSecret, root, run, startDatabase } from './lib.mjs';

const cluster = process.argv.includes('--cluster');
const withPgBouncer = cluster && process.argv.includes('--pgbouncer');
ensureDependencies();
if (cluster) ensureDebianPackage('/usr/sbin/nginx', 'nginx');
if (withPgBouncer) ensureDebianPackage('/usr/sbin/pgbouncer', 'pgbouncer');
startDatabase();

console.log('Building the server and the app (production)…');
run(bin('tsc'), ['-p', 'sync-server/tsconfig.json']);
run('node', ['scripts/subset-icons.mjs']);
run(bin('ng'), ['build', '--configuration', 'production'], { env: { ...process.env, NG_BUILD_OPTIMIZE_CHUNKS: '1' } });
run('node', ['scripts/preload-initial.mjs']);
run('node', ['scripts/precompress.mjs']);

const smtpPort = process.env.LAMPLIGHT_DEV_SMTP_PORT ?? '2525';
const env = {
  ...process.env,
  DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl('lamplight'),
  LAMPLIGHT_APP_DIR: path.join(root, 'dist/app/browser'),
  LAMPLIGHT_JWT_SECRET: jwtSecret(),
  LAMPLIGHT_DEV_MAIL_DIR: process.env.LAMPLIGHT_DEV_MAIL_DIR ?? path.join(root, '.data', 'mail'),
  LAMPLIGHT_DEV_SMTP_PORT: smtpPort,
  SMTP_URL: process.env.SMTP_URL ?? `smtp://127.0.0.1:${smtpPort}`,
  // Links in e-mails point at nginx, not at one instance.
  ...(cluster ? { LAMPLIGHT_PUBLIC_URL: process.env.LAMPLIGHT_PUBLIC_URL ?? `http://${process.env.LAMPLIGHT_CLUSTER_LISTEN ?? '127.0.0.1:8080'}` } : {}),
};
// With no catalogues configured, the server asks the local one (LAMPLIGHT_LOCAL_CATALOGUE_PORT).
const cataloguePort = process.env.LAMPLIGHT_LOCAL_CATALOGUE_PORT ?? '41500';
if (!process.env.LAMPLIGHT_CATALOGUE_URLS) env.LAMPLIGHT_CATALOGUE_URLS = `http://127.0.0.1:${cataloguePort}/sru`;

console.log('Demo accounts (invented people):');
run('node', ['dist/node/sync-server/src/demo/seed.js'], { env });

const children = [];
const inbox = process.env.SMTP_URL ? null : spawn('node', ['dist/node/sync-server/src/mail/dev-inbox-main.js'], { cwd: root, stdio: 'inherit', env });
if (inbox) children.push(inbox);
const catalogue = process.env.LAMPLIGHT_CATALOGUE_URLS
  ? null
  : spawn('node', ['dist/node/sync-server/src/local-catalogue/main.js'], {
      cwd: root,
      stdio: 'inherit',
      env: { ...env, LAMPLIGHT_LOCAL_CATALOGUE_PORT: cataloguePort },
    });
if (catalogue) children.push(catalogue);
const serve = cluster ? ['dist/node/scripts/ops/run-cluster.js', ...(withPgBouncer ? ['--pgbouncer'] : [])] : ['dist/node/sync-server/src/main.js'];
const server = spawn('node', serve, { cwd: root, stdio: 'inherit', env });
children.push(server);

// Ctrl-C reaches the children too (same process group); wait for the server to close cleanly.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => children.forEach((child) => child.kill('SIGTERM')));
server.on('exit', (code) => {
  inbox?.kill('SIGTERM');
  catalogue?.kill('SIGTERM');
  console.log('PostgreSQL keeps running; stop it with: npm run db -- stop');
  process.exit(code ?? 0);
});
