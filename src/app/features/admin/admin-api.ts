import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import type { AdminUserPage, AdminUserView, CaughtMail } from '@shared/api/admin';

/** The admin pages' calls (`/api/admin`), online only; the server checks the role on each. */
@Injectable({ providedIn: 'root' })
export class AdminApi {
  private readonly http = inject(HttpClient);

  /** One page of accounts matching `q` (searched and paged by the server). */
  users(q: string, page: number, size: number): Promise<AdminUserPage> {
    return firstValueFrom(this.http.get<AdminUserPage>('/api/admin/users', { params: { q, page, size } }));
  }

  updateUser(id: string, change: Partial<Pick<AdminUserView, 'disabled' | 'role'>>): Promise<AdminUserView> {
    return firstValueFrom(this.http.patch<AdminUserView>(`/api/admin/users/${encodeURIComponent(id)}`, change));
  }

  /** Development only: what the local inbox caught. */
  caughtMail(): Promise<CaughtMail[]> {
    return firstValueFrom(this.http.get<CaughtMail[]>('/api/admin/mail'));
  }

  /** Development only: empties the local inbox. */
  emptyCaughtMail(): Promise<{ removed: number }> {
    return firstValueFrom(this.http.delete<{ removed: number }>('/api/admin/mail'));
  }
}
