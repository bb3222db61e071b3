import { randomUUID } from 'node:crypto';

import ICAL from 'ical.js';
import request from 'supertest';

import { bearer, registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { startTestServer, type RunningServer } from '../support/test-server';
import { FEED_ANSWER_FLOOR_MS } from '../../sync-server/src/entry-points/calendar.routes';

/**
 * The calendar feed, parsed by ical.js (an iCalendar parser from npm, not ours) and read
 * against RFC 5545 itself: §3.1 (CRLF, folding at 75 octets), §3.3.4 (VALUE=DATE), §3.3.11
 * (TEXT escaping), §3.6.1 (DTEND of an all-day event is the next day), §3.8.4.7 (UID),
 * §3.8.7.2 (DTSTAMP) and §3.8.7.4 (SEQUENCE).
 */
describe('The private calendar feed', () => {
  let server: RunningServer;
  beforeAll(async () => (server = await startTestServer()));
  afterAll(() => server.close());

  const TITLE = 'Salt, Rope; and the \\ Long Tide of Marrow Bay: a Very Long Subtitle That Runs Past Seventy-Five Octets — ünïcode';

  async function readerWithLoan(dueOn = '2026-03-05') {
    const signedIn = await registerReader(server.app);
    const client = new SyncClient(server.baseUrl, signedIn.accessToken);
    const bookId = randomUUID();
    const loanId = randomUUID();
    const wall = Date.now();
    const push = await client.push([
      fieldChange(bookId, 'title', TITLE, { wall }),
      fieldChange(bookId, 'format', 'print', { wall }),
      fieldChange(bookId, 'status', 'reading', { wall }),
      fieldChange(loanId, 'kind', 'library', { wall }, 'loans'),
      fieldChange(loanId, 'bookId', bookId, { wall }, 'loans'),
      fieldChange(loanId, 'dueOn', dueOn, { wall }, 'loans'),
      fieldChange(loanId, 'friendName', 'Odile Marchetti', { wall }, 'loans'),
    ]);
    expect(push.status).toBe(200);
    const made = await request(server.app).post('/api/calendar-feed').set(bearer(signedIn.accessToken)).expect(201);
    return { signedIn, client, loanId, bookId, wall, path: made.body.path as string };
  }

  const fetchFeed = (path: string) =>
    request(server.app)
      .get(path)
      .buffer(true)
      .parse((res, done) => {
        let text = '';
        res.setEncoding('utf8');
        res.on('data', (chunk: string) => (text += chunk));
        res.on('end', () => done(null, text));
      });

  function events(text: string) {
    return new ICAL.Component(ICAL.parse(text)).getAllSubcomponents('vevent');
  }

  it('gives a 256-bit secret URL and a feed that follows RFC 5545', async () => {
    const { path, loanId } = await readerWithLoan();
    expect(path).toMatch(/^\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/); // 43 base64url characters = 256 bits
    const res = await fetchFeed(path)
      .expect(200)
      .expect('Content-Type', /^text\/calendar/);
    const text = res.body as string;

    // §3.1: every line ends CRLF, and no line is longer than 75 octets.
    expect(text.endsWith('\r\n')).toBeTrue();
    expect(text.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
    for (const line of text.split('\r\n')) expect(Buffer.byteLength(line, 'utf8')).withContext(line).toBeLessThanOrEqual(75);
    // The long title had to be folded: a continuation line starts with one space.
    expect(text.split('\r\n').some((line) => line.startsWith(' '))).toBeTrue();

    const [event, ...rest] = events(text);
    expect(rest.length).toBe(0);
    // §3.3.4 / §3.6.1: an all-day event is VALUE=DATE, and DTEND is the day after.
    expect(text).toContain('DTSTART;VALUE=DATE:20260305');
    expect(text).toContain('DTEND;VALUE=DATE:20260306');
    const start = event!.getFirstPropertyValue('dtstart') as ICAL.Time;
    expect(start.isDate).toBeTrue();
    expect(start.toString()).toBe('2026-03-05');
    expect((event!.getFirstPropertyValue('dtend') as ICAL.Time).toString()).toBe('2026-03-06');
    // §3.3.11: , ; \ are escaped on the wire and read back as they were.
    expect(text.replace(/\r\n /g, '')).toContain('Salt\\, Rope\\; and the \\\\ Long Tide');
    expect(event!.getFirstPropertyValue('summary')).toBe(`Due back at the library: ${TITLE}`);
    expect(event!.getFirstPropertyValue('uid')).toBe(`loan-${loanId}@lamplight`);
    expect(event!.getFirstPropertyValue('dtstamp')).toBeTruthy();
    // Never a friend's name or a card.
    expect(text).not.toContain('Odile');
  });

  it('keeps the UID and bumps SEQUENCE when the due date moves', async () => {
    const { path, client, loanId, wall } = await readerWithLoan();
    const before = events((await fetchFeed(path).expect(200)).body)[0]!;
    expect((await client.push([fieldChange(loanId, 'dueOn', '2026-03-19', { wall: wall + 5000 }, 'loans')])).status).toBe(200);
    const after = events((await fetchFeed(path).expect(200)).body)[0]!;
    expect(after.getFirstPropertyValue('uid')).toBe(before.getFirstPropertyValue('uid'));
    expect((after.getFirstPropertyValue('dtstart') as ICAL.Time).toString()).toBe('2026-03-19');
    expect(Number(after.getFirstPropertyValue('sequence'))).toBeGreaterThan(Number(before.getFirstPropertyValue('sequence')));
  });

  it('has a wishlist book’s release day as an all-day event, its UID kept and SEQUENCE bumped when the day moves', async () => {
    const { path, client, bookId, wall } = await readerWithLoan();
    // A date well ahead of today, so the feed (which keeps releases from 30 days back) always has it.
    const ahead = `${new Date().getUTCFullYear() + 1}-06-12`;
    const moved = `${new Date().getUTCFullYear() + 1}-06-19`;
    expect(
      (await client.push([fieldChange(bookId, 'releaseDate', ahead, { wall: wall + 1000 }), fieldChange(bookId, 'copy', 'wishlist', { wall: wall + 1000 })])).status,
    ).toBe(200);
    const release = async () => events((await fetchFeed(path).expect(200)).body).find((e) => String(e.getFirstPropertyValue('uid')).startsWith('release-'));
    const before = (await release())!;
    expect(before.getFirstPropertyValue('summary')).toBe(`Out today: ${TITLE}`);
    // RFC 5545 §3.3.4 / §3.6.1: a DATE value, and DTEND the next day.
    expect((before.getFirstPropertyValue('dtstart') as ICAL.Time).isDate).toBeTrue();
    expect((before.getFirstPropertyValue('dtstart') as ICAL.Time).toString()).toBe(ahead);
    expect((before.getFirstPropertyValue('dtend') as ICAL.Time).toString()).toBe(`${ahead.slice(0, 8)}13`);
    expect((await client.push([fieldChange(bookId, 'releaseDate', moved, { wall: wall + 5000 })])).status).toBe(200);
    const after = (await release())!;
    expect(after.getFirstPropertyValue('uid')).toBe(before.getFirstPropertyValue('uid'));
    expect((after.getFirstPropertyValue('dtstart') as ICAL.Time).toString()).toBe(moved);
    expect(Number(after.getFirstPropertyValue('sequence'))).toBeGreaterThan(Number(before.getFirstPropertyValue('sequence')));
  });

  it('leaves returned loans out', async () => {
    const { path, client, loanId, wall } = await readerWithLoan();
    expect((await client.push([fieldChange(loanId, 'returnedOn', '2026-03-02', { wall: wall + 1000 }, 'loans')])).status).toBe(200);
    expect(events((await fetchFeed(path).expect(200)).body).length).toBe(0);
  });

  it('answers 404 for a revoked or replaced URL, and a wrong secret after the same floor of time', async () => {
    const { path, signedIn } = await readerWithLoan();
    const replaced = await request(server.app).post('/api/calendar-feed').set(bearer(signedIn.accessToken)).expect(201);
    await fetchFeed(path).expect(404); // replaced by the new one
    await fetchFeed(replaced.body.path as string).expect(200);
    const status = await request(server.app).get('/api/calendar-feed').set(bearer(signedIn.accessToken)).expect(200);
    expect(status.body.active).toBeTrue();
    await request(server.app).delete('/api/calendar-feed').set(bearer(signedIn.accessToken)).expect(204);
    expect((await request(server.app).get('/api/calendar-feed').set(bearer(signedIn.accessToken)).expect(200)).body.active).toBeFalse();
    await fetchFeed(replaced.body.path as string).expect(404); // revoked

    const { path: live } = await readerWithLoan();
    const timed = async (p: string, code: number) => {
      const t0 = performance.now();
      await fetchFeed(p).expect(code);
      return performance.now() - t0;
    };
    const wrong = `/api/calendar/${'A'.repeat(43)}.ics`;
    const times = { live: await timed(live, 200), wrong: await timed(wrong, 404), revoked: await timed(path, 404) };
    for (const ms of Object.values(times)) expect(ms).toBeGreaterThanOrEqual(FEED_ANSWER_FLOOR_MS - 5);
    expect(Math.abs(times.live - times.wrong)).toBeLessThan(FEED_ANSWER_FLOOR_MS / 2);
  });

  it('needs a signed-in reader to make or revoke a feed', async () => {
    await request(server.app).post('/api/calendar-feed').expect(401);
    await request(server.app).delete('/api/calendar-feed').expect(401);
  });
});
