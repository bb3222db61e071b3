import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import Dexie from 'dexie';

import { forgetSession, READER, rememberSession } from '../auth/testing/session-fixtures';
import { JOURNAL_DB_VERSION, journalDbName } from './journal-db';
import { LocalJournal } from './local-journal';

describe('LocalJournal across tabs', () => {
  let userId: string;

  beforeEach(() => {
    userId = `tabs-${crypto.randomUUID()}`;
    rememberSession({ user: { ...READER, id: userId } });
    TestBed.configureTestingModule({ providers: [provideHttpClient()] });
  });

  afterEach(async () => {
    TestBed.resetTestingModule();
    await Dexie.delete(journalDbName(userId));
    forgetSession();
  });

  it('closes its database and says so when another tab opens a newer version, so that tab is never stuck', async () => {
    const journal = TestBed.inject(LocalJournal);
    TestBed.tick(); // run the effect that opens the database
    await journal.db()!.open();
    expect(journal.replacedElsewhere()).toBeFalse();

    // "Another tab": a second connection asking for the next schema version (IndexedDB versionchange).
    const newer = new Dexie(journalDbName(userId));
    newer.version(JOURNAL_DB_VERSION + 1).stores({ extra: 'id' });
    await newer.open();

    expect(journal.replacedElsewhere()).toBeTrue();
    expect(journal.db()!.isOpen()).toBeFalse();
    expect(newer.isOpen()).toBeTrue();
    newer.close();
  });

  it('keeps one database per reader, named by their id', () => {
    const journal = TestBed.inject(LocalJournal);
    expect(journal.db()?.name).toBe(`lamplight-journal-${userId}`);
  });
});
