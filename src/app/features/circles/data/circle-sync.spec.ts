import { HttpHeaders } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';

import { NOT_A_MEMBER, NOT_A_MEMBER_TEXT, type CirclePullResponse } from '@shared/circles/circle-wire';
import { formatHlc, parseHlc } from '@shared/sync/hlc';

import { deviceId } from '../../../core/device/device-id';
import { sent } from '../../../core/sync/testing/sync-backend';
import { openTestJournal, type TestJournal } from '../../../core/testing/test-journal';
import { CircleSync } from './circle-sync';

const DAY = 24 * 60 * 60 * 1000;
const CIRCLE = '6f1d3c2a-8b4e-4f0a-9c1d-2e3f4a5b6c7d';
const POST = '0b9e8d7c-6a5f-4e3d-8c2b-1a0f9e8d7c6b';
const PUSH_URL = `/api/circles/${CIRCLE}/sync/push`;

const pulled = (): CirclePullResponse => ({ rows: [], cursor: 'c1', hasMore: false, members: [], role: 'member', serverTime: new Date().toISOString() });

describe('CircleSync', () => {
  let journal: TestJournal;
  let backend: HttpTestingController;

  beforeEach(async () => {
    journal = openTestJournal([provideHttpClientTesting()]);
    backend = TestBed.inject(HttpTestingController);
    await journal.db.open();
  });
  afterEach(() => journal.close());

  it('re-stamps circle changes refused as clock_ahead and sends them again, as it does the reader’s own; nothing is set aside', async () => {
    const { db } = journal;
    const now = Date.now();
    const ahead = (n: number) => formatHlc({ wall: now + 3 * DAY, counter: n, node: deviceId() });
    await db.table('circlePosts').put({ id: POST, circleId: CIRCLE, text: 'Chapter two!', _hlc: { circleId: ahead(0), text: ahead(1) } });
    await db.circleOutbox.bulkAdd([
      { id: 'c1', circleId: CIRCLE, collection: 'circlePosts', rowId: POST, field: 'circleId', value: CIRCLE, hlc: ahead(0) },
      { id: 'c2', circleId: CIRCLE, collection: 'circlePosts', rowId: POST, field: 'text', value: 'Chapter two!', hlc: ahead(1) },
    ]);

    const syncing = TestBed.inject(CircleSync).syncCircle(CIRCLE);
    const first = await sent(backend, PUSH_URL);
    // The server's answer for a clock more than 24 hours ahead (shared/circles/validate-circle-change.ts).
    const problems = [0, 1].map((index) => ({ index, id: `c${index + 1}`, code: 'clock_ahead', reason: 'hlc is more than 24 hours ahead of the server clock' }));
    first.flush(
      { error: { code: 'clock_ahead', message: '2 of 2 changes cannot be applied', details: problems } },
      { status: 400, statusText: 'Bad Request', headers: new HttpHeaders({ Date: new Date(now).toUTCString() }) },
    );

    const second = await sent(backend, PUSH_URL);
    const changes = (second.request.body as { changes: { id: string; hlc: string }[] }).changes;
    expect(changes.map((change) => change.id)).toEqual(['c1', 'c2']);
    for (const change of changes) expect(parseHlc(change.hlc)!.wall).toBeLessThan(now + DAY);
    expect(changes[1]!.hlc > changes[0]!.hlc).toBeTrue();
    second.flush({ applied: 2, duplicates: 0, serverTime: new Date().toISOString() });
    (await sent(backend, `/api/circles/${CIRCLE}/sync/pull`)).flush(pulled());
    await syncing;

    expect(await db.rejected.count()).toBe(0);
    expect(await db.circleOutbox.count()).toBe(0);
    const post = await db.table('circlePosts').get(POST);
    expect(post._hlc).toEqual({ circleId: changes[0]!.hlc, text: changes[1]!.hlc });
    expect((await db.meta.get('clock'))!.value).toBe(changes[1]!.hlc);
  });

  it('when the reader was removed from the circle, drops it from the device and refuses its queued posts with a reason', async () => {
    const { db } = journal;
    const hlc = formatHlc({ wall: Date.now(), counter: 0, node: deviceId() });
    await db.circleMeta.put({ circleId: CIRCLE, role: 'member', members: [] });
    await db.table('circlePosts').put({ id: POST, circleId: CIRCLE, text: 'Written on the train', _hlc: { text: hlc } });
    await db.circleOutbox.add({ id: 'c1', circleId: CIRCLE, collection: 'circlePosts', rowId: POST, field: 'text', value: 'Written on the train', hlc });
    const sync = TestBed.inject(CircleSync);

    const syncing = sync.syncCircle(CIRCLE);
    (await sent(backend, PUSH_URL)).flush(
      { error: { code: NOT_A_MEMBER, message: 'You are not a member of this circle' } },
      { status: 403, statusText: 'Forbidden' },
    );
    await syncing;

    expect(sync.problem()).toBe(`${NOT_A_MEMBER_TEXT}: 1 waiting change was refused (listed in the sync menu).`);
    expect(await db.rejected.toArray()).toEqual([jasmine.objectContaining({ rowId: POST, code: NOT_A_MEMBER, reason: NOT_A_MEMBER_TEXT })]);
    expect(await db.circleOutbox.count()).toBe(0);
    expect(await db.table('circlePosts').get(POST)).toBeUndefined();
    expect(await db.circleMeta.get(CIRCLE)).toBeUndefined();
  });
});
