import request from 'supertest';
import { buildShopWorld } from '@/fixtures/builders';
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

const newPlayer = { name: 'Tilde Marrow', handedness: 'left', heightCm: 171, wristToFloorCm: 83, handicap: 8.5, usualMiss: 'thin', goals: 'carry the 5 iron' };

describe('/api/players', () => {
  it('GET without a session answers 401', async () => {
    expect((await request(ctx.app).get('/api/players')).status).toBe(401);
  });

  it('GET as a fitter lists exactly their shop’s players', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get('/api/players');
    expect(res.status).toBe(200);
    const ids = res.body.map((p: { id: string }) => p.id).sort();
    expect(ids).toEqual([world.player.id, world.otherPlayer.id].sort());
    expect(res.body.find((p: { id: string }) => p.id === world.player.id).fittingCount).toBe(1);
  });

  it('GET ?q= as a fitter filters by name and treats % as a literal', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get('/api/players').query({ q: world.otherPlayer.name.slice(-4) });
    expect(res.body.map((p: { id: string }) => p.id)).toEqual([world.otherPlayer.id]);
    expect((await agent.get('/api/players').query({ q: '%' })).body).toEqual([]);
  });

  it('GET ?q= as a fitter also finds a player by e-mail', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const created = await agent.post('/api/players').set(APP_HEADER).send({ ...newPlayer, name: 'Quill Arden', email: 'quill.arden@test.example' });
    const res = await agent.get('/api/players').query({ q: 'quill.arden@' });
    expect(res.body.map((p: { id: string }) => p.id)).toEqual([created.body.id]);
  });

  it('GET as a player lists only their own profile', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    const res = await agent.get('/api/players');
    expect(res.body.map((p: { id: string }) => p.id)).toEqual([world.player.id]);
  });

  it('GET /:id of another shop’s player answers 404 for a fitter and for that shop’s owner', async () => {
    const fitter = await signedInAgent(ctx.app, world.fitter.email);
    expect((await fitter.get(`/api/players/${rival.player.id}`)).status).toBe(404);
    const owner = await signedInAgent(ctx.app, world.owner.email);
    expect((await owner.get(`/api/players/${rival.player.id}`)).status).toBe(404);
  });

  it('GET /:id of another player of the same shop answers 404 for a player', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await agent.get(`/api/players/${world.otherPlayer.id}`)).status).toBe(404);
    expect((await agent.get(`/api/players/${world.player.id}`)).status).toBe(200);
  });

  it('GET /:id with a malformed id answers 400', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    expect((await agent.get('/api/players/not-a-uuid')).status).toBe(400);
  });

  it('POST as a fitter creates a player in their shop', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post('/api/players').set(APP_HEADER).send(newPlayer);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ...newPlayer, shopId: world.shop.id, hasAccount: false, email: null });
    const rivalView = await signedInAgent(ctx.app, rival.fitter.email);
    expect((await rivalView.get(`/api/players/${res.body.id}`)).status).toBe(404);
  });

  it('POST as a player answers 403', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    const res = await agent.post('/api/players').set(APP_HEADER).send(newPlayer);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
  });

  it.each([
    [{ ...newPlayer, name: '' }, 'name'],
    [{ ...newPlayer, handicap: 99 }, 'handicap'],
    [{ ...newPlayer, handedness: 'both' }, 'handedness'],
    [{ ...newPlayer, heightCm: 'tall' }, 'heightCm'],
    [{ ...newPlayer, email: 'nope' }, 'email'],
  ])('POST with a bad body %#  answers 400 naming the field', async (body, field) => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post('/api/players').set(APP_HEADER).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string[] }) => d.path[0])).toContain(field);
  });

  it('PATCH as an owner changes only the keys sent', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    const before = (await agent.get(`/api/players/${world.otherPlayer.id}`)).body;
    const res = await agent.patch(`/api/players/${world.otherPlayer.id}`).set(APP_HEADER).send({ handicap: 3.1 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ...before, handicap: 3.1, updatedAt: expect.any(String) });
  });

  it('PATCH as a player of their own profile answers 403', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await agent.patch(`/api/players/${world.player.id}`).set(APP_HEADER).send({ handicap: 1 })).status).toBe(403);
  });

  it('PATCH of another shop’s player answers 404', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    expect((await agent.patch(`/api/players/${rival.player.id}`).set(APP_HEADER).send({ handicap: 1 })).status).toBe(404);
  });

});
