import { randomUUID } from 'node:crypto';

import type { Express } from 'express';
import ICAL from 'ical.js';
import request from 'supertest';

import { formatHlc } from '../../shared/sync/hlc';
import { circleMeetingEvents } from '../../sync-server/src/circles/circle-meetings';
import { seedDemoCircle } from '../../sync-server/src/demo/demo-circle';
import { sendReminders } from '../../sync-server/src/jobs/circle-reminders.job';
import { createSmtpMailer } from '../../sync-server/src/mail/mailer';
import { bearer, registerReader, uniqueEmail } from '../support/accounts';
import { uniquePng } from '../support/images';
import { testDataSource } from '../support/test-database';
import { createTestApp, testConfig, testInbox } from '../support/test-server';

type Reader = Awaited<ReturnType<typeof registerReader>>;

let wall = Date.now() - 60_000;
const clock = (node = 'spec-device') => formatHlc({ wall: wall++, counter: 0, node });
const change = (collection: string, rowId: string, field: string, value: unknown, hlc = clock()) => ({ id: randomUUID(), collection, rowId, field, value, hlc });

async function createCircle(app: Express, host: Reader, name = 'The Lantern Readers'): Promise<string> {
  const created = await request(app).post('/api/circles').set(bearer(host.accessToken)).send({ name, description: 'Slow books on Thursdays' }).expect(201);
  return created.body.id as string;
}

async function joinCode(app: Express, host: Reader, circleId: string): Promise<string> {
  return (await request(app).get(`/api/circles/${circleId}`).set(bearer(host.accessToken)).expect(200)).body.joinCode as string;
}

async function joined(app: Express, host: Reader, circleId: string, member: Reader): Promise<void> {
  await request(app)
    .post('/api/circles/join')
    .set(bearer(member.accessToken))
    .send({ code: await joinCode(app, host, circleId) })
    .expect(200);
}

const push = (app: Express, reader: Reader, circleId: string, changes: object[]) =>
  request(app).post(`/api/circles/${circleId}/sync/push`).set(bearer(reader.accessToken)).send({ changes });
const pull = (app: Express, reader: Reader, circleId: string, since?: string) =>
  request(app)
    .get(`/api/circles/${circleId}/sync/pull`)
    .query(since ? { since } : {})
    .set(bearer(reader.accessToken));

const postChanges = (circleId: string, postId: string, text: string, partId: string | null = null) => [
  change('circlePosts', postId, 'circleId', circleId),
  change('circlePosts', postId, 'text', text),
  change('circlePosts', postId, 'partId', partId),
];

