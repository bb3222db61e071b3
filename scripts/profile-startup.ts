/**
 * Where a signed-in cold start spends its main thread: the demo reader (its whole library, after
 * a first sync) opens Today (or `LAMPLIGHT_PROFILE_PATH`, waiting for `LAMPLIGHT_PROFILE_SELECTOR`)
 * in a new tab, offline, with a CPU profile (CDP `Profiler`) until the page has been quiet a while.
 * Prints when each file was asked for and arrived, then the script time before and after the
 * page shows its data, by file and by function (self and inclusive). Build the app first:
 * `NG_BUILD_DEBUG_OPTIMIZE=1 npx ng build --configuration production` keeps names readable (a
 * production build otherwise). Then `npx tsc -p sync-server/tsconfig.json` and
 * `DATABASE_URL=$(scripts/db.sh url lamplight_profile) node dist/node/scripts/profile-startup.js`
 * (`LAMPLIGHT_PROFILE_OUT=file.json` also writes the profile, for DevTools;
 * `LAMPLIGHT_PROFILE_ONLINE=1` starts online, as Lighthouse does: sync and its stream run too;
 * `LAMPLIGHT_PROFILE_SHIFTS=1` uses Lighthouse's mobile viewport and prints each layout shift,
 * with the elements that moved: what Lighthouse's CLS counts). On a busy machine a
 * sample's time includes time the page was not running: compare only figures from a quiet one.
 */
import { writeFileSync } from 'node:fs';

import type { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, seedDemo } from '../sync-server/src/demo/seed-demo';
import { launchProfile } from '../spec/e2e/support/browser';
import { signInThroughUi } from '../spec/e2e/support/reader';
import { waitForOfflineReady } from '../spec/e2e/support/service-worker';
import { testDataSource } from '../spec/support/test-database';
import { startTestServer } from '../spec/support/test-server';

interface CallFrame {
  readonly functionName: string;
  readonly url: string;
  readonly lineNumber: number;
  readonly columnNumber: number;
}
interface CpuProfile {
  readonly nodes: readonly { readonly id: number; readonly callFrame: CallFrame; readonly children?: readonly number[] }[];
  readonly samples?: readonly number[];
  readonly timeDeltas?: readonly number[];
}

const PATH = process.env['LAMPLIGHT_PROFILE_PATH'] ?? '/today';
/** What shows once the page has its data: Today's first in-progress book by default. */
const SHOWN = process.env['LAMPLIGHT_PROFILE_SELECTOR'] ?? 'll-in-progress li';

const frameName = (frame: CallFrame) => `${frame.functionName || '(anon)'} ${frame.url.split('/').pop()}:${frame.lineNumber}:${frame.columnNumber}`;

function report(profile: CpuProfile): void {
  const byId = new Map(profile.nodes.map((node) => [node.id, node]));
  const parent = new Map<number, number>();
  for (const node of profile.nodes) for (const child of node.children ?? []) parent.set(child, node.id);
  let marker = Infinity;
  let t = 0;
  const samples = (profile.samples ?? []).map((id, n) => {
    t += (profile.timeDeltas?.[n] ?? 0) / 1000;
    const frame = byId.get(id)!.callFrame;
    if (frame.functionName === 'benchBookShown' && marker === Infinity) marker = t;
    return { id, t, ms: (profile.timeDeltas?.[n + 1] ?? 0) / 1000, frame };
  });
  const busy = samples.filter(({ frame }) => !['(idle)', '(program)', '(garbage collector)'].includes(frame.functionName));
  const phases = [
    ['before the book shows', busy.filter((s) => s.t < marker)],
    ['after', busy.filter((s) => s.t >= marker)],
  ] as const;
  const sum = (some: readonly { ms: number }[]) => some.reduce((total, { ms }) => total + ms, 0);
  const gc = sum(samples.filter((s) => s.frame.functionName === '(garbage collector)' && s.t < marker));
  const program = sum(samples.filter((s) => s.frame.functionName === '(program)' && s.t < marker));
  console.log(`book shown at ${marker.toFixed(0)} ms of the profile; GC before it ${gc.toFixed(0)} ms, (program) ${program.toFixed(0)} ms`);
  for (const [name, some] of phases) {
    console.log(`\n== ${name}: ${sum(some).toFixed(0)} ms of script`);
    const by = (key: (s: (typeof some)[number]) => string, count: number) => {
      const totals = new Map<string, number>();
      for (const s of some) totals.set(key(s), (totals.get(key(s)) ?? 0) + s.ms);
      return [...totals].sort((a, b) => b[1] - a[1]).slice(0, count);
    };
    console.log('  by file (self):');
    for (const [file, ms] of by((s) => s.frame.url.split('/').pop() || '(native)', 12)) console.log(`    ${ms.toFixed(0).padStart(6)} ms  ${file}`);
    console.log('  by function (self):');
    for (const [fn, ms] of by((s) => frameName(s.frame), 25)) console.log(`    ${ms.toFixed(0).padStart(6)} ms  ${fn}`);
    // Inclusive time per function (each counted once per sample): the call paths that cost.
    const inclusive = new Map<string, number>();
    for (const s of some) {
      const seen = new Set<string>();
      for (let id: number | undefined = s.id; id !== undefined; id = parent.get(id)) {
        const name = frameName(byId.get(id)!.callFrame);
        if (!seen.has(name)) inclusive.set(name, (inclusive.get(name) ?? 0) + s.ms);
        seen.add(name);
      }
    }
    console.log('  by function (inclusive, over 15 ms):');
    for (const [fn, ms] of [...inclusive]
      .sort((a, b) => b[1] - a[1])
      .filter(([, ms]) => ms > 15)
      .slice(0, 70)) {
      console.log(`    ${ms.toFixed(0).padStart(6)} ms  ${fn}`);
    }
  }
}

