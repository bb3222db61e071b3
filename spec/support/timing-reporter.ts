import { writeFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Loaded as a Jasmine helper: measures each spec file (its top-level suites, so beforeAll and
 * afterAll count) and each spec, and prints the slowest at the end. With LAMPLIGHT_TIMINGS_FILE
 * it also writes `{ files: { "name.e2e.js": seconds }, specs: { … } }`. Only measures: it never
 * changes what passes.
 */
const SHOWN = 12;
const seconds = new Map<string, number>();
const specSeconds = new Map<string, number>();
let depth = 0;

const slowestFirst = (map: Map<string, number>) => [...map].sort((a, b) => b[1] - a[1]);
const rounded = (entries: [string, number][]) => Object.fromEntries(entries.map(([name, s]) => [name, Math.round(s * 10) / 10]));

jasmine.getEnv().addReporter({
  suiteStarted() {
    depth++;
  },
  specDone(result) {
    specSeconds.set(result.fullName, (result.duration ?? 0) / 1000);
  },
  suiteDone(result) {
    depth--;
    if (depth !== 0 || !result.filename) return;
    const file = path.basename(result.filename);
    seconds.set(file, (seconds.get(file) ?? 0) + (result.duration ?? 0) / 1000);
  },
  jasmineDone() {
    const files = slowestFirst(seconds);
    const specs = slowestFirst(specSeconds);
    console.log(`\nSlowest spec files (of ${files.length}):`);
    for (const [file, s] of files.slice(0, SHOWN)) console.log(`  ${s.toFixed(1).padStart(6)} s  ${file}`);
    console.log(`Slowest specs (of ${specs.length}):`);
    for (const [name, s] of specs.slice(0, SHOWN)) console.log(`  ${s.toFixed(1).padStart(6)} s  ${name.slice(0, 140)}`);
    const out = process.env['LAMPLIGHT_TIMINGS_FILE'];
    if (out) writeFileSync(out, JSON.stringify({ files: rounded(files), specs: rounded(specs) }, null, 2));
  },
});
