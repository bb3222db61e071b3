import { EntitySchema, type EntitySchemaColumnOptions } from 'typeorm';

import { COLLECTIONS } from '../../../shared/sync/schema/collections';
import type { CollectionSpec } from '../../../shared/sync/schema/collection';
import { columnName, type FieldSpec } from '../../../shared/sync/schema/field';

/**
 * What every synced row keeps besides its fields: whose it is, the clock of each field, the set
 * fields' per-element states and the server sequence of its last winning change (what pulls page
 * by; bigint arrives as a string from pg). Row ids are made by clients, unique per user.
 */
const SYNCED_ROW_COLUMNS: Record<string, EntitySchemaColumnOptions> = {
  userId: { name: 'user_id', type: 'uuid', primary: true },
  id: { type: 'uuid', primary: true },
  clocks: { type: 'jsonb', default: {} },
  sets: { type: 'jsonb', default: {} },
  seq: { type: 'bigint' },
};

/** A field's column: nullable, because a row may arrive one field at a time. */
function fieldColumn(name: string, spec: FieldSpec): EntitySchemaColumnOptions {
  const array = spec.sqlType.endsWith('[]');
  return { name: columnName(name), type: array ? spec.sqlType.slice(0, -2) : spec.sqlType, array, nullable: true } as EntitySchemaColumnOptions;
}

/** The TypeORM entity of a synced collection, built from its shared declaration (tables come from migrations). */
export function syncedEntity(spec: CollectionSpec): EntitySchema {
  const fields = Object.entries(spec.fields as Record<string, FieldSpec>).map(([name, field]) => [name, fieldColumn(name, field)]);
  return new EntitySchema({ name: spec.name, tableName: spec.table, columns: { ...SYNCED_ROW_COLUMNS, ...Object.fromEntries(fields) } });
}

/** The entity of each synced collection, by collection name. */
export const SYNCED_ENTITIES = Object.fromEntries(Object.values(COLLECTIONS).map((spec) => [spec.name, syncedEntity(spec)])) as Record<
  keyof typeof COLLECTIONS,
  EntitySchema
>;
