import { inject, Injectable } from '@angular/core';
import { Subject } from 'rxjs';

import { HlcClock } from '@shared/sync/hlc';
import { emptyRow, type LocalRow } from '@shared/sync/local-row';
import { currentSetState, mergeSetField } from '@shared/sync/merge-set';
import { isEmptyOrSet, joinOrSet, orSetDelta, type OrSetState } from '@shared/sync/or-set';
import { validatePatch } from '@shared/sync/validate-patch';
import type { CollectionName } from '@shared/sync/schema/collections';
import { COLLECTIONS, fieldSpecOf } from '@shared/sync/schema/collections';
import type { PatchOf, RowOf } from '@shared/sync/schema/collection';
import type { FieldSpec } from '@shared/sync/schema/field';
import { textFieldMax } from '@shared/text/text-fields';
import { TEXT_STATES, textStatesOf } from '@shared/text/text-states';
import type { TextUpdateValue } from '@shared/text/text-value';

import { deviceId } from '../device/device-id';
import { InvalidFieldsError } from './field-errors';
import type { JournalDb, OutboxEntry } from './journal-db';
import { LocalJournal } from './local-journal';

type Spec<C extends CollectionName> = (typeof COLLECTIONS)[C];

/** Outbox changes issued in one task of a write's transaction (see {@link JournalStore.writeAll}). */
const OUTBOX_ADDS_PER_TASK = 200;

/** One row's fields to write, for {@link JournalStore.writeAll}. */
export interface RowWrite {
  readonly collection: CollectionName;
  readonly rowId: string;
  readonly patch: Readonly<Record<string, unknown>>;
}

/**
 * Every local write. In one Dexie transaction it updates the row, stamps each changed field with
 * a new hybrid logical clock and appends one outbox change per changed field, so a write is
 * either wholly saved (and will sync) or not at all. The clock's state lives in the same
 * database, so tabs of one device never issue the same clock twice.
 */
@Injectable({ providedIn: 'root' })
export class JournalStore {
  private readonly journal = inject(LocalJournal);
  private readonly writes = new Subject<void>();

  /** Fires after each local write that changed something (the sync engine listens). */
  readonly localWrites = this.writes.asObservable();

  /** Writes the given fields of a row (creating it if needed); unchanged fields are skipped. */
  write<C extends CollectionName>(collection: C, rowId: string, patch: PatchOf<Spec<C>>): Promise<void> {
    return this.writeAll([{ collection, rowId, patch }]);
  }

  /**
   * Several rows in one transaction, under one clock: all of them are saved, or none (a book's
   * status and its history entry, say).
   */
  async writeAll(writes: readonly RowWrite[]): Promise<void> {
    await this.commit(writes, null);
  }

  /**
   * {@link writeAll} for rows whose ids were just made on this device (`crypto.randomUUID()`), as
   * an import's: none can be stored or waiting in the outbox yet, so nothing is read first.
   */
  async writeNew(writes: readonly RowWrite[]): Promise<void> {
    await this.commit(writes, null, true);
  }

  /**
   * {@link writeAll}, but first reads one row in the same transaction and writes nothing when
   * `skip(row)` says so: no second transaction to read it, and no other write slipping in
   * between. Resolves with the row as it was read.
   */
  async writeAllUnless<C extends CollectionName>(
    writes: readonly RowWrite[],
    read: { readonly collection: C; readonly rowId: string },
    skip: (row: RowOf<Spec<C>> | undefined) => boolean,
  ): Promise<RowOf<Spec<C>> | undefined> {
    let before: RowOf<Spec<C>> | undefined;
    await this.commit(writes, { ...read, skip: (row) => skip((before = row as RowOf<Spec<C>> | undefined)) });
    return before;
  }

