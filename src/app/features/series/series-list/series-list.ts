import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';

import { nextUnread, seriesBooks, seriesProgress } from '@shared/journal/series-order';

import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { notBlank } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { allSeries } from '../series-data';

/** Every series the reader follows, how far they are in each, and what comes next. */
@Component({
  selector: 'll-series-list',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, TextField],
  templateUrl: './series-list.html',
  styleUrl: './series-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SeriesList {
  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);

  private readonly data = liveQuerySignal(allSeries, { series: [], books: [] });
  protected readonly rows = computed(() =>
    this.data()
      .series.map((series) => {
        const ordered = seriesBooks(this.data().books, series.id);
        return { series, progress: seriesProgress(ordered, series.plannedCount), next: nextUnread(ordered) };
      })
      .sort((a, b) => (a.series.name ?? '').localeCompare(b.series.name ?? '')),
  );

  protected readonly adding = signal(false);
  protected readonly form = inject(FormBuilder).nonNullable.group({
    name: ['', [Validators.required, notBlank, Validators.maxLength(300)]],
    plannedCount: ['', [Validators.pattern(/^\s*\d*\s*$/), Validators.min(1), Validators.max(500)]],
  });

  protected async addSeries(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid) return;
    const { name, plannedCount } = this.form.getRawValue();
    const id = await this.store.create('series', {
      name: name.trim(),
      plannedCount: plannedCount.trim() ? Number(plannedCount) : null,
    });
    await this.router.navigate(['/journal/series', id]);
  }
}
