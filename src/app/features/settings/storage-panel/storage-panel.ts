import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';

import { DeviceStorage } from '../../../core/device/device-storage';
import { InstallPrompt } from '../../../core/pwa/install-prompt';

/** This device's storage: whether the browser keeps it, how much is used, and the usual caution. */
@Component({
  selector: 'll-storage-panel',
  imports: [DecimalPipe, MatButtonModule],
  templateUrl: './storage-panel.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StoragePanel {
  private readonly storage = inject(DeviceStorage);
  private readonly installPrompt = inject(InstallPrompt);
  protected readonly report = this.storage.report;
  protected readonly installed = computed(() => this.installPrompt.option() === 'installed');
  protected readonly usedMiB = computed(() => (this.report().usageBytes ?? 0) / 1024 / 1024);
  protected readonly quotaMiB = computed(() => (this.report().quotaBytes ?? 0) / 1024 / 1024);

  constructor() {
    void this.storage.refresh();
  }

  protected askAgain(): void {
    void this.storage.requestPersistence();
  }
}
