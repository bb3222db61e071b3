import Dexie, { type Table } from 'dexie';

import type { FieldChange, PulledChange } from '@shared/api/sync';
import type { LocalRow } from '@shared/sync/local-row';
import { CIRCLE_COLLECTION_NAMES } from '@shared/circles/circle-collection-names';
import { COLLECTIONS, type CollectionName } from '@shared/sync/schema/collections';
import type { RowOf } from '@shared/sync/schema/collection';
import { DELETE_CLOCK_INDEX } from '@shared/trash/tombstone';

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
 * reader was told their date looks wrong, recent edits another device overwrote (JSON), and the
 * last clock a re-stamp gave (a floor for the next one).
 */
export interface MetaEntry {
  readonly key: 'clock' | 'cursor' | 'lastSyncedAt' | 'clockOffset' | 'seenClock' | 'clockWarned' | 'overwritten' | 'restamped';
  readonly value: string;
}

/** A pulled change for a collection this version of the app does not know yet, kept for after an update. */
export interface HeldChange extends PulledChange {
  readonly seq?: number;
}

/** A row of collection `C` as this device keeps it: the collection's typed fields plus the field clocks. */
export type StoredRow<C extends CollectionName> = RowOf<(typeof COLLECTIONS)[C]> & LocalRow;

/** Whether a row is still there: deletion is a tombstone (`deleted`), rows are never removed. */
export const isCurrent = (row: { readonly deleted?: boolean | null }): boolean => !row.deleted;

/** The name of a reader's local database: one per user id, so readers sharing a tablet never mix. */
export const journalDbName = (userId: string) => `lamplight-journal-${userId}`;

/**
 * Bump when the stores below change (a new collection or index). Dexie works out the upgrade
 * from the latest declaration; other open tabs get a `versionchange` and close.
 */
export const JOURNAL_DB_VERSION = 9;

/**
 * Dexie store specs for every synced collection, from the shared schema: `id`, its indexes, and
 * the clock of its `deleted` field ({@link DELETE_CLOCK_INDEX}), so Trash reads only rows whose
 * tombstone changed in its window instead of every row (a boolean is no IndexedDB key).
 */
export function collectionStores(): Record<string, string> {
  return Object.fromEntries(Object.values(COLLECTIONS).map((spec) => [spec.name, ['id', ...spec.indexes, DELETE_CLOCK_INDEX].join(', ')]));
}

/** A change to a circle's data waiting to reach `/api/circles/:id/sync` (circles sync on their own, by circle). */
export interface CircleOutboxEntry extends FieldChange {
  readonly seq?: number;
  readonly circleId: string;
}

/**
 * What this device knows about one circle besides its rows: the pull cursor, the reader's role
 * and the members (display names and roles), as of the last sync, so the circle opens offline.
 */
export interface CircleMeta {
  readonly circleId: string;
  readonly cursor?: string;
  readonly role?: 'host' | 'member';
  readonly members?: readonly { readonly userId: string; readonly displayName: string; readonly role: 'host' | 'member' }[];
  readonly lastSyncedAt?: string;
}

/** Dexie stores for the circle collections: by id, and by circle for each circle's page. */
export function circleStores(): Record<string, string> {
  return Object.fromEntries(CIRCLE_COLLECTION_NAMES.map((name) => [name, 'id, circleId']));
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
  /** Circle changes waiting to be sent, and what is known of each circle (features/circles). */
  circleOutbox!: Table<CircleOutboxEntry, number>;
  circleMeta!: Table<CircleMeta, string>;

  constructor(readonly userId: string) {
    super(journalDbName(userId));
    this.version(JOURNAL_DB_VERSION).stores({
      ...collectionStores(),
      // By row too: a write finds the changes still waiting for its rows without reading them all.
      outbox: '++seq, rowId',
      rejected: 'id',
      meta: 'key',
      covers: 'id, state',
      held: '++seq, collection',
      ...circleStores(),
      circleOutbox: '++seq, circleId',
      circleMeta: 'circleId',
    });
  }

  /** The rows of one synced collection, typed from the shared schema (any name: the sync layer's untyped view). */
  rows<C extends CollectionName>(collection: C): Table<StoredRow<C>, string>;
  rows(collection: string): Table<LocalRow, string>;
  rows(collection: string): Table<LocalRow, string> {
    return this.table(collection);
  }

  /**
   * The rows of a collection that are not deleted. Read whole and filtered here: a Dexie
   * `filter()` walks a cursor (a request per row), while `toArray()` is one `getAll`, and live
   * queries asking for the same table at once share it (Dexie's live-query cache).
   */
  async current<C extends CollectionName>(collection: C): Promise<StoredRow<C>[]> {
    return (await this.rows(collection).toArray()).filter(isCurrent);
  }

  /** The rows not deleted of several collections at once, by name: `currentOf('books', 'quotes')` → `{ books, quotes }`. */
  async currentOf<const N extends readonly CollectionName[]>(...names: N): Promise<{ [C in N[number]]: StoredRow<C>[] }> {
    const lists = await Promise.all(names.map((name) => this.current(name)));
    return Object.fromEntries(names.map((name, i) => [name, lists[i]])) as { [C in N[number]]: StoredRow<C>[] };
  }
}
