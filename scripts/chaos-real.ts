// `npm run chaos:real [devices] [seconds] [seed]`: devices against real server processes on
// loopback, with SIGKILL of a server mid-push, a PostgreSQL restart and lost answers, then the
// same checks as `npm run chaos`. Bounded: about `seconds` of faults plus start-up and healing.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { DevInbox } from '../sync-server/src/mail/dev-inbox';
import { restartLocalPostgres } from '../spec/support/postgres-restart';
import { isClean, summary } from '../spec/sync-sim/fault-schedule';
import { runRealChaos } from '../spec/sync-sim/real-chaos';

async function main(): Promise<void> {
  const databaseUrl = process.env['DATABASE_URL'];
  if (!databaseUrl) throw new Error('DATABASE_URL is not set: run through `npm run chaos:real`');
  const devices = Math.min(5, Math.max(3, Number(process.argv[2] ?? 4)));
  const seconds = Number(process.argv[3] ?? 60);
  const seed = Number(process.argv[4] ?? Date.now() % 2 ** 31);
  const inbox = new DevInbox(mkdtempSync(path.join(tmpdir(), 'lamplight-chaos-mail-')));
  const started = performance.now();
  console.log(`chaos:real: ${devices} devices, 2 server processes, ${seconds} s of faults, seed ${seed}`);
  try {
    const report = await runRealChaos({
      databaseUrl,
      smtpPort: await inbox.listen(0),
      devices,
      durationMs: seconds * 1000,
      seed,
      restartPostgres: () => restartLocalPostgres(databaseUrl),
      log: console.log,
    });
    const { outcome } = report;
    console.log(`done in ${((performance.now() - started) / 1000).toFixed(1)} s`);
    console.log(
      `  faults: ${report.kills} servers killed mid-push, ${report.postgresRestarts} PostgreSQL restart(s), ${report.droppedResponses} answers lost, ${report.deviceCrashes} device crashes`,
    );
    console.log(`  seen by devices: ${report.networkErrors} network errors, ${report.serverErrors} 5xx answers (while something was down)`);
    console.log(`  writes                   ${outcome.writes} (${outcome.acknowledged} acknowledged)`);
    console.log(`  divergent states         ${outcome.divergent}`);
    console.log(`  lost acknowledged writes ${outcome.lostAcknowledged}`);
    console.log(`  lost writes (any)        ${outcome.lostWrites}`);
    console.log(`  valid changes refused    ${outcome.refusedValid}`);
    if (!isClean(outcome)) {
      console.log(`FAILED: ${JSON.stringify(summary(outcome))}`);
      process.exitCode = 1;
    }
  } finally {
    await inbox.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
