import request from 'supertest';
import { buildPlayer, buildShopWorld, buildUser } from '@/fixtures/builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

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

describe('/api/shop/margins', () => {
  it('GET as a fitter gives the defaults (carry 3 yd, smash 0.01) and no right to edit', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get('/api/shop/margins');
    expect(res.status).toBe(200);
    expect(res.body.margins.carry).toBeCloseTo(3 * YD, 12);
    expect(res.body.margins.smashFactor).toBe(0.01);
    expect(res.body.fairwayWidthM).toBeCloseTo(30 * YD, 12);
    expect(res.body.greenRadiusM).toBeCloseTo(12 * YD, 12);
    expect(res.body.canEdit).toBe(false);
    expect(res.body.custom).toEqual({});
  });

  it('GET without signing in answers 401, as a player 403', async () => {
    expect((await request(ctx.app).get('/api/shop/margins')).status).toBe(401);
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.get('/api/shop/margins')).status).toBe(403);
  });

  it('PUT as the owner sets the shop’s margins and odds; the rest keep the defaults', async () => {
    const owner = await signedInAgent(ctx.app, world.owner.email);
    const res = await owner.put('/api/shop/margins').set(APP_HEADER).send({ margins: { carry: 5 * YD, spinRate: 250 }, fairwayWidthM: 25 });
    expect(res.status).toBe(200);
    expect(res.body.canEdit).toBe(true);
    expect(res.body.margins.carry).toBeCloseTo(5 * YD, 12);
    expect(res.body.margins.spinRate).toBe(250);
    expect(res.body.margins.offline).toBeCloseTo(3 * YD, 12);
    expect(res.body.fairwayWidthM).toBe(25);
    const again = await (await signedInAgent(ctx.app, world.fitter.email)).get('/api/shop/margins');
    expect(again.body.custom).toEqual({ carry: 5 * YD, spinRate: 250 });
  });

  it('PUT by one shop’s owner leaves another shop’s margins alone', async () => {
    const rivalOwner = await signedInAgent(ctx.app, rival.owner.email);
    expect((await rivalOwner.put('/api/shop/margins').set(APP_HEADER).send({ margins: { carry: 9 } })).status).toBe(200);
    const ours = await (await signedInAgent(ctx.app, world.owner.email)).get('/api/shop/margins');
    expect(ours.body.margins.carry).not.toBe(9);
    const theirs = await rivalOwner.get('/api/shop/margins');
    expect(theirs.body.margins.carry).toBe(9);
  });

  it('PUT as a fitter or a player answers 403', async () => {
    const fitter = await signedInAgent(ctx.app, world.fitter.email);
    expect((await fitter.put('/api/shop/margins').set(APP_HEADER).send({ margins: { carry: 4 } })).status).toBe(403);
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.put('/api/shop/margins').set(APP_HEADER).send({ margins: { carry: 4 } })).status).toBe(403);
  });

  it.each([{ margins: { carry: -1 } }, { margins: { carry: 1000 } }, { margins: { nope: 1 } }, { fairwayWidthM: 2 }, { margins: { carry: 'far' } }, { extra: 1 }])(
    'PUT with %j answers 400',
    async (body) => {
      const owner = await signedInAgent(ctx.app, world.owner.email);
      const res = await owner.put('/api/shop/margins').set(APP_HEADER).send(body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
    },
  );

  it('PUT without signing in answers 401; an unknown shop path answers 404', async () => {
    expect((await request(ctx.app).put('/api/shop/margins').set(APP_HEADER).send({ margins: {} })).status).toBe(401);
    const owner = await signedInAgent(ctx.app, world.owner.email);
    expect((await owner.get('/api/shop/nope')).status).toBe(404);
  });

  it('GET as another player of the shop answers 403 too', async () => {
    const user = await buildUser(world.shop, 'player');
    await buildPlayer(world.shop, { userId: user.id });
    const other = await signedInAgent(ctx.app, user.email);
    expect((await other.get('/api/shop/margins')).status).toBe(403);
  });
});
