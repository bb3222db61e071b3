import type { Page } from 'playwright-core';

/** Fills the book editor (only the fields given) and saves; waits for the book page. */
export async function fillBook(
  page: Page,
  fields: { title?: string; authors?: string; format?: string; status?: string; rating?: string; pageCount?: string; isbn?: string },
): Promise<void> {
  if (fields.title !== undefined) await page.getByLabel('Title', { exact: true }).fill(fields.title);
  if (fields.authors !== undefined) await page.getByLabel('Authors', { exact: true }).fill(fields.authors);
  if (fields.format !== undefined) await page.getByLabel('Format', { exact: true }).selectOption(fields.format);
  if (fields.status !== undefined) await page.getByLabel('Status', { exact: true }).selectOption(fields.status);
  if (fields.rating !== undefined) await page.getByLabel('Rating', { exact: true }).selectOption(fields.rating);
  if (fields.pageCount !== undefined) await page.getByLabel('Page count', { exact: true }).fill(fields.pageCount);
  if (fields.isbn !== undefined) await page.getByLabel('ISBN', { exact: true }).fill(fields.isbn);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await page.locator('article.book').waitFor();
}

/** Opens the sync details and presses "Sync now"; waits until nothing is waiting and it is idle. */
export async function syncNow(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Sync status/ }).click();
  await page.getByRole('menuitem', { name: 'Sync now' }).click();
  await page.getByRole('button', { name: /^Sync status: Synced/ }).waitFor({ timeout: 20_000 });
}

/** The facts shown on a book page, by their labels. */
export async function bookFacts(page: Page): Promise<Record<string, string>> {
  await page.locator('article.book').waitFor();
  return page.evaluate(() => {
    const facts: Record<string, string> = { Title: document.querySelector('article.book .title')?.textContent?.trim() ?? '' };
    for (const dt of Array.from(document.querySelectorAll('article.book dt'))) {
      const dd = dt.nextElementSibling as HTMLElement | null;
      // A select shows its chosen option; stars are read by their label, as a screen reader would.
      const select = dd?.querySelector('select');
      const stars = dd?.querySelector('[role="img"]');
      facts[dt.textContent!.trim()] = select
        ? (select.selectedOptions[0]?.textContent?.trim() ?? '')
        : stars
          ? (stars.getAttribute('aria-label') ?? '')
          : (dd?.textContent?.trim() ?? '');
    }
    return facts;
  });
}

/**
 * Waits until the cover inside `scope` (a CSS selector) is a decoded image and returns its
 * `src` and natural size: a placeholder, or an image that failed to load, never passes.
 */
export async function shownCover(page: Page, scope: string, timeoutMs = 20_000): Promise<{ src: string; naturalWidth: number; naturalHeight: number }> {
  const selector = `${scope} ll-book-cover img`;
  await page.waitForFunction(
    (css) => {
      const img = document.querySelector<HTMLImageElement>(css);
      return !!img && img.complete && img.naturalWidth > 0;
    },
    selector,
    { timeout: timeoutMs },
  );
  return page.$eval(selector, (img) => {
    const image = img as HTMLImageElement;
    return { src: image.src, naturalWidth: image.naturalWidth, naturalHeight: image.naturalHeight };
  });
}
