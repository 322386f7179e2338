import { type Browser } from 'playwright-core';

import { launchBrowser } from './browser';
import { type RunningServer, startServer } from './server';

/**
 * The server and the browser a test file drives: started before its tests and stopped after.
 * Read `server` and `browser` inside the tests, once they have started.
 */
export function withServerAndBrowser() {
  const running = {} as { server: RunningServer; browser: Browser };
  beforeAll(async () => {
    running.server = await startServer();
    running.browser = await launchBrowser();
  });
  afterAll(async () => {
    await running.browser?.close();
    await running.server?.stop();
  });
  return running;
}
