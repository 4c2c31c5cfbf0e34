/**
 * Screenshots of the bag and spec-sheet screens for a look by eye, at phone (390 × 844) and
 * wide (1280 × 800) sizes, plus the printed spec sheet (A4 and Letter, from the print view) and
 * the server's PDF, as PDFs in .scratch/screenshots/ (turn them into images with pdftoppm).
 * Needs a running server with the demo (npm start).
 * Run: BASE_URL=http://127.0.0.1:8080 node --import tsx scripts/screenshots-bag.ts
 */
import { execSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Page } from 'playwright-core';

const BASE = process.env.BASE_URL ?? 'http://127.0.0.1:8080';
const OUT = path.resolve(__dirname, '../.scratch/screenshots');
const PASSWORD = 'ovalyard-demo'; // demo data (fixtures/demo/scenario.json)
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

/** The height of the app's own scroll box's content (the page itself does not scroll). */
const contentHeight = (page: Page) =>
  page.evaluate(() => {
    let height = window.innerHeight;
    for (const d of document.querySelectorAll('div')) {
      const overflow = getComputedStyle(d).overflowY;
      if (overflow === 'auto' || overflow === 'scroll') height = Math.max(height, d.scrollHeight + 80);
    }
    return height;
  });

/**
 * A screenshot; `tall` makes the window as high as the content first (the app scrolls inside
 * its own box, so a full-page capture sees one screen) and saves it in parts of at most 1,400 px.
 */
async function shot(page: Page, name: string, tall = false): Promise<void> {
  const size = page.viewportSize()!;
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(500);
  if (!tall) {
    await page.screenshot({ path: path.join(OUT, `${name}.png`) });
    console.log('  ', name);
    return;
  }
  const height = Math.min(9000, await contentHeight(page));
  await page.setViewportSize({ width: size.width, height });
  await page.waitForTimeout(500);
  for (let y = 0, part = 1; y < height; y += 1400, part++) {
    await page.screenshot({ path: path.join(OUT, `${name}-${part}.png`), clip: { x: 0, y, width: size.width, height: Math.min(1400, height - y) } });
  }
  await page.setViewportSize(size);
  console.log('  ', name);
}

async function playerId(page: Page, name: string): Promise<string> {
  const players = (await (await page.request.get(`${BASE}/api/players`)).json()) as { id: string; name: string }[];
  return players.find((p) => p.name === name)!.id;
}

async function main(): Promise<void> {
  fs.mkdirSync(OUT, { recursive: true });
  const browser = await chromium.launch({
    executablePath: execSync('command -v chromium', { shell: '/bin/bash' }).toString().trim(),
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
  try {
    for (const size of SIZES) {
      const s = size.name;
      let context = await browser.newContext({ viewport: size });
      let page = await context.newPage();
      await signIn(page, 'oskar@larchmere.example');
      const amos = await playerId(page, 'Amos Keverne');
      const nell = await playerId(page, 'Nell Tarrant');
      await page.goto(`${BASE}/players/${amos}/bag`);
      await page.getByText('15 clubs in the bag').first().waitFor();
      await shot(page, `${s}-60-bag-15-clubs`, true);
      await page.goto(`${BASE}/players/${nell}/bag`);
      await page.getByRole('heading', { name: 'Ladder' }).waitFor();
      await shot(page, `${s}-61-bag-nell`, true);
      await page.getByRole('button', { name: 'Open the driver' }).first().click();
      await page.getByRole('heading', { name: 'History' }).waitFor();
      await shot(page, `${s}-62-bag-club`, true);
      await page.getByRole('button', { name: 'Edit', exact: true }).click();
      await page.getByLabel('Added mass', { exact: true }).fill('10');
      await page.getByLabel('Length', { exact: true }).fill('46.5');
      await page.getByText('What this change does').waitFor();
      await shot(page, `${s}-63-bag-club-edit`, true);
      await page.goto(`${BASE}/fittings`);
      await page.getByRole('link').filter({ hasText: 'Nell Tarrant' }).first().click();
      await page.getByRole('heading', { name: 'Chosen for the bag' }).waitFor();
      await page.getByRole('heading', { name: 'Chosen for the bag' }).scrollIntoViewIfNeeded();
      await shot(page, `${s}-64-fitting-chosen`);
      await page.getByRole('button', { name: 'Spec sheet' }).click();
      await page.getByText('Why this build').first().waitFor();
      await shot(page, `${s}-65-spec-sheet-fitter`, true);
      if (s === 'wide') {
        await page.getByRole('button', { name: 'Print' }).click();
        await page.getByText('Why this build').first().waitFor();
        await page.waitForTimeout(600);
        await page.emulateMedia({ media: 'print' });
        await page.pdf({ path: path.join(OUT, 'print-a4.pdf'), format: 'A4', printBackground: true, preferCSSPageSize: true });
        await page.pdf({ path: path.join(OUT, 'print-letter.pdf'), format: 'Letter', printBackground: true, preferCSSPageSize: true });
        await page.emulateMedia({ media: 'screen' });
        const sheetId = new URL(page.url()).searchParams.get('id');
        if (sheetId) {
          const pdf = await page.request.get(`${BASE}/api/spec-sheets/${sheetId}/pdf`);
          fs.writeFileSync(path.join(OUT, 'server-a4.pdf'), await pdf.body());
          const letter = await page.request.get(`${BASE}/api/spec-sheets/${sheetId}/pdf?paper=letter`);
          fs.writeFileSync(path.join(OUT, 'server-letter.pdf'), await letter.body());
        }
        console.log('   print and server PDFs');
        // Send it again: the message lands in npm start's local inbox (INBOX_URL, maildev's page).
        const inbox = process.env.INBOX_URL;
        if (inbox && sheetId) {
          await page.goto(`${BASE}/spec-sheets/${sheetId}`);
          await page.getByRole('button', { name: 'Send again' }).click();
          await page.getByText(/with a copy to the shop/).waitFor();
          await page.goto(inbox);
          await page.waitForTimeout(1500);
          await shot(page, 'wide-66-local-inbox');
          const list = (await (await page.request.get(`${inbox}/api/email`)).json()) as { subject: string; attachments?: { fileName: string; contentType: string }[] }[];
          const last = list[list.length - 1];
          console.log(`   inbox: ${list.length} message(s); last "${last?.subject}" with ${last?.attachments?.map((a) => `${a.fileName} (${a.contentType})`).join(', ') ?? 'no attachment'}`);
        }
      }
      await context.close();

      context = await browser.newContext({ viewport: size });
      page = await context.newPage();
      await signIn(page, 'nell.tarrant@example.net');
      await page.goto(`${BASE}/my-bag`);
      await page.getByRole('heading', { name: 'Ladder' }).waitFor();
      await shot(page, `${s}-70-my-bag`, true);
      await page.goto(`${BASE}/my-fittings`);
      await page.getByRole('link').first().click();
      await page.getByRole('button', { name: 'Your spec sheet' }).click();
      await page.getByText('Why this build').first().waitFor();
      await shot(page, `${s}-71-spec-sheet-player`);
      await context.close();

      context = await browser.newContext({ viewport: size });
      page = await context.newPage();
      await signIn(page, 'hedda@larchmere.example');
      await page.goto(`${BASE}/workshop-settings`);
      await page.getByText('Static-fit table').first().waitFor();
      await shot(page, `${s}-80-workshop-settings`);
      await context.close();
    }
  } finally {
    await browser.close();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
