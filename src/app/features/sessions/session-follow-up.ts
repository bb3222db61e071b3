import { inject, Injectable } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

import { JournalStore } from '../../core/data/journal-store';
import { BookStatus } from '../../core/read-model/book-status';
import { bookEnd } from './book-position';
import { FinishDialog, type FinishDialogData } from './finish-dialog';

/** What was just saved, for {@link SessionFollowUp.afterSave}. */
export interface SavedSession {
  readonly bookId: string;
  /** A session that did not exist before. */
  readonly isNew: boolean;
  /** Where it ended in the book, when that was written now (new, or changed in an edit). */
  readonly toPosition: number | null | undefined;
}

/**
 * What a saved session means for its book: a TBR or paused book is being read again, and a
 * session that reaches the end asks whether the book is finished.
 */
@Injectable({ providedIn: 'root' })
export class SessionFollowUp {
  private readonly store = inject(JournalStore);
  private readonly bookStatus = inject(BookStatus);
  private readonly dialog = inject(MatDialog);

  /** Resolves once the reader has answered (or nothing needed asking). */
  async afterSave(saved: SavedSession): Promise<void> {
    const book = await this.store.get('books', saved.bookId);
    if (!book || book.deleted) return;
    const status = book.status ?? 'tbr';
    if (saved.isNew && (status === 'tbr' || status === 'paused')) await this.bookStatus.change(book.id, 'reading');

    const end = bookEnd(book);
    const reachedEnd = end !== null && saved.toPosition != null && saved.toPosition >= end;
    if (!reachedEnd || status === 'finished') return;
    const ref = this.dialog.open<FinishDialog, FinishDialogData, boolean>(FinishDialog, {
      data: { title: book.title ?? '' },
      width: '420px',
    });
    if (await firstValueFrom(ref.afterClosed())) await this.bookStatus.change(book.id, 'finished');
  }
}