const SHIFTS = process.env['LAMPLIGHT_PROFILE_SHIFTS'] === '1';

/** Records layout shifts from the start (a PerformanceObserver that sees them all, buffered). */
function recordShifts(): void {
  interface Shift extends PerformanceEntry {
    value: number;
    hadRecentInput: boolean;
    sources: { node?: Node; previousRect: DOMRectReadOnly; currentRect: DOMRectReadOnly }[];
  }
  const seen: string[] = [];
  (globalThis as unknown as { benchShifts: string[] }).benchShifts = seen;
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries() as Shift[]) {
      const moved = entry.sources.map(({ node, previousRect: a, currentRect: b }) => {
        const element = node instanceof Element ? node : node?.parentElement;
        const name = element ? `${element.tagName.toLowerCase()}${element.className ? `.${String(element.className).split(' ').join('.')}` : ''}` : '?';
        return `${name} y ${Math.round(a.y)}→${Math.round(b.y)} h ${Math.round(a.height)}→${Math.round(b.height)}`;
      });
      seen.push(`${entry.startTime.toFixed(0)} ms: ${entry.value.toFixed(3)}${entry.hadRecentInput ? ' (input)' : ''}: ${moved.join('; ')}`);
    }
  }).observe({ type: 'layout-shift', buffered: true });
}

async function profiledStart(page: Page, url: string): Promise<CpuProfile> {
  if (SHIFTS) {
    await page.setViewportSize({ width: 412, height: 823 }); // Lighthouse's mobile screen (Moto G Power)
    await page.addInitScript(recordShifts);
  }
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  await page.goto(url);
  await page.locator(SHOWN).first().waitFor({ timeout: 60_000 });
  const timings = await page.evaluate(() => ({
    shown: performance.now(),
    files: performance
      .getEntriesByType('resource')
      .map((entry) => ({ name: entry.name, start: entry.startTime, end: (entry as PerformanceResourceTiming).responseEnd })),
  }));
  // When each file was asked for and arrived: a chain of lazy chunks is a chain of round trips (through the service worker offline).
  console.log(`shown at ${timings.shown.toFixed(0)} ms after navigation; files:`);
  for (const file of timings.files) console.log(`  ${file.start.toFixed(0).padStart(6)} → ${file.end.toFixed(0).padStart(6)} ms  ${file.name.split('/').pop()}`);
  await page.evaluate(() => {
    (function benchBookShown() {
      const start = performance.now();
      while (performance.now() - start < 3);
    })();
  });
  await page.waitForTimeout(Number(process.env['LAMPLIGHT_PROFILE_AFTER_MS'] ?? 4000));
  if (SHIFTS)
    for (const shift of await page.evaluate(() => (globalThis as unknown as { benchShifts: string[] }).benchShifts)) console.log(`layout shift at ${shift}`);
  const { profile } = await cdp.send('Profiler.stop');
  return profile as CpuProfile;
}

async function main(): Promise<void> {
  const dataSource = await testDataSource();
  await seedDemo(dataSource, 4);
  const server = await startTestServer({ withApp: true });
  const context = await launchProfile();
  try {
    const reader = DEMO_ACCOUNTS.find((account) => account.withLibrary)!;
    const page = await context.newPage();
    await signInThroughUi(page, server.baseUrl, reader.email, reader.password);
    await page
      .getByText(/^Synced/)
      .first()
      .waitFor({ timeout: 120_000 });
    await waitForOfflineReady(page, server.baseUrl);
    await page.close();
    if (process.env['LAMPLIGHT_PROFILE_ONLINE'] !== '1') await context.setOffline(true);
    for (let round = 0; round < 2; round++) {
      const tab = await context.newPage();
      const profile = await profiledStart(tab, `${server.baseUrl}${PATH}`);
      await tab.close();
      if (round === 0) continue; // the first one warms the code cache
      report(profile);
      if (process.env['LAMPLIGHT_PROFILE_OUT']) writeFileSync(process.env['LAMPLIGHT_PROFILE_OUT'], JSON.stringify(profile));
    }
  } finally {
    await context.close();
    await server.close();
    await dataSource.destroy();
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
