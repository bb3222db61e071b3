import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import { coverIdsOf, type ExportCover } from '@shared/export/export-covers';
import { collectionCsv, type CsvCollection } from '@shared/export/export-csv';
import { EXPORT_COLLECTIONS, exportJsonPieces, exportRowOf, type ExportRow } from '@shared/export/export-format';
import type { LocalRow } from '@shared/sync/local-row';
import type { CollectionName } from '@shared/sync/schema/collections';
import type { Book } from '@shared/sync/schema/collections';

import { LocalJournal } from '../../core/data/local-journal';
import { nextTask } from './save-file';

/** How far an export has got, in rows. */
export interface ExportProgress {
  readonly done: number;
  readonly total: number;
}

/** Rows read and turned into file rows between two paints. */
const ROWS_PER_STEP = 2_000;

/**
 * Builds the reader's files from this device's journal (IndexedDB), so exporting works offline
 * and shows what this device holds, including changes not yet synced.
 */
@Injectable({ providedIn: 'root' })
export class JournalExport {
  private readonly journal = inject(LocalJournal);
  private readonly http = inject(HttpClient);

  /** Covers the last export could not carry (not on this device, and the server out of reach). */
  missingCovers = 0;

  /** The whole journal as a Lamplight export file (JSON), reporting progress as it goes. */
  async everything(onProgress: (progress: ExportProgress) => void = () => {}, now = new Date()): Promise<Blob> {
    const db = this.journal.requireDb();
    const counts = await Promise.all(EXPORT_COLLECTIONS.map((name) => db.rows(name).count()));
    const total = counts.reduce((sum, count) => sum + count, 0);
    const collections = new Map<CollectionName, ExportRow[]>();
    let done = 0;
    onProgress({ done, total });
    for (const name of EXPORT_COLLECTIONS) {
      const rows: ExportRow[] = [];
      // Keyset paging by id, so a large collection is read a step at a time.
      let after: string | null = null;
      for (;;) {
        const table = db.rows(name);
        const page: LocalRow[] = await (after === null ? table.orderBy('id') : table.where('id').above(after)).limit(ROWS_PER_STEP).toArray();
        for (const row of page) rows.push(exportRowOf(name, row));
        done += page.length;
        onProgress({ done, total });
        if (page.length < ROWS_PER_STEP) break;
        after = page[page.length - 1]!.id;
        await nextTask();
      }
      collections.set(name, rows);
    }
    const covers = await this.covers(coverIdsOf((collections.get('books') ?? []).map((row) => ({ ...row.fields }))));
    return new Blob([...exportJsonPieces(now.toISOString(), collections, undefined, covers)], { type: 'application/json' });
  }

  /**
   * The pictures the books show, as data URLs: from this device, else from the server when it
   * answers (a cover another device chose may never have been shown here). Those neither has
   * are counted in {@link missingCovers}; the books keep their `coverId`.
   */
  private async covers(ids: readonly string[]): Promise<ExportCover[]> {
    const db = this.journal.requireDb();
    const stored = await db.covers.bulkGet([...ids]);
    const covers: ExportCover[] = [];
    this.missingCovers = 0;
    for (const [index, id] of ids.entries()) {
      let blob: Blob | null = stored[index]?.blob ?? null;
      if (!blob) blob = await firstValueFrom(this.http.get(`/api/uploads/${id}`, { responseType: 'blob' })).catch(() => null);
      if (blob) covers.push({ id, dataUrl: await dataUrlOf(blob, stored[index]?.mediaType) });
      else this.missingCovers++;
    }
    return covers;
  }

  /** One collection as CSV (books, readings, sessions or quotes). */
  async csv(collection: CsvCollection): Promise<Blob> {
    const db = this.journal.requireDb();
    const [rows, books] = await Promise.all([db.rows(collection).toArray(), collection === 'books' ? [] : db.rows('books').toArray()]);
    return new Blob([collectionCsv(collection, rows, (collection === 'books' ? rows : books) as unknown as Book[])], { type: 'text/csv;charset=utf-8' });
  }
}

/** A picture as a base64 data URL (RFC 2397), under its stored media type. */
function dataUrlOf(blob: Blob, mediaType = blob.type): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result).replace(/^data:[^;,]*/, `data:${mediaType || 'image/webp'}`));
    reader.onerror = () => reject(reader.error);
    reader.readAsDataURL(blob);
  });
}
