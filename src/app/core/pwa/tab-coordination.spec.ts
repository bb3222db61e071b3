import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import Dexie from 'dexie';

import { forgetSession, READER, rememberSession } from '../auth/testing/session-fixtures';
import { JOURNAL_DB_VERSION, journalDbName } from '../data/journal-db';
import { LocalJournal } from '../data/local-journal';
import { PAGE_RELOAD } from './page-reload';
import { TabCoordination } from './tab-coordination';
import { snackBarText } from './testing/pwa-fixtures';

/**
 * "Another tab" still running an older Lamplight: a plain IndexedDB connection at the previous
 * schema version that does not close when asked (no `versionchange` handler), so an upgrade waits.
 * Dexie keeps IndexedDB versions at ten times its own.
 */
function olderTabHolding(name: string): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const request = indexedDB.open(name, (JOURNAL_DB_VERSION - 1) * 10);
    request.onupgradeneeded = () => request.result.createObjectStore('meta', { keyPath: 'key' });
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error);
  });
}

async function until(check: () => boolean, what: string): Promise<void> {
  for (let i = 0; i < 200; i++) {
    TestBed.tick();
    if (check()) return;
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
  throw new Error(`gave up waiting for ${what}`);
}


describe('TabCoordination when an older tab holds the database', () => {
  let userId: string;
  let olderTab: IDBDatabase | undefined;

  beforeEach(() => {
    userId = `blocked-${crypto.randomUUID()}`;
    rememberSession({ user: { ...READER, id: userId } });
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), { provide: PAGE_RELOAD, useValue: () => fail('a blocked upgrade must not reload this tab') }],
    });
  });

  afterEach(async () => {
    olderTab?.close();
    TestBed.inject(MatSnackBar).dismiss();
    TestBed.resetTestingModule();
    await Dexie.delete(journalDbName(userId));
    forgetSession();
  });

  it('asks the reader to close other tabs, and the upgrade finishes once they do', async () => {
    olderTab = await olderTabHolding(journalDbName(userId));
    TestBed.inject(TabCoordination);
    const journal = TestBed.inject(LocalJournal);
    TestBed.tick(); // opens the reader's database at the current version: blocked by the older tab

    await until(() => journal.upgradeBlocked(), 'the upgrade to be blocked');
    await until(() => snackBarText() !== null, 'the message');
    expect(snackBarText()).toBe('Close other Lamplight tabs to finish updating this one.');
    expect(journal.db()!.isOpen()).toBeFalse();

    olderTab.close(); // the reader closes the other tab
    await journal.db()!.open();
    expect(journal.db()!.verno).toBe(JOURNAL_DB_VERSION);
    await until(() => !journal.upgradeBlocked(), 'the block to clear');
    expect(await journal.db()!.meta.count()).toBe(0); // the upgraded database works
  });

  it('says nothing when no other tab is in the way', async () => {
    TestBed.inject(TabCoordination);
    const journal = TestBed.inject(LocalJournal);
    TestBed.tick();
    await journal.db()!.open();
    TestBed.tick();

    expect(journal.upgradeBlocked()).toBeFalse();
    expect(snackBarText()).toBeNull();
  });
});
