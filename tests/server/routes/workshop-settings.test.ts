import request from 'supertest';
import type { Agent } from 'supertest';
import { buildShopWorld } from '@/fixtures/builders';
import { buildBagClub } from '@/fixtures/bag-builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let as: Record<'player' | 'fitter' | 'owner' | 'rivalFitter' | 'rivalOwner', Agent>;

beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
  as = {
    player: await signedInAgent(ctx.app, world.playerUser.email),
    fitter: await signedInAgent(ctx.app, world.fitter.email),
    owner: await signedInAgent(ctx.app, world.owner.email),
    rivalFitter: await signedInAgent(ctx.app, rival.fitter.email),
    rivalOwner: await signedInAgent(ctx.app, rival.owner.email),
  };
});
afterAll(async () => {
  await ctx.close();
});

const body = {
  wedgeWearRounds: 30,
  wedgeWearPracticeSessions: 50,
  staticFitTable: [{ heightFromCm: null, heightToCm: null, wristFromCm: null, wristToCm: null, lengthChangeIn: 0.5 }],
};

describe('/api/workshop-settings', () => {
  it('GET answers 401 anonymous, 403 a player, 200 staff with the defaults until the owner saves', async () => {
    expect((await request(ctx.app).get('/api/workshop-settings')).status).toBe(401);
    expect((await as.player.get('/api/workshop-settings')).status).toBe(403);
    const res = await as.fitter.get('/api/workshop-settings');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ isDefault: true, wedgeWearRounds: 75, wedgeWearPracticeSessions: 100 });
    expect(res.body.staticFitTable.length).toBeGreaterThan(10);
  });

  it('PUT as the owner answers 200 and the shop’s bags use it; another shop keeps its own', async () => {
    const res = await as.owner.put('/api/workshop-settings').set(APP_HEADER).send(body);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ...body, isDefault: false });
    const wedge = await buildBagClub(world.player, 'W52', { loftDeg: 52, roundsSince: 31 });
    const bag = (await as.player.get(`/api/players/${world.player.id}/bag`)).body;
    expect(bag.clubs.find((c: { id: string }) => c.id === wedge.id).wear.over).toEqual(['rounds']);
    expect(bag.staticFit).toMatchObject({ lengthChangeIn: 0.5, lieChangeDeg: 1 });
    expect((await as.rivalOwner.get('/api/workshop-settings')).body).toMatchObject({ isDefault: true, wedgeWearRounds: 75 });
    expect((await as.rivalFitter.get('/api/workshop-settings')).body.isDefault).toBe(true);
  });

  it('PUT answers 401 anonymous, 403 a fitter or a player, 400 naming a bad field', async () => {
    expect((await request(ctx.app).put('/api/workshop-settings').set(APP_HEADER).send(body)).status).toBe(401);
    expect((await as.fitter.put('/api/workshop-settings').set(APP_HEADER).send(body)).status).toBe(403);
    expect((await as.player.put('/api/workshop-settings').set(APP_HEADER).send(body)).status).toBe(403);
    const bad = await as.owner.put('/api/workshop-settings').set(APP_HEADER).send({ ...body, wedgeWearRounds: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toEqual(['wedgeWearRounds']);
    const empty = await as.owner.put('/api/workshop-settings').set(APP_HEADER).send({ ...body, staticFitTable: [] });
    expect(empty.status).toBe(400);
    expect(empty.body.error.details[0].path).toEqual(['staticFitTable']);
  });
});
