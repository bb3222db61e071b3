import { randomInt } from 'node:crypto';

import type { DataSource } from 'typeorm';
import * as Y from 'yjs';

import type { ChangeProblem, FieldChange, PulledChange } from '../../../shared/api/sync';
import { columnName } from '../../../shared/sync/schema/field';
import { collectionSpec } from '../../../shared/sync/schema/collections';
import { initialTextState } from '../../../shared/text/initial-text-state';
import { compactTextState, TextMerger } from '../../../shared/text/merge-text-update';
import { replaceText } from '../../../shared/text/replace-text';
import { loadTextDoc, textDocName, textOf } from '../../../shared/text/text-doc';
import { textFieldMax } from '../../../shared/text/text-fields';
import { decodeTextBytes, encodeTextBytes, isTextUpdateValue } from '../../../shared/text/text-value';

/** The part of a node-postgres client used here (the push transaction's, or the pool's). */
export interface Queryable {
  query(text: string, values?: unknown[]): Promise<{ rows: Record<string, unknown>[] }>;
}

/** A TypeORM DataSource (or query runner) as a {@link Queryable}. */
export const queryableOf = (db: { query(text: string, values?: unknown[]): Promise<unknown> }): Queryable => ({
  query: async (text, values) => ({ rows: (await db.query(text, values)) as Record<string, unknown>[] }),
});

/** Something that runs work in one transaction (a DataSource, through {@link transactionalOf}). */
export interface Transactional {
  transaction<T>(work: (client: Queryable) => Promise<T>): Promise<T>;
}
export const transactionalOf = (dataSource: DataSource): Transactional => ({
  transaction: (work) => dataSource.transaction((manager) => work(queryableOf(manager))),
});

/** A text change refused while merging: the push answers 400 naming only these changes. */
export class TextChangesRefused extends Error {
  constructor(readonly problems: readonly ChangeProblem[]) {
    super(`${problems.length} text changes refused`);
  }
}

/** One text while a batch is merged into it. */
interface OpenText {
  readonly collection: string;
  readonly rowId: string;
  readonly field: string;
  readonly merger: TextMerger;
  /** The text stored before the batch. */
  readonly before: string;
  hlc: string;
  /** Only the clock moved: the column and clock are written. */
  clocked: boolean;
}

/** A page of history keeps one version per text per this many minutes (the last one of it). */
export const VERSION_PERIOD_MINUTES = 10;
/** How far back a text's history reaches. */
export const HISTORY_DAYS = 30;

/**
 * Mergeable texts on the server (see shared/text). Each text has one stored state in
 * `text_states`; a push merges updates into it with `Y.mergeUpdates` and writes the text it
 * shows into the row's own column, so pulls and every other reader of the row see plain text.
 * The compaction job later drops deleted characters from states (`compactTextState`).
 */
