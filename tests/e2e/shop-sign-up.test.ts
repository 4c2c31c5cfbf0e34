/**
 * A fresh install without the demo (as DEMO_SEED=0 serves it), tried as new users would: an
 * owner starts a shop from the sign-in page, confirms the address through the inbox (a real SMTP
 * exchange to a test server on loopback), invites a fitter and a player, and each accepts from
 * their own message and lands on their own start page.
 */
import { createMailer } from '@/server/services/mailer';
import { DESKTOP, PHONE, useDemoInBrowser } from '../support/browser';
import { choosePassword, linkFor as linkIn } from '../support/inbox-links';
import { useSmtpCapture } from '../support/smtp-capture';

jest.setTimeout(240_000);

const smtp = useSmtpCapture();
const received = smtp.received;

const linkFor = (to: string, pattern: RegExp) => linkIn(received, to, pattern);

const site = useDemoInBrowser({ demo: false, mailer: () => createMailer(smtp.url(), 'Ovalyard <no-reply@ovalyard.invalid>') });

describe('a shop signs up and invites its people', () => {
  it('the owner signs up and confirms by e-mail; a fitter and a player accept their invitations and land on their start pages', async () => {
    const owner = await site.browser.newPage({ viewport: PHONE });
    await owner.goto(site.url);
    await owner.getByText('New shop? Start here').click();
    await owner.waitForURL((u) => u.pathname === '/sign-up', { timeout: 30_000 });
    await owner.reload(); // the sign-in form stays mounted under the pushed page
    await owner.getByLabel('Shop name').fill('Saltmarsh Club Works');
    await owner.getByLabel('Your name').fill('Ines Calloway');
    await owner.getByLabel('E-mail').fill('ines@saltmarsh.example');
    await owner.getByLabel('Password').fill('tidal copper weathervane');
    await owner.getByRole('button', { name: 'Create the shop' }).click();
    await owner.getByText('Check your inbox').waitFor({ timeout: 30_000 });

    // not before the address is confirmed
    await owner.goto(`${site.url}/sign-in`);
    await owner.getByLabel('E-mail').fill('ines@saltmarsh.example');
    await owner.getByLabel('Password').fill('tidal copper weathervane');
    await owner.getByRole('button', { name: 'Sign in' }).click();
    await owner.getByText(/Confirm your e-mail address first/).waitFor({ timeout: 30_000 });
    await owner.getByRole('button', { name: 'Send the link again' }).waitFor();

    const verify = await linkFor('ines@saltmarsh.example', /https?:\/\/[^\s]+\/verify\?token=[A-Za-z0-9_-]+/);
    await owner.goto(verify);
    await owner.getByText('Your address is confirmed. Sign in to open your shop.').waitFor({ timeout: 30_000 });
    await owner.getByRole('button', { name: 'Sign in' }).click();
    await owner.getByLabel('E-mail').fill('ines@saltmarsh.example');
    await owner.getByLabel('Password').fill('tidal copper weathervane');
    await owner.getByRole('button', { name: 'Sign in' }).click();
    await owner.waitForURL((u) => u.pathname === '/players', { timeout: 30_000 });

    // a fitter, invited from the team page
    await owner.goto(`${site.url}/team/new`);
    await owner.getByLabel('Name').fill('Bastian Reel');
    await owner.getByLabel('E-mail').fill('bastian@saltmarsh.example');
    await owner.getByRole('button', { name: 'Send the invitation' }).click();
    await owner.waitForURL((u) => u.pathname === '/team', { timeout: 30_000 });
    await owner.getByText('Bastian Reel · bastian@saltmarsh.example').waitFor({ timeout: 30_000 });

    // a player, invited from their page
    await owner.goto(`${site.url}/players/new`);
    await owner.getByLabel('Name').fill('Petra Quill');
    await owner.getByLabel('E-mail (optional)').fill('petra@quill.example');
    await owner.getByRole('button', { name: /Add player|Save/ }).click();
    await owner.getByRole('button', { name: 'Invite to sign in' }).click();
    await owner.getByLabel('E-mail').waitFor({ timeout: 30_000 });
    await owner.getByRole('button', { name: 'Send the invitation' }).click();
    await owner.getByText('Invitation sent to petra@quill.example.').waitFor({ timeout: 30_000 });
    await owner.close();

    const fitterLink = await linkFor('bastian@saltmarsh.example', /https?:\/\/[^\s]+\/invite\/[A-Za-z0-9_-]+/);
    const fitter = await site.browser.newPage({ viewport: DESKTOP });
    await fitter.goto(fitterLink);
    await fitter.getByText('Welcome, Bastian Reel').waitFor({ timeout: 30_000 });
    await choosePassword(fitter, 'granite harbour lantern');
    await fitter.waitForURL((u) => u.pathname === '/fittings', { timeout: 30_000 });
    // the link is used up: one plain message
    await fitter.context().clearCookies();
    await fitter.goto(fitterLink);
    await fitter.getByText(/This invitation link no longer works/).waitFor({ timeout: 30_000 });
    await fitter.close();

    const playerLink = await linkFor('petra@quill.example', /https?:\/\/[^\s]+\/invite\/[A-Za-z0-9_-]+/);
    const player = await site.browser.newPage({ viewport: PHONE });
    await player.goto(playerLink);
    await player.getByText('Welcome, Petra Quill').waitFor({ timeout: 30_000 });
    await choosePassword(player, 'meadow kettle sundial');
    await player.waitForURL((u) => u.pathname === '/my-fittings', { timeout: 30_000 });
    await player.close();
  });
});
