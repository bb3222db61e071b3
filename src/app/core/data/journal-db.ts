import Dexie, { type Table } from 'dexie';

import type { FieldChange, PulledChange } from '@shared/sync/field-change';
import type { LocalRow } from '@shared/sync/local-row';
import { COLLECTIONS } from '@shared/sync/schema/collections';

/** One change waiting to reach the server; `seq` is its place in the local order of writes. */
export interface OutboxEntry extends FieldChange {
  readonly seq?: number;
}

/** A change the server refused for good, kept so the reader can see why. */
export interface RejectedChange extends FieldChange {
  readonly code: string;
  readonly reason: string;
  readonly rejectedAt: string;
}

/**
 * A cover image kept on this device: the compressed bytes, shown offline, and whether the
 * server has them yet. `id` is the hex SHA-256 of the bytes, which is also the server's id.
 */
export interface StoredCover {
  readonly id: string;
  readonly blob: Blob;
  readonly mediaType: string;
  readonly state: 'pending' | 'uploaded' | 'refused';
  /** Why the server refused it, for the reader. */
  readonly problem?: string;
}

/**
 * Small key-value facts about this database: the last clock, the pull cursor, the last sync, the
 * offset from the server's time (ms, as text), the greatest clock seen from others, whether the
 * reader was told their date looks wrong, and recent edits another device overwrote (JSON).
 */
export interface MetaEntry {
  readonly key: 'clock' | 'cursor' | 'lastSyncedAt' | 'clockOffset' | 'seenClock' | 'clockWarned' | 'overwritten';
  readonly value: string;
}

/** A pulled change for a collection this version of the app does not know yet, kept for after an update. */
export interface HeldChange extends PulledChange {
  readonly seq?: number;
}

/** The name of a reader's local database: one per user id, so readers sharing a tablet never mix. */
export const journalDbName = (userId: string) => `lamplight-journal-${userId}`;

/**
 * Bump when the stores below change (a new collection or index). Dexie works out the upgrade
 * from the latest declaration; other open tabs get a `versionchange` and close.
 */
export const JOURNAL_DB_VERSION = 8;

/** Dexie store specs for every synced collection, from the shared schema: `id` plus its indexes. */
export function collectionStores(): Record<string, string> {
  return Object.fromEntries(Object.values(COLLECTIONS).map((spec) => [spec.name, ['id', ...spec.indexes].join(', ')]));
}

/** A reader's journal in IndexedDB, the app's first and only place to read and write. */
export class JournalDb extends Dexie {
  outbox!: Table<OutboxEntry, number>;
  rejected!: Table<RejectedChange, string>;
  meta!: Table<MetaEntry, string>;
  /** Cover images on this device (not a synced collection: books sync their `coverId`). */
  covers!: Table<StoredCover, string>;
  /** Pulled changes of collections unknown to this app version (applied once it knows them). */
  held!: Table<HeldChange, number>;

  constructor(readonly userId: string) {
    super(journalDbName(userId));
    this.version(JOURNAL_DB_VERSION).stores({
      ...collectionStores(),
      outbox: '++seq',
      rejected: 'id',
      meta: 'key',
      covers: 'id, state',
      held: '++seq, collection',
    });
  }

  /** The rows of one synced collection. */
  rows(collection: string): Table<LocalRow, string> {
    return this.table(collection);
  }
}
