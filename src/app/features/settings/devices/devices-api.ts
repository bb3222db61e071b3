import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import type { DeviceSessionView } from '@shared/api/devices';

/** The reader's signed-in devices, online only (`/api/devices`): not synced data, so no local copy. */
@Injectable({ providedIn: 'root' })
export class DevicesApi {
  private readonly http = inject(HttpClient);

  list(): Promise<DeviceSessionView[]> {
    return firstValueFrom(this.http.get<DeviceSessionView[]>('/api/devices'));
  }

  rename(id: string, name: string): Promise<DeviceSessionView> {
    return firstValueFrom(this.http.patch<DeviceSessionView>(`/api/devices/${encodeURIComponent(id)}`, { name }));
  }

  signOut(id: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(`/api/devices/${encodeURIComponent(id)}`));
  }
}
