// `npm run bench` (visit): the built client and the real server on a fresh demo data folder, opened
// cold in Chromium under mobile test conditions set through the DevTools protocol: 150 ms round
// trip, 1.6 Mbit/s down, 750 kbit/s up, CPU slowed 4×, 412 px wide (the conditions the issue names;
// common practice for "slow 4G" lab runs, no published source). For the public landing page and the
// staff sign-in page: JavaScript transferred (bytes on the wire, compressed when the server compresses),
// all bytes transferred, and the largest contentful paint.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { execSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { startServer } from './http-bench.js';

const PORT = Number(process.env.BENCH_PORT ?? 3291);
// Each page with what shows it is drawn: under a slowed CPU the network falls quiet while the
// scripts run, so "network idle" alone would stop before the page has asked for its data
const PAGES = [
  { url: '/visit', ready: '#visit-title' },
  { url: '/sign-in', ready: 'input[type=password]' },
];
const RUNS = Number(process.env.BENCH_RUNS ?? 3);

if (!existsSync('dist/index.html')) execSync('npx vite build', { stdio: 'inherit' });
const dataDir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-visit-'));
// The demo seed: the landing page shows the ship's published introduction, closures and appeals
const server = await startServer(dataDir, PORT, { SEED_ON_START: 'true', BCRYPT_COST: '4', STRIPE_FAKE_PORT: '0' });
const browser = await chromium.launch({ executablePath: process.env.CHROMIUM ?? '/usr/bin/chromium' });

type Figures = { js: number; total: number; requests: number; lcp: number };

async function measure(url: string, ready: string): Promise<Figures> {
  // A new context each time: a cold cache, like a visitor's first scan of a QR code
  const context = await browser.newContext({ viewport: { width: 412, height: 823 }, deviceScaleFactor: 2.625, isMobile: true, hasTouch: true });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 150, downloadThroughput: (1.6 * 1e6) / 8, uploadThroughput: (750 * 1e3) / 8 });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
  const types = new Map<string, string>();
  let js = 0;
  let total = 0;
  let requests = 0;
  cdp.on('Network.responseReceived', (e) => types.set(e.requestId, e.type));
  cdp.on('Network.loadingFinished', (e) => {
    requests += 1;
    total += e.encodedDataLength;
    if (types.get(e.requestId) === 'Script') js += e.encodedDataLength;
  });
  // As text: this script is typed for Node, the page's code runs in the browser
  await page.addInitScript({
    content: `window.__lcp = 0; new PerformanceObserver((list) => { for (const e of list.getEntries()) window.__lcp = e.startTime; }).observe({ type: 'largest-contentful-paint', buffered: true });`,
  });
  await page.goto(`http://127.0.0.1:${PORT}${url}`, { waitUntil: 'load', timeout: 120_000 });
  await page.locator(ready).first().waitFor({ timeout: 120_000 });
  await page.evaluate('document.fonts.ready.then(() => undefined)');
  await page.waitForLoadState('networkidle', { timeout: 120_000 });
  // LCP is final once the page has been idle; a short wait lets the last entry land
  await page.waitForTimeout(1000);
  const lcp = Number(await page.evaluate('window.__lcp'));
  await context.close();
  return { js, total, requests, lcp };
}

const kB = (n: number) => `${(n / 1000).toFixed(1)} kB`;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

try {
  console.log(`visit: ${RUNS} cold loads each, 150 ms RTT, 1.6 Mbit/s down, 750 kbit/s up, CPU 4× slower, 412 px wide`);
  for (const { url, ready } of PAGES) {
    const runs: Figures[] = [];
    for (let i = 0; i < RUNS; i++) runs.push(await measure(url, ready));
    const last = runs[runs.length - 1]!;
    console.log(
      `${url.padEnd(9)} JavaScript ${kB(last.js)}, all ${kB(last.total)} in ${last.requests} requests, ` +
        `LCP median ${median(runs.map((r) => r.lcp)).toFixed(0)} ms (runs: ${runs.map((r) => r.lcp.toFixed(0)).join(', ')} ms)`,
    );
  }
} finally {
  await browser.close();
  server.kill();
  rmSync(dataDir, { recursive: true, force: true });
}
