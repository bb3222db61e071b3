import { randomUUID } from 'node:crypto';

import { BOOK_STATUSES } from '../../shared/sync/schema/collections';
import { FaultProxy } from '../support/fault-proxy';
import { registeredReader, serverProcessEnv, startServerProcess, type ServerProcess } from '../support/server-process';
import { checkOutcome, fullState, NODES, type Outcome } from './fault-schedule';
import { NetworkError, SimDevice } from './sim-device';
import { HttpSimServer, type SimRequest, type SimResponse } from './sim-wire';

export interface RealChaosOptions {
  readonly databaseUrl: string;
  readonly smtpPort: number;
  /** 3–5 devices. */
  readonly devices: number;
  /** How long faults are injected before the network heals. */
  readonly durationMs: number;
  readonly seed: number;
  /** Servers killed mid-push: 1 (the first) or 2 (one each). */
  readonly kills?: 1 | 2;
  /** Stops and starts the PostgreSQL cluster the servers use. */
  readonly restartPostgres: () => Promise<void>;
  readonly log?: (line: string) => void;
}

export interface RealChaosReport {
  readonly outcome: Outcome;
  readonly kills: number;
  readonly postgresRestarts: number;
  readonly droppedResponses: number;
  readonly networkErrors: number;
  /** 5xx answers, all while PostgreSQL or a server was down (the device retries them). */
  readonly serverErrors: number;
  readonly deviceCrashes: number;
}

