import { writeFileSync } from 'node:fs';

/**
 * Loaded as a Jasmine helper: counts finished specs and, when scripts/test.mjs asks through
 * LAMPLIGHT_RESULTS_FILE, writes `{ passed, failed }` for the overall summary line. A spec that
 * did not run (`xit`/`pending`, or `excluded` because another one is focused with `fit`) counts
 * as failed, so a stray `x` or `f` cannot turn part of the suite off unnoticed.
 */
let passed = 0;
let failed = 0;
// Named again in the overall summary, so the tail of a CI log says what failed.
const failures: string[] = [];
const filtering = process.argv.some((arg) => arg.startsWith('--filter'));

jasmine.getEnv().addReporter({
  specDone(result) {
    if (result.status === 'passed') {
      passed++;
      return;
    }
    // `--filter` on the command line leaves the other specs out on purpose (a developer's short run).
    if (result.status === 'excluded' && filtering) return;
    failed++;
    failures.push(`${result.fullName}: ${result.status === 'failed' ? firstLine(result.failedExpectations[0]?.message) : result.status}`);
    if (result.status !== 'failed') console.log(`\n  ${result.status.toUpperCase()} (counted as failed)  ${result.fullName}`);
  },
  suiteDone(result) {
    // An error in beforeAll/afterAll fails the suite without failing a spec: count it.
    if (result.status === 'failed') {
      failed++;
      failures.push(`${result.fullName} (before/after all): ${firstLine(result.failedExpectations[0]?.message)}`);
    }
  },
  jasmineDone(result) {
    // 'incomplete' is what Jasmine says when a `fit`/`fdescribe` narrowed the run.
    if (result.overallStatus !== 'passed' && failed === 0) failed = 1;
    console.log(`${passed} passed, ${failed} failed`);
    const file = process.env['LAMPLIGHT_RESULTS_FILE'];
    if (file) writeFileSync(file, JSON.stringify({ passed, failed, failures }));
  },
});

/** The first line of a failure's message (the stack follows it). */
function firstLine(text: string | undefined): string {
  return (text ?? '').split('\n')[0].slice(0, 300);
}
