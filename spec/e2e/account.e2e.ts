import type { BrowserContext, Page } from 'playwright-core';
import request from 'supertest';

import { GOOD_PASSWORD, registerAdmin, uniqueEmail } from '../support/accounts';
import { testInbox } from '../support/test-server';
import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { databaseNames, registerThroughApi, signInThroughUi, waitForDatabase } from './support/reader';

const NEW_PASSWORD = 'a heron waiting by the slow canal';
const REFUSED = 'E-mail or password is not right';

/** Fills the sign-in page and presses Sign in, without waiting for where it leads. */
async function trySignIn(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Opens a page of the account menu, as a reader would. */
async function openFromAccountMenu(page: Page, item: string): Promise<void> {
  await page.getByRole('button', { name: /account menu/ }).click();
  await page.getByRole('menuitem', { name: item }).click();
}

describe('Account, Settings and Accounts screens', () => {
  const harness = useServerAndBrowser();
  let context: BrowserContext;
  let page: Page;
  const base = () => harness.server.baseUrl;

  beforeEach(async () => {
    context = await harness.browser.newContext();
    page = await context.newPage();
  });

  afterEach(async () => {
    await context.close();
  });

  describe('Register', () => {
    it('explains a too-short password and a taken address, then creates the account and opens Today', async () => {
      const taken = await registerThroughApi(base(), 'Leontine Marsh');
      const email = uniqueEmail('tamsin');
      await page.goto(`${base()}/register`);
      await page.getByRole('heading', { name: 'Create your journal' }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);

      await page.getByLabel('Your name').fill('Tamsin Okonjo');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password').fill('too short');
      await page.getByRole('button', { name: 'Create account' }).click();

      await page.locator('mat-error', { hasText: 'Use at least 15 characters' }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/register');
      expect(await seriousViolations(page)).toEqual([]);

      await page.getByLabel('E-mail').fill(taken.user.email);
      await page.getByLabel('Password').fill(GOOD_PASSWORD);
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.getByRole('alert').filter({ hasText: 'An account already uses this e-mail' }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/register');

      await page.getByLabel('E-mail').fill(email);
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.waitForURL(`${base()}/today`);

      // The shell draws after the address changes (later on a busy machine): wait for its menu.
      const menu = page.getByRole('button', { name: /account menu/ });
      await menu.waitFor();
      expect(await menu.getAttribute('aria-label')).toBe('Tamsin Okonjo, account menu');
      await request(base()).post('/api/auth/login').send({ email, password: GOOD_PASSWORD }).expect(200);
    });
  });

  describe('Forgot password', () => {
    it('mails a link that opens the reset page, where a new password replaces the old one', async () => {
      const reader = await registerThroughApi(base(), 'Osric Pennant');
      await page.goto(`${base()}/sign-in`);
      await page.getByRole('link', { name: 'Forgot your password?' }).click();
      await page.waitForURL(`${base()}/forgot-password`);
      expect(await seriousViolations(page)).toEqual([]);

      await page.getByLabel('E-mail').fill('not an address');
      await page.getByRole('button', { name: 'Send the link' }).click();
      await page.locator('mat-error', { hasText: 'Enter an e-mail address like name@example.com' }).waitFor();

      await page.getByLabel('E-mail').fill(reader.user.email);
      await page.getByRole('button', { name: 'Send the link' }).click();
      await page.getByRole('status').filter({ hasText: 'The link works once, for 30 minutes.' }).waitFor();

      const mail = await (await testInbox()).inbox.waitFor((m) => m.to.includes(reader.user.email) && m.subject === 'Choose a new Lamplight password');
      const link = /https?:\/\/\S+\/reset-password#token=[A-Za-z0-9_-]+/.exec(mail.text)?.[0];
      expect(link).withContext(mail.text).toBeDefined();
      // The server's public URL is the default one; the page is the test server's.
      const url = new URL(link!);
      await page.goto(`${base()}${url.pathname}${url.hash}`);
      await page.getByLabel('New password', { exact: true }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);

      await page.getByLabel('New password', { exact: true }).fill('a short one');
      await page.getByRole('button', { name: 'Set the new password' }).click();
      await page.locator('mat-error', { hasText: 'Use at least 15 characters' }).waitFor();

      await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
      await page.getByRole('button', { name: 'Set the new password' }).click();
      await page.getByRole('status').filter({ hasText: 'Your new password is set' }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);

      await trySignIn(page, base(), reader.user.email, reader.password);
      await page.getByRole('alert').filter({ hasText: REFUSED }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/sign-in');

      await signInThroughUi(page, base(), reader.user.email, NEW_PASSWORD);
      // The shell draws after the address changes (later on a busy machine): wait for its menu.
      const menu = page.getByRole('button', { name: /account menu/ });
      await menu.waitFor();
      expect(await menu.getAttribute('aria-label')).toBe('Osric Pennant, account menu');
    });

    it('says so when the reset page is opened without its token', async () => {
      await page.goto(`${base()}/reset-password`);

      await page.getByRole('alert').filter({ hasText: 'This link is incomplete' }).waitFor();
      expect(await page.getByLabel('New password', { exact: true }).count()).toBe(0);
      expect(await seriousViolations(page)).toEqual([]);
    });
  });

  describe('Settings', () => {
    async function openSettings(reader: { user: { email: string }; password: string }): Promise<void> {
      await signInThroughUi(page, base(), reader.user.email, reader.password);
      await openFromAccountMenu(page, 'Settings');
      await page.waitForURL(`${base()}/settings`);
      await page.getByText('this device', { exact: true }).waitFor();
    }

    it('renames this device, and the name is kept by the server', async () => {
      const reader = await registerThroughApi(base(), 'Ysolde Amari');
      await openSettings(reader);
      expect(await seriousViolations(page)).toEqual([]);

      await page
        .getByRole('button', { name: /^Rename / })
        .first()
        .click();
      await page.getByLabel('Device name').fill('   ');
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      await page.getByRole('status').filter({ hasText: 'Name is required' }).waitFor();
      expect(await page.getByLabel('Device name').isVisible()).toBeTrue();

      await page.getByLabel('Device name').fill('Reading tablet by the window');
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      await page.locator('.device .name', { hasText: 'Reading tablet by the window' }).waitFor();

      await page.reload();
      await page.locator('.device .name', { hasText: 'Reading tablet by the window' }).waitFor();
      expect(await page.getByRole('button', { name: 'Rename Reading tablet by the window' }).count()).toBe(1);
    });

    it('changes the password after refusing a wrong current one and a short new one; the old one is refused afterwards', async () => {
      const reader = await registerThroughApi(base(), 'Ferdinand Achterberg');
      await openSettings(reader);

      await page.getByLabel('Current password').fill('not my password at all');
      await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
      await page.getByRole('button', { name: 'Change password' }).click();
      await page.getByRole('alert').filter({ hasText: 'The current password is not right' }).waitFor();

      await page.getByLabel('Current password').fill(reader.password);
      await page.getByLabel('New password', { exact: true }).fill('tiny');
      await page.getByRole('button', { name: 'Change password' }).click();
      await page.locator('mat-error', { hasText: 'Use at least 15 characters' }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);

      await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
      await page.getByRole('button', { name: 'Change password' }).click();
      await page.getByRole('status').filter({ hasText: 'Password changed.' }).waitFor();

      // This device stays signed in: its list of devices still loads.
      await page.reload();
      await page.getByText('this device', { exact: true }).waitFor();

      await openFromAccountMenu(page, 'Sign out');
      await page.getByRole('button', { name: 'Keep and sign out' }).click();
      await page.waitForURL(`${base()}/sign-in`);
      await trySignIn(page, base(), reader.user.email, reader.password);
      await page.getByRole('alert').filter({ hasText: REFUSED }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      await signInThroughUi(page, base(), reader.user.email, NEW_PASSWORD);
    });

    it('deletes the account only with the right password, erases this device, and then sign-in fails', async () => {
      const reader = await registerThroughApi(base(), 'Wilhelmina Oduya');
      await openSettings(reader);
      await waitForDatabase(page, `lamplight-journal-${reader.user.id}`);

      await page.getByRole('button', { name: 'Delete my account…' }).click();
      await page.getByLabel('Your password, to confirm').fill('a wrong password for sure');
      await page.getByRole('button', { name: 'Delete everything' }).click();
      await page.getByRole('alert').filter({ hasText: 'The password is not right' }).waitFor();
      expect(await seriousViolations(page)).toEqual([]);
      await request(base()).post('/api/auth/login').send({ email: reader.user.email, password: reader.password }).expect(200);

      await page.getByLabel('Your password, to confirm').fill(reader.password);
      await page.getByRole('button', { name: 'Delete everything' }).click();
      await page.waitForURL(`${base()}/register`);

      expect(await databaseNames(page)).not.toContain(`lamplight-journal-${reader.user.id}`);
      expect(await page.evaluate(() => localStorage.getItem('lamplight.session'))).toBeNull();
      await trySignIn(page, base(), reader.user.email, reader.password);
      await page.getByRole('alert').filter({ hasText: REFUSED }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/sign-in');
    });
  });

  describe('Accounts (admin)', () => {
    /** Signs an admin in (made in the database, as the server specs do) and opens Accounts from the menu. */
    async function openAccountsAsAdmin(): Promise<{ email: string }> {
      const admin = await registerAdmin(harness.server.app);
      await signInThroughUi(page, base(), admin.user.email, GOOD_PASSWORD);
      await openFromAccountMenu(page, 'Accounts (admin)');
      await page.waitForURL(`${base()}/admin`);
      await page.getByRole('heading', { name: 'Accounts' }).waitFor();
      return admin.user;
    }

    const rowOf = (email: string) => page.getByRole('row').filter({ hasText: email });
    /** The list is paged (10,000 accounts work): search for the account so it is on the first page. */
    const search = async (text: string) => {
      await page.getByPlaceholder('E-mail or name').fill(text);
      // The search answers a moment after the last key. Wait for its answer: the first page (when
      // it holds the account) would do for the row, and the late answer would then replace it.
      await page.locator('#accounts-count', { hasText: `1 account matching “${text}”` }).waitFor();
    };

    it('disables a reader (their sign-in is refused), enables them again and makes them an admin', async () => {
      const reader = await registerThroughApi(base(), 'Tamsin Okonjo');
      await openAccountsAsAdmin();
      await search(reader.user.email);
      const row = rowOf(reader.user.email);
      await row.waitFor();
      expect(await seriousViolations(page)).toEqual([]);
      const canSignIn = row.getByRole('switch', { name: 'Account of Tamsin Okonjo can sign in' });
      expect(await canSignIn.getAttribute('aria-checked')).toBe('true');

      // Listening before the click: the answer can come back before a later wait would start.
      await Promise.all([page.waitForResponse((res) => res.url().includes(`/api/admin/users/${reader.user.id}`) && res.ok()), canSignIn.click()]);
      expect(await canSignIn.getAttribute('aria-checked')).toBe('false');

      const readerContext = await harness.browser.newContext();
      try {
        const readerPage = await readerContext.newPage();
        await trySignIn(readerPage, base(), reader.user.email, reader.password);
        await readerPage.getByRole('alert').filter({ hasText: 'This account is disabled' }).waitFor();
        expect(new URL(readerPage.url()).pathname).toBe('/sign-in');

        await page.reload();
        await search(reader.user.email);
        await rowOf(reader.user.email).waitFor();
        expect(await canSignIn.getAttribute('aria-checked')).toBe('false');
        // Listening before the click: the answer can come back before a later wait would start.
        await Promise.all([page.waitForResponse((res) => res.url().includes(`/api/admin/users/${reader.user.id}`) && res.ok()), canSignIn.click()]);
        expect(await canSignIn.getAttribute('aria-checked')).toBe('true');

        await row.getByRole('button', { name: 'Make admin' }).click();
        await row.getByRole('button', { name: 'Remove admin' }).waitFor();
        expect(await row.getByRole('cell').nth(2).textContent()).toContain('admin');

        await signInThroughUi(readerPage, base(), reader.user.email, reader.password);
        await readerPage.getByRole('button', { name: /account menu/ }).click();
        // The menu loads on first use: wait for it rather than look at once.
        await readerPage.getByRole('menuitem', { name: 'Accounts (admin)' }).waitFor();
        expect(await readerPage.getByRole('menuitem', { name: 'Accounts (admin)' }).isVisible()).toBeTrue();
      } finally {
        await readerContext.close();
      }
    });

    it('puts the switch back and says why when a change is refused', async () => {
      const reader = await registerThroughApi(base(), 'Casimir Llewellyn-Adeyemi');
      await openAccountsAsAdmin();
      await search(reader.user.email);
      const canSignIn = rowOf(reader.user.email).getByRole('switch', { name: 'Account of Casimir Llewellyn-Adeyemi can sign in' });
      expect(await canSignIn.getAttribute('aria-checked')).toBe('true');
      // The account goes away while the list is open.
      await request(base()).delete('/api/auth/account').set('Authorization', `Bearer ${reader.accessToken}`).send({ password: reader.password }).expect(204);

      await canSignIn.click();

      await page.getByRole('alert').filter({ hasText: 'No such account' }).waitFor();
      expect(await canSignIn.getAttribute('aria-checked')).toBe('true');
    });

    it('lets no admin disable themselves or drop their own role', async () => {
      const me = await openAccountsAsAdmin();
      await search(me.email);
      const myRow = rowOf(me.email);
      await myRow.waitFor();

      expect(await myRow.getByRole('switch').isDisabled()).toBeTrue();
      expect(await myRow.getByRole('button', { name: /admin/ }).count()).toBe(0);
    });

    it('keeps a reader who is not an admin out of Accounts', async () => {
      const reader = await registerThroughApi(base(), 'Piet Vantongeren');
      await signInThroughUi(page, base(), reader.user.email, reader.password);
      await page.getByRole('button', { name: /account menu/ }).click();
      await page.getByRole('menuitem', { name: 'Sign out' }).waitFor(); // the menu is open (it loads on first use)
      expect(await page.getByRole('menuitem', { name: 'Accounts (admin)' }).count()).toBe(0);
      await page.keyboard.press('Escape');

      await page.goto(`${base()}/admin`);
      await page.waitForURL(`${base()}/today`);
      expect(new URL(page.url()).pathname).toBe('/today');
    });

    it('shows the caught mail, with a reset mail to a reader', async () => {
      const reader = await registerThroughApi(base(), 'Annelie Kowalczyk');
      await request(base()).post('/api/auth/password-reset/request').send({ email: reader.user.email }).expect(202);
      await (await testInbox()).inbox.waitFor((m) => m.to.includes(reader.user.email) && m.subject === 'Choose a new Lamplight password');
      await openAccountsAsAdmin();

      await page.getByRole('link', { name: 'Caught mail' }).click();
      await page.waitForURL(`${base()}/admin/mail`);
      // Mails are grouped by recipient and subject.
      const resetMail = page
        .locator('section.group')
        .filter({ hasText: `To ${reader.user.email}` })
        .filter({
          has: page.getByRole('heading', { name: 'Choose a new Lamplight password' }),
        });
      await resetMail.waitFor();
      expect(await resetMail.locator('pre').first().textContent()).toMatch(/\/reset-password#token=[A-Za-z0-9_-]+/);
      expect(await seriousViolations(page)).toEqual([]);
    });
  });
});
