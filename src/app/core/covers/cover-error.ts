/** Why a file could not become a cover. */
export type CoverErrorReason = 'unreadable' | 'too-large' | 'cannot-encode';

/**
 * A file refused before it touched the journal. `message` is written for the reader and can be
 * shown as it is.
 */
export class CoverError extends Error {
  constructor(
    readonly reason: CoverErrorReason,
    message: string,
  ) {
    super(message);
    this.name = 'CoverError';
  }
}
