import { isDeepStrictEqual } from 'node:util';

import fc from 'fast-check';

import { registerReader } from '../support/accounts';
import { startTestServer, type RunningServer } from '../support/test-server';
import { isClean, runSchedule, scheduleArbitrary, summary, type Outcome } from '../sync-sim/fault-schedule';
import type { ClockAheadHandling } from '../sync-sim/sim-device';
import { ServerModel } from '../sync-sim/sim-server-model';
import type { OrSetState } from '../../shared/sync/or-set';
import type { SimRequest, SimResponse, SimServer } from '../sync-sim/sim-wire';
import { HttpSimServer } from '../sync-sim/sim-wire';

/** Fixed, so a failure here is the same failure on every machine; `npm run chaos` varies it. */
const SEED = 20261204;
const MODEL_START_MS = Date.UTC(2026, 11, 4, 9, 0);

/** fast-check's own verdict, with the shrunk schedule and its outcome in the message. */
async function schedulesHold(server: () => SimServer, numRuns: number, seed = SEED, clockAhead: ClockAheadHandling = 'restamp') {
  const totals = { writes: 0, acknowledged: 0, requests: 0, clockAhead: 0, setPushes: 0 };
  const details = await fc.check(
    fc.asyncProperty(scheduleArbitrary(), async (schedule) => {
      const outcome = await runSchedule(schedule, server(), MODEL_START_MS, clockAhead);
      totals.writes += outcome.writes;
      totals.acknowledged += outcome.acknowledged;
      totals.requests += outcome.trace.length;
      totals.clockAhead += outcome.trace.filter((e) => e.response.body?.error?.code === 'clock_ahead').length;
      totals.setPushes += outcome.trace.filter(
        (e) => e.request.kind === 'push' && e.response.status === 200 && e.request.body.changes.some((c) => c.field === 'tags'),
      ).length;
      if (!isClean(outcome)) throw new Error(JSON.stringify(summary(outcome)));
    }),
    { numRuns, seed },
  );
  return { details, totals };
}

describe('Fault schedules (simulated devices, network and crashes)', () => {
  it('When 300 schedules drop, delay, duplicate and reorder requests and crash devices and the server, then nothing acknowledged is lost and all converge', async () => {
    const { details, totals } = await schedulesHold(() => new ServerModel(), 300);
    expect(details.failed)
      .withContext(fc.defaultReportMessage(details) ?? '')
      .toBeFalse();
    expect(details.numRuns).toBe(300);
    // The schedules did real work: many confirmed writes and requests to check.
    expect(totals.acknowledged).toBeGreaterThan(1000);
    expect(totals.requests).toBeGreaterThan(3000);
    // …including tags added and removed, and clocks days off refused and re-stamped.
    expect(totals.setPushes).toBeGreaterThan(300);
    expect(totals.clockAhead).toBeGreaterThan(20); // 30 with this seed
  }, 60_000); // a few seconds here; room for a busy machine

  it('When a device’s clock jumps back 3 days while a pull is in flight and it then edits a field it has pulled, then its edit orders after the pulled one and all converge', async () => {
    // Found by `npm run chaos` (seed 1126624529): the offset measured across the jump was half of it, the device
    // refused to adopt the pulled clock as "over 24 h ahead", and stamped its edit below a clock it already held.
    const edit = { collection: 'bookStatusChanges', field: 'changedAt', value: '2026-05-28T20:26:40.000Z' } as const;
    const schedule = {
      devices: 2,
      batchSize: 1,
      pullLimit: 1,
      skews: [1, 0, 0, 0],
      steps: [
        { t: 'write', d: 0, row: 1, edit },
        { t: 'sync', d: 0 },
        { t: 'sync', d: 1 },
        { t: 'deliver', k: 0, fault: 'ok' },
        { t: 'jump', d: 1, skewMs: -3 * 24 * 60 * 60 * 1000 },
        { t: 'deliver', k: 0, fault: 'ok' },
        { t: 'write', d: 1, row: 1, edit },
        { t: 'deliver', k: 0, fault: 'drop-request' },
      ],
    } as unknown as Parameters<typeof runSchedule>[0];
    const outcome = await runSchedule(schedule, new ServerModel(), MODEL_START_MS);
    expect(outcome.writes).toBe(2);
    expect(summary(outcome)).toEqual(jasmine.objectContaining({ divergent: 0, lostAcknowledged: 0 }));
    expect(isClean(outcome)).toBeTrue();
  });

  it('When the server forgets one change of a batch, then the checks find a schedule that shows it (and shrink it)', async () => {
    /** A broken server: answers 200 for a push of two or more changes but drops the last one. */
    class ForgetfulServer extends ServerModel {
      override handle(request: SimRequest, nowMs: number): Promise<SimResponse> {
        if (request.kind === 'push' && request.body.changes.length > 1) {
          return super.handle({ ...request, body: { ...request.body, changes: request.body.changes.slice(0, -1) } }, nowMs);
        }
        return super.handle(request, nowMs);
      }
    }
    const { details } = await schedulesHold(() => new ForgetfulServer(), 300);
    expect(details.failed).toBeTrue();
    expect(String(details.errorInstance)).toMatch(/"lostAcknowledged":[1-9]/);
  }, 60_000);

  it('When a pull page loses its last change, then the checks find divergent devices', async () => {
    class LeakyPullServer extends ServerModel {
      override async handle(request: SimRequest, nowMs: number): Promise<SimResponse> {
        const res = await super.handle(request, nowMs);
        if (request.kind !== 'pull' || res.status !== 200 || request.limit === 1000) return res;
        return { ...res, body: { ...res.body, changes: res.body.changes.slice(0, -1) } };
      }
    }
    const { details } = await schedulesHold(() => new LeakyPullServer(), 300);
    expect(details.failed).toBeTrue();
    expect(String(details.errorInstance)).toMatch(/"divergent":[1-9]/);
  }, 60_000);

  it('When the server keeps only the newest delta of a set field (concurrent adds dropped), then the checks find a lost acknowledged add', async () => {
    /** A broken server: a set field's delta replaces the stored state instead of joining it, as a whole-value last-writer-wins would. */
    class AddDroppingServer extends ServerModel {
      protected override joinSet(stored: OrSetState | undefined, delta: OrSetState): OrSetState | 'same' {
        const joined = super.joinSet(stored, delta);
        return joined === 'same' ? joined : delta;
      }
    }
    const { details } = await schedulesHold(() => new AddDroppingServer(), 300);
    expect(details.failed).toBeTrue();
    expect(String(details.errorInstance)).toMatch(/"lostSetAdds":[1-9]/);
  }, 60_000);

  it('When a device sets changes refused as clock_ahead aside instead of re-stamping them, then the checks find it', async () => {
    const { details } = await schedulesHold(() => new ServerModel(), 300, SEED, 'set-aside');
    expect(details.failed).toBeTrue();
    expect(String(details.errorInstance)).toMatch(/"setAsideClockAhead":[1-9]/);
  }, 60_000);
});

