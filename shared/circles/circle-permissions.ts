import { isHost, type CircleRole } from './circle-roles';
import type { CircleCollectionName } from './circle-collections';

/** Who is writing, and to which row: what the server knows when a change arrives. */
export interface WriteContext {
  readonly circleId: string;
  readonly role: CircleRole;
  readonly callerId: string;
  /** The row's author (its first writer), or `undefined` for a row the server has not seen. */
  readonly authorId: string | undefined;
}

export interface WriteRefusal {
  readonly code: 'not_allowed' | 'wrong_circle';
  readonly reason: string;
}

/** Collections only hosts write: the circle itself and its schedule. */
const HOSTS_WRITE: ReadonlySet<string> = new Set(['circles', 'circlePicks', 'circleParts']);
/** Collections whose rows belong to their author alone. */
const AUTHORS_WRITE: ReadonlySet<string> = new Set(['circleReactions', 'circleRsvps', 'circleProgress']);

/**
 * Whether a member may write this field of this row. Every row names its own circle; hosts keep
 * the circle and schedule; a post is its author's (only they edit or delete it), except
 * `hidden`, which hosts set; reactions, RSVPs and progress belong to their author.
 */
export function writeRefusal(
  change: { collection: CircleCollectionName | string; rowId: string; field: string; value: unknown },
  context: WriteContext,
): WriteRefusal | null {
  if (change.field === 'circleId' && change.value !== context.circleId) return { code: 'wrong_circle', reason: 'circleId must be the circle of this request' };
  if (change.collection === 'circles' && change.rowId !== context.circleId) return { code: 'wrong_circle', reason: 'a circle row must have the circle id' };
  const isNew = context.authorId === undefined;
  const isAuthor = isNew || context.authorId === context.callerId;
  if (HOSTS_WRITE.has(change.collection)) {
    return isHost(context.role) ? null : { code: 'not_allowed', reason: 'only a host can change the circle and its schedule' };
  }
  if (AUTHORS_WRITE.has(change.collection)) {
    return isAuthor ? null : { code: 'not_allowed', reason: 'this belongs to another member' };
  }
  if (change.collection === 'circlePosts') {
    if (change.field === 'hidden') return isHost(context.role) ? null : { code: 'not_allowed', reason: 'only a host can hide a post' };
    return isAuthor ? null : { code: 'not_allowed', reason: 'only its author can change a post' };
  }
  return { code: 'not_allowed', reason: `${change.collection} is not a circle collection` };
}
