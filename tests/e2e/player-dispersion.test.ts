import { PHONE, signInAs, useDemoInBrowser } from '../support/browser';

jest.setTimeout(120_000);

const demo = useDemoInBrowser();

describe('a player on a phone', () => {
  it('the demo player sees their fitting’s dispersion plot and cannot decide on strays', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await signInAs(page, demo.url, 'nell.tarrant@example.net');
    await page.getByText('My fittings').first().waitFor({ timeout: 30_000 });
    await page.getByText('Indoor bay').first().click();
    // The plot's accessible summary (components/charts/oval-plot-geometry.ts ovalPlotSummary).
    await page.getByRole('img', { name: /^Driver: 24 shots, two builds/ }).waitFor({ timeout: 30_000 });
    await page.getByRole('radio', { name: '7 iron' }).click();
    await page.getByRole('img', { name: /^7 iron: 20 shots, two builds/ }).waitFor({ timeout: 15_000 });
    expect(await page.getByRole('button', { name: 'Keep' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Drop' }).count()).toBe(0);
    await page.close();
  });
});
