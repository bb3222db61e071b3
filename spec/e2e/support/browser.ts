import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

import { journalPagesOf } from './page-journal';

/** Debian's Chromium, never a downloaded browser. */
const CHROMIUM = process.env['CHROME_BIN'] ?? '/usr/bin/chromium';

// Browser specs start Chromium and a server; give them room on a slow, shared machine.
// (Benchmarks load these helpers outside Jasmine.)
// A 40-second journey took 60 s with two shards and other work on two cores: leave it twice that.
if (typeof jasmine !== 'undefined') jasmine.DEFAULT_TIMEOUT_INTERVAL = 150_000;

// The network here is closed: keep Chromium from calling out on its own.
const ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export async function launchBrowser(): Promise<Browser> {
  return journalPagesOf(await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ARGS }));
}

/**
 * A browser with a real profile on disk. Contexts of `launchBrowser()` are incognito-like, and
 * Chromium never offers to install an app from incognito.
 */
export function launchProfile(): Promise<BrowserContext> {
  const profile = mkdtempSync(path.join(tmpdir(), 'lamplight-profile-'));
  return chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: ARGS });
}

/** Collects every URL the page (and its workers) request, to check they stay on our origin. */
export function recordRequests(page: Page): string[] {
  const urls: string[] = [];
  page.on('request', (request) => urls.push(request.url()));
  return urls;
}

/** The requested URLs that left `origin` (data: and blob: URLs never leave the device). */
export function offOrigin(urls: readonly string[], origin: string): string[] {
  return urls.filter((url) => !/^(data|blob):/.test(url) && new URL(url).origin !== origin);
}
