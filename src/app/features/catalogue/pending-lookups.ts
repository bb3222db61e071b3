import { computed, inject, Injectable, signal } from '@angular/core';

import { Auth } from '../../core/auth/auth';
import { browserStorage } from '../../core/device/browser-storage';

const KEY_PREFIX = 'lamplight.catalogue-pending.';

/**
 * ISBNs the reader asked the catalogue about while offline, by book id, kept on this device
 * (localStorage, per reader) until the book's page has offered what the catalogue found.
 */
@Injectable({ providedIn: 'root' })
export class PendingLookups {
  private readonly auth = inject(Auth);
  private readonly key = computed(() => `${KEY_PREFIX}${this.auth.user()?.id ?? 'nobody'}`);
  private readonly changed = signal(0);
  /** Book id → ISBN, live. */
  readonly all = computed<Readonly<Record<string, string>>>(() => {
    this.changed();
    return browserStorage.read<Record<string, string>>(this.key()) ?? {};
  });

  add(bookId: string, isbn: string): void {
    this.save({ ...this.all(), [bookId]: isbn });
  }

  remove(bookId: string): void {
    const { [bookId]: _removed, ...rest } = this.all();
    this.save(rest);
  }

  private save(pending: Record<string, string>): void {
    browserStorage.write(this.key(), pending);
    this.changed.update((n) => n + 1);
  }
}
