import type { Page } from 'playwright-core';
import { PHONE, signInAs, useDemoInBrowser } from '../support/browser';

jest.setTimeout(180_000);

// The demo's invented bay file of Nell Tarrant's fitting (fixtures/demo/nell-driver-and-7-iron.csv).
const FILE = 'nell-driver-and-7-iron.csv';

const demo = useDemoInBrowser();

async function signInAndOpenNell(page: Page): Promise<void> {
  await signInAs(page, demo.url, 'oskar@larchmere.example');
  await page.goto(`${demo.url}/fittings`);
  await page.getByRole('link', { name: /Fitting of Nell Tarrant/ }).first().click();
  await page.getByRole('tab', { name: 'Session' }).click();
  await page.getByText(FILE).waitFor({ timeout: 30_000 });
}

/** The shot count the fitting's bay-file list shows for the file ("44 shots · …"). */
async function listedShots(page: Page): Promise<number> {
  const line = await page.getByText(/^\d+ shots? ·/).first().textContent();
  return Number(/^(\d+)/.exec(line ?? '')?.[1]);
}

describe('re-mapping and deleting a stored bay file in the browser', () => {
  it('a demo fitter at phone size ignores one column of the stored file, applies it, and then deletes the file', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await signInAndOpenNell(page);
    const before = await listedShots(page);
    expect(before).toBeGreaterThan(0);

    await page.getByRole('button', { name: `Change the mapping of ${FILE}` }).click();
    await page.getByText(`Change the mapping of ${FILE}`, { exact: true }).waitFor({ timeout: 30_000 });

    // the stored mapping reads "Apex (ft)" as apex height; the fitter sets it to Ignore
    const apex = page.getByLabel('Apex (ft): read as');
    await apex.waitFor({ timeout: 30_000 });
    expect(await apex.inputValue()).toBe('apexHeight');
    // the stored file is, of course, in the fitting: no duplicate notice here
    expect(await page.getByText('This file is already in the fitting').count()).toBe(0);
    await apex.selectOption('ignore');
    await page.getByText('Set by you to Ignore.', { exact: false }).waitFor();

    const apply = page.getByRole('button', { name: 'Apply the new mapping', disabled: false });
    await apply.waitFor({ timeout: 30_000 });
    await apply.click();

    // the result report: ignoring a column rejects no row, so the count stays
    await page.getByText('New mapping applied').waitFor({ timeout: 30_000 });
    await page.getByText(`${before} shots imported`).waitFor();
    expect(await page.getByText(`Before: ${before} shots.`, { exact: false }).count()).toBe(1);

    await page.getByRole('button', { name: 'Back to the fitting' }).click();
    await page.getByText(FILE).waitFor({ timeout: 15_000 });
    expect(await listedShots(page)).toBe(before);

    // opened again, the column is stored as ignored
    await page.getByRole('button', { name: `Change the mapping of ${FILE}` }).click();
    const apexAgain = page.getByLabel('Apex (ft): read as');
    await apexAgain.waitFor({ timeout: 30_000 });
    expect(await apexAgain.inputValue()).toBe('ignore');
    await page.goBack();
    await page.getByText(FILE).waitFor({ timeout: 15_000 });

    // delete, with the in-page confirmation
    await page.getByRole('button', { name: `Delete ${FILE}` }).click();
    await page.getByText(`Delete ${FILE}? Its ${before} shots leave the analysis.`).waitFor();
    await page.getByRole('button', { name: `Yes, delete ${FILE}` }).click();

    // the fitting's empty analysis state, where a session starts (with the bay's caution)
    await page.getByText('No bay file imported yet.').waitFor({ timeout: 30_000 });
    await page.getByRole('tab', { name: 'Decide' }).click();
    await page.getByText('Import the launch monitor’s export of this session', { exact: false }).waitFor({ timeout: 30_000 });
    await page.getByText('Before you hit').waitFor();
    expect(await page.getByText(FILE).count()).toBe(0);
    await page.close();
  });
});
