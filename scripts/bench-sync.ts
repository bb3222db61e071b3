/**
 * `npm run bench:sync`: push merge throughput against a raw PostgreSQL upsert of the same rows,
 * and the time to pull everything to a fresh device, measured in one run on one database.
 *
 * Workload: 50,000 field changes (10,000 books × 5 fields) in batches of 500, first as new rows,
 * then as newer edits of every field (the update path). The baseline is a plain multi-row
 * `INSERT … ON CONFLICT DO UPDATE` of the same rows, with the same batching, into a table of the
 * same columns and foreign key, without clocks. Rounds alternate between the two so machine noise hits both.
 */
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';

import type { DataSource } from 'typeorm';

import type { FieldChange, PullResponse } from '../shared/api/sync';
import { HlcClock } from '../shared/sync/hlc';
import { mergeChanges, type FieldState } from '../shared/sync/merge-changes';
import { createApp } from '../sync-server/src/app';
import { loadConfig } from '../sync-server/src/config';
import { createDataSource } from '../sync-server/src/data-access/data-source';
import { migrate } from '../sync-server/src/data-access/migrate';
import { SyncStore } from '../sync-server/src/data-access/sync-store';
import { createSmtpMailer } from '../sync-server/src/mail/mailer';
import { signAccessToken } from '../sync-server/src/domain/access-tokens';

const ROWS = 10_000;
const FIELDS = ['title', 'authors', 'format', 'status', 'rating'] as const;
const BATCH = 500;
const ROUNDS = 5;

function changesFor(rowIds: readonly string[], clock: HlcClock, edition: number): FieldChange[][] {
  const all: FieldChange[] = [];
  for (const [n, rowId] of rowIds.entries()) {
    const hlc = clock.tick();
    const values: Record<(typeof FIELDS)[number], unknown> = {
      title: `Bench volume ${n} (edition ${edition})`,
      authors: [`Author ${n % 97}`, `Co-author ${n % 13}`],
      format: ['print', 'ebook', 'audiobook'][n % 3],
      status: ['tbr', 'reading', 'finished'][(n + edition) % 3],
      rating: ((n + edition) % 10) / 2 + 0.5,
    };
    for (const field of FIELDS) all.push({ id: randomUUID(), collection: 'books', rowId, field, value: values[field], hlc });
  }
  const batches: FieldChange[][] = [];
  for (let i = 0; i < all.length; i += BATCH) batches.push(all.slice(i, i + BATCH));
  return batches;
}

/**
 * The baseline: the same rows as a plain multi-row upsert, one statement per batch, into a copy
 * of the books table (same columns, key and indexes, and a sequence number from the same
 * sequence), so the ratio measures what merging costs, not the width of a book row.
 */
async function rawUpsert(dataSource: DataSource, userId: string, batches: FieldChange[][]): Promise<void> {
  for (const batch of batches) {
    const rows = new Map<string, Record<string, unknown>>();
    for (const change of batch) rows.set(change.rowId, { ...rows.get(change.rowId), [change.field]: change.value });
    const params: unknown[] = [];
    const tuples = [...rows.entries()].map(([id, row]) => {
      params.push(userId, id, row['title'], row['authors'], row['format'], row['status'], row['rating']);
      const base = params.length - 7;
      return `($${base + 1}, $${base + 2}, $${base + 3}, $${base + 4}, $${base + 5}, $${base + 6}, $${base + 7}, nextval('sync_seq'))`;
    });
    await dataSource.query(
      `INSERT INTO bench_raw_books (user_id, id, title, authors, format, status, rating, seq) VALUES ${tuples.join(', ')}
       ON CONFLICT (user_id, id) DO UPDATE SET title = excluded.title, authors = excluded.authors,
         format = excluded.format, status = excluded.status, rating = excluded.rating, seq = excluded.seq`,
      params,
    );
  }
}

