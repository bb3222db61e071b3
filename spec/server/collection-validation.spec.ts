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

  /**
   * Values of the right JSON type that are still wrong. ISBN examples: ISO 2108 (978-0-306-40615-7
   * is valid; the same digits ending 8 fail the check digit; an ISBN-10 is refused because the
   * field stores ISBN-13 digits only).
   */
  const wellTypedButWrong: readonly { collection: string; field: string; value: unknown; reason: RegExp }[] = [
    { collection: 'books', field: 'isbn', value: '9780306406158', reason: /books\.isbn/ },
    { collection: 'books', field: 'isbn', value: '0306406152', reason: /books\.isbn/ },
    { collection: 'books', field: 'isbn', value: '978-0-306-40615-7', reason: /books\.isbn/ },
    { collection: 'books', field: 'rating', value: 4.25, reason: /books\.rating/ },
    { collection: 'books', field: 'rating', value: 5.5, reason: /books\.rating/ },
    { collection: 'books', field: 'pageCount', value: 0, reason: /books\.pageCount/ },
    { collection: 'books', field: 'format', value: 'scroll', reason: /books\.format/ },
    { collection: 'labels', field: 'colour', value: 'chartreuse', reason: /labels\.colour/ },
    { collection: 'labels', field: 'icon', value: 'rocket', reason: /labels\.icon/ },
    { collection: 'yearPlans', field: 'otherGoals', value: [{ id: 'g1', text: 'x'.repeat(301) }], reason: /at most 300 characters/ },
    { collection: 'sessions', field: 'activeMinutes', value: 1201, reason: /sessions\.activeMinutes/ },
  ];

  for (const wrong of wellTypedButWrong) {
    it(`When ${wrong.collection}.${wrong.field} gets ${JSON.stringify(wrong.value).slice(0, 40)}, then the batch is refused and nothing is stored`, async () => {
      const row = randomUUID();
      const good = fieldChange(row, 'deleted', false, { wall: Date.now() }, wrong.collection);
      const res = await client.push([good, fieldChange(row, wrong.field, wrong.value, { wall: Date.now(), counter: 1 }, wrong.collection)]);

      expect(res.status).toBe(400);
      const problems = res.body.error?.details as { index: number; code: string; reason: string }[];
      expect(problems.map((p) => p.index)).toEqual([1]);
      expect(problems[0]!.reason).toMatch(wrong.reason);
      const { state } = await client.pullAll();
      expect([...state.keys()].some((key) => key.includes(row)))
        .withContext('an invalid batch applies nothing')
        .toBeFalse();
    });
  }

  it('When books.isbn gets valid ISBN-13 digits, then it is stored', async () => {
    const row = randomUUID();
    const res = await client.push([fieldChange(row, 'isbn', '9780306406157', { wall: Date.now() })]);
    expect(res.status).toBe(200);
    expect((await client.pullAll()).state.get(`books/${row}/isbn`)?.value).toBe('9780306406157');
  });
});
