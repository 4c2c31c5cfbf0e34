/**
 * Addresses typed by hand: every signed-in screen, opened by its address by each role of the
 * demo shop, is either shown (its header names it and the address stays) or sends the role to
 * its start page. On each screen shown, every text is set in Inter (no fallback font) and every
 * control is at least 44 × 44 px (WCAG 2.1, success criterion 2.5.5, target size: 44 × 44 CSS px).
 */
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { PHONE, signInAs, useDemoInBrowser } from '../support/browser';

jest.setTimeout(600_000);

const demo = useDemoInBrowser();

type Role = 'owner' | 'fitter' | 'player';
const EMAIL: Record<Role, string> = {
  owner: 'hedda@larchmere.example',
  fitter: 'oskar@larchmere.example',
  player: 'nell.tarrant@example.net',
};
const HOME: Record<Role, string> = { owner: '/players', fitter: '/fittings', player: '/my-fittings' };
const HOME_TITLE: Record<Role, string> = { owner: 'Players', fitter: 'Fittings', player: 'My fittings' };

type Row = {
  /** The address, with the demo's ids filled in. */
  path: string;
  /** The header title that shows the screen is there (a pattern for pages named by their data). */
  title: string | RegExp;
  /** The roles the screen is shown to; the others are sent home. */
  shown: readonly Role[];
  /** Measure control sizes here (the fitting page's own controls are checked with its rebuild). */
  measure?: boolean;
};

const STAFF: readonly Role[] = ['owner', 'fitter'];
const ALL: readonly Role[] = ['owner', 'fitter', 'player'];

/** The demo's ids, read through the API as the fitter (the page's own session cookie). */
async function demoIds(context: BrowserContext, url: string) {
  const get = async <T,>(path: string): Promise<T> => {
    const res = await context.request.get(`${url}/api${path}`);
    if (!res.ok()) throw new Error(`${path}: ${res.status()}`);
    return (await res.json()) as T;
  };
  const players = await get<{ id: string; name: string }[]>('/players');
  const nell = players.find((p) => p.name === 'Nell Tarrant')!.id;
  const amos = players.find((p) => p.name === 'Amos Keverne')!.id;
  const [fitting] = await get<{ id: string }[]>(`/fittings?playerId=${nell}`);
  const [bayFile] = await get<{ id: string }[]>(`/fittings/${fitting.id}/bay-files`);
  const [build] = await get<{ id: string }[]>(`/fittings/${fitting.id}/builds`);
  const saved = await context.request.post(`${url}/api/recipes`, {
    headers: { 'x-ovalyard-request': '1' },
    data: { name: 'Bay 1 export', recipe: { columns: { Club: { field: 'club' } } } },
  });
  if (!saved.ok()) throw new Error(`recipe: ${saved.status()}`);
  const recipe = ((await saved.json()) as { id: string }).id;
  return { nell, amos, fitting: fitting.id, bayFile: bayFile.id, build: build.id, recipe };
}

function screens(ids: Awaited<ReturnType<typeof demoIds>>): Row[] {
  return [
    { path: '/players', title: 'Players', shown: STAFF },
    { path: '/players/new', title: 'New player', shown: STAFF },
    { path: `/players/${ids.nell}`, title: 'Nell Tarrant', shown: ALL },
    { path: `/players/${ids.nell}/edit`, title: 'Edit Nell Tarrant', shown: STAFF },
    { path: `/players/${ids.amos}/account`, title: 'Invite to sign in', shown: STAFF },
    { path: '/fittings', title: 'Fittings', shown: STAFF },
    { path: '/fittings/new', title: 'New fitting', shown: STAFF },
    { path: `/fittings/${ids.fitting}`, title: /Nell Tarrant/, shown: ALL, measure: false },
    { path: `/fittings/${ids.fitting}/edit`, title: 'Edit fitting', shown: STAFF },
    // Nell's fitting is not remote: only staff import into it.
    { path: `/fittings/${ids.fitting}/import`, title: 'Import a bay file', shown: STAFF },
    { path: `/fittings/${ids.fitting}/intake`, title: /Intake/i, shown: ALL },
    { path: `/fittings/${ids.fitting}/messages`, title: 'Messages', shown: ALL },
    { path: `/bay-files/${ids.bayFile}/remap`, title: 'Change mapping', shown: STAFF },
    { path: `/builds/${ids.build}/edit`, title: 'Edit build', shown: STAFF },
    { path: '/my-fittings', title: 'My fittings', shown: ['player'] },
    { path: '/team', title: 'Team', shown: ['owner'] },
    { path: '/team/new', title: 'Invite a fitter', shown: ['owner'] },
    { path: '/shop', title: 'Larchmere Fitting Barn', shown: ['owner'] },
    { path: '/recipes', title: 'Import recipes', shown: ['owner'] },
    { path: `/recipes/${ids.recipe}`, title: 'Bay 1 export', shown: ['owner'] },
    { path: '/account', title: 'Account', shown: ALL },
  ];
}