export const TextStore = {
  /**
   * Merges a push's text changes, in order, inside the caller's transaction (which holds the
   * reader's advisory lock). Answers how many changed something; throws
   * {@link TextChangesRefused} when any is refused, so the caller's transaction rolls back.
   */
  async merge(client: Queryable, userId: string, changes: readonly { index: number; change: FieldChange }[]): Promise<number> {
    const open = new Map<string, OpenText>();
    const problems: ChangeProblem[] = [];
    let applied = 0;
    for (const { index, change } of changes) {
      const key = textDocName(change.collection, change.rowId, change.field);
      let text = open.get(key);
      if (!text) {
        text = await load(client, userId, change);
        open.set(key, text);
      }
      const update = updateOf(key, text, change.value);
      const result = update ? text.merger.apply(update) : ({ ok: false, reason: 'is not base64' } as const);
      if (!result.ok) {
        problems.push({ index, id: change.id, code: 'invalid_value', reason: `${change.collection}.${change.field} update ${result.reason}` });
        continue;
      }
      // A first write of an empty text changes no character but still sets the field's clock.
      const newerClock = change.hlc > text.hlc;
      if (newerClock) Object.assign(text, { hlc: change.hlc, clocked: true });
      if (result.changed || newerClock) applied++;
    }
    if (problems.length > 0) throw new TextChangesRefused(problems);
    for (const text of open.values()) if (text.merger.changed || text.clocked) await save(client, userId, text);
    return applied;
  },

  /** Adds each text field's stored state (base64) to pulled changes; values are already the texts. */
  async withStates(db: Queryable, userId: string, changes: PulledChange[]): Promise<PulledChange[]> {
    const wanted = changes.filter((change) => textFieldMax(change.collection, change.field) !== undefined);
    if (wanted.length === 0) return changes;
    const { rows } = await db.query(
      `SELECT s.collection, s.row_id, s.field, s.state FROM text_states s
         JOIN unnest($2::text[], $3::uuid[], $4::text[]) AS w(collection, row_id, field)
           ON s.collection = w.collection AND s.row_id = w.row_id AND s.field = w.field
        WHERE s.user_id = $1`,
      [userId, wanted.map((c) => c.collection), wanted.map((c) => c.rowId), wanted.map((c) => c.field)],
    );
    const states = new Map(rows.map((row) => [textDocName(row['collection'] as string, row['row_id'] as string, row['field'] as string), row['state'] as Buffer]));
    return changes.map((change) => {
      const state = states.get(textDocName(change.collection, change.rowId, change.field));
      return state ? { ...change, state: encodeTextBytes(state) } : change;
    });
  },

  /** A text's versions of the last {@link HISTORY_DAYS} days, newest first. */
  async versions(db: Queryable, userId: string, collection: string, rowId: string, field: string): Promise<{ savedAt: string; text: string }[]> {
    const { rows } = await db.query(
      `SELECT saved_at, text FROM text_versions
        WHERE user_id = $1 AND collection = $2 AND row_id = $3 AND field = $4 AND saved_at > now() - make_interval(days => $5)
        ORDER BY saved_at DESC`,
      [userId, collection, rowId, field, HISTORY_DAYS],
    );
    return rows.map((row) => ({ savedAt: (row['saved_at'] as Date).toISOString(), text: row['text'] as string }));
  },

  /**
   * Compacts one text whose state changed at least `quietSeconds` ago, if any is waiting: under
   * the reader's advisory lock (the one pushes take), so no push lands between the read and the
   * write, and only after checking that the compact state shows exactly the same text.
   * `SKIP LOCKED` lets several instances compact different texts side by side.
   */
  async compactOne(db: Transactional, quietSeconds: number): Promise<boolean> {
    return db.transaction(async (client) => {
      const { rows } = await client.query(
        `SELECT user_id, collection, row_id, field FROM text_states
          WHERE compacted_at IS NULL AND updated_at < now() - make_interval(secs => $1)
          ORDER BY updated_at LIMIT 1 FOR UPDATE SKIP LOCKED`,
        [quietSeconds],
      );
      const found = rows[0];
      if (!found) return false;
      await client.query('SELECT pg_advisory_xact_lock(hashtextextended($1::text, 0))', [found['user_id']]);
      const key = [found['user_id'], found['collection'], found['row_id'], found['field']];
      const { rows: states } = await client.query('SELECT state FROM text_states WHERE user_id = $1 AND collection = $2 AND row_id = $3 AND field = $4', key);
      const state = new Uint8Array(states[0]!['state'] as Buffer);
      const compacted = compactTextState(state);
      const name = textDocName(found['collection'] as string, found['row_id'] as string, found['field'] as string);
      if (textOf(loadTextDoc([compacted]), name) !== textOf(loadTextDoc([state]), name)) {
        throw new Error(`compacting ${name} would change its text; left as it was`);
      }
      await client.query('UPDATE text_states SET state = $5, compacted_at = now() WHERE user_id = $1 AND collection = $2 AND row_id = $3 AND field = $4', [
        ...key,
        Buffer.from(compacted),
      ]);
      return true;
    });
  },

  /** Drops versions older than the history keeps. */
  async pruneVersions(db: Queryable): Promise<number> {
    const { rows } = await db.query(
      'WITH gone AS (DELETE FROM text_versions WHERE saved_at < now() - make_interval(days => $1) RETURNING 1) SELECT count(*)::int AS n FROM gone',
      [HISTORY_DAYS],
    );
    return rows[0]!['n'] as number;
  },
};