/** A small deterministic random source (the choices are seeded; real timing is not). */
function random(seed: number): () => number {
  let state = seed % 2 ** 31 || 1;
  return () => (state = (state * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const ROWS = ['b0000000-0000-4000-8000-000000000001', 'b0000000-0000-4000-8000-000000000002', 'b0000000-0000-4000-8000-000000000003'];

/** A valid edit of a book, chosen by `rand`. */
function randomEdit(rand: () => number): { field: string; value: unknown } {
  const pick = <T>(values: readonly T[]) => values[Math.floor(rand() * values.length)]!;
  const edits: (() => { field: string; value: unknown })[] = [
    () => ({ field: 'title', value: pick(['The Copper Orchard', 'Nine Lanterns', 'A Map of Small Rivers']) }),
    () => ({ field: 'status', value: pick(BOOK_STATUSES) }),
    () => ({ field: 'rating', value: rand() < 0.2 ? null : Math.ceil(rand() * 10) / 2 }),
    () => ({ field: 'pageCount', value: 1 + Math.floor(rand() * 900) }),
    () => ({ field: 'deleted', value: rand() < 0.3 }),
  ];
  return pick(edits)();
}

/**
 * Devices (the shared sync cycle over HTTP) against two real server processes on loopback, each
 * behind a proxy that loses some answers, while the servers are killed with SIGKILL mid-push and
 * restarted and PostgreSQL restarts; then the network heals, every device syncs, and the same
 * checks as the simulated schedules run.
 */
export async function runRealChaos(options: RealChaosOptions): Promise<RealChaosReport> {
  const began = performance.now();
  const log = (line: string) => options.log?.(`${((performance.now() - began) / 1000).toFixed(1).padStart(6)} s  ${line}`);
  const rand = random(options.seed);
  const env = serverProcessEnv(options.databaseUrl, options.smtpPort);
  // Together: instances take turns to migrate (an advisory lock), as in a real deployment.
  const servers: ServerProcess[] = await Promise.all([startServerProcess(env), startServerProcess(env)]);
  log('two server processes listening');
  const proxies = await Promise.all(servers.map((server) => FaultProxy.start(server.port, rand)));
  const counts = { kills: 0, postgresRestarts: 0, networkErrors: 0, serverErrors: 0, deviceCrashes: 0 };
  try {
    const token = await registeredReader(proxies[0]!.baseUrl, `chaos-${randomUUID().slice(0, 8)}@example.com`);
    const transport =
      (index: number) =>
      async (_device: SimDevice, request: SimRequest): Promise<SimResponse> => {
        let response: SimResponse;
        try {
          response = await new HttpSimServer(() => proxies[index % proxies.length]!.baseUrl, token, 10_000).handle(request);
        } catch (error) {
          counts.networkErrors++;
          throw new NetworkError(error instanceof Error ? error.message : String(error));
        }
        if (response.status >= 500) {
          counts.serverErrors++;
          throw new NetworkError(`server answered ${response.status}`);
        }
        return response;
      };
    const devices = NODES.concat(['Watch-E'])
      .slice(0, options.devices)
      .map((node, index) => {
        const device = new SimDevice(node, Date.now, transport(index), randomUUID, { batchSize: 1 + Math.floor(rand() * 5), pullLimit: 1 + Math.floor(rand() * 5) });
        device.skewMs = Math.round((rand() - 0.5) * 2 * 3_600_000);
        return device;
      });

    const stopAt = Date.now() + options.durationMs;
    const deviceLoop = async (device: SimDevice) => {
      while (Date.now() < stopAt) {
        const r = rand();
        if (r < 0.02) device.writeInvalid('books', ROWS[Math.floor(rand() * ROWS.length)]!, 'rating', 7);
        for (let n = Math.floor(rand() * 3); n > 0; n--) {
          const { field, value } = randomEdit(rand);
          device.write('books', ROWS[Math.floor(rand() * ROWS.length)]!, field, value);
        }
        if (rand() < 0.01) device.skewMs = Math.round((rand() - 0.5) * 4 * 3_600_000); // the clock jumps
        device.startSync();
        if (rand() < 0.05) {
          // The app dies half way through a sync (or just after writing its outbox).
          await sleep(rand() * 30);
          device.crash();
          counts.deviceCrashes++;
        } else {
          await device.settle();
        }
        await sleep(10 + rand() * 90);
      }
    };
    const killMidPush = async (index: number) => {
      await Promise.race([proxies[index]!.nextPush(), sleep(5000)]);
      servers[index]!.child.kill('SIGKILL');
      await servers[index]!.exited;
      counts.kills++;
      log(`killed server ${index} (SIGKILL) mid-push; restarting it`);
      servers[index] = await startServerProcess(env);
      proxies[index]!.retarget(servers[index]!.port);
      log(`server ${index} is back`);
    };
    const chaos = async () => {
      proxies.forEach((proxy) => (proxy.dropResponses = 0.1));
      await sleep(options.durationMs * 0.25);
      await killMidPush(0);
      await sleep(Math.max(0, stopAt - options.durationMs * 0.5 - Date.now()));
      log('restarting PostgreSQL');
      await options.restartPostgres();
      log('PostgreSQL is back');
      counts.postgresRestarts++;
      if (options.kills === 1) return;
      await sleep(Math.max(0, stopAt - options.durationMs * 0.25 - Date.now()));
      await killMidPush(1);
    };
    await Promise.all([chaos(), ...devices.map(deviceLoop)]);

    // The network heals; every device syncs until a whole cycle goes through, twice round.
    log('faults over; final sync');
    proxies.forEach((proxy) => (proxy.dropResponses = 0));
    await Promise.all(devices.map((device) => device.settle()));
    for (let round = 0; round < 2; round++) {
      for (const device of devices) {
        for (let attempt = 0; attempt < 20; attempt++) {
          device.startSync();
          await device.settle();
          if (device.lastCycleOk && device.durable.outbox.length === 0) break;
          await sleep(250);
        }
      }
    }
    log('final sync done');
    const state = await fullState(new HttpSimServer(() => proxies[0]!.baseUrl, token), Date.now());
    return { outcome: checkOutcome(devices, state, []), droppedResponses: proxies.reduce((n, p) => n + p.droppedResponses, 0), ...counts };
  } finally {
    for (const server of servers) server.child.kill('SIGTERM');
    await Promise.all(servers.map((server) => server.exited));
    await Promise.all(proxies.map((proxy) => proxy.close()));
  }
}
