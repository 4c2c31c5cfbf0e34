import request from 'supertest';
import type { Agent } from 'supertest';
import { BagClubHistory } from '@/server/models';
import { buildShopWorld } from '@/fixtures/builders';
import { buildBagClub, buildPlayerWithAccount } from '@/fixtures/bag-builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let as: Record<'playerA' | 'playerB' | 'fitter' | 'owner' | 'rivalFitter' | 'rivalOwner', Agent>;
const UNKNOWN = '00000000-0000-4000-8000-000000000000';

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

const driver = { club: 'DR', loftDeg: 10.5, lieDeg: 58, lengthIn: 45.75, shaft: 'Test graphite 60', shaftWeightG: 62, shaftFlex: 'S', hoselSetting: '+1', hoselLoftChangeDeg: 1, addedMassG: 4, addedMassWhere: 'heel' };

describe('GET /api/players/:id/bag', () => {
  it('GET by role answers 401 anonymous, 200 the player and the shop’s staff, 404 another player and another shop', async () => {
    await buildBagClub(world.player, '7I', { loftDeg: 31, carryEnteredM: 140 });
    const url = `/api/players/${world.player.id}/bag`;
    expect((await request(ctx.app).get(url)).status).toBe(401);
    for (const who of ['playerA', 'fitter', 'owner'] as const) expect((await as[who].get(url)).status).toBe(200);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(url)).status).toBe(404);
  });

  it('GET of an unknown player answers 404, a malformed id or date 400', async () => {
    expect((await as.fitter.get(`/api/players/${UNKNOWN}/bag`)).status).toBe(404);
    expect((await as.fitter.get('/api/players/not-an-id/bag')).status).toBe(400);
    const res = await as.fitter.get(`/api/players/${world.player.id}/bag`).query({ on: '1 June' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toEqual(['on']);
  });

  it('GET shows each club with its carry’s source, the ladder and the static-fit start', async () => {
    const res = await as.fitter.get(`/api/players/${world.player.id}/bag`);
    const seven = res.body.clubs.find((c: { club: string }) => c.club === '7I');
    expect(seven.carry).toEqual({ carryM: 140, source: 'entered' });
    expect(res.body.ladder.map((r: { club: string }) => r.club)).toContain('7I');
    // builder player: 175 cm, 84 cm wrist-to-floor → the default table's band middles 173 cm / 86 cm → 0 in
    expect(res.body.staticFit).toMatchObject({ lengthChangeIn: 0, lieChangeDeg: 0 });
  });

  it('GET of a bag with 15 clubs answers 200 with the Rule 4.1b note', async () => {
    const { player } = await buildPlayerWithAccount(world.shop);
    const codes = ['DR', '3W', '5W', '4H', '4I', '5I', '6I', '7I', '8I', '9I', 'PW', 'W50', 'W54', 'W58', 'PT'];
    for (const c of codes) await buildBagClub(player, c);
    const res = await as.owner.get(`/api/players/${player.id}/bag`);
    expect(res.status).toBe(200);
    expect(res.body.clubs).toHaveLength(15);
    expect(res.body.checks.map((c: { code: string }) => c.code)).toContain('over-14-clubs');
  });

  it('GET ?on= shows the bag as recorded at the end of that date', async () => {
    const { player } = await buildPlayerWithAccount(world.shop);
    const old = await buildBagClub(player, '4I', { loftDeg: 22 }, new Date('2026-01-05T10:00:00Z'));
    await buildBagClub(player, 'DR', { loftDeg: 10.5 }, new Date('2026-01-05T10:00:00Z'));
    const res = await as.fitter.patch(`/api/bag-clubs/${old.id}`).set(APP_HEADER).send({ status: 'out', version: 1 });
    expect(res.status).toBe(200);
    // the change was recorded now; move it to March for the test
    await BagClubHistory.update({ changedAt: new Date('2026-03-01T09:00:00Z') }, { where: { bagClubId: old.id, action: 'out' } });
    const clubsOn = async (on: string) => (await as.fitter.get(`/api/players/${player.id}/bag`).query({ on })).body.clubs.map((c: { club: string }) => c.club).sort();
    expect(await clubsOn('2026-01-04')).toEqual([]);
    expect(await clubsOn('2026-02-01')).toEqual(['4I', 'DR']);
    expect(await clubsOn('2026-03-01')).toEqual(['DR']);
  });
});

