/**
 * Screenshots of a shop's first steps on an install without the demo (DEMO_SEED=0): sign-up,
 * "check your inbox", the confirmation, the shop page, inviting a fitter, the invitation page, and
 * the player's page with its invitation. Needs npm start's local inbox (INBOX_URL, maildev's page).
 * Usage: BASE_URL=http://127.0.0.1:8111 INBOX_URL=http://127.0.0.1:1180 node --import tsx scripts/screenshots-shops.ts
 * Images in .scratch/shops-*.png at 390×844 and 1280×800.
 */
import { execSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Page } from 'playwright-core';

const BASE = process.env.BASE_URL ?? 'http://127.0.0.1:8080';
const INBOX = process.env.INBOX_URL ?? 'http://127.0.0.1:1080';
const OUT = path.resolve('.scratch');
const SIZES = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'desktop', width: 1280, height: 800 },
];
const PASSWORD = 'tidal copper weathervane';

async function shot(page: Page, name: string): Promise<void> {
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(600);
  await page.screenshot({ path: path.join(OUT, `shops-${name}.png`) });
  console.log('  ', name);
}

/** The last link matching a pattern in a message to an address (maildev's REST list). */
async function linkFor(page: Page, to: string, pattern: RegExp): Promise<string> {
  for (let i = 0; i < 50; i++) {
    const list = (await (await page.request.get(`${INBOX}/api/email`)).json()) as { to: { address: string }[]; text: string }[];
    const hit = list.filter((m) => m.to.some((t) => t.address === to)).at(-1);
    const link = hit ? pattern.exec(hit.text)?.[0] : undefined;
    if (link) return link;
    await page.waitForTimeout(200);
  }
  throw new Error(`no message to ${to}`);
}

async function main(): Promise<void> {
  fs.mkdirSync(OUT, { recursive: true });
  const browser = await chromium.launch({ executablePath: execSync('command -v chromium', { shell: '/bin/bash' }).toString().trim(), args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'] });
  try {
    for (const size of SIZES) {
      const s = size.name;
      const stamp = Date.now();
      const owner = `owner-${stamp}@saltmarsh.example`;
      let page = await (await browser.newContext({ viewport: size })).newPage();
      await page.goto(`${BASE}/sign-in`);
      await shot(page, `${s}-01-sign-in`);
      await page.goto(`${BASE}/sign-up`);
      await shot(page, `${s}-02-sign-up`);
      await page.getByLabel('Shop name').fill('Saltmarsh Club Works');
      await page.getByLabel('Your name').fill('Ines Calloway');
      await page.getByLabel('E-mail').fill(owner);
      await page.getByLabel('Password').fill(PASSWORD);
      await page.getByRole('button', { name: 'Create the shop' }).click();
      await page.getByText('Check your inbox').waitFor();
      await shot(page, `${s}-03-check-inbox`);
      await page.goto(`${BASE}/sign-in`);
      await page.getByLabel('E-mail').fill(owner);
      await page.getByLabel('Password').fill(PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByText(/Confirm your e-mail address first/).waitFor();
      await shot(page, `${s}-04-not-confirmed`);
      await page.goto(await linkFor(page, owner, /https?:\/\/\S+\/verify\?token=[A-Za-z0-9_-]+/));
      await page.getByText(/Your address is confirmed/).waitFor();
      await shot(page, `${s}-05-confirmed`);
      await page.goto(`${BASE}/sign-in`);
      await page.getByLabel('E-mail').fill(owner);
      await page.getByLabel('Password').fill(PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL((u) => u.pathname === '/players');
      await page.goto(`${BASE}/team/new`);
      await page.getByLabel('Name').fill('Bastian Reel');
      await page.getByLabel('E-mail').fill(`bastian-${stamp}@saltmarsh.example`);
      await shot(page, `${s}-06-invite-fitter`);
      await page.getByRole('button', { name: 'Send the invitation' }).click();
      await page.waitForURL((u) => u.pathname === '/team');
      await shot(page, `${s}-07-team-invitations`);
      await page.goto(`${BASE}/players/new`);
      await page.getByLabel('Name').fill('Petra Quill');
      await page.getByLabel('E-mail (optional)').fill(`petra-${stamp}@quill.example`);
      await page.getByRole('button', { name: 'Add player' }).click();
      await page.getByRole('button', { name: 'Invite to sign in' }).click();
      await page.getByRole('button', { name: 'Send the invitation' }).click();
      await page.getByText(/Invitation sent/).waitFor();
      await shot(page, `${s}-08-player-invitation`);
      await page.goto(`${BASE}/shop`);
      await page.getByText('Export everything (zip)').waitFor();
      await shot(page, `${s}-09-shop`);
      await page.goto(`${BASE}/players`);
      await shot(page, `${s}-10-players-list`);
      const invite = await linkFor(page, `bastian-${stamp}@saltmarsh.example`, /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/);
      page = await (await browser.newContext({ viewport: size })).newPage();
      await page.goto(invite);
      await page.getByText('Welcome, Bastian Reel').waitFor();
      await shot(page, `${s}-11-invitation`);
      await page.goto(`${BASE}/invite/${'x'.repeat(43)}`);
      await page.getByText(/no longer works/).waitFor();
      await shot(page, `${s}-12-invitation-dead`);
    }
  } finally {
    await browser.close();
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
