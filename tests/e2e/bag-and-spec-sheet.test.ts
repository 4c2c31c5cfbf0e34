/**
 * The whole path in the browser: a fitter chooses a build on a fitting, confirms the bag change,
 * sees the new bag and its ladder, sends the spec sheet — which goes over a real SMTP exchange to
 * a test server on loopback, PDF attached — and the player opens it on a phone and accepts it.
 */
import fs from 'node:fs';
import path from 'node:path';
import { Build, Fitting, Player, User } from '@/server/models';
import { createMailer } from '@/server/services/mailer';
import { importCsv } from '@/fixtures/bag-builders';
import { DESKTOP, PHONE, signInAs, useDemoInBrowser } from '../support/browser';
import { plainMessage as plain } from '../support/inbox-links';
import { useSmtpCapture } from '../support/smtp-capture';

jest.setTimeout(240_000);

const smtp = useSmtpCapture();
const received = smtp.received;

const demo = useDemoInBrowser({ mailer: () => createMailer(smtp.url(), 'Ovalyard <no-reply@ovalyard.invalid>') });

// A new fitting of the invented demo player Nell Tarrant with the demo's driver and 7 iron session.
let fittingId = '';
beforeAll(async () => {
  const nell = (await Player.findOne({ where: { name: 'Nell Tarrant' } }))!;
  const oskar = (await User.findOne({ where: { email: 'oskar@larchmere.example' } }))!;
  const fitting = await Fitting.create({ shopId: nell.shopId, playerId: nell.id, fitterId: oskar.id, date: new Date().toISOString().slice(0, 10), venue: 'indoor', temperatureC: 18, altitudeM: 40, humidityPct: 55, ball: null, notes: 'Second look at the driver.', remote: false });
  const csv = fs.readFileSync(path.resolve(__dirname, '../../fixtures/demo/nell-driver-and-7-iron.csv'), 'utf8');
  await importCsv(Fitting.sequelize!, oskar, fitting, csv);
  await Build.update({ loftDeg: 11.5, hoselSetting: '+1', lengthIn: 45.75, addedMassG: 6, addedMassWhere: 'heel' }, { where: { fittingId: fitting.id, club: 'DR', label: 'Loft up + heel 6 g' } });
  fittingId = fitting.id;
});

describe('from a fitting to the bag and the spec sheet in the browser', () => {
  it('a demo fitter chooses the driver build, confirms the bag change and sends the sheet; it arrives with its PDF; the player accepts it on a phone', async () => {
    const page = await demo.browser.newPage({ viewport: DESKTOP });
    await signInAs(page, demo.url, 'oskar@larchmere.example');
    await page.goto(`${demo.url}/fittings/${fittingId}?view=builds`);
    await page.getByRole('heading', { name: 'Chosen for the bag' }).waitFor({ timeout: 30_000 });

    await page.getByLabel('Chosen build, driver').selectOption({ label: 'Loft up + heel 6 g' });
    await page.getByRole('button', { name: 'Propose the bag changes' }).click();
    await page.getByText(/Replace the driver, 11\.5° with the driver \(Loft up \+ heel 6 g\)/).waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Confirm the changes' }).click();
    await page.getByText(/In the bag since/).waitFor({ timeout: 30_000 });

    // the new bag and its ladder
    await page.getByRole('button', { name: 'Open the bag' }).click();
    await page.getByRole('heading', { name: 'Ladder' }).waitFor({ timeout: 30_000 });
    await page.getByText('On order').first().waitFor();
    await page.getByRole('img', { name: /Bag ladder: \d+ clubs/ }).waitFor();
    await page.goBack();

    // the spec sheet, sent to the player
    await page.getByRole('button', { name: 'Spec sheet', exact: true }).click();
    await page.getByText('Why this build').first().waitFor({ timeout: 30_000 });
    await page.getByText(/head maker’s instructions/).first().waitFor();
    await page.getByRole('button', { name: /Send (to the player|again)/ }).click();
    await page.getByText('Sent to Nell Tarrant, with a copy to the shop.').waitFor({ timeout: 30_000 });

    // the message, over SMTP: to the player, a copy to the shop, the link and the PDF
    const mail = plain(received[received.length - 1] ?? '');
    expect(mail).toMatch(/To: nell\.tarrant@example\.net/);
    expect(mail).toMatch(/Cc: .*hedda@larchmere\.example/);
    expect(mail).toMatch(/Content-Type: application\/pdf;\s+name=spec-sheet-Nell-Tarrant-/);
    expect(mail).toMatch(/JVBERi0/); // base64 of "%PDF-"
    const link = /https?:\/\/[^\s]+\/spec-sheets\/[0-9a-f-]{36}/.exec(mail)?.[0];
    expect(link).toBeTruthy();
    await page.close();

    // the player on a phone
    const phone = await demo.browser.newPage({ viewport: PHONE });
    await signInAs(phone, demo.url, 'nell.tarrant@example.net');
    await phone.goto(`${demo.url}${new URL(link!).pathname}`);
    await phone.getByText('Why this build').first().waitFor({ timeout: 30_000 });
    await phone.getByRole('button', { name: 'Accept the spec sheet' }).click();
    await phone.getByText(/Accepted by the player/).waitFor({ timeout: 30_000 });
    await phone.close();
  });
});
