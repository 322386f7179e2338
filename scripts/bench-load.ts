// First-load benchmark: builds the web app, starts the real server, and opens /sign-in in Chromium
// at phone size with an empty cache, on an emulated "fast 3G" connection and on plain loopback.
// Reports the bytes transferred and the time until the sign-in form can be used (the e-mail field
// visible and enabled, and the page's fonts loaded), median of five runs.
// Targets on the emulated connection: at most 450 KB and 3.5 s.
//   npm run bench:load                 build, then measure
//   npm run bench:load -- --no-build   measure the dist/ already built
//   npm run bench:load -- --list       also list what the first load fetched
import { execSync } from 'node:child_process';

import { type Browser } from 'playwright-core';

import { launchBrowser, viewports } from '../tests/e2e/helpers/browser';
import { startServer } from '../tests/e2e/helpers/server';

const RUNS = 5;
const BYTES_TARGET = 450 * 1000;
const USABLE_TARGET_MS = 3500;

/** Chrome DevTools' "fast 3G" profile: throughput in bytes per second, latency in ms. */
const fast3g = {
  offline: false,
  latency: 150,
  downloadThroughput: (1.6 * 1000 * 1000) / 8,
  uploadThroughput: (750 * 1000) / 8,
};

type Fetched = { url: string; bytes: number };
type Sample = { bytes: number; usableMs: number; requests: number; fetched: Fetched[] };

async function loadSignIn(browser: Browser, url: string, throttle: boolean): Promise<Sample> {
  const context = await browser.newContext({ viewport: viewports.phone });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(e.message));
  page.on('console', (m) => {
    // Signed out, the session check's 401 from /api/me is the answer the page expects.
    if (m.type() === 'error' && !/status of 401/.test(m.text())) problems.push(m.text());
  });
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  if (throttle) await cdp.send('Network.emulateNetworkConditions', fast3g);

  const inFlight = new Map<string, string>();
  const fetched: Fetched[] = [];
  let lastActivity = Date.now();
  cdp.on('Network.requestWillBeSent', (e) => {
    inFlight.set(e.requestId, e.request.url);
    lastActivity = Date.now();
  });
  cdp.on('Network.loadingFinished', (e) => {
    fetched.push({ url: inFlight.get(e.requestId) ?? '?', bytes: e.encodedDataLength });
    inFlight.delete(e.requestId);
    lastActivity = Date.now();
  });
  cdp.on('Network.loadingFailed', (e) => {
    inFlight.delete(e.requestId);
    lastActivity = Date.now();
  });

  await page.goto(`${url}/sign-in`, { waitUntil: 'commit' });
  // Milliseconds since navigation started, taken in the page on the first frame that qualifies.
  const usable = await page.waitForFunction(
    () => {
      const input = document.querySelector<HTMLInputElement>('[data-testid="sign-in-email"]');
      if (!input || input.disabled) return false;
      const box = input.getBoundingClientRect();
      if (box.width === 0 || box.height === 0) return false;
      if (getComputedStyle(input).visibility === 'hidden') return false;
      // The app's font faces are declared and none is still on its way.
      let loaded = 0;
      document.fonts.forEach((face) => {
        if (face.status === 'loaded') loaded += 1;
      });
      if (loaded === 0 || document.fonts.status !== 'loaded') return false;
      return performance.now();
    },
    undefined,
    { polling: 'raf', timeout: 120_000 },
  );
  const usableMs = (await usable.jsonValue()) as number;
  // Whatever the page still fetches after the form is ready counts as part of the load: wait until
  // nothing has been in flight for a second.
  while (inFlight.size > 0 || Date.now() - lastActivity < 1000) {
    await new Promise((r) => setTimeout(r, 100));
  }
  await context.close();
  if (problems.length > 0) throw new Error(`The page logged errors:\n${problems.join('\n')}`);
  const bytes = fetched.reduce((sum, f) => sum + f.bytes, 0);
  return { bytes, usableMs, requests: fetched.length, fetched };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

const kb = (bytes: number) => `${(bytes / 1000).toFixed(1)} KB`;
const sec = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

async function measure(browser: Browser, url: string, throttle: boolean) {
  const samples: Sample[] = [];
  for (let i = 0; i < RUNS; i++) samples.push(await loadSignIn(browser, url, throttle));
  if (throttle && process.argv.includes('--list')) {
    for (const f of samples[0]!.fetched) {
      console.log(`  ${kb(f.bytes).padStart(9)}  ${new URL(f.url).pathname}`);
    }
  }
  const result = {
    bytes: median(samples.map((s) => s.bytes)),
    usableMs: median(samples.map((s) => s.usableMs)),
    requests: median(samples.map((s) => s.requests)),
  };
  console.log(
    `${throttle ? 'fast 3G ' : 'loopback'}  ${kb(result.bytes)} in ${result.requests} requests, ` +
      `usable after ${sec(result.usableMs)} (runs: ${samples.map((s) => sec(s.usableMs)).join(', ')})`,
  );
  return result;
}

async function main() {
  if (!process.argv.includes('--no-build')) execSync('npm run build:web', { stdio: 'inherit' });
  const server = await startServer();
  const browser = await launchBrowser();
  try {
    console.log(`/sign-in at ${viewports.phone.width}×${viewports.phone.height}, cache disabled,`);
    console.log(`median of ${RUNS} runs:`);
    const slow = await measure(browser, server.url, true);
    await measure(browser, server.url, false);
    const verdict = (ok: boolean) => (ok ? 'PASS' : 'FAIL');
    console.log(
      `${verdict(slow.bytes <= BYTES_TARGET)}  bytes on fast 3G: ${kb(slow.bytes)} (target at most ${kb(BYTES_TARGET)})`,
    );
    console.log(
      `${verdict(slow.usableMs <= USABLE_TARGET_MS)}  usable on fast 3G: ${sec(slow.usableMs)} (target at most ${sec(USABLE_TARGET_MS)})`,
    );
  } finally {
    await browser.close();
    await server.stop();
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
