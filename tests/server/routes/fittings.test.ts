import request from 'supertest';
import { buildFitting, buildPlayer, buildShop, buildShopWorld, buildUser } from '@/fixtures/builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
});
afterAll(async () => {
  await ctx.close();
});

const body = () => ({ playerId: world.player.id, date: '2026-11-28', venue: 'outdoor', temperatureC: 14, altitudeM: 350, humidityPct: 70, groundFirmness: 'firm', ball: 'urethane', notes: 'range day' });

describe('/api/fittings', () => {
  it('GET without a session answers 401', async () => {
    expect((await request(ctx.app).get('/api/fittings')).status).toBe(401);
  });

  it('GET as a fitter lists their shop’s fittings with player and fitter names', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get('/api/fittings');
    expect(res.status).toBe(200);
    expect(res.body.map((f: { id: string }) => f.id).sort()).toEqual([world.fitting.id, world.otherFitting.id].sort());
    expect(res.body[0]).toMatchObject({ fitterName: world.fitter.name, shotCount: 0 });
  });

  it('GET as a player lists only their own fittings', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    const res = await agent.get('/api/fittings');
    expect(res.body.map((f: { id: string }) => f.id)).toEqual([world.fitting.id]);
    expect((await agent.get(`/api/fittings/${world.otherFitting.id}`)).status).toBe(404);
    expect((await agent.get(`/api/fittings/${world.fitting.id}`)).status).toBe(200);
  });

  it('GET ?playerId= filters to one player', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    const res = await agent.get('/api/fittings').query({ playerId: world.otherPlayer.id });
    expect(res.body.map((f: { id: string }) => f.id)).toEqual([world.otherFitting.id]);
  });

  it('GET /:id of another shop’s fitting answers 404', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    expect((await agent.get(`/api/fittings/${rival.fitting.id}`)).status).toBe(404);
  });

  it('POST as a fitter creates a fitting run by them by default', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post('/api/fittings').set(APP_HEADER).send(body());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ...body(), fitterId: world.fitter.id, playerName: world.player.name, remote: false });
  });

  it('POST for another shop’s player answers 400 naming playerId', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post('/api/fittings').set(APP_HEADER).send({ ...body(), playerId: rival.player.id });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toEqual(['playerId']);
  });

  it('POST naming another shop’s fitter answers 400', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    const res = await agent.post('/api/fittings').set(APP_HEADER).send({ ...body(), fitterId: rival.fitter.id });
    expect(res.status).toBe(400);
  });

  it('POST as a player answers 403', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await agent.post('/api/fittings').set(APP_HEADER).send(body())).status).toBe(403);
  });

  it.each([
    [{ date: '28/11/2026' }, 'date'],
    [{ venue: 'garage' }, 'venue'],
    [{ humidityPct: 140 }, 'humidityPct'],
    [{ temperatureC: 90 }, 'temperatureC'],
    [{ groundFirmness: 'muddy' }, 'groundFirmness'],
  ])('POST with %j answers 400 naming the field', async (patch, field) => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post('/api/fittings').set(APP_HEADER).send({ ...body(), ...patch });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string[] }) => d.path[0])).toContain(field);
  });

  it('PATCH as a fitter changes only the keys sent', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const before = (await agent.get(`/api/fittings/${world.otherFitting.id}`)).body;
    const res = await agent.patch(`/api/fittings/${world.otherFitting.id}`).set(APP_HEADER).send({ notes: 'moved bays' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ...before, notes: 'moved bays', updatedAt: expect.any(String) });
  });

  it('PATCH of the ground firmness stores it, and null clears it', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const soft = await agent.patch(`/api/fittings/${world.otherFitting.id}`).set(APP_HEADER).send({ groundFirmness: 'soft' });
    expect(soft.status).toBe(200);
    expect((await agent.get(`/api/fittings/${world.otherFitting.id}`)).body.groundFirmness).toBe('soft');
    const cleared = await agent.patch(`/api/fittings/${world.otherFitting.id}`).set(APP_HEADER).send({ groundFirmness: null });
    expect(cleared.body.groundFirmness).toBeNull();
  });

  it('PATCH as a player or another shop answers 403 / 404', async () => {
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.patch(`/api/fittings/${world.fitting.id}`).set(APP_HEADER).send({ notes: 'x' })).status).toBe(403);
    const rivalOwner = await signedInAgent(ctx.app, rival.owner.email);
    expect((await rivalOwner.patch(`/api/fittings/${world.fitting.id}`).set(APP_HEADER).send({ notes: 'x' })).status).toBe(404);
  });
});

