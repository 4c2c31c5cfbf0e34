/**
 * Spec sheets through the routes, with e-mail over a real SMTP exchange: nodemailer (SMTP_URL)
 * to a local smtp-server on loopback.
 */
import request from 'supertest';
import type { Agent } from 'supertest';
import { Build, Player } from '@/server/models';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { buildBagClub, buildPlayerWithAccount, importCsv } from '@/fixtures/bag-builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';
import { useSmtpCapture } from '../../support/smtp-capture';

let ctx: TestContext;
const smtp = useSmtpCapture();
const received = smtp.received;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let as: Record<'playerA' | 'playerB' | 'fitter' | 'owner' | 'rivalFitter' | 'rivalOwner', Agent>;

const CSV = [
  'Club,Build,Carry (m),Side (m),Ball Speed (m/s),Club Speed (m/s)',
  ...[0, 1, 2, 3, 4].flatMap((i) => [`Driver,Low spin,${200 + i},${i - 2},65,45`, `Driver,Loft up,${205 + i},${(i - 2) / 2},66,45`]),
].join('\n');

beforeAll(async () => {
  // The links name the HTTPS address; the agents talk plain HTTP on loopback, so cookies go without
  // the Secure flag here (with APP_URL on https they would get it, and a browser would keep them
  // off plain HTTP).
  ctx = await createTestContext({ SMTP_URL: smtp.url(), APP_URL: 'https://ovalyard.test', COOKIE_SECURE: '0' });
  world = await buildShopWorld();
  rival = await buildShopWorld();
  await Player.update({ email: 'player-a@test.example' }, { where: { id: world.player.id } });
  const b = await buildPlayerWithAccount(world.shop);
  as = {
    playerA: await signedInAgent(ctx.app, world.playerUser.email),
    playerB: await signedInAgent(ctx.app, b.user.email),
    fitter: await signedInAgent(ctx.app, world.fitter.email),
    owner: await signedInAgent(ctx.app, world.owner.email),
    rivalFitter: await signedInAgent(ctx.app, rival.fitter.email),
    rivalOwner: await signedInAgent(ctx.app, rival.owner.email),
  };
});
afterAll(async () => {
  await ctx.close();
});

/** A fitting of world.player with a session, a driver in the bag and the 'Loft up' build chosen. */
async function chosenFitting() {
  const fitting = await buildFitting(world.shop, world.player, world.fitter);
  await importCsv(ctx.sequelize, world.fitter, fitting, CSV);
  const loftUp = (await Build.findOne({ where: { fittingId: fitting.id, club: 'DR', label: 'Loft up' } }))!;
  await loftUp.update({ loftDeg: 11.5, lengthIn: 46.5, addedMassG: 6, addedMassWhere: 'heel' });
  await buildBagClub(world.player, 'DR', { loftDeg: 10.5 });
  const put = await as.fitter.put(`/api/fittings/${fitting.id}/chosen-builds`).set(APP_HEADER).send({ builds: [{ buildId: loftUp.id }] });
  expect(put.status).toBe(200);
  return fitting;
}

