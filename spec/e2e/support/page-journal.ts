import type { Browser, BrowserContext, Page } from 'playwright-core';

/**
 * What the app's pages did during a spec (navigations, API answers of 400 and up, failed requests,
 * console errors, uncaught errors), printed only when the spec fails: a flaky failure on CI is
 * then explained by its own run rather than guessed at afterwards.
 */
const lines: string[] = [];
let startedAt = Date.now();
const MAX_LINES = 200;

function note(tab: string, text: string): void {
  if (lines.length >= MAX_LINES) lines.shift();
  lines.push(`  +${((Date.now() - startedAt) / 1000).toFixed(1)} s ${tab}: ${text}`);
}

let tabs = 0;
function watchPage(page: Page): void {
  const tab = `tab ${++tabs}`;
  page.on('framenavigated', (frame) => frame === page.mainFrame() && note(tab, `at ${frame.url()}`));
  page.on('console', (message) => message.type() === 'error' && note(tab, `console error ${message.text()}`));
  page.on('pageerror', (error) => note(tab, `uncaught ${error.message}`));
  page.on('crash', () => note(tab, 'crashed'));
  page.on('requestfailed', (request) => note(tab, `failed ${request.method()} ${request.url()} (${request.failure()?.errorText ?? '?'})`));
  page.on('response', (response) => response.status() >= 400 && note(tab, `${response.status()} ${response.request().method()} ${response.url()}`));
}

function watchContext(context: BrowserContext): BrowserContext {
  context.on('page', watchPage);
  return context;
}

/** Makes every context of `browser` (and so every page) report to the journal. */
export function journalPagesOf(browser: Browser): Browser {
  const newContext = browser.newContext.bind(browser);
  browser.newContext = async (...args) => watchContext(await newContext(...args));
  return browser;
}

if (typeof jasmine !== 'undefined') {
  jasmine.getEnv().addReporter({
    specStarted: () => {
      lines.length = 0;
      tabs = 0;
      startedAt = Date.now();
    },
    specDone: (result) => {
      if (result.status !== 'failed' || lines.length === 0) return;
      console.log(`\nWhat the pages did in “${result.fullName}”:\n${lines.join('\n')}\n`);
    },
  });
}