describe('Reading circles', () => {
  let app: Express;
  beforeAll(async () => (app = await createTestApp()));

  describe('membership scoping', () => {
    it('When a non-member pushes or pulls, then the answer is 403 and nothing is applied', async () => {
      const host = await registerReader(app);
      const stranger = await registerReader(app);
      const circleId = await createCircle(app, host);
      const postId = randomUUID();

      const refused = await push(app, stranger, circleId, postChanges(circleId, postId, 'Hello from outside')).expect(403);
      await pull(app, stranger, circleId).expect(403);

      expect(refused.body.error.code).toBe('not_a_member');
      const rows = await (await testDataSource()).query('SELECT 1 FROM circle_rows WHERE id = $1', [postId]);
      expect(rows.length).toBe(0);
    });

    it('When a member of circle X guesses the ids of circle Y and its rows, then they read and write nothing of Y', async () => {
      const hostX = await registerReader(app);
      const hostY = await registerReader(app);
      const x = await createCircle(app, hostX, 'Circle X');
      const y = await createCircle(app, hostY, 'Circle Y');
      const postInY = randomUUID();
      await push(app, hostY, y, postChanges(y, postInY, 'Only for Y')).expect(200);

      await request(app).get(`/api/circles/${y}`).set(bearer(hostX.accessToken)).expect(403);
      await pull(app, hostX, y).expect(403);
      // Through their own circle: a change naming Y's row (or Y itself) is refused.
      const overwrite = await push(app, hostX, x, [change('circlePosts', postInY, 'text', 'Taken over')]).expect(403);
      await push(app, hostX, x, [change('circlePosts', randomUUID(), 'circleId', y)]).expect(403);
      const pulledX = await pull(app, hostX, x).expect(200);

      expect(overwrite.body.error.details[0].code).toBe('not_allowed');
      expect(JSON.stringify(pulledX.body.rows)).not.toContain('Only for Y');
      const pulledY = await pull(app, hostY, y).expect(200);
      expect(JSON.stringify(pulledY.body.rows)).toContain('Only for Y');
      expect(JSON.stringify(pulledY.body.rows)).not.toContain('Taken over');
    });

    it('When a reader joins a circle with history, then their first pull gets the whole circle', async () => {
      const host = await registerReader(app);
      const late = await registerReader(app);
      const circleId = await createCircle(app, host);
      for (let n = 0; n < 5; n++) await push(app, host, circleId, postChanges(circleId, randomUUID(), `Post ${n}`)).expect(200);
      await joined(app, host, circleId, late);

      const texts: string[] = [];
      let cursor: string | undefined;
      for (let page = 0; page < 10; page++) {
        const answer = await request(app)
          .get(`/api/circles/${circleId}/sync/pull`)
          .query({ limit: 2, ...(cursor ? { since: cursor } : {}) })
          .set(bearer(late.accessToken))
          .expect(200);
        for (const row of answer.body.rows) if (row.collection === 'circlePosts') texts.push(row.fields.text.value);
        cursor = answer.body.cursor;
        if (!answer.body.hasMore) break;
      }

      expect(texts.sort()).toEqual(['Post 0', 'Post 1', 'Post 2', 'Post 3', 'Post 4']);
    });

    it('When a member is removed, then their device gets nothing more and its queued posts are refused with a reason', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);
      const first = await pull(app, member, circleId).expect(200);

      await request(app).delete(`/api/circles/${circleId}/members/${member.user.id}`).set(bearer(host.accessToken)).expect(204);

      const queued = await push(app, member, circleId, postChanges(circleId, randomUUID(), 'Written offline')).expect(403);
      await pull(app, member, circleId, first.body.cursor).expect(403);
      expect(queued.body.error.code).toBe('not_a_member');
      expect(queued.body.error.message).toContain('not a member');
      const list = await request(app).get('/api/circles').set(bearer(member.accessToken)).expect(200);
      expect(list.body.circles).toEqual([]);
    });

    it('When a member leaves, then their posts stay, their shared progress goes, and nobody else can edit their post', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);
      const postId = randomUUID();
      const progressId = randomUUID();
      await push(app, member, circleId, [
        ...postChanges(circleId, postId, 'I loved the storm chapter'),
        change('circleProgress', progressId, 'circleId', circleId),
        change('circleProgress', progressId, 'shareProgress', true),
      ]).expect(200);

      await push(app, host, circleId, [change('circlePosts', postId, 'text', 'Edited by the host')]).expect(403);
      await push(app, host, circleId, [change('circlePosts', postId, 'hidden', true)]).expect(200);
      await request(app).post(`/api/circles/${circleId}/leave`).set(bearer(member.accessToken)).expect(204);

      const pulled = await pull(app, host, circleId).expect(200);
      const post = pulled.body.rows.find((row: { id: string }) => row.id === postId);
      expect(post.fields.text.value).toBe('I loved the storm chapter');
      expect(post.authorId).toBe(member.user.id);
      expect(pulled.body.members.map((m: { userId: string }) => m.userId)).toEqual([host.user.id]);
      expect(pulled.body.rows.some((row: { id: string }) => row.id === progressId)).toBeFalse();
    });

    it('When a member does not share progress, then others pull nothing of it; when they do, only what sharing shows', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);
      const progressId = randomUUID();
      const partId = randomUUID();
      await push(app, member, circleId, [
        change('circleProgress', progressId, 'circleId', circleId),
        change('circleProgress', progressId, 'revealedPartIds', [partId]),
        change('circleProgress', progressId, 'sharedPastPartIds', [partId]),
      ]).expect(200);

      const hidden = await pull(app, host, circleId).expect(200);
      await push(app, member, circleId, [change('circleProgress', progressId, 'shareProgress', true)]).expect(200);
      const shared = await pull(app, host, circleId).expect(200);
      const own = await pull(app, member, circleId).expect(200);

      expect(hidden.body.rows.some((row: { id: string }) => row.id === progressId)).toBeFalse();
      const seen = shared.body.rows.find((row: { id: string }) => row.id === progressId);
      expect(Object.keys(seen.fields).sort()).toEqual(['circleId', 'shareProgress', 'sharedPastPartIds']);
      expect(Object.keys(own.body.rows.find((row: { id: string }) => row.id === progressId).fields)).toContain('revealedPartIds');
    });
  });

  describe('merge', () => {
    it('When two devices write the same field, then the greater clock wins whatever the order, and a re-send is a duplicate', async () => {
      const host = await registerReader(app);
      const circleId = await createCircle(app, host);
      const postId = randomUUID();
      const older = change('circlePosts', postId, 'text', 'first thought', formatHlc({ wall: Date.now() - 5000, counter: 0, node: 'a' }));
      const newer = change('circlePosts', postId, 'text', 'second thought', formatHlc({ wall: Date.now() - 4000, counter: 0, node: 'b' }));

      await push(app, host, circleId, [newer]).expect(200);
      const late = await push(app, host, circleId, [older]).expect(200);
      const again = await push(app, host, circleId, [newer]).expect(200);

      expect(late.body.overwritten).toEqual([{ id: older.id, by: newer.hlc }]);
      expect(again.body.duplicates).toBe(1);
      const pulled = await pull(app, host, circleId).expect(200);
      expect(pulled.body.rows.find((row: { id: string }) => row.id === postId).fields.text.value).toBe('second thought');
    });

    it('When a member edits the schedule or a change is malformed, then it is refused with the field and reason', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);

      const notHost = await push(app, member, circleId, [change('circleParts', randomUUID(), 'date', '2026-12-10')]).expect(403);
      const bad = await push(app, host, circleId, [change('circleParts', randomUUID(), 'date', '10/12/2026')]).expect(400);

      expect(notHost.body.error.details[0].reason).toContain('host');
      expect(bad.body.error.details[0].reason).toContain('circleParts.date');
    });
  });

  describe('join codes and invitations', () => {
    it('When the host rotates the join code, then the old code stops working and the new one works', async () => {
      const host = await registerReader(app);
      const reader = await registerReader(app);
      const circleId = await createCircle(app, host);
      const old = await joinCode(app, host, circleId);

      const rotated = await request(app).post(`/api/circles/${circleId}/join-code`).set(bearer(host.accessToken)).expect(200);
      await request(app).post('/api/circles/join').set(bearer(reader.accessToken)).send({ code: old }).expect(404);
      await request(app).post('/api/circles/join').set(bearer(reader.accessToken)).send({ code: rotated.body.joinCode.toLowerCase() }).expect(200);

      expect(rotated.body.joinCode).not.toBe(old);
      const members = await request(app).get(`/api/circles/${circleId}`).set(bearer(reader.accessToken)).expect(200);
      expect(members.body.joinCode).toBeUndefined(); // only hosts see the code
      await request(app).post(`/api/circles/${circleId}/join-code`).set(bearer(reader.accessToken)).expect(403);
    });

    async function invite(host: Reader, circleId: string, email: string): Promise<string> {
      await request(app).post(`/api/circles/${circleId}/invitations`).set(bearer(host.accessToken)).send({ email }).expect(202);
      const mail = await (await testInbox()).inbox.waitFor((m) => m.to.includes(email) && m.subject.includes('reading circle'));
      const match = /\/circles\/join#invite=([A-Za-z0-9_.-]+)/.exec(mail.text);
      if (!match) throw new Error(`no link in: ${mail.text}`);
      expect(mail.text).not.toContain('The Lantern Readers'); // no words the host chose go to an unconfirmed address
      return match[1]!;
    }

    it('When an invitation is used, then the reader joins, and a second use is refused', async () => {
      const host = await registerReader(app);
      const email = uniqueEmail('invitee');
      const invitee = await registerReader(app, { email });
      const other = await registerReader(app);
      const circleId = await createCircle(app, host);
      const token = await invite(host, circleId, email);

      const accepted = await request(app).post('/api/circles/invitations/accept').set(bearer(invitee.accessToken)).send({ token }).expect(200);
      const reused = await request(app).post('/api/circles/invitations/accept').set(bearer(other.accessToken)).send({ token }).expect(400);

      expect(accepted.body.id).toBe(circleId);
      expect(reused.body.error.code).toBe('invitation_used');
      await pull(app, invitee, circleId).expect(200);
      await pull(app, other, circleId).expect(403);
    });

    it('When an invitation has expired or was tampered with, then it is refused', async () => {
      const host = await registerReader(app);
      const email = uniqueEmail('late');
      const invitee = await registerReader(app, { email });
      const circleId = await createCircle(app, host);
      const token = await invite(host, circleId, email);
      await (await testDataSource()).query(`UPDATE circle_invitations SET expires_at = now() - interval '1 second' WHERE email = $1`, [email]);

      const expired = await request(app).post('/api/circles/invitations/accept').set(bearer(invitee.accessToken)).send({ token }).expect(400);
      const forged = await request(app)
        .post('/api/circles/invitations/accept')
        .set(bearer(invitee.accessToken))
        .send({ token: `${token.slice(0, -4)}AAAA` })
        .expect(400);

      expect(expired.body.error.code).toBe('invitation_expired');
      expect(forged.body.error.code).toBe('invitation_unknown');
      await pull(app, invitee, circleId).expect(403);
    });

    it('When a member invites, hands over or the last host leaves, then it is refused with a reason', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);

      await request(app).post(`/api/circles/${circleId}/invitations`).set(bearer(member.accessToken)).send({ email: uniqueEmail() }).expect(403);
      const leaving = await request(app).post(`/api/circles/${circleId}/leave`).set(bearer(host.accessToken)).expect(409);
      await request(app).post(`/api/circles/${circleId}/hosts`).set(bearer(host.accessToken)).send({ userId: member.user.id }).expect(204);
      await request(app).post(`/api/circles/${circleId}/leave`).set(bearer(host.accessToken)).expect(204);

      expect(leaving.body.error.message).toContain('Hand over');
      const details = await request(app).get(`/api/circles/${circleId}`).set(bearer(member.accessToken)).expect(200);
      expect(details.body.role).toBe('host');
    });
  });

  describe('cover image', () => {
    const upload = async (reader: Reader) =>
      (
        await request(app)
          .post('/api/uploads')
          .set(bearer(reader.accessToken))
          .attach('file', uniquePng(), { filename: 'cover.png', contentType: 'image/png' })
          .expect(201)
      ).body.id as string;
    const cover = (reader: Reader, id: string) => request(app).get(`/api/uploads/${id}`).set(bearer(reader.accessToken));

    it('When a host gives the circle a cover, then members see it and non-members or removed members get 404', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const outsider = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);
      const coverId = await upload(host);
      await cover(member, coverId).expect(404);

      await push(app, host, circleId, [change('circles', circleId, 'coverId', coverId)]).expect(200);

      await cover(member, coverId).expect(200).expect('Content-Type', 'image/png');
      await cover(outsider, coverId).expect(404);
      await request(app).delete(`/api/circles/${circleId}/members/${member.user.id}`).set(bearer(host.accessToken)).expect(204);
      await cover(member, coverId).expect(404);
    });

    it('When a host names another reader’s image as the cover, then members still cannot read it', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const stranger = await registerReader(app);
      const circleId = await createCircle(app, host);
      await joined(app, host, circleId, member);
      const strangersImage = await upload(stranger);

      await push(app, host, circleId, [change('circles', circleId, 'coverId', strangersImage)]).expect(200);

      await cover(member, strangersImage).expect(404);
      await cover(host, strangersImage).expect(404);
    });
  });

  describe('meetings', () => {
    it('When a meeting is tomorrow, then members who did not say "not going" get one reminder, and it is in their events', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const away = await registerReader(app);
      const circleId = await createCircle(app, host, `Reminder circle ${randomUUID().slice(0, 8)}`);
      await joined(app, host, circleId, member);
      await joined(app, host, circleId, away);
      const partId = randomUUID();
      const rsvpId = randomUUID();
      const day = '2031-03-14';
      await push(app, host, circleId, [
        change('circleParts', partId, 'circleId', circleId),
        change('circleParts', partId, 'label', 'Part one'),
        change('circleParts', partId, 'date', day),
        change('circleParts', partId, 'time', '19:30'),
      ]).expect(200);
      await push(app, away, circleId, [
        change('circleRsvps', rsvpId, 'circleId', circleId),
        change('circleRsvps', rsvpId, 'partId', partId),
        change('circleRsvps', rsvpId, 'answer', 'notGoing'),
      ]).expect(200);
      const config = await testConfig();
      const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
      const dataSource = await testDataSource();

      // Neither member's zone is known: the day before is the UTC day.
      const first = await sendReminders(dataSource, mailer, config.publicUrl, new Date('2031-03-13T12:00:00Z'));
      const second = await sendReminders(dataSource, mailer, config.publicUrl, new Date('2031-03-13T13:00:00Z'));
      mailer.close();

      expect(first).toBe(2);
      expect(second).toBe(0);
      await (await testInbox()).inbox.waitFor((m) => m.to.includes(member.user.email) && m.subject.startsWith('Tomorrow'));
      const events = await circleMeetingEvents(member.user.id, dataSource.manager);
      expect(events).toContain(jasmine.objectContaining({ uid: `circle-part-${partId}@lamplight`, start: `${day}T19:30` }));
      expect(await circleMeetingEvents(randomUUID(), dataSource.manager)).toEqual([]);
    });

    it('When members live in Los Angeles and Kiritimati, then each gets the reminder on the day before in their own time zone', async () => {
      const host = await registerReader(app);
      const west = await registerReader(app);
      const east = await registerReader(app);
      const circleId = await createCircle(app, host, `Zones circle ${randomUUID().slice(0, 8)}`);
      await joined(app, host, circleId, west);
      await joined(app, host, circleId, east);
      const partId = randomUUID();
      await push(app, host, circleId, [change('circleParts', partId, 'circleId', circleId), change('circleParts', partId, 'date', '2032-05-20')]).expect(200);
      for (const [reader, zone] of [
        [west, 'America/Los_Angeles'],
        [east, 'Pacific/Kiritimati'],
        [host, 'Not/A_Zone'],
      ] as const) {
        const rowId = randomUUID();
        await push(app, reader, circleId, [change('circleProgress', rowId, 'circleId', circleId), change('circleProgress', rowId, 'timeZone', zone)]).expect(200);
      }
      const config = await testConfig();
      const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
      const dataSource = await testDataSource();
      const sent = (now: string) => sendReminders(dataSource, mailer, config.publicUrl, new Date(now));

      // Offsets from the IANA tz database: Kiritimati UTC+14, Los Angeles UTC−7 (PDT) in May 2032.
      expect(await sent('2032-05-18T20:00:00Z'))
        .withContext('10:00 on the 19th in Kiritimati, the 18th in Los Angeles and UTC')
        .toBe(1);
      await (await testInbox()).inbox.waitFor((m) => m.to.includes(east.user.email) && m.subject.startsWith('Tomorrow'));
      expect(await sent('2032-05-19T12:00:00Z'))
        .withContext('the host has an unknown zone: UTC, the 19th')
        .toBe(1);
      expect(await sent('2032-05-19T14:00:00Z'))
        .withContext('07:00 in Los Angeles: not yet')
        .toBe(0);
      expect(await sent('2032-05-19T17:00:00Z'))
        .withContext('10:00 on the 19th in Los Angeles')
        .toBe(1);
      mailer.close();
      await (await testInbox()).inbox.waitFor((m) => m.to.includes(west.user.email) && m.subject.startsWith('Tomorrow'));
    });

    it('When a meeting moves, then its feed event keeps its UID, DTSTAMP is its last change and SEQUENCE grows (read by ical.js)', async () => {
      const member = await registerReader(app);
      const circleId = await createCircle(app, member, `Feed circle ${randomUUID().slice(0, 8)}`);
      const partId = randomUUID();
      await push(app, member, circleId, [
        change('circleParts', partId, 'circleId', circleId),
        change('circleParts', partId, 'date', '2031-06-02'),
        change('circleParts', partId, 'place', 'The reading room'),
      ]).expect(200);
      const path = (await request(app).post('/api/calendar-feed').set(bearer(member.accessToken)).expect(201)).body.path as string;
      const feedEvent = async () => {
        const text = (await request(app).get(path).expect(200)).text;
        const events = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents('vevent');
        return events.find((event) => event.getFirstPropertyValue('uid') === `circle-part-${partId}@lamplight`)!;
      };

      const before = await feedEvent();
      // RFC 5545 §3.8.7.2: DTSTAMP is when the event last changed, so the same feed fetched again is the same.
      expect((await feedEvent()).getFirstPropertyValue('dtstamp')!.toString()).toBe(before.getFirstPropertyValue('dtstamp')!.toString());
      // The circle's name was stamped by the server at creation, now: the move comes after it.
      wall = Date.now() + 5000;
      const movedAt = wall;
      await push(app, member, circleId, [change('circleParts', partId, 'place', 'The harbour café')]).expect(200);
      const moved = await feedEvent();
      expect((moved.getFirstPropertyValue('dtstamp') as ICAL.Time).toJSDate().getTime()).toBe(Math.floor(movedAt / 1000) * 1000);
      // §3.8.7.4: SEQUENCE grows with every change of the event; §3.8.4.7: the UID stays.
      expect(Number(moved.getFirstPropertyValue('sequence'))).toBeGreaterThan(Number(before.getFirstPropertyValue('sequence')));
      expect(String(moved.getFirstPropertyValue('description'))).toContain('The harbour café');
      wall += 5000;
      await push(app, member, circleId, [change('circleParts', partId, 'date', '2031-06-09')]).expect(200);
      const later = await feedEvent();
      expect((later.getFirstPropertyValue('dtstart') as ICAL.Time).toString()).toBe('2031-06-09');
      expect(Number(later.getFirstPropertyValue('sequence'))).toBeGreaterThan(Number(moved.getFirstPropertyValue('sequence')));
    });
  });

  describe('demo', () => {
    it('When the demo circle is seeded twice, then the host has one circle with a pick, two dated parts and posts, and the member pulls it', async () => {
      const host = await registerReader(app);
      const member = await registerReader(app);
      const dataSource = await testDataSource();

      expect(await seedDemoCircle(dataSource, host.user.id, member.user.id)).toBeTrue();
      expect(await seedDemoCircle(dataSource, host.user.id, member.user.id)).toBeFalse();

      const circles = (await request(app).get('/api/circles').set(bearer(member.accessToken)).expect(200)).body.circles;
      expect(circles.length).toBe(1);
      const rows = (await pull(app, member, circles[0].id).expect(200)).body.rows as { collection: string }[];
      const count = (collection: string) => rows.filter((row) => row.collection === collection).length;
      expect([count('circlePicks'), count('circleParts'), count('circlePosts')]).toEqual([1, 2, 2]);
    });
  });
});
