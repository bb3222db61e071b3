import { Injectable, inject } from '@angular/core';

import { readCoverDataUrl } from '@shared/export/export-covers';
import { EXPORT_COLLECTIONS } from '@shared/export/export-format';
import { importRow, type ImportedChange } from '@shared/import/import-row';
import { countOutcome, emptySummary, type ImportSummary } from '@shared/import/import-summary';
import { MAX_IMPORT_BYTES, readExportFile } from '@shared/import/read-export-file';
import { HlcClock } from '@shared/sync/hlc';
import type { LocalRow } from '@shared/sync/local-row';
import type { CollectionName } from '@shared/sync/schema/collections';

import { sha256Hex } from '../../core/covers/sha256-hex';
import type { JournalDb } from '../../core/data/journal-db';
import { LocalJournal } from '../../core/data/local-journal';
import { deviceId } from '../../core/device/device-id';
import type { ExportProgress } from './journal-export';
import { nextTask } from './save-file';

/** An import's answer: what it did, or why it did nothing. */
export type ImportResult = { readonly summary: ImportSummary } | { readonly problem: string };

/** Rows merged per Dexie transaction: all of a batch is stored, or none of it. */
const ROWS_PER_BATCH = 500;

/** "50 MB", for messages. */
export const maxImportSize = `${MAX_IMPORT_BYTES / 1024 / 1024} MB`;

/**
 * Imports a Lamplight export into this device's journal: each row merges by id with the file's
 * clocks (see `shared/import/import-row.ts`), and what it takes goes to the outbox with those
 * clocks, so the server merges it by the same rule and nothing newer anywhere is overwritten.
 */
@Injectable({ providedIn: 'root' })
export class JournalImport {
  private readonly journal = inject(LocalJournal);

  async importJson(file: Blob, onProgress: (progress: ExportProgress) => void = () => {}): Promise<ImportResult> {
    if (file.size > MAX_IMPORT_BYTES) return { problem: `This file is larger than ${maxImportSize}, too large to be a Lamplight export. Nothing was changed.` };
    if (file.size === 0) return { problem: 'This file is empty. Nothing was changed.' };
    const read = readExportFile(await file.text());
    if ('problem' in read) return read;
    const db = this.journal.db();
    if (!db) return { problem: 'Sign in to import.' };
    const { importText } = await import('@shared/import/text-importer');
    const summary = emptySummary();
    const entries = Object.entries(read.file.collections);
    const total = entries.reduce((sum, [, rows]) => sum + (Array.isArray(rows) ? rows.length : 0), 0);
    let done = 0;
    for (const [name, rows] of entries) {
      if (!(EXPORT_COLLECTIONS as string[]).includes(name) || !Array.isArray(rows)) {
        summary.refused.push({ collection: name, id: '', reason: `${name} is not a collection this version of Lamplight knows` });
        continue;
      }
      const collection = name as CollectionName;
      for (let start = 0; start < rows.length; start += ROWS_PER_BATCH) {
        const batch: unknown[] = rows.slice(start, start + ROWS_PER_BATCH);
        await db.transaction('rw', [db.rows(collection), db.outbox, db.meta], async () => {
          const ids = batch.map((row) => (row as { id?: unknown })?.id).map((id) => (typeof id === 'string' ? id : ''));
          const locals = await db.rows(collection).bulkGet(ids);
          const put: LocalRow[] = [];
          const changes: ImportedChange[] = [];
          batch.forEach((fileRow, index) => {
            const result = importRow(collection, fileRow, locals[index], Date.now(), importText);
            if (result.outcome === 'refused') summary.refused.push({ collection, id: ids[index]!, reason: result.reason! });
            else countOutcome(summary, result.outcome);
            if (result.row) put.push(result.row);
            changes.push(...result.changes);
          });
          await db.rows(collection).bulkPut(put);
          await db.outbox.bulkAdd(changes.map((change) => ({ ...change, id: crypto.randomUUID() })));
          await this.advanceClock(changes);
        });
        done += batch.length;
        onProgress({ done, total });
        await nextTask();
      }
    }
    await this.importCovers(db, read.file.covers, summary);
    return { summary };
  }

  /**
   * Keeps the file's cover pictures on this device, to upload like a cover chosen here (the
   * server names it by the same digest). A picture whose bytes do not hash to its id is refused.
   */
  private async importCovers(db: JournalDb, covers: unknown, summary: ImportSummary): Promise<void> {
    if (!Array.isArray(covers)) return;
    for (const cover of covers as { id?: unknown; dataUrl?: unknown }[]) {
      const id = typeof cover?.id === 'string' ? cover.id : '';
      const read = readCoverDataUrl(cover?.dataUrl);
      const bytes = read && Uint8Array.from(atob(read.base64), (char) => char.charCodeAt(0));
      if (!read || !bytes || (await sha256Hex(bytes)) !== id) {
        summary.refused.push({ collection: 'covers', id, reason: 'the picture is not a cover image whose bytes match its id (SHA-256)' });
        continue;
      }
      const added = await db.transaction('rw', db.covers, async () => {
        if (await db.covers.get(id)) return false;
        await db.covers.add({ id, blob: new Blob([bytes], { type: read.mediaType }), mediaType: read.mediaType, state: 'pending' });
        return true;
      });
      countOutcome(summary, added ? 'added' : 'unchanged');
    }
  }

  /** This device's next clocks order after every imported one (the receive rule of HLC). */
  private async advanceClock(changes: readonly ImportedChange[]): Promise<void> {
    const db = this.journal.db()!;
    if (changes.length === 0) return;
    const greatest = changes.reduce((max, change) => (change.hlc > max ? change.hlc : max), '');
    const clock = new HlcClock(deviceId(), Date.now, (await db.meta.get('clock'))?.value);
    clock.receive(greatest);
    await db.meta.put({ key: 'clock', value: clock.tick() });
  }
}
