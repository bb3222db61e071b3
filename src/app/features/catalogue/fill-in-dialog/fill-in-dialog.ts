import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatRadioModule } from '@angular/material/radio';

import type { CatalogueBook } from '@shared/api/catalogue';

import { fillChoices, matchLine, type FillableField, type FillValues } from '../fill-values';

export interface FillInData {
  /** The matches; the reader picks one when there are several. */
  readonly books: readonly CatalogueBook[];
  /** Where they came from (a catalogue's host, or `cache`). */
  readonly source: string;
  /** What the form (or the stored book) holds now. */
  readonly current: Partial<FillValues>;
}

/** The fields the reader chose, with the catalogue's values; nothing when they cancelled. */
export type FillInResult = Partial<Record<FillableField, string>>;

/**
 * "Details from the catalogue": shows the match (or lets the reader pick one of several) and
 * a tick box per field it would fill. Empty fields are ticked; a field the reader typed into is
 * left unticked and says what it would replace, so nothing typed is overwritten unasked.
 */
@Component({
  selector: 'll-fill-in-dialog',
  imports: [MatDialogModule, MatButtonModule, MatCheckboxModule, MatRadioModule],
  templateUrl: './fill-in-dialog.html',
  styleUrl: './fill-in-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FillInDialog {
  protected readonly data = inject<FillInData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<FillInDialog, FillInResult>>(MatDialogRef);

  protected readonly picked = signal(0);
  protected readonly book = computed(() => this.data.books[this.picked()]!);
  protected readonly choices = computed(() => fillChoices(this.data.current, this.book()));
  /** Fields the reader has ticked; reset to "the empty ones" when another match is picked. */
  protected readonly taken = signal<ReadonlySet<FillableField>>(new Set());
  protected readonly matchLine = matchLine;
  protected readonly sourceLine = this.data.source === 'cache' ? 'From an earlier look-up' : `From ${this.data.source}`;

  constructor() {
    this.pick(0);
  }

  protected pick(index: number): void {
    this.picked.set(index);
    this.taken.set(
      new Set(
        this.choices()
          .filter((choice) => !choice.replaces)
          .map((choice) => choice.field),
      ),
    );
  }

  protected toggle(field: FillableField, checked: boolean): void {
    const next = new Set(this.taken());
    if (checked) next.add(field);
    else next.delete(field);
    this.taken.set(next);
  }

  protected take(): void {
    const chosen = this.choices().filter((choice) => this.taken().has(choice.field));
    this.ref.close(Object.fromEntries(chosen.map((choice) => [choice.field, choice.offered])) as FillInResult);
  }
}
