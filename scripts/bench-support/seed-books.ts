/** Books for the browser benchmarks, written straight into a reader's IndexedDB as the app's store would leave them. */
import type { Page } from 'playwright-core';

const WORDS = ['Lantern', 'Orchard', 'River', 'Salt', 'Harbour', 'Moth', 'Copper', 'Winter', 'Glass', 'Fen', 'Heron', 'Ledger'];

/** Invented books: titles and authors made from a small word list, statuses and formats in turn. */
export function benchBooks(count: number): Record<string, unknown>[] {
  const statuses = ['tbr', 'reading', 'paused', 'finished', 'dnf'];
  const formats = ['print', 'ebook', 'audiobook'];
  const books: Record<string, unknown>[] = [];
  for (let n = 0; n < count; n++) {
    const pick = (list: string[], k: number) => list[(n * k + Math.floor(n / list.length)) % list.length]!;
    books.push({
      id: crypto.randomUUID(),
      title: `The ${pick(WORDS, 7)} of ${pick(WORDS, 11)} ${n}`,
      authors: [`${pick(WORDS, 3)} ${pick(WORDS, 5)}son`],
      format: pick(formats, 1),
      status: pick(statuses, 1),
      rating: n % 3 === 0 ? null : ((n % 10) + 1) / 2,
      deleted: false,
      _hlc: {},
    });
  }
  return books;
}

/** Puts `count` books into the object store `books` of the page's IndexedDB database `name`. */
export async function seedBooks(page: Page, name: string, count: number): Promise<void> {
  await page.evaluate(
    async ({ name, books }) => {
      // The app makes its database once the signed-in shell has loaded, which can be after sign-in
      // returns on a busy machine; opened first from here, it would be made empty (no `books`).
      for (const giveUp = Date.now() + 60_000; !(await indexedDB.databases()).some((db) => db.name === name);) {
        if (Date.now() > giveUp) throw new Error(`no database ${name} after 60 s`);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
      const db: IDBDatabase = await new Promise((resolve, reject) => {
        const open = indexedDB.open(name);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      const tx = db.transaction('books', 'readwrite');
      for (const book of books) tx.objectStore('books').put(book);
      await new Promise((resolve, reject) => {
        tx.oncomplete = resolve;
        tx.onerror = () => reject(tx.error);
      });
      db.close();
    },
    { name, books: benchBooks(count) },
  );
}

export function median(values: readonly number[]): number {
  return percentile(values, 0.5);
}

/** The nearest-rank percentile (p in 0…1). */
export function percentile(values: readonly number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1))] ?? NaN;
}
