/**
 * Screenshots of the web app for a look by eye: signs in as each demo role through the sign-in
 * screen and visits the main pages at phone (390 × 844) and wide (1280 × 800) sizes.
 * Needs a running server (npm start). Images go to .scratch/screenshots/ (ignored).
 * Run: BASE_URL=http://127.0.0.1:8090 node --import tsx scripts/screenshots.ts
 * ONLY=fitter (or owner, player, signed-out) takes one role's pictures only.
 */
import { execSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type BrowserContext, type Locator, type Page } from 'playwright-core';

const BASE = process.env.BASE_URL ?? 'http://127.0.0.1:8080';
const OUT = path.resolve(__dirname, '../.scratch/screenshots');
const PASSWORD = 'ovalyard-demo'; // demo data (fixtures/demo/scenario.json)

/** Which roles' pictures to take (ONLY=fitter…); all by default. */
const wants = (role: string) => !process.env.ONLY || process.env.ONLY.split(',').includes(role);

const SIZES = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
] as const;

async function signIn(page: Page, email: string): Promise<void> {
  await page.goto(`${BASE}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

async function shot(page: Page, name: string, fullPage = false): Promise<void> {
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(300);
  await page.screenshot({ path: path.join(OUT, `${name}.png`), fullPage });
  console.log('  ', name);
}

/** Scrolls the page's scroll view until the text is in sight, then shoots. */
async function shotAt(page: Page, name: string, text: string | RegExp | Locator): Promise<void> {
  const target = typeof text === 'string' || text instanceof RegExp ? page.getByText(text).first() : text;
  await target.scrollIntoViewIfNeeded();
  await shot(page, name);
}

const DEMO_DIR = path.resolve(__dirname, '../fixtures/demo');

/** Scrolls the page's scrolling container until `text` (a heading) is at the top, then a shot. */
async function shotAtHeading(page: Page, name: string, heading: string): Promise<void> {
  const target = page.getByRole('heading', { name: heading, exact: true }).first();
  await target.waitFor({ timeout: 30_000 });
  await target.evaluate((el) => el.scrollIntoView({ block: 'start' }));
  await shot(page, name);
}

/** The fitting page's views (decide, head-to-head, odds, course; shots; ladder; builds; session). */
async function fittingViews(page: Page, s: string): Promise<void> {
  await page.getByRole('heading', { name: /where the shots land/ }).first().waitFor({ timeout: 30_000 });
  await shot(page, `${s}-21-fitting`);
  await page.getByRole('radio', { name: '7 iron' }).click();
  await shotAtHeading(page, `${s}-24-head-to-head`, 'Head-to-head');
  await page.getByText(/^Overall: /).first().waitFor({ timeout: 30_000 }).catch(() => undefined);
  await page.getByRole('img', { name: /minus/ }).first().evaluate((el) => el.scrollIntoView({ block: 'start' }));
  await shot(page, `${s}-24b-head-to-head-plot`);
  await page.getByLabel('Head-to-head table').evaluate((el) => el.scrollIntoView({ block: 'start' }));
  await shot(page, `${s}-24c-head-to-head-table`);
  await shotAtHeading(page, `${s}-25-odds`, 'On target');
  await page.getByLabel('Altitude').fill('1600');
  await page.getByLabel('Temperature').fill('30');
  await page.getByRole('button', { name: 'Show at the course' }).click();
  await page.getByText('What changed at the course').waitFor({ timeout: 30_000 });
  await page.getByText('What changed at the course').evaluate((el) => el.scrollIntoView({ block: 'center' }));
  await shot(page, `${s}-26-course`);
  await page.getByRole('tab', { name: 'Shots' }).click();
  await page.getByLabel('Groups table').waitFor({ timeout: 30_000 });
  await shot(page, `${s}-27-groups`);
  await shotAtHeading(page, `${s}-28-shot-table`, 'Every shot');
  await page.getByRole('tab', { name: 'Ladder' }).click();
  await page.getByRole('img', { name: /^Ladder:/ }).waitFor({ timeout: 30_000 });
  await shot(page, `${s}-29-ladder`);
  await page.getByRole('tab', { name: 'Session' }).click();
  await page.getByRole('heading', { name: 'Bay files' }).waitFor({ timeout: 30_000 });
  await shot(page, `${s}-29b-session`);
}

async function main(): Promise<void> {
  fs.mkdirSync(OUT, { recursive: true });
  const browser = await chromium.launch({
    executablePath: execSync('command -v chromium', { shell: '/bin/bash' }).toString().trim(),
    args: [
      '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage',
    ],
  });
  try {
    for (const size of SIZES) {
      const s = size.name;
      let context: BrowserContext;
      let page: Page;
      // signed out, and a failed sign-in
      if (wants('signed-out')) {
      context = await browser.newContext({ viewport: size });
      page = await context.newPage();
      await page.goto(`${BASE}/sign-in`);
      await shot(page, `${s}-01-sign-in`);
      await page.getByLabel('E-mail').fill('oskar@larchmere.example');
      await page.getByLabel('Password').fill('wrong-password');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByText('do not match').waitFor();
      await shot(page, `${s}-02-sign-in-error`);
      await page.getByLabel('Password').fill('');
      await page.getByLabel('E-mail').fill('');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await shot(page, `${s}-03-sign-in-emptied`);
      await page.goto(`${BASE}/no-such-page`);
      await shot(page, `${s}-04-not-found-signed-out`);
      await context.close();
      }

      // fitter
      if (wants('fitter')) {
      context = await browser.newContext({ viewport: size });
      page = await context.newPage();
      await signIn(page, 'oskar@larchmere.example');
      await page.goto(`${BASE}/players`); // a fitter starts at the fittings
      await page.getByLabel('Search players').waitFor();
      await shot(page, `${s}-10-players`);
      await page.getByLabel('Search players').fill('zzz');
      await page.getByText('No player matches').waitFor();
      await shot(page, `${s}-11-players-no-match`);
      await page.getByLabel('Search players').fill('');
      await page.getByText('Nell Tarrant').first().click();
      await page.waitForURL(/\/players\/[0-9a-f-]+$/);
      await shot(page, `${s}-12-player`);
      await page.getByRole('button', { name: 'Edit' }).click();
      await shot(page, `${s}-13-player-edit`);
      await page.getByLabel('Height').fill('abc');
      await page.getByLabel('Name').fill('');
      await page.getByRole('button', { name: 'Save' }).click();
      await shot(page, `${s}-14-player-edit-errors`);
      await page.goto(`${BASE}/players/new`);
      await shot(page, `${s}-15-player-new`);
      const players = (await (await page.request.get(`${BASE}/api/players`)).json()) as { id: string; name: string }[];
      const nellId = players.find((p) => p.name === 'Nell Tarrant')!.id;
      await page.goto(`${BASE}/players/${nellId}/account`);
      await shot(page, `${s}-16-player-has-sign-in`);
      await page.goto(`${BASE}/fittings`);
      await shot(page, `${s}-20-fittings`);
      await page.getByLabel('Search by player').fill('nell');
      await page.getByLabel('Sort').selectOption('player-asc');
      await shot(page, `${s}-20b-fittings-filtered`);
      await page.getByLabel('Search by player').fill('nobody');
      await page.getByText('No fitting matches').waitFor();
      await shot(page, `${s}-20c-fittings-no-match`);
      await page.goto(`${BASE}/fittings`);
      await page.getByRole('link').filter({ hasText: 'Nell Tarrant' }).first().click();
      await page.waitForURL(/\/fittings\/[0-9a-f-]+$/);
      await fittingViews(page, s);
      const fittingUrl = page.url().split('?')[0];
      await page.getByRole('tab', { name: 'Builds' }).click();
      const buildsHeading = page.getByRole('heading', { name: 'Builds', exact: true });
      await buildsHeading.waitFor();
      await shotAt(page, `${s}-21b-fitting-builds`, buildsHeading);
      await page.getByRole('tab', { name: 'Session' }).click();
      await page.getByRole('button', { name: 'Edit', exact: true }).first().click();
      await shot(page, `${s}-22-fitting-edit`);
      await page.goto(`${BASE}/fittings/new`);
      await shot(page, `${s}-23-fitting-new`);
      await shotAt(page, `${s}-24-fitting-new-conditions`, 'Conditions');
      // a build's edit page opened by its address alone
      const fittingId = fittingUrl.split('/').pop()!;
      const builds = (await (await page.request.get(`${BASE}/api/fittings/${fittingId}/builds`)).json()) as { id: string }[];
      await page.goto(`${BASE}/builds/${builds[0].id}/edit`);
      await shot(page, `${s}-25-build-edit-by-address`);
      // import: a file with no build column and a side column of signed numbers
      const all = (await (await page.request.get(`${BASE}/api/fittings`)).json()) as { id: string; playerName: string }[];
      const into = all.find((f) => f.playerName === (s === 'phone' ? 'Nell Tarrant' : 'Bea Solloway'))!.id;
      await page.goto(`${BASE}/fittings/${into}/import`);
      const chooser = page.waitForEvent('filechooser');
      await page.getByRole('button', { name: 'Choose a bay file' }).click();
      await (await chooser).setFiles(path.join(DEMO_DIR, 'amos-wedge-gapping.csv'));
      await page.getByLabel('Side [m]: read as').waitFor({ timeout: 30_000 });
      await shot(page, `${s}-26-import-mapping`);
      await shotAt(page, `${s}-27-import-sign-question`, 'which way does + point');
      await shotAt(page, `${s}-28-import-preview`, /The first \d+ of/);
      if ((await page.getByText('This file is already in the fitting').count()) === 0) {
        const answer = page.getByRole('radio', { name: '+ is right, − is left' });
        while ((await answer.count()) > 0) await answer.first().click();
        await page.getByLabel('Build for rows without one').fill('Own wedges');
        await page.getByRole('button', { name: 'Import the bay file', disabled: false }).waitFor({ timeout: 30_000 });
        await page.getByRole('button', { name: 'Import the bay file' }).click();
        await page.getByText(/shots imported/).waitFor({ timeout: 30_000 });
        await shot(page, `${s}-29-import-result`);
        await page.goto(`${BASE}/fittings/${into}?view=ladder`);
        const ladder = page.getByRole('img', { name: /^Ladder:/ });
        await ladder.waitFor({ timeout: 30_000 });
        await shotAt(page, `${s}-29c-imported-ladder`, ladder);
      }
      await page.goto(`${BASE}/account`);
      await shot(page, `${s}-30-account-fitter`);
      await context.close();
      }

      // owner
      if (wants('owner')) {
      context = await browser.newContext({ viewport: size });
      page = await context.newPage();
      await signIn(page, 'hedda@larchmere.example');
      await page.goto(`${BASE}/team`);
      await shot(page, `${s}-40-team`);
      await page.getByRole('button', { name: /^Deactivate / }).first().click();
      await shot(page, `${s}-40b-team-deactivate-question`);
      await page.getByRole('button', { name: 'Cancel' }).click();
      await page.goto(`${BASE}/team/new`);
      await shot(page, `${s}-41-team-new`);
      await page.request.post(`${BASE}/api/recipes`, {
        headers: { 'x-ovalyard-request': '1' },
        data: {
          name: `Bay 2 export (${s})`,
          recipe: { columns: { Club: { field: 'club' }, 'Carry [m]': { field: 'carry', unit: 'm' }, 'Side [m]': { field: 'offline', unit: 'm', side: 'signed-right-positive' }, Notes: { field: 'ignore' } } },
        },
      });
      await page.goto(`${BASE}/team`);
      await page.getByRole('button', { name: 'Import recipes' }).click();
      await page.waitForURL(/\/recipes$/);
      await shot(page, `${s}-42-recipes`);
      await page.getByRole('link', { name: `Recipe Bay 2 export (${s})` }).click();
      await page.waitForURL(/\/recipes\/[0-9a-f-]+$/);
      await shot(page, `${s}-43-recipe`, true);
      await page.goto(`${BASE}/team/margins`);
      await page.getByLabel('Carry', { exact: true }).waitFor({ timeout: 30_000 });
      await shot(page, `${s}-42-margins`);
      await context.close();
      }

      // player
      if (wants('player')) {
      context = await browser.newContext({ viewport: size });
      page = await context.newPage();
      await signIn(page, 'nell.tarrant@example.net');
      await shot(page, `${s}-50-my-fittings`);
      await page.goto(`${BASE}/account`);
      await shot(page, `${s}-51-account-player`);
      await page.goto(`${BASE}/players`);
      await page.waitForURL(/\/my-fittings$/);
      await shot(page, `${s}-52-player-typed-players`);
      await page.goto(`${BASE}/nothing-here`);
      await shot(page, `${s}-53-not-found`);
      await context.close();
      }
    }
  } finally {
    await browser.close();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
