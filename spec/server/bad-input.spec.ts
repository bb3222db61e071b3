import { gzipSync } from 'node:zlib';

import type { Express } from 'express';
import fc from 'fast-check';
import request from 'supertest';

import { bearer, GOOD_PASSWORD, registerAdmin, uniqueEmail } from '../support/accounts';
import { listRoutes, type RouteInfo } from '../support/routes';
import { startTestServer, type RunningServer } from '../support/test-server';

/** Parameter values that cannot be ids: not uuids, traversal, injection, control characters, huge. */
const badParam = fc.oneof(
  fc.constantFrom(
    'abc',
    '1',
    '-1',
    '..',
    '%00',
    "1' OR '1'='1",
    'ffffffff-ffff-ffff-ffff-ffffffffffffff',
    '{00000000-0000-0000-0000-000000000000}',
    'x'.repeat(5000),
  ),
  fc.string({ unit: 'binary', maxLength: 80 }).map(encodeURIComponent),
);

/** Bodies: any JSON, strings with NUL and lone surrogates, and values of the wrong shape. */
const badJson = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.dictionary(
    fc.constantFrom(
      'email',
      'password',
      'displayName',
      'deviceName',
      'refreshToken',
      'token',
      'newPassword',
      'currentPassword',
      'name',
      'role',
      'disabled',
      'deviceId',
      'changes',
      '__proto__',
    ),
    fc.oneof(
      fc.string({ unit: 'binary', maxLength: 120 }),
      fc.integer(),
      fc.boolean(),
      fc.constant(null),
      fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 3 }),
    ),
  ),
);

/** The same request again with a raw body of the given kind. */
type RawBody = { type: string; encoding?: string; bytes: Buffer };
const badRaw = fc.oneof(
  fc.uint8Array({ maxLength: 200 }).map((bytes): RawBody => ({ type: 'application/json', bytes: Buffer.from(bytes) })),
  fc.uint8Array({ maxLength: 200 }).map((bytes): RawBody => ({ type: 'application/json', encoding: 'gzip', bytes: Buffer.from(bytes) })),
  fc.constant<RawBody>({ type: 'application/json; charset=latin-9', bytes: Buffer.from('{}') }),
  fc.constant<RawBody>({ type: 'application/json', encoding: 'compress', bytes: Buffer.from('{}') }),
  fc.constant<RawBody>({ type: 'application/json', bytes: Buffer.from(`{"a":"${'x'.repeat(70 * 1024)}"}`) }),
  fc.constant<RawBody>({ type: 'multipart/form-data; boundary=zz', bytes: Buffer.from('--zz\r\nContent-Disposition: form-data; name="file"\r\n\r\nnot an end') }),
  fc.constant<RawBody>({ type: 'text/plain', bytes: Buffer.from('hello') }),
);

function fill(path: string, value: string): string {
  return path.replace(/:[A-Za-z]+/g, value);
}

/** Sends exactly these bytes (supertest would turn a Buffer with a JSON type into JSON text). */
async function sendRaw(
  server: RunningServer,
  method: string,
  path: string,
  headers: Record<string, string>,
  bytes: Buffer,
): Promise<{ status: number; body: unknown }> {
  const res = await fetch(`${server.baseUrl}${path}`, { method, headers, body: method === 'GET' || method === 'HEAD' ? undefined : new Uint8Array(bytes) });
  const text = await res.text();
  return { status: res.status, body: text.startsWith('{') ? JSON.parse(text) : text };
}

