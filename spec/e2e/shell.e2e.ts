import type { BrowserContext } from 'playwright-core';

import { offOrigin, recordRequests } from './support/browser';
import { useServerAndBrowser } from './support/harness';

describe('The built app served by the sync server', () => {
  const harness = useServerAndBrowser();
  let context: BrowserContext;

  beforeEach(async () => {
    context = await harness.browser.newContext();
  });

  afterEach(async () => {
    await context.close();
  });

  it('loads the Lamplight shell in Chromium, on the sign-in page for a new device', async () => {
    const page = await context.newPage();
    await page.goto(harness.server.baseUrl);

    await page.locator('.brand-name').waitFor();
    expect(await page.locator('.brand-name').textContent()).toBe('Lamplight');
    expect(await page.title()).toContain('Lamplight');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
  });

  it('satisfies its own Content-Security-Policy: no violation is reported', async () => {
    const page = await context.newPage();
    const violations: string[] = [];
    page.on('console', (message) => {
      if (/Content Security Policy/i.test(message.text())) violations.push(message.text());
    });
    await page.goto(harness.server.baseUrl);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.evaluate(() => document.fonts.ready);

    expect(violations).toEqual([]);
  });

  it('renders text in Atkinson Hyperlegible, loaded from the app itself', async () => {
    const page = await context.newPage();
    await page.goto(harness.server.baseUrl);
    await page.locator('h1').waitFor();

    const fonts = await page.evaluate(async () => {
      await document.fonts.ready;
      const faces = Array.from(document.fonts).filter((face) => face.family.replace(/"/g, '') === 'Atkinson Hyperlegible');
      return {
        // check() alone is true when no face matches at all, so also look for a loaded face.
        check: document.fonts.check('16px "Atkinson Hyperlegible"'),
        loadedFaces: faces.filter((face) => face.status === 'loaded').length,
        bodyFamily: getComputedStyle(document.body).fontFamily,
      };
    });

    expect(fonts.check).toBeTrue();
    expect(fonts.loadedFaces).toBeGreaterThan(0);
    expect(fonts.bodyFamily).toMatch(/^"?Atkinson Hyperlegible/);
  });

  it('makes every request to its own origin', async () => {
    const page = await context.newPage();
    const requests = recordRequests(page);
    await page.goto(`${harness.server.baseUrl}/register`);
    await page.locator('h1', { hasText: 'Create your journal' }).waitFor();
    await page.evaluate(() => document.fonts.ready);

    expect(requests.length).toBeGreaterThan(3);
    expect(offOrigin(requests, harness.server.baseUrl)).toEqual([]);
  });
});
