/**
 * A remote fitting through the routes: the course, the intake, messages with their unread
 * count, the shop's public request page and the player's plain words. E-mail is caught by a
 * recording mailer; the message and request limits are small so a test can spend them.
 */
import request from 'supertest';
import type { Agent } from 'supertest';
import { RateLimiterMemory } from 'rate-limiter-flexible';
import { Build, Fitting, FittingCourseStep, Player } from '@/server/models';
import { closeApp, createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import type { MailMessage } from '@/server/services/mailer';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { buildPlayerWithAccount, importCsv } from '@/fixtures/bag-builders';
import { createTestDatabase } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

type Who = 'playerA' | 'playerB' | 'fitter' | 'owner' | 'rivalFitter' | 'rivalOwner';
let app: ReturnType<typeof createApp>;
let drop: () => Promise<void>;
const mail: MailMessage[] = [];
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let as: Record<Who, Agent>;
let sequelize: Awaited<ReturnType<typeof createTestDatabase>>['sequelize'];

const intake = { handedness: 'left', heightCm: 183, wristToFloorCm: 88, handicap: 14.2, usualMiss: 'Right with the driver', ballFlightNow: 'High and short', ballFlightWanted: 'Lower and longer', wishes: 'Fewer lost balls' };

beforeAll(async () => {
  const db = await createTestDatabase();
  sequelize = db.sequelize;
  drop = db.drop;
  const config = loadConfig({ NODE_ENV: 'test', JWT_SECRET: 'test-secret-test-secret-test-secret-00', SIGN_IN_LIMIT: '1000', DB_PORT: String(db.db.port), DB_NAME: db.db.name, DB_USER: db.db.user, DB_PASSWORD: db.db.password, APP_URL: 'http://ovalyard.test' });
  app = createApp({
    sequelize,
    config,
    mailer: { async send(m) { mail.push(m); } },
    log: () => {},
    fittingLimits: { messages: new RateLimiterMemory({ points: 6, duration: 600 }), requests: new RateLimiterMemory({ points: 2, duration: 86_400 }) },
  });
  world = await buildShopWorld();
  rival = await buildShopWorld();
  await Player.update({ email: 'player-a@test.example' }, { where: { id: world.player.id } });
  const b = await buildPlayerWithAccount(world.shop);
  as = {
    playerA: await signedInAgent(app, world.playerUser.email),
    playerB: await signedInAgent(app, b.user.email),
    fitter: await signedInAgent(app, world.fitter.email),
    owner: await signedInAgent(app, world.owner.email),
    rivalFitter: await signedInAgent(app, rival.fitter.email),
    rivalOwner: await signedInAgent(app, rival.owner.email),
  };
});
afterAll(async () => {
  await closeApp(app);
  await drop();
});

async function remoteFitting() {
  const res = await as.fitter.post('/api/fittings').set(APP_HEADER).send({ playerId: world.player.id, date: '2026-12-01', venue: 'indoor', remote: true });
  expect(res.status).toBe(201);
  return res.body as { id: string; courseStep: string };
}
const UNKNOWN = '00000000-0000-4000-8000-000000000000';

describe('the course of a fitting', () => {
  it('POST /api/fittings remote, opens it at "requested" with one dated step and e-mails the player what to send; in the bay at "in progress", no e-mail', async () => {
    mail.length = 0;
    const f = await remoteFitting();
    expect(mail.map((m) => [m.to, m.subject])).toEqual([['player-a@test.example', expect.stringMatching(/^Your fitter opened a remote fitting/)]]);
    expect(mail[0].text).toContain(`http://ovalyard.test/fittings/${f.id}`);
    expect(f.courseStep).toBe('requested');
    const course = await as.playerA.get(`/api/fittings/${f.id}/course`);
    expect(course.status).toBe(200);
    expect(course.body.step).toBe('requested');
    expect(course.body.entries).toHaveLength(1);
    expect(Date.parse(course.body.entries[0].at)).toBeGreaterThan(Date.now() - 60_000);
    mail.length = 0;
    const bay = await as.fitter.post('/api/fittings').set(APP_HEADER).send({ playerId: world.player.id, date: '2026-12-01', venue: 'indoor' });
    expect(mail).toEqual([]);
    expect(bay.body.courseStep).toBe('in-progress');
  });

  it('POST course, staff moving on one step, answers 200, dates the step and e-mails the player', async () => {
    const f = await remoteFitting();
    mail.length = 0;
    const res = await as.owner.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'in-progress' });
    expect(res.status).toBe(200);
    expect(res.body.step).toBe('in-progress');
    expect(res.body.entries.map((e: { step: string }) => e.step)).toEqual(['requested', 'in-progress']);
    expect(mail.map((m) => m.to)).toEqual(['player-a@test.example']);
    expect(mail[0].text).toContain(`http://ovalyard.test/fittings/${f.id}`);
  });

  it('POST course, a step that is not next, one reached elsewhere, or back without a reason, answers 409, 409 and 400 and changes nothing', async () => {
    const f = await remoteFitting();
    expect((await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'built' })).status).toBe(409);
    await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'in-progress' });
    const sent = await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'recommendation-sent' });
    expect(sent.status).toBe(409);
    expect(sent.body.error.code).toBe('COURSE_STEP');
    const back = await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'requested' });
    expect(back.status).toBe(400);
    expect(back.body.error.code).toBe('REASON_NEEDED');
    expect((await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'sideways' })).status).toBe(400);
    expect(await FittingCourseStep.count({ where: { fittingId: f.id } })).toBe(2);
  });

  it('POST course back with a reason answers 200 and keeps the reason with the step', async () => {
    const f = await remoteFitting();
    await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'in-progress' });
    const res = await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'requested', reason: 'The file had no carry column; please send another.' });
    expect(res.status).toBe(200);
    expect(res.body.entries.at(-1)).toMatchObject({ step: 'requested', direction: 'back', reason: 'The file had no carry column; please send another.' });
  });

  it('course routes by role answer 401 anonymous, 403 a player moving it, 404 another player, another shop and an unknown fitting', async () => {
    const f = await remoteFitting();
    expect((await request(app).get(`/api/fittings/${f.id}/course`)).status).toBe(401);
    expect((await as.playerA.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'in-progress' })).status).toBe(403);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) {
      expect((await as[who].get(`/api/fittings/${f.id}/course`)).status).toBe(404);
    }
    expect((await as.rivalOwner.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'in-progress' })).status).toBe(404);
    expect((await as.fitter.get(`/api/fittings/${UNKNOWN}/course`)).status).toBe(404);
  });

  it('GET /api/fittings?step= lists only the fittings at that step', async () => {
    const f = await remoteFitting();
    await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to: 'in-progress' });
    const requested = await as.fitter.get('/api/fittings?step=requested');
    expect(requested.status).toBe(200);
    expect(requested.body.every((x: { courseStep: string }) => x.courseStep === 'requested')).toBe(true);
    expect(requested.body.some((x: { id: string }) => x.id === f.id)).toBe(false);
    expect((await as.fitter.get('/api/fittings?step=somewhere')).status).toBe(400);
  });
});

