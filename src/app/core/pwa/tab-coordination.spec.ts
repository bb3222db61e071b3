import { provideHttpClient } from '@angular/common/http';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import Dexie from 'dexie';

import { forgetSession, READER, rememberSession } from '../auth/testing/session-fixtures';
import { JOURNAL_DB_VERSION, journalDbName } from '../data/journal-db';
import { LocalJournal } from '../data/local-journal';
import { PAGE_RELOAD } from './page-reload';
import { TabCoordination } from './tab-coordination';
import { UnsavedWork } from './unsaved-work';
import { untilTicked as until } from './testing/leave-question';
import { snackBarText } from './testing/pwa-fixtures';
import { patiently } from '../testing/patience';

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

/** Waits one real task (a message, which the mocked clock does not hold back). */
function afterATask(): Promise<void> {
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => resolve();
    channel.port2.postMessage(null);
  });
}

describe('TabCoordination', () => {
  let userId: string;
  let olderTab: IDBDatabase | undefined;
  let newerTab: Dexie | undefined;
  let reload: jasmine.Spy;

  beforeEach(() => {
    userId = `tabs-${crypto.randomUUID()}`;
    olderTab = newerTab = undefined;
    reload = jasmine.createSpy('reload');
    rememberSession({ user: { ...READER, id: userId } });
    TestBed.configureTestingModule({ providers: [provideHttpClient(), { provide: PAGE_RELOAD, useValue: reload }] });
  });

  afterEach(async () => {
    olderTab?.close();
    newerTab?.close();
    TestBed.inject(MatSnackBar).dismiss();
    TestBed.resetTestingModule();
    await Dexie.delete(journalDbName(userId));
    forgetSession();
  });

  describe('when a newer tab upgrades the database', () => {
    const unsavedInput = signal(false);
    beforeEach(() => unsavedInput.set(false));
    afterEach(() => jasmine.clock().uninstall());

    /** Opens this tab's journal, then has another tab open the next schema version (with the clock mocked). */
    async function upgradedElsewhere(): Promise<void> {
      TestBed.runInInjectionContext(() => TestBed.inject(UnsavedWork).track(unsavedInput));
      TestBed.inject(TabCoordination);
      const journal = TestBed.inject(LocalJournal);
      TestBed.tick();
      await journal.db()!.open();
      // From here the clock is ours: Angular may run the reaction on its own before the next tick.
      await import('@angular/material/snack-bar'); // the snack bar loads on first use; have it ready before time stops
      jasmine.clock().install();
      newerTab = new Dexie(journalDbName(userId));
      newerTab.version(JOURNAL_DB_VERSION + 1).stores({ extra: 'id' });
      await newerTab.open();
      expect(journal.replacedElsewhere()).toBeTrue();
      TestBed.tick();
      await afterATask(); // the snack bar opens once its (already loaded) module resolves
      TestBed.tick();
    }

    it('says so and reloads this tab shortly after, or at once on Reload now', async () => {
      await upgradedElsewhere();
      // Under load the snack bar can take more than one task to open (real time; the mocked clock stands still).
      await patiently('the snack bar', snackBarText, () => TestBed.tick());
      expect(snackBarText()).toBe('Lamplight was updated in another tab, so this tab reloads to keep up.');
      jasmine.clock().tick(2499);
      expect(reload).not.toHaveBeenCalled();
      jasmine.clock().tick(1);
      expect(reload).toHaveBeenCalledTimes(1);

      document.querySelector<HTMLButtonElement>('.mat-mdc-simple-snack-bar button')!.click();
      expect(reload).toHaveBeenCalledTimes(2);
    });

    it('with unsaved input on screen, waits until it is saved', async () => {
      unsavedInput.set(true);
      await upgradedElsewhere();
      jasmine.clock().tick(60_000);
      expect(reload).not.toHaveBeenCalled();

      unsavedInput.set(false);
      TestBed.tick();
      jasmine.clock().tick(2500);
      expect(reload).toHaveBeenCalledTimes(1);
    });
  });

  describe('when an older tab holds the database', () => {
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
      expect(reload).not.toHaveBeenCalled(); // a blocked upgrade needs no reload here
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
});
