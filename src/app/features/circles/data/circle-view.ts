import type { Circle, CirclePart, CirclePick, CirclePost, CircleProgress, CircleReaction, CircleRsvp } from '@shared/circles/circle-collections';
import { readingPositionOf } from '@shared/circles/reading-position';
import { orderedParts, type SchedulePart } from '@shared/circles/schedule';
import { partsPassed, type ShieldContext } from '@shared/circles/spoiler-shield';
import { deterministicId } from '@shared/sync/deterministic-id';
import type { Book, Session } from '@shared/sync/schema/collections';

import type { CircleMeta, JournalDb } from '../../../core/data/journal-db';

type Authored<T> = T & { readonly _author?: string };

/** Everything one circle's screens read, from this device only. */
export interface CircleView {
  readonly circle: Circle | undefined;
  readonly meta: CircleMeta | undefined;
  readonly picks: CirclePick[];
  readonly parts: (CirclePart & SchedulePart)[];
  readonly posts: Authored<CirclePost>[];
  readonly reactions: Authored<CircleReaction>[];
  readonly rsvps: Authored<CircleRsvp>[];
  /** Other members' progress, as far as they share it. */
  readonly shared: Authored<CircleProgress>[];
  /** The reader's own settings and shield state for this circle. */
  readonly mine: CircleProgress | undefined;
  readonly myProgressId: string;
  /** Per pick, what the shield needs: parts, the pick's length, the reader's position and marks. */
  readonly shield: ReadonlyMap<string, ShieldContext & { readonly passed: ReadonlySet<string> }>;
}

export const progressRowId = (circleId: string, userId: string) => deterministicId('circle-progress', `${circleId}:${userId}`);

const live = <T extends { deleted?: boolean | null }>(rows: T[]) => rows.filter((row) => !row.deleted);

export async function loadCircleView(db: JournalDb, circleId: string, myId: string): Promise<CircleView> {
  const of = async <T>(collection: string) => (await db.table(collection).where('circleId').equals(circleId).toArray()) as T[];
  const myProgressId = progressRowId(circleId, myId);
  const progress = await of<Authored<CircleProgress>>('circleProgress');
  const mine = progress.find((row) => row.id === myProgressId);
  const picks = live(await of<CirclePick>('circlePicks'));
  const parts = orderedParts(
    live(await of<CirclePart>('circleParts')).map((part) => ({
      ...part,
      position: part.position ?? 0,
      endKind: part.endKind ?? 'chapter',
      endValue: part.endValue ?? '',
    })),
  );
  const shield = new Map<string, ShieldContext & { passed: ReadonlySet<string> }>();
  for (const pick of picks) {
    const bookId = mine?.bookLinks?.[pick.id];
    const book = bookId ? ((await db.rows('books').get(bookId)) as Book | undefined) : undefined;
    const sessions = bookId ? ((await db.rows('sessions').where('bookId').equals(bookId).toArray()) as Session[]) : [];
    const context: ShieldContext = {
      parts: parts.filter((part) => part.pickId === pick.id),
      pick: { pageCount: pick.pageCount, audioMinutes: pick.audioMinutes },
      position: readingPositionOf(book && !book.deleted ? book : undefined, sessions),
      pastPartIds: new Set(mine?.pastPartIds ?? []),
      revealedPartIds: new Set(mine?.revealedPartIds ?? []),
    };
    shield.set(pick.id, { ...context, passed: partsPassed(context) });
  }
  return {
    circle: (await db.table('circles').get(circleId)) as Circle | undefined,
    meta: await db.circleMeta.get(circleId),
    picks,
    parts,
    posts: (await of<Authored<CirclePost>>('circlePosts')).filter((post) => !post.deleted).sort((a, b) => (a.postedAt ?? '').localeCompare(b.postedAt ?? '')),
    reactions: (await of<Authored<CircleReaction>>('circleReactions')).filter((reaction) => reaction.on),
    rsvps: await of<Authored<CircleRsvp>>('circleRsvps'),
    shared: progress.filter((row) => row.id !== myProgressId && row.shareProgress),
    mine,
    myProgressId,
    shield,
  };
}

/** A post's author as the circle sees them: their display name, "you", or "a former member". */
export function authorName(view: CircleView, authorId: string | undefined, myId: string): string {
  if (authorId === myId) return 'You';
  return view.meta?.members?.find((member) => member.userId === authorId)?.displayName ?? 'A former member';
}
