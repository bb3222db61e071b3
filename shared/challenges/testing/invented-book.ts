import type { ChallengeBook } from '../challenge-book';

/** An invented book for the challenge specs: finished on `finishedOn` unless another status is given. */
export const inventedBook = (id: string, finishedOn: string | undefined, status = 'finished'): ChallengeBook => ({
  id,
  title: `Saltmarsh ${id}`,
  authors: ['Kit Ashdown'],
  status,
  finishedOn,
});
