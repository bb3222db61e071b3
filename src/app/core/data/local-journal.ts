import { computed, effect, inject, Injectable, type Signal } from '@angular/core';
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

  /** The reader's database, or `null` when nobody is signed in. */
  readonly db: Signal<JournalDb | null> = computed(() => {
    const userId = this.userId();
    return userId ? new JournalDb(userId) : null;
  });

  constructor() {
    // Open at sign-in rather than on first read, so a schema upgrade happens at a calm moment.
    effect((onCleanup) => {
      const db = this.db();
      db?.open().catch((error: unknown) => console.error('Could not open the local journal', error));
      onCleanup(() => db?.close());
    });
  }

  /** Changes written on this device that the server has not confirmed yet. */
  async pendingChanges(): Promise<number> {
    const db = this.db();
    return db ? db.outbox.count() : 0;
  }

  /** Removes a reader's local copy from this device (their server copy is untouched). */
  async erase(userId: string): Promise<void> {
    if (this.db()?.name === journalDbName(userId)) this.db()?.close();
    await Dexie.delete(journalDbName(userId));
  }
}
