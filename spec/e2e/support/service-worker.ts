import type { Page } from 'playwright-core';

/**
 * Waits until the Angular service worker controls the page and has every prefetch URL of
 * `ngsw.json` in Cache Storage: it fills its caches only after activating, so going offline
 * earlier would test nothing. Polled from Node (an async predicate in waitForFunction is not awaited).
 */
export async function waitForOfflineReady(page: Page, baseUrl: string, timeoutMs = 30_000): Promise<void> {
  const manifest = (await (await fetch(`${baseUrl}/ngsw.json`)).json()) as {
    assetGroups: { installMode: string; urls: string[] }[];
  };
  const wanted = manifest.assetGroups.filter((group) => group.installMode === 'prefetch').flatMap((group) => group.urls);
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const missing = await page.evaluate(async (urls) => {
      if (!navigator.serviceWorker.controller) return urls;
      const cached = new Set<string>();
      for (const name of await caches.keys()) {
        for (const request of await (await caches.open(name)).keys()) cached.add(new URL(request.url).pathname);
      }
      return urls.filter((url) => !cached.has(url));
    }, wanted);
    if (missing.length === 0) return;
    if (Date.now() > deadline) throw new Error(`service worker has not cached: ${missing.slice(0, 5).join(', ')}`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}
