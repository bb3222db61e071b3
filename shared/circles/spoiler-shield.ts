import { orderedParts, partEndOf, partEndFraction, type PickLength, type SchedulePart } from './schedule';

/**
 * How far a reader is in their own copy, in its own unit: the latest page, percent or minute
 * from their sessions and progress in Lamplight. `null` when they have not started.
 */
export type ReadingPosition = { readonly unit: 'page' | 'percent' | 'minute'; readonly value: number } | null;

/** What the shield knows about one reader and one pick. */
export interface ShieldContext {
  readonly parts: readonly SchedulePart[];
  readonly pick: PickLength;
  readonly position: ReadingPosition;
  /** Parts the reader said "I'm past this part" about (it covers the parts before too). */
  readonly pastPartIds: ReadonlySet<string>;
  /** Parts whose posts the reader chose to see anyway (that part only). */
  readonly revealedPartIds: ReadonlySet<string>;
}

/** A post as the shield sees it. */
export interface ShieldedPost {
  readonly partId: string | null | undefined;
  readonly mine: boolean;
}

/** The reader's position as a share of the book (0–1), when the pick's length allows it. */
export function positionFraction(position: ReadingPosition, pick: PickLength): number | null {
  if (!position) return null;
  if (position.unit === 'percent') return position.value / 100;
  if (position.unit === 'page') return pick.pageCount ? position.value / pick.pageCount : null;
  return pick.audioMinutes ? position.value / pick.audioMinutes : null;
}

/**
 * Whether the reader's own reading has passed the end of `part`. A page end compares pages
 * directly; otherwise both sides become a share of the book. A chapter label cannot be measured:
 * only "I'm past this part" passes it.
 */
export function readingPassed(part: SchedulePart, context: Pick<ShieldContext, 'pick' | 'position'>): boolean {
  const end = partEndOf(part);
  const position = context.position;
  if (!end || !position || end.kind === 'chapter') return false;
  if (end.kind === 'page' && position.unit === 'page') return position.value >= end.page;
  const endAt = partEndFraction(end, context.pick);
  const at = positionFraction(position, context.pick);
  // A hair of tolerance for float division (150 / 300 pages against 50 %).
  return endAt !== null && at !== null && at + 1e-9 >= endAt;
}

/**
 * The parts the reader has reached the end of: by their own reading, or because they said they
 * are past this part or a later one.
 */
export function partsPassed(context: Omit<ShieldContext, 'revealedPartIds'>): Set<string> {
  const ordered = orderedParts(context.parts);
  const furthestManual = ordered.reduce((furthest, part, index) => (context.pastPartIds.has(part.id) ? index : furthest), -1);
  return new Set(ordered.filter((part, index) => index <= furthestManual || readingPassed(part, context)).map((part) => part.id));
}

/**
 * The spoiler shield: a post about a part is shown when the reader wrote it, has passed that
 * part, or revealed that very part; a post about no part (or a part no longer in the schedule,
 * which nobody can be "before") is shown. Revealing a part never reveals a later one.
 */
export function isPostShielded(post: ShieldedPost, context: ShieldContext, passed: ReadonlySet<string> = partsPassed(context)): boolean {
  if (post.mine || !post.partId) return false;
  if (!context.parts.some((part) => part.id === post.partId)) return false;
  return !passed.has(post.partId) && !context.revealedPartIds.has(post.partId);
}
