import { PHONE, useDemoInBrowser } from '../support/browser';

jest.setTimeout(180_000);

// The demo player Nell Tarrant (invented) forgets her password; the server's e-mail is captured
// by the test mailer of serveDemo().
const demo = useDemoInBrowser();
const EMAIL = 'nell.tarrant@example.net';
const NEW_PASSWORD = 'a new long password';
// By role, not label: the stack keeps the screen below mounted but hidden, and roles skip hidden inputs.

/** The reset link in the last message sent to `to`. */
function resetLinkTo(to: string): string {
  const message = [...demo.mail].reverse().find((m) => m.to === to);
  if (!message) throw new Error(`No e-mail was sent to ${to}`);
  const match = /https?:\/\/\S+\/reset\?token=[A-Za-z0-9_-]+/.exec(message.text);
  if (!match) throw new Error(`The e-mail to ${to} has no reset link:\n${message.text}`);
  return match[0];
}

describe('password reset in the browser', () => {
  it('a demo player at phone size asks for a link, sets a new password with it and signs in with that', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await page.goto(demo.url);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByRole('textbox', { name: 'E-mail' }).fill(EMAIL);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await page
      .getByText(`If an account uses ${EMAIL}, a link to set a new password is on its way. It works for one hour.`)
      .waitFor({ timeout: 30_000 });

    const link = resetLinkTo(EMAIL);
    await page.goto(link);
    await page.getByRole('textbox', { name: 'New password', exact: true }).fill(NEW_PASSWORD);
    await page.getByRole('textbox', { name: 'New password again' }).fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Set the password' }).click();
    await page.getByText('Your password is set. Sign in with it.').waitFor({ timeout: 30_000 });

    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((u) => u.pathname.startsWith('/sign-in'), { timeout: 30_000 });
    await page.getByRole('textbox', { name: 'E-mail' }).fill(EMAIL);
    await page.getByRole('textbox', { name: 'Password' }).fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('My fittings').first().waitFor({ timeout: 30_000 });
    await page.close();

    // The link is used up: a second visit says so in the page and offers a new one.
    const again = await demo.browser.newPage({ viewport: PHONE });
    await again.goto(link);
    await again.getByRole('textbox', { name: 'New password', exact: true }).fill('yet another long password');
    await again.getByRole('textbox', { name: 'New password again' }).fill('yet another long password');
    await again.getByRole('button', { name: 'Set the password' }).click();
    await again.getByText('This link has expired or was already used. Ask for a new one.').waitFor({ timeout: 30_000 });
    expect(await again.getByRole('link', { name: 'Ask for a new link' }).count()).toBe(1);
    await again.close();
  });

  it('the reset page without a token says the link is incomplete and offers a new one', async () => {
    const page = await demo.browser.newPage({ viewport: PHONE });
    await page.goto(`${demo.url}/reset`);
    await page.getByText('This link is incomplete').waitFor({ timeout: 30_000 });
    await page.getByRole('link', { name: 'Ask for a new link' }).click();
    await page.getByRole('button', { name: 'Send the link' }).waitFor({ timeout: 30_000 });
    await page.close();
  });
});
