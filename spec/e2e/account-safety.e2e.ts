import { testDataSource } from '../support/test-database';
import { testInbox } from '../support/test-server';
import { useServerAndBrowser } from './support/harness';
import { registerThroughApi, signInThroughUi, waitForDatabase } from './support/reader';

/** An access token whose payload expired a minute ago (the client reads `exp`, never the signature). */
function expiredAccessToken(): string {
  const encode = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
  return `${encode({ alg: 'HS256', typ: 'JWT' })}.${encode({ sub: 'x', exp: Math.floor(Date.now() / 1000) - 60 })}.c2ln`;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('Account safety in a real browser', () => {
  const harness = useServerAndBrowser();

  it('confirms the e-mail address from the link in the welcome mail, caught by the local SMTP inbox', async () => {
    const { inbox } = await testInbox();
    const reader = await registerThroughApi(harness.server.baseUrl, 'Edda Kvist');
    const mail = await inbox.waitFor((m) => m.to.includes(reader.user.email));
    const link = /https?:\/\/\S+\/verify-email#token=[\w.-]+/.exec(mail.text)![0];
    expect(mail.text).not.toContain('Edda Kvist');
    const context = await harness.browser.newContext();
    const page = await context.newPage();

    // The mail names the public URL; the path and fragment are what matter here.
    await page.goto(`${harness.server.baseUrl}${new URL(link).pathname}${new URL(link).hash}`);

    await page.getByRole('status').filter({ hasText: 'your address is confirmed' }).waitFor();
    const rows: { verified: boolean }[] = await (
      await testDataSource()
    ).query('SELECT email_verified_at IS NOT NULL AS verified FROM users WHERE id = $1', [reader.user.id]);
    expect(rows[0]!.verified).toBeTrue();
    await context.close();
  });

  it('when two tabs open with an expired access token, only one presents the refresh token, and the session lives on', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Ivo Marten');
    const context = await harness.browser.newContext();
    const first = await context.newPage();
    await signInThroughUi(first, harness.server.baseUrl, reader.user.email, reader.password);
    await waitForDatabase(first, `lamplight-journal-${reader.user.id}`);
    const second = await context.newPage();
    await second.goto(`${harness.server.baseUrl}/today`);
    await second.getByRole('heading', { name: /Ivo Marten/ }).waitFor();
    const db = await testDataSource();
    const family = async () =>
      (await db.query(
        `SELECT t.used_at IS NOT NULL AS used, t.grace_used_at IS NOT NULL AS grace, s.revoked_at IS NOT NULL AS revoked
           FROM refresh_tokens t JOIN device_sessions s ON s.id = t.session_id
          WHERE t.session_id = (SELECT id FROM device_sessions WHERE user_id = $1 ORDER BY created_at DESC LIMIT 1)`,
        [reader.user.id],
      )) as { used: boolean; grace: boolean; revoked: boolean }[];
    expect((await family()).length).toBe(1);

    // Both tabs wake up needing a refresh at the same moment. The token is changed from a page that
    // runs no app (robots.txt), with the tabs closed, so no running tab reacts to it first.
    await Promise.all([first.close(), second.close()]);
    const setter = await context.newPage();
    await setter.goto(`${harness.server.baseUrl}/robots.txt`);
    await setter.evaluate((token) => {
      const session = JSON.parse(localStorage.getItem('lamplight.session')!);
      localStorage.setItem('lamplight.session', JSON.stringify({ ...session, accessToken: token }));
    }, expiredAccessToken());
    await setter.close();
    const tabs = await Promise.all([context.newPage(), context.newPage()]);
    await Promise.all(tabs.map((tab) => tab.goto(`${harness.server.baseUrl}/today`)));
    for (let i = 0; i < 100 && (await family()).length < 2; i++) await sleep(100);
    await sleep(2_000); // room for a second presentation, if one were coming

    const tokens = await family();
    expect(tokens.length).withContext('tokens in the family: the first and one successor').toBe(2);
    expect(tokens.some((token) => token.grace))
      .withContext('a token presented twice (answered from the grace window)')
      .toBeFalse();
    expect(tokens.some((token) => token.revoked)).toBeFalse();
    await context.close();
  });
});
