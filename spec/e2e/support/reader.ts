import type { Page } from 'playwright-core';
import request from 'supertest';

import type { SignedIn } from '../../../shared/api/auth';
import { GOOD_PASSWORD, uniqueEmail } from '../../support/accounts';

/** Registers an invented reader through the real API. */
export async function registerThroughApi(baseUrl: string, displayName = 'Marit Solberg'): Promise<SignedIn & { password: string }> {
  const res = await request(baseUrl)
    .post('/api/auth/register')
    .send({ email: uniqueEmail('e2e'), password: GOOD_PASSWORD, displayName })
    .expect(201);
  return { ...(res.body as SignedIn), password: GOOD_PASSWORD };
}

/** Signs in through the sign-in page, as a reader would, and waits for Today. */
export async function signInThroughUi(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}/today`);
}

/** Names of the IndexedDB databases this origin holds. */
export function databaseNames(page: Page): Promise<string[]> {
  return page.evaluate(async () => (await indexedDB.databases()).map((db) => db.name ?? ''));
}

/** Waits until the app has created a database (it opens the reader's journal just after sign-in). */
export async function waitForDatabase(page: Page, name: string, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await databaseNames(page)).includes(name)) {
    if (Date.now() > deadline) throw new Error(`no IndexedDB database ${name}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
