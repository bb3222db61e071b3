import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import type { CircleDetails, CircleSummary } from '@shared/circles/circle-wire';

/**
 * The online-only circle actions: creating, joining, inviting and membership. Circle data itself
 * (picks, schedule, posts, answers) goes through the device's store and CircleSync.
 */
@Injectable({ providedIn: 'root' })
export class CirclesApi {
  private readonly http = inject(HttpClient);

  async list(): Promise<CircleSummary[]> {
    return (await firstValueFrom(this.http.get<{ circles: CircleSummary[] }>('/api/circles'))).circles;
  }
  create(name: string, description: string | null): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>('/api/circles', { name, description }));
  }
  joinByCode(code: string): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>('/api/circles/join', { code }));
  }
  acceptInvitation(token: string): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>('/api/circles/invitations/accept', { token }));
  }
  details(circleId: string): Promise<CircleDetails> {
    return firstValueFrom(this.http.get<CircleDetails>(`/api/circles/${circleId}`));
  }
  invite(circleId: string, email: string): Promise<unknown> {
    return firstValueFrom(this.http.post(`/api/circles/${circleId}/invitations`, { email }));
  }
  rotateJoinCode(circleId: string): Promise<{ joinCode: string }> {
    return firstValueFrom(this.http.post<{ joinCode: string }>(`/api/circles/${circleId}/join-code`, {}));
  }
  remove(circleId: string, userId: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(`/api/circles/${circleId}/members/${userId}`));
  }
  handOver(circleId: string, userId: string, stayHost: boolean): Promise<unknown> {
    return firstValueFrom(this.http.post(`/api/circles/${circleId}/hosts`, { userId, stayHost }));
  }
  leave(circleId: string): Promise<unknown> {
    return firstValueFrom(this.http.post(`/api/circles/${circleId}/leave`, {}));
  }
}