describe('The in-memory server model against the real server (same schedules, two instances, real PostgreSQL)', () => {
  let server: RunningServer;
  let other: RunningServer;
  beforeAll(async () => ([server, other] = await Promise.all([startTestServer(), startTestServer()])));
  afterAll(async () => {
    await server.close();
    await other.close();
  });

  /** Answers as the devices see them: cursors are each server's own, the rest must match. */
  const comparable = (request: SimRequest, response: SimResponse) => {
    const { status, body } = response;
    if (status !== 200) return { kind: request.kind, status, code: body?.error?.code, details: body?.error?.details };
    if (request.kind === 'push') return { kind: 'push', status, applied: body.applied };
    return { kind: 'pull', status, hasMore: body.hasMore, changes: body.changes };
  };

  it('When 12 schedules run on both, then every answer and the final state are the same, and the real server passes the checks', async () => {
    const schedules = fc.sample(scheduleArbitrary(40), { seed: SEED, numRuns: 12 });
    let compared = 0;
    for (const [n, schedule] of schedules.entries()) {
      const reader = await registerReader(server.app);
      const startMs = Date.now(); // the real server checks clocks against its own time
      // Requests alternate between two instances on the one database, as behind a load balancer.
      let turn = 0;
      const real: Outcome = await runSchedule(schedule, new HttpSimServer(() => [server, other][turn++ % 2]!.baseUrl, reader.accessToken), startMs);
      const model: Outcome = await runSchedule(schedule, new ServerModel(), startMs);

      expect(isClean(real))
        .withContext(`schedule ${n} on the real server: ${JSON.stringify(summary(real))}`)
        .toBeTrue();
      expect(real.trace.length).withContext(`schedule ${n}: requests`).toBe(model.trace.length);
      const firstDifference = real.trace.findIndex(
        (entry, i) => !isDeepStrictEqual(comparable(entry.request, entry.response), comparable(model.trace[i]!.request, model.trace[i]!.response)),
      );
      expect(firstDifference)
        .withContext(
          `schedule ${n}, answer ${firstDifference}: real ${JSON.stringify(real.trace[firstDifference]?.response.body)} model ${JSON.stringify(model.trace[firstDifference]?.response.body)}`,
        )
        .toBe(-1);
      expect([...real.finalState.entries()].sort()).toEqual([...model.finalState.entries()].sort());
      compared += real.trace.length;
    }
    expect(compared).toBeGreaterThan(100);
  }, 120_000);
});
