import type { Page } from 'playwright-core';

import { seedDemoLibrary } from '../../../sync-server/src/demo/seed-demo-library';
import { testDataSource } from '../../support/test-database';
import { seriousViolations } from './axe';
import type { Harness } from './harness';
import { registerThroughApi, signInThroughUi } from './reader';

/** A phone (390 × 844) and a tablet upright (768 × 1024), the sizes readers use most. */
export const PHONE = { width: 390, height: 844 } as const;
export const TABLET = { width: 768, height: 1024 } as const;

/** Every route a reader (here also an admin) can open, with ids filled in from the seeded library. */
function routes(ids: { book: string; series: string; notebook: string | null; more: readonly string[] }): string[] {
  const year = new Date().getFullYear();
  const month = String(new Date().getMonth() + 1).padStart(2, '0');
  return [
    '/today',
    '/library',
    '/library/new',
    `/library/${ids.book}`,
    `/library/${ids.book}/edit`,
    `/library/${ids.book}/readings/new`,
    `/library/${ids.book}/sessions/new`,
    '/journal',
    '/journal/quotes',
    '/journal/notebooks',
    ...(ids.notebook ? [`/journal/notebooks/${ids.notebook}`] : []),
    '/journal/series',
    `/journal/series/${ids.series}`,
    '/journal/favourites',
    '/journal/labels',
    '/goals',
    `/goals/${year - 1}`,
    `/goals/${year}/${month}`,
    '/goals/challenges',
    '/goals/challenges/new',
    '/insights',
    `/insights/${year}`,
    `/insights/${year}/review`,
    '/timer',
    '/settings',
    '/settings/trash',
    '/settings/your-data',
    '/loans',
    '/loans/wishlist',
    '/circles',
    '/circles/join',
    '/admin',
    '/admin/mail',
    // A reading, a session, a challenge and a notebook page of the seeded library.
    ...ids.more,
    '/no-such-page',
  ];
}

/** The pages one opens signed out. */
const SIGNED_OUT = ['/sign-in', '/register', '/forgot-password', '/reset-password', '/verify-email'];

/** Routes to one row of each kind the seed wrote (a reading, a session, a challenge, a notebook page), from the database. */
async function rowRoutes(userId: string): Promise<string[]> {
  const dataSource = await testDataSource();
  const first = async (table: string, columns: string) =>
    (
      (await dataSource.query(`SELECT ${columns} FROM ${table} WHERE user_id = $1 AND deleted IS NOT TRUE ORDER BY id LIMIT 1`, [userId])) as Record<
        string,
        string
      >[]
    )[0];
  const [reading, session, challenge, notebookPage] = await Promise.all([
    first('readings', 'id, book_id'),
    first('sessions', 'id, book_id'),
    first('challenges', 'id'),
    first('notebook_pages', 'id, notebook_id'),
  ]);
  return [
    `/library/${reading!['book_id']}/readings/${reading!['id']}`,
    `/library/${session!['book_id']}/sessions/${session!['id']}`,
    `/goals/challenges/${challenge!['id']}`,
    `/journal/notebooks/${notebookPage!['notebook_id']}/pages/${notebookPage!['id']}`,
  ];
}

/** The first link whose address matches, as the page lists it. */
async function firstId(page: Page, url: string, pattern: RegExp): Promise<string | null> {
  await page.goto(url);
  try {
    await page.waitForFunction(
      (source) => [...document.querySelectorAll('a[href]')].some((a) => new RegExp(source).test(a.getAttribute('href') ?? '')),
      pattern.source,
      {
        timeout: 10_000,
      },
    );
  } catch {
    return null;
  }
  const href = await page.evaluate(
    (source) => [...document.querySelectorAll('a[href]')].map((a) => a.getAttribute('href') ?? '').find((h) => new RegExp(source).test(h)),
    pattern.source,
  );
  return href ? href.split('/').pop()! : null;
}

/**
 * Every route, signed in (as a reader with the demo library who is also an admin) and signed out, at
 * one window size: no sideways scrolling, no serious or critical axe findings, nothing under the
 * round Add button. One file per size, so npm test's two e2e shards can share the work.
 */
