import request from 'supertest';
import type { Agent } from 'supertest';
import { BagClub, BagClubHistory, Build } from '@/server/models';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { buildBagClub, buildPlayerWithAccount, importCsv } from '@/fixtures/bag-builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let as: Record<'playerA' | 'playerB' | 'fitter' | 'owner' | 'rivalFitter' | 'rivalOwner', Agent>;

/** An invented session: two driver builds and one 7 iron build, four shots each. */
const CSV = [
  'Club,Build,Carry (m),Side (m),Ball Speed (m/s),Club Speed (m/s)',
  ...[0, 1, 2, 3].flatMap((i) => [`Driver,Low spin,${200 + i},${i - 1.5},65,45`, `Driver,Loft up,${204 + i},${1 - i},66,45`, `7 Iron,Steel,${140 + i},${i - 1},48,37`]),
].join('\n');

beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
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

/** A fitting of world.player with the session imported and a bag of driver, 4 iron and 7 iron. */
async function setUp() {
  await BagClub.update({ status: 'out' }, { where: { playerId: world.player.id } });
  const fitting = await buildFitting(world.shop, world.player, world.fitter);
  await importCsv(ctx.sequelize, world.fitter, fitting, CSV);
  const builds = await Build.findAll({ where: { fittingId: fitting.id } });
  const build = (club: string, label: string) => builds.find((b) => b.club === club && b.label === label)!;
  await build('DR', 'Loft up').update({ loftDeg: 11.5, lengthIn: 45.5, hoselSetting: '+1', hoselLoftChangeDeg: 1 });
  const bag = {
    driver: await buildBagClub(world.player, 'DR', { loftDeg: 10.5 }),
    fourIron: await buildBagClub(world.player, '4I', { loftDeg: 22 }),
    sevenIron: await buildBagClub(world.player, '7I', { loftDeg: 32 }),
  };
  return { fitting, build, bag, url: `/api/fittings/${fitting.id}/chosen-builds` };
}

