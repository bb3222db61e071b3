import type { Browser } from 'playwright-core';

import { startTestServer, type RunningServer } from '../../support/test-server';
import { launchBrowser } from './browser';

/** The real server serving the production build, and Debian's Chromium, for one e2e suite. */
export interface Harness {
  readonly server: RunningServer;
  readonly browser: Browser;
}

/** Starts both before the suite and stops both after it; read them inside specs. */
export function useServerAndBrowser(): Harness {
  const harness = {} as { server: RunningServer; browser: Browser };
  beforeAll(async () => {
    harness.server = await startTestServer({ withApp: true });
    harness.browser = await launchBrowser();
  });
  afterAll(async () => {
    await harness.browser?.close();
    await harness.server?.close();
  });
  return harness;
}
