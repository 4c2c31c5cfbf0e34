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