describe('the intake', () => {
  it('PUT intake as the player answers 200, copies the measures to the profile, moves the course and e-mails the fitter', async () => {
    const f = await remoteFitting();
    mail.length = 0;
    const res = await as.playerA.put(`/api/fittings/${f.id}/intake`).set(APP_HEADER).send(intake);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ heightCm: 183, wristToFloorCm: 88, handedness: 'left' });
    expect(await Player.findByPk(world.player.id)).toMatchObject({ heightCm: 183, wristToFloorCm: 88, handedness: 'left', handicap: 14.2 });
    expect((await Fitting.findByPk(f.id))!.courseStep).toBe('intake-done');
    expect(mail.map((m) => m.to)).toEqual([world.fitter.email]);
    expect((await as.fitter.get(`/api/fittings/${f.id}/intake`)).body.intake).toMatchObject({ wishes: 'Fewer lost balls' });
  });

  it.each([
    [{ heightCm: 300 }, 'heightCm'],
    [{ heightCm: 170, wristToFloorCm: 175 }, 'wristToFloorCm'],
    [{ heightCm: 180, wristToFloorCm: 119 }, 'wristToFloorCm'],
    [{ handicap: 55 }, 'handicap'],
    [{ handicap: -11 }, 'handicap'],
    [{ handedness: 'both' }, 'handedness'],
  ])('PUT intake with %j answers 400 naming %s, and stores nothing', async (patch, field) => {
    const f = await remoteFitting();
    const res = await as.playerA.put(`/api/fittings/${f.id}/intake`).set(APP_HEADER).send({ ...intake, ...patch });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string[] }) => d.path[0])).toContain(field);
    expect((await as.playerA.get(`/api/fittings/${f.id}/intake`)).body.intake).toBeNull();
  });

  it('intake routes by role: 401 anonymous, 403 staff writing, 404 another player and another shop, 409 a fitting in the bay', async () => {
    const f = await remoteFitting();
    expect((await request(app).put(`/api/fittings/${f.id}/intake`).send(intake)).status).toBe(401);
    expect((await as.fitter.put(`/api/fittings/${f.id}/intake`).set(APP_HEADER).send(intake)).status).toBe(403);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(`/api/fittings/${f.id}/intake`)).status).toBe(404);
    expect((await as.playerB.put(`/api/fittings/${f.id}/intake`).set(APP_HEADER).send(intake)).status).toBe(404);
    const bay = await buildFitting(world.shop, world.player, world.fitter);
    expect((await as.playerA.put(`/api/fittings/${bay.id}/intake`).set(APP_HEADER).send(intake)).status).toBe(409);
  });
});

