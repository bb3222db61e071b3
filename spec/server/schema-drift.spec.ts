import { COLLECTIONS } from '../../shared/sync/schema/collections';
import { columnName, type FieldSpec, type SqlType } from '../../shared/sync/schema/field';
import { SYNCED_ENTITIES } from '../../sync-server/src/data-access/synced-entities';
import { testDataSource } from '../support/test-database';

/** Columns every synced table has besides its fields. */
const SYNC_COLUMNS = ['user_id', 'id', 'clocks', 'sets', 'seq'];

/** information_schema's name for each of our column types. */
const INFORMATION_SCHEMA_TYPE: Record<SqlType, string> = {
  text: 'text',
  'text[]': 'ARRAY',
  'double precision': 'double precision',
  integer: 'integer',
  boolean: 'boolean',
  uuid: 'uuid',
  jsonb: 'jsonb',
};

/**
 * The shared schema is the one description of a synced collection: the TypeORM entities are
 * generated from it (synced-entities.ts) and the tables come from explicit migrations, so this spec
 * is what notices a migration that forgot a field or gave it another type.
 */
describe('The shared schema, the generated TypeORM entities and the migrated database agree', () => {
  it('generates an entity for every synced collection and no other', () => {
    expect(Object.keys(SYNCED_ENTITIES).sort()).toEqual(Object.keys(COLLECTIONS).sort());
  });

  for (const spec of Object.values(COLLECTIONS)) {
    it(`${spec.name}: the generated entity maps every field to a nullable column of its type, and nothing else`, async () => {
      const metadata = (await testDataSource()).getMetadata(SYNCED_ENTITIES[spec.name as keyof typeof SYNCED_ENTITIES]);
      expect(metadata.tableName).toBe(spec.table);
      const byColumn = new Map(metadata.columns.map((column) => [column.databaseName, column]));

      for (const [name, field] of Object.entries(spec.fields as Record<string, FieldSpec>)) {
        const column = byColumn.get(columnName(name));
        expect(column).withContext(`${spec.name}.${name}`).toBeDefined();
        const type = `${String(column?.type)}${column?.isArray ? '[]' : ''}`;
        expect(type).withContext(`${spec.name}.${name} type`).toBe(field.sqlType);
        expect(column?.isNullable).withContext(`${spec.name}.${name} nullable (rows arrive in pieces)`).toBeTrue();
      }
      const expected = [...SYNC_COLUMNS, ...Object.keys(spec.fields).map(columnName)].sort();
      expect([...byColumn.keys()].sort()).toEqual(expected);
    });

    it(`${spec.name}: the migrated table has exactly those columns and types`, async () => {
      const rows: { column_name: string; data_type: string; is_nullable: string }[] = await (
        await testDataSource()
      ).query(`SELECT column_name, data_type, is_nullable FROM information_schema.columns WHERE table_name = $1`, [spec.table]);
      const actual = new Map(rows.map((row) => [row.column_name, row]));

      for (const [name, field] of Object.entries(spec.fields as Record<string, FieldSpec>)) {
        expect(actual.get(columnName(name))?.data_type)
          .withContext(`${spec.name}.${name}`)
          .toBe(INFORMATION_SCHEMA_TYPE[field.sqlType]);
        expect(actual.get(columnName(name))?.is_nullable).toBe('YES');
      }
      expect([...actual.keys()].sort()).toEqual([...SYNC_COLUMNS, ...Object.keys(spec.fields).map(columnName)].sort());
    });
  }
});
