import type { Express } from 'express';
import { imageSize } from 'image-size';
import request from 'supertest';

import { MAX_IMAGE_SIDES } from '../../sync-server/src/domain/uploads';
import { bearer, registerReader } from '../support/accounts';
import { JPEG, png, pngClaiming, pngWithText, uniquePng, WEBP } from '../support/images';
import { createTestApp } from '../support/test-server';

function upload(app: Express, accessToken: string, bytes: Buffer, filename = 'cover.png') {
  return request(app).post('/api/uploads').set(bearer(accessToken)).attach('file', bytes, { filename, contentType: 'image/png' });
}

const HTML = '<html><body><script>fetch("/api/auth/me")</script></body></html>';

describe('POST /api/uploads reads the image, not just its first bytes', () => {
  let app: Express;
  let token: string;
  beforeAll(async () => {
    app = await createTestApp();
    token = (await registerReader(app)).accessToken;
  });

  it('When a PNG claims 30000 × 30000 pixels in a small file, then it is refused with its real size', async () => {
    const bomb = pngClaiming(30000, 30000);
    // The reference reader agrees about what the header says.
    expect(imageSize(bomb)).toEqual(jasmine.objectContaining({ width: 30000, height: 30000, type: 'png' }));

    const res = await upload(app, token, bomb).expect(400);

    expect(res.body.error.code).toBe('unreadable_image');
    expect(res.body.error.details.file).toContain('30000 × 30000');
  });

  it('When an image is at most 4000 × 6000 either way round, then its size is accepted; one pixel more is not', async () => {
    expect(MAX_IMAGE_SIDES).toEqual({ short: 4000, long: 6000 });
    await upload(app, token, pngClaiming(4000, 6000)).expect(201);
    await upload(app, token, pngClaiming(6000, 4000)).expect(201);
    await upload(app, token, pngClaiming(4001, 6000)).expect(400);
    await upload(app, token, pngClaiming(4000, 6001)).expect(400);
  });

  it('When HTML follows a whole PNG (an image/HTML polyglot), then it is refused', async () => {
    const res = await upload(app, token, Buffer.concat([png(), Buffer.from(HTML)])).expect(400);

    expect(res.body.error.details.file).toBe('there are bytes after the end of the PNG');
  });

  it('When HTML hides inside a PNG text chunk with a right CRC, then it is refused', async () => {
    const res = await upload(app, token, pngWithText(HTML)).expect(400);

    expect(res.body.error.details.file).toBe('it holds web-page markup');
  });

  it('When HTML follows a whole JPEG, or sits in a JPEG comment segment, then it is refused', async () => {
    await upload(app, token, Buffer.concat([JPEG, Buffer.from(HTML)]), 'cover.jpg').expect(400);
    // T.81 B.2.4.5: a COM segment is FFFE, a 2-byte length, then the comment.
    const comment = Buffer.from(HTML, 'latin1');
    const com = Buffer.concat([Buffer.from([0xff, 0xfe, (comment.length + 2) >> 8, (comment.length + 2) & 0xff]), comment]);
    const res = await upload(app, token, Buffer.concat([JPEG.subarray(0, 2), com, JPEG.subarray(2)]), 'cover.jpg').expect(400);

    expect(res.body.error.details.file).toBe('it holds web-page markup');
  });

  it('When HTML sits in a WebP metadata chunk (XMP), then it is refused', async () => {
    // RFC 9649 §2.7: a chunk is a FourCC, a little-endian size, the data, and a pad byte if odd.
    const xmp = Buffer.from(HTML.length % 2 ? `${HTML} ` : HTML, 'latin1');
    const header = Buffer.alloc(8);
    header.write('XMP ', 0, 'latin1');
    header.writeUInt32LE(xmp.length, 4);
    const withXmp = Buffer.concat([WEBP, header, xmp]);
    withXmp.writeUInt32LE(withXmp.length - 8, 4);

    const res = await upload(app, token, withXmp, 'cover.webp').expect(400);

    expect(res.body.error.details.file).toBe('it holds web-page markup');
  });

  it('When a PNG chunk is damaged, then its CRC gives it away and it is refused', async () => {
    const damaged = png();
    damaged[damaged.length - 20]! ^= 0xff; // a byte of the IDAT data

    const res = await upload(app, token, damaged).expect(400);

    expect(res.body.error.details.file).toContain('CRC');
  });

  it('When a WebP is malformed (wrong size, cut short, damaged image chunk), then it is refused, not stored', async () => {
    const wrongSize = Buffer.from(WEBP);
    wrongSize.writeUInt32LE(wrongSize.readUInt32LE(4) + 100, 4);
    const cutShort = Buffer.from(WEBP.subarray(0, WEBP.length - 30));
    cutShort.writeUInt32LE(cutShort.length - 8, 4);
    const damaged = Buffer.from(WEBP);
    const vp8 = damaged.indexOf('VP8 ', 12, 'latin1');
    damaged[vp8 + 8 + 3] = 0; // the key frame start code, RFC 6386 §9.1

    for (const [name, bytes] of [
      ['wrong size', wrongSize],
      ['cut short', cutShort],
      ['damaged', damaged],
    ] as const) {
      const res = await upload(app, token, bytes, 'cover.webp');
      expect(res.status).withContext(name).toBe(400);
      expect(res.body.error.code).withContext(name).toBe('unreadable_image');
    }
  });

  it('When the JPEG and WebP are as a browser encodes them, then they are still taken', async () => {
    expect((await upload(app, token, JPEG, 'cover.jpg')).status).toBeLessThan(300);
    expect((await upload(app, token, WEBP, 'cover.webp')).status).toBeLessThan(300);
  });
});