export async function checkEveryScreenAt(harness: Harness, viewport: { width: number; height: number }): Promise<void> {
  const { baseUrl } = harness.server;
  const reader = await registerThroughApi(baseUrl, 'Oona Teller');
  const dataSource = await testDataSource();
  await seedDemoLibrary(dataSource, reader.user.id);
  // An admin too, so Admin › Accounts and Caught mail are measured with the rest.
  await dataSource.query(`UPDATE users SET role = 'admin' WHERE id = $1`, [reader.user.id]);
  const more = await rowRoutes(reader.user.id);
  const context = await harness.browser.newContext({ viewport });
  const page = await context.newPage();
  await signInThroughUi(page, baseUrl, reader.user.email, reader.password);

  const book = await firstId(page, `${baseUrl}/library`, /^\/library\/(?!new$)[^/]+$/);
  const series = await firstId(page, `${baseUrl}/journal/series`, /^\/journal\/series\/[^/]+$/);
  const notebook = await firstId(page, `${baseUrl}/journal/notebooks`, /^\/journal\/notebooks\/[^/]+$/);
  expect(book).withContext('a book of the seeded library').not.toBeNull();
  // A 500-character title with no space to break at must wrap, not widen the page.
  await page.goto(`${baseUrl}/library/new`);
  await page.getByLabel('Title', { exact: true }).fill('Lanternlight'.repeat(42).slice(0, 500));
  await page.getByRole('button', { name: 'Save' }).click();
  await page.waitForURL(/\/library\/(?!new$)[^/]+$/);
  const longTitle = page.url().split('/').pop()!;
  expect(series).withContext('a series of the seeded library').not.toBeNull();

  const tooWide: string[] = [];
  const findings: string[] = [];
  const covered: string[] = [];
  const signedOut = await harness.browser.newContext({ viewport });
  const visitor = await signedOut.newPage();
  const measured: [Page, string[]][] = [
    [page, [...routes({ book: book!, series: series!, notebook, more }), `/library/${longTitle}`]],
    [visitor, SIGNED_OUT],
  ];
  for (const [tab, list] of measured) {
    for (const route of list) {
      await tab.goto(`${baseUrl}${route}`);
      await tab.locator('main h1, main h2').first().waitFor({ timeout: 10_000 });
      // Lazy parts (charts, covers, live queries) settle before measuring. Not 'networkidle': the
      // live-update stream keeps one request open for as long as the page is.
      await tab.waitForLoadState('load');
      const { scrollWidth, windowWidth } = await settledWidth(tab);
      if (scrollWidth > windowWidth) tooWide.push(`${route} at ${viewport.width}: ${scrollWidth} px wide`);
      for (const finding of await seriousViolations(tab)) findings.push(`${route} at ${viewport.width}: ${finding}`);
      for (const control of await coveredByAddButton(tab)) covered.push(`${route} at ${viewport.width}: ${control}`);
    }
  }
  expect(tooWide).toEqual([]);
  expect(findings).toEqual([]);
  expect(covered).toEqual([]);
  await signedOut.close();
  await context.close();
}

/**
 * With the page scrolled to its end, the page's own controls that the round Add button lies over
 * (none: the page end is padded for it).
 */
function coveredByAddButton(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    window.scrollTo(0, document.documentElement.scrollHeight);
    const add = document.querySelector('button.add')?.getBoundingClientRect();
    if (!add) return [];
    return [...document.querySelectorAll<HTMLElement>('main button, main a[href], main input, main select, main textarea')]
      .filter((control) => {
        const box = control.getBoundingClientRect();
        return box.width > 0 && box.height > 0 && box.left < add.right && box.right > add.left && box.top < add.bottom && box.bottom > add.top;
      })
      .map((control) => control.getAttribute('aria-label') ?? control.textContent?.trim().slice(0, 40) ?? control.tagName);
  });
}

/** The page's width once it has stayed the same for a quarter of a second (at most about 3 s). */
async function settledWidth(page: Page): Promise<{ scrollWidth: number; windowWidth: number }> {
  const measure = () => page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, windowWidth: window.innerWidth }));
  let last = await measure();
  for (let i = 0; i < 12; i++) {
    await new Promise((resolve) => setTimeout(resolve, 250));
    const next = await measure();
    if (next.scrollWidth === last.scrollWidth) return next;
    last = next;
  }
  return last;
}
