import { randomUUID } from 'node:crypto';

import { COLLECTIONS } from '../../shared/sync/schema/collections';
import type { FieldSpec } from '../../shared/sync/schema/field';
import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { startTestServer, type RunningServer } from '../support/test-server';

/** A value of the wrong JSON type for a field stored as `sqlType`. */
function wrongType(field: FieldSpec): unknown {
  switch (field.sqlType) {
    case 'text':
    case 'uuid':
      return 42;
    case 'text[]':
      return 'not a list';
    case 'jsonb':
      return 'not a list of entries';
    default:
      return 'not a number or boolean';
  }
}

describe('Every synced collection validates each of its fields on push', () => {
  let server: RunningServer;
  let client: SyncClient;

  beforeAll(async () => {
    server = await startTestServer();
    client = new SyncClient(server.baseUrl, (await registerReader(server.app)).accessToken);
  });
  afterAll(() => server.close());

  for (const spec of Object.values(COLLECTIONS)) {
    it(`When a ${spec.name} field gets a value of the wrong type, then the batch is refused naming that field`, async () => {
      const fields = Object.entries(spec.fields as Record<string, FieldSpec>);
      const row = randomUUID();
      const batch = fields.map(([name, field], n) => fieldChange(row, name, wrongType(field), { wall: Date.now(), counter: n }, spec.name));

      const res = await client.push(batch);

      expect(res.status).toBe(400);
      const problems = res.body.error?.details as { index: number; code: string; reason: string }[];
      expect(problems.map((p) => p.index)).toEqual(fields.map((_, n) => n));
      for (const [n, [name]] of fields.entries()) {
        expect(problems[n]!.code).toBe('invalid_value');
        expect(problems[n]!.reason).toContain(`${spec.name}.${name}`);
      }
    });

    it(`When a ${spec.name} row arrives with only its tombstone and one nullable field, then it is accepted`, async () => {
      const nullable = Object.entries(spec.fields as Record<string, FieldSpec>).find(([, field]) => field.schema.safeParse(null).success);
      const row = randomUUID();
      const batch = [fieldChange(row, 'deleted', false, { wall: Date.now() }, spec.name)];
      if (nullable) batch.push(fieldChange(row, nullable[0], null, { wall: Date.now(), counter: 1 }, spec.name));

      const res = await client.push(batch);

      expect(res.status).toBe(200);
      expect(res.body.applied).toBe(batch.length);
    });
  }
});