describe('POST /api/players/:id/bag/clubs', () => {
  const url = () => `/api/players/${world.player.id}/bag/clubs`;

  it('POST as a fitter or owner answers 201 with every spec and version 1', async () => {
    for (const who of ['fitter', 'owner'] as const) {
      const res = await as[who].post(url()).set(APP_HEADER).send(driver);
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({ ...driver, status: 'in-bag', version: 1, roundsSince: 0 });
    }
  });

  it('POST answers 401 anonymous, 201 the player for their own bag (a remote intake), 404 another player and another shop', async () => {
    expect((await request(ctx.app).post(url()).set(APP_HEADER).send(driver)).status).toBe(401);
    expect((await as.playerA.post(url()).set(APP_HEADER).send({ ...driver, club: '3H' })).status).toBe(201);
    expect((await as.playerB.post(url()).set(APP_HEADER).send(driver)).status).toBe(404);
    expect((await as.rivalFitter.post(url()).set(APP_HEADER).send(driver)).status).toBe(404);
    expect((await as.rivalOwner.post(url()).set(APP_HEADER).send(driver)).status).toBe(404);
  });

  it.each([
    [{ lieDeg: 85 }, 'lieDeg', 'Lie must lie between 40° and 80°.'],
    [{ lieDeg: 39 }, 'lieDeg', 'Lie must lie between 40° and 80°.'],
    [{ lengthIn: 51 }, 'lengthIn', 'Length must lie between 28 in and 50 in.'],
    [{ lengthIn: 27.5 }, 'lengthIn', 'Length must lie between 28 in and 50 in.'],
    [{ loftDeg: 71 }, 'loftDeg', 'Loft must lie between 0° and 70°.'],
    [{ addedMassG: -2 }, 'addedMassG', 'Added mass cannot be negative.'],
    [{ shaftWeightG: -60 }, 'shaftWeightG', 'Shaft weight cannot be negative.'],
    [{ club: 'Big stick' }, 'club', 'Choose a club from the list.'],
  ])('POST with %j answers 400 naming %s', async (patch, field, message) => {
    const res = await as.fitter.post(url()).set(APP_HEADER).send({ ...driver, ...patch });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.details[0].path).toEqual([field]);
    expect(res.body.error.message).toBe(message);
  });
});

describe('PATCH /api/bag-clubs/:id', () => {
  it('PATCH by two fitters from one version: the first saves, the second answers 409 VERSION_CONFLICT', async () => {
    const club = await buildBagClub(world.player, '5W', { loftDeg: 18 });
    const first = await as.fitter.patch(`/api/bag-clubs/${club.id}`).set(APP_HEADER).send({ loftDeg: 19, version: 1 });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ loftDeg: 19, version: 2 });
    const second = await as.owner.patch(`/api/bag-clubs/${club.id}`).set(APP_HEADER).send({ lengthIn: 42, version: 1 });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('VERSION_CONFLICT');
    expect(second.body.error.message).toMatch(/Reload/);
    const bag = (await as.owner.get(`/api/players/${world.player.id}/bag`)).body;
    expect(bag.clubs.find((c: { id: string }) => c.id === club.id)).toMatchObject({ loftDeg: 19, lengthIn: null, version: 2 });
  });

  it('PATCH answers 401 anonymous, 200 the player for their own club, 404 another player, another shop and an unknown club, 400 out of range', async () => {
    const club = await buildBagClub(world.player, '3W');
    const url = `/api/bag-clubs/${club.id}`;
    expect((await request(ctx.app).patch(url).set(APP_HEADER).send({ version: 1 })).status).toBe(401);
    expect((await as.playerB.patch(url).set(APP_HEADER).send({ loftDeg: 15, version: 1 })).status).toBe(404);
    expect((await as.rivalOwner.patch(url).set(APP_HEADER).send({ loftDeg: 15, version: 1 })).status).toBe(404);
    expect((await as.fitter.patch(`/api/bag-clubs/${UNKNOWN}`).set(APP_HEADER).send({ loftDeg: 15, version: 1 })).status).toBe(404);
    const bad = await as.fitter.patch(url).set(APP_HEADER).send({ lengthIn: 52, version: 1 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toEqual(['lengthIn']);
    const noVersion = await as.fitter.patch(url).set(APP_HEADER).send({ loftDeg: 15 });
    expect(noVersion.status).toBe(400);
    expect((await as.playerA.patch(url).set(APP_HEADER).send({ loftDeg: 15, version: 1 })).status).toBe(200);
  });
});