/** A text's stored state, or the initial state of its plain column (a text saved before). */
async function load(client: Queryable, userId: string, change: FieldChange): Promise<OpenText> {
  const { rows } = await client.query('SELECT state FROM text_states WHERE user_id = $1 AND collection = $2 AND row_id = $3 AND field = $4', [
    userId,
    change.collection,
    change.rowId,
    change.field,
  ]);
  const spec = collectionSpec(change.collection)!;
  const name = textDocName(change.collection, change.rowId, change.field);
  const { rows: current } = await client.query(`SELECT ${columnName(change.field)} AS text, clocks->>$3 AS hlc FROM ${spec.table} WHERE user_id = $1 AND id = $2`, [
    userId,
    change.rowId,
    change.field,
  ]);
  const plain = (current[0]?.['text'] as string | null | undefined) ?? '';
  const state = rows[0] ? new Uint8Array(rows[0]['state'] as Buffer) : initialTextState(name, plain);
  const merger = new TextMerger(name, state, textFieldMax(change.collection, change.field)!);
  return {
    collection: change.collection,
    rowId: change.rowId,
    field: change.field,
    merger,
    before: plain,
    hlc: (current[0]?.['hlc'] as string | null) ?? '',
    clocked: false,
  };
}

/**
 * The Yjs update a pushed value stands for. A plain string or null comes from an app that
 * predates mergeable texts and means "make the text this": the characters that differ from
 * the stored text become an edit, written under a fresh client id.
 */
function updateOf(name: string, text: OpenText, value: unknown): Uint8Array | null {
  if (isTextUpdateValue(value)) return decodeTextBytes(value.yjs);
  const doc = loadTextDoc([text.merger.state()]);
  doc.clientID = randomInt(1, 2 ** 32 - 1);
  const before = Y.encodeStateVector(doc);
  replaceText(doc.getText(name), typeof value === 'string' ? value : '');
  return Y.encodeStateAsUpdate(doc, before);
}

/** Writes a text's new state, its row's column (null when empty), clock and sequence, and its version of now. */
async function save(client: Queryable, userId: string, text: OpenText): Promise<void> {
  const spec = collectionSpec(text.collection)!;
  const column = columnName(text.field);
  const changed = text.merger.changed;
  const shown = changed ? text.merger.text : text.before;
  if (changed) {
    await client.query(
      `INSERT INTO text_states (user_id, collection, row_id, field, state) VALUES ($1, $2, $3, $4, $5)
       ON CONFLICT (user_id, collection, row_id, field) DO UPDATE SET state = excluded.state, updated_at = now(), compacted_at = NULL`,
      [userId, text.collection, text.rowId, text.field, Buffer.from(text.merger.state())],
    );
  }
  // The clock kept for a text is the greatest that wrote to it (older apps apply the text by it).
  await client.query(
    `INSERT INTO ${spec.table} AS t (user_id, id, ${column}, clocks, seq)
     VALUES ($1, $2, $3, jsonb_build_object($4::text, $5::text), nextval('sync_seq'))
     ON CONFLICT (user_id, id) DO UPDATE SET ${column} = excluded.${column},
       clocks = t.clocks || jsonb_build_object($4::text, CASE WHEN coalesce(t.clocks->>$4, '') COLLATE "C" < $5::text COLLATE "C" THEN $5 ELSE t.clocks->>$4 END),
       seq = excluded.seq`,
    [userId, text.rowId, shown === '' ? null : shown, text.field, text.hlc],
  );
  if (changed) {
    await client.query(
      `INSERT INTO text_versions (user_id, collection, row_id, field, period, saved_at, text)
       VALUES ($1, $2, $3, $4, date_bin(make_interval(mins => $6), now(), timestamptz '2000-01-01'), now(), $5)
       ON CONFLICT (user_id, collection, row_id, field, period) DO UPDATE SET saved_at = excluded.saved_at, text = excluded.text`,
      [userId, text.collection, text.rowId, text.field, shown, VERSION_PERIOD_MINUTES],
    );
  }
}
