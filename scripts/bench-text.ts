/**
 * `npm run bench:text`: a 50,000-character notebook page written in 5,000 edits, as a mergeable
 * Yjs text against the same page as a plain last-writer-wins text, in one run on one database.
 *
 * - server merge time: the edits pushed in 100 batches of 50 (a device syncing every few
 *   seconds of typing) through SyncStore.push; the baseline writes the whole text once per batch
 *   with a plain upsert into a copy of `notebook_pages` (what last-writer-wins costs: one value
 *   per field per push, the outbox keeping only the latest);
 * - bytes pulled and time to open on a fresh device: a pull over HTTP of the page (after the
 *   compaction job), then building the Yjs document and reading its text; the baseline pulls the
 *   same text as a plain value.
 * Ratios are ours / baseline (lower is better for all three).
 */
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';

import * as Y from 'yjs';

import type { FieldChange, PullResponse } from '../shared/api/sync';
import { HlcClock } from '../shared/sync/hlc';
import { loadTextDoc, textDocName, textOf } from '../shared/text/text-doc';
import { decodeTextBytes, encodeTextBytes } from '../shared/text/text-value';
import { createApp } from '../sync-server/src/app';
import { loadConfig } from '../sync-server/src/config';
import { createDataSource } from '../sync-server/src/data-access/data-source';
import { migrate } from '../sync-server/src/data-access/migrate';
import { SyncStore } from '../sync-server/src/data-access/sync-store';
import { TextStore, transactionalOf } from '../sync-server/src/data-access/text-store';
import { signAccessToken } from '../sync-server/src/domain/access-tokens';
import { createSmtpMailer } from '../sync-server/src/mail/mailer';

const EDITS = 5_000;
const TARGET_LENGTH = 50_000;
const BATCH = 50;
const WORDS = ['lantern', 'harbour', 'quiet', 'margin', 'chapter', 'tide', 'ink', 'window', 'orchard', 'evening'];

