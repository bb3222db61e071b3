import type { ImportOutcome } from './import-row';

/** A row the import did not take, and why (shown to the reader). */
export interface ImportRefusal {
  readonly collection: string;
  readonly id: string;
  readonly reason: string;
}

/** What an import did: rows added, updated, unchanged, and each refused row with its reason. */
export interface ImportSummary {
  added: number;
  updated: number;
  unchanged: number;
  readonly refused: ImportRefusal[];
}

export const emptySummary = (): ImportSummary => ({ added: 0, updated: 0, unchanged: 0, refused: [] });

/** Counts one row's outcome into the summary. */
export function countOutcome(summary: ImportSummary, outcome: Exclude<ImportOutcome, 'refused'>): void {
  summary[outcome] += 1;
}

/** "3 added, 1 updated, 12 unchanged, 2 refused". */
export function describeSummary({ added, updated, unchanged, refused }: ImportSummary): string {
  return `${added} added, ${updated} updated, ${unchanged} unchanged, ${refused.length} refused`;
}
