import { HttpClient, HttpErrorResponse, HttpEventType } from '@angular/common/http';
import { DestroyRef, effect, inject, Injectable, signal } from '@angular/core';
import { filter, firstValueFrom, map, tap } from 'rxjs';

import { UPLOAD_FIELD, type UploadView } from '@shared/api/upload';

import { Auth } from '../auth/auth';
import type { JournalDb, StoredCover } from '../data/journal-db';
import { LocalJournal } from '../data/local-journal';
import { isUnreachable, readableError } from '../http/api-error-message';
import { SerialJob, withTabLock } from '../tasks/serial-job';
import { prepareCover } from './prepare-cover';
import { sha256Hex } from './sha256-hex';

/** What the server calls an upload: 64 lower-case hex digits (anything else is a 404 there). */
const COVER_ID = /^[0-9a-f]{64}$/;
/** A long library list asks for many covers at once; fetch a few at a time. */
const DOWNLOADS_AT_ONCE = 4;

/**
 * Cover images on this device. A chosen file is resized, stored in the reader's database as
 * "pending" and named by its SHA-256 (the server's id for the same bytes), so a book can refer to
 * it at once, offline. Pending covers upload at start, when the browser comes online and after
 * each save, backing off like sync on failure; covers other devices chose are fetched when a
 * book shows one this device lacks.
 */
@Injectable({ providedIn: 'root' })
export class Covers {
  private readonly http = inject(HttpClient);
  private readonly auth = inject(Auth);
  private readonly journal = inject(LocalJournal);

  private readonly progressState = signal<ReadonlyMap<string, number>>(new Map());
  private readonly onlineState = signal(globalThis.navigator?.onLine ?? true);
  /** `<database>/<id>` the server does not have for this reader: not asked again this session. */
  private readonly misses = new Set<string>();
  private readonly downloading = new Map<string, Promise<boolean>>();
  private readonly waitingForSlot: (() => void)[] = [];
  private downloadsRunning = 0;
  /** Upload rounds one at a time; a save mid-round goes round once more afterwards. */
  private readonly uploads = new SerialJob(() => this.uploadRound());
  private destroyed = false;

  /** How far each cover now uploading from this tab has got, from 0 to 1, by cover id. */
  readonly uploadProgress = this.progressState.asReadonly();
  /** Whether the browser says it has a network (when it says not, it is right). */
  readonly online = this.onlineState.asReadonly();

  constructor() {
    // Signed in, or the app opened with a reader: upload what earlier visits left pending.
    effect(() => {
      if (this.journal.db() && !this.auth.needsSignIn()) this.uploads.schedule(0);
    });
    const online = () => {
      this.onlineState.set(true);
      this.uploads.succeeded();
      this.uploads.schedule(0);
    };
    const offline = () => this.onlineState.set(false);
    globalThis.addEventListener?.('online', online);
    globalThis.addEventListener?.('offline', offline);
    inject(DestroyRef).onDestroy(() => {
      this.destroyed = true;
      this.uploads.stop();
      globalThis.removeEventListener?.('online', online);
      globalThis.removeEventListener?.('offline', offline);
    });
  }

  /**
   * Prepares an image file as a cover and keeps it on this device, to upload when online.
   * Resolves the cover's id; the same picture chosen twice is stored once.
   *
   * @throws CoverError (its message is for the reader) when the file is not a readable image.
   */
  async save(file: Blob): Promise<string> {
    const db = this.journal.requireDb();
    const cover = await prepareCover(file);
    await db.transaction('rw', db.covers, async () => {
      if (!(await db.covers.get(cover.id))) await db.covers.add({ id: cover.id, blob: cover.blob, mediaType: cover.mediaType, state: 'pending' });
    });
    this.uploads.schedule(0);
    return cover.id;
  }

  /**
   * Fetches a cover this device does not have from the server and keeps it. Resolves whether it
   * is here now; never rejects. An id the server does not have for this reader is remembered
   * and not asked for again this session.
   */
  download(id: string): Promise<boolean> {
    const db = this.journal.db();
    if (!db || !COVER_ID.test(id) || this.auth.needsSignIn()) return Promise.resolve(false);
    const key = `${db.name}/${id}`;
    if (this.misses.has(key)) return Promise.resolve(false);
    let running = this.downloading.get(key);
    if (!running) {
      running = this.inSlot(() => this.fetchInto(db, id, key))
        .catch(() => false) // the database closed meanwhile (signed out): nothing to show anyway
        .finally(() => this.downloading.delete(key));
      this.downloading.set(key, running);
    }
    return running;
  }

