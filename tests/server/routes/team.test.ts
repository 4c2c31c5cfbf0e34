import { buildShopWorld, buildUser } from '@/fixtures/builders';
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

describe('/api/team', () => {
  it('GET as an owner lists the shop’s owner and fitters, no players', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    const res = await agent.get('/api/team');
    expect(res.status).toBe(200);
    expect(res.body.map((m: { id: string }) => m.id).sort()).toEqual([world.owner.id, world.fitter.id].sort());
  });

  it('GET as a player answers 403', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await agent.get('/api/team')).status).toBe(403);
  });

  it('POST as an owner answers 404: fitters join by invitation, nobody sets a password for another (no address is probed either)', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    const res = await agent.post('/api/team').set(APP_HEADER).send({ name: 'Cato Brisk', email: world.fitter.email, password: 'copper lantern orchard' });
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toContain('EMAIL_TAKEN');
  });

  it('PATCH active=false as an owner ends the fitter’s session; another shop’s owner gets 404', async () => {
    const owner = await signedInAgent(ctx.app, world.owner.email);
    const created = { body: await buildUser(world.shop, 'fitter') };
    const lise = await signedInAgent(ctx.app, created.body.email);
    const rivalOwner = await signedInAgent(ctx.app, rival.owner.email);
    expect((await rivalOwner.patch(`/api/team/${created.body.id}`).set(APP_HEADER).send({ active: false })).status).toBe(404);
    const res = await owner.patch(`/api/team/${created.body.id}`).set(APP_HEADER).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    expect((await lise.get('/api/me')).status).toBe(401);
  });
});
