import { writeFileSync } from 'node:fs';

/**
 * Loaded as a Jasmine helper: counts finished specs and, when scripts/test.mjs asks through
 * LAMPLIGHT_RESULTS_FILE, writes `{ passed, failed }` for the overall summary line.
 */
let passed = 0;
let failed = 0;

jasmine.getEnv().addReporter({
  specDone(result) {
    if (result.status === 'passed') passed++;
    else if (result.status === 'failed') failed++;
  },
  suiteDone(result) {
    // An error in beforeAll/afterAll fails the suite without failing a spec: count it.
    if (result.status === 'failed') failed++;
  },
  jasmineDone(result) {
    if (result.overallStatus === 'failed' && failed === 0) failed = 1;
    console.log(`${passed} passed, ${failed} failed`);
    const file = process.env['LAMPLIGHT_RESULTS_FILE'];
    if (file) writeFileSync(file, JSON.stringify({ passed, failed }));
  },
});
