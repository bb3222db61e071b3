import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatSlideToggleModule, type MatSlideToggleChange } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';

import type { AdminUserView } from '@shared/account/account-input';

import { Auth } from '../../../core/auth/auth';
import { readableError } from '../../../core/http/api-error-message';
import { AdminApi } from '../admin-api';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** Admins see accounts (never their journals), and can disable one or change its role. */
@Component({
  selector: 'll-accounts',
  imports: [ReaderDatePipe, DecimalPipe, RouterLink, MatButtonModule, MatSlideToggleModule, MatTableModule],
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

  constructor() {
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      this.users.set(await this.api.users());
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
