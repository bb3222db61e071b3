/**
 * `npm run bench:sync`: push merge throughput against a raw PostgreSQL upsert of the same rows,
 * and the time to pull everything to a fresh device, measured in one run on one database.
 *
 * Workload: 50,000 field changes (10,000 books × 5 fields) in batches of the contract's 1,000,
 * first as new rows, then as newer edits of every field (the update path): merged in process
 * (`SyncStore.push`) and through the HTTP route (JSON, validation, authentication). The baseline
 * is a plain multi-row `INSERT … ON CONFLICT DO UPDATE` of the same rows, with the same batching,
 * into a table of the same columns and foreign key, without clocks. The order of the three
 * alternates round by round so machine noise hits all. Then the pull: everything to a fresh
 * device over HTTP at the app's page size, for three account sizes (1,000, 10,000 and 50,000
 * fields), against plain SQL paging of the same rows by (user_id, seq) with as many rows a page,
 * reading the values and their clocks, alternating (15 rounds), median ratios. Both HTTP paths use a plain
 * keep-alive client with native gzip (as a browser); the pulled pages are merged and checked after
 * the timing.
 */
import { fork } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { join } from 'node:path';
import { Agent, request } from 'node:http';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';

import type { DataSource } from 'typeorm';

import { MAX_PULL_LIMIT, MAX_PUSH_CHANGES, type FieldChange, type PullResponse } from '../shared/api/sync';
import { HlcClock } from '../shared/sync/hlc';
import { mergeChanges, type FieldState } from '../shared/sync/merge-changes';
import { loadConfig } from '../sync-server/src/config';
import { createDataSource } from '../sync-server/src/data-access/data-source';
import { migrate } from '../sync-server/src/data-access/migrate';
import { SyncStore } from '../sync-server/src/data-access/sync-store';
import { signAccessToken } from '../sync-server/src/domain/access-tokens';

const ROWS = 10_000;
const FIELDS = ['title', 'authors', 'format', 'status', 'rating'] as const;
const BATCH = MAX_PUSH_CHANGES;
const ROUNDS = 5;
/** Pulls are short and this machine is shared: more rounds keep their medians steadier. */
const PULL_ROUNDS = 15;

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

/**
 * A plain keep-alive HTTP client with native decompression, as a browser has: Node's `fetch`
 * decompresses through web streams in JavaScript, which cost more than the server's work here.
 */
const agent = new Agent({ keepAlive: true, maxSockets: 1 });
function httpRequest(url: string, method: 'GET' | 'POST', token: string, body?: string, encoding = 'gzip'): Promise<{ status: number; text: string }> {
  return new Promise((resolve, reject) => {
    const headers: Record<string, string> = { authorization: `Bearer ${token}`, 'accept-encoding': encoding };
    if (body !== undefined) Object.assign(headers, { 'content-type': 'application/json', 'content-length': String(Buffer.byteLength(body)) });
    const req = request(url, { method, headers, agent }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => {
        const raw = Buffer.concat(chunks);
        const encoding = res.headers['content-encoding'];
        const bytes = encoding === 'gzip' ? gunzipSync(raw) : encoding === 'br' ? brotliDecompressSync(raw) : raw;
        resolve({ status: res.statusCode ?? 0, text: bytes.toString('utf8') });
      });
      res.on('error', reject);
    });
    req.on('error', reject);
    req.end(body);
  });
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

/**
 * Plain SQL paging of the books table by (user_id, seq), `rows` a page: the floor of a pull. It
 * reads what a device needs of each row, the values and their clocks (a device cannot merge a
 * value without its clock), but builds no answer and sends nothing.
 */
async function plainPull(dataSource: DataSource, userId: string, rows: number): Promise<number> {
  let seq = '0';
  let fields = 0;
  for (;;) {
    const page: Record<string, unknown>[] = await dataSource.query(
      'SELECT id, title, authors, format, status, rating, clocks, seq FROM books WHERE user_id = $1 AND seq > $2 ORDER BY seq LIMIT $3',
      [userId, seq, rows],
    );
    fields += page.length * FIELDS.length;
    if (page.length < rows) return fields;
    seq = String(page.at(-1)!['seq']);
  }
}