  private async commit(writes: readonly RowWrite[], guard: Guard | null, allNew = false): Promise<void> {
    const db = this.journal.requireDb();
    for (const { collection, patch } of writes) {
      const problems = validatePatch(COLLECTIONS[collection], patch);
      if (Object.keys(problems).length > 0) throw new InvalidFieldsError(problems);
    }
    // Yjs loads on the first text write, before the transaction (which must not await anything else).
    const texts = writes.some(({ collection, patch }) => Object.keys(patch).some((field) => textFieldMax(collection, field) !== undefined))
      ? await loadTextWriter()
      : null;
    const names = [...new Set([...writes.map((w) => w.collection), ...(guard ? [guard.collection] : [])])];
    const changed = await db.transaction('rw', [...names.map((name) => db.rows(name)), db.outbox, db.meta], async () => {
      // Every read is issued at once: the rows, the clock and its offset, the waiting changes.
      const [rows, [offsetEntry, clockEntry], waiting] = await Promise.all([
        allNew ? new Map<string, LocalRow>() : readRows(db, writes, guard),
        db.meta.bulkGet(['clockOffset', 'clock']),
        allNew ? [] : waitingFor(db, writes),
      ]);
      if (guard?.skip(rows.get(rowKey(guard.collection, guard.rowId)))) return false;
      // From the server-corrected time, so a device with a wrong date still stamps sensible clocks.
      const offset = Number(offsetEntry?.value ?? 0) || 0;
      let hlc: string | null = null;
      const outbox: OutboxEntry[] = [];
      const puts = new Map<CollectionName, Map<string, LocalRow>>();
      for (const { collection, rowId, patch } of writes) {
        const key = rowKey(collection, rowId);
        const row: LocalRow = rows.get(key) ?? emptyRow(rowId);
        const fields = Object.entries(patch).filter(([field, value]) => !sameValue(row[field], value));
        if (fields.length === 0) continue;
        hlc ??= new HlcClock(deviceId(), () => Date.now() + offset, clockEntry?.value).tick();
        const next: Record<string, unknown> = { ...row, _hlc: { ...row._hlc } };
        for (const [field, value] of fields) {
          if (fieldSpecOf(collection, field)?.kind === 'set') {
            // Sent as a delta (what was added, which adds were removed), so other devices' edits stay.
            const current = { value: row[field], hlc: row._hlc[field], state: row._sets?.[field] };
            const delta = orSetDelta(currentSetState(current), value as string[], hlc);
            if (isEmptyOrSet(delta)) continue; // the same elements in another order
            const merged = mergeSetField(current, { value: delta, hlc });
            next[field] = merged.value;
            next['_sets'] = { ...(next['_sets'] as object), [field]: merged.state };
            (next['_hlc'] as Record<string, string>)[field] = hlc;
            outbox.push({ id: crypto.randomUUID(), collection, rowId, field, value: delta, hlc });
            continue;
          }
          const text = texts && textWrite(texts, collection, next as LocalRow, field, value); // next: keeps earlier texts of this write
          if (text) Object.assign(next, text.row);
          else next[field] = value;
          (next['_hlc'] as Record<string, string>)[field] = hlc;
          outbox.push({ id: crypto.randomUUID(), collection, rowId, field, value: text ? text.value : value, hlc });
        }
        rows.set(key, next as LocalRow); // a later write to the same row builds on this one
        puts.set(collection, (puts.get(collection) ?? new Map()).set(rowId, next as LocalRow));
      }
      if (!hlc) return false;
      const { stale, entries } = coalesce(waiting, outbox);
      // Issued together: IndexedDB runs them in order within the transaction without a round trip each.
      await Promise.all([
        ...[...puts].map(([collection, byId]) => db.rows(collection).bulkPut([...byId.values()])),
        db.meta.put({ key: 'clock', value: hlc }),
        db.outbox.bulkDelete(stale),
        ...(entries.length <= OUTBOX_ADDS_PER_TASK ? [db.outbox.bulkAdd(entries)] : []),
      ]);
      // A large write's changes a slice at a time, each issued in a new task (the last request's
      // answer) of the same transaction: copying a thousand changes into IndexedDB at once, or
      // with the rows, was a long task on a busy device.
      for (let start = 0; entries.length > OUTBOX_ADDS_PER_TASK && start < entries.length; start += OUTBOX_ADDS_PER_TASK) {
        await db.outbox.bulkAdd(entries.slice(start, start + OUTBOX_ADDS_PER_TASK));
      }
      return true;
    });
    if (changed) this.writes.next();
  }

  /** Adds a new row with a client-made id and returns the id. */
  async create<C extends CollectionName>(collection: C, fields: PatchOf<Spec<C>>): Promise<string> {
    const id = crypto.randomUUID();
    await this.write(collection, id, { ...fields, deleted: false } as PatchOf<Spec<C>>);
    return id;
  }

  /** Rows of a collection that are not deleted. */
  async list<C extends CollectionName>(collection: C): Promise<RowOf<Spec<C>>[]> {
    return (await this.journal.requireDb().rows(collection).toArray()).filter((row) => !row['deleted']) as unknown as RowOf<Spec<C>>[];
  }

  /** Deletes by tombstone, which syncs like any other edit. */
  remove<C extends CollectionName>(collection: C, rowId: string): Promise<void> {
    return this.write(collection, rowId, { deleted: true } as PatchOf<Spec<C>>);
  }

  /** One row, or `undefined` when it does not exist here (yet). */
  async get<C extends CollectionName>(collection: C, rowId: string): Promise<RowOf<Spec<C>> | undefined> {
    return (await this.journal.requireDb().rows(collection).get(rowId)) as RowOf<Spec<C>> | undefined;
  }
}