describe('/api/fittings/:id/chosen-builds', () => {
  it('GET by role answers 401 anonymous, 200 the player and the shop’s staff, 404 another player and another shop', async () => {
    const { url } = await setUp();
    expect((await request(ctx.app).get(url)).status).toBe(401);
    for (const who of ['playerA', 'fitter', 'owner'] as const) expect((await as[who].get(url)).status).toBe(200);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(url)).status).toBe(404);
    expect((await as.fitter.get('/api/fittings/00000000-0000-4000-8000-000000000000/chosen-builds')).status).toBe(404);
  });

  it('PUT as a fitter proposes replace, add and take out; confirm puts the builds in the bag and records the changes', async () => {
    const { fitting, build, bag, url } = await setUp();
    const put = await as.fitter.put(url).set(APP_HEADER).send({
      builds: [{ buildId: build('DR', 'Loft up').id }, { buildId: build('7I', 'Steel').id, replacesBagClubId: bag.sevenIron.id }],
      takeOut: [bag.fourIron.id],
    });
    expect(put.status).toBe(200);
    expect(put.body.proposal).toEqual([
      { kind: 'replace', club: 'DR', buildId: build('DR', 'Loft up').id, label: 'Loft up', bagClubId: bag.driver.id, replacedClub: 'DR', version: 1 },
      { kind: 'take-out', club: '4I', bagClubId: bag.fourIron.id, version: 1 },
      { kind: 'replace', club: '7I', buildId: build('7I', 'Steel').id, label: 'Steel', bagClubId: bag.sevenIron.id, replacedClub: '7I', version: 1 },
    ]);
    const versions = { [bag.driver.id]: 1, [bag.fourIron.id]: 1, [bag.sevenIron.id]: 1 };
    const confirm = await as.fitter.post(`${url}/confirm`).set(APP_HEADER).send({ versions, newStatus: 'on-order' });
    expect(confirm.status).toBe(200);
    expect(confirm.body.confirmedAt).toEqual(expect.any(String));
    const view = (await as.playerA.get(`/api/players/${world.player.id}/bag`)).body;
    const active = view.clubs.filter((c: { status: string }) => c.status !== 'out');
    expect(active.map((c: { club: string; status: string }) => `${c.club}:${c.status}`).sort()).toEqual(['7I:on-order', 'DR:on-order']);
    const newDriver = active.find((c: { club: string }) => c.club === 'DR');
    expect(newDriver).toMatchObject({ loftDeg: 11.5, hoselSetting: '+1', hoselLoftChangeDeg: 1, sourceFittingId: fitting.id });
    // carry from the fitting where it was hit: median of 204–207 m
    expect(newDriver.carry).toMatchObject({ source: 'hit', carryM: 205.5, fittingId: fitting.id, n: 4 });
    const outs = await BagClubHistory.findAll({ where: { fittingId: fitting.id } });
    expect(outs.map((h) => h.action).sort()).toEqual(['add', 'add', 'out', 'replace', 'replace']);
    expect(outs.every((h) => h.changedBy === world.fitter.id)).toBe(true);
    // once confirmed, the choice is fixed
    expect((await as.fitter.put(url).set(APP_HEADER).send({ builds: [] })).status).toBe(409);
    const again = await as.fitter.post(`${url}/confirm`).set(APP_HEADER).send({ versions });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('CHOICE_CONFIRMED');
  });

  it('POST confirm after someone changed a club the proposal touches answers 409 VERSION_CONFLICT and changes nothing', async () => {
    const { build, bag, url } = await setUp();
    expect((await as.fitter.put(url).set(APP_HEADER).send({ builds: [{ buildId: build('DR', 'Low spin').id }] })).status).toBe(200);
    expect((await as.owner.patch(`/api/bag-clubs/${bag.driver.id}`).set(APP_HEADER).send({ lengthIn: 45, version: 1 })).status).toBe(200);
    const res = await as.fitter.post(`${url}/confirm`).set(APP_HEADER).send({ versions: { [bag.driver.id]: 1 } });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('VERSION_CONFLICT');
    expect((await BagClub.findByPk(bag.driver.id))!.status).toBe('in-bag');
  });

  it('PUT and confirm answer 401 anonymous, 403 the player, 404 another shop', async () => {
    const { build, url } = await setUp();
    const body = { builds: [{ buildId: build('DR', 'Low spin').id }] };
    expect((await request(ctx.app).put(url).set(APP_HEADER).send(body)).status).toBe(401);
    expect((await as.playerA.put(url).set(APP_HEADER).send(body)).status).toBe(403);
    expect((await as.rivalOwner.put(url).set(APP_HEADER).send(body)).status).toBe(404);
    expect((await as.playerA.post(`${url}/confirm`).set(APP_HEADER).send({ versions: {} })).status).toBe(403);
    expect((await as.rivalFitter.post(`${url}/confirm`).set(APP_HEADER).send({ versions: {} })).status).toBe(404);
    expect((await request(ctx.app).post(`${url}/confirm`).set(APP_HEADER).send({ versions: {} })).status).toBe(401);
  });

  it('PUT with a build of another fitting, two builds for one club or a club not in the bag answers 400 naming the field', async () => {
    const { build, url } = await setUp();
    const other = await setUp();
    const foreign = await as.fitter.put(url).set(APP_HEADER).send({ builds: [{ buildId: other.build('DR', 'Low spin').id }] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details[0].path).toEqual(['builds']);
    const twice = await as.fitter.put(url).set(APP_HEADER).send({ builds: [{ buildId: build('DR', 'Low spin').id }, { buildId: build('DR', 'Loft up').id }] });
    expect(twice.status).toBe(400);
    expect(twice.body.error.message).toMatch(/one build per club/);
    const notInBag = await as.fitter.put(url).set(APP_HEADER).send({ builds: [], takeOut: ['00000000-0000-4000-8000-000000000000'] });
    expect(notInBag.status).toBe(400);
    expect(notInBag.body.error.details[0].path).toEqual(['takeOut']);
    const malformed = await as.fitter.put(url).set(APP_HEADER).send({ builds: [{ buildId: 'x' }] });
    expect(malformed.status).toBe(400);
  });

  it('GET, PUT and confirm with a malformed fitting id answer 400', async () => {
    expect((await as.fitter.get('/api/fittings/nope/chosen-builds')).status).toBe(400);
    expect((await as.fitter.put('/api/fittings/nope/chosen-builds').set(APP_HEADER).send({ builds: [] })).status).toBe(400);
    expect((await as.fitter.post('/api/fittings/nope/chosen-builds/confirm').set(APP_HEADER).send({ versions: {} })).status).toBe(400);
  });

  it('POST confirm with nothing chosen answers 400', async () => {
    const { url } = await setUp();
    const res = await as.fitter.post(`${url}/confirm`).set(APP_HEADER).send({ versions: {} });
    expect(res.status).toBe(400);
  });
});
