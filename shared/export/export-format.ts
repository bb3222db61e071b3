import type { LocalRow } from '../sync/local-row';
import type { ExportCover } from './export-covers';
import { compareBytes } from '../sync/or-set';
import { COLLECTIONS, type CollectionName } from '../sync/schema/collections';

/** The `format` every Lamplight export file declares, so an import knows what it holds. */
export const EXPORT_FORMAT = 'lamplight-export';
/** Bumped when the file's shape changes; an import refuses a version newer than it knows. */
export const EXPORT_VERSION = 1;

/**
 * One row as the file keeps it: its id, the values of its fields and each field's clock, so an
 * import merges by the same per-field rule as sync. A deleted row keeps only its id and the
 * `deleted` flag (its content stays out of the file).
 */
export interface ExportRow {
  readonly id: string;
  readonly fields: Readonly<Record<string, unknown>>;
  readonly clocks: Readonly<Record<string, string>>;
}

export interface LamplightExport {
  readonly format: typeof EXPORT_FORMAT;
  readonly version: number;
  readonly exportedAt: string;
  readonly collections: Readonly<Partial<Record<CollectionName, readonly ExportRow[]>>>;
  /** The books' cover pictures (`export-covers.ts`); left out when there are none. */
  readonly covers?: readonly ExportCover[];
}

/** Every collection in the file, in a fixed order (the schema's). */
export const EXPORT_COLLECTIONS = Object.keys(COLLECTIONS) as CollectionName[];

/**
 * A device's row as the file keeps it: only the collection's own fields (never `_hlc`, set or
 * text states, which are this device's bookkeeping), each with its clock; sets' elements sorted.
 */
export function exportRowOf(collection: CollectionName, row: LocalRow): ExportRow {
  if (row['deleted'] === true) {
    return { id: row.id, fields: { deleted: true }, clocks: row._hlc['deleted'] ? { deleted: row._hlc['deleted'] } : {} };
  }
  const fields: Record<string, unknown> = {};
  const clocks: Record<string, string> = {};
  for (const [name, spec] of Object.entries(COLLECTIONS[collection].fields)) {
    const value = row[name];
    if (value === undefined) continue;
    // A set has no order: written sorted, so the same set always reads the same in the file.
    fields[name] = spec.kind === 'set' && Array.isArray(value) ? [...(value as string[])].sort(compareBytes) : value;
    const clock = row._hlc[name];
    if (clock) clocks[name] = clock;
  }
  return { id: row.id, fields, clocks };
}

/** `lamplight-export-YYYY-MM-DD.json`, the reader's local date. */
export function exportFileName(localDate: string, extension = 'json', collection?: string): string {
  return `lamplight-${collection ? `${collection}-` : 'export-'}${localDate}.${extension}`;
}

/**
 * The file's text in pieces (header, then rows a chunk at a time), so a large library never sits
 * in memory as one string; joined, the pieces are exactly `JSON.stringify` of the export.
 */
export function* exportJsonPieces(
  exportedAt: string,
  collections: ReadonlyMap<CollectionName, readonly ExportRow[]>,
  rowsPerPiece = 500,
  covers: readonly ExportCover[] = [],
): Generator<string> {
  yield `{"format":${JSON.stringify(EXPORT_FORMAT)},"version":${EXPORT_VERSION},"exportedAt":${JSON.stringify(exportedAt)},"collections":{`;
  let firstCollection = true;
  for (const [name, rows] of collections) {
    yield `${firstCollection ? '' : ','}${JSON.stringify(name)}:[`;
    firstCollection = false;
    for (let start = 0; start < rows.length; start += rowsPerPiece) {
      const piece = rows
        .slice(start, start + rowsPerPiece)
        .map((row) => JSON.stringify(row))
        .join(',');
      yield start === 0 ? piece : `,${piece}`;
    }
    yield ']';
  }
  yield '}';
  // A picture at a time: each is up to a few hundred kB of base64.
  for (const [index, cover] of covers.entries()) yield `${index === 0 ? ',"covers":[' : ','}${JSON.stringify(cover)}`;
  yield covers.length > 0 ? ']}' : '}';
}
