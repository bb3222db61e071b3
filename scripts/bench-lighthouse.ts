/**
 * `npm run bench:lighthouse`: Lighthouse 12.2 (mobile: simulated slow 4G and 4× CPU, its default)
 * on the sign-in page and, signed in as the demo reader, Today and Library, beside the blank app
 * of bench:startup served by a plain static server. Goal: performance ≥ 90 on all three,
 * accessibility 100. Debian's Chromium (through playwright-core, with a DevTools port for
 * Lighthouse). Each page runs ROUNDS times in alternating order; the run with the median
 * performance score is printed.
 *
 * Signed-in pages keep all storage (Lighthouse's storage reset would sign the reader out): a
 * returning reader whose installed app (service worker and its caches) is warm. Clearing only the
 * caches or the worker under Lighthouse failed its runs (an error page, or a lost trace).
 * `LAMPLIGHT_BENCH_WHERE=1` also prints, for each run, the scripts with the most main-thread time
 * (Lighthouse's bootup-time audit), the longest main-thread tasks and the largest transfers:
 * where to look next. `LAMPLIGHT_BENCH_PAGES` runs only the pages named (comma-separated: `blank
 * app`, `sign-in`, `Today`, `Library`, or `signed-in` for the last two);
 * `LAMPLIGHT_BENCH_BASELINE=DIR` also serves another build's `browser` folder (say the previous
 * commit's, built into a temporary folder) and runs its pages in turn with this build's, so both
 * see the same machine load; `LAMPLIGHT_BENCH_JSON=DIR` keeps each run's Lighthouse JSON and trace.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';

import express from 'express';
import { chromium } from 'playwright-core';

import { DEMO_ACCOUNTS, seedDemo } from '../sync-server/src/demo/seed-demo';
import { signInThroughUi } from '../spec/e2e/support/reader';
import { testDataSource } from '../spec/support/test-database';
import { startTestServer } from '../spec/support/test-server';
import { buildBlankApp } from './bench-support/blank-app';
import { median } from './bench-support/seed-books';

const ROUNDS = Number(process.env['LAMPLIGHT_BENCH_ROUNDS'] ?? 3);
const CHROMIUM = process.env['CHROME_BIN'] ?? '/usr/bin/chromium';
const CATEGORIES = ['performance', 'accessibility', 'best-practices', 'seo'] as const;
const WHERE = process.env['LAMPLIGHT_BENCH_WHERE'] === '1';
const ONLY = process.env['LAMPLIGHT_BENCH_PAGES']
  ?.split(',')
  .flatMap((name) => (name.trim().toLowerCase() === 'signed-in' ? ['today', 'library'] : [name.trim().toLowerCase()]));
const BASELINE_DIR = process.env['LAMPLIGHT_BENCH_BASELINE'];
const LHR_DIR = process.env['LAMPLIGHT_BENCH_JSON'];
/** Whether a page (a baseline's by its own name) is one the run asked for. */
const wanted = (name: string) => !ONLY || ONLY.includes(name.replace(' (baseline)', '').toLowerCase());

interface Run {
  scores: Record<string, number>;
  lcp: number;
  tbt: number;
  fcp: number;
  bytes: number;
  /** The scripts with the most main-thread time, most first (when WHERE). */
  where: string[];
}

interface BootupItem {
  url: string;
  total: number;
  scripting: number;
}

/** A row of Lighthouse's long-tasks audit. */
interface LongTaskItem {
  url: string;
  duration: number;
  startTime: number;
}

/** A row of Lighthouse's network-requests audit (the fields used here). */
interface NetworkItem {
  url: string;
  transferSize: number;
  priority?: string;
}

