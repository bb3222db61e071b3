import { createHash } from 'node:crypto';
import { cpSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';

import { BUILT_APP_DIR, startTestServer, type RunningServer } from '../support/test-server';
import { launchProfile, offOrigin, recordRequests } from './support/browser';
import { fillBook } from './support/library';
import { registerThroughApi, signInThroughUi } from './support/reader';
import { waitForOfflineReady } from './support/service-worker';

/**
 * The installable, offline app. The server serves a copy of the production build, so the spec
 * can turn that copy into a "new version" the way a deployment would: change a file and its hash
 * in ngsw.json.
 */
describe('Lamplight as an installed app on a plane', () => {
  let appDir: string;
  let server: RunningServer;

  beforeAll(async () => {
    appDir = mkdtempSync(path.join(tmpdir(), 'lamplight-build-'));
    cpSync(BUILT_APP_DIR, appDir, { recursive: true });
    server = await startTestServer({ withApp: true, env: { LAMPLIGHT_APP_DIR: appDir } });
  });

  afterAll(async () => {
    await server?.close();
  });

  it('activates its service worker, is installable, works offline with the reader’s data, stays on its origin, and offers a new version', async () => {
    const reader = await registerThroughApi(server.baseUrl, 'Wilhelmina Osei');
    const context = await launchProfile();
    const page = context.pages()[0] ?? (await context.newPage());
    const requests = recordRequests(page);
    context.on('request', (request) => requests.push(request.url())); // service worker fetches too

    await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
    await page.goto(`${server.baseUrl}/library/new`);
    await fillBook(page, { title: 'Lanterns over Lake Vell', authors: 'Corin Hale' });

    // (1) The service worker activates and controls the page.
    await waitForOfflineReady(page, server.baseUrl);
    const worker = await page.evaluate(async () => {
      const registration = await navigator.serviceWorker.ready;
      return { state: registration.active?.state, controlled: navigator.serviceWorker.controller !== null, script: registration.active?.scriptURL };
    });
    expect(worker).toEqual({ state: 'activated', controlled: true, script: `${server.baseUrl}/ngsw-worker.js` });

    // (2) Chromium finds nothing stopping installation (DevTools Protocol).
    const cdp = await context.newCDPSession(page);
    const { installabilityErrors } = (await cdp.send('Page.getInstallabilityErrors')) as { installabilityErrors: unknown[] };
    expect(installabilityErrors).toEqual([]);

    // (3) Offline, a reload still shows the shell and the reader's local data.
    await context.setOffline(true);
    await page.goto(`${server.baseUrl}/library`);
    await page.getByRole('link', { name: /Lanterns over Lake Vell/ }).waitFor();
    expect(await page.locator('.brand-name').textContent()).toBe('Lamplight');
    await page.getByRole('button', { name: /^Sync status: Offline/ }).waitFor();
    await context.setOffline(false);

    // (4) Every request went to the app's own origin.
    expect(requests.length).toBeGreaterThan(5);
    expect(offOrigin(requests, server.baseUrl)).toEqual([]);

    // (5) A new build is detected and the update snackbar appears.
    publishNewVersion(appDir);
    await page.reload();
    await page.getByText('A new version of Lamplight is ready.').waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Reload', exact: true }).waitFor();
    await context.close();
  });

  it('asks for every file of the first screen in its first round trip (scripts/preload-initial.mjs)', async () => {
    const html = await (await fetch(`${server.baseUrl}/`)).text();
    const main = html.match(/<script src="(main-[\w-]+\.js)"/)?.[1] ?? 'main.js';
    // The sign-in page a first visit shows, and what it imports (main alone may import nothing).
    const signIn = readdirSync(appDir).find(
      (file) => /^chunk-[\w-]+\.js$/.test(file) && /selectors:\[\[["`]ll-sign-in["`]\]\]/.test(readFileSync(path.join(appDir, file), 'utf8')),
    );
    const imported = new Set<string>(signIn ? [signIn] : []);
    const visit = (file: string) => {
      for (const [, chunk] of readFileSync(path.join(appDir, file), 'utf8').matchAll(/(?:from|import)\s*"\.\/(chunk-[\w-]+\.js)"/g)) {
        if (imported.has(chunk)) continue;
        imported.add(chunk);
        visit(chunk);
      }
    };
    visit(main);
    if (signIn) visit(signIn);

    expect(signIn).toBeDefined();
    expect(imported.size).toBeGreaterThan(1);
    expect(html).toContain(`<link rel="modulepreload" href="${main}">`);
    expect(html.match(/<link rel="preload" href="media\/atkinson-hyperlegible-latin-(400|700)-normal-/g)?.length).toBe(2);

    // Signed out, the page asks for all of it (the sign-in page's part through its preload script);
    // signed in, not the sign-in page's part, which that start has no use for.
    const context = await launchProfile();
    const page = context.pages()[0] ?? (await context.newPage());
    const preloaded = async () => {
      await page.waitForLoadState('load'); // an async module script has run by then
      return page.evaluate(() => Array.from(document.querySelectorAll<HTMLLinkElement>('link[rel=modulepreload]'), (link) => link.getAttribute('href')));
    };
    await page.goto(server.baseUrl);
    const signedOut = await preloaded();
    expect([...imported, main].filter((chunk) => !signedOut.includes(chunk))).toEqual([]);
    const reader = await registerThroughApi(server.baseUrl, 'Ottilie Marsh');
    await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
    await page.reload();
    const signedIn = await preloaded();
    expect(signedIn).toContain(main);
    expect(signedIn).not.toContain(signIn ?? null);
    await context.close();
  });
});

/** What a deployment changes: a file's content, and its SHA-1 in the service worker's manifest. */
function publishNewVersion(dir: string): void {
  const indexFile = path.join(dir, 'index.html');
  const html = readFileSync(indexFile, 'utf8').replace('</body>', '<!-- next version --></body>');
  writeFileSync(indexFile, html);
  const ngswFile = path.join(dir, 'ngsw.json');
  const ngsw = JSON.parse(readFileSync(ngswFile, 'utf8')) as { timestamp: number; hashTable: Record<string, string> };
  ngsw.hashTable['/index.html'] = createHash('sha1').update(html).digest('hex');
  ngsw.timestamp = Date.now();
  writeFileSync(ngswFile, JSON.stringify(ngsw, null, 2));
  // A build writes its compressed copies too (scripts/precompress.mjs), and the server serves those.
  for (const file of [indexFile, ngswFile]) {
    const content = readFileSync(file);
    writeFileSync(`${file}.gz`, gzipSync(content));
    writeFileSync(`${file}.br`, brotliCompressSync(content));
  }
}
