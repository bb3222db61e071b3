import type { Page } from 'playwright-core';

/**
 * Waits in the page until the reader's IndexedDB holds `field` = `value` in row `rowId` of
 * `store`, polling every few milliseconds; resolves with the page's `Date.now()` at that moment.
 */
export function arrivalInIndexedDb(
  page: Page,
  args: { userId: string; store: string; rowId: string; field: string; value: unknown; timeoutMs: number },
): Promise<number> {
  return page.evaluate(
    ({ userId, store, rowId, field, value, timeoutMs }) =>
      new Promise<number>((resolve, reject) => {
        const deadline = Date.now() + timeoutMs;
        const look = () => {
          const opening = indexedDB.open(`lamplight-journal-${userId}`);
          opening.onsuccess = () => {
            const db = opening.result;
            const get = db.transaction(store, 'readonly').objectStore(store).get(rowId);
            get.onsuccess = () => {
              db.close();
              const row = get.result as Record<string, unknown> | undefined;
              if (row && JSON.stringify(row[field]) === JSON.stringify(value)) resolve(Date.now());
              else if (Date.now() > deadline) reject(new Error(`${store}/${rowId}.${field} did not arrive in ${timeoutMs} ms`));
              else setTimeout(look, 5);
            };
            get.onerror = () => (db.close(), reject(get.error));
          };
          opening.onerror = () => reject(opening.error);
        };
        look();
      }),
    args,
  );
}