/** A seeded pseudo-random generator (mulberry32), so every run types the same page. */
function random(seed: number): () => number {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The page typed in EDITS edits (insertions of words, some deletions), and each edit's update. */
function typePage(name: string): { updates: Uint8Array[]; texts: string[] } {
  const next = random(20261204);
  const doc = new Y.Doc();
  const text = doc.getText(name);
  const updates: Uint8Array[] = [];
  const texts: string[] = [];
  doc.on('update', (update: Uint8Array) => updates.push(update));
  for (let n = 0; n < EDITS; n++) {
    const left = EDITS - n;
    const wanted = Math.ceil((TARGET_LENGTH - text.length) / left);
    if ((n % 10 === 9 && text.length > 20) || text.length >= TARGET_LENGTH) {
      text.delete(Math.floor(next() * (text.length - 8)), 1 + Math.floor(next() * 6));
    } else {
      let words = '';
      while (words.length < wanted + 4) words += `${WORDS[Math.floor(next() * WORDS.length)]} `;
      const insert = words.slice(0, Math.min(wanted + 4, TARGET_LENGTH - text.length));
      text.insert(Math.floor(next() * (text.length + 1)), insert);
    }
    texts.push(text.toString());
  }
  return { updates, texts };
}

const timed = async <T>(work: () => Promise<T>): Promise<[number, T]> => {
  const start = performance.now();
  const result = await work();
  return [performance.now() - start, result];
};

async function main(): Promise<void> {
  const config = loadConfig({ ...process.env, LAMPLIGHT_JWT_SECRET: process.env['LAMPLIGHT_JWT_SECRET'] ?? 'bench-secret-bench-secret-bench-secret-0' });
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  await dataSource.query(`CREATE TABLE IF NOT EXISTS bench_raw_pages (LIKE notebook_pages INCLUDING ALL,
      FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE)`);
  const newReader = async () =>
    (
      await dataSource.query(`INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Bench Reader', 'x') RETURNING id`, [
        `bench-${randomUUID()}@example.com`,
      ])
    )[0].id as string;
  const [ours, plain] = [await newReader(), await newReader()];
  const rowId = randomUUID();
  const name = textDocName('notebookPages', rowId, 'body');
  const { updates, texts } = typePage(name);
  const finalText = texts.at(-1)!;

  // Server merge: ours through the real push, the baseline as one whole-text upsert per batch.
  const store = new SyncStore(dataSource);
  const clock = new HlcClock('bench-device');
  const changes: FieldChange[] = updates.map((update) => ({
    id: randomUUID(),
    collection: 'notebookPages',
    rowId,
    field: 'body',
    value: { yjs: encodeTextBytes(update) },
    hlc: clock.tick(),
  }));
  let pushedBytes = 0;
  const [mergeMs] = await timed(async () => {
    for (let i = 0; i < changes.length; i += BATCH) {
      const batch = changes.slice(i, i + BATCH);
      pushedBytes += Buffer.byteLength(JSON.stringify(batch));
      await store.push(ours, batch);
    }
  });
  let plainPushedBytes = 0;
  const [plainMs] = await timed(async () => {
    for (let i = 0; i < changes.length; i += BATCH) {
      const last = Math.min(i + BATCH, changes.length) - 1;
      const change = { ...changes[last]!, value: texts[last]! };
      plainPushedBytes += Buffer.byteLength(JSON.stringify([change]));
      await dataSource.query(
        `INSERT INTO bench_raw_pages (user_id, id, body, clocks, seq) VALUES ($1, $2, $3, jsonb_build_object('body', $4::text), nextval('sync_seq'))
         ON CONFLICT (user_id, id) DO UPDATE SET body = excluded.body, clocks = excluded.clocks, seq = excluded.seq`,
        [plain, rowId, change.value, change.hlc],
      );
    }
  });
  // The baseline reader's page, as a pull would read it: a plain text column, no Yjs state.
  await dataSource.query(
    `INSERT INTO notebook_pages (user_id, id, body, clocks, seq) SELECT user_id, id, body, clocks, seq FROM bench_raw_pages WHERE user_id = $1`,
    [plain],
  );

  const [{ bytes: mergedBytes }] = await dataSource.query('SELECT length(state) AS bytes FROM text_states WHERE user_id = $1', [ours]);
  await dataSource.query(`UPDATE text_states SET updated_at = now() - interval '1 minute' WHERE user_id = $1`, [ours]);
  const [compactMs] = await timed(() => TextStore.compactOne(transactionalOf(dataSource), 30));
  const [{ bytes: compactBytes }] = await dataSource.query('SELECT length(state) AS bytes FROM text_states WHERE user_id = $1', [ours]);

  // A fresh device opens the page: pull over HTTP, then the text it shows.
  const mailer = createSmtpMailer('smtp://127.0.0.1:9', 'bench@example.com');
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const listening = createApp({ config, dataSource, mailer }).listen(0, '127.0.0.1', () => resolve(listening));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  async function open(userId: string, yjs: boolean): Promise<{ ms: number; bytes: number }> {
    const [session] = await dataSource.query(`INSERT INTO device_sessions (user_id, name) VALUES ($1, 'bench') RETURNING id`, [userId]);
    const token = await signAccessToken({ userId, sessionId: session.id, role: 'reader' }, config.jwtSecret);
    const samples: { ms: number; bytes: number }[] = [];
    for (let round = 0; round < 7; round++) {
      let bytes = 0;
      const [ms, shown] = await timed(async () => {
        const res = await fetch(`${baseUrl}/api/sync/pull`, { headers: { authorization: `Bearer ${token}` } });
        const body = await res.text();
        bytes = Buffer.byteLength(body);
        const body0 = (JSON.parse(body) as PullResponse).changes.find((change) => change.field === 'body')!;
        return yjs ? textOf(loadTextDoc([decodeTextBytes(body0.state as string)!]), name) : (body0.value as string);
      });
      if (shown !== finalText) throw new Error(`the ${yjs ? 'Yjs' : 'plain'} page does not show the typed text`);
      samples.push({ ms, bytes });
    }
    return samples.sort((a, b) => a.ms - b.ms)[3]!;
  }
  const plainOpen = await open(plain, false);
  const oursOpen = await open(ours, true);
  server.close();
  mailer.close();
  await dataSource.destroy();

  const kib = (bytes: number) => `${(bytes / 1024).toFixed(1)} KiB`;
  console.log(
    `bench-text: one page of ${finalText.length.toLocaleString('en')} characters typed in ${EDITS.toLocaleString('en')} edits, pushed in batches of ${BATCH}`,
  );
  console.log(
    `  server merge      Yjs ${mergeMs.toFixed(0).padStart(6)} ms  plain LWW ${plainMs.toFixed(0).padStart(6)} ms  ratio ${(mergeMs / plainMs).toFixed(2)}`,
  );
  console.log(
    `  bytes pushed      Yjs ${kib(pushedBytes).padStart(10)}  plain LWW ${kib(plainPushedBytes).padStart(10)}  ratio ${(pushedBytes / plainPushedBytes).toFixed(2)}`,
  );
  console.log(`  stored state      merged ${kib(Number(mergedBytes))}, compacted by the job in ${compactMs.toFixed(0)} ms to ${kib(Number(compactBytes))}`);
  console.log(
    `  bytes pulled      Yjs ${kib(oursOpen.bytes).padStart(10)}  plain LWW ${kib(plainOpen.bytes).padStart(10)}  ratio ${(oursOpen.bytes / plainOpen.bytes).toFixed(2)}`,
  );
  console.log(
    `  open, fresh device (pull + show, median of 7)  Yjs ${oursOpen.ms.toFixed(1)} ms  plain LWW ${plainOpen.ms.toFixed(1)} ms  ratio ${(oursOpen.ms / plainOpen.ms).toFixed(2)}`,
  );
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
