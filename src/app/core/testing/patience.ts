/**
 * How long a spec waits for something asynchronous (a live query's answer, a request sent after
 * a Web Lock) before it fails. Generous: `npm test` runs the unit specs beside the e2e specs and
 * a build on two cores, where the browser can wait seconds for the CPU; a passing spec never
 * waits this long. `performance.now()`, because some specs mock `Date`.
 */
export const PATIENCE_MS = 10_000;

/** When a wait that starts now must give up. */
export function patienceDeadline(): number {
  return performance.now() + PATIENCE_MS;
}

/** Whether a wait with this deadline may go on. */
export function stillPatient(deadline: number): boolean {
  return performance.now() < deadline;
}

/** The browser's own timer, kept before any spec installs jasmine.clock, so waits stay real. */
const realSetTimeout = globalThis.setTimeout.bind(globalThis);

/** A few real milliseconds for IndexedDB, Web Locks and live queries to move on, whatever clock a spec has installed. */
export const realPause = (ms = 5) => new Promise<void>((resolve) => realSetTimeout(resolve, ms));

/**
 * Resolves with what `look` gives once it gives something (true, an element, a sent request),
 * running `settle` before each look (change detection, a fixture's `whenStable`) and pausing a
 * few real milliseconds between looks. Fails naming `what` once `timeoutMs` has passed.
 */
export async function patiently<T>(
  what: string | (() => string),
  look: () => T | Promise<T>,
  settle: () => unknown = () => undefined,
  timeoutMs = PATIENCE_MS,
): Promise<NonNullable<T>> {
  for (const deadline = performance.now() + timeoutMs; stillPatient(deadline);) {
    await settle();
    const value = await look();
    if (value) return value;
    await realPause();
  }
  throw new Error(`gave up waiting for ${typeof what === 'string' ? what : what()}`);
}