describe('messages', () => {
  it('POST a message each way: 201, the other side is e-mailed, and the unread count counts only the other side’s until read', async () => {
    const f = await remoteFitting();
    mail.length = 0;
    const fromPlayer = await as.playerA.post(`/api/fittings/${f.id}/messages`).set(APP_HEADER).send({ body: '<b>Is</b> the 7 iron in?' });
    expect(fromPlayer.status).toBe(201);
    expect(fromPlayer.body).toMatchObject({ body: '<b>Is</b> the 7 iron in?', fromPlayer: true, mine: true });
    expect(mail.map((m) => m.to)).toEqual([world.fitter.email]);
    expect(mail[0].html).toBeUndefined();
    expect((await as.playerA.get(`/api/fittings/${f.id}/messages`)).body.unread).toBe(0);
    expect((await as.fitter.get(`/api/fittings/${f.id}/messages`)).body.unread).toBe(1);
    expect((await as.fitter.get('/api/fittings')).body.find((x: { id: string }) => x.id === f.id).unreadMessages).toBe(1);
    await as.fitter.post(`/api/fittings/${f.id}/messages/read`).set(APP_HEADER);
    expect((await as.fitter.get(`/api/fittings/${f.id}`)).body.unreadMessages).toBe(0);
    await as.owner.post(`/api/fittings/${f.id}/messages`).set(APP_HEADER).send({ body: 'Yes, it is in.' });
    expect(mail.at(-1)!.to).toBe('player-a@test.example');
    expect((await as.playerA.get(`/api/fittings/${f.id}`)).body.unreadMessages).toBe(1);
    const list = await as.playerA.get(`/api/fittings/${f.id}/messages`);
    expect(list.body.messages.map((m: { body: string }) => m.body)).toEqual(['<b>Is</b> the 7 iron in?', 'Yes, it is in.']);
  });

  it('POST a message empty, too long or with control characters answers 400 and stores nothing', async () => {
    const f = await remoteFitting();
    for (const body of ['   ', 'x'.repeat(2001), 'bell\u0007', 42]) {
      expect((await as.playerA.post(`/api/fittings/${f.id}/messages`).set(APP_HEADER).send({ body })).status).toBe(400);
    }
    expect((await as.playerA.get(`/api/fittings/${f.id}/messages`)).body.messages).toEqual([]);
  });

  it('messages by role: 401 anonymous, 404 another player, another shop and an unknown fitting', async () => {
    const f = await remoteFitting();
    expect((await request(app).get(`/api/fittings/${f.id}/messages`)).status).toBe(401);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) {
      expect((await as[who].get(`/api/fittings/${f.id}/messages`)).status).toBe(404);
      expect((await as[who].post(`/api/fittings/${f.id}/messages`).set(APP_HEADER).send({ body: 'hello' })).status).toBe(404);
      expect((await as[who].post(`/api/fittings/${f.id}/messages/read`).set(APP_HEADER)).status).toBe(404);
    }
    expect((await as.fitter.get(`/api/fittings/${UNKNOWN}/messages`)).status).toBe(404);
  });

  it('POST messages past the limit (six in ten minutes here) answers 429 TOO_MANY_ATTEMPTS', async () => {
    const f = await buildFitting(world.shop, world.player, world.fitter, { remote: true });
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) statuses.push((await as.playerB.post(`/api/fittings/${f.id}/messages`).set(APP_HEADER).send({ body: `n ${i}` })).status);
    expect(statuses).toEqual([404, 404, 404, 404, 404, 404, 404]); // another's fitting spends nothing
    const own = [] as number[];
    for (let i = 0; i < 7; i++) own.push((await as.fitter.post(`/api/fittings/${f.id}/messages`).set(APP_HEADER).send({ body: `n ${i}` })).status);
    expect(own).toEqual([201, 201, 201, 201, 201, 201, 429]);
  });
});

