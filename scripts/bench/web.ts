/**
 * First load of the sign-in page in Debian's Chromium (playwright-core), from the bench server
 * serving dist/ as production does:
 * - signInKb: bytes on the wire (as Chromium counts them: compressed, headers included) of the
 *   HTML, JavaScript, CSS and fonts the page loads until the network is quiet, cold cache;
 * - signInButtonMs: navigation start to a visible "Sign in" button, cold cache, with the CPU
 *   slowed 4× and the network held to 10 Mbit/s each way and 20 ms latency (Chrome DevTools
 *   Protocol); the median of three loads. Informational on a shared machine.
 * Needs the web build (built here when its sources changed) and a chromium binary.
 */
import { execSync } from 'node:child_process';
import { chromium, type Browser, type BrowserContext } from 'playwright-core';
import { buildWebIfChanged } from '../lib/web-build';
import type { BenchEnv } from './bench-env';

export interface WebFigures {
  signInKb: number;
  /** The same bytes by kind (document, script, stylesheet, font, other). */
  byKindKb: Record<string, number>;
  requests: number;
  signInButtonMs: number;
  signInButtonRunsMs: number[];
}

const COUNTED = new Set(['Document', 'Script', 'Stylesheet', 'Font']);
const PHONE = { width: 390, height: 844 };

function chromiumPath(): string | null {
  try {
    return execSync('command -v chromium || command -v chromium-browser', { encoding: 'utf8', shell: '/bin/sh' }).trim() || null;
  } catch {
    return null;
  }
}

async function launch(executablePath: string): Promise<Browser> {
  return chromium.launch({
    executablePath,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
}

async function signInBytes(context: BrowserContext, url: string): Promise<{ byKind: Record<string, number>; requests: number }> {
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  const kinds = new Map<string, string>();
  const byKind: Record<string, number> = {};
  let requests = 0;
  cdp.on('Network.responseReceived', (e: { requestId: string; type: string }) => kinds.set(e.requestId, e.type));
  cdp.on('Network.loadingFinished', (e: { requestId: string; encodedDataLength: number }) => {
    const type = kinds.get(e.requestId) ?? 'Other';
    const kind = COUNTED.has(type) ? type.toLowerCase() : 'other';
    byKind[kind] = (byKind[kind] ?? 0) + e.encodedDataLength / 1024;
    requests += 1;
  });
  await page.goto(`${url}/sign-in`, { waitUntil: 'networkidle' });
  await page.getByRole('button', { name: 'Sign in' }).waitFor({ state: 'visible', timeout: 60_000 });
  await page.waitForLoadState('networkidle');
  await page.close();
  return { byKind, requests };
}

async function timeToButton(context: BrowserContext, url: string): Promise<number> {
  const page = await context.newPage();
  await page.setViewportSize(PHONE);
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  const bytesPerS = (10 * 1_000_000) / 8;
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: bytesPerS, uploadThroughput: bytesPerS });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
  const started = performance.now();
  await page.goto(`${url}/sign-in`, { waitUntil: 'commit' });
  await page.getByRole('button', { name: 'Sign in' }).waitFor({ state: 'visible', timeout: 120_000 });
  const ms = performance.now() - started;
  await page.close();
  return ms;
}

/** Null when no chromium is installed (the figures are then skipped, not failed). */
export async function benchWeb(env: BenchEnv, log: (line: string) => void = () => {}): Promise<WebFigures | null> {
  const executable = chromiumPath();
  if (!executable) {
    log('web      skipped: no chromium found (apt-get install chromium)');
    return null;
  }
  buildWebIfChanged(log, undefined, false, true);
  const server = await env.startServer({ workers: 1, web: true });
  const browser = await launch(executable);
  try {
    const first = await browser.newContext({ viewport: PHONE });
    const { byKind, requests } = await signInBytes(first, server.url);
    await first.close();
    const runs: number[] = [];
    for (let i = 0; i < 3; i++) {
      const context = await browser.newContext({ viewport: PHONE });
      runs.push(await timeToButton(context, server.url));
      await context.close();
    }
    const sorted = [...runs].sort((a, b) => a - b);
    const counted = Object.entries(byKind).filter(([k]) => k !== 'other').reduce((sum, [, kb]) => sum + kb, 0);
    return { signInKb: counted, byKindKb: byKind, requests, signInButtonMs: sorted[1], signInButtonRunsMs: runs };
  } finally {
    await browser.close();
    await server.stop();
  }
}
