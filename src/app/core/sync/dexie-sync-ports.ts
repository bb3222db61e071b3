import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { firstValueFrom } from 'rxjs';

import { isApiErrorBody } from '@shared/api/api-error';
import type { ChangeProblem, FieldChange, PullResponse } from '@shared/sync/field-change';
import { HlcClock } from '@shared/sync/hlc';
import { applyPulled, emptyRow } from '@shared/sync/local-row';
import type { PushOutcome, QueuedChange, SyncPorts } from '@shared/sync/sync-cycle';
import { textFieldMax } from '@shared/text/text-fields';

import { deviceId } from '../device/device-id';
import type { JournalDb } from '../data/journal-db';

/** The browser's side of the shared sync cycle: the outbox and rows in Dexie, the server over HTTP. */
export class DexieSyncPorts implements SyncPorts {
  constructor(
    private readonly db: JournalDb,
    private readonly http: HttpClient,
  ) {}

  nextBatch(limit: number): Promise<readonly QueuedChange[]> {
    return this.db.outbox.orderBy('seq').limit(limit).toArray();
  }

  async acknowledge(changes: readonly QueuedChange[]): Promise<void> {
    await this.db.outbox.bulkDelete(changes.map((change) => change.seq!));
  }

  async setAside(refused: readonly { change: QueuedChange; problem: ChangeProblem }[]): Promise<void> {
    const rejectedAt = new Date().toISOString();
    await this.db.transaction('rw', [this.db.outbox, this.db.rejected], async () => {
      await this.db.rejected.bulkPut(
        refused.map(({ change: { seq: _seq, ...change }, problem }) => ({ ...change, code: problem.code, reason: problem.reason, rejectedAt })),
      );
      await this.db.outbox.bulkDelete(refused.map(({ change }) => change.seq!));
    });
  }

  async push(changes: readonly FieldChange[]): Promise<PushOutcome> {
    try {
      await firstValueFrom(this.http.post('/api/sync/push', { deviceId: deviceId(), changes }));
      return { kind: 'applied' };
    } catch (error) {
      if (error instanceof HttpErrorResponse && error.status === 413) return { kind: 'too-large' };
      if (error instanceof HttpErrorResponse && error.status === 400 && isApiErrorBody(error.error) && Array.isArray(error.error.error.details)) {
        return { kind: 'refused', problems: error.error.error.details as ChangeProblem[] };
      }
      throw error;
    }
  }

  async cursor(): Promise<string | undefined> {
    return (await this.db.meta.get('cursor'))?.value;
  }

  pull(cursor: string | undefined): Promise<PullResponse> {
    const params: Record<string, string> = { limit: '1000' };
    if (cursor) params['since'] = cursor;
    return firstValueFrom(this.http.get<PullResponse>('/api/sync/pull', { params }));
  }

  /**
   * Merges a page into local rows with the shared rule and saves its cursor in the same
   * transaction, so a crash can only make the next pull repeat work, never skip it.
   */
  async apply(page: PullResponse): Promise<void> {
    const byRow = new Map<string, { collection: string; rowId: string; changes: PullResponse['changes'][number][] }>();
    for (const change of page.changes) {
      const key = `${change.collection}/${change.rowId}`;
      const entry = byRow.get(key) ?? { collection: change.collection, rowId: change.rowId, changes: [] };
      entry.changes.push(change);
      byRow.set(key, entry);
    }
    const collections = [...new Set(page.changes.map((change) => change.collection))].filter((name) =>
      this.db.tables.some((table) => table.name === name),
    );
    // Yjs loads on the first pulled text, before the transaction (which must not await anything else).
    const { applyPulledTexts } = page.changes.some((change) => textFieldMax(change.collection, change.field) !== undefined)
      ? await import('@shared/text/apply-pulled-texts')
      : { applyPulledTexts: null };
    await this.db.transaction('rw', [...collections.map((name) => this.db.rows(name)), this.db.meta], async () => {
      for (const collection of collections) {
        const entries = [...byRow.values()].filter((entry) => entry.collection === collection);
        const table = this.db.rows(collection);
        const current = await table.bulkGet(entries.map((entry) => entry.rowId));
        // Mergeable texts merge their Yjs states; every other field by the shared per-field rule.
        const merged = entries.map((entry, n) => {
          const isText = (change: { field: string }) => textFieldMax(collection, change.field) !== undefined;
          const row = applyPulled(current[n] ?? emptyRow(entry.rowId), entry.changes.filter((change) => !isText(change)));
          return applyPulledTexts ? applyPulledTexts(collection, row, entry.changes.filter(isText)) : row;
        });
        await table.bulkPut(merged.filter((row, n) => row !== current[n]));
      }
      await this.adoptClocks(page);
      await this.db.meta.bulkPut([
        { key: 'cursor', value: page.cursor },
        { key: 'lastSyncedAt', value: new Date().toISOString() },
      ]);
    });
  }

  /** HLC receive rule: later local edits order after everything seen from other devices. */
  private async adoptClocks(page: PullResponse): Promise<void> {
    const latest = page.changes.reduce<string | null>((max, change) => (max === null || change.hlc > max ? change.hlc : max), null);
    if (!latest) return;
    const clock = new HlcClock(deviceId(), Date.now, (await this.db.meta.get('clock'))?.value);
    try {
      clock.receive(latest);
      await this.db.meta.put({ key: 'clock', value: clock.current() });
    } catch {
      // A clock over 24 h ahead of this device: keep our own (this device's date may be wrong).
    }
  }
}
