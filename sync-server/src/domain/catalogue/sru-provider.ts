import type { CatalogueBook } from '../../../../shared/api/catalogue';
import { isbn13To10 } from '../../../../shared/isbn/isbn13-to-10';
import { CatalogueError, type CatalogueProvider } from './catalogue-provider';
import { cqlTerm } from './cql';
import { marcToBook } from './marc-to-book';
import { readSruResponse } from './sru-response';

/** Answers larger than this are not a handful of book records. */
const MAX_RESPONSE_BYTES = 4 * 1024 * 1024;
const SEARCH_RECORDS = 10;
const ISBN_RECORDS = 5;
/** SRU Diagnostics List: "Unsupported relation". */
const UNSUPPORTED_RELATION = 'info:srw/diagnostic/1/19';

/**
 * A catalogue that speaks SRU 2.0 (OASIS searchRetrieve Part 3): searchRetrieve over HTTP GET
 * with a CQL query and `recordSchema=marcxml`, MARC 21 records back. `operation` and
 * `version` are sent as well, which 2.0 servers ignore and 1.x servers need.
 */
export class SruProvider implements CatalogueProvider {
  readonly name: string;

  constructor(
    private readonly baseUrl: string,
    private readonly timeoutMs: number,
  ) {
    this.name = new URL(baseUrl).host;
  }

  async lookupByIsbn(isbn: string): Promise<CatalogueBook[]> {
    // Older records carry only the ISBN-10, and some catalogues index only what is written.
    const isbn10 = isbn13To10(isbn);
    const query = isbn10 ? `bath.isbn=${isbn} or bath.isbn=${isbn10}` : `bath.isbn=${isbn}`;
    const records = await this.searchRetrieve(query, ISBN_RECORDS);
    return records.map((record) => marcToBook(record, isbn)).filter((book) => book.isbns.includes(isbn));
  }

  async search(title: string | null, author: string | null): Promise<CatalogueBook[]> {
    const query = (relation: string) =>
      [title ? `dc.title ${relation} ${cqlTerm(title)}` : null, author ? `dc.creator ${relation} ${cqlTerm(author)}` : null].filter(Boolean).join(' and ');
    let records;
    try {
      records = await this.searchRetrieve(query('all'), SEARCH_RECORDS);
    } catch (error) {
      // Diagnostic 19, "Unsupported relation": a catalogue without `all` still knows `=`.
      if (!(error instanceof CatalogueError && error.diagnosticUri === UNSUPPORTED_RELATION)) throw error;
      records = await this.searchRetrieve(query('='), SEARCH_RECORDS);
    }
    return records.map((record) => marcToBook(record)).filter((book) => book.title);
  }

  private async searchRetrieve(query: string, maximumRecords: number) {
    const url = new URL(this.baseUrl);
    url.searchParams.set('operation', 'searchRetrieve');
    url.searchParams.set('version', '2.0');
    url.searchParams.set('query', query);
    url.searchParams.set('recordSchema', 'marcxml');
    url.searchParams.set('recordXMLEscaping', 'xml');
    url.searchParams.set('maximumRecords', String(maximumRecords));
    const xml = await this.fetchText(url);
    const result = readSruResponse(xml);
    if (result.records.length === 0 && result.diagnostics.length > 0) {
      const first = result.diagnostics[0]!;
      throw new CatalogueError(
        'diagnostic',
        `The catalogue could not run the search: ${first.message || first.uri}${first.details ? ` (${first.details})` : ''}`,
        first.uri,
      );
    }
    return result.records;
  }

  private async fetchText(url: URL): Promise<string> {
    let response: Response;
    try {
      response = await fetch(url, { signal: AbortSignal.timeout(this.timeoutMs), headers: { Accept: 'application/sru+xml, application/xml, text/xml' } });
      const length = Number(response.headers.get('content-length') ?? 0);
      if (length > MAX_RESPONSE_BYTES) throw new CatalogueError('malformed', 'The catalogue’s answer is too large to be a few records');
      const text = await response.text();
      // SRU servers send diagnostics with 200, and some with 4xx/5xx: read any XML they send.
      if (!response.ok && !text.trimStart().startsWith('<')) throw new CatalogueError('unavailable', `The catalogue answered ${response.status}`);
      return text;
    } catch (error) {
      if (error instanceof CatalogueError) throw error;
      if (error instanceof Error && (error.name === 'TimeoutError' || error.name === 'AbortError')) {
        throw new CatalogueError('timeout', `The catalogue did not answer within ${this.timeoutMs / 1000} s`);
      }
      throw new CatalogueError('unavailable', 'The catalogue could not be reached');
    }
  }
}