async function timed(work: () => Promise<unknown>): Promise<number> {
  const start = process.hrtime.bigint();
  await work();
  return Number(process.hrtime.bigint() - start) / 1e6;
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

async function main(): Promise<void> {
  const config = loadConfig({ ...process.env, LAMPLIGHT_JWT_SECRET: process.env['LAMPLIGHT_JWT_SECRET'] ?? 'bench-secret-bench-secret-bench-secret-0' });
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  await dataSource.query(`CREATE TABLE IF NOT EXISTS bench_raw_books (LIKE books INCLUDING ALL,
      FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE)`);
  const store = new SyncStore(dataSource);

  const insertRatios: number[] = [];
  const updateRatios: number[] = [];
  const rows: { path: string; round: number; oursMs: number; rawMs: number }[] = [];
  let lastUser = '';
  for (let round = 1; round <= ROUNDS; round++) {
    const [{ id: userId }] = await dataSource.query(`INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Bench Reader', 'x') RETURNING id`, [
      `bench-${randomUUID()}@example.com`,
    ]);
    lastUser = userId;
    const rowIds = Array.from({ length: ROWS }, () => randomUUID());
    const clock = new HlcClock('bench-device');
    const first = changesFor(rowIds, clock, 1);
    const second = changesFor(rowIds, clock, 2);

    const rawInsert = await timed(() => rawUpsert(dataSource, userId, first));
    const oursInsert = await timed(async () => {
      for (const batch of first) await store.push(userId, batch);
    });
    const oursUpdate = await timed(async () => {
      for (const batch of second) await store.push(userId, batch);
    });
    const rawUpdate = await timed(() => rawUpsert(dataSource, userId, second));
    insertRatios.push(rawInsert / oursInsert);
    updateRatios.push(rawUpdate / oursUpdate);
    rows.push({ path: 'new rows', round, oursMs: oursInsert, rawMs: rawInsert }, { path: 'edits', round, oursMs: oursUpdate, rawMs: rawUpdate });
  }

  // Pull everything the last round's reader has to a fresh device, over HTTP like a browser.
  const mailer = createSmtpMailer('smtp://127.0.0.1:9', 'bench@example.com');
  const app = createApp({ config, dataSource, mailer });
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const [session] = await dataSource.query(`INSERT INTO device_sessions (user_id, name) VALUES ($1, 'bench') RETURNING id`, [lastUser]);
  const token = await signAccessToken({ userId: lastUser, sessionId: session.id, role: 'reader' }, config.jwtSecret);
  let state: FieldState = new Map();
  let pages = 0;
  const pullMs = await timed(async () => {
    let cursor = '';
    for (;;) {
      const res = await fetch(`${baseUrl}/api/sync/pull?limit=5000${cursor ? `&since=${cursor}` : ''}`, { headers: { authorization: `Bearer ${token}` } });
      const page = (await res.json()) as PullResponse;
      state = mergeChanges(state, page.changes);
      pages++;
      cursor = page.cursor;
      if (!page.hasMore) break;
    }
  });
  server.close();
  mailer.close();

  const changes = ROWS * FIELDS.length;
  console.log(`bench-sync: ${changes} field changes (${ROWS} rows × ${FIELDS.length} fields), batches of ${BATCH}, ${ROUNDS} rounds`);
  for (const row of rows) {
    console.log(
      `  round ${row.round} ${row.path.padEnd(9)} ours ${row.oursMs.toFixed(0).padStart(6)} ms (${((changes / row.oursMs) * 1000).toFixed(0)} changes/s)  raw upsert ${row.rawMs.toFixed(0).padStart(6)} ms  ratio ${(row.rawMs / row.oursMs).toFixed(2)}`,
    );
  }
  console.log(
    `push merge throughput / raw INSERT … ON CONFLICT DO UPDATE, median: new rows ${median(insertRatios).toFixed(2)}, edits ${median(updateRatios).toFixed(2)} (goal ≥ 0.50)`,
  );
  console.log(
    `pull to a fresh device over HTTP: ${state.size} field values in ${pages} pages, ${pullMs.toFixed(0)} ms (${((state.size / pullMs) * 1000).toFixed(0)} values/s)`,
  );
  await dataSource.destroy();
  if (state.size !== changes) {
    console.error(`expected ${changes} field values after the pull, got ${state.size}`);
    process.exit(1);
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
