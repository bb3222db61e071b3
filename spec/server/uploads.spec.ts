import { createHash } from 'node:crypto';

import type { Express } from 'express';
import request from 'supertest';

import { loadConfig } from '../../sync-server/src/config';
import { removeOrphanedUploads } from '../../sync-server/src/data-access/upload-store';
import { bearer, GOOD_PASSWORD, registerAdmin, registerReader } from '../support/accounts';
import { JPEG, JPEG_SHA256, png, uniquePng, WEBP } from '../support/images';
import { testDataSource } from '../support/test-database';
import { createTestApp } from '../support/test-server';

/** SHA-256 (FIPS 180-4) by node:crypto, in hex: the id the server must give these bytes. */
const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

function upload(app: Express, accessToken: string, bytes: Buffer, file: { filename?: string; contentType?: string } = {}) {
  return request(app)
    .post('/api/uploads')
    .set(bearer(accessToken))
    .attach('file', bytes, { filename: file.filename ?? 'cover.png', contentType: file.contentType ?? 'image/png' });
}

async function storedCopies(id: string): Promise<number> {
  const rows = await (await testDataSource()).query('SELECT count(*)::int AS n FROM uploads WHERE id = $1', [id]);
  return rows[0].n;
}

describe('/api/uploads', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  describe('POST /api/uploads', () => {
    it('When a reader uploads a PNG, then it answers 201 with the SHA-256 of the bytes as id, and GET returns the same bytes and type', async () => {
      const reader = await registerReader(app);
      const image = uniquePng();

      const res = await upload(app, reader.accessToken, image).expect(201);
      const read = await request(app).get(`/api/uploads/${res.body.id}`).set(bearer(reader.accessToken)).expect(200);

      expect(res.body).toEqual({ id: sha256(image), mediaType: 'image/png', byteSize: image.length });
      expect(res.headers['location']).toBe(`/api/uploads/${sha256(image)}`);
      expect(read.headers['content-type']).toBe('image/png');
      expect(Buffer.compare(read.body as Buffer, image)).toBe(0);
    });

    it('When a reader uploads a JPEG and a WebP as a browser encodes them, then each keeps its own type, whatever the file says', async () => {
      const reader = await registerReader(app);

      // Declared as something else on purpose: only the bytes count.
      const jpeg = await upload(app, reader.accessToken, JPEG, { filename: 'cover.webp', contentType: 'image/webp' }).expect(201);
      const webp = await upload(app, reader.accessToken, WEBP, { filename: 'cover.jpg', contentType: 'application/octet-stream' }).expect(201);

      // JPEG_SHA256 is GNU coreutils' sha256sum of these bytes, an implementation outside Node.
      expect(jpeg.body).toEqual({ id: JPEG_SHA256, mediaType: 'image/jpeg', byteSize: 784 });
      expect(webp.body).toEqual({ id: sha256(WEBP), mediaType: 'image/webp', byteSize: 568 });
      const read = await request(app).get(`/api/uploads/${JPEG_SHA256}`).set(bearer(reader.accessToken)).expect(200);
      expect(read.headers['content-type']).toBe('image/jpeg');
      expect(Buffer.compare(read.body as Buffer, JPEG)).toBe(0);
    });

    it('When a reader uploads the same image twice, then the second answer is 200 with the same id and one copy is stored', async () => {
      const reader = await registerReader(app);
      const image = uniquePng();

      const first = await upload(app, reader.accessToken, image).expect(201);
      const again = await upload(app, reader.accessToken, image, { filename: 'another-name.png' }).expect(200);

      expect(again.body).toEqual(first.body);
      expect(await storedCopies(first.body.id)).toBe(1);
    });

    it('When two readers upload the same image, then it is stored once, both may read it, and neither learns of the other', async () => {
      const one = await registerReader(app);
      const other = await registerReader(app);
      const image = uniquePng();

      const first = await upload(app, one.accessToken, image).expect(201);
      // 201 again: "already stored" would tell the second reader that someone else has this image.
      const second = await upload(app, other.accessToken, image).expect(201);

      expect(second.body.id).toBe(first.body.id);
      expect(await storedCopies(first.body.id)).toBe(1);
      await request(app).get(`/api/uploads/${first.body.id}`).set(bearer(other.accessToken)).expect(200);
    });

    it('When a text file named cover.png is sent as image/png, then it answers 400 unsupported_type and stores nothing', async () => {
      const reader = await registerReader(app);
      const text = Buffer.from('Not a picture at all, only words about one.\n', 'utf8');

      const res = await upload(app, reader.accessToken, text, { filename: 'cover.png', contentType: 'image/png' }).expect(400);

      expect(res.body.error.code).toBe('unsupported_type');
      expect(res.body.error.details).toEqual({ file: 'must be a JPEG, PNG or WebP image' });
      expect(await storedCopies(sha256(text))).toBe(0);
    });

    it('When an image of another type (a GIF) is sent, then it answers 400 unsupported_type', async () => {
      const reader = await registerReader(app);
      // The 1 × 1 transparent GIF89a of many web pages (GIF89a spec: header, screen, table, extension, image, trailer).
      const gif = Buffer.from('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7', 'base64');

      const res = await upload(app, reader.accessToken, gif, { filename: 'cover.gif', contentType: 'image/gif' }).expect(400);

      expect(res.body.error.code).toBe('unsupported_type');
    });

    it('When the image is larger than LAMPLIGHT_UPLOAD_MAX_BYTES, then it answers 413 too_large; one within the limit is taken', async () => {
      const small = await createTestApp({ LAMPLIGHT_UPLOAD_MAX_BYTES: '1024' });
      const reader = await registerReader(small);
      const big = uniquePng({ padding: 1024 });

      const res = await upload(small, reader.accessToken, big).expect(413);
      await upload(small, reader.accessToken, JPEG, { filename: 'cover.jpg', contentType: 'image/jpeg' }).expect(201); // 784 bytes

      expect(res.body.error).toEqual({ code: 'too_large', message: 'The image is larger than 1024 bytes', details: { file: 'must be at most 1024 bytes' } });
      expect(await storedCopies(sha256(big))).toBe(0);
    });

    it('When the file field is missing, then it answers 400 naming `file`', async () => {
      const reader = await registerReader(app);

      const onlyText = await request(app).post('/api/uploads').set(bearer(reader.accessToken)).field('title', 'The Lantern Keeper').expect(400);
      const noBody = await request(app).post('/api/uploads').set(bearer(reader.accessToken)).expect(400);
      const rawImage = await request(app).post('/api/uploads').set(bearer(reader.accessToken)).type('image/png').send(png()).expect(400);

      for (const res of [onlyText, noBody, rawImage]) {
        expect(res.body.error.code).toBe('invalid_input');
        expect(Object.keys(res.body.error.details)).toEqual(['file']);
      }
    });

    it('When the image comes in another field, or two come at once, then it answers 400 naming `file`', async () => {
      const reader = await registerReader(app);

      const otherField = await request(app)
        .post('/api/uploads')
        .set(bearer(reader.accessToken))
        .attach('cover', png(), { filename: 'cover.png', contentType: 'image/png' })
        .expect(400);
      const two = await request(app)
        .post('/api/uploads')
        .set(bearer(reader.accessToken))
        .attach('file', png(), { filename: 'front.png', contentType: 'image/png' })
        .attach('file', uniquePng(), { filename: 'back.png', contentType: 'image/png' })
        .expect(400);

      expect(otherField.body.error.details).toEqual({ file: 'send exactly one image, in the multipart field "file"' });
      expect(two.body.error.details).toEqual({ file: 'send exactly one image, in the multipart field "file"' });
    });

    it('When the multipart body is malformed, then it answers 400, not 500', async () => {
      const reader = await registerReader(app);

      const cut = await request(app)
        .post('/api/uploads')
        .set(bearer(reader.accessToken))
        .set('Content-Type', 'multipart/form-data; boundary=lamplight')
        .send('--lamplight\r\nContent-Disposition: form-data; name="file"; filename="cover.png"\r\n\r\n\x89PNG');
      const noBoundary = await request(app).post('/api/uploads').set(bearer(reader.accessToken)).set('Content-Type', 'multipart/form-data').send('whatever');

      for (const res of [cut, noBoundary]) {
        expect(res.status).toBe(400);
        expect(res.body.error).toEqual({
          code: 'invalid_input',
          message: 'The upload is not well-formed multipart/form-data',
          details: { body: 'send exactly one image, in the multipart field "file"' },
        });
      }
    });

    it('When nobody is signed in, then uploading and reading both answer 401', async () => {
      const reader = await registerReader(app);
      const { id } = (await upload(app, reader.accessToken, uniquePng()).expect(201)).body;

      await request(app).post('/api/uploads').attach('file', png(), { filename: 'cover.png', contentType: 'image/png' }).expect(401);
      await request(app).get(`/api/uploads/${id}`).expect(401);
    });
  });

  describe('GET /api/uploads/:id', () => {
    it('When another reader asks for your upload, then it is not found, exactly as an unknown or malformed id is', async () => {
      const owner = await registerReader(app);
      const stranger = await registerReader(app);
      const { id } = (await upload(app, owner.accessToken, uniquePng()).expect(201)).body;

      const theirs = await request(app).get(`/api/uploads/${id}`).set(bearer(stranger.accessToken)).expect(404);
      const unknown = await request(app)
        .get(`/api/uploads/${'0'.repeat(64)}`)
        .set(bearer(stranger.accessToken))
        .expect(404);
      const malformed = await request(app).get('/api/uploads/not-a-digest').set(bearer(stranger.accessToken)).expect(404);
      const upperCase = await request(app).get(`/api/uploads/${id.toUpperCase()}`).set(bearer(owner.accessToken)).expect(404);

      expect(theirs.body).toEqual(unknown.body);
      expect(malformed.body).toEqual(unknown.body);
      expect(upperCase.body).toEqual(unknown.body);
      expect(theirs.headers['etag']).not.toBe(`"${id}"`);
      // Not the owner's long-lived caching: the API's default no-store.
      expect(theirs.headers['cache-control']).toBe('no-store');
    });

    it('When a reader reads an upload, then it may be cached for good, and If-None-Match answers 304 without the bytes', async () => {
      const reader = await registerReader(app);
      const { id } = (await upload(app, reader.accessToken, uniquePng()).expect(201)).body;

      const read = await request(app).get(`/api/uploads/${id}`).set(bearer(reader.accessToken)).expect(200);
      const same = await request(app).get(`/api/uploads/${id}`).set(bearer(reader.accessToken)).set('If-None-Match', read.headers['etag']!).expect(304);
      const inList = await request(app)
        .get(`/api/uploads/${id}`)
        .set(bearer(reader.accessToken))
        .set('If-None-Match', `"${'1'.repeat(64)}", W/"${id}"`)
        .expect(304);
      const other = await request(app)
        .get(`/api/uploads/${id}`)
        .set(bearer(reader.accessToken))
        .set('If-None-Match', `"${'1'.repeat(64)}"`)
        .expect(200);

      // An entity tag is a quoted string (RFC 9110 §8.8.3); ours is the id.
      expect(read.headers['etag']).toBe(`"${id}"`);
      expect(read.headers['cache-control']).toBe('private, max-age=31536000, immutable');
      expect(read.headers['x-content-type-options']).toBe('nosniff');
      for (const res of [same, inList]) {
        expect(res.headers['etag']).toBe(`"${id}"`);
        expect(res.headers['cache-control']).toBe('private, max-age=31536000, immutable');
        expect(res.text ?? '').toBe('');
      }
      expect((other.body as Buffer).length).toBeGreaterThan(0);
    });

    it('When a stranger sends If-None-Match for your upload, then it is still not found', async () => {
      const owner = await registerReader(app);
      const stranger = await registerReader(app);
      const { id } = (await upload(app, owner.accessToken, uniquePng()).expect(201)).body;

      await request(app).get(`/api/uploads/${id}`).set(bearer(stranger.accessToken)).set('If-None-Match', `"${id}"`).expect(404);
    });
  });

  describe('Stored data size', () => {
    it('When a reader uploads images, then the admin list counts their bytes, for each reader who owns one', async () => {
      const admin = await registerAdmin(app);
      const one = await registerReader(app);
      const other = await registerReader(app);
      // The list is paged: search for the reader's address so they are on the first page.
      const storedBytes = async (user: { id: string; email: string }) =>
        (await request(app).get('/api/admin/users').query({ q: user.email }).set(bearer(admin.accessToken)).expect(200)).body.accounts.find(
          (u: { id: string }) => u.id === user.id,
        ).storedBytes as number;
      const before = { one: await storedBytes(one.user), other: await storedBytes(other.user) };
      const shared = uniquePng();
      const own = uniquePng({ padding: 100 });

      await upload(app, one.accessToken, shared).expect(201);
      await upload(app, one.accessToken, own).expect(201);
      await upload(app, other.accessToken, shared).expect(201);
      await upload(app, one.accessToken, own).expect(200); // a repeat adds nothing

      expect(await storedBytes(one.user)).toBe(before.one + shared.length + own.length);
      expect(await storedBytes(other.user)).toBe(before.other + shared.length);
    });
  });

  describe('Deleting the account', () => {
    it('When a reader deletes their account, then their images go unless another reader owns them too', async () => {
      const leaving = await registerReader(app);
      const staying = await registerReader(app);
      const onlyTheirs = uniquePng();
      const shared = uniquePng();
      await upload(app, leaving.accessToken, onlyTheirs).expect(201);
      await upload(app, leaving.accessToken, shared).expect(201);
      await upload(app, staying.accessToken, shared).expect(201);

      await request(app).delete('/api/auth/account').set(bearer(leaving.accessToken)).send({ password: GOOD_PASSWORD }).expect(204);

      const db = await testDataSource();
      expect(await db.query('SELECT 1 FROM upload_owners WHERE user_id = $1', [leaving.user.id])).toEqual([]);
      expect(await storedCopies(sha256(onlyTheirs))).toBe(0);
      expect(await storedCopies(sha256(shared))).toBe(1);
      const read = await request(app)
        .get(`/api/uploads/${sha256(shared)}`)
        .set(bearer(staying.accessToken))
        .expect(200);
      expect(Buffer.compare(read.body as Buffer, shared)).toBe(0);
    });

    it('When an image is uploaded while its last owner’s deletion is removing it, then the new upload keeps it', async () => {
      const db = await testDataSource();
      const leaving = await registerReader(app);
      const arriving = await registerReader(app);
      const image = uniquePng();
      const id = sha256(image);
      await upload(app, leaving.accessToken, image).expect(201);

      // The account deletion, held open after it has locked the image it is about to remove.
      const deletion = db.createQueryRunner();
      await deletion.connect();
      try {
        await deletion.startTransaction();
        await deletion.query('DELETE FROM users WHERE id = $1', [leaving.user.id]);
        await deletion.query('SELECT 1 FROM uploads WHERE id = $1 FOR UPDATE', [id]);

        // `then` sends the request now; it finds the image stored and waits for the lock.
        const arrival = upload(app, arriving.accessToken, image).then((res) => res.status);
        await waitForLockWait('FOR KEY SHARE');
        await removeOrphanedUploads(deletion.manager, [id]);
        await deletion.commitTransaction();

        expect(await arrival).toBe(201);
      } finally {
        if (deletion.isTransactionActive) await deletion.rollbackTransaction();
        await deletion.release();
      }
      expect(await storedCopies(id)).toBe(1);
      const read = await request(app).get(`/api/uploads/${id}`).set(bearer(arriving.accessToken)).expect(200);
      expect(Buffer.compare(read.body as Buffer, image)).toBe(0);
    });
  });

  describe('LAMPLIGHT_UPLOAD_MAX_BYTES', () => {
    const base = { DATABASE_URL: 'postgres://127.0.0.1/x', LAMPLIGHT_JWT_SECRET: 'spec-secret-that-is-at-least-32-characters-long' };

    it('When it is unset, then uploads may be up to 2 MiB; when it is not a sensible size, then start-up names it', () => {
      expect(loadConfig(base).uploadMaxBytes).toBe(2_097_152);
      expect(loadConfig({ ...base, LAMPLIGHT_UPLOAD_MAX_BYTES: '500000' }).uploadMaxBytes).toBe(500_000);
      for (const bad of ['lots', '1.5', '10', String(64 * 1024 * 1024)]) {
        expect(() => loadConfig({ ...base, LAMPLIGHT_UPLOAD_MAX_BYTES: bad }))
          .withContext(bad)
          .toThrowError(/LAMPLIGHT_UPLOAD_MAX_BYTES/);
      }
    });
  });
});

/** Waits until some statement of this database (matching `statementPart`) is waiting for a lock. */
async function waitForLockWait(statementPart: string): Promise<void> {
  const db = await testDataSource();
  for (let tries = 0; tries < 200; tries++) {
    const waiting = await db.query(
      `SELECT 1 FROM pg_stat_activity
        WHERE datname = current_database() AND wait_event_type = 'Lock' AND query LIKE '%' || $1 || '%'`,
      [statementPart],
    );
    if (waiting.length > 0) return;
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  throw new Error(`no statement with ${statementPart} came to wait for a lock`);
}
