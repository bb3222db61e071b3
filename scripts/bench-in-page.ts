/**
 * Helpers for benchmarks that run the app in Chromium: the page's JavaScript heap sampled over
 * a step (Chrome DevTools Protocol, `Performance.getMetrics`) and main-thread long tasks counted
 * (the Long Tasks API), so a step reports time, peak memory and stalls together.
 */
import { performance } from 'node:perf_hooks';

import type { Page } from 'playwright-core';

export interface StepMeasure {
  readonly ms: number;
  readonly peakHeapMb: number;
  /** Main-thread tasks over 200 ms during the step. */
  readonly longTasks: number;
  readonly longestTaskMs: number;
}

/** Starts recording long tasks in the page (call once per page, after it has loaded). */
export async function watchLongTasks(page: Page): Promise<void> {
  await page.evaluate(() => {
    const tasks: number[] = [];
    (window as unknown as { benchLongTasks: number[] }).benchLongTasks = tasks;
    new PerformanceObserver((list) => list.getEntries().forEach((entry) => tasks.push(entry.duration))).observe({ type: 'longtask', buffered: false });
  });
}

/**
 * Runs a step, sampling the page's heap every 25 ms; returns its time, peak heap and long tasks.
 * With `LAMPLIGHT_BENCH_PROFILE` set, also prints the step's busiest functions (a CPU profile).
 */
export async function measureStep(page: Page, step: () => Promise<unknown>): Promise<StepMeasure> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Performance.enable');
  const profiling = Boolean(process.env['LAMPLIGHT_BENCH_PROFILE']);
  if (profiling) {
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.start');
  }
  await page.evaluate(() => ((window as unknown as { benchLongTasks: number[] }).benchLongTasks.length = 0));
  let peak = 0;
  let sampling = true;
  const sampler = (async () => {
    while (sampling) {
      const { metrics } = await cdp.send('Performance.getMetrics');
      peak = Math.max(peak, metrics.find((metric) => metric.name === 'JSHeapUsedSize')?.value ?? 0);
      await new Promise((resolve) => setTimeout(resolve, 25));
    }
  })().catch(() => undefined); // a failed step closes the page: its own error is the one to show
  const start = performance.now();
  try {
    await step();
  } finally {
    sampling = false;
    await sampler;
  }
  const ms = performance.now() - start;
  if (profiling) printBusiest((await cdp.send('Profiler.stop')).profile);
  await cdp.detach();
  const tasks = await page.evaluate(() => (window as unknown as { benchLongTasks: number[] }).benchLongTasks.filter((duration) => duration > 200));
  return { ms, peakHeapMb: peak / 1024 / 1024, longTasks: tasks.length, longestTaskMs: Math.max(0, ...tasks) };
}

export function printStep(name: string, { ms, peakHeapMb, longTasks, longestTaskMs }: StepMeasure): void {
  console.log(
    `  ${name.padEnd(20)} ${ms.toFixed(0).padStart(7)} ms   peak heap ${peakHeapMb.toFixed(1).padStart(6)} MB   long tasks > 200 ms: ${longTasks}${longTasks ? ` (longest ${longestTaskMs.toFixed(0)} ms)` : ''}`,
  );
}

/** The parts of a DevTools CPU profile read here (`Profiler.stop`). */
interface CpuProfile {
  readonly nodes: readonly {
    readonly id: number;
    readonly callFrame: { readonly functionName: string; readonly url: string; readonly lineNumber: number; readonly columnNumber: number };
  }[];
  readonly samples?: readonly number[];
  readonly timeDeltas?: readonly number[];
}

/**
 * What a step spent its main thread on: the 10 functions with the most self time over the step,
 * then, for each of the 5 longest stretches of work without an idle sample (over 150 ms: a long
 * task, give or take), its busiest 6.
 */
function printBusiest(profile: CpuProfile): void {
  const byNode = new Map(profile.nodes.map((node) => [node.id, node.callFrame]));
  const samples = (profile.samples ?? []).map((id, n) => {
    const frame = byNode.get(id)!;
    return {
      name: `${frame.functionName || '(anonymous)'} ${frame.url.split('/').pop()}:${frame.lineNumber}:${frame.columnNumber}`,
      ms: (profile.timeDeltas?.[n] ?? 0) / 1000,
    };
  });
  const top = (some: typeof samples, count: number) => {
    const self = new Map<string, number>();
    for (const { name, ms } of some) self.set(name, (self.get(name) ?? 0) + ms);
    return [...self].sort((a, b) => b[1] - a[1]).slice(0, count);
  };
  for (const [name, ms] of top(samples, 10)) console.log(`    ${ms.toFixed(0).padStart(7)} ms  ${name}`);
  const stretches: (typeof samples)[] = [[]];
  for (const sample of samples) {
    if (sample.name.startsWith('(idle)')) stretches.push([]);
    else stretches.at(-1)!.push(sample);
  }
  const timed = stretches.map((stretch) => ({ stretch, ms: stretch.reduce((sum, { ms }) => sum + ms, 0) })).filter(({ ms }) => ms > 150);
  for (const { stretch, ms } of timed.sort((a, b) => b.ms - a.ms).slice(0, 5)) {
    console.log(
      `    a stretch of ${ms.toFixed(0)} ms: ${top(stretch, 6)
        .map(([name, self]) => `${name} ${self.toFixed(0)}`)
        .join(', ')}`,
    );
  }
}

const WORDS = ['Lantern', 'Orchard', 'River', 'Salt', 'Harbour', 'Moth', 'Copper', 'Winter', 'Glass', 'Fen', 'Heron', 'Ledger'];

/** An invented title and author for row `n`, the same in every run. */
export function inventedBook(n: number): { title: string; author: string } {
  const pick = (k: number) => WORDS[(n * k + Math.floor(n / WORDS.length)) % WORDS.length]!;
  return { title: `The ${pick(7)} of ${pick(11)} ${n}`, author: `${pick(3)} ${pick(5)}son` };
}
