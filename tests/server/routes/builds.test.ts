import request from 'supertest';
import { buildFitting, buildPlayer, buildShopWorld, buildUser } from '@/fixtures/builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let playerB: string;
let buildId: string;
let fittingId: string;
beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
  const userB = await buildUser(world.shop, 'player');
  await buildPlayer(world.shop, { userId: userB.id });
  playerB = userB.email;
  // player A's fitting with one invented bay file: a driver under one build name
  const fitting = await buildFitting(world.shop, world.player, world.fitter);
  fittingId = fitting.id;
  const csv = ['Club,Build,Carry (m),Side (m)', 'Driver,Test head A,201,2 R', 'Driver,Test head A,205,1 L', 'Driver,Test head A,199,3 R'].join('\n');
  const fitter = await signedInAgent(ctx.app, world.fitter.email);
  const up = await fitter.post(`/api/fittings/${fitting.id}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', Buffer.from(csv), 'a.csv');
  expect(up.status).toBe(201);
  const builds = (await fitter.get(`/api/fittings/${fitting.id}/builds`)).body as { id: string }[];
  buildId = builds[0].id;
  expect((await fitter.patch(`/api/builds/${buildId}`).set(APP_HEADER).send({ loftDeg: 10.5 })).status).toBe(200);
});
afterAll(async () => {
  await ctx.close();
});

describe('GET /api/builds/:id', () => {
  it('GET /api/builds/:id, the shop’s fitter and owner, answers 200 with the build and its fitting', async () => {
    for (const email of [world.fitter.email, world.owner.email]) {
      const res = await (await signedInAgent(ctx.app, email)).get(`/api/builds/${buildId}`);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ id: buildId, fittingId, club: 'DR', label: 'Test head A', loftDeg: 10.5 });
    }
  });

  it('GET /api/builds/:id, the fitting’s own player A, answers 200 (players read their builds)', async () => {
    const res = await (await signedInAgent(ctx.app, world.playerUser.email)).get(`/api/builds/${buildId}`);
    expect(res.status).toBe(200);
    expect(res.body.id).toBe(buildId);
  });

  it('GET /api/builds/:id, player B of the same shop and another shop’s fitter and owner, answers 404', async () => {
    for (const email of [playerB, rival.fitter.email, rival.owner.email]) {
      expect((await (await signedInAgent(ctx.app, email)).get(`/api/builds/${buildId}`)).status).toBe(404);
    }
  });

  it('GET /api/builds/:id, no session 401, a bad id 400, an unknown id 404', async () => {
    expect((await request(ctx.app).get(`/api/builds/${buildId}`)).status).toBe(401);
    const fitter = await signedInAgent(ctx.app, world.fitter.email);
    expect((await fitter.get('/api/builds/nope')).status).toBe(400);
    expect((await fitter.get('/api/builds/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});
