/**
 * localStorage, tolerating browsers where it is unavailable or full (private modes, quotas):
 * reads give `null` and writes are dropped rather than breaking the app.
 */
export const browserStorage = {
  read<T>(key: string): T | null {
    try {
      const raw = globalThis.localStorage?.getItem(key);
      return raw ? (JSON.parse(raw) as T) : null;
    } catch {
      return null;
    }
  },
  write(key: string, value: unknown): void {
    try {
      globalThis.localStorage?.setItem(key, JSON.stringify(value));
    } catch {
      // Storage unavailable: the value lives for this page only.
    }
  },
  remove(key: string): void {
    try {
      globalThis.localStorage?.removeItem(key);
    } catch {
      // Nothing stored, nothing to remove.
    }
  },
};
