import * as z from 'zod/mini';
import { en } from 'zod/locales';
// Named core classes, not the `z.core` namespace: that would keep all of zod in the first screen's chunk.
import { $ZodNullable, $ZodString } from 'zod/v4/core';

import { isValidIsbn13 } from '../../isbn/is-valid-isbn13';

// zod's mini build (a third of the full one's size): the schema reaches the first screen through
// the local database. Full zod sets English messages itself; the mini build has to be told.
if (!z.config().localeError) z.config(en());

/** How a field is stored in PostgreSQL: the server's TypeORM entities are generated from it and a spec checks the migrated tables against it. */
export type SqlType = 'text' | 'text[]' | 'double precision' | 'integer' | 'boolean' | 'uuid' | 'jsonb';

/**
 * How concurrent writes to a field combine; every layer (shared merge, server SQL, client apply)
 * switches on it. See DEVELOPERS.md, "Field kinds".
 * - `lww`: one value, the greater clock wins, whole (scalars, and ordered lists such as authors,
 *   whose order is part of the value).
 * - `set`: an unordered list merged per element (an observed-remove set, `shared/sync/or-set.ts`):
 *   concurrent adds both survive and a remove takes away only the adds it saw.
 * - `text`: long prose merged character by character as a Yjs document (`shared/text/`), so
 *   edits from several devices all stay. The column holds the text it shows.
 * New kinds are added to this union and to {@link FIELD_KINDS}.
 */
export type FieldKind = 'lww' | 'set' | 'text';
export const FIELD_KINDS: readonly FieldKind[] = ['lww', 'set', 'text'];

/** One field of a synced collection: how it merges, its validator and its column type. */
export interface FieldSpec<T = unknown> {
  readonly kind: FieldKind;
  readonly sqlType: SqlType;
  /** The value as the app reads and writes it (and as an older client pushes it). */
  readonly schema: z.ZodMiniType<T>;
  /** `set` only: the most elements and the longest element, for the per-element wire form. */
  readonly elements?: { readonly maxItems: number; readonly maxLength: number };
  /** `text` only: the longest text (UTF-16 code units, as `String.length` counts). */
  readonly maxLength?: number;
  /** Where the field holds book ids, when it does (merging two books moves them; `shared/duplicates/book-references.ts`). */
  readonly bookIds?: BookIdsIn;
}

/**
 * How a field holds book ids: `value` — the value is one; `entries` — a list of objects, each
 * with a `bookId`; `values` — the values of a record (id → book id).
 */
export type BookIdsIn = 'value' | 'entries' | 'values';

/**
 * A field whose validator is built on first use (`schema` is a caching getter): building every
 * collection's zod schemas when the module loads cost a cold start ~50 ms, and reading the
 * journal validates nothing. Spreading a spec builds its validator; pass `build` here instead.
 */
function lazySpec<T>(base: Omit<FieldSpec<T>, 'schema'>, build: () => z.ZodMiniType<T>): FieldSpec<T> {
  let schema: z.ZodMiniType<T> | undefined;
  return Object.defineProperty({ ...base }, 'schema', { get: () => (schema ??= build()), enumerable: true }) as FieldSpec<T>;
}

const spec = <T>(sqlType: SqlType, build: () => z.ZodMiniType<T>): FieldSpec<T> => lazySpec({ kind: 'lww', sqlType }, build);

const stringList = (maxItems: number, maxLength: number) =>
  z
    .array(z.string().check(z.maxLength(maxLength, `each entry must be at most ${maxLength} characters`)))
    .check(z.maxLength(maxItems, `must have at most ${maxItems} entries`));

const rowId = () => z.nullable(z.uuid('must be a row id (UUID)'));

/** Calendar dates as readers think of them, 'YYYY-MM-DD' (RFC 3339 full-date). */
const DATE = /^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;
/** Instants in UTC, as `Date.prototype.toISOString` writes them (RFC 3339, 'Z'). */
const TIMESTAMP = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d{1,3})?Z$/;

/**
 * Field builders. Values are validated by type and range only: rows arrive in pieces from
 * several devices, so no field is ever "required" on the server.
 */
