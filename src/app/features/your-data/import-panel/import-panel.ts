import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';

import { describeSummary, type ImportSummary } from '@shared/import/import-summary';

import { SyncEngine } from '../../../core/sync/sync-engine';
import type { ExportProgress } from '../journal-export';
import { CsvImport } from '../csv-import/csv-import';
import { JournalImport } from '../journal-import';

/** Choose a file: a Lamplight export (JSON) merges at once; a spreadsheet (CSV) opens the mapping steps. */
@Component({
  selector: 'll-import-panel',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, CsvImport],
  templateUrl: './import-panel.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ImportPanel {
  private readonly importer = inject(JournalImport);
  private readonly sync = inject(SyncEngine);

  protected readonly progress = signal<ExportProgress | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly summary = signal<ImportSummary | null>(null);
  protected readonly csvFile = signal<File | null>(null);
  protected readonly describe = describeSummary;

  protected async chosen(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    this.problem.set(null);
    this.summary.set(null);
    this.csvFile.set(null);
    if (/\.csv$/i.test(file.name) || file.type === 'text/csv') {
      this.csvFile.set(file);
      return;
    }
    if (!/\.json$/i.test(file.name) && file.type !== 'application/json') {
      this.problem.set('Choose a Lamplight export (.json) or a spreadsheet saved as CSV (.csv). Nothing was changed.');
      return;
    }
    this.progress.set({ done: 0, total: 0 });
    try {
      const result = await this.sync.holdWhile(() => this.importer.importJson(file, (progress) => this.progress.set(progress)));
      if ('problem' in result) this.problem.set(result.problem);
      else {
        this.summary.set(result.summary);
        void this.sync.syncNow().catch(() => undefined);
      }
    } finally {
      this.progress.set(null);
    }
  }

  protected percent(progress: ExportProgress): number {
    return progress.total === 0 ? 0 : Math.round((progress.done / progress.total) * 100);
  }
}
