import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

/** The private calendar feed, online only (`/api/calendar-feed`): the secret is never stored on the device. */
@Injectable({ providedIn: 'root' })
export class CalendarFeedApi {
  private readonly http = inject(HttpClient);

  status(): Promise<{ active: boolean; createdAt: string | null }> {
    return firstValueFrom(this.http.get<{ active: boolean; createdAt: string | null }>('/api/calendar-feed'));
  }

  /** A new private URL path; the one before stops working. */
  async regenerate(): Promise<string> {
    return (await firstValueFrom(this.http.post<{ path: string }>('/api/calendar-feed', {}))).path;
  }

  revoke(): Promise<unknown> {
    return firstValueFrom(this.http.delete('/api/calendar-feed'));
  }
}