export const field = {
  text: (max: number) => spec('text', () => z.string().check(z.maxLength(max, `must be at most ${max} characters`))),
  optionalText: (max: number) => spec('text', () => z.nullable(z.string().check(z.maxLength(max, `must be at most ${max} characters`)))),
  /** An ordered list (authors: the first is the main one). Last writer wins for the whole list. */
  orderedList: (maxItems: number, maxLength: number) => spec('text[]', () => stringList(maxItems, maxLength)),
  /**
   * An unordered list of distinct strings (tags, label ids) merged per element, so two devices
   * adding different entries offline both keep theirs. The column holds the current elements;
   * the per-element state lives beside it (see `shared/sync/or-set.ts`).
   */
  set: (maxItems: number, maxLength: number): FieldSpec<string[]> =>
    lazySpec({ kind: 'set', sqlType: 'text[]', elements: { maxItems, maxLength } }, () => stringList(maxItems, maxLength)),
  /**
   * Long prose (a page, a review, a note) that merges per character (Yjs): the app reads it as
   * text; pushes carry Yjs updates (`shared/text/text-value.ts`), pulls the text and its state.
   */
  mergeableText: (max: number): FieldSpec<string | null> =>
    lazySpec({ kind: 'text', sqlType: 'text', maxLength: max }, () => z.nullable(z.string().check(z.maxLength(max, `must be at most ${max} characters`)))),
  choice: <const Values extends readonly [string, ...string[]]>(values: Values) =>
    spec('text', () => z.enum(values, { error: `must be one of ${values.join(', ')}` })),
  optionalChoice: <const Values extends readonly [string, ...string[]]>(values: Values) =>
    spec('text', () => z.nullable(z.enum(values, { error: `must be one of ${values.join(', ')} or null` }))),
  optionalInteger: (min: number, max: number) =>
    spec('integer', () =>
      z.nullable(z.number().check(z.int('must be a whole number'), z.gte(min, `must be at least ${min}`), z.lte(max, `must be at most ${max}`))),
    ),
  optionalNumber: (min: number, max: number, step?: number) =>
    spec('double precision', () => {
      const number = z.number().check(z.gte(min, `must be at least ${min}`), z.lte(max, `must be at most ${max}`));
      return z.nullable(step ? number.check(z.multipleOf(step, `must be in steps of ${step}`)) : number);
    }),
  boolean: () => spec('boolean', () => z.boolean({ error: 'must be true or false' })),
  optionalBoolean: () => spec('boolean', () => z.nullable(z.boolean({ error: 'must be true or false' }))),
  /** A calendar month, 'YYYY-MM' (ISO 8601). */
  optionalMonth: () => spec('text', () => z.nullable(z.string().check(z.regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'must be a month like 2026-03')))),
  optionalDate: () => spec('text', () => z.nullable(z.string().check(z.regex(DATE, 'must be a date like 2026-03-08')))),
  optionalTimestamp: () => spec('text', () => z.nullable(z.string().check(z.regex(TIMESTAMP, 'must be a UTC time like 2026-03-08T09:30:00.000Z')))),
  optionalRef: () => spec('uuid', rowId),
  /** The id of one of the reader's books: a merge of two books moves it to the kept one. */
  optionalBookRef: (): FieldSpec<string | null> => lazySpec({ kind: 'lww', sqlType: 'uuid', bookIds: 'value' }, rowId),
  /** ISBN-13 digits only (ISO 2108): the client converts an ISBN-10 before writing. */
  optionalIsbn13: () =>
    spec('text', () =>
      z.nullable(
        z
          .string()
          .check(z.regex(/^\d{13}$/, 'must be the 13 digits of an ISBN-13, without hyphens'), z.refine(isValidIsbn13, 'is not a valid ISBN-13 (check digit)')),
      ),
    ),
  /** A language tag such as 'en' or 'pt-BR' (BCP 47 shape: a 2–3 letter language, then subtags). */
  optionalLanguage: () =>
    spec('text', () => z.nullable(z.string().check(z.regex(/^[A-Za-z]{2,3}(-[A-Za-z0-9]{1,8})*$/, 'must be a language tag like en or pt-BR')))),
  /** The id of an uploaded image: the hex SHA-256 of its bytes (FIPS 180-4). */
  optionalUploadId: () => spec('text', () => z.nullable(z.string().check(z.regex(/^[0-9a-f]{64}$/, 'must be an upload id (64 hex digits)')))),
  /** Any JSON value (its validator, or a function building it on first use); `bookIds` says where it holds book ids, if it does. */
  json: <T>(schema: z.ZodMiniType<T> | (() => z.ZodMiniType<T>), bookIds?: BookIdsIn): FieldSpec<T> =>
    lazySpec({ kind: 'lww', sqlType: 'jsonb', ...(bookIds ? { bookIds } : {}) }, typeof schema === 'function' ? schema : () => schema),
};

/** camelCase field name → its snake_case column. */
export function columnName(fieldName: string): string {
  return fieldName.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);
}

/** Whether a field merges per element (see {@link FieldKind}). */
export const isSetField = (spec: FieldSpec | undefined): boolean => spec?.kind === 'set';

/** The longest text a text field of the schema takes; throws for any other field. */
export function maxTextLength(spec: FieldSpec): number {
  const max = textMaxLength(spec);
  if (max === null) throw new Error('not a text field with a maximum length');
  return max;
}

/**
 * The longest text a plain text field takes (unwrapping `nullable`), or `null` for other fields
 * and string formats such as UUIDs. Read from the validator's checks, so it never drifts.
 */
export function textMaxLength(spec: FieldSpec): number | null {
  const schema = spec.schema instanceof $ZodNullable ? spec.schema._zod.def.innerType : spec.schema;
  if (!(schema instanceof $ZodString) || (schema._zod.def as { format?: string }).format) return null;
  const max = schema._zod.def.checks?.find((check) => check._zod.def.check === 'max_length');
  return (max?._zod.def as { maximum?: number } | undefined)?.maximum ?? null;
}