describe('Cover storage quota and request limits per reader', () => {
  it('When a reader’s covers would go beyond LAMPLIGHT_UPLOAD_QUOTA_BYTES, then it answers 413 quota_full with a plain reason', async () => {
    const app = await createTestApp({ LAMPLIGHT_UPLOAD_QUOTA_BYTES: '2048' });
    const reader = await registerReader(app);
    const other = await registerReader(app);
    const first = uniquePng({ padding: 1200 });
    const second = uniquePng({ padding: 1200 });

    await upload(app, reader.accessToken, first).expect(201);
    const full = await upload(app, reader.accessToken, second).expect(413);

    expect(full.body.error.code).toBe('quota_full');
    expect(full.body.error.message).toContain('Your cover storage is full');
    // What they already have is unaffected, and another reader has their own quota.
    await upload(app, reader.accessToken, first).expect(200);
    await upload(app, other.accessToken, second).expect(201);
  });

  it('When one reader sends too many uploads, then they get 429; reading covers and other readers are not held back', async () => {
    const app = await createTestApp({ LAMPLIGHT_UPLOAD_RATE_LIMIT: '2' });
    const reader = await registerReader(app);
    const other = await registerReader(app);

    const { id } = (await upload(app, reader.accessToken, uniquePng()).expect(201)).body;
    await upload(app, reader.accessToken, uniquePng()).expect(201);
    const limited = await upload(app, reader.accessToken, uniquePng()).expect(429);

    expect(limited.body.error.code).toBe('too_many_requests');
    await request(app).get(`/api/uploads/${id}`).set(bearer(reader.accessToken)).expect(200);
    await upload(app, other.accessToken, uniquePng()).expect(201);
  });

  it('When one reader sends too many sync requests, then they get 429, whatever address they come from', async () => {
    const app = await createTestApp({ LAMPLIGHT_SYNC_RATE_LIMIT: '3', LAMPLIGHT_TRUST_PROXY: 'loopback' });
    const reader = await registerReader(app);
    const other = await registerReader(app);
    const pull = (token: string, from: string) => request(app).get('/api/sync/pull').set(bearer(token)).set('X-Forwarded-For', from);

    for (let i = 1; i <= 3; i++) await pull(reader.accessToken, `192.0.2.${i}`).expect(200);
    const limited = await pull(reader.accessToken, '192.0.2.99').expect(429);

    expect(limited.body.error.code).toBe('too_many_requests');
    await pull(other.accessToken, '192.0.2.1').expect(200);
  });
});
