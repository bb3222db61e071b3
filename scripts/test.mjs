// `npm test`: everything, on a fresh machine. Installs what is missing, starts PostgreSQL, makes a
// fresh test database, then runs the suites (two at a time, see `JOBS`) and ends with one line:
// `N passed, N failed`.
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { e2eShards } from './e2e-shards.mjs';
import { bin, databaseUrl, ensureDebianPackage, ensureDependencies, run, runCaptured, startDatabase } from './lib.mjs';

const TEST_DB = 'lamplight_test';
const CHROMIUM = '/usr/bin/chromium';
/** Steps at a time: one per core of the 2-core test machine (LAMPLIGHT_TEST_JOBS overrides). */
const JOBS = Math.max(1, Math.floor(Number(process.env['LAMPLIGHT_TEST_JOBS']) || 2));
/** Browser e2e processes, each with its own database (LAMPLIGHT_E2E_SHARDS overrides). */
const E2E_SHARDS = Math.max(1, Math.floor(Number(process.env['LAMPLIGHT_E2E_SHARDS']) || 2));

const started = Date.now();
ensureDependencies();
ensureDebianPackage(CHROMIUM, 'chromium');
// The cluster and PgBouncer server specs run Debian's nginx and pgbouncer as our own processes.
ensureDebianPackage('/usr/sbin/nginx', 'nginx');
ensureDebianPackage('/usr/sbin/pgbouncer', 'pgbouncer');
startDatabase();
run('bash', ['scripts/db.sh', 'fresh-db', TEST_DB]);
// Each e2e shard has a database of its own, so no shard sees another's readers.
const shards = e2eShards(E2E_SHARDS);
const shardDatabase = (shard) => `${TEST_DB}_e2e${shard + 1}`;
for (const shard of shards.keys()) run('bash', ['scripts/db.sh', 'fresh-db', shardDatabase(shard)]);

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
 * LAMPLIGHT_RESULTS_FILE) or counts as one check by its exit code. `needs` names steps that must
 * finish first, and succeed, for this one to run. Suites start in `start` order (the e2e specs are
 * the longest, so what they need goes first; Karma has the other core meanwhile, then the checks
 * fill gaps) and print in list order. `alone`: nothing runs beside
 * it (the server specs stop and start PostgreSQL, and time a few things). `shards`: the e2e files
 * split over processes, each on its own fresh database; their counts add up.
 */
const suites = [
  { name: 'lint: ESLint with the boundary rule (no warnings)', start: 3, command: [bin('eslint'), '--max-warnings', '0', '.'] },
  { name: 'format: Prettier check', start: 3, command: [bin('prettier'), '--check', '.'] },
  { name: 'type check: shared/', start: 3, command: [bin('tsc'), '-p', 'shared/tsconfig.json'] },
  { name: 'type check: src/', start: 3, command: [bin('tsc'), '-p', 'tsconfig.app.json', '--noEmit'] },
  { name: 'type check + compile: sync-server/, spec/, scripts/', start: 1, id: 'node', command: [bin('tsc'), '-p', 'sync-server/tsconfig.json'] },
  { name: 'unit specs of src/ and shared/ (Karma, Chromium)', start: 2, counts: true, command: [bin('ng'), 'test', '--watch=false'] },
  {
    name: 'server specs (Jasmine, PostgreSQL)',
    start: 4,
    alone: true,
    counts: true,
    needs: 'node',
    command: [bin('jasmine'), '--config=spec/support/jasmine-server.json'],
  },
  {
    name: 'production build of the app',
    start: 1,
    id: 'build',
    command: [
      'bash',
      '-c',
      `node scripts/subset-icons.mjs && NG_BUILD_OPTIMIZE_CHUNKS=1 ${bin('ng')} build --configuration production && node scripts/preload-initial.mjs && node scripts/precompress.mjs`,
    ],
  },
  {
    name: 'browser e2e specs (Playwright, Chromium)',
    start: 5,
    counts: true,
    needs: ['node', 'build'],
    shards,
    command: [bin('jasmine'), '--config=spec/support/jasmine-e2e.json'],
  },
];

const outcome = new Map();
const rows = [];
let passed = 0;
let failed = 0;

/** The parts a suite runs as: the e2e files split into shards, every other suite as itself. */
function partsOf(suite, index) {
  if (!suite.shards) return [{ label: '', command: suite.command, env: {}, resultsFile: path.join(resultsDir, `${index}.json`) }];
  return suite.shards.map((files, shard) => {
    const database = shardDatabase(shard);
    return {
      label: `shard ${shard + 1} of ${suite.shards.length}: ${files.map((file) => path.basename(file)).join(', ')}`,
      command: [...suite.command, ...files],
      env: { DATABASE_URL: databaseUrl(database), LAMPLIGHT_TIMINGS_FILE: path.join(resultsDir, `${index}-${shard}-timings.json`) },
      resultsFile: path.join(resultsDir, `${index}-${shard}.json`),
    };
  });
}