/** One row read before a write, and whether to skip the write because of it. */
interface Guard {
  readonly collection: CollectionName;
  readonly rowId: string;
  readonly skip: (row: LocalRow | undefined) => boolean;
}

const rowKey = (collection: string, rowId: string) => `${collection}\u0000${rowId}`;
const changeKey = (change: OutboxEntry) => `${change.collection}\u0000${change.rowId}\u0000${change.field}`;

/** The rows written (and the guard's row), one `bulkGet` per collection, all issued together. */
async function readRows(db: JournalDb, writes: readonly RowWrite[], guard: Guard | null): Promise<Map<string, LocalRow>> {
  const ids = new Map<CollectionName, Set<string>>();
  for (const { collection, rowId } of [...writes, ...(guard ? [guard] : [])]) ids.set(collection, (ids.get(collection) ?? new Set()).add(rowId));
  const lists = await Promise.all(
    [...ids].map(async ([collection, set]) => {
      const keys = [...set];
      const found = await db.rows(collection).bulkGet(keys);
      return keys.flatMap((rowId, n) => (found[n] ? [[rowKey(collection, rowId), found[n]] as const] : []));
    }),
  );
  return new Map(lists.flat());
}

/**
 * Waiting outbox changes to the rows being written, through the outbox's `rowId` index: the
 * outbox can hold tens of thousands of changes (an import offline), and reading all of it for
 * every batch made a large import quadratic. One request per row, all issued at once: `anyOf`
 * walks a cursor, a round trip to IndexedDB per key, and a 150-row batch waited on each in turn.
 */
async function waitingFor(db: JournalDb, writes: readonly RowWrite[]): Promise<OutboxEntry[]> {
  const rowIds = [...new Set(writes.map((write) => write.rowId))];
  return (await Promise.all(rowIds.map((rowId) => db.outbox.where('rowId').equals(rowId).toArray()))).flat();
}

/**
 * Drops waiting outbox changes to the same field of the same row, so only the newest is sent
 * (with its newer clock): a timer that writes every few seconds keeps one change, not hundreds.
 * A set field's waiting deltas are joined into the new one instead, so no add or remove is lost;
 * a mergeable text's updates are never dropped. Returns the waiting changes to delete and the
 * changes to add.
 */
function coalesce(waiting: readonly OutboxEntry[], fresh: readonly OutboxEntry[]): { stale: number[]; entries: OutboxEntry[] } {
  // A mergeable text's updates each carry typed characters: they all go, never only the newest.
  const coalescable = (change: OutboxEntry) => fieldSpecOf(change.collection, change.field)?.kind !== 'text';
  const byKey = new Map(fresh.filter(coalescable).map((change) => [changeKey(change), change]));
  const stale = waiting.filter((change) => byKey.has(changeKey(change)));
  for (const old of stale) {
    const replacement = byKey.get(changeKey(old))!;
    if (fieldSpecOf(old.collection, old.field)?.kind === 'set') {
      byKey.set(changeKey(old), { ...replacement, value: joinOrSet(old.value as OrSetState, replacement.value as OrSetState) });
    }
  }
  return {
    stale: stale.map((change) => change.seq!),
    entries: [...new Set(fresh.map((change) => (coalescable(change) ? byKey.get(changeKey(change))! : change)))],
  };
}

/**
 * A mergeable text's write (see shared/text/local-text.ts): the text and its new Yjs state for
 * the row, and the update the outbox pushes. Null for any other kind of field.
 */
const loadTextWriter = async () => {
  const [{ writeLocalText }, { textDocName }] = await Promise.all([import('@shared/text/local-text'), import('@shared/text/text-doc')]);
  return { writeLocalText, textDocName };
};

function textWrite(
  { writeLocalText, textDocName }: Awaited<ReturnType<typeof loadTextWriter>>,
  collection: CollectionName,
  row: LocalRow,
  field: string,
  value: unknown,
): { row: Record<string, unknown>; value: TextUpdateValue } | null {
  const spec: FieldSpec | undefined = (COLLECTIONS[collection].fields as Record<string, FieldSpec>)[field];
  if (spec?.kind !== 'text') return null;
  const states = textStatesOf(row);
  const local = { state: states[field], text: row[field] as string | null | undefined };
  const written = writeLocalText(textDocName(collection, row.id, field), local, value as string | null | TextUpdateValue, spec.maxLength!);
  if ('problem' in written) throw new InvalidFieldsError({ [field]: written.problem });
  return {
    row: { [field]: written.text === '' ? null : written.text, [TEXT_STATES]: { ...states, [field]: written.state } },
    value: { yjs: written.update },
  };
}

/** Values are JSON (strings, numbers, booleans, null, lists): compare them as JSON. */
function sameValue(a: unknown, b: unknown): boolean {
  return a === b || JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}
