import { HttpEventType } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';

import type { JournalDb } from '../data/journal-db';
import { CoverError } from './cover-error';
import { Covers } from './covers';
import { sha256Hex } from './sha256-hex';
import { useCoverJournal } from './testing/cover-journal';
import { drawnImage } from './testing/test-images';

/** Real IndexedDB in Chromium, one fresh database per spec; the network is HttpTestingController. */
describe('Covers', () => {
  let covers: Covers;
  const shared = useCoverJournal();

  const turn = () => new Promise((resolve) => setTimeout(resolve, 5));
  const db = (): JournalDb => shared().journal.db;

  const sent = (url: string) => shared().sent(url);

  /** A cover stored as an earlier visit would have left it: waiting to upload, unless said otherwise. */
  async function storedCover(state: 'pending' | 'uploaded' = 'pending'): Promise<{ id: string; blob: Blob }> {
    const blob = await drawnImage(20, 30, 'image/webp');
    const id = await sha256Hex(blob);
    await db().covers.add({ id, blob, mediaType: 'image/webp', state });
    return { id, blob };
  }

  const offline = () => spyOnProperty(navigator, 'onLine').and.returnValue(false);
  const apiError = (code: string, message: string) => ({ error: { code, message, details: { file: message } } });
  /** An error body as a blob request receives it. */
  const blobError = (code: string, message: string) => new Blob([JSON.stringify(apiError(code, message))], { type: 'application/json' });

  beforeEach(() => {
    covers = TestBed.inject(Covers);
  });

  describe('saving', () => {
    beforeEach(offline); // keeps save's upload round from starting

    it('keeps the prepared image on this device as pending, named by the SHA-256 of its bytes', async () => {
      const id = await covers.save(await drawnImage(1200, 1800));

      const stored = await db().covers.get(id);
      expect(stored).toEqual(jasmine.objectContaining({ id, mediaType: 'image/webp', state: 'pending' }));
      expect(await sha256Hex(stored!.blob)).toBe(id);
      const bitmap = await createImageBitmap(stored!.blob);
      expect([bitmap.width, bitmap.height]).toEqual([400, 600]);
    });

    it('stores the same picture once, and keeps what is known about it', async () => {
      const picture = await drawnImage(90, 120);
      const id = await covers.save(picture);
      await db().covers.update(id, { state: 'uploaded' });

      expect(await covers.save(picture)).toBe(id);
      expect(await db().covers.count()).toBe(1);
      expect((await db().covers.get(id))?.state).toBe('uploaded');
    });

    it('refuses a file that is not an image and stores nothing', async () => {
      await expectAsync(covers.save(new Blob(['a grocery list'], { type: 'text/plain' }))).toBeRejectedWithError(
        CoverError,
        'This file is not an image Lamplight can read. Try a JPEG, PNG or WebP picture.',
      );
      expect(await db().covers.count()).toBe(0);
    });
  });

  describe('uploading', () => {
    it('posts each pending cover as multipart, shows its progress, and marks it uploaded', async () => {
      const { id, blob } = await storedCover();

      const round = covers.uploadPending();
      const request = await sent('/api/uploads');
      expect(request.request.method).toBe('POST');
      expect(request.request.reportProgress).toBeTrue();
      const sentFile = (request.request.body as FormData).get('file') as File;
      expect(await sha256Hex(sentFile)).toBe(id);
      expect(sentFile.type).toBe('image/webp');
      expect(covers.uploadProgress().get(id)).toBe(0);

      request.event({ type: HttpEventType.UploadProgress, loaded: 300, total: 1200 });
      expect(covers.uploadProgress().get(id)).toBe(0.25);

      request.flush({ id, mediaType: 'image/webp', byteSize: blob.size }, { status: 201, statusText: 'Created' });
      await round;
      expect((await db().covers.get(id))?.state).toBe('uploaded');
      expect(covers.uploadProgress().has(id)).toBeFalse();
    });

    it('marks a cover the server refuses as refused, with the server’s reason, and goes on to the next', async () => {
      const first = await storedCover();
      const second = { blob: await drawnImage(20, 31, 'image/webp') };
      const secondId = await sha256Hex(second.blob);
      await db().covers.add({ id: secondId, blob: second.blob, mediaType: 'image/webp', state: 'pending' });
      // Each cover gets its own refusal, whichever the round sends first (a round may already
      // have taken the first cover before the second was stored).
      const refusals = new Map([
        [first.id, { body: apiError('too_large', 'The image is larger than 2097152 bytes'), status: 413, statusText: 'Payload Too Large' }],
        [secondId, { body: apiError('unsupported_type', 'Covers must be JPEG, PNG or WebP images'), status: 400, statusText: 'Bad Request' }],
      ]);

      const round = covers.uploadPending();
      for (let answered = 0; answered < 2; answered++) {
        const request = await sent('/api/uploads');
        const refusal = refusals.get(await sha256Hex((request.request.body as FormData).get('file') as File))!;
        request.flush(refusal.body, { status: refusal.status, statusText: refusal.statusText });
      }
      await round;

      expect(await db().covers.get(first.id)).toEqual(jasmine.objectContaining({ state: 'refused', problem: 'The image is larger than 2097152 bytes' }));
      expect(await db().covers.get(secondId)).toEqual(jasmine.objectContaining({ state: 'refused', problem: 'Covers must be JPEG, PNG or WebP images' }));
    });

    it('when the reader’s cover storage is full, keeps the cover on this device with the server’s plain reason', async () => {
      const { id } = await storedCover();
      const full = 'Your cover storage is full (200 MB); covers already saved stay as they are';

      const round = covers.uploadPending();
      (await sent('/api/uploads')).flush(apiError('quota_full', full), { status: 413, statusText: 'Content Too Large' });
      await round;

      expect(await db().covers.get(id)).toEqual(jasmine.objectContaining({ state: 'refused', problem: full }));
    });

    it('when uploads come too fast for the server (429), keeps the cover pending to try again later', async () => {
      const { id } = await storedCover();

      const round = covers.uploadPending();
      (await sent('/api/uploads')).flush(apiError('too_many_requests', 'Too many upload requests'), { status: 429, statusText: 'Too Many Requests' });
      await round;

      expect((await db().covers.get(id))?.state).toBe('pending');
    });

    it('keeps a cover pending when the server cannot be reached, and uploads it on a later round', async () => {
      const { id, blob } = await storedCover();

      const failed = covers.uploadPending();
      (await sent('/api/uploads')).error(new ProgressEvent('error'), { status: 0, statusText: '' });
      await failed;
      expect((await db().covers.get(id))?.state).toBe('pending');
      expect(covers.uploadProgress().has(id)).toBeFalse();

      const retried = covers.uploadPending();
      (await sent('/api/uploads')).flush({ id, mediaType: 'image/webp', byteSize: blob.size });
      await retried;
      expect((await db().covers.get(id))?.state).toBe('uploaded');
    });

    it('counts as offline when the service worker answers 504 though the browser says online, until an upload goes through', async () => {
      const { id, blob } = await storedCover();
      expect(covers.online()).toBeTrue();

      const failed = covers.uploadPending();
      // The Angular service worker's own answer with no network: 504 and no API error body.
      (await sent('/api/uploads')).flush('', { status: 504, statusText: 'Gateway Timeout' });
      await failed;
      expect(covers.online()).toBeFalse();

      const retried = covers.uploadPending();
      (await sent('/api/uploads')).flush({ id, mediaType: 'image/webp', byteSize: blob.size });
      await retried;
      expect(covers.online()).toBeTrue();
    });

    it('waits while the browser is offline, sending nothing', async () => {
      offline();
      const { id } = await storedCover();
      await covers.uploadPending();
      shared().backend.expectNone('/api/uploads');
      expect((await db().covers.get(id))?.state).toBe('pending');
    });

    it('uploads soon after a save, without being asked', async () => {
      const id = await covers.save(await drawnImage(30, 45));
      const request = await sent('/api/uploads');
      request.flush({ id, mediaType: 'image/webp', byteSize: 1 }, { status: 201, statusText: 'Created' });
      for (let i = 0; i < 200 && (await db().covers.get(id))?.state !== 'uploaded'; i++) await turn();
      expect((await db().covers.get(id))?.state).toBe('uploaded');
    });
  });

  describe('downloading', () => {
    it('fetches a cover this device lacks and keeps it as uploaded', async () => {
      const blob = await drawnImage(12, 18, 'image/webp');
      const id = await sha256Hex(blob);

      const fetched = covers.download(id);
      const request = await sent(`/api/uploads/${id}`);
      expect(request.request.method).toBe('GET');
      expect(request.request.responseType).toBe('blob');
      request.flush(blob);

      expect(await fetched).toBeTrue();
      const stored = await db().covers.get(id);
      expect(stored).toEqual(jasmine.objectContaining({ id, state: 'uploaded', mediaType: 'image/webp' }));
      expect(await sha256Hex(stored!.blob)).toBe(id);
    });

    it('asks once for a cover the server does not have, for the rest of the session', async () => {
      const id = 'a'.repeat(64);
      const first = covers.download(id);
      expect(covers.download(id)).toBe(first); // one request for two showings at once
      (await sent(`/api/uploads/${id}`)).flush(blobError('not_found', 'No such upload'), { status: 404, statusText: 'Not Found' });
      expect(await first).toBeFalse();

      expect(await covers.download(id)).toBeFalse();
      shared().backend.expectNone(`/api/uploads/${id}`);
    });

    it('asks again after a failure that was not a 404', async () => {
      const id = 'b'.repeat(64);
      const first = covers.download(id);
      (await sent(`/api/uploads/${id}`)).error(new ProgressEvent('error'), { status: 0, statusText: '' });
      expect(await first).toBeFalse();

      const second = covers.download(id);
      (await sent(`/api/uploads/${id}`)).flush(blobError('not_found', 'No such upload'), { status: 404, statusText: 'Not Found' });
      expect(await second).toBeFalse();
    });

    it('keeps nothing whose bytes do not match the id', async () => {
      const id = 'c'.repeat(64);
      const fetched = covers.download(id);
      (await sent(`/api/uploads/${id}`)).flush(await drawnImage(5, 5, 'image/webp'));
      expect(await fetched).toBeFalse();
      expect(await db().covers.count()).toBe(0);
    });

    it('does not ask for a cover already here, or for something that is not a cover id', async () => {
      // Already uploaded: a pending one would (rightly) be posted by the upload round the
      // service starts on its own, whenever a busy machine lets that timer run.
      const { id } = await storedCover('uploaded');
      expect(await covers.download(id)).toBeTrue();
      expect(await covers.download('../sync/pull')).toBeFalse();
      shared().backend.expectNone(() => true);
    });
  });
});