const shortUrl = (url: string) => url.replace(/^https?:\/\/[^/]+\//, '/');

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

let saved = 0;

async function audit(url: string, port: number, keepStorage: boolean): Promise<Run> {
  // Lighthouse is ECMAScript-module only; this file compiles to CommonJS.
  const { default: lighthouse } = await import('lighthouse');
  const result = await lighthouse(url, { port, logLevel: 'error', onlyCategories: [...CATEGORIES], disableStorageReset: keepStorage });
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const { lhr } = result;
  if (lhr.runtimeError) throw new Error(`Lighthouse on ${url}: ${lhr.runtimeError.message}`);
  if (LHR_DIR) {
    mkdirSync(LHR_DIR, { recursive: true });
    writeFileSync(
      path.join(LHR_DIR, `${String(++saved).padStart(2, '0')}-${new URL(url).port}${new URL(url).pathname.replaceAll('/', '-')}.json`),
      JSON.stringify(lhr),
    );
    writeFileSync(path.join(LHR_DIR, `${String(saved).padStart(2, '0')}-trace.json`), JSON.stringify(result.artifacts.Trace));
  }
  const numeric = (id: string) => lhr.audits[id]?.numericValue ?? NaN;
  return {
    scores: Object.fromEntries(CATEGORIES.map((id) => [id, Math.round((lhr.categories[id]?.score ?? NaN) * 100)])),
    lcp: numeric('largest-contentful-paint'),
    tbt: numeric('total-blocking-time'),
    fcp: numeric('first-contentful-paint'),
    bytes: numeric('total-byte-weight'),
    where: [
      ...((lhr.audits['bootup-time']?.details as { items?: BootupItem[] } | undefined)?.items ?? [])
        .slice(0, 6)
        .map((item) => `${shortUrl(item.url)} ${Math.round(item.total)} ms (script ${Math.round(item.scripting)})`),
      ...((lhr.audits['long-tasks']?.details as { items?: LongTaskItem[] } | undefined)?.items ?? [])
        .slice(0, 6)
        .map((item) => `long task ${Math.round(item.duration)} ms at ${Math.round(item.startTime)} ms: ${shortUrl(item.url)}`),
      ...((lhr.audits['network-requests']?.details as { items?: NetworkItem[] } | undefined)?.items ?? [])
        .sort((a, b) => b.transferSize - a.transferSize)
        .slice(0, 8)
        .map((item) => `${shortUrl(item.url)} ${(item.transferSize / 1024).toFixed(1)} KiB, ${item.priority ?? '?'} priority`),
    ],
  };
}

/** One audit, tried again once: Lighthouse sometimes loses a trace on a busy machine. */
async function attempt(url: string, port: number, keepStorage: boolean): Promise<Run | null> {
  for (let tries = 1; ; tries++) {
    try {
      return await audit(url, port, keepStorage);
    } catch (error) {
      console.log(`  (${url}: ${(error as Error).message}${tries < 2 ? '; trying again' : '; skipped'})`);
      if (tries >= 2) return null;
    }
  }
}

function line(name: string, run: Run): string {
  const scores = CATEGORIES.map((id) => `${id} ${String(run.scores[id]).padStart(3)}`).join('  ');
  return `  ${name.padEnd(20)} ${scores}   FCP ${(run.fcp / 1000).toFixed(1)} s  LCP ${(run.lcp / 1000).toFixed(1)} s  TBT ${Math.round(run.tbt)} ms  ${Math.round(run.bytes / 1024)} KiB`;
}

async function main(): Promise<void> {
  const blankDir = wanted('blank app') ? buildBlankApp() : null;
  const blank = express()
    .use(express.static(path.join(blankDir ?? tmpdir(), 'dist/browser')))
    .listen(0, '127.0.0.1');
  await new Promise((resolve) => blank.once('listening', resolve));
  const blankUrl = `http://127.0.0.1:${(blank.address() as AddressInfo).port}/`;
  const dataSource = await testDataSource();
  await seedDemo(dataSource, 4);
  const server = await startTestServer({ withApp: true });
  const baseline = BASELINE_DIR ? await startTestServer({ withApp: true, env: { LAMPLIGHT_APP_DIR: path.resolve(BASELINE_DIR) } }) : null;
  const port = await freePort();
  const profileDir = mkdtempSync(path.join(tmpdir(), 'lamplight-lighthouse-'));
  const profile = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', `--remote-debugging-port=${port}`],
  });
  try {
    const builds = [{ label: '', baseUrl: server.baseUrl }, ...(baseline ? [{ label: ' (baseline)', baseUrl: baseline.baseUrl }] : [])];
    const pages: { name: string; url: string; signedIn: boolean }[] = [
      { name: 'blank app', url: blankUrl, signedIn: false },
      ...builds.map(({ label, baseUrl }) => ({ name: `sign-in${label}`, url: `${baseUrl}/sign-in`, signedIn: false })),
      ...builds.flatMap(({ label, baseUrl }) => [
        { name: `Today${label}`, url: `${baseUrl}/today`, signedIn: true },
        { name: `Library${label}`, url: `${baseUrl}/library`, signedIn: true },
      ]),
    ].filter((page) => wanted(page.name));
    const runs = new Map<string, Run[]>(pages.map((page) => [page.name, []]));
    // Signed-out pages first, then the demo reader signs in once for the rest.
    for (const signedIn of [false, true]) {
      if (!pages.some((page) => page.signedIn === signedIn)) continue;
      if (signedIn) {
        const reader = DEMO_ACCOUNTS.find((account) => account.withLibrary)!;
        for (const { baseUrl } of builds) {
          const page = await profile.newPage();
          await signInThroughUi(page, baseUrl, reader.email, reader.password);
          // The first sync brings the demo library into IndexedDB; then it is a returning reader.
          await page
            .getByText(/^Synced/)
            .first()
            .waitFor({ timeout: 120_000 })
            .catch(() => console.log('  (the first sync did not say "Synced" within 120 s; measuring anyway)'));
          await page.close();
        }
      }
      const group = pages.filter((page) => page.signedIn === signedIn || page.name === 'blank app');
      for (let round = 0; round < ROUNDS; round++) {
        const order = round % 2 === 0 ? group : [...group].reverse();
        for (const page of order) {
          if (signedIn && page.name === 'blank app' && round > 0) continue; // enough blank rounds
          const run = await attempt(page.url, port, page.signedIn);
          if (run) runs.get(page.name)!.push(run);
          if (run) console.log(`${line(page.name, run)}   (round ${round + 1})`);
          if (run && WHERE) for (const where of run.where) console.log(`      ${where}`);
        }
      }
    }
    console.log('bench-lighthouse: Lighthouse 12 mobile (simulated slow 4G, 4× CPU), the run with the median performance score of each page');
    for (const page of pages) {
      const all = runs.get(page.name)!;
      if (all.length === 0) {
        console.log(`  ${page.name.padEnd(20)} no run finished`);
        continue;
      }
      const middle = median(all.map((run) => run.scores['performance']!));
      const run = all.find((candidate) => candidate.scores['performance'] === middle) ?? all[0]!;
      console.log(`${line(page.name, run)}   (performance in ${all.length} runs: ${all.map((r) => r.scores['performance']).join(', ')})`);
    }
  } finally {
    await profile.close();
    await server.close();
    await baseline?.close();
    await dataSource.destroy();
    blank.close();
    if (blankDir) rmSync(blankDir, { recursive: true, force: true });
    rmSync(profileDir, { recursive: true, force: true });
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
