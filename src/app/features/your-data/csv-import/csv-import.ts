import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatProgressBarModule } from '@angular/material/progress-bar';

import { bookKeys } from '@shared/duplicates/book-keys';
import { CSV_TARGET_LABELS, CSV_TARGETS, guessMapping, type CsvTarget } from '@shared/import/csv/csv-fields';
import { csvDryRunSteps, type CsvDryRun } from '@shared/import/csv/csv-dry-run';
import { CSV_DATE_FORMATS, statusValueMapping, type BookStatus, type CsvDateFormat } from '@shared/import/csv/csv-values';
import { BOOK_STATUSES, type Book } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { SyncEngine } from '../../../core/sync/sync-engine';
import { nextTask } from '../save-file';
import { additionWrites, CSV_ROWS_PER_BATCH } from './csv-batches';
import { readCsv } from './read-csv';

/** Work done in one go between paints: well under the 200 ms that makes a page feel stuck. */
const TASK_BUDGET_MS = 40;

const STATUS_LABELS: Record<BookStatus, string> = { tbr: 'To be read', reading: 'Reading', paused: 'Paused', finished: 'Finished', dnf: 'Did not finish' };

/**
 * A spreadsheet into the library: preview, a field for each column (guessed from its header),
 * the date layout, what each status value means, a dry run listing every refused row, then the
 * import in batches with progress and Cancel.
 */
@Component({
  selector: 'll-csv-import',
  imports: [MatButtonModule, MatCheckboxModule, MatProgressBarModule],
  templateUrl: './csv-import.html',
  styleUrl: './csv-import.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvImport {
  private readonly store = inject(JournalStore);
  private readonly sync = inject(SyncEngine);

  readonly file = input.required<File>();

  protected readonly targets = CSV_TARGETS.map((target) => ({ target, label: CSV_TARGET_LABELS[target] }));
  protected readonly dateFormats = CSV_DATE_FORMATS.map((format) => ({ format, label: format.toUpperCase() }));
  protected readonly statuses = BOOK_STATUSES.map((status) => ({ status, label: STATUS_LABELS[status] }));

  protected readonly parsing = signal<number | null>(0);
  protected readonly problem = signal<string | null>(null);
  protected readonly headers = signal<string[]>([]);
  private readonly rows = signal<string[][]>([]);
  protected readonly preview = computed(() => this.rows().slice(0, 5));
  protected readonly rowCount = computed(() => this.rows().length);
  protected readonly mapping = signal<(CsvTarget | null)[]>([]);
  protected readonly dateFormat = signal<CsvDateFormat>('yyyy-MM-dd');
  protected readonly keepBadIsbn = signal(false);
  private readonly statusChoices = signal<ReadonlyMap<string, BookStatus | null>>(new Map());
  /** Every different value of the status column, with what it means. */
  protected readonly statusValues = computed(() => {
    const column = this.mapping().indexOf('status');
    if (column < 0) return [];
    const guessed = statusValueMapping(this.rows().map((row) => row[column] ?? ''));
    return [...guessed].slice(0, 30).map(([value, guess]) => ({ value, status: this.statusChoices().has(value) ? this.statusChoices().get(value)! : guess }));
  });
  protected readonly dryRun = signal<CsvDryRun | null>(null);
  protected readonly importing = signal<{ done: number; total: number } | null>(null);
  protected readonly outcome = signal<string | null>(null);
  private cancelled = false;

  constructor() {
    effect(() => void this.read(this.file()));
  }

  private async read(file: File): Promise<void> {
    this.parsing.set(0);
    this.problem.set(null);
    this.dryRun.set(null);
    this.outcome.set(null);
    const read = await readCsv(file, (fraction) => this.parsing.set(fraction));
    this.parsing.set(null);
    if ('problem' in read) {
      this.problem.set(read.problem);
      return;
    }
    this.headers.set(read.headers);
    this.rows.set(read.rows);
    this.mapping.set(guessMapping(read.headers));
  }

  protected mapColumn(column: number, value: string): void {
    this.mapping.update((mapping) => mapping.map((target, index) => (index === column ? ((value || null) as CsvTarget | null) : target)));
    this.dryRun.set(null);
  }

  protected mapStatus(value: string, status: string): void {
    this.statusChoices.update((choices) => new Map(choices).set(value, (status || null) as BookStatus | null));
    this.dryRun.set(null);
  }

  protected setDateFormat(format: string): void {
    this.dateFormat.set(format as CsvDateFormat);
    this.dryRun.set(null);
  }

  protected setKeepBadIsbn(keep: boolean): void {
    this.keepBadIsbn.set(keep);
    this.dryRun.set(null);
  }

  /** Plans every row against the library as it is now; writes nothing. */
  protected async check(): Promise<void> {
    const library = (await this.store.list('books')) as Book[];
    const keys = new Set(library.flatMap((book) => bookKeys(book)));
    const statuses = new Map(this.statusValues().map(({ value, status }) => [value, status]));
    const options = { mapping: this.mapping(), dateFormat: this.dateFormat(), statuses, keepBooksWithBadIsbn: this.keepBadIsbn() };
    // Slices of 50 rows until a task's time is spent, painting between: no long task on a large
    // spreadsheet, however slow the device (a fixed 500 rows was one on a busy one).
    const steps = csvDryRunSteps(this.rows(), options, keys, 50);
    let step = steps.next();
    while (!step.done) {
      await nextTask();
      const until = performance.now() + TASK_BUDGET_MS;
      do step = steps.next();
      while (!step.done && performance.now() < until);
    }
    this.dryRun.set(step.value);
  }

  /** Writes the dry run's books a batch per transaction, until done or cancelled. */
  protected async import(): Promise<void> {
    const additions = this.dryRun()?.additions ?? [];
    this.cancelled = false;
    this.importing.set({ done: 0, total: additions.length });
    const now = new Date().toISOString();
    let done = 0;
    // Sync waits for the last batch (then sends them all), rather than racing each one.
    await this.sync.holdWhile(async () => {
      for (let start = 0; start < additions.length && !this.cancelled; start += CSV_ROWS_PER_BATCH) {
        const batch = additions.slice(start, start + CSV_ROWS_PER_BATCH);
        await this.store.writeNew(batch.flatMap((addition) => additionWrites(addition, now)));
        done += batch.length;
        this.importing.set({ done, total: additions.length });
        await nextTask();
      }
    });
    this.importing.set(null);
    this.dryRun.set(null);
    this.outcome.set(
      done < additions.length
        ? `Stopped: ${done} of ${additions.length} books were imported (rows ${additions[0]?.row ?? 0} to ${additions[done - 1]?.row ?? 0}); the rest were not.`
        : `Imported ${done} books.`,
    );
  }

  protected cancel(): void {
    this.cancelled = true;
  }

  protected percent(fraction: number): number {
    return Math.round(fraction * 100);
  }
}