describe('GET /api/fittings/:id/spec-sheet', () => {
  it('GET as staff answers 200 with the draft: the chosen build, its figures against the other build, the ladder, the notes and the caution', async () => {
    const fitting = await chosenFitting();
    const res = await as.owner.get(`/api/fittings/${fitting.id}/spec-sheet`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: null, state: 'draft', playerName: world.player.name, takenOut: [] });
    const [choice] = res.body.choices;
    expect(choice).toMatchObject({ club: 'DR', clubLabel: 'Driver', buildLabel: 'Loft up', change: { kind: 'replace', replacedClubLabel: 'Driver' } });
    expect(choice.spec).toMatchObject({ loftDeg: 11.5, lengthIn: 46.5, addedMassG: 6 });
    // carries 205–209 m: median 207; against Low spin (200–204 m) +5 m
    expect(choice.figures).toMatchObject({ n: 5, carryMedianM: 207, rival: { label: 'Low spin', carryDiffM: 5 }, onTargetOdds: null });
    // the head-to-head's sentence in the fitter's yards: 5 m = 5.47 yd (1 yd = 0.9144 m, NIST SP 811)
    expect(choice.figures.summary).toMatch(/^Loft up carries 5\.5 yd farther \(clear\)/);
    expect(res.body.checks.map((c: { code: string }) => c.code)).toContain('over-46-local-rule');
    expect(res.body.ladder.find((r: { club: string }) => r.club === 'DR')).toMatchObject({ carrySource: 'hit', carryM: 207 });
    expect(res.body.caution).toMatch(/head maker’s instructions/);
  });

  it('GET answers 401 anonymous, 404 for the player while it is a draft, another player and another shop', async () => {
    const fitting = await chosenFitting();
    const url = `/api/fittings/${fitting.id}/spec-sheet`;
    expect((await request(ctx.app).get(url)).status).toBe(401);
    for (const who of ['playerA', 'playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(url)).status).toBe(404);
    expect((await as.fitter.get(url)).status).toBe(200);
    expect((await as.fitter.get('/api/fittings/nope/spec-sheet')).status).toBe(400);
    expect((await as.fitter.get('/api/fittings/00000000-0000-4000-8000-000000000000/spec-sheet')).status).toBe(404);
    expect((await as.fitter.post('/api/fittings/nope/spec-sheet/send').set(APP_HEADER)).status).toBe(400);
    expect((await as.playerA.post('/api/spec-sheets/nope/accept').set(APP_HEADER)).status).toBe(400);
  });
});

describe('POST /api/fittings/:id/spec-sheet/send and the sent sheet', () => {
  it('send e-mails the player the link and the PDF with a copy to the shop; the player reads it, gets the PDF and accepts it', async () => {
    const fitting = await chosenFitting();
    received.length = 0;
    const sent = await as.fitter.post(`/api/fittings/${fitting.id}/spec-sheet/send`).set(APP_HEADER);
    expect(sent.status).toBe(200);
    expect(sent.body).toMatchObject({ state: 'sent', id: expect.any(String), sentAt: expect.any(String) });
    const id = sent.body.id as string;

    expect(received).toHaveLength(1);
    const mail = received[0].replace(/=\r?\n/g, ''); // undo quoted-printable soft line breaks
    expect(mail).toMatch(/To: player-a@test\.example/);
    expect(mail).toMatch(new RegExp(`Cc: .*${world.owner.email.replace('.', '\\.')}`));
    expect(mail).toMatch(/Subject: Your spec sheet from/);
    expect(mail).toMatch(new RegExp(`https://ovalyard\\.test/spec-sheets/${id}`));
    expect(mail).toMatch(/Content-Type: application\/pdf;\s+name=spec-sheet-/);
    expect(mail).toMatch(/JVBERi0/); // base64 of "%PDF-": the attachment is a PDF

    const sheet = await as.playerA.get(`/api/spec-sheets/${id}`);
    expect(sheet.status).toBe(200);
    expect((await as.playerA.get(`/api/fittings/${fitting.id}/spec-sheet`)).body.id).toBe(id);
    const pdf = await as.playerA.get(`/api/spec-sheets/${id}/pdf`).buffer(true);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(Buffer.from(pdf.body).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const letter = await as.fitter.get(`/api/spec-sheets/${id}/pdf`).query({ paper: 'letter' }).buffer(true);
    expect(Buffer.from(letter.body).toString('latin1')).toMatch(/\/MediaBox \[0 0 612 792\]/); // US Letter, 8½ × 11 in in points

    const accepted = await as.playerA.post(`/api/spec-sheets/${id}/accept`).set(APP_HEADER);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ state: 'accepted', acceptedAt: expect.any(String) });
    const resend = await as.fitter.post(`/api/fittings/${fitting.id}/spec-sheet/send`).set(APP_HEADER);
    expect(resend.status).toBe(409);
    expect(resend.body.error.code).toBe('SPEC_SHEET_ACCEPTED');
  });

  it('send answers 401 anonymous, 403 the player, 404 another shop, 400 with nothing chosen or no e-mail address', async () => {
    const fitting = await chosenFitting();
    const url = `/api/fittings/${fitting.id}/spec-sheet/send`;
    expect((await request(ctx.app).post(url).set(APP_HEADER)).status).toBe(401);
    expect((await as.playerA.post(url).set(APP_HEADER)).status).toBe(403);
    expect((await as.rivalOwner.post(url).set(APP_HEADER)).status).toBe(404);
    const empty = await buildFitting(world.shop, world.player, world.fitter);
    const nothing = await as.fitter.post(`/api/fittings/${empty.id}/spec-sheet/send`).set(APP_HEADER);
    expect(nothing.status).toBe(400);
    expect(nothing.body.error.code).toBe('NOTHING_CHOSEN');
    const noMail = await buildFitting(world.shop, world.otherPlayer, world.fitter);
    const res = await as.fitter.post(`/api/fittings/${noMail.id}/spec-sheet/send`).set(APP_HEADER);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('PLAYER_HAS_NO_EMAIL');
  });

  it('the sent sheet, its PDF and accept answer 401, 404 for another player, another shop and an unknown id, 400 a bad id or paper, 403 staff accepting', async () => {
    const fitting = await chosenFitting();
    const id = (await as.owner.post(`/api/fittings/${fitting.id}/spec-sheet/send`).set(APP_HEADER)).body.id as string;
    for (const url of [`/api/spec-sheets/${id}`, `/api/spec-sheets/${id}/pdf`]) {
      expect((await request(ctx.app).get(url)).status).toBe(401);
      for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(url)).status).toBe(404);
      for (const who of ['fitter', 'owner', 'playerA'] as const) expect((await as[who].get(url)).status).toBe(200);
    }
    expect((await as.fitter.get('/api/spec-sheets/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await as.fitter.get('/api/spec-sheets/nope')).status).toBe(400);
    expect((await as.fitter.get(`/api/spec-sheets/${id}/pdf`).query({ paper: 'a3' })).status).toBe(400);
    const accept = `/api/spec-sheets/${id}/accept`;
    expect((await request(ctx.app).post(accept).set(APP_HEADER)).status).toBe(401);
    expect((await as.fitter.post(accept).set(APP_HEADER)).status).toBe(403);
    expect((await as.owner.post(accept).set(APP_HEADER)).status).toBe(403);
    expect((await as.playerB.post(accept).set(APP_HEADER)).status).toBe(404);
    expect((await as.rivalOwner.post(accept).set(APP_HEADER)).status).toBe(403);
  });
});
