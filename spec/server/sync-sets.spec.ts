import { randomUUID } from 'node:crypto';

import fc from 'fast-check';

import { formatHlc } from '../../shared/sync/hlc';
import { joinOrSet, orSetDelta, orSetElements, type OrSetState } from '../../shared/sync/or-set';
import { listToStateSql } from '../../sync-server/src/data-access/migrations/1765411200000-set-fields';
import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

const NOW = Date.now();
const clock = (wall: number, node: string) => formatHlc({ wall, counter: 0, node });

/** Random states over a few elements (some awkward for JSON and SQL), devices and clocks. */
const stateArb: fc.Arbitrary<OrSetState> = fc
  .dictionary(
    fc.constantFrom('fantasy', 'Signed', 'signed', '__proto__', 'constructor', 'ünï', '😀', 'a"b'),
    fc.record({
      a: fc.dictionary(fc.constantFrom('a', 'B', 'c-1'), fc.integer({ min: 1, max: 9 })),
      r: fc.dictionary(fc.constantFrom('a', 'B', 'c-1'), fc.integer({ min: 1, max: 9 })),
    }),
  )
  .map(
    (raw) =>
      JSON.parse(
        JSON.stringify(
          Object.fromEntries(
            Object.entries(raw).map(([element, { a, r }]) => [
              element,
              {
                a: Object.fromEntries(Object.entries(a).map(([node, wall]) => [node, clock(wall, node)])),
                r: Object.fromEntries(Object.entries(r).map(([node, wall]) => [node, clock(wall, node)])),
              },
            ]),
          ),
        ),
      ) as OrSetState,
  );

describe('Set fields merge per element (observed-remove sets)', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  async function twoDevices() {
    const { accessToken } = await registerReader(server.app);
    return [new SyncClient(server.baseUrl, accessToken), new SyncClient(server.baseUrl, accessToken)] as const;
  }

  it('the SQL join and elements agree with the shared TypeScript on random states', async () => {
    const db = await testDataSource();
    await fc.assert(
      fc.asyncProperty(stateArb, stateArb, async (x, y) => {
        const [row] = await db.query(
          'SELECT lamplight_orset_join($1::jsonb, $2::jsonb) AS joined, lamplight_orset_elements(lamplight_orset_join($1::jsonb, $2::jsonb)) AS elements',
          [JSON.stringify(x), JSON.stringify(y)],
        );
        expect(row.joined).toEqual(JSON.parse(JSON.stringify(joinOrSet(x, y))));
        expect(row.elements).toEqual(orSetElements(joinOrSet(x, y)));
      }),
      { numRuns: 60 },
    );
  });

  it('When two devices add different tags offline, then both tags remain (and an older app sees the list)', async () => {
    const [tablet, laptop] = await twoDevices();
    const row = randomUUID();
    const base = orSetDelta({}, ['signed'], clock(NOW, 'tablet'));
    await tablet.push([fieldChange(row, 'tags', base, { wall: NOW, node: 'tablet' })]);

    await tablet.push([fieldChange(row, 'tags', orSetDelta(base, ['signed', 'reread'], clock(NOW + 5, 'tablet')), { wall: NOW + 5, node: 'tablet' })]);
    await laptop.push([fieldChange(row, 'tags', orSetDelta(base, ['signed', 'book club'], clock(NOW + 9, 'laptop')), { wall: NOW + 9, node: 'laptop' })]);
    const pulled = (await laptop.pull()).changes.find((c) => c.field === 'tags')!;

    expect(pulled.value).toEqual(['signed', 'reread', 'book club']);
    expect(orSetElements(pulled.state as OrSetState)).toEqual(['signed', 'reread', 'book club']);
    expect(pulled.hlc).toBe(clock(NOW + 9, 'laptop'));
  });

  it('When a remove meets a concurrent add of the same tag, then the add survives; what the remove saw is gone', async () => {
    const [tablet, laptop] = await twoDevices();
    const row = randomUUID();
    const base = orSetDelta({}, ['signed', 'reread'], clock(NOW, 'tablet'));
    await tablet.push([fieldChange(row, 'tags', base, { wall: NOW, node: 'tablet' })]);

    await tablet.push([fieldChange(row, 'tags', orSetDelta(base, [], clock(NOW + 5, 'tablet')), { wall: NOW + 5, node: 'tablet' })]);
    await laptop.push([fieldChange(row, 'tags', orSetDelta({}, ['signed'], clock(NOW + 3, 'laptop')), { wall: NOW + 3, node: 'laptop' })]);

    expect((await laptop.pull()).changes.find((c) => c.field === 'tags')!.value).toEqual(['signed']);
  });

  it('When an older app pushes a whole list, then it means "set to exactly this" as of its clock', async () => {
    const [newer, older] = await twoDevices();
    const row = randomUUID();
    await newer.push([fieldChange(row, 'labelIds', orSetDelta({}, ['a1', 'b2'], clock(NOW, 'new')), { wall: NOW, node: 'new' })]);
    await newer.push([fieldChange(row, 'labelIds', orSetDelta({}, ['late'], clock(NOW + 20, 'new')), { wall: NOW + 20, node: 'new' })]);

    const res = await older.push([fieldChange(row, 'labelIds', ['b2', 'c3'], { wall: NOW + 10, node: 'old' })]);
    const again = await older.push([fieldChange(row, 'labelIds', ['b2', 'c3'], { wall: NOW + 10, node: 'old' })]);

    expect(res.status).toBe(200);
    expect(again.body.applied).toBe(0);
    // a1 removed (older than the list), c3 added, 'late' kept: the older app could not have seen it.
    expect((await older.pull()).changes.find((c) => c.field === 'labelIds')!.value).toEqual(['b2', 'c3', 'late']);
  });

  it('A list stored before the migration becomes a state added at its clock, and merges from there', async () => {
    const [device] = await twoDevices();
    const row = randomUUID();
    await device.push([fieldChange(row, 'title', 'Legacy', { wall: NOW, node: 'old' })]);
    const db = await testDataSource();
    const legacyClock = clock(NOW, 'old');
    await db.query(`UPDATE books SET genres = ARRAY['Essays', 'Nature writing'], clocks = clocks || jsonb_build_object('genres', $2::text) WHERE id = $1`, [
      row,
      legacyClock,
    ]);
    await db.query(listToStateSql('books', 'genres', 'genres'));

    await device.push([fieldChange(row, 'genres', orSetDelta({}, ['Poetry'], clock(NOW + 1, 'new')), { wall: NOW + 1, node: 'new' })]);
    const genres = (await device.pull()).changes.find((c) => c.field === 'genres')!;

    expect(genres.value).toEqual(['Essays', 'Nature writing', 'Poetry']);
    expect((genres.state as OrSetState)['Essays']).toEqual({ a: { old: legacyClock }, r: {} });
  });

  it('When a set change carries a clock later than its own, or a malformed entry, then it is a 400', async () => {
    const [device] = await twoDevices();
    const row = randomUUID();
    const late = await device.push([fieldChange(row, 'tags', { x: { a: { d: clock(NOW + 99, 'd') }, r: {} } }, { wall: NOW, node: 'd' })]);
    const malformed = await device.push([fieldChange(row, 'tags', { x: { a: 'yes' } }, { wall: NOW, node: 'd' })]);

    expect(late.status).toBe(400);
    expect(malformed.status).toBe(400);
    expect(JSON.stringify(malformed.body.error?.details)).toContain('books.tags');
  });
});
