import { inject, Injectable } from '@angular/core';
import type { MatDialogRef } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

import type { Quote } from '@shared/sync/schema/collections';

import { LazyOverlays } from '../../ui/lazy-overlays';
import type { QuoteCaptureData, QuoteCaptureDialog } from './quote-capture-dialog/quote-capture-dialog';

/** Where a new quote is from, when the caller knows. */
export interface QuoteCaptureOptions {
  /** The book it is from; otherwise the book the reader is reading (most recently started). */
  readonly bookId?: string;
  /** The page, to fill in for a print book. */
  readonly page?: number;
}

/**
 * Capturing a quote in a few seconds, from anywhere: opens the capture dialog and saves to this
 * device only, so it works offline. The dialog's code loads on first use (the service worker
 * has it cached), keeping it out of the app's first download.
 */
@Injectable({ providedIn: 'root' })
export class QuoteCapture {
  private readonly overlays = inject(LazyOverlays);
  private open$: Promise<string | undefined> | null = null;

  /** Opens the capture dialog; resolves with the new quote's id, or `undefined` if cancelled. */
  open(options: QuoteCaptureOptions = {}): Promise<string | undefined> {
    return this.run({ bookId: options.bookId, page: options.page }, 'Quote saved on this device.');
  }

  /** Opens the same dialog on an existing quote; resolves with its id once saved, else `undefined`. */
  edit(quote: Quote): Promise<string | undefined> {
    return this.run({ quote }, 'Quote saved.');
  }

  /** One dialog at a time: a second tap while it opens (or is open) gets the same one. */
  private run(data: QuoteCaptureData, savedMessage: string): Promise<string | undefined> {
    this.open$ ??= this.show(data, savedMessage).finally(() => (this.open$ = null));
    return this.open$;
  }

  private async show(data: QuoteCaptureData, savedMessage: string): Promise<string | undefined> {
    const { QuoteCaptureDialog } = await import('./quote-capture-dialog/quote-capture-dialog');
    const ref: MatDialogRef<QuoteCaptureDialog, string> = await this.overlays.dialog(QuoteCaptureDialog, {
      data,
      width: '600px',
      maxWidth: '100vw',
      maxHeight: '100dvh',
    });
    // Cancel closes with '' (mat-dialog-close), Escape with nothing: both mean no quote.
    const id = (await firstValueFrom(ref.afterClosed())) || undefined;
    if (id) void this.overlays.snackBar(savedMessage, undefined, { duration: 3000 });
    return id;
  }
}
