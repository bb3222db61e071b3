import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatSlideToggleModule, type MatSlideToggleChange } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';

import type { AdminUserView } from '@shared/api/admin';

import { Auth } from '../../../core/auth/auth';
import { readableError } from '../../../core/http/api-error-message';
import { AdminApi } from '../admin-api';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** Admins see accounts (never their journals), and can disable one or change its role. */
@Component({
  selector: 'll-accounts',
  imports: [ReaderDatePipe, DecimalPipe, RouterLink, MatButtonModule, MatPaginatorModule, MatSlideToggleModule, MatTableModule],
  templateUrl: './accounts.html',
  styleUrl: './accounts.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Accounts {
  private readonly api = inject(AdminApi);
  protected readonly me = inject(Auth).user;

  protected readonly columns = ['name', 'email', 'role', 'created', 'lastSeen', 'stored', 'enabled'];
  protected readonly users = signal<readonly AdminUserView[]>([]);
  protected readonly problem = signal('');
  protected readonly query = signal({ q: '', page: 0, size: 50 });
  protected readonly total = signal(0);
  private searchTimer: ReturnType<typeof setTimeout> | undefined;

  constructor() {
    void this.load();
  }

  /** Searches as the admin types, a moment after the last key (the server does the searching). */
  protected search(q: string): void {
    clearTimeout(this.searchTimer);
    this.searchTimer = setTimeout(() => {
      this.query.update((query) => ({ ...query, q: q.trim(), page: 0 }));
      void this.load();
    }, 300);
  }

  protected turnPage(event: PageEvent): void {
    this.query.update((query) => ({ ...query, page: event.pageIndex, size: event.pageSize }));
    void this.load();
  }

  private async load(): Promise<void> {
    const { q, page, size } = this.query();
    try {
      const answer = await this.api.users(q, page, size);
      if (answer.page !== this.query().page || q !== this.query().q) return; // a later search is on its way
      this.users.set(answer.accounts);
      this.total.set(answer.total);
      this.problem.set('');
    } catch (error) {
      this.problem.set(readableError(error).message);
    }
  }

  protected async setEnabled(user: AdminUserView, toggled: MatSlideToggleChange): Promise<void> {
    // The switch has already moved; its bound value has not, so a refusal must move it back itself.
    if (!(await this.update(user, { disabled: !toggled.checked }))) toggled.source.checked = !toggled.checked;
  }

  protected async toggleAdmin(user: AdminUserView): Promise<void> {
    await this.update(user, { role: user.role === 'admin' ? 'reader' : 'admin' });
  }

  /** Resolves whether the server took the change. */
  private async update(user: AdminUserView, change: Partial<Pick<AdminUserView, 'disabled' | 'role'>>): Promise<boolean> {
    try {
      const updated = await this.api.updateUser(user.id, change);
      this.users.update((list) => list.map((u) => (u.id === updated.id ? updated : u)));
      this.problem.set('');
      return true;
    } catch (error) {
      this.problem.set(readableError(error).message);
      return false;
    }
  }
}
