import { randomUUID } from 'node:crypto';

import { MAX_PULL_BYTES } from '../../shared/api/sync';
import { COLLECTIONS } from '../../shared/sync/schema/collections';
import { textMaxLength, type FieldSpec } from '../../shared/sync/schema/field';
import { pullPageSql } from '../../sync-server/src/data-access/merge-sql';
import { compressApi } from '../../sync-server/src/entry-points/compress-api';
import { registerReader } from '../support/accounts';
import { MemoryDevice } from '../support/memory-device';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

const NOW = Date.now();

/** Every text field with a maximum length, and that maximum. */
const TEXT_FIELDS = Object.values(COLLECTIONS).flatMap((spec) =>
  Object.entries(spec.fields as Record<string, FieldSpec>).flatMap(([field, fieldSpec]) => {
    const max = textMaxLength(fieldSpec);
    return max === null ? [] : [{ collection: spec.name, field, max }];
  }),
);

describe('Sync sizes and limits', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  async function reader() {
    const signedIn = await registerReader(server.app);
    return { ...signedIn, client: new SyncClient(server.baseUrl, signedIn.accessToken) };
  }

  it('accepts a push of 1,000 ordinary changes (about 190 KB, over the 64 KB parser of the rest of /api)', async () => {
    const { client } = await reader();
    const changes = Array.from({ length: 1000 }, (_, n) =>
      fieldChange(randomUUID(), n % 2 ? 'title' : 'publisher', `The ordinary title of book number ${n}`, { wall: NOW, counter: n }),
    );
    expect(JSON.stringify({ deviceId: 'x', changes }).length).toBeGreaterThan(180_000);

    const res = await client.push(changes);

    expect(res.status).toBe(200);
    expect(res.body.applied).toBe(1000);
  });

  it('syncs every text field at its maximum length in the costliest characters to send', async () => {
    const { client } = await reader();
    expect(TEXT_FIELDS.some((f) => f.max === 50_000)).toBeTrue();
    for (const { collection, field, max } of TEXT_FIELDS) {
      // U+0001 is escaped as six bytes in JSON (RFC 8259 §7): the largest body a value can make.
      const value = '\u0001'.repeat(max);
      const res = await client.push([fieldChange(randomUUID(), field, value, { wall: NOW }, collection)]);
      expect(res.status).withContext(`${collection}.${field} at ${max}`).toBe(200);
    }
  });

  it('caps a pull page at about 2 MiB of JSON (at least one row), and pages through the rest', async () => {
    const { client } = await reader();
    const rows = Array.from({ length: 10 }, () => randomUUID());
    for (const [n, row] of rows.entries()) {
      await client.push([fieldChange(row, 'body', '\u0001'.repeat(50_000), { wall: NOW + n }, 'notebookPages')]);
    }
    let cursor: string | undefined;
    const seen = new Set<string>();
    let pages = 0;
    for (;;) {
      const res = await fetch(`${server.baseUrl}/api/sync/pull?limit=5000${cursor ? `&since=${cursor}` : ''}`, {
        headers: { authorization: `Bearer ${(client as unknown as { accessToken: string }).accessToken}` },
      });
      const text = await res.text();
      const page = JSON.parse(text) as { changes: { rowId: string }[]; cursor: string; hasMore: boolean };
      expect(text.length).toBeLessThan(MAX_PULL_BYTES + 16_384);
      expect(page.changes.length).toBeGreaterThan(0);
      for (const change of page.changes) seen.add(change.rowId);
      pages++;
      cursor = page.cursor;
      if (!page.hasMore) break;
    }
    expect(pages).toBeGreaterThanOrEqual(2); // 10 × 300 KB does not fit one page
    expect(seen.size).toBe(10);
  });

  it('sends a pull page as UTF-8 whose Content-Length counts its bytes, ASCII-only or not', async () => {
    const { client, accessToken } = await reader();
    const { request } = await import('node:http');
    const pullBytes = (since?: string) =>
      new Promise<{ length: number; body: Buffer }>((resolve, reject) =>
        request(
          `${server.baseUrl}/api/sync/pull${since ? `?since=${since}` : ''}`,
          { headers: { authorization: `Bearer ${accessToken}`, 'accept-encoding': 'identity' } },
          (res) => {
            const chunks: Buffer[] = [];
            res.on('data', (chunk: Buffer) => chunks.push(chunk));
            res.on('end', () => resolve({ length: Number(res.headers['content-length']), body: Buffer.concat(chunks) }));
          },
        )
          .on('error', reject)
          .end(),
      );
    // The second push adds titles outside ASCII: two, three and four bytes a character in UTF-8.
    const titles = [
      ['Plain title', 'Another plain one'],
      ['Über die Lampe', '灯下读书', 'Shelf 📚 of nights'],
    ];
    let cursor: string | undefined;
    for (const batch of titles) {
      await client.push(batch.map((title, n) => fieldChange(randomUUID(), 'title', title, { wall: NOW + n })));
      const { length, body } = await pullBytes(cursor);
      // WHATWG Encoding's fatal decoder refuses any byte sequence that is not UTF-8 (RFC 8259 §8.1 asks for UTF-8).
      const text = new TextDecoder('utf-8', { fatal: true }).decode(body);
      expect(length).withContext('Content-Length').toBe(body.length);
      expect(new TextEncoder().encode(text).length).toBe(body.length);
      const page = JSON.parse(text) as { changes: { value: unknown }[]; cursor: string };
      expect(page.changes.map((change) => change.value).sort()).toEqual([...batch].sort());
      cursor = page.cursor;
    }
  });

  it('answers 429 with Retry-After to a reader running too many pulls at once, and never a 5xx', async () => {
    const { client, accessToken } = await reader();
    for (let n = 0; n < 6; n++) await client.push([fieldChange(randomUUID(), 'body', '\u0001'.repeat(50_000), { wall: NOW + n }, 'notebookPages')]);

    const answers = await Promise.all(
      Array.from({ length: 6 }, () => fetch(`${server.baseUrl}/api/sync/pull?limit=5000`, { headers: { authorization: `Bearer ${accessToken}` } })),
    );

    const statuses = answers.map((res) => res.status);
    expect(statuses.every((status) => status === 200 || status === 429))
      .withContext(String(statuses))
      .toBeTrue();
    expect(statuses.filter((status) => status === 429).length)
      .withContext(String(statuses))
      .toBeGreaterThan(0);
    expect(answers.find((res) => res.status === 429)?.headers.get('retry-after')).toBe('1');
    await Promise.all(answers.map((res) => res.arrayBuffer()));
  });

  it('seals the pull cursor: it shows no sequence number, differs each time, and opens only for its reader', async () => {
    const one = await reader();
    const two = await reader();
    await one.client.push([fieldChange(randomUUID(), 'title', 'Cursor book', { wall: NOW })]);
    const [first, again] = [await one.client.pull(), await one.client.pull()];
    const [{ seq }] = await (await testDataSource()).query('SELECT max(seq)::text AS seq FROM books');

    expect(first.cursor).not.toBe(again.cursor);
    expect(Buffer.from(first.cursor, 'base64url').toString('latin1')).not.toContain(seq);
    expect((await one.client.pull(first.cursor)).changes).toEqual([]);
    await expectAsync(two.client.pull(first.cursor)).toBeRejectedWithError(/400/);
    const tampered = first.cursor.slice(0, -2) + (first.cursor.endsWith('AA') ? 'BA' : 'AA');
    await expectAsync(one.client.pull(tampered)).toBeRejectedWithError(/400/);
  });

  it("sets aside only the change with a NUL character or a lone surrogate; the rest of the device's edits sync", async () => {
    const { accessToken } = await reader();
    const device = new MemoryDevice(server.baseUrl, accessToken, 'nul-device');
    const row = randomUUID();
    device.write('books', row, { title: 'Clean title', subtitle: 'Bad\u0000subtitle', publisher: 'Broken \ud800 press', status: 'reading' });

    const report = await device.sync();

    expect(report.refused).toBe(2);
    expect(device.setAsideChanges.map(({ problem }) => problem.reason).sort()).toEqual([
      'books.publisher must not contain a broken character (an unpaired surrogate)',
      'books.subtitle must not contain the NUL character',
    ]);
    const fresh = new MemoryDevice(server.baseUrl, accessToken, 'other');
    await fresh.sync();
    expect(fresh.rows.get(`books/${row}`)?.['title']).toBe('Clean title');
    expect(fresh.rows.get(`books/${row}`)?.['status']).toBe('reading');
  });

  // issue 17: a pull pages each table's (user_id, seq) index, reading about a page of rows and
  // sorting none of the account. PostgreSQL's own EXPLAIN (ANALYZE, BUFFERS) is the witness.
  it('pulls from a 50,000-field account by an index scan per table, reading no more than a page of rows', async () => {
    const db = await testDataSource();
    const { user, client } = await reader();
    await db.query(
      `INSERT INTO books (user_id, id, title, status, format, rating, deleted, clocks, seq)
       SELECT $1, gen_random_uuid(), 'Book ' || g, 'tbr', 'print', 3, false,
              jsonb_build_object('title', $2::text, 'status', $2::text, 'format', $2::text, 'rating', $2::text, 'deleted', $2::text),
              nextval('sync_seq')
         FROM generate_series(1, 10000) g`,
      [user.id, `${String(NOW).padStart(15, '0')}:00000:bulk`],
    );
    await db.query('ANALYZE books');
    const rows = 251;

    const [{ 'QUERY PLAN': plan }] = await db.query(`EXPLAIN (ANALYZE, BUFFERS, FORMAT JSON) ${pullPageSql(COLLECTIONS.books)}`, [
      user.id,
      0,
      rows,
      Number.MAX_SAFE_INTEGER,
    ]);
    const nodes: { 'Node Type': string; 'Index Name'?: string; 'Relation Name'?: string; 'Actual Rows': number; 'Actual Loops': number }[] = [];
    const walk = (node: Record<string, unknown>) => {
      nodes.push(node as never);
      for (const child of (node['Plans'] as Record<string, unknown>[] | undefined) ?? []) walk(child);
    };
    walk(plan[0].Plan);

    const scan = nodes.find((node) => node['Relation Name'] === 'books')!;
    expect(scan['Node Type']).toBe('Index Scan');
    expect(scan['Index Name']).toBe('books_user_seq_idx');
    expect(scan['Actual Rows']).toBe(rows);
    expect(nodes.some((node) => node['Node Type'] === 'Sort' || node['Node Type'] === 'Seq Scan')).toBeFalse();
    // Five clocks a book: a page of 1,000 fields holds 200 whole books, and says more remain.
    const page = await client.pull(undefined, 1000);
    expect(page.changes.length).toBe(1000);
    expect(new Set(page.changes.map((change) => change.rowId)).size).toBe(200);
    expect(page.hasMore).toBeTrue();
    expect(page.remaining).toBe(9800);
  });

  it('gzips API answers for clients that accept it, and leaves an event stream uncompressed', async () => {
    const { client, accessToken } = await reader();
    for (let n = 0; n < 20; n++) await client.push([fieldChange(randomUUID(), 'title', `A fairly ordinary title ${n}`, { wall: NOW })]);
    const { createServer, request } = await import('node:http');
    const res = await fetch(`${server.baseUrl}/api/sync/pull`, { headers: { authorization: `Bearer ${accessToken}`, 'accept-encoding': 'gzip' } });
    expect(res.headers.get('content-encoding')).toBe('gzip');
    expect((await res.json()).changes.length).toBe(20);

    // A stand-in stream route behind the same middleware (the live-updates route is another change).
    const express = (await import('express')).default;
    const app = express();
    app.use(compressApi());
    app.get('/events', (_req, res) => {
      res.setHeader('Content-Type', 'text/event-stream');
      res.end('data: '.padEnd(4000, 'x') + '\n\n');
    });
    const http = createServer(app).listen(0, '127.0.0.1');
    await new Promise((resolve) => http.once('listening', resolve));
    const port = (http.address() as { port: number }).port;
    const encoding = await new Promise<string | undefined>((resolve) =>
      request({ port, host: '127.0.0.1', path: '/events', headers: { 'accept-encoding': 'gzip' } }, (answer) => {
        answer.resume();
        resolve(answer.headers['content-encoding']);
      }).end(),
    );
    http.close();
    expect(encoding).toBeUndefined();
  });
});
