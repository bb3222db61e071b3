import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import type { EmailVerified, ResetRequested } from '@shared/api/auth';

/**
 * The account's online-only calls besides signing in (`Auth`): password resets, e-mail
 * verification, changing the password and deleting the account. Pages call these, never
 * `HttpClient` themselves; errors reach the caller as `HttpErrorResponse` for its form to show.
 */
@Injectable({ providedIn: 'root' })
export class AccountApi {
  private readonly http = inject(HttpClient);

  requestPasswordReset(body: { email: string }): Promise<ResetRequested> {
    return firstValueFrom(this.http.post<ResetRequested>('/api/auth/password-reset/request', body));
  }

  confirmPasswordReset(body: { token: string; newPassword: string }): Promise<unknown> {
    return firstValueFrom(this.http.post('/api/auth/password-reset/confirm', body));
  }

  sendVerificationLink(): Promise<EmailVerified> {
    return firstValueFrom(this.http.post<EmailVerified>('/api/auth/verify-email/send', {}));
  }

  verifyEmail(token: string): Promise<EmailVerified> {
    return firstValueFrom(this.http.post<EmailVerified>('/api/auth/verify-email', { token }));
  }

  changePassword(body: { currentPassword: string; newPassword: string }): Promise<unknown> {
    return firstValueFrom(this.http.post('/api/auth/password', body));
  }

  deleteAccount(body: { password: string }): Promise<unknown> {
    return firstValueFrom(this.http.request('DELETE', '/api/auth/account', { body }));
  }
}
