import { restartLocalPostgres } from '../support/postgres-restart';
import { testDatabaseUrl } from '../support/test-database';
import { testInbox } from '../support/test-server';
import { summary } from '../sync-sim/fault-schedule';
import { runRealChaos } from '../sync-sim/real-chaos';

/**
 * The short form of `npm run chaos:real`: 3 devices against two real server processes for about
 * 8 s of faults — one server killed with SIGKILL mid-push and restarted, the spec cluster's
 * PostgreSQL restarted, a tenth of the answers lost — then the same checks as the simulated
 * schedules.
 */
describe('Chaos against real server processes (short)', () => {
  it('When servers are killed mid-push, PostgreSQL restarts and answers are lost, then nothing acknowledged is lost and all devices converge', async () => {
    const { port } = await testInbox();
    const report = await runRealChaos({
      databaseUrl: testDatabaseUrl(),
      smtpPort: port,
      devices: 3,
      durationMs: 8000,
      kills: 1,
      seed: 20261204,
      restartPostgres: () => restartLocalPostgres(testDatabaseUrl()),
    });
    const { outcome } = report;
    // The faults happened…
    expect(report.kills).toBe(1);
    expect(report.postgresRestarts).toBe(1);
    expect(report.droppedResponses).toBeGreaterThan(0);
    expect(outcome.acknowledged).toBeGreaterThan(20);
    // …and nothing was lost or left apart.
    expect(summary(outcome)).toEqual(
      jasmine.objectContaining({ divergent: 0, lostAcknowledged: 0, lostWrites: 0, refusedValid: 0, acceptedInvalid: 0, outboxLeft: 0, unexpected: [] }),
    );
  }, 90_000);
});
