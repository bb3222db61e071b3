// `npm test`: everything, on a fresh machine. Installs what is missing, starts PostgreSQL, makes a
// fresh test database, then runs each suite and ends with one line: `N passed, N failed`.
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { bin, databaseUrl, ensureDebianPackage, ensureDependencies, run, runStatus, startDatabase } from './lib.mjs';

const TEST_DB = 'lamplight_test';
const CHROMIUM = '/usr/bin/chromium';

const started = Date.now();
ensureDependencies();
ensureDebianPackage(CHROMIUM, 'chromium');
// The cluster and PgBouncer server specs run Debian's nginx and pgbouncer as our own processes.
ensureDebianPackage('/usr/sbin/nginx', 'nginx');
ensureDebianPackage('/usr/sbin/pgbouncer', 'pgbouncer');
startDatabase();
run('bash', ['scripts/db.sh', 'fresh-db', TEST_DB]);

const resultsDir = mkdtempSync(path.join(tmpdir(), 'lamplight-results-'));
const env = {
  ...process.env,
  CHROME_BIN: CHROMIUM,
  DATABASE_URL: databaseUrl(TEST_DB),
  LAMPLIGHT_BCRYPT_COST: '4',
  NODE_ENV: 'test',
};

/**
 * Each suite either counts its own specs (it writes `{ passed, failed }` to the file named by
 * LAMPLIGHT_RESULTS_FILE) or counts as one check by its exit code. `needs` names a step whose
 * success this one depends on.
 */
const suites = [
  { name: 'lint: ESLint with the boundary rule (no warnings)', command: [bin('eslint'), '--max-warnings', '0', '.'] },
  { name: 'format: Prettier check', command: [bin('prettier'), '--check', '.'] },
  { name: 'type check: shared/', command: [bin('tsc'), '-p', 'shared/tsconfig.json'] },
  { name: 'type check: src/', command: [bin('tsc'), '-p', 'tsconfig.app.json', '--noEmit'] },
  { name: 'type check + compile: sync-server/, spec/, scripts/', id: 'node', command: [bin('tsc'), '-p', 'sync-server/tsconfig.json'] },
  { name: 'unit specs of src/ and shared/ (Karma, Chromium)', counts: true, command: [bin('ng'), 'test', '--watch=false'] },
  { name: 'server specs (Jasmine, PostgreSQL)', counts: true, needs: 'node', command: [bin('jasmine'), '--config=spec/support/jasmine-server.json'] },
  { name: 'production build of the app', id: 'build', command: ['bash', '-c', `node scripts/subset-icons.mjs && ${bin('ng')} build --configuration production && node scripts/precompress.mjs`] },
  { name: 'browser e2e specs (Playwright, Chromium)', counts: true, needs: ['node', 'build'], command: [bin('jasmine'), '--config=spec/support/jasmine-e2e.json'] },
];

const outcome = new Map();
const rows = [];
let passed = 0;
let failed = 0;

for (const [index, suite] of suites.entries()) {
  const needs = [suite.needs ?? []].flat();
  const missing = needs.filter((id) => outcome.get(id) !== true);
  console.log(`\n── ${suite.name} ──`);
  if (missing.length > 0) {
    console.log(`skipped: it needs ${missing.join(', ')} to succeed first`);
    failed++;
    rows.push(`  ${suite.name}: not run (counted as 1 failed)`);
    continue;
  }
  const resultsFile = path.join(resultsDir, `${index}.json`);
  const t0 = Date.now();
  const [command, ...args] = suite.command;
  const code = await runStatus(command, args, { env: { ...env, LAMPLIGHT_RESULTS_FILE: resultsFile } });
  const seconds = ((Date.now() - t0) / 1000).toFixed(1);
  if (suite.id) outcome.set(suite.id, code === 0);

  let counted = code === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 };
  if (suite.counts) {
    counted = existsSync(resultsFile) ? JSON.parse(readFileSync(resultsFile, 'utf8')) : { passed: 0, failed: 0 };
    // A crash before any result, or a non-zero exit with nothing failed, still fails the run.
    if (code !== 0 && counted.failed === 0) counted.failed = 1;
  }
  passed += counted.passed;
  failed += counted.failed;
  rows.push(`  ${suite.name}: ${counted.passed} passed, ${counted.failed} failed (${seconds} s)`);
}

console.log(`\nSummary (${((Date.now() - started) / 1000).toFixed(0)} s in all):`);
for (const row of rows) console.log(row);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