describe('Bad ids and bodies', () => {
  let server: RunningServer;
  let app: Express;
  let token: string;
  beforeAll(async () => {
    server = await startTestServer();
    app = server.app;
    token = (await registerAdmin(app)).accessToken;
  });
  afterAll(async () => server.close());

  it('When an id in the path cannot be an id, then devices and admin accounts answer 404, not 500', async () => {
    for (const id of ['not-a-uuid', '12345', 'ffffffff-ffff-ffff-ffff-fffffffffffg']) {
      expect((await request(app).delete(`/api/devices/${id}`).set(bearer(token))).status)
        .withContext(id)
        .toBe(404);
      expect((await request(app).patch(`/api/devices/${id}`).set(bearer(token)).send({ name: 'Kitchen tablet' })).status)
        .withContext(id)
        .toBe(404);
      expect((await request(app).patch(`/api/admin/users/${id}`).set(bearer(token)).send({ disabled: true })).status)
        .withContext(id)
        .toBe(404);
    }
    // A well-formed id nobody has is the same 404.
    expect((await request(app).delete('/api/devices/00000000-0000-4000-8000-000000000000').set(bearer(token))).status).toBe(404);
  });

  it('When a name holds NUL, a control character or a lone surrogate, then it is refused 400 before PostgreSQL sees it', async () => {
    const signedIn = await registerAdmin(app);
    const [device] = (await request(app).get('/api/devices').set(bearer(signedIn.accessToken))).body as { id: string }[];

    for (const bad of ['Ann\u0000a', 'Ann\ud800a', 'Ann\u001b[2Ja']) {
      const register = await request(app).post('/api/auth/register').send({ email: uniqueEmail(), password: GOOD_PASSWORD, displayName: bad });
      const login = await request(app).post('/api/auth/login').send({ email: signedIn.user.email, password: GOOD_PASSWORD, deviceName: bad });
      const rename = await request(app).patch(`/api/devices/${device!.id}`).set(bearer(signedIn.accessToken)).send({ name: bad });

      expect([register.status, register.body.error?.details?.displayName])
        .withContext(JSON.stringify(bad))
        .toEqual([400, 'Use letters, digits, spaces and punctuation only']);
      expect([login.status, rename.status]).withContext(JSON.stringify(bad)).toEqual([400, 400]);
    }
  });

  // Statuses as body-parser documents them (expressjs/body-parser README, "Errors").
  it('When a body is declared gzip but is not, then it answers 400 invalid_encoding', async () => {
    const res = await sendRaw(server, 'POST', '/api/auth/login', { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, Buffer.from('{"email":"x"}'));

    expect(res.status).toBe(400);
    expect((res.body as { error: { code: string } }).error.code).toBe('invalid_encoding');
  });

  it('When a body is real gzip, then it is read as usual', async () => {
    const body = gzipSync(JSON.stringify({ email: 'someone-gzip@example.com', password: 'not the password at all' }));
    const res = await sendRaw(server, 'POST', '/api/auth/login', { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body);

    expect(res.status).withContext(JSON.stringify(res.body)).toBe(401);
  });

  it('When the encoding or charset is one the server does not read, then it answers 415', async () => {
    const encoding = await request(app).post('/api/auth/login').set('Content-Type', 'application/json').set('Content-Encoding', 'compress').send('{}');
    const charset = await request(app).post('/api/auth/login').set('Content-Type', 'application/json; charset=latin-9').send('{}');

    expect([encoding.status, encoding.body.error.code]).toEqual([415, 'unsupported_encoding']);
    expect([charset.status, charset.body.error.code]).toEqual([415, 'unsupported_charset']);
  });

  it('When a JSON body is malformed or too large, then it answers 400 or 413', async () => {
    const malformed = await request(app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email":');
    const large = await request(app)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'x'.repeat(70 * 1024) }));

    expect([malformed.status, malformed.body.error.code]).toEqual([400, 'invalid_json']);
    expect([large.status, large.body.error.code]).toEqual([413, 'too_large']);
  });

  describe('a bounded fuzz over every route', () => {
    // Streams (server-sent events) never end, so a request-and-wait fuzz cannot hit them.
    const streaming = (route: RouteInfo) => route.method === 'GET' && /\/events$/.test(route.path);

    it('finds the routes it fuzzes by walking the app (at least the known ones)', () => {
      const found = listRoutes(app).map((route) => `${route.method} ${route.path}`);
      for (const known of [
        'POST /api/auth/login',
        'PATCH /api/devices/:id',
        'PATCH /api/admin/users/:id',
        'GET /api/sync/pull',
        'POST /api/uploads',
        'GET /api/uploads/:id',
      ]) {
        expect(found).toContain(known);
      }
    });

    it('When any route gets malformed parameters, query strings and bodies, then no answer is a 5xx', async () => {
      const routes = listRoutes(app).filter((route) => !streaming(route));
      const fifth: string[] = [];
      for (const route of routes) {
        // A fresh admin per route: a fuzzed logout or deletion must not spoil the next route.
        const auth = bearer((await registerAdmin(app)).accessToken);
        await fc.assert(
          fc.asyncProperty(
            badParam,
            badJson,
            badRaw,
            fc.dictionary(fc.constantFrom('since', 'limit', 'x'), fc.string({ maxLength: 30 })),
            async (param, json, raw, query) => {
              const path = fill(route.path, param);
              const method = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete' | 'put';
              const withJson = await request(app)[method](path).query(query).set(auth).set('Content-Type', 'application/json').send(JSON.stringify(json));
              const withRaw = await sendRaw(
                server,
                route.method,
                path,
                { ...auth, 'Content-Type': raw.type, ...(raw.encoding ? { 'Content-Encoding': raw.encoding } : {}) },
                raw.bytes,
              );
              for (const res of [withJson, withRaw]) {
                if (res.status >= 500) fifth.push(`${route.method} ${route.path} ${res.status} ${JSON.stringify(res.body)}`);
              }
              return withJson.status < 500 && withRaw.status < 500;
            },
          ),
          { numRuns: 8 },
        );
      }
      expect(fifth).toEqual([]);
      // Bounded: about 30 routes × 8 runs × 2 requests; seconds alone, longer on a busy machine.
    }, 180_000);
  });
});