describe('PATCH /api/bag-clubs/:id/wear', () => {
  it('PATCH wear by the player and the fitter answers 200; past the shop’s count the wedge gets its reminder', async () => {
    const wedge = await buildBagClub(world.player, 'W56', { loftDeg: 56 });
    const url = `/api/bag-clubs/${wedge.id}/wear`;
    expect((await as.playerA.patch(url).set(APP_HEADER).send({ roundsSince: 40, version: 1 })).status).toBe(200);
    expect((await as.fitter.patch(url).set(APP_HEADER).send({ roundsSince: 80, practiceSessionsSince: 3, version: 2 })).status).toBe(200);
    const bag = (await as.playerA.get(`/api/players/${world.player.id}/bag`)).body;
    // the shop has not set its counts: the default 75 rounds applies
    expect(bag.clubs.find((c: { id: string }) => c.id === wedge.id).wear).toEqual({ over: ['rounds'], roundsSince: 80, practiceSessionsSince: 3 });
  });

  it('PATCH wear answers 401, 404 another player or shop, 400 a negative count, 409 a stale version', async () => {
    const wedge = await buildBagClub(world.player, 'W60', { loftDeg: 60 });
    const url = `/api/bag-clubs/${wedge.id}/wear`;
    expect((await request(ctx.app).patch(url).set(APP_HEADER).send({ roundsSince: 1, version: 1 })).status).toBe(401);
    expect((await as.playerB.patch(url).set(APP_HEADER).send({ roundsSince: 1, version: 1 })).status).toBe(404);
    expect((await as.rivalFitter.patch(url).set(APP_HEADER).send({ roundsSince: 1, version: 1 })).status).toBe(404);
    const neg = await as.playerA.patch(url).set(APP_HEADER).send({ roundsSince: -1, version: 1 });
    expect(neg.status).toBe(400);
    expect(neg.body.error.details[0].path).toEqual(['roundsSince']);
    expect((await as.playerA.patch(url).set(APP_HEADER).send({ roundsSince: 2, version: 1 })).status).toBe(200);
    expect((await as.playerA.patch(url).set(APP_HEADER).send({ roundsSince: 3, version: 1 })).status).toBe(409);
  });
});

describe('GET /api/bag-clubs/:id/history', () => {
  it('GET history lists each change newest first with who made it; the player reads their own', async () => {
    const club = await buildBagClub(world.player, '4H', { loftDeg: 22 });
    await as.fitter.patch(`/api/bag-clubs/${club.id}`).set(APP_HEADER).send({ loftDeg: 23, version: 1 });
    const res = await as.playerA.get(`/api/bag-clubs/${club.id}/history`);
    expect(res.status).toBe(200);
    expect(res.body.map((h: { action: string }) => h.action)).toEqual(['update', 'add']);
    expect(res.body[0]).toMatchObject({ changedBy: world.fitter.id, changedByName: world.fitter.name, snapshot: { loftDeg: 23, version: 2 } });
    expect(res.body[1].snapshot).toMatchObject({ loftDeg: 22, version: 1 });
  });

  it('GET history answers 401 anonymous, 404 another player, another shop and an unknown club', async () => {
    const club = await buildBagClub(world.player, '6I');
    const url = `/api/bag-clubs/${club.id}/history`;
    expect((await request(ctx.app).get(url)).status).toBe(401);
    for (const who of ['playerB', 'rivalFitter', 'rivalOwner'] as const) expect((await as[who].get(url)).status).toBe(404);
    expect((await as.owner.get(`/api/bag-clubs/${UNKNOWN}/history`)).status).toBe(404);
    expect((await as.owner.get(url)).status).toBe(200);
  });

  it('history, PATCH and wear with a malformed id answer 400', async () => {
    expect((await as.owner.get('/api/bag-clubs/nope/history')).status).toBe(400);
    expect((await as.owner.patch('/api/bag-clubs/nope').set(APP_HEADER).send({ version: 1 })).status).toBe(400);
    expect((await as.playerA.patch('/api/bag-clubs/nope/wear').set(APP_HEADER).send({ version: 1 })).status).toBe(400);
    expect((await as.fitter.post('/api/players/nope/bag/clubs').set(APP_HEADER).send(driver)).status).toBe(400);
  });
});
