import type { CatalogueBook } from '../../../../shared/api/catalogue';

/** How a catalogue failed to answer; none of these is the reader's fault. */
export type CatalogueFailure = 'timeout' | 'unavailable' | 'malformed' | 'diagnostic';

export class CatalogueError extends Error {
  constructor(
    readonly failure: CatalogueFailure,
    message: string,
    /** For `diagnostic`: the SRU diagnostic's URI, e.g. info:srw/diagnostic/1/19. */
    readonly diagnosticUri?: string,
  ) {
    super(message);
    this.name = 'CatalogueError';
  }
}

/**
 * A library catalogue. Both methods answer the records found (none is an answer too) or throw
 * a `CatalogueError` when the catalogue could not be asked or its answer could not be read.
 */
export interface CatalogueProvider {
  /** Shown to readers as where the details came from (the catalogue's host). */
  readonly name: string;
  /** `isbn` is ISBN-13 digits. */
  lookupByIsbn(isbn: string): Promise<CatalogueBook[]>;
  /** Words of a title and/or an author's name; at least one is given. */
  search(title: string | null, author: string | null): Promise<CatalogueBook[]>;
}
