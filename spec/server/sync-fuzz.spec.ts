import { randomUUID } from 'node:crypto';

import fc from 'fast-check';

import { formatHlc } from '../../shared/sync/hlc';
import { COLLECTIONS } from '../../shared/sync/schema/collections';
import { registerReader } from '../support/accounts';
import { startTestServer, type RunningServer } from '../support/test-server';

const NAMES = Object.keys(COLLECTIONS);
const FIELDS = [...new Set(Object.values(COLLECTIONS).flatMap((spec) => Object.keys(spec.fields)))];
const AWKWARD = ['__proto__', 'constructor', 'prototype', 'hasOwnProperty', 'toString', ''];

/** Values of every shape, with text that may hold NUL, lone surrogates and any code unit. */
const valueArb = fc.oneof(
  fc.jsonValue(),
  fc.string({ unit: 'binary' }),
  fc.string({ unit: fc.constantFrom('\u0000', '\ud800', '\udfff', 'a', '😀', '\\', '"') }),
  fc.dictionary(fc.oneof(fc.constantFrom(...AWKWARD), fc.string()), fc.jsonValue()),
  fc.array(fc.string({ unit: 'binary' })),
  fc.double(),
);
const changeArb = fc.record(
  {
    id: fc.oneof(
      fc.uuid().map((id) => id.toLowerCase()),
      fc.string(),
    ),
    collection: fc.oneof(fc.constantFrom(...NAMES, ...AWKWARD), fc.string()),
    rowId: fc.oneof(
      fc.uuid().map((id) => id.toLowerCase()),
      fc.constant(randomUUID()),
    ),
    field: fc.oneof(fc.constantFrom(...FIELDS, ...AWKWARD), fc.string()),
    value: valueArb,
    hlc: fc.oneof(
      fc.integer({ min: -3, max: 3 }).map((days) => formatHlc({ wall: Date.now() + days * 86_400_000, counter: 0, node: 'fuzz' })),
      fc.string(),
    ),
  },
  { requiredKeys: [] },
);
/** Well-formed envelopes on real fields, so the values themselves reach the merge and PostgreSQL. */
const PAIRS = Object.values(COLLECTIONS).flatMap((spec) => Object.keys(spec.fields).map((field) => [spec.name, field] as const));
const nearlyValidArb = fc
  .record({
    id: fc.uuid({ version: 4 }),
    rowId: fc.uuid({ version: 4 }),
    pair: fc.constantFrom(...PAIRS),
    value: fc.oneof(
      { weight: 3, arbitrary: fc.string({ unit: fc.constantFrom('\u0000', '\ud800', '\udfff', 'a', '😀'), maxLength: 6 }) },
      { weight: 1, arbitrary: valueArb },
    ),
  })
  .map(({ id, rowId, pair: [collection, field], value }) => ({
    id,
    rowId,
    collection,
    field,
    value,
    hlc: formatHlc({ wall: Date.now(), counter: 0, node: 'fuzz' }),
  }));
const bodyArb = fc.oneof(
  fc.record({ deviceId: fc.constant('fuzz-device'), changes: fc.array(nearlyValidArb, { minLength: 1, maxLength: 4 }) }),
  fc.record({ deviceId: fc.oneof(fc.string(), fc.constant('fuzz-device')), changes: fc.array(changeArb, { maxLength: 8 }) }, { requiredKeys: [] }),
  fc.anything(),
);

// The brief: no input may ever produce a 5xx from the sync routes. Bounded so it runs in npm test.
describe('Sync routes under random input (fast-check)', () => {
  let server: RunningServer;
  let token: string;
  beforeAll(async () => {
    server = await startTestServer();
    token = (await registerReader(server.app)).accessToken;
  });
  afterAll(() => server.close());

  const send = (path: string, init: RequestInit = {}) =>
    fetch(`${server.baseUrl}${path}`, { ...init, headers: { 'content-type': 'application/json', authorization: `Bearer ${token}`, ...init.headers } });

  it('never answers a push with a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(bodyArb, async (body) => {
        const res = await send('/api/sync/push', { method: 'POST', body: JSON.stringify(body) ?? 'null' });
        expect(res.status).withContext(JSON.stringify(body)).toBeLessThan(500);
        await res.arrayBuffer();
      }),
      { numRuns: 150 },
    );
  });

  it('never answers raw bytes pushed as JSON with a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ maxLength: 200 }), async (bytes) => {
        const res = await send('/api/sync/push', { method: 'POST', body: bytes });
        expect(res.status).toBeLessThan(500);
        await res.arrayBuffer();
      }),
      { numRuns: 40 },
    );
  });

  it('never answers a pull with a 5xx, whatever the cursor and limit', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string({ unit: 'binary' }), fc.oneof(fc.string(), fc.integer().map(String)), async (since, limit) => {
        const res = await send(`/api/sync/pull?since=${encodeURIComponent(since)}&limit=${encodeURIComponent(limit)}`);
        expect(res.status).toBeLessThan(500);
        await res.arrayBuffer();
      }),
      { numRuns: 60 },
    );
  });

  it('answers a field or collection named __proto__ or constructor with 400 naming it', async () => {
    for (const [collection, field] of [
      ['books', '__proto__'],
      ['books', 'constructor'],
      ['__proto__', 'title'],
      ['constructor', 'title'],
    ]) {
      const change = { id: randomUUID(), collection, rowId: randomUUID(), field, value: 'x', hlc: formatHlc({ wall: Date.now(), counter: 0, node: 'd' }) };
      const res = await send('/api/sync/push', { method: 'POST', body: `{"deviceId":"d","changes":[${JSON.stringify(change)}]}` });
      const body = (await res.json()) as { error: { details: { code: string; reason: string }[] } };
      expect(res.status).toBe(400);
      expect(body.error.details[0]!.reason).toContain(collection === 'books' ? field : collection);
    }
  });
});
