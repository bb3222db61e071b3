import type { FinishedBook } from '../../goals/finished-books';
import type { ChallengeBook } from '../challenge-book';

/** An invented book for the challenge specs: finished on `finishedOn` unless another status is given. */
export const inventedBook = (id: string, finishedOn: string | undefined, status = 'finished'): ChallengeBook => ({
  id,
  title: `Saltmarsh ${id}`,
  authors: ['Kit Ashdown'],
  status,
  finishedOn,
});

/** An invented finish, as goals and insights count them. */
export const inventedFinish = (id: string, finishedOn: string): FinishedBook => ({ ...inventedBook(id, finishedOn), status: 'finished', finishedOn });
