import { computed, effect, inject, Injectable, signal, type Signal } from '@angular/core';
import Dexie from 'dexie';

import { Auth } from '../auth/auth';
import { JournalDb, journalDbName } from './journal-db';

/**
 * Opens the signed-in reader's own database and closes it when they sign out. Everything the
 * UI shows is read from here.
 */
@Injectable({ providedIn: 'root' })
export class LocalJournal {
  private readonly auth = inject(Auth);
  private readonly userId = computed(() => this.auth.user()?.id ?? null);

  private readonly closedByOtherTab = signal(false);
  private readonly upgradeWaiting = signal(false);

  /** The reader's database, or `null` when nobody is signed in. */
  readonly db: Signal<JournalDb | null> = computed(() => {
    const userId = this.userId();
    return userId ? new JournalDb(userId) : null;
  });
  /** Another tab opened a newer version of the database, so this tab closed its copy. */
  readonly replacedElsewhere = this.closedByOtherTab.asReadonly();
  /** This tab wants to upgrade the database but an older tab still holds it open. */
  readonly upgradeBlocked = this.upgradeWaiting.asReadonly();

  constructor() {
    // Open at sign-in rather than on first read, so a schema upgrade happens at a calm moment.
    effect((onCleanup) => {
      const db = this.db();
      if (!db) return;
      // Dexie closes this connection on versionchange after we are told, so the other tab's
      // upgrade never waits on us.
      db.on('versionchange', () => this.closedByOtherTab.set(true));
      db.on('blocked', () => this.upgradeWaiting.set(true));
      db.on('ready', () => this.upgradeWaiting.set(false));
      db.open().catch((error: unknown) => console.error('Could not open the local journal', error));
      onCleanup(() => db.close());
    });
  }

  /** The reader's database, for work that only makes sense signed in: throws when nobody is. */
  requireDb(): JournalDb {
    const db = this.db();
    if (!db) throw new Error('Nobody is signed in on this device');
    return db;
  }

  /** Changes written on this device that the server has not confirmed yet. */
  async pendingChanges(): Promise<number> {
    const db = this.db();
    // Circle posts and answers waiting count too: signing out with erase would lose them.
    return db ? (await db.outbox.count()) + (await db.circleOutbox.count()) : 0;
  }

  /** Removes a reader's local copy from this device (their server copy is untouched). */
  async erase(userId: string): Promise<void> {
    if (this.db()?.name === journalDbName(userId)) this.db()?.close();
    await Dexie.delete(journalDbName(userId));
  }
}
