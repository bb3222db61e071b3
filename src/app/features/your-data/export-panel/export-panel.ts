import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';

import { CSV_COLLECTIONS, type CsvCollection } from '@shared/export/export-csv';
import { exportFileName } from '@shared/export/export-format';

import { readerToday } from '../../../core/time/reader-today';
import { JournalExport, type ExportProgress } from '../journal-export';
import { saveFile } from '../save-file';

const CSV_LABELS: Record<CsvCollection, string> = { books: 'Books', readings: 'Readings', sessions: 'Sessions', quotes: 'Quotes' };

/** Export everything (JSON) and each main collection as CSV, from this device's journal. */
@Component({
  selector: 'll-export-panel',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './export-panel.html',
  styleUrl: './export-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExportPanel {
  private readonly exporter = inject(JournalExport);

  protected readonly csvCollections = CSV_COLLECTIONS.map((name) => ({ name, label: CSV_LABELS[name] }));
  protected readonly progress = signal<ExportProgress | null>(null);
  protected readonly message = signal<string | null>(null);
  private readonly date = readerToday();

  protected async exportEverything(): Promise<void> {
    this.message.set(null);
    this.progress.set({ done: 0, total: 0 });
    try {
      const file = await this.exporter.everything((progress) => this.progress.set(progress));
      const name = exportFileName(this.date);
      saveFile(file, name);
      const missing = this.exporter.missingCovers;
      this.message.set(
        `Saved ${name} (${this.progress()?.total ?? 0} rows, with covers).` +
          (missing ? ` ${missing} covers were neither on this device nor reachable on the server; export again online to include them.` : ''),
      );
    } catch {
      this.message.set('The export could not be made. Nothing was lost; try again.');
    } finally {
      this.progress.set(null);
    }
  }

  protected async exportCsv(collection: CsvCollection): Promise<void> {
    this.message.set(null);
    const name = exportFileName(this.date, 'csv', collection);
    saveFile(await this.exporter.csv(collection), name);
    this.message.set(`Saved ${name}.`);
  }

  protected percent(progress: ExportProgress): number {
    return progress.total === 0 ? 0 : Math.round((progress.done / progress.total) * 100);
  }
}
