// `npm run chaos [runs] [seed]`: fault schedules against the in-memory server model (checked
// against the real server by spec/server/fault-schedules.spec.ts). Prints how many schedules,
// writes and requests ran, and the numbers that must be 0: divergent states, lost acknowledged
// writes, lost set adds, changes set aside for clock_ahead. On a failure, fast-check prints the shrunk schedule to replay.
import fc from 'fast-check';

import { isClean, runSchedule, scheduleArbitrary, summary } from '../spec/sync-sim/fault-schedule';
import { ServerModel } from '../spec/sync-sim/sim-server-model';

async function main(): Promise<void> {
  const runs = Number(process.argv[2] ?? 10_000);
  const seed = Number(process.argv[3] ?? Date.now() % 2 ** 31);
  const totals = {
    schedules: 0,
    writes: 0,
    acknowledged: 0,
    requests: 0,
    divergent: 0,
    lostAcknowledged: 0,
    lostWrites: 0,
    refusedValid: 0,
    lostSetAdds: 0,
    setAsideClockAhead: 0,
  };
  const started = performance.now();
  const details = await fc.check(
    fc.asyncProperty(scheduleArbitrary(), async (schedule) => {
      const outcome = await runSchedule(schedule, new ServerModel(), Date.UTC(2026, 11, 4, 9, 0));
      totals.schedules++;
      totals.writes += outcome.writes;
      totals.acknowledged += outcome.acknowledged;
      totals.requests += outcome.trace.length;
      totals.divergent += outcome.divergent;
      totals.lostAcknowledged += outcome.lostAcknowledged;
      totals.lostWrites += outcome.lostWrites;
      totals.refusedValid += outcome.refusedValid;
      totals.lostSetAdds += outcome.lostSetAdds;
      totals.setAsideClockAhead += outcome.setAsideClockAhead;
      if (!isClean(outcome)) throw new Error(JSON.stringify(summary(outcome)));
    }),
    { numRuns: runs, seed },
  );
  const seconds = ((performance.now() - started) / 1000).toFixed(1);
  console.log(`chaos: seed ${seed}, ${seconds} s`);
  console.log(`  schedules run            ${totals.schedules} (of ${runs}; shrinking runs included)`);
  console.log(`  writes                   ${totals.writes} (${totals.acknowledged} acknowledged)`);
  console.log(`  requests answered        ${totals.requests}`);
  console.log(`  divergent states         ${totals.divergent}`);
  console.log(`  lost acknowledged writes ${totals.lostAcknowledged}`);
  console.log(`  lost writes (any)        ${totals.lostWrites}`);
  console.log(`  valid changes refused    ${totals.refusedValid}`);
  console.log(`  lost set adds            ${totals.lostSetAdds}`);
  console.log(`  set aside for clock_ahead ${totals.setAsideClockAhead}`);
  if (details.failed) {
    console.log(fc.defaultReportMessage(details));
    process.exit(1);
  }
}

void main();