async function main(): Promise<void> {
  const config = loadConfig({ ...process.env, LAMPLIGHT_JWT_SECRET: process.env['LAMPLIGHT_JWT_SECRET'] ?? 'bench-secret-bench-secret-bench-secret-0' });
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  await dataSource.query(`CREATE TABLE IF NOT EXISTS bench_raw_books (LIKE books INCLUDING ALL,
      FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE)`);
  const store = new SyncStore(dataSource);
  // The server runs in a process of its own, as deployed: the client's work shares no event loop with it.
  const env = { ...process.env, LAMPLIGHT_JWT_SECRET: Buffer.from(config.jwtSecret).toString('utf8') };
  const child = fork(join(__dirname, 'bench-support', 'serve-app.js'), { env, stdio: ['ignore', 'ignore', 'inherit', 'ipc'] });
  const port = await new Promise<number>((resolve, reject) => {
    child.once('message', (message) => resolve((message as { port: number }).port));
    child.once('exit', (code) => reject(new Error(`the server process ended (${code})`)));
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const newReader = async () => {
    const [{ id: userId }] = await dataSource.query(`INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Bench Reader', 'x') RETURNING id`, [
      `bench-${randomUUID()}@example.com`,
    ]);
    const [session] = await dataSource.query(`INSERT INTO device_sessions (user_id, name) VALUES ($1, 'bench') RETURNING id`, [userId]);
    const token = await signAccessToken({ userId, sessionId: session.id, role: 'reader' }, config.jwtSecret);
    return { userId: userId as string, token };
  };
  const httpPush = async (token: string, batches: FieldChange[][]) => {
    for (const batch of batches) {
      const res = await httpRequest(`${baseUrl}/api/sync/push`, 'POST', token, JSON.stringify({ deviceId: 'bench-device', changes: batch }));
      if (res.status !== 200) throw new Error(`push answered ${res.status}: ${res.text}`);
    }
  };

  type Path = 'raw' | 'ours' | 'http';
  const times: Record<'insert' | 'update', Record<Path, number[]>> = {
    insert: { raw: [], ours: [], http: [] },
    update: { raw: [], ours: [], http: [] },
  };
  let lastUser = '';
  let lastToken = '';
  for (let round = 0; round < ROUNDS; round++) {
    const readers = { raw: await newReader(), ours: await newReader(), http: await newReader() };
    const rowIds = Array.from({ length: ROWS }, () => randomUUID());
    const clock = new HlcClock('bench-device');
    const first = changesFor(rowIds, clock, 1);
    const second = changesFor(rowIds, clock, 2);
    const run: Record<Path, (batches: FieldChange[][]) => Promise<unknown>> = {
      raw: (batches) => rawUpsert(dataSource, readers.raw.userId, batches),
      ours: async (batches) => {
        for (const batch of batches) await store.push(readers.ours.userId, batch);
      },
      http: (batches) => httpPush(readers.http.token, batches),
    };
    const paths: Path[] = ['raw', 'ours', 'http'];
    const order = [...paths.slice(round % 3), ...paths.slice(0, round % 3)];
    for (const path of order) times.insert[path].push(await timed(() => run[path](first)));
    for (const path of order.reverse()) times.update[path].push(await timed(() => run[path](second)));
    lastUser = readers.http.userId;
    lastToken = readers.http.token;
  }

  // Pull everything a reader has to a fresh device, over HTTP like a browser, at the app's large
  // page size; the baseline pages the same rows with plain SQL, as many rows a page. Three sizes
  // (the last round's reader and two smaller ones), to see that the cost grows linearly.
  const small = async (rows: number) => {
    const reader = await newReader();
    for (const batch of changesFor(
      Array.from({ length: rows }, () => randomUUID()),
      new HlcClock('bench-device'),
      1,
    ))
      await store.push(reader.userId, batch);
    return reader;
  };
  const pullReaders = [await small(200), await small(2000), { userId: lastUser, token: lastToken }];
  await dataSource.query('ANALYZE');
  const pullOnce = async (token: string, encoding = 'gzip') => {
    let cursor = '';
    const pages: PullResponse[] = [];
    for (;;) {
      const res = await httpRequest(`${baseUrl}/api/sync/pull?limit=${MAX_PULL_LIMIT}${cursor ? `&since=${cursor}` : ''}`, 'GET', token, undefined, encoding);
      const page = JSON.parse(res.text) as PullResponse;
      pages.push(page);
      cursor = page.cursor;
      if (!page.hasMore) return pages;
    }
  };
  // Where the time goes: the store's pull in this process (SQL and the answer's JSON, no HTTP), and
  // HTTP without compression; the plain paging runs in this process too.
  const storePull = async (userId: string) => {
    for (let seq = 0; ;) {
      const page = await store.pull(userId, seq, MAX_PULL_LIMIT);
      if (!page.hasMore) return;
      seq = page.lastSeq;
    }
  };
  const pullLines: string[] = [];
  for (const reader of pullReaders) {
    const pullTimes: number[] = [];
    const plainTimes: number[] = [];
    const storeTimes: number[] = [];
    const identityTimes: number[] = [];
    let pages: PullResponse[] = [];
    for (let round = 0; round < PULL_ROUNDS; round++) {
      if (round % 2 === 0) pullTimes.push(await timed(async () => (pages = await pullOnce(reader.token))));
      plainTimes.push(await timed(() => plainPull(dataSource, reader.userId, MAX_PULL_LIMIT / FIELDS.length)));
      storeTimes.push(await timed(() => storePull(reader.userId)));
      identityTimes.push(await timed(() => pullOnce(reader.token, 'identity')));
      if (round % 2 === 1) pullTimes.push(await timed(async () => (pages = await pullOnce(reader.token))));
    }
    // Checked after the timing: the device's merge is the client's work, not the pull's.
    const state = pages.reduce<FieldState>((merged, page) => mergeChanges(merged, page.changes), new Map());
    const [{ rows }] = (await dataSource.query('SELECT count(*)::int AS rows FROM books WHERE user_id = $1', [reader.userId])) as [{ rows: number }];
    if (state.size !== rows * FIELDS.length) throw new Error(`expected ${rows * FIELDS.length} field values after the pull, got ${state.size}`);
    pullLines.push(
      `  ${String(state.size).padStart(6)} field values in ${String(pages.length).padStart(2)} pages: HTTP median ${median(pullTimes).toFixed(0).padStart(5)} ms; plain SQL paging ${median(plainTimes).toFixed(0).padStart(4)} ms; ratio ${(median(pullTimes) / median(plainTimes)).toFixed(2)} (goal ≤ 1.5)`,
      `         parts: store.pull in process (SQL + JSON) ${median(storeTimes).toFixed(0).padStart(4)} ms (${(median(storeTimes) / median(plainTimes)).toFixed(2)}×), HTTP uncompressed ${median(identityTimes).toFixed(0).padStart(4)} ms (${(median(identityTimes) / median(plainTimes)).toFixed(2)}×), gzip ${(median(pullTimes) / median(plainTimes)).toFixed(2)}×`,
    );
  }
  child.disconnect();

  const changes = ROWS * FIELDS.length;
  const rate = (ms: number) => `${((changes / ms) * 1000).toFixed(0)} changes/s`;
  console.log(`bench-sync: ${changes} field changes (${ROWS} rows × ${FIELDS.length} fields), batches of ${BATCH}, ${ROUNDS} rounds, order rotating`);
  for (const kind of ['insert', 'update'] as const) {
    const t = times[kind];
    console.log(
      `  ${kind === 'insert' ? 'new rows' : 'edits   '}  raw upsert ${median(t.raw).toFixed(0).padStart(6)} ms (${rate(median(t.raw))})  merge ${median(t.ours).toFixed(0).padStart(6)} ms (${rate(median(t.ours))})  HTTP ${median(t.http).toFixed(0).padStart(6)} ms (${rate(median(t.http))})`,
    );
    const ratios = (path: Path) => median(t.raw.map((raw, n) => raw / t[path][n]!)).toFixed(2);
    console.log(`            throughput / raw, median of rounds: merge ${ratios('ours')}, HTTP ${ratios('http')} (goal ≥ 0.80)`);
  }
  console.log(`pull to a fresh device over HTTP (${MAX_PULL_LIMIT} fields a page) against plain SQL paging by (user_id, seq), ${PULL_ROUNDS} alternating rounds:`);
  for (const line of pullLines) console.log(line);
  agent.destroy();
  await dataSource.destroy();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
