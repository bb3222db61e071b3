/**
 * `npm run bench:startup`: what the first screen costs. (1) The JS and CSS the sign-in page and a
 * signed-in Today load, gzip bytes (goal ≤ 2.5× the baseline and ≤ 150 KB), against a blank
 * zoneless Angular + Material app built the same way in this benchmark's own temporary folder.
 * (2) An offline cold start: a new tab of an installed (service-worker) Lamplight opened offline,
 * until the book being read shows on Today, against the blank app's first render from the local
 * server; alternating rounds, medians and the ratio (goal ≤ 3).
 */
import { rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

import express from 'express';
import type { Browser, BrowserContext, Page } from 'playwright-core';

import { HlcClock } from '../shared/sync/hlc';
import { launchProfile, launchBrowser } from '../spec/e2e/support/browser';
import { registerThroughApi, signInThroughUi } from '../spec/e2e/support/reader';
import { waitForOfflineReady } from '../spec/e2e/support/service-worker';
import { SyncClient } from '../spec/support/sync-client';
import { startTestServer } from '../spec/support/test-server';
import { buildBlankApp } from './bench-support/blank-app';
import { median } from './bench-support/seed-books';

const ROUNDS = 5;
const BOOK = 'The Heron Ledger';

/** Gzip bytes of every script and style sheet a page loads until the network is quiet. */
async function firstScreenBytes(page: Page, url: string): Promise<{ gzip: number; files: number }> {
  const bodies: Promise<Buffer | null>[] = [];
  page.on('response', (response) => {
    if (['script', 'stylesheet'].includes(response.request().resourceType())) bodies.push(response.body().catch(() => null));
  });
  await page.goto(url);
  await page.waitForLoadState('load');
  await page.waitForTimeout(1500); // lazy chunks of the first route
  const all = (await Promise.all(bodies)).filter((body): body is Buffer => body !== null);
  return { gzip: all.reduce((sum, body) => sum + gzipSync(body, { level: 6 }).length, 0), files: all.length };
}

async function readerWithABook(baseUrl: string) {
  const reader = await registerThroughApi(baseUrl, 'Bench Start-up');
  const hlc = new HlcClock('bench-startup').tick();
  const id = crypto.randomUUID();
  const fields = { title: BOOK, authors: ['Ines Marlowe'], format: 'print', status: 'reading', deleted: false };
  await new SyncClient(baseUrl, reader.accessToken).push(
    Object.entries(fields).map(([field, value]) => ({ id: crypto.randomUUID(), collection: 'books', rowId: id, field, value, hlc })),
  );
  return reader;
}

async function offlineColdStart(context: BrowserContext, baseUrl: string): Promise<number> {
  await context.setOffline(true);
  const page = await context.newPage();
  const start = Date.now();
  await page.goto(`${baseUrl}/today`);
  await page.getByText(BOOK).first().waitFor();
  const elapsed = Date.now() - start;
  await page.close();
  await context.setOffline(false);
  return elapsed;
}

async function blankFirstRender(browser: Browser, url: string): Promise<number> {
  const context = await browser.newContext();
  const page = await context.newPage();
  const start = Date.now();
  await page.goto(url);
  await page.locator('h1.first').waitFor();
  const elapsed = Date.now() - start;
  await context.close();
  return elapsed;
}

async function main(): Promise<void> {
  const blankDir = buildBlankApp();
  const blankApp = express().use(express.static(path.join(blankDir, 'dist/browser')));
  const blank = blankApp.listen(0, '127.0.0.1');
  await new Promise((resolve) => blank.once('listening', resolve));
  const blankUrl = `http://127.0.0.1:${(blank.address() as AddressInfo).port}/`;
  const server = await startTestServer({ withApp: true });
  const browser = await launchBrowser();
  const profile = await launchProfile();
  try {
    const reader = await readerWithABook(server.baseUrl);
    const bytes = {
      signedOut: await firstScreenBytes(await (await browser.newContext()).newPage(), `${server.baseUrl}/sign-in`),
      blank: await firstScreenBytes(await (await browser.newContext()).newPage(), blankUrl),
    };
    const page = await profile.newPage();
    await signInThroughUi(page, server.baseUrl, reader.user.email, reader.password);
    await page.getByText(BOOK).first().waitFor();
    await waitForOfflineReady(page, server.baseUrl);
    const signedIn = await firstScreenBytes(await profile.newPage(), `${server.baseUrl}/today`);
    await page.close();
    for (const p of profile.pages()) await p.close();

    const cold: number[] = [];
    const blankTimes: number[] = [];
    await offlineColdStart(profile, server.baseUrl); // warm-up
    await blankFirstRender(browser, blankUrl);
    for (let round = 0; round < ROUNDS; round++) {
      if (round % 2 === 0) cold.push(await offlineColdStart(profile, server.baseUrl));
      blankTimes.push(await blankFirstRender(browser, blankUrl));
      if (round % 2 === 1) cold.push(await offlineColdStart(profile, server.baseUrl));
    }
    const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
    console.log('bench-startup: first-screen JS + CSS (gzip) and an offline cold start, vs a blank zoneless Angular + Material app');
    console.log(`  blank app    ${kb(bytes.blank.gzip).padStart(9)} in ${bytes.blank.files} files`);
    console.log(
      `  signed out   ${kb(bytes.signedOut.gzip).padStart(9)} in ${bytes.signedOut.files} files   ratio ${(bytes.signedOut.gzip / bytes.blank.gzip).toFixed(2)}`,
    );
    console.log(`  signed in    ${kb(signedIn.gzip).padStart(9)} in ${signedIn.files} files   ratio ${(signedIn.gzip / bytes.blank.gzip).toFixed(2)}`);
    console.log(
      `  offline cold start to the book being read: median ${median(cold)} ms (${cold.join(', ')}); blank first render ${median(blankTimes)} ms (${blankTimes.join(', ')}); ratio ${(median(cold) / median(blankTimes)).toFixed(2)}`,
    );
  } finally {
    await profile.close();
    await browser.close();
    await server.close();
    blank.close();
    rmSync(blankDir, { recursive: true, force: true });
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
