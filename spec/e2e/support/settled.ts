import type { Locator } from 'playwright-core';

/**
 * What `read` answers once `done` holds of it, or its last answer after `timeoutMs`. A page fills
 * some parts in from IndexedDB after it shows (later still on a busy machine), so a spec reads
 * such a value when it has come rather than once; the caller's `expect` still fails on a wrong one.
 */
export async function settled<T>(read: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 15_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let value = await read();
  while (!done(value) && Date.now() < deadline) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    value = await read();
  }
  return value;
}

/** A field's value once `done` holds of it (or its last value after the wait). */
export const valueWhen = (field: Locator, done: (value: string) => boolean): Promise<string> => settled(() => field.inputValue(), done);

/** An element's text once `done` holds of it (or its last text after the wait). */
export const textWhen = (element: Locator, done: (text: string) => boolean): Promise<string> => settled(async () => (await element.textContent()) ?? '', done);
