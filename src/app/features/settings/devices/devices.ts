import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';

import type { DeviceSessionView } from '@shared/api/devices';

import { readableError } from '../../../core/http/api-error-message';
import { DevicesApi } from './devices-api';
import { ReaderDatePipe } from '../../../ui/reader-date';

/** The reader's signed-in devices: rename one, or sign out a lost one. Needs a connection. */
@Component({
  selector: 'll-devices',
  imports: [FormsModule, ReaderDatePipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './devices.html',
  styleUrl: './devices.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Devices {
  private readonly api = inject(DevicesApi);

  protected readonly devices = signal<readonly DeviceSessionView[]>([]);
  protected readonly problem = signal('');
  protected readonly loaded = signal(false);
  protected readonly renaming = signal<string | null>(null);
  protected draftName = '';

  constructor() {
    void this.load();
  }

  protected async load(): Promise<void> {
    try {
      this.devices.set(await this.api.list());
      this.problem.set('');
    } catch (error) {
      const readable = readableError(error);
      this.problem.set(readable.offline ? 'Your devices are listed when you are online.' : readable.message);
    } finally {
      this.loaded.set(true);
    }
  }

  protected startRename(device: DeviceSessionView): void {
    this.draftName = device.name;
    this.renaming.set(device.id);
  }

  protected async saveName(device: DeviceSessionView): Promise<void> {
    try {
      const updated = await this.api.rename(device.id, this.draftName);
      this.devices.update((list) => list.map((d) => (d.id === updated.id ? updated : d)));
      this.renaming.set(null);
    } catch (error) {
      const readable = readableError(error);
      this.problem.set(readable.fields['name'] ?? readable.message);
    }
  }

  protected async signOutDevice(device: DeviceSessionView): Promise<void> {
    try {
      await this.api.signOut(device.id);
      this.devices.update((list) => list.filter((d) => d.id !== device.id));
    } catch (error) {
      this.problem.set(readableError(error).message);
    }
  }
}
