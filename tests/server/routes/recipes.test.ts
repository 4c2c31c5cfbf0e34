import request from 'supertest';
import { buildPlayer, buildShopWorld, buildUser } from '@/fixtures/builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let playerB: string;
beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
  const userB = await buildUser(world.shop, 'player');
  await buildPlayer(world.shop, { userId: userB.id });
  playerB = userB.email;
});
afterAll(async () => {
  await ctx.close();
});

/** An invented recipe: carry in yards, offline with L/R letters. */
const RECIPE = { columns: { Club: { field: 'club' }, 'Carry (yds)': { field: 'carry', unit: 'yd' }, 'Side (yds)': { field: 'offline', unit: 'yd', side: 'suffix-LR' } } };

async function saveRecipe(name: string): Promise<string> {
  const owner = await signedInAgent(ctx.app, world.owner.email);
  const res = await owner.post('/api/recipes').set(APP_HEADER).send({ name, recipe: RECIPE });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

describe('GET /api/recipes/:id', () => {
  it('GET /api/recipes/:id, the shop’s owner and fitter, answers 200 with the mapping', async () => {
    const id = await saveRecipe('Bay 1 export');
    for (const email of [world.owner.email, world.fitter.email]) {
      const res = await (await signedInAgent(ctx.app, email)).get(`/api/recipes/${id}`);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ id, name: 'Bay 1 export', recipe: RECIPE });
    }
  });

  it('GET /api/recipes/:id, players A and B, answers 403; no session 401', async () => {
    const id = await saveRecipe('Bay 1 players');
    for (const email of [world.playerUser.email, playerB]) {
      expect((await (await signedInAgent(ctx.app, email)).get(`/api/recipes/${id}`)).status).toBe(403);
    }
    expect((await request(ctx.app).get(`/api/recipes/${id}`)).status).toBe(401);
  });

  it('GET /api/recipes/:id, another shop’s owner and fitter or an unknown id, answers 404; a bad id 400', async () => {
    const id = await saveRecipe('Bay 1 rivals');
    for (const email of [rival.owner.email, rival.fitter.email]) {
      expect((await (await signedInAgent(ctx.app, email)).get(`/api/recipes/${id}`)).status).toBe(404);
    }
    const owner = await signedInAgent(ctx.app, world.owner.email);
    expect((await owner.get('/api/recipes/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await owner.get('/api/recipes/not-an-id')).status).toBe(400);
  });
});

describe('PATCH /api/recipes/:id', () => {
  it('PATCH /api/recipes/:id, the owner with a new name, answers 200 and the list shows it', async () => {
    const id = await saveRecipe('Old name');
    const owner = await signedInAgent(ctx.app, world.owner.email);
    const res = await owner.patch(`/api/recipes/${id}`).set(APP_HEADER).send({ name: '  Bay 2, new monitor  ' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id, name: 'Bay 2, new monitor', recipe: RECIPE });
    const list = await owner.get('/api/recipes');
    expect(list.body.map((r: { name: string }) => r.name)).toContain('Bay 2, new monitor');
    expect(list.body.map((r: { name: string }) => r.name)).not.toContain('Old name');
  });

  it('PATCH /api/recipes/:id, an empty or too long name, answers 400 naming the field', async () => {
    const id = await saveRecipe('Name checks');
    const owner = await signedInAgent(ctx.app, world.owner.email);
    for (const name of ['   ', 'x'.repeat(121)]) {
      const res = await owner.patch(`/api/recipes/${id}`).set(APP_HEADER).send({ name });
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toEqual(['name']);
    }
    expect((await owner.patch(`/api/recipes/${id}`).set(APP_HEADER).send({})).status).toBe(400);
  });

  it('PATCH /api/recipes/:id, a name the shop already uses, answers 409 RECIPE_NAME_TAKEN', async () => {
    await saveRecipe('Taken');
    const id = await saveRecipe('Free');
    const owner = await signedInAgent(ctx.app, world.owner.email);
    const res = await owner.patch(`/api/recipes/${id}`).set(APP_HEADER).send({ name: 'Taken' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('RECIPE_NAME_TAKEN');
  });

  it('PATCH /api/recipes/:id, a fitter or a player, answers 403; no session 401', async () => {
    const id = await saveRecipe('Owner manages');
    for (const email of [world.fitter.email, world.playerUser.email, playerB]) {
      const agent = await signedInAgent(ctx.app, email);
      expect((await agent.patch(`/api/recipes/${id}`).set(APP_HEADER).send({ name: 'Mine now' })).status).toBe(403);
    }
    expect((await request(ctx.app).patch(`/api/recipes/${id}`).set(APP_HEADER).send({ name: 'Mine now' })).status).toBe(401);
  });

  it('PATCH /api/recipes/:id, another shop’s owner, answers 404 and the name stays', async () => {
    const id = await saveRecipe('Not theirs');
    const agent = await signedInAgent(ctx.app, rival.owner.email);
    expect((await agent.patch(`/api/recipes/${id}`).set(APP_HEADER).send({ name: 'Stolen' })).status).toBe(404);
    expect((await agent.patch(`/api/recipes/00000000-0000-4000-8000-000000000000`).set(APP_HEADER).send({ name: 'X' })).status).toBe(404);
    const owner = await signedInAgent(ctx.app, world.owner.email);
    expect((await owner.get(`/api/recipes/${id}`)).body.name).toBe('Not theirs');
  });
});
