import { bookKeys } from '../../duplicates/book-keys';
import { planCsvRow, type CsvImportOptions } from './csv-row';

/** A row ready to import: its place in the file (1 = the first row after the header). */
export interface CsvAddition {
  readonly row: number;
  readonly book: Record<string, unknown>;
  readonly reading: Record<string, unknown> | null;
  readonly notes: readonly string[];
}

/** What an import would do, row by row, before anything is written. */
export interface CsvDryRun {
  readonly additions: CsvAddition[];
  /** Rows whose book is already in the library (or earlier in the file): left out. */
  readonly duplicates: { readonly row: number; readonly title: string }[];
  readonly refused: { readonly row: number; readonly reasons: readonly string[] }[];
}

/**
 * Plans every row: what would be added, what is already there (same ISBN-13, or the same
 * normalised title and first author; `shared/duplicates/book-keys.ts`) and every refused row
 * with its reasons. Writes nothing.
 */
export function csvDryRun(rows: readonly (readonly string[])[], options: CsvImportOptions, libraryKeys: ReadonlySet<string>): CsvDryRun {
  const seen = new Set(libraryKeys);
  const result: CsvDryRun = { additions: [], duplicates: [], refused: [] };
  rows.forEach((cells, index) => {
    const row = index + 1;
    if (cells.every((cell) => cell.trim() === '')) return;
    const plan = planCsvRow(cells, options);
    if ('reasons' in plan) {
      result.refused.push({ row, reasons: plan.reasons });
      return;
    }
    const keys = bookKeys(plan.book as { title: string; authors: string[]; isbn: string | null });
    if (keys.some((key) => seen.has(key))) {
      result.duplicates.push({ row, title: plan.book['title'] as string });
      return;
    }
    for (const key of keys) seen.add(key);
    result.additions.push({ row, ...plan });
  });
  return result;
}
