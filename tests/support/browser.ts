/**
 * Headless Chromium for the browser tests: Debian's chromium driven by playwright-core (no
 * browser download), against the exported web app served by the real Express app.
 */
import { execSync } from 'node:child_process';
import http, { type Server } from 'node:http';
import path from 'node:path';
import fs from 'node:fs';
import { chromium, type Browser, type Page } from 'playwright-core';
import { closeApp, createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import type { MailMessage, Mailer } from '@/server/services/mailer';
import { seedDemo } from '@/server/seed/demo';
import { createTestDatabase } from './test-db';

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 800 };

export function chromiumPath(): string {
  return execSync('command -v chromium || command -v chromium-browser', { encoding: 'utf8', shell: '/bin/sh' }).trim();
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath(),
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
}

export interface ServedApp {
  url: string;
  /** The e-mails the server sent (a capturing mailer). */
  mail: MailMessage[];
  close: () => Promise<void>;
}

/**
 * The web build from dist/ and the API on a free port, over a fresh database with the demo loaded.
 * `mailer` replaces the capturing one (e.g. real SMTP to a test server on loopback).
 */
export async function serveDemo(now = new Date(), options: { mailer?: Mailer; demo?: boolean } = {}): Promise<ServedApp> {
  const { sequelize, db, drop } = await createTestDatabase();
  // demo: false serves an empty install, as DEMO_SEED=0 does
  if (options.demo !== false) await seedDemo(sequelize, now);
  // Listen first: the app's APP_URL (the address in e-mailed links) is this server's own address.
  const server: Server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  const url = `http://127.0.0.1:${port}`;
  const config = loadConfig({
    NODE_ENV: 'test',
    JWT_SECRET: 'e2e-secret-e2e-secret-e2e-secret-0000',
    DB_PORT: String(db.port),
    DB_NAME: db.name,
    DB_USER: db.user,
    DB_PASSWORD: db.password,
    WEB_DIST: path.resolve(__dirname, '../../dist'),
    APP_URL: url,
  });
  const mail: MailMessage[] = [];
  const app = createApp({ sequelize, config, serveWeb: true, log: () => {}, mailer: options.mailer ?? { send: async (m) => void mail.push(m) } });
  server.on('request', app);
  return {
    url,
    mail,
    close: async () => {
      await new Promise((r) => server.close(r));
      await closeApp(app);
      await drop();
    },
  };
}

/**
 * Collects the Content-Security-Policy violations of every page a browser opens (Chromium logs
 * them to the console; the page also reports `securitypolicyviolation` events to it).
 */
function watchCsp(browser: Browser, violations: string[]): void {
  const newPage = browser.newPage.bind(browser);
  browser.newPage = async (options) => {
    const page = await newPage(options);
    await page.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) => console.error(`CSP violation: ${e.violatedDirective} blocked ${e.blockedURI}`));
    });
    page.on('console', (m) => {
      if (/Content Security Policy|CSP violation/i.test(m.text())) violations.push(`${page.url()}: ${m.text()}`);
    });
    return page;
  };
}

/**
 * The served demo and a browser for one test file: started before its tests, closed after.
 * Read `.url` and `.browser` inside the tests (they are set in beforeAll).
 */
export function useDemoInBrowser(options: { mailer?: () => Mailer; demo?: boolean } = {}): { readonly url: string; readonly browser: Browser; readonly mail: MailMessage[] } {
  let served: ServedApp | undefined;
  let browser: Browser | undefined;
  const cspViolations: string[] = [];
  beforeAll(async () => {
    if (!fs.existsSync(path.resolve(__dirname, '../../dist/index.html'))) {
      throw new Error('No web build in dist/: run npm test (it builds), or npm run build:web');
    }
    served = await serveDemo(new Date(), { mailer: options.mailer?.(), demo: options.demo });
    browser = await launchBrowser();
    watchCsp(browser, cspViolations);
  });
  afterAll(async () => {
    await browser?.close();
    await served?.close();
    // The app runs under the server's Content-Security-Policy: no page a test visited may break it.
    if (cspViolations.length > 0) throw new Error(`Content-Security-Policy violations:\n${cspViolations.join('\n')}`);
  });
  return {
    get url() {
      return served!.url;
    },
    get browser() {
      return browser!;
    },
    get mail() {
      return served!.mail;
    },
  };
}

/** Signs in through the sign-in screen and waits to leave it. */
export async function signInAs(page: Page, baseUrl: string, email: string, password = 'ovalyard-demo'): Promise<void> {
  await page.goto(baseUrl);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'), { timeout: 30_000 });
}
