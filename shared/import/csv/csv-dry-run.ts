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
  const steps = csvDryRunSteps(rows, options, libraryKeys, rows.length || 1);
  for (let step = steps.next(); ; step = steps.next()) if (step.done) return step.value;
}

/**
 * {@link csvDryRun} a slice of rows at a time: yields how many rows are planned so far after
 * each `rowsPerStep`, so a page can let the browser paint between slices (a 10,000-row plan is
 * most of a second of validation), and returns the plan.
 */
export function* csvDryRunSteps(
  rows: readonly (readonly string[])[],
  options: CsvImportOptions,
  libraryKeys: ReadonlySet<string>,
  rowsPerStep = 500,
): Generator<number, CsvDryRun> {
  const seen = new Set(libraryKeys);
  const result: CsvDryRun = { additions: [], duplicates: [], refused: [] };
  for (const [index, cells] of rows.entries()) {
    if (index > 0 && index % rowsPerStep === 0) yield index;
    const row = index + 1;
    if (cells.every((cell) => cell.trim() === '')) continue;
    const plan = planCsvRow(cells, options);
    if ('reasons' in plan) {
      result.refused.push({ row, reasons: plan.reasons });
      continue;
    }
    const keys = bookKeys(plan.book as { title: string; authors: string[]; isbn: string | null });
    if (keys.some((key) => seen.has(key))) {
      result.duplicates.push({ row, title: plan.book['title'] as string });
      continue;
    }
    for (const key of keys) seen.add(key);
    result.additions.push({ row, ...plan });
  }
  return result;
}
