/**
 * Screenshots of the remote-fitting screens (the course, the intake, messages, the player's own
 * view, the public request page) at 390 × 844 and 1280 × 800, against a running demo server.
 * Run: BASE_URL=http://127.0.0.1:8080 node --import tsx scripts/screenshots-remote.ts
 */
import fs from 'node:fs';
import path from 'node:path';
import { execSync } from 'node:child_process';
import { chromium, type Page } from 'playwright-core';

const BASE = process.env.BASE_URL ?? 'http://127.0.0.1:8080';
const OUT = path.resolve(__dirname, '../.scratch/screenshots');
const PASSWORD = 'ovalyard-demo'; // demo data (fixtures/demo/scenario.json)
const APP = { 'x-ovalyard-request': '1' };

async function signIn(page: Page, email: string): Promise<void> {
  await page.goto(`${BASE}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

async function shot(page: Page, name: string): Promise<void> {
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(500);
  await page.screenshot({ path: path.join(OUT, `${name}.png`), fullPage: true });
  console.log('  ', name);
}

async function main(): Promise<void> {
  fs.mkdirSync(OUT, { recursive: true });
  const chromiumPath = execSync('command -v chromium || command -v chromium-browser', { encoding: 'utf8', shell: '/bin/sh' }).trim();
  const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: ['--no-sandbox', '--disable-gpu'] });
  // One remote fitting of the demo player, with a message each way, made as the fitter.
  const setup = await browser.newPage();
  await signIn(setup, 'oskar@larchmere.example');
  const players = (await (await setup.request.get(`${BASE}/api/players`)).json()) as { id: string; name: string }[];
  const nell = players.find((p) => p.name === 'Nell Tarrant')!;
  const fitting = (await (await setup.request.post(`${BASE}/api/fittings`, { headers: APP, data: { playerId: nell.id, date: '2026-12-01', venue: 'indoor', remote: true } })).json()) as { id: string };
  await setup.request.post(`${BASE}/api/fittings/${fitting.id}/messages`, { headers: APP, data: { body: 'Welcome: answer the intake when you have ten minutes, and send your last range session.' } });
  const link = (await (await setup.request.get(`${BASE}/api/shop/request-link`)).json()) as { slug: string };
  const all = (await (await setup.request.get(`${BASE}/api/fittings?playerId=${nell.id}`)).json()) as { id: string; shotCount: number }[];
  const withShots = all.find((f) => f.shotCount > 0)!;
  await setup.close();

  for (const size of [{ name: 'phone', width: 390, height: 844 }, { name: 'wide', width: 1280, height: 800 }]) {
    const s = size.name;
    const fitter = await browser.newPage({ viewport: size });
    await signIn(fitter, 'oskar@larchmere.example');
    await fitter.goto(`${BASE}/fittings`);
    await shot(fitter, `${s}-r01-fittings-list`);
    await fitter.goto(`${BASE}/fittings/${fitting.id}`);
    await fitter.getByText('Waiting for the player', { exact: false }).first().waitFor({ timeout: 30_000 });
    await shot(fitter, `${s}-r02-fitting-course-staff`);
    await fitter.goto(`${BASE}/fittings/${fitting.id}/intake`);
    await shot(fitter, `${s}-r03-intake-staff-empty`);
    await fitter.close();

    const player = await browser.newPage({ viewport: size });
    await signIn(player, 'nell.tarrant@example.net');
    await player.goto(`${BASE}/fittings/${fitting.id}/intake`);
    await player.getByText('Measuring wrist to floor').waitFor({ timeout: 30_000 });
    await player.getByLabel('Height').fill('300');
    await player.getByRole('button', { name: /Send the/ }).click();
    await player.waitForTimeout(300);
    await shot(player, `${s}-r04-intake-player-errors`);
    await player.goto(`${BASE}/fittings/${fitting.id}/messages`);
    await shot(player, `${s}-r05-messages-player`);
    await player.goto(`${BASE}/fittings/${fitting.id}`);
    await shot(player, `${s}-r06-fitting-player-remote`);
    await player.goto(`${BASE}/fittings/${withShots.id}?view=shots`);
    await player.getByRole('heading', { name: 'Where your shots land' }).waitFor({ timeout: 30_000 });
    await shot(player, `${s}-r07-fitting-player-shots`);
    await player.getByRole('button', { name: 'How we worked this out' }).click();
    await shot(player, `${s}-r08-fitting-player-how`);
    await player.goto(`${BASE}/request/${link.slug}`);
    await shot(player, `${s}-r09-request-player`);
    await player.close();

    const anonymous = await browser.newPage({ viewport: size });
    await anonymous.goto(`${BASE}/request/${link.slug}`);
    await shot(anonymous, `${s}-r10-request-anonymous`);
    await anonymous.close();
  }
  await browser.close();
}

void main().catch((err) => {
  console.error(err);
  process.exit(1);
});
