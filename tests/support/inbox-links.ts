/**
 * Reading the messages a browser test's SMTP capture received: their text with quoted-printable
 * undone, and the first link of a kind in the last message to an address.
 */
import type { Page } from 'playwright-core';

/** The message's text with quoted-printable soft line breaks and "=" undone. */
export const plainMessage = (raw: string) => raw.replace(/=\r?\n/g, '').replace(/=3D/g, '=');

/** The link matching `pattern` in the last message to `to` (waits up to 15 s for it to arrive). */
export async function linkFor(received: readonly string[], to: string, pattern: RegExp): Promise<string> {
  for (let i = 0; i < 150; i++) {
    const message = received.map(plainMessage).filter((m) => m.includes(`To: ${to}`)).at(-1);
    const link = message ? pattern.exec(message)?.[0] : undefined;
    if (link) return link;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No link for ${to}`);
}

/** Sets a password on the invitation page and sends it. */
export async function choosePassword(page: Page, password: string): Promise<void> {
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByLabel('Password again').fill(password);
  await page.getByRole('button', { name: 'Set the password and sign in' }).click();
}
