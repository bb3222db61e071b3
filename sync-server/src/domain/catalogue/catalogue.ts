import type { CatalogueAnswer } from '../../../../shared/api/catalogue';
import type { CatalogueCache } from '../../data-access/catalogue-cache';
import { CatalogueError, type CatalogueProvider } from './catalogue-provider';

/** A found book is kept 30 days; "not found" one day, since catalogues add new books daily. */
export const FOUND_DAYS = 30;
export const NOT_FOUND_DAYS = 1;

/**
 * Look-ups through the configured catalogues, in order, with a shared cache. The first
 * catalogue that finds something answers; one that finds nothing or fails passes the question
 * on. When none found anything but one answered, the answer is "no books"; when every one
 * failed, the first catalogue's failure is thrown.
 */
export class Catalogue {
  constructor(
    private readonly providers: readonly CatalogueProvider[],
    private readonly cache: CatalogueCache,
  ) {}

  /** `isbn` is ISBN-13 digits. */
  lookupByIsbn(isbn: string): Promise<CatalogueAnswer> {
    return this.answer(`isbn:${isbn}`, (provider) => provider.lookupByIsbn(isbn));
  }

  search(title: string | null, author: string | null): Promise<CatalogueAnswer> {
    const key = `search:${(title ?? '').trim().toLowerCase()}|${(author ?? '').trim().toLowerCase()}`;
    return this.answer(key, (provider) => provider.search(title, author));
  }

  private async answer(key: string, ask: (provider: CatalogueProvider) => Promise<CatalogueAnswer['books']>): Promise<CatalogueAnswer> {
    const cached = await this.cache.get(key);
    if (cached) return { books: cached.books, source: 'cache' };
    const failures: CatalogueError[] = [];
    let emptyFrom: string | null = null;
    for (const provider of this.providers) {
      try {
        const books = await ask(provider);
        if (books.length > 0) {
          const answer = { books, source: provider.name };
          await this.cache.put(key, answer, FOUND_DAYS);
          return answer;
        }
        emptyFrom ??= provider.name;
      } catch (error) {
        if (!(error instanceof CatalogueError)) throw error;
        failures.push(error);
      }
    }
    if (emptyFrom !== null) {
      const answer = { books: [], source: emptyFrom };
      await this.cache.put(key, answer, NOT_FOUND_DAYS);
      return answer;
    }
    throw failures[0] ?? new CatalogueError('unavailable', 'No catalogue is configured');
  }
}
