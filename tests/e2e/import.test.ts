import fs from 'node:fs';
import path from 'node:path';
import { PHONE, signInAs, useDemoInBrowser } from '../support/browser';

jest.setTimeout(180_000);

// An invented bay file with a preamble, semicolons, decimal commas, a blank line and an average
// row; its expected counts were worked out by hand from the file (fixtures/bay-files/*.expected.json).
const FIXTURE = path.resolve(__dirname, '../../fixtures/bay-files/semicolon-decimal-comma.csv');
const expected = JSON.parse(fs.readFileSync(FIXTURE.replace(/\.csv$/, '.expected.json'), 'utf8')) as {
  counts: { rows: number; shots: number; rejected: number; skipped: number };
};

const demo = useDemoInBrowser();

describe('bay-file import in the browser', () => {
  it('a demo fitter at phone size imports a file with one column corrected and sees the shot count', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await signInAs(page, demo.url, 'oskar@larchmere.example');

    await page.goto(`${demo.url}/fittings`);
    await page.getByRole('link', { name: /Fitting of Nell Tarrant/ }).first().click();
    await page.getByRole('tab', { name: 'Session' }).click();
    await page.getByRole('button', { name: 'Import a bay file' }).click();

    // expo-document-picker makes its <input type=file> only on the click
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose a bay file' }).click();
    await (await chooser).setFiles(FIXTURE);

    // the mapping step: the suggestion reads "Total (m)" as total; the fitter sets it to Ignore
    const total = page.getByLabel('Total (m): read as');
    await total.waitFor({ timeout: 30_000 });
    expect(await total.inputValue()).toBe('total');
    await total.selectOption('ignore');
    await page.getByText('Set by you to Ignore.', { exact: false }).waitFor();

    // the preview after the edit still converts every shot row; the button is enabled once it is in
    await page.getByText(`Import ${expected.counts.shots} shots`, { exact: true }).waitFor({ timeout: 30_000 });
    const commit = page.getByRole('button', { name: 'Import the bay file', disabled: false });
    await commit.waitFor({ timeout: 30_000 });
    await commit.click();

    await page.getByText(`${expected.counts.shots} shots imported`).waitFor({ timeout: 30_000 });
    expect(await page.getByText(`${expected.counts.rows} rows read, ${expected.counts.rejected} rows not imported`, { exact: false }).count()).toBe(1);
    // the blank line and the average row are listed as skipped
    expect(await page.getByText(/Skipped: .*summary row/).count()).toBe(1);

    await page.getByRole('button', { name: 'Back to the fitting' }).click();
    await page.getByText('semicolon-decimal-comma.csv').waitFor({ timeout: 15_000 });
    expect(await page.getByText(new RegExp(`^${expected.counts.shots} shots ·`)).count()).toBe(1);
    await page.close();
  });
});
