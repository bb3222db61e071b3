import Dexie, { type Table } from 'dexie';

/** One change waiting to reach the server: one field of one row, stamped with its clock. */
export interface OutboxEntry {
  /** Local order of writes. */
  readonly seq?: number;
  /** Globally unique; the server applies each id at most once. */
  readonly id: string;
  readonly collection: string;
  readonly rowId: string;
  readonly field: string;
  readonly value: unknown;
  readonly hlc: string;
}

/** The name of a reader's local database: one per user id, so readers sharing a tablet never mix. */
export const journalDbName = (userId: string) => `lamplight-journal-${userId}`;

/** A reader's journal in IndexedDB, the app's first and only place to read and write. */
export class JournalDb extends Dexie {
  outbox!: Table<OutboxEntry, number>;

  constructor(userId: string) {
    super(journalDbName(userId));
    this.version(1).stores({ outbox: '++seq, id' });
  }
}
