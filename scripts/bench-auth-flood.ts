/**
 * `npm run bench:auth-flood`: does a sign-in flood slow down everyone else? Another reader pulls
 * their journal over HTTP, one request after another, first alone (the baseline) and then while
 * wrong sign-ins arrive at the attack run's pace (80 in 6 s, each for a different address, so no
 * per-account limit stops them and every one costs a bcrypt comparison at the production cost
 * of 10). Phases alternate, so machine noise hits both. Prints the pull p99 of each and the ratio
 * flood / alone (goal: ≤ 2). Percentiles by simple-statistics' `quantile`.
 */
import { randomUUID } from 'node:crypto';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';

import { quantile } from 'simple-statistics';

import type { FieldChange } from '../shared/api/sync';
import { HlcClock } from '../shared/sync/hlc';
import { createApp } from '../sync-server/src/app';
import { loadConfig } from '../sync-server/src/config';
import { createDataSource } from '../sync-server/src/data-access/data-source';
import { migrate } from '../sync-server/src/data-access/migrate';
import { SyncStore } from '../sync-server/src/data-access/sync-store';
import { signAccessToken } from '../sync-server/src/domain/access-tokens';
import { createSmtpMailer } from '../sync-server/src/mail/mailer';
import { closePasswordPools, hashPassword } from '../sync-server/src/domain/passwords';

const PHASE_MS = 6_000;
const FLOOD_SIGN_INS = 80;
const ROUNDS = 3;
const BOOKS = 200;

/** Pulls one page after another until `until`; the latencies in ms. */
async function pullLoop(baseUrl: string, token: string, until: number): Promise<number[]> {
  const latencies: number[] = [];
  while (Date.now() < until) {
    const start = performance.now();
    const res = await fetch(`${baseUrl}/api/sync/pull?limit=1000`, { headers: { authorization: `Bearer ${token}` } });
    await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`pull answered ${res.status}`);
    latencies.push(performance.now() - start);
  }
  return latencies;
}

/** FLOOD_SIGN_INS wrong sign-ins spread evenly over PHASE_MS; counts the answers by status. */
async function flood(baseUrl: string): Promise<Map<number, number>> {
  const statuses = new Map<number, number>();
  const sends: Promise<void>[] = [];
  for (let i = 0; i < FLOOD_SIGN_INS; i++) {
    await new Promise((resolve) => setTimeout(resolve, PHASE_MS / FLOOD_SIGN_INS));
    sends.push(
      fetch(`${baseUrl}/api/auth/login`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: `flood-${randomUUID()}@example.com`, password: 'a guess that is wrong' }),
      }).then(async (res) => {
        await res.arrayBuffer();
        statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      }),
    );
  }
  await Promise.all(sends);
  return statuses;
}

const p = (values: number[], q: number) => quantile(values, q);

async function main(): Promise<void> {
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'bench',
    LAMPLIGHT_JWT_SECRET: process.env['LAMPLIGHT_JWT_SECRET'] ?? 'bench-secret-bench-secret-bench-secret-0',
    LAMPLIGHT_BCRYPT_COST: '10',
    // The flood must reach the password check: the per-address limit would stop it first.
    LAMPLIGHT_AUTH_RATE_LIMIT: '1000000',
    LAMPLIGHT_SYNC_RATE_LIMIT: '1000000',
  });
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);

  // The other reader, with a journal of BOOKS books to pull.
  const passwordHash = await hashPassword('bench reader password', 10, config);
  const [{ id: userId }] = await dataSource.query(`INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Bench Reader', $2) RETURNING id`, [
    `bench-${randomUUID()}@example.com`,
    passwordHash,
  ]);
  const clock = new HlcClock('bench-device');
  const changes: FieldChange[] = [];
  for (let n = 0; n < BOOKS; n++) {
    const rowId = randomUUID();
    changes.push(
      { id: randomUUID(), collection: 'books', rowId, field: 'title', value: `Bench volume ${n}`, hlc: clock.tick() },
      { id: randomUUID(), collection: 'books', rowId, field: 'authors', value: [`Author ${n % 17}`], hlc: clock.tick() },
      { id: randomUUID(), collection: 'books', rowId, field: 'format', value: 'print', hlc: clock.tick() },
    );
  }
  await new SyncStore(dataSource).push(userId, changes);
  const [session] = await dataSource.query(`INSERT INTO device_sessions (user_id, name) VALUES ($1, 'bench') RETURNING id`, [userId]);
  const token = await signAccessToken({ userId, sessionId: session.id, role: 'reader' }, config.jwtSecret);

  const mailer = createSmtpMailer('smtp://127.0.0.1:9', 'bench@example.com');
  const app = createApp({ config, dataSource, mailer });
  const server = await new Promise<Server>((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  await pullLoop(baseUrl, token, Date.now() + 1_000); // warm up

  const alone: number[] = [];
  const flooded: number[] = [];
  const signIns = new Map<number, number>();
  for (let round = 1; round <= ROUNDS; round++) {
    alone.push(...(await pullLoop(baseUrl, token, Date.now() + PHASE_MS)));
    const [latencies, statuses] = await Promise.all([pullLoop(baseUrl, token, Date.now() + PHASE_MS), flood(baseUrl)]);
    flooded.push(...latencies);
    for (const [status, count] of statuses) signIns.set(status, (signIns.get(status) ?? 0) + count);
  }
  server.close();
  mailer.close();
  await closePasswordPools();
  await dataSource.destroy();

  const ratio = p(flooded, 0.99) / p(alone, 0.99);
  console.log(
    `bench-auth-flood: ${ROUNDS} rounds of ${PHASE_MS / 1000} s alone, then ${PHASE_MS / 1000} s with ${FLOOD_SIGN_INS} wrong sign-ins (bcrypt cost 10, ${config.hashThreads} hashing thread(s), queue ${config.hashQueue})`,
  );
  console.log(`  pull of ${BOOKS * 3} field values alone:      ${alone.length} pulls, p50 ${p(alone, 0.5).toFixed(1)} ms, p99 ${p(alone, 0.99).toFixed(1)} ms`);
  console.log(`  pull during the sign-in flood: ${flooded.length} pulls, p50 ${p(flooded, 0.5).toFixed(1)} ms, p99 ${p(flooded, 0.99).toFixed(1)} ms`);
  console.log(
    `  sign-in answers: ${[...signIns.entries()]
      .sort(([a], [b]) => a - b)
      .map(([status, count]) => `${count} × ${status}`)
      .join(', ')}`,
  );
  console.log(`pull p99 during the flood / alone: ${ratio.toFixed(2)} (goal ≤ 2.00)`);
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
