import { Router, type RequestHandler } from 'express';
import * as z from 'zod';

import type { CatalogueAnswer, CatalogueErrorCode } from '../../../shared/api/catalogue';
import { normalizeIsbn } from '../../../shared/isbn/normalize-isbn';
import type { Catalogue } from '../domain/catalogue/catalogue';
import { CatalogueError, type CatalogueFailure } from '../domain/catalogue/catalogue-provider';
import { AppError } from '../errors';
import { parseInput } from './parse-input';

/** Control characters and lone surrogates: no catalogue search needs them, and PostgreSQL refuses NUL. */
const UNREADABLE = /[\u0000-\u001f\u007f]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
const words = (what: string) =>
  z
    .string({ error: `${what} must be given once, as text` })
    .trim()
    .max(200, `${what} must be at most 200 characters`)
    .refine((value) => !UNREADABLE.test(value), `${what} has characters that cannot be searched for`)
    .optional();

const isbnParams = z.object({
  isbn: z.string().refine((value) => normalizeIsbn(value) !== null, 'Enter a valid ISBN-10 or ISBN-13 (check the digits)'),
});
const searchQuery = z
  .object({ q: words('The search'), title: words('The title'), author: words('The author') })
  .refine((query) => !!(query.q || query.title || query.author), { path: ['q'], message: 'Type some words of a title or an author’s name' });

const FAILURE_CODES: Record<CatalogueFailure, CatalogueErrorCode> = {
  timeout: 'catalogue_timeout',
  unavailable: 'catalogue_unavailable',
  diagnostic: 'catalogue_unavailable',
  malformed: 'catalogue_malformed',
};

/**
 * A catalogue's failure as the API's own error: 502, since the catalogue behind us failed,
 * not the request (504 is kept for "no network", which the app's service worker answers).
 */
async function askCatalogue(question: () => Promise<CatalogueAnswer>): Promise<CatalogueAnswer> {
  try {
    return await question();
  } catch (error) {
    if (error instanceof CatalogueError) throw new AppError(502, FAILURE_CODES[error.failure], error.message);
    throw error;
  }
}

/**
 * `/api/catalogue` (behind requireAuth): book details from library catalogues.
 * `GET /isbn/:isbn` answers the books with that ISBN (404 `no_match` when none has it);
 * `GET /search?q=` finds titles with those words, then names; `?title=&author=` both at once.
 */
export function catalogueRoutes(catalogue: Catalogue, limiter: RequestHandler): Router {
  const router = Router();
  router.use(limiter);

  router.get('/isbn/:isbn', async (req, res) => {
    const isbn = normalizeIsbn(parseInput(isbnParams, req.params).isbn)!;
    const answer = await askCatalogue(() => catalogue.lookupByIsbn(isbn));
    if (answer.books.length === 0) throw new AppError(404, 'no_match', 'No catalogue has a book with this ISBN');
    res.json(answer satisfies CatalogueAnswer);
  });

  router.get('/search', async (req, res) => {
    const { q, title, author } = parseInput(searchQuery, req.query);
    const answer = await askCatalogue(async () => {
      if (title || author) return catalogue.search(title || null, author || null);
      const byTitle = await catalogue.search(q!, null);
      return byTitle.books.length > 0 ? byTitle : catalogue.search(null, q!);
    });
    res.json(answer satisfies CatalogueAnswer);
  });

  return router;
}
