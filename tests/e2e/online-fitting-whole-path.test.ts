/**
 * The whole online fitting in one go, on a fresh install without the demo (as DEMO_SEED=0 serves
 * it), tried as new users would: an owner signs up and confirms by e-mail, invites a fitter and a
 * player (each through the inbox, a real SMTP exchange to a test server on loopback); the fitter
 * opens a remote fitting and the player is told by e-mail; the player, on a phone, answers the intake as a left-hander, adds a club
 * to the bag and sends a launch-monitor file that writes club path and face for the player's
 * hand; the fitter analyses it, chooses a build and sends the spec sheet; the player accepts it.
 * On the way: nobody reaches a screen or a record that is not theirs.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Player } from '@/server/models';
import { createMailer } from '@/server/services/mailer';
import { DESKTOP, PHONE, signInAs, useDemoInBrowser } from '../support/browser';
import { choosePassword, linkFor as linkIn, plainMessage as plain } from '../support/inbox-links';
import { useSmtpCapture } from '../support/smtp-capture';

jest.setTimeout(420_000);

const smtp = useSmtpCapture();
const linkFor = (to: string, pattern: RegExp) => linkIn(smtp.received, to, pattern);

const site = useDemoInBrowser({ demo: false, mailer: () => createMailer(smtp.url(), 'Ovalyard <no-reply@ovalyard.invalid>') });

const INVITE = /https?:\/\/[^\s]+\/invite\/[A-Za-z0-9_-]+/;

/**
 * An invented left-hander's 7-iron session with two shafts, as a monitor writes it for the
 * player's hand: a positive club path is in-to-out and a positive face is open for this player
 * (for a left-hander both point left of the target line); the ball's side is on the ground.
 */
function leftHandersFile(): string {
  const lines = ['Club,Shaft,Ball Speed (mph),Club Speed (mph),Launch Angle (deg),Spin Rate (rpm),Carry (yds),Offline (yds L-/R+),Club Path (deg),Face Angle (deg)'];
  for (let i = 0; i < 16; i++) {
    const steel = i % 2 === 0;
    const k = Math.floor(i / 2);
    const ball = (steel ? 117.0 : 114.6) + ((k * 7) % 5) * 0.4;
    const club = ball / 1.36;
    const launch = (steel ? 16.4 : 17.6) + ((k * 3) % 4) * 0.3;
    const spin = (steel ? 6150 : 6480) + ((k * 5) % 6) * 40;
    const carry = (steel ? 165 : 160) + ((k * 3) % 5);
    const offline = (steel ? 2 : 5) + ((k * 2) % 5) - 2; // to the right: a left-hander's draw curving right
    const path = 3 + ((k * 3) % 4) * 0.4;
    const face = 1 + ((k * 5) % 3) * 0.3;
    lines.push(`7 Iron,${steel ? 'Steel 105 S' : 'Graphite 75 R'},${ball.toFixed(1)},${club.toFixed(1)},${launch.toFixed(1)},${spin},${carry},${offline},${path.toFixed(1)},${face.toFixed(1)}`);
  }
  return lines.join('\n') + '\n';
}

