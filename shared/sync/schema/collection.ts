import type { z } from 'zod';

import { columnName, field, type FieldSpec } from './field';

/** Field names the sync layer keeps for itself. */
export const RESERVED_FIELDS = ['id', 'userId', 'hlc', 'clocks', 'seq'] as const;

export interface CollectionSpec<Fields extends Record<string, FieldSpec> = Record<string, FieldSpec>> {
  /** The name on the wire and in IndexedDB (camelCase). */
  readonly name: string;
  /** The PostgreSQL table (snake_case of the name). */
  readonly table: string;
  /** Every field, including the `deleted` tombstone. */
  readonly fields: Fields & { readonly deleted: FieldSpec<boolean> };
  /** Fields the client indexes in IndexedDB for its queries. */
  readonly indexes: readonly string[];
}

/** Declares a synced collection; adds the `deleted` tombstone every collection has. */
export function defineCollection<const Fields extends Record<string, FieldSpec>>(
  name: string,
  fields: Fields,
  options: { indexes?: readonly (keyof Fields & string)[] } = {},
): CollectionSpec<Fields> {
  for (const reserved of RESERVED_FIELDS) {
    if (reserved in fields) throw new Error(`${name}.${reserved} is reserved for the sync layer`);
  }
  return { name, table: columnName(name), fields: { ...fields, deleted: field.boolean() }, indexes: options.indexes ?? [] };
}

/** The shape of a row of a collection: its id plus every field (absent until its piece arrives). */
export type RowOf<C extends { readonly fields: Record<string, FieldSpec> }> = { readonly id: string } & {
  readonly [K in keyof C['fields']]?: z.infer<C['fields'][K]['schema']>;
};

/** A change to some fields of a row. */
export type PatchOf<C extends { readonly fields: Record<string, FieldSpec> }> = {
  readonly [K in keyof C['fields']]?: z.infer<C['fields'][K]['schema']>;
};
