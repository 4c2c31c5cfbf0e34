/**
 * A remote fitting in the browser, on the demo: the fitter opens it; the player, on a phone,
 * answers the intake (an impossible height refused first), adds a club to the bag and sends a
 * launch-monitor file; the fitter reads the intake, moves the course on, chooses a build and
 * sends the spec sheet; the player reads the builds in plain words (no statistics on the page)
 * and accepts; a message each way, with the unread count on the lists.
 */
import path from 'node:path';
import { Player } from '@/server/models';
import { DESKTOP, PHONE, signInAs, useDemoInBrowser } from '../support/browser';

jest.setTimeout(300_000);

const demo = useDemoInBrowser();
const FILE = path.resolve(__dirname, '../../fixtures/bay-files/semicolon-decimal-comma.csv');
const FITTER = 'oskar@larchmere.example';
const PLAYER = 'nell.tarrant@example.net';

describe('a remote fitting in the browser', () => {
  it('fitter opens it, the player answers the intake with a bag club and a file, the sheet is sent and accepted, messages go both ways', async () => {
    const nell = (await Player.findOne({ where: { name: 'Nell Tarrant' } }))!;

    // the fitter opens a remote fitting with the existing form
    const desk = await demo.browser.newPage({ viewport: DESKTOP });
    await signInAs(desk, demo.url, FITTER);
    await desk.goto(`${demo.url}/fittings/new?playerId=${nell.id}`);
    await desk.getByRole('switch', { name: /Remote fitting/ }).click();
    await desk.getByRole('button', { name: 'Create fitting' }).click();
    await desk.waitForURL(/\/fittings\/[0-9a-f-]{36}/, { timeout: 30_000 });
    const fittingId = /\/fittings\/([0-9a-f-]{36})/.exec(desk.url())![1];
    await desk.getByText('Waiting for the player’s intake (or start without it).').waitFor({ timeout: 30_000 });

    // the player, on a phone: the intake, refused field by field, then sent
    const phone = await demo.browser.newPage({ viewport: PHONE });
    await signInAs(phone, demo.url, PLAYER);
    await phone.goto(`${demo.url}/fittings/${fittingId}`);
    await phone.getByRole('button', { name: 'Your intake' }).click();
    await phone.getByText('Measuring wrist to floor').waitFor({ timeout: 30_000 });
    await phone.getByLabel('Height').fill('300'); // inches: the demo player reads imperial units
    await phone.getByRole('button', { name: 'Send the intake' }).click();
    await phone.getByRole('alert').filter({ hasText: /^A height over 230 cm/ }).first().waitFor({ timeout: 10_000 }); // under the field itself
    await phone.getByLabel('Height').fill('66');
    await phone.getByLabel('Wrist to floor').fill('32');
    await phone.getByLabel('How the ball flies now').fill('High, curving right');
    await phone.getByLabel('How you want it to fly').fill('Lower and straighter');
    await phone.getByRole('button', { name: 'Send the intake' }).click();
    await phone.getByText('Thank you: your intake is in.').waitFor({ timeout: 30_000 });

    // the bag: one club added with the bag editor
    await phone.getByRole('button', { name: 'Your bag' }).click();
    await phone.getByRole('button', { name: 'Add a club' }).click();
    await phone.getByLabel('Club', { exact: true }).selectOption('5W');
    await phone.getByLabel(/Carry, entered/).fill('185');
    await phone.getByRole('button', { name: 'Save' }).click();
    await phone.waitForURL((u) => !u.pathname.endsWith('/new'), { timeout: 30_000 });

    // the player's own launch-monitor file, through the mapping step
    await phone.goto(`${demo.url}/fittings/${fittingId}/import`);
    const chooser = phone.waitForEvent('filechooser');
    await phone.getByRole('button', { name: 'Choose a bay file' }).click();
    await (await chooser).setFiles(FILE);
    const commit = phone.getByRole('button', { name: 'Import the bay file', disabled: false });
    await commit.waitFor({ timeout: 60_000 });
    await commit.click();
    await phone.getByText('4 shots imported').waitFor({ timeout: 30_000 });

    // the fitter sees the intake and the shots, and starts
    await desk.goto(`${demo.url}/fittings/${fittingId}/intake`);
    await desk.getByText('Lower and straighter').waitFor({ timeout: 30_000 });
    await desk.goto(`${demo.url}/fittings/${fittingId}`);
    await desk.getByText('The intake is in: start the fitting.').waitFor({ timeout: 30_000 });
    await desk.getByRole('button', { name: 'Mark “In progress”' }).click();
    await desk.getByText('Choose the builds and send the spec sheet.').waitFor({ timeout: 30_000 });

    // a build chosen and the sheet sent
    await desk.goto(`${demo.url}/fittings/${fittingId}?view=builds`);
    await desk.getByLabel('Chosen build, 7 iron').selectOption({ label: 'Steel 105 S' });
    await desk.getByRole('button', { name: 'Propose the bag changes' }).click();
    await desk.getByText(/the 7 iron \(Steel 105 S\)/).first().waitFor({ timeout: 30_000 });
    await desk.goto(`${demo.url}/fittings/${fittingId}/spec-sheet`);
    await desk.getByRole('button', { name: /Send (to the player|again)/ }).click();
    await desk.getByText('Sent to Nell Tarrant, with a copy to the shop.').waitFor({ timeout: 30_000 });

    // the player reads plain words, no statistics, and accepts
    await phone.goto(`${demo.url}/fittings/${fittingId}`);
    await phone.getByRole('heading', { name: 'Your builds' }).waitFor({ timeout: 30_000 });
    await phone.getByText(/^Steel 105 S: /).first().waitFor({ timeout: 30_000 });
    await phone.getByRole('heading', { name: 'Where your shots land' }).waitFor({ timeout: 30_000 });
    const words = await phone.locator('body').innerText();
    expect(words).not.toMatch(/p = |p=|Welch|modified z/);
    await phone.getByRole('button', { name: 'Read and accept your spec sheet' }).click();
    await phone.getByRole('button', { name: 'Accept the spec sheet' }).click();
    await phone.getByText(/Accepted by the player/).waitFor({ timeout: 30_000 });

    // a message from the player; the fitter sees it unread, reads it and answers
    await phone.goto(`${demo.url}/fittings/${fittingId}/messages`);
    await phone.getByLabel('Your message').fill('<b>Is</b> the steel shaft too heavy for winter?');
    const posted = phone.waitForResponse((r) => r.url().endsWith('/messages') && r.request().method() === 'POST');
    await phone.getByRole('button', { name: 'Send', exact: true }).click();
    expect((await posted).status()).toBe(201); // the e-mail goes before the answer
    await phone.getByText('<b>Is</b> the steel shaft too heavy for winter?').waitFor({ timeout: 30_000 });
    expect(demo.mail.filter((m) => m.text.includes('too heavy for winter')).map((m) => m.to)).toEqual([FITTER]);

    await desk.goto(`${demo.url}/fittings`);
    await desk.getByText('1 unread message').first().waitFor({ timeout: 30_000 });
    await desk.goto(`${demo.url}/fittings/${fittingId}/messages`);
    await desk.getByText('<b>Is</b> the steel shaft too heavy for winter?').waitFor({ timeout: 30_000 });
    await desk.getByLabel('Your message').fill('No: it suits your speed. We build it this week.');
    const replied = desk.waitForResponse((r) => r.url().endsWith('/messages') && r.request().method() === 'POST');
    await desk.getByRole('button', { name: 'Send', exact: true }).click();
    expect((await replied).status()).toBe(201);
    await desk.getByText('No: it suits your speed. We build it this week.').waitFor({ timeout: 30_000 });
    expect(demo.mail.filter((m) => m.text.includes('suits your speed')).map((m) => m.to)).toEqual([PLAYER]);
    await desk.goto(`${demo.url}/fittings/${fittingId}`);
    await desk.getByRole('button', { name: 'Mark “Built”' }).click();
    await desk.getByText('Built: mark it delivered when the player has the clubs.').waitFor({ timeout: 30_000 });

    await phone.goto(`${demo.url}/my-fittings`);
    await phone.getByText('1 unread message').first().waitFor({ timeout: 30_000 });
    await phone.goto(`${demo.url}/fittings/${fittingId}`);
    await phone.getByText('Your clubs are built.').waitFor({ timeout: 30_000 });
    await desk.close();
    await phone.close();
  });
});
