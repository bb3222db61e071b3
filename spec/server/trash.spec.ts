import { randomUUID } from 'node:crypto';

import { applyPulled, emptyRow, type LocalRow } from '../../shared/sync/local-row';
import type { FieldState } from '../../shared/sync/merge-changes';
import { initialTextState } from '../../shared/text/initial-text-state';
import { textDocName } from '../../shared/text/text-doc';
import { encodeTextBytes } from '../../shared/text/text-value';
import { deletedWith, deletionClock, editedAfterDelete } from '../../shared/trash/tombstone';
import { startJobRunner } from '../../sync-server/src/jobs/job-runner';
import { purgeTombstonesJob } from '../../sync-server/src/jobs/purge-tombstones.job';
import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDatabaseUrl, testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

const DAY_MS = 86_400_000;
const NOW = Date.now();

/** A row as a device would hold it after folding the pulled fields. */
function rowOf(state: FieldState, collection: string, id: string): LocalRow {
  const prefix = `${collection}/${id}/`;
  const changes = [...state.entries()].filter(([key]) => key.startsWith(prefix)).map(([key, { value, hlc }]) => ({ field: key.slice(prefix.length), value, hlc }));
  return applyPulled(emptyRow(id), changes);
}

describe('tombstones across devices and the purge job', () => {
  let server: RunningServer;

  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  async function twoDevices() {
    const signedIn = await registerReader(server.app);
    return { userId: signedIn.user.id, laptop: new SyncClient(server.baseUrl, signedIn.accessToken), phone: new SyncClient(server.baseUrl, signedIn.accessToken) };
  }

  /** A book with one session, both written at `wall` by the laptop. */
  async function bookWithSession(client: SyncClient, wall: number) {
    const bookId = randomUUID();
    const sessionId = randomUUID();
    const pushed = await client.push([
      fieldChange(bookId, 'title', 'The Lantern Keeper’s Almanac', { wall, node: 'laptop' }),
      fieldChange(bookId, 'tags', ['winter'], { wall, node: 'laptop' }),
      fieldChange(bookId, 'deleted', false, { wall, node: 'laptop' }),
      fieldChange(sessionId, 'bookId', bookId, { wall, node: 'laptop' }, 'sessions'),
      fieldChange(sessionId, 'activeMinutes', 25, { wall, node: 'laptop' }, 'sessions'),
      fieldChange(sessionId, 'deleted', false, { wall, node: 'laptop' }, 'sessions'),
    ]);
    expect(pushed.status).toBe(200);
    return { bookId, sessionId };
  }

  /** The laptop's delete of the book and its session, in one write: one clock for both. */
  const deleteBoth = (ids: { bookId: string; sessionId: string }, wall: number) => [
    fieldChange(ids.bookId, 'deleted', true, { wall, counter: 3, node: 'laptop' }),
    fieldChange(ids.sessionId, 'deleted', true, { wall, counter: 3, node: 'laptop' }, 'sessions'),
  ];

  describe('POST /api/sync/push', () => {
    it('When a device deletes a book offline and another edits it later, then both converge on a deleted book flagged as edited after the delete', async () => {
      const { laptop, phone } = await twoDevices();
      const ids = await bookWithSession(laptop, NOW - 60_000);
      // The phone, which never saw the delete, renames the book a minute after the laptop deleted it…
      expect((await phone.push([fieldChange(ids.bookId, 'title', 'The Lantern Keeper’s Almanac (2nd ed.)', { wall: NOW - 20_000, node: 'phone' })])).status).toBe(
        200,
      );
      // …and the laptop comes back online with its delete, stamped earlier.
      expect((await laptop.push(deleteBoth(ids, NOW - 30_000))).status).toBe(200);

      const onLaptop = (await laptop.pullAll()).state;
      const onPhone = (await phone.pullAll()).state;
      expect(onPhone).toEqual(onLaptop);
      const book = rowOf(onPhone, 'books', ids.bookId);
      const session = rowOf(onPhone, 'sessions', ids.sessionId);
      expect(book['deleted']).toBeTrue();
      expect(book['title']).toBe('The Lantern Keeper’s Almanac (2nd ed.)');
      expect(editedAfterDelete(book)).toBeTrue();
      expect(deletedWith(session, deletionClock(book)!))
        .withContext('restored together with the book')
        .toBeTrue();
    });

    it('When the delete is later than the other device’s edit, then the delete wins and nothing is flagged', async () => {
      const { laptop, phone } = await twoDevices();
      const ids = await bookWithSession(laptop, NOW - 60_000);
      expect((await laptop.push(deleteBoth(ids, NOW - 10_000))).status).toBe(200);
      expect((await phone.push([fieldChange(ids.bookId, 'title', 'An older rename', { wall: NOW - 20_000, node: 'phone' })])).status).toBe(200);

      const book = rowOf((await phone.pullAll()).state, 'books', ids.bookId);
      expect(book['deleted']).toBeTrue();
      expect(editedAfterDelete(book)).toBeFalse();
    });
  });

  describe('purge-tombstones job', () => {
    it('When a delete is over 30 days old, then the job empties the row but keeps its id, tombstone and clocks, and a late device cannot bring it back', async () => {
      const { userId, laptop, phone } = await twoDevices();
      const old = await bookWithSession(laptop, NOW - 40 * DAY_MS);
      await laptop.push(deleteBoth(old, NOW - 31 * DAY_MS));
      const recent = await bookWithSession(laptop, NOW - 40 * DAY_MS);
      await laptop.push(deleteBoth(recent, NOW - 29 * DAY_MS));
      const pageId = randomUUID();
      const body = initialTextState(textDocName('notebookPages', pageId, 'body'), 'Notes on the almanac.');
      await laptop.push([
        fieldChange(pageId, 'body', { yjs: encodeTextBytes(body) }, { wall: NOW - 40 * DAY_MS, node: 'laptop' }, 'notebookPages'),
        fieldChange(pageId, 'deleted', true, { wall: NOW - 35 * DAY_MS, node: 'laptop' }, 'notebookPages'),
      ]);
      const dataSource = await testDataSource();
      const stored = (id: string) => dataSource.query('SELECT title, tags, sets, deleted, clocks FROM books WHERE user_id = $1 AND id = $2', [userId, id]);
      const [before] = await stored(old.bookId);

      const runner = await startJobRunner(testDatabaseUrl(), dataSource, [purgeTombstonesJob]);
      try {
        await runner.send('purge-tombstones');
        for (const deadline = Date.now() + 30_000; Date.now() < deadline; await new Promise((resolve) => setTimeout(resolve, 250))) {
          if ((await stored(old.bookId))[0].title === null) break;
        }
      } finally {
        await runner.stop();
      }

      const [after] = await stored(old.bookId);
      const deletedAt: string = before.clocks.deleted;
      // Every field's clock stays, raised to the delete's where it was older.
      expect(after).toEqual({ title: null, tags: null, sets: {}, deleted: true, clocks: { title: deletedAt, tags: deletedAt, deleted: deletedAt } });
      const [session] = await dataSource.query('SELECT active_minutes, book_id FROM sessions WHERE user_id = $1 AND id = $2', [userId, old.sessionId]);
      expect(session).toEqual({ active_minutes: null, book_id: null });
      expect((await stored(recent.bookId))[0].title)
        .withContext('29 days: still in Trash')
        .toBe('The Lantern Keeper’s Almanac');
      const texts = await dataSource.query('SELECT count(*)::int AS n FROM text_states WHERE user_id = $1 AND row_id = $2', [userId, pageId]);
      expect(texts[0].n).toBe(0);

      // A device offline for six weeks sends edits made before the delete, an undelete among them: the delete and the purge stand.
      await phone.push([
        fieldChange(old.bookId, 'title', 'Resurrected?', { wall: NOW - 32 * DAY_MS, node: 'phone' }),
        fieldChange(old.bookId, 'deleted', false, { wall: NOW - 32 * DAY_MS, node: 'phone' }),
      ]);
      expect((await stored(old.bookId))[0]).toEqual(jasmine.objectContaining({ title: null, deleted: true }));
    }, 60_000);
  });
});