/** Texts whose font is not Inter (a fallback font shows where a Text missed the app's font). */
async function textsNotInInter(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    for (let node = walker.nextNode(); node; node = walker.nextNode()) {
      const text = node.textContent?.trim();
      const el = node.parentElement;
      if (!text || !el || el.closest('script, style, noscript')) continue;
      const box = el.getBoundingClientRect();
      if (box.width === 0 && box.height === 0) continue;
      if (!/Inter/.test(getComputedStyle(el).fontFamily)) out.push(`${text.slice(0, 40)} (${getComputedStyle(el).fontFamily})`);
    }
    return out;
  });
}

/** Controls smaller than 44 × 44 px: buttons, links, switches, radios, selects, date inputs. */
async function smallControls(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const selector = '[role="button"], [role="link"], [role="switch"], [role="radio"], a[href], button, select, input[type="date"]';
    for (const el of Array.from(document.querySelectorAll<HTMLElement>(selector))) {
      const box = el.getBoundingClientRect();
      if (box.width === 0 && box.height === 0) continue;
      if (getComputedStyle(el).visibility === 'hidden') continue;
      if (box.width < 44 - 0.5 || box.height < 44 - 0.5) {
        out.push(`${el.getAttribute('aria-label') ?? el.textContent?.trim().slice(0, 30)}: ${Math.round(box.width)}×${Math.round(box.height)}`);
      }
    }
    return out;
  });
}

async function visit(page: Page, url: string, row: Row, role: Role): Promise<void> {
  await page.goto(`${url}${row.path}`);
  const expected = row.shown.includes(role) ? row.path : HOME[role];
  await page.waitForURL((u) => u.pathname === expected, { timeout: 30_000 });
  if (!row.shown.includes(role)) {
    await page.getByRole('heading', { name: HOME_TITLE[role], exact: true }).first().waitFor({ timeout: 30_000 });
    return;
  }
  await page.getByRole('heading', { name: row.title, exact: typeof row.title === 'string' }).first().waitFor({ timeout: 30_000 });
  await page.waitForLoadState('networkidle');
  // Still there once everything has loaded (a late guard would have moved it by now).
  expect(new URL(page.url()).pathname).toBe(row.path);
  expect(await textsNotInInter(page)).toEqual([]);
  if (row.measure !== false) expect(await smallControls(page)).toEqual([]);
}

async function signedIn(browser: Browser, url: string, role: Role): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  await signInAs(page, url, EMAIL[role]);
  return { context, page };
}

describe('addresses typed by hand', () => {
  let rows: Row[] = [];
  beforeAll(async () => {
    const { context } = await signedIn(demo.browser, demo.url, 'owner');
    rows = screens(await demoIds(context, demo.url));
    await context.close();
  });

  it.each<Role>(['owner', 'fitter', 'player'])('every screen typed by the %s is shown to the roles that may see it and sends the others home', async (role) => {
    const { context, page } = await signedIn(demo.browser, demo.url, role);
    for (const row of rows) {
      try {
        await visit(page, demo.url, row, role);
      } catch (error) {
        throw new Error(`${role} at ${row.path}: ${(error as Error).message}`);
      }
    }
    await context.close();
  });

  it('every screen typed by someone signed out leads to the sign-in page, set in Inter with 44 px controls', async () => {
    const context = await demo.browser.newContext({ viewport: PHONE });
    const page = await context.newPage();
    for (const row of rows) {
      await page.goto(`${demo.url}${row.path}`);
      await page.waitForURL((u) => u.pathname === '/sign-in', { timeout: 30_000 });
    }
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(await textsNotInInter(page)).toEqual([]);
    expect(await smallControls(page)).toEqual([]);
    await context.close();
  });

  it('an address that is no page shows the not-found page with its header and a way back', async () => {
    const { context, page } = await signedIn(demo.browser, demo.url, 'player');
    await page.goto(`${demo.url}/no-such-page`);
    await page.getByRole('heading', { name: 'Not found', exact: true }).waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Back to the start page' }).click();
    await page.waitForURL((u) => u.pathname === '/my-fittings', { timeout: 30_000 });
    await context.close();
  });
});
