import type { EntityManager } from 'typeorm';

/**
 * A meeting or checkpoint as a calendar feed needs it, in no calendar format: an all-day `day`
 * (YYYY-MM-DD) or a `start` in the meeting's own local time (YYYY-MM-DDTHH:MM, floating, as
 * RFC 5545 §3.3.5 form 1 means it), never both.
 */
export interface NeutralEvent {
  readonly uid: string;
  readonly day?: string;
  readonly start?: string;
  readonly summary: string;
  readonly description?: string;
  readonly url?: string;
  /** The clocks of every field the event is made of (its last change is the greatest). */
  readonly clocks: readonly string[];
}

/** One dated part of a circle a reader belongs to, with what the mail and the feed say about it. */
export interface Meeting {
  readonly partId: string;
  readonly circleId: string;
  readonly circleName: string;
  readonly pickTitle: string | null;
  readonly partLabel: string;
  readonly day: string;
  readonly time: string | null;
  readonly place: string | null;
  readonly link: string | null;
  /** Clocks of the fields the meeting is shown with: the part's, the circle's name, the pick's title. */
  readonly clocks: readonly string[];
}

const SHOWN_PART_FIELDS = ['date', 'time', 'place', 'link', 'label', 'pickId'] as const;

interface MeetingRow {
  part_id: string;
  circle_id: string;
  user_id: string;
  circle_name: string | null;
  pick_title: string | null;
  part: Record<string, unknown>;
  part_clocks: Record<string, string>;
  name_clock: string | null;
  title_clock: string | null;
}

/** Dated, not deleted parts of the reader's circles (all of them, or those on one of `days`). */
export async function meetingsOf(
  manager: Pick<EntityManager, 'query'>,
  filter: { userId?: string; days?: readonly string[] },
): Promise<(Meeting & { userId: string })[]> {
  const rows: MeetingRow[] = await manager.query(
    `SELECT p.id AS part_id, p.circle_id, m.user_id, c.fields->>'name' AS circle_name, k.fields->>'title' AS pick_title, p.fields AS part,
              p.clocks AS part_clocks, c.clocks->>'name' AS name_clock, k.clocks->>'title' AS title_clock
         FROM circle_rows p
         JOIN circle_members m ON m.circle_id = p.circle_id
         LEFT JOIN circle_rows c ON c.collection = 'circles' AND c.id = p.circle_id
         LEFT JOIN circle_rows k ON k.collection = 'circlePicks' AND k.id = (p.fields->>'pickId')::uuid AND k.circle_id = p.circle_id
        WHERE p.collection = 'circleParts' AND p.fields->>'date' IS NOT NULL AND coalesce((p.fields->>'deleted')::boolean, false) = false
          AND ($1::uuid IS NULL OR m.user_id = $1) AND ($2::text[] IS NULL OR p.fields->>'date' = ANY($2::text[]))
        ORDER BY p.fields->>'date', p.id, m.user_id`,
    [filter.userId ?? null, filter.days ?? null],
  );
  return rows.map((row) => ({
    partId: row.part_id,
    circleId: row.circle_id,
    userId: row.user_id,
    circleName: row.circle_name ?? 'Your circle',
    pickTitle: row.pick_title,
    partLabel: typeof row.part['label'] === 'string' && row.part['label'] ? row.part['label'] : 'the next part',
    day: row.part['date'] as string,
    time: typeof row.part['time'] === 'string' ? row.part['time'] : null,
    place: typeof row.part['place'] === 'string' ? row.part['place'] : null,
    link: typeof row.part['link'] === 'string' ? row.part['link'] : null,
    clocks: [...SHOWN_PART_FIELDS.map((field) => row.part_clocks?.[field]), row.name_clock, row.title_clock].filter((clock): clock is string => !!clock),
  }));
}

/**
 * The reader's circle meetings as neutral events, for the calendar feed to render. A meeting's
 * uid is stable (the part's id), so a calendar updates it in place when the host moves it.
 */
export async function circleMeetingEvents(userId: string, manager: Pick<EntityManager, 'query'>, publicUrl = ''): Promise<NeutralEvent[]> {
  const meetings = await meetingsOf(manager, { userId });
  return meetings.map((meeting) => ({
    uid: `circle-part-${meeting.partId}@lamplight`,
    ...(meeting.time ? { start: `${meeting.day}T${meeting.time}` } : { day: meeting.day }),
    summary: `${meeting.circleName}: ${meeting.partLabel}`,
    description:
      [meeting.pickTitle ? `Reading ${meeting.pickTitle}.` : null, meeting.place ? `Where: ${meeting.place}` : null].filter(Boolean).join('\n') || undefined,
    url: meeting.link ?? `${publicUrl}/circles/${meeting.circleId}`,
    clocks: meeting.clocks,
  }));
}
