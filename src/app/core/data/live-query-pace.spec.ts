import { TestBed } from '@angular/core/testing';
import type { Subscription } from 'rxjs';

import { openTestJournal, type TestJournal } from '../testing/test-journal';
import { LiveQueryPace, PACED_MS, pacedLiveQuery } from './live-query-pace';

/** Real IndexedDB and Dexie live queries; real time (the pace is a wall-clock window). */
describe('LiveQueryPace (live queries during a long pull)', () => {
  let journal: TestJournal;
  let pace: LiveQueryPace;
  let subscription: Subscription | undefined;
  /** Each answer of the query: how many books there were. */
  let answers: number[];
  let runs: number;

  const turn = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
  /** Waits until `check` holds, for at most two windows. */
  async function until(check: () => boolean, what: string): Promise<void> {
    for (const deadline = performance.now() + 2 * PACED_MS + 2000; performance.now() < deadline; await turn(10)) if (check()) return;
    throw new Error(`timed out waiting until ${what}`);
  }
  /** A page from another device, written as the sync's own transaction does (not a local write). */
  const pulledBook = (title: string) => journal.db.rows('books').put({ id: crypto.randomUUID(), title, _hlc: {} });
  function watchBooks(): void {
    subscription = pacedLiveQuery(pace, () => {
      runs++;
      return journal.db.rows('books').count();
    }).subscribe((count) => answers.push(count));
  }

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    pace = TestBed.inject(LiveQueryPace);
    answers = [];
    runs = 0;
  });
  afterEach(async () => {
    subscription?.unsubscribe();
    await journal.close();
  });

  it('re-runs after every change while not paced', async () => {
    watchBooks();
    await until(() => answers.length === 1, 'the first answer');
    await pulledBook('The Copper Heron');
    await until(() => answers.at(-1) === 1, 'the first book shows');
    await pulledBook('Salt Winter');
    await until(() => answers.at(-1) === 2, 'the second book shows');
    expect(answers).toEqual([0, 1, 2]);
  });

  it('while paced, re-runs once per stored page window (each longer than the last) rather than per transaction, and at once when the pull ends', async () => {
    watchBooks();
    await until(() => answers.length === 1, 'the first answer');
    pace.start();
    await pulledBook('Lantern Moth');
    await turn(100);
    expect(runs).withContext('a transaction alone re-runs nothing while paced').toBe(1);

    pace.pageStored();
    await until(() => answers.at(-1) === 1, 'the first page shows at once');
    await pulledBook('Orchard Glass');
    pace.pageStored(); // within the window: waits for its end
    await pulledBook('River Ledger');
    pace.pageStored();
    await turn(100);
    expect(answers.at(-1)).withContext('inside the window').toBe(1);
    await until(() => answers.at(-1) === 3, 'the window ends and what arrived shows');
    expect(runs).toBe(3);

    await pulledBook('Harrow Lane');
    pace.pageStored(); // the next window is a second longer
    await turn(PACED_MS + 200);
    expect(answers.at(-1)).withContext('inside the second, longer window').toBe(3);
    await until(() => answers.at(-1) === 4, 'the second window ends');

    await pulledBook('Fen Harbour');
    pace.stop();
    await until(() => answers.at(-1) === 5, 'the pull is over: live again');
    await pulledBook('Winter Salt');
    await until(() => answers.at(-1) === 6, 'a later change shows at once');
  });

  it('answers at once when a screen opens during a paced pull, and shows this tab’s own writes at once', async () => {
    pace.start();
    await pulledBook('Heron Copper');
    watchBooks();
    await until(() => answers.at(-1) === 1, 'the first answer');

    await journal.store.create('books', { title: 'Typed while syncing' });
    await until(() => answers.at(-1) === 2, 'the local write shows');
    expect(answers).toEqual([1, 2]);
  });
});
