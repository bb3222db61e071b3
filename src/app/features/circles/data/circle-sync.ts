import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { DestroyRef, inject, Injectable, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { firstValueFrom, debounceTime } from 'rxjs';

import { isApiErrorBody } from '@shared/api/api-error';
import { CIRCLE_COLLECTIONS } from '@shared/circles/circle-collections';
import { NOT_A_MEMBER, NOT_A_MEMBER_TEXT, type CirclePullResponse } from '@shared/circles/circle-wire';
import type { ChangeProblem, PushResponse } from '@shared/api/sync';
import { clockOffsetMs } from '@shared/sync/device-clock';

import type { CircleOutboxEntry, JournalDb } from '../../../core/data/journal-db';
import { LocalJournal } from '../../../core/data/local-journal';
import { isUnreachable } from '../../../core/http/api-error-message';
import { OneAtATime } from '../../../core/tasks/one-at-a-time';
import { CirclesApi } from './circles-api';
import { mergePulledRow, type LocalCircleRow } from './circle-rows';
import { restampCircleChanges } from './circle-restamp';
import { CircleStore } from './circle-store';

const PUSH_BATCH = 50;
const CIRCLE_TABLES = Object.keys(CIRCLE_COLLECTIONS);

/**
 * Sends and fetches circle data, circle by circle (`/api/circles/:id/sync`): the outbox first,
 * then pages of rows after this circle's own cursor, merged per field. A circle the reader is no
 * longer in is dropped from the device at once, and its waiting changes are set aside (in
 * `rejected`, with the reason) rather than lost silently.
 */
@Injectable({ providedIn: 'root' })
export class CircleSync {
  private readonly http = inject(HttpClient);
  private readonly journal = inject(LocalJournal);
  private readonly api = inject(CirclesApi);
  private readonly queue = new OneAtATime();
  /** The last sync's trouble, in words, or null. */
  readonly problem = signal<string | null>(null);
  readonly offline = signal(false);

  constructor() {
    inject(CircleStore)
      .localWrites.pipe(debounceTime(800), takeUntilDestroyed(inject(DestroyRef)))
      .subscribe((circleId) => void this.syncCircle(circleId));
    globalThis.addEventListener?.('online', () => void this.syncAll());
  }

  /** Refreshes the list of the reader's circles, drops circles they left or were removed from, then syncs each. */
  syncAll(): Promise<void> {
    return this.queue.run(async () => {
      const db = this.journal.db();
      if (!db) return;
      try {
        const circles = await this.api.list();
        this.offline.set(false);
        const known = new Set(circles.map((circle) => circle.id));
        for (const meta of await db.circleMeta.toArray()) if (!known.has(meta.circleId)) await this.forget(db, meta.circleId);
        for (const circle of circles) await this.syncOne(db, circle.id);
      } catch (error) {
        this.noteFailure(error);
      }
    });
  }

  syncCircle(circleId: string): Promise<void> {
    return this.queue.run(async () => {
      const db = this.journal.db();
      if (!db) return;
      try {
        await this.syncOne(db, circleId);
        this.offline.set(false);
      } catch (error) {
        this.noteFailure(error);
      }
    });
  }

  private noteFailure(error: unknown): void {
    if (isUnreachable(error)) this.offline.set(true);
    else
      this.problem.set(
        isApiErrorBody((error as HttpErrorResponse).error) ? (error as HttpErrorResponse).error.error.message : 'Circles could not sync; trying again later.',
      );
  }

  private async syncOne(db: JournalDb, circleId: string): Promise<void> {
    try {
      await this.push(db, circleId);
      await this.pull(db, circleId);
      this.problem.set(null);
    } catch (error) {
      if (error instanceof HttpErrorResponse && error.status === 403 && isApiErrorBody(error.error) && error.error.error.code === NOT_A_MEMBER) {
        const refused = await this.forget(db, circleId);
        this.problem.set(
          refused === 0
            ? NOT_A_MEMBER_TEXT
            : `${NOT_A_MEMBER_TEXT}: ${refused} waiting ${refused === 1 ? 'change was' : 'changes were'} refused (listed in the sync menu).`,
        );
        return;
      }
      throw error;
    }
  }

  private async push(db: JournalDb, circleId: string): Promise<void> {
    let restamps = 0;
    for (;;) {
      const batch = await db.circleOutbox.where('circleId').equals(circleId).limit(PUSH_BATCH).toArray();
      if (batch.length === 0) return;
      const changes = batch.map(({ id, collection, rowId, field, value, hlc }) => ({ id, collection, rowId, field, value, hlc }));
      const sentAt = Date.now();
      try {
        await firstValueFrom(this.http.post<PushResponse>(`/api/circles/${circleId}/sync/push`, { changes }));
        await db.circleOutbox.bulkDelete(batch.map((entry) => entry.seq!));
      } catch (error) {
        const problems = refusedChanges(error);
        if (!problems) throw error;
        const ahead = problems.filter((problem) => problem.code === 'clock_ahead' && batch[problem.index]);
        if (ahead.length > 0) {
          // Never set aside for a clock problem (as for the reader's own changes): stamp again from the server's time.
          if (++restamps > 3) throw new Error("This device's clock could not be brought in line with the server; trying again later");
          await learnServerTime(db, error as HttpErrorResponse, sentAt);
          await restampCircleChanges(
            db,
            ahead.map((problem) => batch[problem.index]!),
          );
          continue;
        }
        // The refused ones are set aside with their reason (shown in the sync menu); the rest go again.
        await this.setAside(db, batch, problems);
      }
    }
  }

  private async setAside(db: JournalDb, entries: readonly CircleOutboxEntry[], problems: readonly ChangeProblem[]): Promise<void> {
    const now = new Date().toISOString();
    const refused = problems.map((problem) => ({ entry: entries[problem.index], problem })).filter((item) => item.entry !== undefined);
    await db.transaction('rw', [db.circleOutbox, db.rejected], async () => {
      for (const { entry, problem } of refused) {
        const { seq, circleId: _circle, ...change } = entry!;
        await db.rejected.put({ ...change, code: problem.code, reason: problem.reason, rejectedAt: now });
        await db.circleOutbox.delete(seq!);
      }
    });
  }

  private async pull(db: JournalDb, circleId: string): Promise<void> {
    for (let page = 0; page < 100; page++) {
      const meta = await db.circleMeta.get(circleId);
      const params: Record<string, string> = meta?.cursor ? { since: meta.cursor } : {};
      const answer = await firstValueFrom(this.http.get<CirclePullResponse>(`/api/circles/${circleId}/sync/pull`, { params }));
      const tables = CIRCLE_TABLES.map((name) => db.table<LocalCircleRow, string>(name));
      await db.transaction('rw', [...tables, db.circleMeta], async () => {
        for (const row of answer.rows) {
          const table = db.table<LocalCircleRow, string>(row.collection);
          if (!CIRCLE_TABLES.includes(row.collection)) continue;
          await table.put(mergePulledRow(await table.get(row.id), row));
        }
        await db.circleMeta.put({ circleId, cursor: answer.cursor, role: answer.role, members: answer.members, lastSyncedAt: answer.serverTime });
      });
      if (!answer.hasMore) return;
    }
  }

  /** Removes a circle's rows, meta and waiting changes from this device (kept aside as refused, with the reason); answers how many were waiting. */
  async forget(db: JournalDb, circleId: string): Promise<number> {
    const waiting = await db.circleOutbox.where('circleId').equals(circleId).toArray();
    await this.setAside(
      db,
      waiting,
      waiting.map((entry, index) => ({ index, id: entry.id, code: NOT_A_MEMBER, reason: NOT_A_MEMBER_TEXT })),
    );
    const tables = CIRCLE_TABLES.map((name) => db.table<LocalCircleRow, string>(name));
    await db.transaction('rw', [...tables, db.circleMeta], async () => {
      for (const table of tables) await table.where('circleId').equals(circleId).delete();
      await db.circleMeta.delete(circleId);
    });
    return waiting.length;
  }
}

/** Keeps the offset from the server's time (its HTTP Date header), as the reader's own sync does. */
async function learnServerTime(db: JournalDb, error: HttpErrorResponse, sentAt: number): Promise<void> {
  const server = Date.parse(error.headers?.get('Date') ?? '');
  if (Number.isFinite(server)) await db.meta.put({ key: 'clockOffset', value: String(clockOffsetMs(server, sentAt, Date.now())) });
}

/** The per-change problems of a refused push (400 invalid, 403 not allowed), or null for any other failure. */
function refusedChanges(error: unknown): ChangeProblem[] | null {
  if (!(error instanceof HttpErrorResponse) || ![400, 403].includes(error.status) || !isApiErrorBody(error.error)) return null;
  if (error.error.error.code === NOT_A_MEMBER) return null;
  const details = error.error.error.details;
  return Array.isArray(details) && details.length > 0 ? (details as ChangeProblem[]) : null;
}
