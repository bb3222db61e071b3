import * as z from 'zod/mini';

import { defineCollection, type RowOf } from '../sync/schema/collection';
import { field, maxTextLength, type FieldSpec } from '../sync/schema/field';
import { BOOK_FORMATS } from '../sync/schema/collections';
import { PART_END_KINDS } from './schedule';

/**
 * Circle data: collections scoped by circle, not by reader. They merge per field (last writer
 * wins by clock, shared/sync/merge.ts) like a reader's own, but travel through
 * `/api/circles/:id/sync`, where the server checks membership and who may write what
 * (circle-permissions.ts). Every row names its circle in `circleId`.
 */
const circleId = () => field.json(z.uuid('must be a circle id (UUID)'));

/** Reactions of our own: a lamp for "this lit something up", and a few feelings. */
export const REACTIONS = ['lamp', 'gasp', 'moved', 'laugh', 'ponder'] as const;
export type Reaction = (typeof REACTIONS)[number];
export const RSVP_ANSWERS = ['going', 'maybe', 'notGoing'] as const;
export type RsvpAnswer = (typeof RSVP_ANSWERS)[number];

const uuidList = (max: number) => z.array(z.uuid('must list row ids (UUIDs)')).check(z.maxLength(max, `must have at most ${max} entries`));

export const circles = defineCollection('circles', {
  circleId: circleId(),
  name: field.text(120),
  description: field.optionalText(1000),
  /** An uploaded image (its SHA-256); members read it through `/api/uploads/:id`, non-members get 404. */
  coverId: field.optionalUploadId(),
});

/** A book the circle reads, with its length for the schedule. */
export const circlePicks = defineCollection('circlePicks', {
  circleId: circleId(),
  title: field.text(500),
  authors: field.orderedList(20, 200),
  isbn: field.optionalIsbn13(),
  format: field.optionalChoice(BOOK_FORMATS),
  pageCount: field.optionalInteger(1, 100_000),
  audioMinutes: field.optionalInteger(1, 20_000),
  addedOn: field.optionalDate(),
});

/** One part of a pick's schedule: where it ends, and its meeting or checkpoint. */
export const circleParts = defineCollection('circleParts', {
  circleId: circleId(),
  pickId: field.optionalRef(),
  position: field.optionalInteger(0, 1000),
  label: field.optionalText(120),
  endKind: field.optionalChoice(PART_END_KINDS),
  endValue: field.optionalText(120),
  date: field.optionalDate(),
  /** Local time of the meeting, 'HH:MM' (24-hour), or none for a checkpoint. */
  time: field.json(z.nullable(z.string().check(z.regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'must be a time like 19:30')))),
  place: field.optionalText(300),
  link: field.json(z.nullable(z.url({ protocol: /^https?$/, error: 'must be a web address (http or https)' }).check(z.maxLength(500)))),
});

/** A post in a part's discussion (or the circle's general one), or a reply to a post. */
export const circlePosts = defineCollection('circlePosts', {
  circleId: circleId(),
  partId: field.optionalRef(),
  replyToId: field.optionalRef(),
  text: field.text(4000),
  postedAt: field.optionalTimestamp(),
  editedAt: field.optionalTimestamp(),
  /** Set by a host: the post is folded away for everyone. */
  hidden: field.optionalBoolean(),
});

/** The longest post, as the schema checks it: the post forms stop typing there. */
export const POST_MAX_LENGTH = maxTextLength(circlePosts.fields.text);

/** One reader's reaction of one kind to one post; `on` false takes it back. */
export const circleReactions = defineCollection('circleReactions', {
  circleId: circleId(),
  postId: field.optionalRef(),
  kind: field.optionalChoice(REACTIONS),
  on: field.optionalBoolean(),
});

/** One reader's answer for one meeting (a part with a date). */
export const circleRsvps = defineCollection('circleRsvps', {
  circleId: circleId(),
  partId: field.optionalRef(),
  answer: field.optionalChoice(RSVP_ANSWERS),
});

/**
 * One reader's own circle settings and shield state. Only its author pulls the whole row; the
 * others see `sharedPastPartIds` (and `shareProgress`), and only while `shareProgress` is on.
 */
export const circleProgress = defineCollection('circleProgress', {
  circleId: circleId(),
  shareProgress: field.optionalBoolean(),
  pastPartIds: field.json(z.nullable(uuidList(500))),
  revealedPartIds: field.json(z.nullable(uuidList(500))),
  /** pick id → the reader's own book added from it (their library stays private). */
  bookLinks: field.json(z.nullable(z.record(z.uuid(), z.uuid())), 'values'),
  /** Parts the reader is past, written only while sharing is on ("Wren is past part 2"). */
  sharedPastPartIds: field.json(z.nullable(uuidList(500))),
  /** The reader's IANA time zone, so meeting reminders come the day before in their own day (never shared). */
  timeZone: field.optionalText(64),
});

/** The fields of circleProgress other members may pull, while `shareProgress` is on. */
export const SHARED_PROGRESS_FIELDS: readonly string[] = ['circleId', 'shareProgress', 'sharedPastPartIds', 'deleted'];

export const CIRCLE_COLLECTIONS = { circles, circlePicks, circleParts, circlePosts, circleReactions, circleRsvps, circleProgress } as const;
export type CircleCollectionName = keyof typeof CIRCLE_COLLECTIONS;

export type Circle = RowOf<typeof circles>;
export type CirclePick = RowOf<typeof circlePicks>;
export type CirclePart = RowOf<typeof circleParts>;
export type CirclePost = RowOf<typeof circlePosts>;
export type CircleReaction = RowOf<typeof circleReactions>;
export type CircleRsvp = RowOf<typeof circleRsvps>;
export type CircleProgress = RowOf<typeof circleProgress>;

export function circleCollectionSpec(name: string) {
  return Object.hasOwn(CIRCLE_COLLECTIONS, name) ? CIRCLE_COLLECTIONS[name as CircleCollectionName] : undefined;
}

export function circleFieldSpec(collection: string, fieldName: string): FieldSpec | undefined {
  const fields: Readonly<Record<string, FieldSpec>> | undefined = circleCollectionSpec(collection)?.fields;
  return fields && Object.hasOwn(fields, fieldName) ? fields[fieldName] : undefined;
}