/** `{ passed, failed }` of one finished part (see the comment above `suites`). */
function countsOf(suite, part, code) {
  if (!suite.counts) return code === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 };
  const counted = existsSync(part.resultsFile) ? JSON.parse(readFileSync(part.resultsFile, 'utf8')) : { passed: 0, failed: 0 };
  // A crash before any result, or a non-zero exit with nothing failed, still fails the run.
  if (code !== 0 && counted.failed === 0) counted.failed = 1;
  return counted;
}

/**
 * Runs the suites, up to JOBS parts at a time, each starting (in `start` order) once the suites it
 * needs have finished; a suite whose needs failed is not run. Output is kept and printed suite by
 * suite in list order, so parallel steps never interleave.
 */
const states = suites.map((suite) => ({ suite, parts: null, running: 0, left: 0, outputs: [], counts: [], code: 0, t0: 0, seconds: 0, done: false }));
const inStartOrder = [...states].sort((a, b) => a.suite.start - b.suite.start);
let running = 0;
let printed = 0;
const finished = new Promise((resolveAll) => {
  const schedule = () => {
    const aloneRunning = () => states.some((other) => other.running > 0 && other.suite.alone);
    for (const state of inStartOrder) {
      const index = states.indexOf(state);
      if (state.done || (state.parts && state.parts.length === 0)) continue;
      const needs = [state.suite.needs ?? []].flat();
      if (needs.some((id) => !states.find((other) => other.suite.id === id)?.done)) continue;
      if (state.parts === null) {
        const missing = needs.filter((id) => outcome.get(id) !== true);
        if (missing.length > 0) {
          state.outputs.push(`skipped: it needs ${missing.join(', ')} to succeed first\n`);
          state.skipped = true;
          finish(state);
          continue;
        }
        state.parts = partsOf(state.suite, index);
        state.left = state.parts.length;
      }
      // Nothing starts beside an `alone` suite, and nothing later jumps ahead of one that waits.
      if (aloneRunning() || (state.suite.alone && running > 0)) break;
      state.t0 ||= Date.now();
      while (state.parts.length > 0 && running < JOBS) start(state, state.parts.shift());
      if (running >= JOBS) break;
    }
    if (states.every((state) => state.done)) resolveAll();
  };
  const start = (state, part) => {
    running++;
    state.running++;
    const slot = state.outputs.length;
    state.outputs.push('');
    console.log(`  … started ${state.suite.name}${part.label ? ` (${part.label.split(':')[0]})` : ''}`);
    const [command, ...args] = part.command;
    runCaptured(command, args, { env: { ...env, LAMPLIGHT_RESULTS_FILE: part.resultsFile, ...part.env } }).then(({ code, output }) => {
      running--;
      state.running--;
      state.left--;
      state.outputs[slot] = (part.label ? `[${part.label}]\n` : '') + output;
      state.counts.push(countsOf(state.suite, part, code));
      if (code !== 0) state.code = code;
      if (state.left === 0 && state.parts.length === 0) finish(state);
      schedule();
    });
  };
  const finish = (state) => {
    state.done = true;
    state.seconds = state.t0 ? (Date.now() - state.t0) / 1000 : 0;
    if (state.suite.id) outcome.set(state.suite.id, !state.skipped && state.code === 0);
    // Print every finished suite whose turn has come.
    while (printed < states.length && states[printed].done) {
      const { suite, outputs } = states[printed++];
      console.log(`\n── ${suite.name} ──`);
      for (const output of outputs) process.stdout.write(output.endsWith('\n') || output === '' ? output : `${output}\n`);
    }
  };
  schedule();
});
await finished;

for (const state of states) {
  const { suite } = state;
  if (state.skipped) {
    failed++;
    rows.push(`  ${suite.name}: not run (counted as 1 failed)`);
    continue;
  }
  const counted = state.counts.reduce((sum, part) => ({ passed: sum.passed + part.passed, failed: sum.failed + part.failed }), { passed: 0, failed: 0 });
  passed += counted.passed;
  failed += counted.failed;
  const split = suite.shards?.length > 1 ? `, ${suite.shards.length} shards` : '';
  rows.push(`  ${suite.name}: ${counted.passed} passed, ${counted.failed} failed (${state.seconds.toFixed(1)} s${split})`);
  for (const failure of state.counts.flatMap((part) => part.failures ?? [])) rows.push(`    ✗ ${failure}`);
}

console.log(`\nSummary (${((Date.now() - started) / 1000).toFixed(0)} s in all):`);
for (const row of rows) console.log(row);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