describe('online fitting, the whole path on a fresh install', () => {
  it('sign-up, invitations by e-mail, intake with bag and file from a phone, analysis, spec sheet sent and accepted', async () => {
    // the owner starts the shop on a phone
    const owner = await site.browser.newPage({ viewport: PHONE });
    await owner.goto(site.url);
    await owner.getByText('New shop? Start here').click();
    await owner.waitForURL((u) => u.pathname === '/sign-up', { timeout: 30_000 });
    await owner.reload();
    await owner.getByLabel('Shop name').fill('Heronsgate Fitting Loft');
    await owner.getByLabel('Your name').fill('Maren Ostby');
    await owner.getByLabel('E-mail').fill('maren@heronsgate.example');
    await owner.getByLabel('Password').fill('lantern orchard pebble');
    await owner.getByRole('button', { name: 'Create the shop' }).click();
    await owner.getByText('Check your inbox').waitFor({ timeout: 30_000 });
    await owner.goto(await linkFor('maren@heronsgate.example', /https?:\/\/[^\s]+\/verify\?token=[A-Za-z0-9_-]+/));
    await owner.getByText('Your address is confirmed. Sign in to open your shop.').waitFor({ timeout: 30_000 });
    await signInAs(owner, site.url, 'maren@heronsgate.example', 'lantern orchard pebble');
    await owner.waitForURL((u) => u.pathname === '/players', { timeout: 30_000 });

    // a fitter and a player invited by e-mail
    await owner.goto(`${site.url}/team/new`);
    await owner.getByLabel('Name').fill('Tobias Wren');
    await owner.getByLabel('E-mail').fill('tobias@heronsgate.example');
    await owner.getByRole('button', { name: 'Send the invitation' }).click();
    await owner.getByText('Tobias Wren · tobias@heronsgate.example').waitFor({ timeout: 30_000 });
    await owner.goto(`${site.url}/players/new`);
    await owner.getByLabel('Name').fill('Sanna Lowe');
    await owner.getByLabel('E-mail (optional)').fill('sanna@lowe.example');
    await owner.getByRole('button', { name: /Add player|Save/ }).click();
    await owner.getByRole('button', { name: 'Invite to sign in' }).click();
    await owner.getByRole('button', { name: 'Send the invitation' }).click();
    await owner.getByText('Invitation sent to sanna@lowe.example.').waitFor({ timeout: 30_000 });
    // a second player, fitted in the bay, whom Sanna must never see
    await owner.goto(`${site.url}/players/new`);
    await owner.getByLabel('Name').fill('Jonah Pike');
    await owner.getByRole('button', { name: /Add player|Save/ }).click();
    await owner.waitForURL(/\/players\/[0-9a-f-]{36}/, { timeout: 30_000 });
    const jonahId = /\/players\/([0-9a-f-]{36})/.exec(owner.url())![1];
    await owner.close();

    const desk = await site.browser.newPage({ viewport: DESKTOP });
    await desk.goto(await linkFor('tobias@heronsgate.example', INVITE));
    await desk.getByText('Welcome, Tobias Wren').waitFor({ timeout: 30_000 });
    await choosePassword(desk, 'granite willow compass');
    await desk.waitForURL((u) => u.pathname === '/fittings', { timeout: 30_000 });

    const phone = await site.browser.newPage({ viewport: PHONE });
    await phone.goto(await linkFor('sanna@lowe.example', INVITE));
    await phone.getByText('Welcome, Sanna Lowe').waitFor({ timeout: 30_000 });
    await choosePassword(phone, 'meadow ferry thimble');
    await phone.waitForURL((u) => u.pathname === '/my-fittings', { timeout: 30_000 });

    // the fitter opens a remote fitting for the player; she is told by e-mail
    const sanna = (await Player.findOne({ where: { name: 'Sanna Lowe' } }))!;
    await desk.goto(`${site.url}/fittings/new?playerId=${sanna.id}`);
    await desk.getByRole('switch', { name: /Remote fitting/ }).click();
    await desk.getByRole('button', { name: 'Create fitting' }).click();
    await desk.waitForURL(/\/fittings\/[0-9a-f-]{36}/, { timeout: 30_000 });
    const fittingId = /\/fittings\/([0-9a-f-]{36})/.exec(desk.url())![1];
    await desk.getByText('Waiting for the player’s intake (or start without it).').waitFor({ timeout: 30_000 });

    // the player follows the e-mail to the fitting and answers the intake as a left-hander (a new shop reads inches)
    await phone.goto(await linkFor('sanna@lowe.example', new RegExp(`https?://[^\\s]+/fittings/${fittingId}`)));
    await phone.getByRole('button', { name: 'Your intake' }).click();
    await phone.getByRole('radio', { name: 'Left-handed' }).click();
    await phone.getByLabel('Height').fill('40');
    await phone.getByLabel('Wrist to floor').fill('45'); // longer than the height: refused under the field
    await phone.getByRole('button', { name: 'Send the intake' }).click();
    await phone.getByRole('alert').filter({ hasText: /^Wrist-to-floor must be shorter than your height/ }).first().waitFor({ timeout: 10_000 });
    await phone.getByLabel('Height').fill('68');
    await phone.getByLabel('Wrist to floor').fill('33');
    await phone.getByLabel('How the ball flies now').fill('Starts left, stays left');
    await phone.getByLabel('How you want it to fly').fill('A gentle draw');
    await phone.getByRole('button', { name: 'Send the intake' }).click();
    await phone.getByText('Thank you: your intake is in.').waitFor({ timeout: 30_000 });

    // a club of her bag
    await phone.getByRole('button', { name: 'Your bag' }).click();
    await phone.getByRole('button', { name: 'Add a club' }).click();
    await phone.getByLabel('Club', { exact: true }).selectOption('7I');
    await phone.getByLabel(/Carry, entered/).fill('158');
    await phone.getByRole('button', { name: 'Save' }).click();
    await phone.waitForURL((u) => !u.pathname.endsWith('/new'), { timeout: 30_000 });

    // her own file, mapped on the phone: path and face written for her hand
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'ovalyard-')), 'sanna-7-iron.csv');
    fs.writeFileSync(file, leftHandersFile());
    await phone.goto(`${site.url}/fittings/${fittingId}/import`);
    const chooser = phone.waitForEvent('filechooser');
    await phone.getByRole('button', { name: 'Choose a bay file' }).click();
    await (await chooser).setFiles(file);
    // the file does not say which way + points: for a left-hander the page offers her hand's words
    const pathQuestion = phone.getByRole('radiogroup', { name: 'In “Club Path (deg)”, which way does + point?' });
    await pathQuestion.waitFor({ timeout: 30_000 });
    await pathQuestion.getByRole('radio', { name: '+ is in-to-out for this left-hander' }).click();
    await phone.getByLabel('Club Path (deg): whose left and right').waitFor({ timeout: 30_000 });
    expect(await phone.getByLabel('Club Path (deg): whose left and right').inputValue()).toBe('hand');
    // or in two answers: which way + points, then whose left and right
    const faceQuestion = phone.getByRole('radiogroup', { name: 'In “Face Angle (deg)”, which way does + point?' });
    await faceQuestion.waitFor({ timeout: 30_000 });
    await faceQuestion.getByRole('radio', { name: '+ is right, − is left' }).click();
    await phone.getByLabel('Face Angle (deg): whose left and right').selectOption('hand');
    const commit = phone.getByRole('button', { name: 'Import the bay file', disabled: false });
    await commit.waitFor({ timeout: 60_000 });
    await commit.click();
    await phone.getByText('16 shots imported').waitFor({ timeout: 30_000 });

    // stored with + = right: her in-to-out path points left of the target line
    const shots = (await (await desk.request.get(`${site.url}/api/fittings/${fittingId}/shots?limit=100`)).json()) as { shots: { values: { clubPath: number; offline: number } }[] };
    expect(shots.shots).toHaveLength(16);
    expect(shots.shots.every((s) => s.values.clubPath < 0)).toBe(true);
    expect(shots.shots.some((s) => s.values.offline > 0)).toBe(true);

    // the fitter reads the intake, starts, and analyses
    await desk.goto(`${site.url}/fittings/${fittingId}/intake`);
    await desk.getByText('A gentle draw').waitFor({ timeout: 30_000 });
    await desk.goto(`${site.url}/fittings/${fittingId}`);
    await desk.getByRole('button', { name: 'Mark “In progress”' }).click();
    await desk.getByText('Choose the builds and send the spec sheet.').waitFor({ timeout: 30_000 });
    await desk.getByRole('heading', { name: 'Head-to-head' }).waitFor({ timeout: 30_000 });
    // her path and face in her hand's words: in-to-out and open, though both point left of the line
    await desk.getByText(/Path: in-to-out; face: open; finishes: miss right \(left-handed words\)/).first().waitFor({ timeout: 30_000 });

    // a build chosen for the bag, the change confirmed, the sheet sent
    await desk.goto(`${site.url}/fittings/${fittingId}?view=builds`);
    await desk.getByLabel('Chosen build, 7 iron').selectOption({ label: 'Steel 105 S' });
    await desk.getByRole('button', { name: 'Propose the bag changes' }).click();
    await desk.getByRole('button', { name: 'Confirm the changes' }).click();
    await desk.getByText(/In the bag since/).first().waitFor({ timeout: 30_000 });
    await desk.goto(`${site.url}/fittings/${fittingId}/spec-sheet`);
    await desk.getByRole('button', { name: /Send (to the player|again)/ }).click();
    await desk.getByText('Sent to Sanna Lowe, with a copy to the shop.').waitFor({ timeout: 30_000 });
    const sheetLink = await linkFor('sanna@lowe.example', /https?:\/\/[^\s]+\/spec-sheets\/[0-9a-f-]{36}/);
    const sheetMail = plain(smtp.received.filter((m) => m.includes('To: sanna@lowe.example')).at(-1)!);
    expect(sheetMail).toMatch(/Content-Type: application\/pdf/);
    expect(sheetMail).toMatch(/JVBERi0/); // base64 of "%PDF-"

    // the player reads plain words and accepts
    await phone.goto(`${site.url}/fittings/${fittingId}`);
    await phone.getByRole('heading', { name: 'Your builds' }).waitFor({ timeout: 30_000 });
    await phone.getByText(/^Steel 105 S: /).first().waitFor({ timeout: 30_000 });
    expect(await phone.locator('body').innerText()).not.toMatch(/p = |p=|Welch|modified z/);
    await phone.goto(sheetLink); // from her e-mail
    await phone.getByText('Why this build').first().waitFor({ timeout: 30_000 });
    await phone.getByRole('button', { name: 'Accept the spec sheet' }).click();
    await phone.getByText(/Accepted by the player/).waitFor({ timeout: 30_000 });

    // nobody saw what was not theirs: the player's browser cannot open the staff's screens or records
    await phone.goto(`${site.url}/players`);
    await phone.waitForURL((u) => u.pathname !== '/players', { timeout: 30_000 });
    const seen = await phone.request.get(`${site.url}/api/players`);
    expect(((await seen.json()) as { name: string }[]).map((p) => p.name)).toEqual(['Sanna Lowe']);
    expect((await phone.request.get(`${site.url}/api/players/${jonahId}`)).status()).toBe(404);
    expect((await phone.request.get(`${site.url}/api/team`)).status()).toBe(403);
    // and the fitter cannot close or export the shop
    expect((await desk.request.get(`${site.url}/api/shop/export`)).status()).toBe(403);
    await desk.close();
    await phone.close();
  });
});
