import { randomUUID } from 'node:crypto';

import request from 'supertest';
import type { DataSource } from 'typeorm';

import type { CaughtMail } from '../../shared/api/admin';
import { deterministicId } from '../../shared/sync/deterministic-id';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import type { JobServices } from '../../sync-server/src/jobs/job';
import { startJobRunner } from '../../sync-server/src/jobs/job-runner';
import { jobServices } from '../../sync-server/src/jobs/job-services';
import { loanReminders } from '../../sync-server/src/jobs/loan-reminders.job';
import { createSmtpMailer } from '../../sync-server/src/mail/mailer';
import { registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDatabaseUrl, testDataSource } from '../support/test-database';
import { startTestServer, testConfig, testInbox, type RunningServer } from '../support/test-server';

const SECRET = new TextEncoder().encode('spec-secret-that-is-at-least-32-characters-long');
const TITLE = 'The Lantern-Keeper’s Almanac';
const CARD = '29876543210';

describe('Loan reminders by e-mail (pg-boss job)', () => {
  let server: RunningServer;
  let dataSource: DataSource;
  beforeAll(async () => {
    server = await startTestServer();
    dataSource = await testDataSource();
  });
  afterAll(() => server.close());

  /** Job services for one "instance": its own mailer to the local inbox, its clock fixed at `now`. */
  async function services(now: string): Promise<JobServices> {
    const config = await testConfig();
    return { mailer: createSmtpMailer(config.smtpUrl, config.mailFrom), publicUrl: config.publicUrl, serverSecret: SECRET, now: () => new Date(now) };
  }

  /** A verified reader in Los Angeles with a library loan due 5 March 2026 (or `dueOn`) and reminders on. */
  async function reader(settings: Record<string, unknown> = {}, dueOn = '2026-03-05') {
    const signedIn = await registerReader(server.app);
    await dataSource.query('UPDATE users SET email_verified_at = now() WHERE id = $1', [signedIn.user.id]);
    const client = new SyncClient(server.baseUrl, signedIn.accessToken);
    const [bookId, loanId, libraryId] = [randomUUID(), randomUUID(), randomUUID()];
    const settingsId = deterministicId('loan-reminders', 'settings');
    const wall = Date.now();
    const fields = { email: true, timeZone: 'America/Los_Angeles', emailSince: new Date(wall - 60_000).toISOString(), ...settings };
    const push = await client.push([
      fieldChange(bookId, 'title', TITLE, { wall }),
      fieldChange(libraryId, 'name', 'Harbourside Branch', { wall }, 'libraries'),
      fieldChange(libraryId, 'cardNumber', CARD, { wall }, 'libraries'),
      fieldChange(loanId, 'kind', 'library', { wall }, 'loans'),
      fieldChange(loanId, 'bookId', bookId, { wall }, 'loans'),
      fieldChange(loanId, 'libraryId', libraryId, { wall }, 'loans'),
      fieldChange(loanId, 'dueOn', dueOn, { wall }, 'loans'),
      ...Object.entries(fields).map(([field, value]) => fieldChange(settingsId, field, value, { wall }, 'loanReminders')),
    ]);
    expect(push.status).toBe(200);
    return { email: signedIn.user.email, userId: signedIn.user.id, client, bookId, loanId, wall };
  }

  /** Reminder mails only (the welcome mail goes to the same address). */
  const isReminder = (email: string) => (mail: CaughtMail) => mail.to.includes(email) && mail.subject.startsWith('Lamplight: ');
  const mailsTo = async (email: string) => (await testInbox()).inbox.messages().filter(isReminder(email));

  it('two instances running the job at once send the reminder once, with text and HTML and nothing private', async () => {
    const { email } = await reader();
    // 17:00 UTC is 09:00 on 3 March in Los Angeles: the loan is due in 2 days (the default).
    const [a, b] = [await services('2026-03-03T17:00:00Z'), await services('2026-03-03T17:00:00Z')];
    const second = createDataSource(testDatabaseUrl(), { poolSize: 3 });
    await second.initialize();
    const runners = [await startJobRunner(testDatabaseUrl(), dataSource, [loanReminders], a), await startJobRunner(testDatabaseUrl(), second, [loanReminders], b)];
    try {
      await Promise.all([
        ...runners.map((runner) => runner.send('loan-reminders')),
        // And two runs outside pg-boss at the same moment (no singleton queue to help): the claimed keys still hold.
        loanReminders.run({ dataSource, services: a }),
        loanReminders.run({ dataSource: second, services: b }),
      ]);
      const mail = await (await testInbox()).inbox.waitFor(isReminder(email), 8000);
      await new Promise((resolve) => setTimeout(resolve, 5000)); // both runners poll every 2 s
      expect((await mailsTo(email)).length).toBe(1);
      expect(mail.text).toContain(`“${TITLE}” is due back on 5 March 2026.`);
      expect(mail.html).toContain('5 March 2026');
      expect(mail.listUnsubscribe).toMatch(/^<http:\/\/127\.0\.0\.1:8080\/api\/reminders\/unsubscribe\?token=/);
      for (const part of [mail.text, mail.html ?? '', mail.subject]) {
        expect(part).not.toContain(CARD);
        expect(part).not.toContain('Harbourside');
      }
    } finally {
      for (const runner of runners) await runner.stop();
      await second.destroy();
      a.mailer.close();
      b.mailer.close();
    }
  });

  it('sends on the right local day: not while it is still 2 March in Los Angeles, nor before 08:00', async () => {
    const { email } = await reader();
    const evening = await services('2026-03-03T07:00:00Z'); // 23:00 on 2 March in LA: 3 days before
    await loanReminders.run({ dataSource, services: evening });
    const early = await services('2026-03-03T14:00:00Z'); // 06:00 on 3 March: too early
    await loanReminders.run({ dataSource, services: early });
    expect((await mailsTo(email)).length).toBe(0);
    const morning = await services('2026-03-03T16:00:00Z'); // 08:00 on 3 March
    await loanReminders.run({ dataSource, services: morning });
    await (await testInbox()).inbox.waitFor(isReminder(email));
    for (const s of [evening, early, morning]) s.mailer.close();
  });

  /**
   * The server's own job services with its clock moved by LAMPLIGHT_JOBS_NOW (as `npm start` or a
   * demo would set it), one per instant: runs the job at each and answers how many reminder mails
   * the local inbox holds for the reader after each run.
   */
  async function mailsAfterRunsAt(email: string, instants: readonly string[]): Promise<number[]> {
    const counts: number[] = [];
    for (const instant of instants) {
      const config = await testConfig({ LAMPLIGHT_JOBS_NOW: instant });
      const moved = jobServices(config, createSmtpMailer(config.smtpUrl, config.mailFrom));
      await loanReminders.run({ dataSource, services: moved });
      moved.mailer.close();
      counts.push((await mailsTo(email)).length);
    }
    return counts;
  }

  // Zone offsets and change instants from the IANA tz database: Kiritimati is UTC+14 all year;
  // London goes from GMT to BST at 2026-03-29T01:00:00Z (RFC 9557 / ISO 8601 instants below).
  it('with LAMPLIGHT_JOBS_NOW moved to the morning N days before it is due, the mail arrives in the local inbox; not the day before', async () => {
    // Kiritimati, 3 days before (the reader's choice): due 5 March, so the mail is for 2 March local.
    const far = await reader({ timeZone: 'Pacific/Kiritimati', daysBefore: 3 });
    expect(
      await mailsAfterRunsAt(far.email, [
        '2026-02-28T19:00:00Z', // 09:00 on 1 March there: 4 days before
        '2026-03-01T17:30:00Z', // 07:30 on 2 March: the right day, before 08:00
        '2026-03-01T18:00:00Z', // 08:00 on 2 March (still 1 March in UTC)
        '2026-03-01T20:00:00Z', // later that day: no second mail
      ]),
    ).toEqual([0, 0, 1, 1]);
    const mail = (await mailsTo(far.email))[0]!;
    expect(mail.text).toContain(`“${TITLE}” is due back on 5 March 2026.`);
  });

  it('writes the dates in the reader’s date locale from their synced settings (CLDR: en-US puts the month first)', async () => {
    const { email, client, wall } = await reader();
    const settingsId = deterministicId('reader-settings', 'current');
    expect((await client.push([fieldChange(settingsId, 'dateLocale', 'en-US', { wall: wall + 1000 }, 'readerSettings')])).status).toBe(200);
    expect(await mailsAfterRunsAt(email, ['2026-03-03T17:00:00Z'])).toEqual([1]);
    const [mail] = await mailsTo(email);
    expect(mail!.text).toContain(`“${TITLE}” is due back on March 5, 2026.`);
  });

  it('keeps to the local morning across London’s change to summer time (08:00 BST is 07:00 UTC)', async () => {
    // Due 31 March, 2 days before (the default): the mail is for 29 March, the day the clocks change.
    const london = await reader({ timeZone: 'Europe/London' }, '2026-03-31');
    expect(
      await mailsAfterRunsAt(london.email, [
        '2026-03-28T09:00:00Z', // 09:00 GMT on 28 March: 3 days before
        '2026-03-29T06:30:00Z', // 07:30 BST on 29 March: the right day, too early
        '2026-03-29T07:00:00Z', // 08:00 BST on 29 March (a UTC clock would still say 07:00)
      ]),
    ).toEqual([0, 0, 1]);
  });

  it('stops after the unsubscribe link (no sign-in), and starts again when turned on again later', async () => {
    const { email, client, loanId, wall } = await reader();
    const link = new URL(
      (
        await (async () => {
          const s = await services('2026-03-03T17:00:00Z');
          await loanReminders.run({ dataSource, services: s });
          s.mailer.close();
          return (await (await testInbox()).inbox.waitFor(isReminder(email))).listUnsubscribe ?? '';
        })()
      ).slice(1, -1),
    );
    const path = `${link.pathname}${link.search}`;
    const page = await request(server.app).get(path).expect(200);
    expect(page.text).toContain('<form method="post"');
    await request(server.app).post(path).expect(200);

    // A renewal makes a new reminder due, but the reader has unsubscribed.
    expect((await client.push([fieldChange(loanId, 'dueOn', '2026-03-04', { wall: wall + 1000 }, 'loans')])).status).toBe(200);
    const s = await services('2026-03-03T17:00:00Z');
    await loanReminders.run({ dataSource, services: s });
    expect((await mailsTo(email)).length).toBe(1);

    // Turned on again in Settings (a later emailSince): the renewal's reminder goes out.
    const settingsId = deterministicId('loan-reminders', 'settings');
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect((await client.push([fieldChange(settingsId, 'emailSince', new Date().toISOString(), { wall: wall + 2000 }, 'loanReminders')])).status).toBe(200);
    await loanReminders.run({ dataSource, services: s });
    await (await testInbox()).inbox.waitFor((m) => isReminder(email)(m) && m.text.includes('4 March 2026'));
    s.mailer.close();
  });

  it('refuses a forged or damaged unsubscribe token with a 400 naming it', async () => {
    const res = await request(server.app)
      .post(`/api/reminders/unsubscribe?token=${randomUUID()}.${'A'.repeat(43)}`)
      .expect(400);
    expect(JSON.stringify(res.body)).toContain('token');
  });

  it('sends one digest a day with every item in it', async () => {
    const { email, client, wall } = await reader({ digest: true });
    const [bookId, loanId] = [randomUUID(), randomUUID()];
    await client.push([
      fieldChange(bookId, 'title', 'Moss and Mortar', { wall }),
      fieldChange(loanId, 'kind', 'hold', { wall }, 'loans'),
      fieldChange(loanId, 'bookId', bookId, { wall }, 'loans'),
      fieldChange(loanId, 'readyOn', '2026-03-02', { wall }, 'loans'),
    ]);
    const s = await services('2026-03-03T17:00:00Z');
    await loanReminders.run({ dataSource, services: s });
    await loanReminders.run({ dataSource, services: s });
    const mail = await (await testInbox()).inbox.waitFor(isReminder(email));
    expect(mail.subject).toBe('Lamplight: 2 loan reminders');
    expect(mail.text).toContain('“Moss and Mortar” is ready to pick up.');
    expect((await mailsTo(email)).length).toBe(1);
    s.mailer.close();
  });
});
