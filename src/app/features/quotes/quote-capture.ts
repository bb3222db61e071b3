import { Injectable } from '@angular/core';

/**
 * Opens the quick quote capture for a book. A stand-in: it does nothing yet, and the real one
 * lands with the quotes work (same path, same API), replacing this file on merge.
 */
@Injectable({ providedIn: 'root' })
export class QuoteCapture {
  /** Opens the capture, prefilled with the book and page when given. */
  open(_options?: { bookId?: string; page?: number }): void {
    // Intentionally empty until the quotes work lands.
  }
}
