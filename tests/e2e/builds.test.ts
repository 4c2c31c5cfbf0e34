import { PHONE, signInAs, useDemoInBrowser } from '../support/browser';

jest.setTimeout(180_000);

// The demo's invented bay file of Nell Tarrant's fitting names the driver build "Stock 10.5"
// (the demo gives it specs, 45.75 in among them; the test lengthens it).
const demo = useDemoInBrowser();

describe('editing a build’s specs in the browser', () => {
  it('a demo fitter at phone size sets loft and length of a driver build, sees the local-rule note, and the summary on the fitting', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await signInAs(page, demo.url, 'oskar@larchmere.example');
    await page.goto(`${demo.url}/fittings`);
    await page.getByRole('link', { name: /Fitting of Nell Tarrant/ }).first().click();
    // The builds are one tap away from what the fitter decides from.
    await page.getByRole('tab', { name: 'Builds' }).click();
    await page.getByRole('heading', { name: 'Builds' }).waitFor({ timeout: 30_000 });

    await page.getByRole('button', { name: 'Edit the specs of Driver, Stock 10.5' }).click();
    await page.getByText('Driver · Stock 10.5', { exact: true }).waitFor({ timeout: 30_000 });
    await page.getByLabel('Loft', { exact: true }).fill('10,5');
    await page.getByLabel('Length', { exact: true }).fill('46.5');

    // Model Local Rule G-10 (R&A / USGA, from 1 January 2022): clubs other than putters ≤ 46 in.
    await page.getByText('Longer than 46 in', { exact: true }).waitFor();
    expect(await page.getByText('The committee in charge of a competition decides.', { exact: false }).count()).toBe(1);
    await page.getByText('follow the head maker’s instructions', { exact: false }).waitFor();

    await page.getByRole('button', { name: 'Save' }).click();
    await page.getByRole('heading', { name: 'Builds' }).waitFor({ timeout: 30_000 });
    await page.getByText(/10\.5°\s·.*46\.5\sin/).first().waitFor({ timeout: 30_000 });
    await page.getByText('Longer than 46 in: see Local Rule G-10').waitFor();

    // saved on the server: a reload shows the same line
    await page.reload();
    await page.getByText(/10\.5°\s·.*46\.5\sin/).first().waitFor({ timeout: 30_000 });
    await page.close();
  });
});
