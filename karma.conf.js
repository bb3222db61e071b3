// Karma for the unit tests of src/ and shared/, in Debian's Chromium (CHROME_BIN=/usr/bin/chromium).
// Used through the @angular/build:karma builder (`ng test`).
const fs = require('node:fs');

/**
 * Prints `N passed, N failed` at the end and, when asked, writes the counts for scripts/test.mjs.
 * A skipped spec (`xit`, `xdescribe`, or one left out because another is focused with `fit`)
 * counts as failed, so a stray `x` or `f` cannot turn part of the suite off unnoticed.
 */
function SummaryReporter(baseReporterDecorator) {
  baseReporterDecorator(this);
  let passed = 0;
  let failed = 0;
  // Named again in the overall summary, so the tail of a CI log says what failed.
  const failures = [];
  this.onSpecComplete = (_browser, result) => {
    const outcome = result.skipped ? 'SKIPPED (counted as failed)' : result.success ? 'ok' : 'FAIL';
    if (process.env.KARMA_VERBOSE || result.skipped) this.write(`\n  ${outcome}  ${result.fullName}\n`);
    if (result.success && !result.skipped) passed++;
    else {
      failed++;
      failures.push(`${result.fullName}${result.skipped ? ' (skipped)' : `: ${firstLine(result.log[0])}`}`);
    }
  };
  this.onRunComplete = (_browsers, results) => {
    if (results.error || results.disconnected) failed = Math.max(failed, 1);
    this.write(`${passed} passed, ${failed} failed\n`);
    const file = process.env.LAMPLIGHT_RESULTS_FILE;
    if (file) fs.writeFileSync(file, JSON.stringify({ passed, failed, failures }));
  };
}
/** The first line of a failure's message (the stack follows it). */
function firstLine(text) {
  return String(text ?? '')
    .split('\n')[0]
    .slice(0, 300);
}
SummaryReporter.$inject = ['baseReporterDecorator'];

module.exports = function (config) {
  config.set({
    basePath: '',
    frameworks: ['jasmine'],
    plugins: [require('karma-jasmine'), require('karma-chrome-launcher'), { 'reporter:summary': ['type', SummaryReporter] }],
    client: {
      clearContext: true,
      // timeoutInterval: a spec may wait up to 10 s for the CPU on a busy machine (core/testing/patience.ts).
      jasmine: { random: true, seed: process.env.KARMA_SEED, failSpecWithNoExpectations: true, timeoutInterval: 30000 },
    },
    reporters: ['dots', 'summary'],
    browsers: ['ChromiumHeadlessLocal'],
    customLaunchers: {
      ChromiumHeadlessLocal: {
        base: 'ChromeHeadless',
        // --no-sandbox: the test machines run as root. The rest keep Chromium from calling out
        // to the network, which is closed here.
        flags: [
          '--no-sandbox',
          '--disable-gpu',
          '--disable-quic',
          '--disable-background-networking',
          '--disable-component-update',
          '--disable-sync',
          '--no-first-run',
        ],
      },
    },
    browserNoActivityTimeout: 120000,
    // A shared, busy machine can starve the browser of CPU for a while: wait for it rather than fail the run.
    browserDisconnectTimeout: 60000,
    browserDisconnectTolerance: 2,
    pingTimeout: 120000,
    captureTimeout: 120000,
    singleRun: true,
    restartOnFileChange: false,
  });
};