describe('GET /api/fittings search, date range and order', () => {
  // A shop of its own: three invented players, four fittings on known dates.
  let shop: { owner: string; fitter: string; player: string; ids: Record<string, string> };
  beforeAll(async () => {
    const s = await buildShop();
    const owner = await buildUser(s, 'owner');
    const fitter = await buildUser(s, 'fitter');
    const playerUser = await buildUser(s, 'player');
    const alma = await buildPlayer(s, { name: 'Alma Rudge', userId: playerUser.id });
    const bram = await buildPlayer(s, { name: 'Bram Colley' });
    const cara = await buildPlayer(s, { name: 'Cara 100%_Almsworth' });
    const ids = {
      alma1: (await buildFitting(s, alma, fitter, { date: '2026-03-02' })).id,
      alma2: (await buildFitting(s, alma, fitter, { date: '2026-06-15' })).id,
      bram: (await buildFitting(s, bram, fitter, { date: '2026-04-20' })).id,
      cara: (await buildFitting(s, cara, fitter, { date: '2026-01-10' })).id,
    };
    shop = { owner: owner.email, fitter: fitter.email, player: playerUser.email, ids };
  });
  const ids = (res: { body: { id: string }[] }) => res.body.map((f) => f.id);

  it('GET /api/fittings, no sort given, lists newest first', async () => {
    const agent = await signedInAgent(ctx.app, shop.fitter);
    const { alma1, alma2, bram, cara } = shop.ids;
    expect(ids(await agent.get('/api/fittings'))).toEqual([alma2, bram, alma1, cara]);
  });

  it('GET /api/fittings?q=, part of a player name in any case, finds only that player’s fittings', async () => {
    const agent = await signedInAgent(ctx.app, shop.fitter);
    const res = await agent.get('/api/fittings').query({ q: 'rUDG' });
    expect(res.status).toBe(200);
    expect(ids(res)).toEqual([shop.ids.alma2, shop.ids.alma1]);
  });

  it('GET /api/fittings?q=, LIKE wildcards typed by a user, are matched literally', async () => {
    const agent = await signedInAgent(ctx.app, shop.owner);
    expect(ids(await agent.get('/api/fittings').query({ q: '%_A' }))).toEqual([shop.ids.cara]);
    expect(ids(await agent.get('/api/fittings').query({ q: '%' }))).toEqual([shop.ids.cara]);
    expect(ids(await agent.get('/api/fittings').query({ q: 'Al_a' }))).toEqual([]);
  });

  it('GET /api/fittings?from=&to=, an inclusive date range, keeps the fittings on its end dates', async () => {
    const agent = await signedInAgent(ctx.app, shop.fitter);
    const res = await agent.get('/api/fittings').query({ from: '2026-03-02', to: '2026-04-20' });
    expect(ids(res)).toEqual([shop.ids.bram, shop.ids.alma1]);
    expect(ids(await agent.get('/api/fittings').query({ from: '2026-05-01' }))).toEqual([shop.ids.alma2]);
    expect(ids(await agent.get('/api/fittings').query({ to: '2026-01-10' }))).toEqual([shop.ids.cara]);
  });

  it('GET /api/fittings?sort=, by date or by player either way, orders the list', async () => {
    const agent = await signedInAgent(ctx.app, shop.fitter);
    const { alma1, alma2, bram, cara } = shop.ids;
    expect(ids(await agent.get('/api/fittings').query({ sort: 'date-asc' }))).toEqual([cara, alma1, bram, alma2]);
    // by player name, each player's fittings newest first
    expect(ids(await agent.get('/api/fittings').query({ sort: 'player-asc' }))).toEqual([alma2, alma1, bram, cara]);
    expect(ids(await agent.get('/api/fittings').query({ sort: 'player-desc' }))).toEqual([cara, bram, alma2, alma1]);
  });

  it('GET /api/fittings, filters combined with a player’s own scope, never shows another player’s fittings', async () => {
    const agent = await signedInAgent(ctx.app, shop.player);
    expect(ids(await agent.get('/api/fittings').query({ q: 'Bram' }))).toEqual([]);
    expect(ids(await agent.get('/api/fittings').query({ sort: 'date-asc' }))).toEqual([shop.ids.alma1, shop.ids.alma2]);
  });

  it('GET /api/fittings, another shop searching the names, finds none of them', async () => {
    const agent = await signedInAgent(ctx.app, rival.owner.email);
    expect(ids(await agent.get('/api/fittings').query({ q: 'Alma' }))).toEqual([]);
  });

  it.each([
    ['sort', { sort: 'price' }],
    ['from', { from: '2026-13-01' }],
    ['to', { to: 'yesterday' }],
    ['to', { from: '2026-05-01', to: '2026-04-01' }],
    ['q', { q: 'x'.repeat(101) }],
    ['playerId', { playerId: 'not-an-id' }],
  ])('GET /api/fittings, a bad %s, answers 400 naming it', async (field, query) => {
    const agent = await signedInAgent(ctx.app, shop.fitter);
    const res = await agent.get('/api/fittings').query(query);
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string[] }) => d.path[0])).toContain(field);
  });

  it('GET /api/fittings, a search given twice (an array), answers 400', async () => {
    const agent = await signedInAgent(ctx.app, shop.fitter);
    expect((await agent.get('/api/fittings?q=a&q=b')).status).toBe(400);
  });

  it('GET /api/fittings with filters and no session answers 401', async () => {
    expect((await request(ctx.app).get('/api/fittings').query({ q: 'Alma', sort: 'player-asc' })).status).toBe(401);
  });
});