  /** Uploads every pending cover now, forgetting any backoff; resolves when this round is over. */
  uploadPending(): Promise<void> {
    return this.uploads.runNow();
  }

  private async uploadRound(): Promise<void> {
    const db = this.journal.db();
    // Offline for sure: the `online` event starts the next round.
    if (!db || this.destroyed || this.auth.needsSignIn() || globalThis.navigator?.onLine === false) return;
    this.uploads.cancelTimer();
    try {
      const ran = await withTabLock(`lamplight-covers-${db.userId}`, () => this.uploadEach(db));
      this.uploads.succeeded();
      if (ran) this.onlineState.set(true);
      else this.uploads.lookAgainSoon(); // another tab is uploading
    } catch (error) {
      // A refused sign-in waits for the reader (signing in again restarts us).
      if (error instanceof HttpErrorResponse && (error.status === 401 || error.status === 403)) return;
      // No answer (or the service worker's 504): offline, whatever navigator.onLine says, as
      // the sync status judges it too.
      if (isUnreachable(error)) this.onlineState.set(false);
      this.uploads.retryLater();
    }
  }

  /** Uploads pending covers one by one; stops (rejects) at the first failure worth retrying. */
  private async uploadEach(db: JournalDb): Promise<void> {
    for (;;) {
      const cover = await db.covers.where('state').equals('pending').first();
      if (!cover || this.destroyed) return;
      await db.covers.update(cover.id, await this.uploadOne(cover));
    }
  }

  private async uploadOne(cover: StoredCover): Promise<Pick<StoredCover, 'state' | 'problem'>> {
    this.setProgress(cover.id, 0);
    try {
      const answer = await this.post(cover);
      if (answer.id === cover.id) return { state: 'uploaded' };
      // Cannot happen unless bytes changed on the way; other devices could never fetch it.
      return { state: 'refused', problem: 'The server received a different image. Choose the cover again.' };
    } catch (error) {
      // Too large or not an image: sending it again would get the same answer.
      if (error instanceof HttpErrorResponse && (error.status === 400 || error.status === 413)) {
        return { state: 'refused', problem: readableError(error).message };
      }
      throw error;
    } finally {
      this.setProgress(cover.id, null);
    }
  }

  private post(cover: StoredCover): Promise<UploadView> {
    const form = new FormData();
    form.append(UPLOAD_FIELD, cover.blob, `cover.${cover.mediaType.split('/')[1] ?? 'img'}`);
    return firstValueFrom(
      this.http.post<UploadView>('/api/uploads', form, { reportProgress: true, observe: 'events' }).pipe(
        tap((event) => {
          if (event.type === HttpEventType.UploadProgress && event.total) this.setProgress(cover.id, event.loaded / event.total);
        }),
        filter((event) => event.type === HttpEventType.Response),
        map((response) => response.body!),
      ),
    );
  }

  private async fetchInto(db: JournalDb, id: string, key: string): Promise<boolean> {
    if (await db.covers.get(id)) return true;
    let blob: Blob;
    try {
      blob = await firstValueFrom(this.http.get(`/api/uploads/${id}`, { responseType: 'blob' }));
    } catch (error) {
      if (error instanceof HttpErrorResponse && error.status === 404) this.misses.add(key);
      return false; // offline or refused: a later showing asks again
    }
    // The id names the bytes; anything else is not this cover and must not show as it.
    if ((await sha256Hex(blob)) !== id) {
      this.misses.add(key);
      return false;
    }
    await db.transaction('rw', db.covers, async () => {
      if (!(await db.covers.get(id))) await db.covers.add({ id, blob, mediaType: blob.type, state: 'uploaded' });
    });
    return true;
  }

  /** Runs `work` when fewer than DOWNLOADS_AT_ONCE others are running. */
  private async inSlot<T>(work: () => Promise<T>): Promise<T> {
    if (this.downloadsRunning >= DOWNLOADS_AT_ONCE) await new Promise<void>((resolve) => this.waitingForSlot.push(resolve));
    this.downloadsRunning++;
    try {
      return await work();
    } finally {
      this.downloadsRunning--;
      this.waitingForSlot.shift()?.();
    }
  }

  private setProgress(id: string, fraction: number | null): void {
    const next = new Map(this.progressState());
    if (fraction === null) next.delete(id);
    else next.set(id, Math.min(1, Math.max(0, fraction)));
    this.progressState.set(next);
  }
}
