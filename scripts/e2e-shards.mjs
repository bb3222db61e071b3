// Splits the browser e2e files into shards of about equal length, for scripts/test.mjs to run side
// by side. Most of an e2e run is waiting (page loads, sync rounds, timeouts of offline steps), so
// two shards on two cores take little more than half the time of one.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

import { root } from './lib.mjs';

/**
 * Seconds each file took in a whole run (`LAMPLIGHT_TIMINGS_FILE` of spec/support/timing-reporter.ts;
 * only the proportions matter). A file not listed yet counts as the median.
 */
const DURATIONS = path.join(root, 'spec', 'e2e', 'durations.json');

/** The compiled e2e files (dist/node/spec/e2e/NAME.e2e.js) in `count` shards, longest first. */
export function e2eShards(count) {
  const names = readdirSync(path.join(root, 'spec', 'e2e'))
    .filter((name) => name.endsWith('.e2e.ts'))
    .map((name) => name.replace(/\.ts$/, '.js'));
  const measured = JSON.parse(readFileSync(DURATIONS, 'utf8'));
  const known = names.map((name) => measured[name]).filter((seconds) => typeof seconds === 'number');
  const median = known.sort((a, b) => a - b)[Math.floor(known.length / 2)] ?? 1;
  const shards = Array.from({ length: Math.max(1, count) }, () => ({ seconds: 0, files: [] }));
  // Longest first, each to the shard with the least so far (LPT): within 4/3 of the best split.
  for (const name of [...names].sort((a, b) => (measured[b] ?? median) - (measured[a] ?? median) || a.localeCompare(b))) {
    const shortest = shards.reduce((best, shard) => (shard.seconds < best.seconds ? shard : best));
    shortest.seconds += measured[name] ?? median;
    shortest.files.push(path.join('dist', 'node', 'spec', 'e2e', name));
  }
  return shards.filter((shard) => shard.files.length > 0).map((shard) => shard.files);
}
