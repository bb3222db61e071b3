import { useServerAndBrowser } from './support/harness';
import { databaseNames, registerThroughApi, signInThroughUi, waitForDatabase } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

describe('Signing in once, then reading offline', () => {
  const harness = useServerAndBrowser();

  it('opens the journal with no network after one sign-in, and signs out keeping the local copy', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Marit Solberg');
    const context = await harness.browser.newContext();
    const page = await context.newPage();

    await signInThroughUi(page, harness.server.baseUrl, reader.user.email, reader.password);
    await page.getByRole('heading', { name: /Marit Solberg/ }).waitFor();
    await waitForOfflineReady(page, harness.server.baseUrl);
    // The journal opens after the first screen (the signed-in shell is deferred): wait for it before going offline.
    await waitForDatabase(page, `lamplight-journal-${reader.user.id}`);

    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: /Marit Solberg/ }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/today');
    await waitForDatabase(page, `lamplight-journal-${reader.user.id}`);

    await page.getByRole('button', { name: /account menu/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Keep and sign out' }).click();
    await page.waitForURL(`${harness.server.baseUrl}/sign-in`);

    expect(await databaseNames(page)).toContain(`lamplight-journal-${reader.user.id}`);
    expect(await page.evaluate(() => localStorage.getItem('lamplight.session'))).toBeNull();
    await context.close();
  });

  it('erases the local copy when the reader chooses to', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl, 'Joaquín Ferreira');
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, harness.server.baseUrl, reader.user.email, reader.password);
    await page.getByRole('heading', { name: /Joaquín Ferreira/ }).waitFor();
    await waitForDatabase(page, `lamplight-journal-${reader.user.id}`);

    await page.getByRole('button', { name: /account menu/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Erase from this device' }).click();
    await page.waitForURL(`${harness.server.baseUrl}/sign-in`);

    expect(await databaseNames(page)).not.toContain(`lamplight-journal-${reader.user.id}`);
    await context.close();
  });

  it('shows a per-field message when the password is wrong, and stays on sign-in', async () => {
    const reader = await registerThroughApi(harness.server.baseUrl);
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await page.goto(`${harness.server.baseUrl}/sign-in`);

    await page.getByLabel('E-mail').fill(reader.user.email);
    await page.getByLabel('Password').fill('not the password at all');
    await page.getByRole('button', { name: 'Sign in' }).click();

    await page.getByRole('alert').filter({ hasText: 'E-mail or password is not right' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await context.close();
  });
});
