import { PHONE, useDemoInBrowser } from '../support/browser';

jest.setTimeout(120_000);

const demo = useDemoInBrowser();

describe('sign-in in the browser', () => {
  it('a demo fitter signing in at phone size sees the players list', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await page.goto(demo.url);
    await page.getByLabel('E-mail').fill('oskar@larchmere.example');
    await page.getByLabel('Password').fill('ovalyard-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Nell Tarrant').first().waitFor({ timeout: 30_000 });
    expect(await page.getByText('Amos Keverne').count()).toBeGreaterThan(0);
    await page.close();
  });

  it('a wrong password shows the error in the page and stays on sign-in', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await page.goto(demo.url);
    await page.getByLabel('E-mail').fill('oskar@larchmere.example');
    await page.getByLabel('Password').fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('That e-mail and password do not match. Check both and try again.').waitFor({ timeout: 15_000 });
    expect(await page.getByLabel('Password').count()).toBe(1);
    await page.close();
  });
});
