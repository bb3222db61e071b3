import { randomUUID } from 'node:crypto';

import type { DataSource } from 'typeorm';

import type { FieldChange } from '../../../shared/api/sync';
import { HlcClock } from '../../../shared/sync/hlc';
import { validateCircleChange } from '../../../shared/circles/validate-circle-change';
import { CircleMembership } from '../circles/circle-membership';
import { CircleSyncStore } from '../circles/circle-sync-store';

/** Days from `now` as YYYY-MM-DD (the demo's meetings are always ahead). */
const dayFrom = (now: number, days: number) => new Date(now + days * 86_400_000).toISOString().slice(0, 10);

/**
 * An invented reading circle for the demo reader (host) with the other demo account as a member:
 * a made-up pick, two parts with meetings, a few posts. Does nothing when the host is already in
 * a circle, so `npm start` can run it every time. Every name and title here is invented.
 */
export async function seedDemoCircle(dataSource: DataSource, hostId: string, memberId: string | null, now: () => number = Date.now): Promise<boolean> {
  const membership = new CircleMembership(dataSource);
  if ((await membership.list(hostId)).length > 0) return false;
  const { id: circleId } = await membership.create(hostId, 'The Harbour Lantern Circle', 'Slow reads, one part a fortnight, tea optional.');
  if (memberId)
    await dataSource.query(`INSERT INTO circle_members (circle_id, user_id, role) VALUES ($1, $2, 'member') ON CONFLICT DO NOTHING`, [circleId, memberId]);
  const clock = new HlcClock('demo-seed', now);
  const changes: FieldChange[] = [];
  const row = (collection: string, rowId: string, fields: Record<string, unknown>) => {
    for (const [field, value] of Object.entries({ circleId, deleted: false, ...fields }))
      changes.push({ id: randomUUID(), collection, rowId, field, value, hlc: clock.tick() });
  };
  const pickId = randomUUID();
  const partOne = randomUUID();
  const partTwo = randomUUID();
  row('circlePicks', pickId, {
    title: 'The Cartographer of Low Tides',
    authors: ['Ines Marlowe-Quill'],
    format: 'print',
    pageCount: 312,
    addedOn: dayFrom(now(), -3),
  });
  row('circleParts', partOne, {
    pickId,
    position: 1,
    label: 'Part 1: The drowned maps',
    endKind: 'page',
    endValue: '140',
    date: dayFrom(now(), 9),
    time: '19:30',
    place: 'The back room of the Quayside library',
  });
  row('circleParts', partTwo, {
    pickId,
    position: 2,
    label: 'Part 2: Spring tide',
    endKind: 'percent',
    endValue: '100',
    date: dayFrom(now(), 23),
    link: 'https://meet.example.org/harbour-lantern',
  });
  row('circlePosts', randomUUID(), {
    partId: null,
    text: 'Welcome, everyone! Start whenever you like; the first meeting covers up to page 140.',
    postedAt: new Date(now()).toISOString(),
  });
  row('circlePosts', randomUUID(), {
    partId: partTwo,
    text: 'That ending with the lighthouse keeper’s ledger: I did not see it coming.',
    postedAt: new Date(now()).toISOString(),
  });
  const problems = changes.map((change, index) => validateCircleChange(change, index, now())).filter(Boolean);
  if (problems.length > 0) throw new Error(`demo circle: ${JSON.stringify(problems)}`);
  await new CircleSyncStore(dataSource).push(circleId, hostId, changes);
  return true;
}
