import { randomUUID } from 'node:crypto';

import { DataSource } from 'typeorm';

import { formatHlc } from '../../shared/sync/hlc';
import { canonicalText, mergeField } from '../../shared/sync/merge';
import { mergeChanges } from '../../shared/sync/merge-changes';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { migrate } from '../../sync-server/src/data-access/migrate';
import { SyncStore } from '../../sync-server/src/data-access/sync-store';
import { registerReader } from '../support/accounts';
import { asObject, fieldChange, SyncClient } from '../support/sync-client';
import { testDatabaseUrl, testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

const NOW = Date.now();

describe('Sync at its edges', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  async function reader() {
    const { accessToken } = await registerReader(server.app);
    return new SyncClient(server.baseUrl, accessToken);
  }

  it('pages rows of 1, 2 and 3 fields with limits 1 to 5 without ever ending early or splitting a row', async () => {
    const client = await reader();
    const fields = ['title', 'status', 'rating'] as const;
    const values = { title: 'A title', status: 'reading', rating: 3 };
    const changes = Array.from({ length: 12 }, (_, n) => {
      const row = randomUUID();
      return fields.slice(0, (n % 3) + 1).map((field) => fieldChange(row, field, values[field], { wall: NOW + n }));
    });
    // One push per row, so rows get sequences in this mixed order of sizes.
    for (const rowChanges of changes) await client.push(rowChanges);
    const everything = asObject(mergeChanges(new Map(), changes.flat()));

    for (let limit = 1; limit <= 5; limit++) {
      let cursor: string | undefined;
      let state = new Map();
      for (let pages = 0; ; pages++) {
        const page = await client.pull(cursor, limit);
        const rows = new Set(page.changes.map((c) => c.rowId));
        // A page holds at most `limit` fields, unless one row alone has more (rows are never split).
        if (rows.size > 1) expect(page.changes.length).withContext(`limit ${limit}`).toBeLessThanOrEqual(limit);
        for (const row of rows) expect(page.changes.filter((c) => c.rowId === row).length).toBe(changes.flat().filter((c) => c.rowId === row).length);
        state = new Map(mergeChanges(state, page.changes));
        cursor = page.cursor;
        if (!page.hasMore) break;
        expect(page.changes.length).withContext('a page that says more is not empty').toBeGreaterThan(0);
        expect(pages).toBeLessThan(40);
      }
      expect(asObject(state)).withContext(`limit ${limit}: hasMore went false while rows remained`).toEqual(everything);
    }
  });

  // JavaScript compares clocks by UTF-16 units: 'Zed' < 'abe' ('Z' is 0x5A, 'a' 0x61). A
  // linguistic collation such as en-US sorts 'abe' first, so SQL that compared with the
  // database's collation would pick the other winner.
  const tiedOnNode = (row: string) => [
    fieldChange(row, 'title', 'from Zed', { wall: NOW, counter: 4, node: 'Zed' }),
    fieldChange(row, 'title', 'from abe', { wall: NOW, counter: 4, node: 'abe' }),
  ];

  it('compares clocks of mixed-case node ids byte for byte, as JavaScript does, in either order', async () => {
    const client = await reader();
    const [one, two] = [randomUUID(), randomUUID()];
    const [zedFirst, abeFirst] = [tiedOnNode(one), tiedOnNode(two).reverse()];
    for (const change of [...zedFirst, ...abeFirst]) await client.push([change]);

    const { state } = await client.pullAll();
    expect(mergeField({ value: 'from Zed', hlc: zedFirst[0]!.hlc }, { value: 'from abe', hlc: zedFirst[1]!.hlc }).value).toBe('from abe');
    expect(state.get(`books/${one}/title`)?.value).toBe('from abe');
    expect(state.get(`books/${two}/title`)?.value).toBe('from abe');
  });

  it('merges the same way in a database whose default collation is ICU en-US', async () => {
    const url = testDatabaseUrl().replace(/\/([^/?]+)(\?|$)/, '/$1_icu$2');
    const icu: DataSource = createDataSource(url);
    try {
      await icu.initialize();
    } catch {
      pending('No database with a non-C collation here (scripts/db.sh fresh-db makes one where PostgreSQL has ICU)');
      return;
    }
    try {
      await migrate(icu);
      const [{ linguistic }] = await icu.query(`SELECT 'abe' < 'Zed' AS linguistic`);
      expect(linguistic).withContext('the database really sorts linguistically').toBeTrue();
      const [{ id: userId }] = await icu.query(`INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Ines', 'x') RETURNING id`, [
        `${randomUUID()}@example.test`,
      ]);
      const store = new SyncStore(icu);
      const row = randomUUID();
      for (const change of tiedOnNode(row)) await store.push(userId, [change]);
      await store.push(userId, [fieldChange(row, 'tags', ['Beta', 'alpha'], { wall: NOW, node: 'Zed' })]);

      const page = await store.pull(userId, 0, 100);
      expect(page.changes.find((c) => c.field === 'title')?.value).toBe('from abe');
      // Elements with one first clock are listed by byte order on every side: 'Beta' before 'alpha'.
      expect(page.changes.find((c) => c.field === 'tags')?.value).toEqual(['Beta', 'alpha']);
    } finally {
      await icu.destroy();
    }
  });

  it('resolves two different values with the same clock the same way on the server and every device', async () => {
    const [first, second] = [await reader(), await reader()];
    const row = randomUUID();
    const hlc = formatHlc({ wall: NOW, counter: 0, node: 'reused-id' });
    const a = { ...fieldChange(row, 'title', 'Über', { wall: NOW }), hlc };
    const b = { ...fieldChange(row, 'title', 'Zebra', { wall: NOW }), hlc };
    const tagsA = { ...fieldChange(row, 'authors', ['Ann', 'Bo'], { wall: NOW }), hlc };
    const tagsB = { ...fieldChange(row, 'authors', ['Ann'], { wall: NOW }), hlc };

    for (const change of [a, tagsA, b, tagsB]) await first.push([change]);
    for (const change of [b, tagsB, a, tagsA]) await second.push([change]);
    const [one, two] = [(await first.pullAll()).state, (await second.pullAll()).state];

    // Byte order of the jsonb text: '"Über"' (0xC3…) is after '"Zebra"'; '["Ann"]' after '["Ann", "Bo"]' (']' > ',').
    expect(canonicalText(['Ann', 'Bo'])).toBe('["Ann", "Bo"]');
    for (const state of [one, two]) {
      expect(state.get(`books/${row}/title`)?.value).toBe('Über');
      expect(state.get(`books/${row}/authors`)?.value).toEqual(['Ann']);
    }
    expect(mergeField({ value: 'Zebra', hlc }, { value: 'Über', hlc }).value).toBe('Über');
    expect(mergeField({ value: 'Über', hlc }, { value: 'Zebra', hlc }).value).toBe('Über');
  });

  it('PostgreSQL prints jsonb as canonicalText does, for every kind of value a field holds', async () => {
    const db = await testDataSource();
    const samples: unknown[] = ['tab\there "q" \\ \u0001 é 😀', 4.5, 0.1, 12, true, null, ['a', 'b c'], { zz: 1, a: [1, 2], bb: { y: null } }];
    for (const value of samples) {
      const [{ text }] = await db.query("SELECT coalesce(($1::jsonb)::text, 'null') AS text", [JSON.stringify(value)]);
      expect(canonicalText(value)).withContext(JSON.stringify(value)).toBe(text);
    }
  });
});
