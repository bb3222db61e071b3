import { inject, signal } from '@angular/core';
import { Router } from '@angular/router';

import { readableError } from '../../../core/http/api-error-message';
import { CircleSync } from './circle-sync';

/**
 * Starting a circle, joining one by code and accepting an invitation all need the server; then the
 * circle syncs to this device and opens. One per page (create it in a field): `busy` while that
 * runs, `message` when it failed.
 */
export class CircleEntry {
  private readonly sync = inject(CircleSync);
  private readonly router = inject(Router);
  readonly busy = signal(false);
  readonly message = signal<string | null>(null);

  async enter(action: () => Promise<{ id: string }>): Promise<void> {
    this.busy.set(true);
    this.message.set(null);
    try {
      const { id } = await action();
      await this.sync.syncAll();
      await this.router.navigate(['/circles', id]);
    } catch (error) {
      this.message.set(readableError(error).message);
    } finally {
      this.busy.set(false);
    }
  }
}