describe('the public request page', () => {
  it('GET /api/shop/request-link as staff gives one link; anyone reads the shop’s name from it; a player of the shop requests a fitting (201, "requested", the fitter… or owners e-mailed)', async () => {
    const link = await as.owner.get('/api/shop/request-link');
    expect(link.status).toBe(200);
    expect((await as.fitter.get('/api/shop/request-link')).body.slug).toBe(link.body.slug);
    const page = await request(app).get(`/api/requests/${link.body.slug}`);
    expect(page.status).toBe(200);
    expect(page.body).toEqual({ shopName: world.shop.name, slug: link.body.slug });
    mail.length = 0;
    const made = await as.playerA.post(`/api/requests/${link.body.slug}`).set(APP_HEADER).send({ note: 'My driver goes right.' });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ remote: true, courseStep: 'requested', playerId: world.player.id, notes: 'My driver goes right.' });
    expect(mail.map((m) => m.to)).toEqual([world.owner.email]);
  });

  it('request routes by role: 401 anonymous asking, 403 staff, 404 another shop’s player and an unknown link, 400 a malformed link, 429 past the daily limit', async () => {
    const slug = (await as.owner.get('/api/shop/request-link')).body.slug as string;
    expect((await request(app).post(`/api/requests/${slug}`).send({})).status).toBe(401);
    expect((await as.fitter.post(`/api/requests/${slug}`).set(APP_HEADER).send({})).status).toBe(403);
    expect((await as.rivalOwner.post(`/api/requests/${slug}`).set(APP_HEADER).send({})).status).toBe(404);
    expect((await request(app).get('/api/requests/no-such-shop-000000')).status).toBe(404);
    expect((await request(app).get('/api/requests/Not%20A%20Link')).status).toBe(400);
    expect((await request(app).get('/api/shop/request-link')).status).toBe(401);
    expect((await as.playerA.get('/api/shop/request-link')).status).toBe(403);
    expect((await as.playerB.post(`/api/requests/${slug}`).set(APP_HEADER).send({})).status).toBe(201);
    expect((await as.playerB.post(`/api/requests/${slug}`).set(APP_HEADER).send({})).status).toBe(201);
    expect((await as.playerB.post(`/api/requests/${slug}`).set(APP_HEADER).send({})).status).toBe(429);
  });
});

describe('plain words and the sheet on the course', () => {
  const CSV = [
    'Club,Build,Carry (m),Side (m),Ball Speed (m/s),Club Speed (m/s)',
    ...[0, 1, 2, 3, 4, 5].flatMap((i) => [`Driver,55 g shaft,${200 + (i % 3)},${(i % 3) - 1},65,45`, `Driver,65 g shaft,${206 + (i % 3)},${(i % 3) - 1},66,45`]),
  ].join('\n');

  it('GET plain-words as the player: the chosen build in words, no statistics; sending and accepting the sheet move the course', async () => {
    const f = await remoteFitting();
    const fitting = (await Fitting.findByPk(f.id))!;
    await importCsv(sequelize, world.fitter, fitting, CSV);
    const chosen = (await Build.findOne({ where: { fittingId: f.id, label: '65 g shaft' } }))!;
    expect((await as.fitter.put(`/api/fittings/${f.id}/chosen-builds`).set(APP_HEADER).send({ builds: [{ buildId: chosen.id }] })).status).toBe(200);
    const words = await as.playerA.get(`/api/fittings/${f.id}/plain-words`);
    expect(words.status).toBe(200);
    expect(words.body.choices[0].headline).toMatch(/^The 65 g shaft: \d+ yd longer/);
    expect(JSON.stringify(words.body)).not.toMatch(/p =|Welch|modified z/);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(`/api/fittings/${f.id}/plain-words`)).status).toBe(404);
    expect((await request(app).get(`/api/fittings/${f.id}/plain-words`)).status).toBe(401);

    const sent = await as.fitter.post(`/api/fittings/${f.id}/spec-sheet/send`).set(APP_HEADER);
    expect(sent.status).toBe(200);
    expect((await as.playerA.get(`/api/fittings/${f.id}/course`)).body.step).toBe('recommendation-sent');
    mail.length = 0;
    expect((await as.playerA.post(`/api/spec-sheets/${sent.body.id}/accept`).set(APP_HEADER)).status).toBe(200);
    expect((await as.playerA.get(`/api/fittings/${f.id}/course`)).body.step).toBe('accepted');
    expect(mail.map((m) => m.to)).toEqual([world.fitter.email]);
    for (const to of ['built', 'delivered']) expect((await as.fitter.post(`/api/fittings/${f.id}/course`).set(APP_HEADER).send({ to })).status).toBe(200);
    const course = (await as.playerA.get(`/api/fittings/${f.id}/course`)).body;
    expect(course.entries.map((e: { step: string }) => e.step)).toEqual(['requested', 'recommendation-sent', 'accepted', 'built', 'delivered']);
  });
});
