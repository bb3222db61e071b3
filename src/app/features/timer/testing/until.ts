import { TestBed } from '@angular/core/testing';

/** Waits until a condition holds: Dexie live queries (and what shows them) answer asynchronously. */
export async function until(condition: () => boolean, timeoutMs = 3000, what = 'the live query'): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!condition()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 10));
    TestBed.tick();
  }
}
