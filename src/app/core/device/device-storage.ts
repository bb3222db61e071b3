import { Injectable, signal } from '@angular/core';

/** What the browser says about this app's storage on this device. */
export interface StorageReport {
  /** The browser promised not to clear our data under storage pressure. */
  readonly persisted: boolean | null;
  readonly usageBytes: number | null;
  readonly quotaBytes: number | null;
}

/**
 * The journal lives in this browser's storage. Asking for persistent storage (StorageManager,
 * WHATWG Storage Standard) keeps a browser from clearing it to free space; browsers decide on
 * their own, often granting it to installed or much-used apps.
 */
@Injectable({ providedIn: 'root' })
export class DeviceStorage {
  private readonly state = signal<StorageReport>({ persisted: null, usageBytes: null, quotaBytes: null });
  readonly report = this.state.asReadonly();

  /** Asks once for persistent storage, then refreshes the report. */
  async requestPersistence(): Promise<boolean> {
    const storage = globalThis.navigator?.storage;
    let persisted = false;
    try {
      persisted = (await storage?.persisted?.()) || ((await storage?.persist?.()) ?? false);
    } catch {
      persisted = false; // not allowed here (private mode, an embedded view)
    }
    await this.refresh(persisted);
    return persisted;
  }

  async refresh(persisted?: boolean): Promise<void> {
    const storage = globalThis.navigator?.storage;
    try {
      const estimate = await storage?.estimate?.();
      this.state.set({
        persisted: persisted ?? (await storage?.persisted?.()) ?? null,
        usageBytes: estimate?.usage ?? null,
        quotaBytes: estimate?.quota ?? null,
      });
    } catch {
      this.state.set({ persisted: persisted ?? null, usageBytes: null, quotaBytes: null });
    }
  }
}
