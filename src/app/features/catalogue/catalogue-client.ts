import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import { isApiErrorBody } from '@shared/api/api-error';
import type { CatalogueAnswer, CatalogueBook } from '@shared/api/catalogue';

import { isUnreachable } from '../../core/http/api-error-message';

/** Why a look-up gave no books; `offline` means it can be tried again later. */
export type CatalogueProblem = 'offline' | 'no_match' | 'failed' | 'refused';

export type CatalogueOutcome =
  | { readonly kind: 'found'; readonly books: readonly CatalogueBook[]; readonly source: string }
  | { readonly kind: 'problem'; readonly problem: CatalogueProblem; readonly message: string };

/** Our words for each way a look-up can fail. Whatever happens, the book saves as typed. */
const MESSAGES: Readonly<Record<string, string>> = {
  offline: 'You’re offline, so the catalogue can’t be asked now. Save the book as it is: once you’re back online, its page will offer what the catalogue has.',
  no_match: 'The catalogue has no book with this ISBN. Check the digits, or fill in the details yourself.',
  no_results: 'Nothing in the catalogue matches those words. Try fewer words, or fill in the details yourself.',
  catalogue_timeout: 'The catalogue took too long to answer. Try again in a moment, or fill in the details yourself — the book saves either way.',
  catalogue_unavailable: 'The catalogue can’t be reached just now. Try again later, or fill in the details yourself — the book saves either way.',
  catalogue_malformed: 'The catalogue sent an answer we couldn’t read. Try again later, or fill in the details yourself — the book saves either way.',
  too_many_attempts: 'That was a lot of look-ups in a minute. Wait a moment, then try again.',
};

/** Asks our server's catalogue routes; every failure becomes a message rather than an error. */
@Injectable({ providedIn: 'root' })
export class CatalogueClient {
  private readonly http = inject(HttpClient);

  /** Books with this ISBN (any valid ISBN-10 or ISBN-13). */
  lookUp(isbn: string): Promise<CatalogueOutcome> {
    return this.ask(`/api/catalogue/isbn/${encodeURIComponent(isbn.trim())}`, {}, 'no_match');
  }

  /** Books whose titles, else whose authors, have these words. */
  search(words: string): Promise<CatalogueOutcome> {
    return this.ask('/api/catalogue/search', { q: words.trim() }, 'no_results');
  }

  private async ask(url: string, params: Record<string, string>, emptyCode: string): Promise<CatalogueOutcome> {
    try {
      const answer = await firstValueFrom(this.http.get<CatalogueAnswer>(url, { params }));
      if (answer.books.length === 0) return { kind: 'problem', problem: 'no_match', message: MESSAGES[emptyCode]! };
      return { kind: 'found', books: answer.books, source: answer.source };
    } catch (error) {
      return problemOf(error);
    }
  }
}

function problemOf(error: unknown): CatalogueOutcome {
  if (isUnreachable(error) || !(error instanceof HttpErrorResponse)) return { kind: 'problem', problem: 'offline', message: MESSAGES['offline']! };
  const body = isApiErrorBody(error.error) ? error.error.error : null;
  const code = body?.code ?? '';
  if (code === 'no_match') return { kind: 'problem', problem: 'no_match', message: MESSAGES['no_match']! };
  if (error.status === 400) {
    const reason = body?.details && !Array.isArray(body.details) ? Object.values(body.details as Record<string, string>)[0] : undefined;
    return { kind: 'problem', problem: 'refused', message: reason ?? body?.message ?? 'The catalogue could not be asked that.' };
  }
  return { kind: 'problem', problem: 'failed', message: MESSAGES[code] ?? MESSAGES['catalogue_unavailable']! };
}
