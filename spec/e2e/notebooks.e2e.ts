import AxeBuilder from '@axe-core/playwright';
import type { Page } from 'playwright-core';

import { useServerAndBrowser } from './support/harness';
import { fillBook } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';
import { valueWhen } from './support/settled';

/** axe-core findings that block or seriously hinder someone (WCAG impact "serious" or "critical"). */
async function seriousViolations(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.help} (${v.nodes.length})`);
}

const PAGE_TEXT = [
  '# Low tide',
  'Gulls and **one heron**, standing *very* still.',
  '- mud to the horizon',
  '[x] flask',
  '[ ] come back at dawn',
  '> The tide keeps its own hours.',
  '',
  '<b>not bold</b> on {{weekday}}',
].join('\n');

describe('Notebooks', () => {
  const harness = useServerAndBrowser();

  it('offline: a notebook on a book, pages from a starter template and from the reader’s own, all there after a reload; no serious accessibility problems', async () => {
    const { baseUrl } = harness.server;
    const reader = await registerThroughApi(baseUrl, 'Ottilie Fairweather');
    const context = await harness.browser.newContext();
    const page = await context.newPage();
    await signInThroughUi(page, baseUrl, reader.user.email, reader.password);
    await page.goto(`${baseUrl}/library/new`);
    await fillBook(page, { title: 'The Salt Roads', authors: 'Wren Okafor' });
    await waitForOfflineReady(page, baseUrl);
    await context.setOffline(true);

    // An empty shelf of notebooks, then one about the book.
    await page.goto(`${baseUrl}/journal/notebooks`);
    await page.getByRole('heading', { name: 'No notebooks yet' }).waitFor();
    await page.getByRole('button', { name: /^Sync status: Offline/ }).waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByLabel('Title', { exact: true }).fill('Coast reading');
    await page.getByLabel('About a book').selectOption({ label: 'The Salt Roads' });
    await page.getByRole('button', { name: 'Start notebook' }).click();
    await page.getByRole('heading', { level: 1, name: 'Coast reading' }).waitFor();
    expect(await page.locator('.book').textContent()).toContain('The Salt Roads');
    expect(await seriousViolations(page)).toEqual([]);

    // A page from a starter template: its placeholders filled with the book and today.
    await page.getByLabel('Start from').selectOption({ label: 'After a sitting' });
    await page.getByRole('button', { name: 'Add a page' }).click();
    await page.waitForURL(/\/journal\/notebooks\/[^/]+\/pages\/[^/]+$/);
    const title = page.getByLabel('Page title');
    await title.waitFor();
    expect(await title.inputValue()).toMatch(/^The Salt Roads · [A-Z][a-z]+day \d{4}-\d{2}-\d{2}$/);
    expect(await page.getByLabel('Page text').inputValue()).toContain('## Where I stopped');
    await page.locator('.preview h4', { hasText: 'Where I stopped' }).waitFor();

    // Light formatting, previewed as typed; markup stays text.
    await title.fill('Low tide at the harbour');
    await page.getByLabel('Page text').fill(PAGE_TEXT);
    await page.locator('.preview strong', { hasText: 'one heron' }).waitFor();
    expect(await page.locator('.preview h3').textContent()).toBe('Low tide');
    expect(await page.locator('.preview em').textContent()).toBe('very');
    expect(await page.locator('.preview blockquote').textContent()).toBe('The tide keeps its own hours.');
    expect(await page.locator('.preview li.check').count()).toBe(2);
    expect(await page.locator('.preview b').count()).toBe(0);
    expect(await page.locator('.preview').textContent()).toContain('<b>not bold</b>');
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('button', { name: 'Save page', exact: true }).click();
    await page.getByRole('status').filter({ hasText: 'Saved on this device.' }).waitFor();

    // Saved as a template of the reader's own, then a second page from it.
    await page.getByRole('button', { name: 'Save this page as a template' }).click();
    await page.getByLabel('Template name').fill('Shore log');
    await page.getByRole('button', { name: 'Save template', exact: true }).click();
    await page.getByRole('status').filter({ hasText: 'Saved as the template “Shore log”' }).waitFor();
    await page.getByRole('link', { name: 'Back to the notebook' }).click();
    await page.getByLabel('Start from').selectOption({ label: 'Shore log' });
    await page.getByRole('button', { name: 'Add a page' }).click();
    await page.waitForURL(/\/pages\//);
    await page.getByLabel('Page title').waitFor();
    const weekday = await page.evaluate(() => new Intl.DateTimeFormat('en', { weekday: 'long' }).format(new Date()));
    expect(await page.getByLabel('Page title').inputValue()).toBe('Low tide at the harbour');
    expect(await page.getByLabel('Page text').inputValue()).toBe(PAGE_TEXT.replace('{{weekday}}', weekday));

    // Everything is still there after a reload, still offline.
    await page.reload();
    await page.getByLabel('Page title').waitFor();
    const typed = PAGE_TEXT.replace('{{weekday}}', weekday);
    expect(await valueWhen(page.getByLabel('Page text'), (text) => text === typed)).toBe(typed);
    await page.getByRole('link', { name: 'Coast reading' }).click();
    await page.locator('li.page').nth(1).waitFor();
    expect(await page.locator('li.page .page-title').allTextContents()).toEqual(['Low tide at the harbour', 'Low tide at the harbour']);
    expect(await page.locator('li.page .excerpt').first().textContent()).toContain('Gulls and one heron');
    expect(await seriousViolations(page)).toEqual([]);

    await page.goto(`${baseUrl}/journal/notebooks`);
    const listed = page.locator('li.notebook');
    await listed.first().waitFor();
    expect(await listed.locator('.title').textContent()).toBe('Coast reading');
    expect(await listed.locator('.book').textContent()).toBe('On The Salt Roads');
    expect(await listed.locator('.facts').textContent()).toMatch(/^2 pages · edited \w{3} \d{1,2}, \d{4}/);
    expect(await page.getByRole('list', { name: 'Your templates' }).textContent()).toContain('Shore log');
    expect(await seriousViolations(page)).toEqual([]);

    // The book's page links to its notebook.
    await page.goto(`${baseUrl}/library`);
    await page.getByRole('link', { name: 'The Salt Roads' }).click();
    await page.getByRole('heading', { name: 'Notebooks' }).waitFor();
    await page.getByRole('link', { name: 'Coast reading' }).click();
    await page.getByRole('heading', { level: 1, name: 'Coast reading' }).waitFor();
    await context.close();
  });
});
