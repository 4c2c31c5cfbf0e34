import fs from 'node:fs';
import path from 'node:path';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let fittingId: string;
beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
  const fitting = await buildFitting(world.shop, world.player, world.fitter);
  fittingId = fitting.id;
  // The demo's invented driver and 7-iron session (fixtures/demo): two builds per club.
  const csv = fs.readFileSync(path.resolve(__dirname, '../../../fixtures/demo/nell-driver-and-7-iron.csv'));
  const agent = await signedInAgent(ctx.app, world.fitter.email);
  const res = await agent.post(`/api/fittings/${fittingId}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', csv, 'nell.csv');
  if (res.status !== 201) throw new Error(JSON.stringify(res.body));
});
afterAll(async () => {
  await ctx.close();
});

describe('GET /api/fittings/:id/analysis', () => {
  it('analysis of an imported session gives a group per club and build with ovals, in bag order', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/analysis`);
    expect(res.status).toBe(200);
    const groups = res.body.analysis.groups;
    expect(groups.map((g: { club: string }) => g.club)).toEqual(['DR', 'DR', '7I', '7I']);
    for (const g of groups) {
      expect(g.oval.level).toBe(0.95);
      expect(g.predictionOval.semiMajor).toBeGreaterThan(g.oval.semiMajor); // Hotelling scale > χ² scale for small n
    }
    expect(res.body.shots).toHaveLength(44);
    expect(res.body.analysis.ladder.map((r: { club: string }) => r.club)).toEqual(['DR', '7I']);
  });

  it('analysis with a and b gives the head-to-head of two builds', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/analysis`).query({ a: '7I|Steel 105 S', b: '7I|Graphite 75 R' });
    expect(res.status).toBe(200);
    const h = res.body.analysis.headToHead;
    expect(h.a).toEqual({ club: '7I', build: 'Steel 105 S' });
    expect(h.fields.carry.diff).toBeCloseTo(h.fields.carry.meanA - h.fields.carry.meanB, 9);
    expect(h.fields.carry.ci95[0]).toBeLessThan(h.fields.carry.diff);
  });

  it('analysis with an unknown build to compare answers 400', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/analysis`).query({ a: '7I|Steel 105 S', b: '7I|Nope' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_ANALYSIS_REQUEST');
  });

  it.each([{ level: '1.5' }, { level: 'x' }, { a: '7I|Steel 105 S' }, { toAltitudeM: '9000' }, { toFirmness: 'muddy' }])('analysis with %j answers 400', async (query) => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    expect((await agent.get(`/api/fittings/${fittingId}/analysis`).query(query)).status).toBe(400);
  });

  it('analysis carried over to a course at altitude gives a lower driver apex than measured', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const measured = (await agent.get(`/api/fittings/${fittingId}/analysis`)).body;
    const high = (await agent.get(`/api/fittings/${fittingId}/analysis`).query({ toAltitudeM: 1600, toTemperatureC: 25 })).body;
    expect(high.air.normalisedTo).toMatchObject({ altitudeM: 1600, temperatureC: 25 });
    // Thinner air lifts less: the apex falls (the carry of this slow, low drive barely moves under
    // the modern-ball model, whose drag crisis starts at a higher speed in thin air).
    const apex = (b: typeof measured) => b.analysis.groups[0].fields.apexHeight.mean;
    expect(apex(high)).toBeLessThan(apex(measured) * 0.95);
    expect(high.analysis.groups[0].fields.carry.mean).not.toBeCloseTo(measured.analysis.groups[0].fields.carry.mean, 1);
  });

  it('analysis carried over to firmer ground gives a longer driver total and reports the ground', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const soft = (await agent.get(`/api/fittings/${fittingId}/analysis`).query({ toFirmness: 'soft' })).body;
    const firm = (await agent.get(`/api/fittings/${fittingId}/analysis`).query({ toFirmness: 'firm' })).body;
    expect(firm.air.normalisedTo).toMatchObject({ firmness: 'firm' });
    const total = (b: typeof soft) => b.analysis.groups[0].fields.total.mean;
    expect(total(firm)).toBeGreaterThan(total(soft) + 10);
  });

  it('a dropped shot leaves the statistics and is reported as dropped', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const before = (await agent.get(`/api/fittings/${fittingId}/analysis`)).body;
    const shot = before.shots.find((s: { club: string; stray: boolean }) => s.club === '7I' && !s.stray);
    await agent.patch(`/api/shots/${shot.id}`).set(APP_HEADER).send({ decision: 'drop' });
    const after = (await agent.get(`/api/fittings/${fittingId}/analysis`)).body;
    const group = (b: typeof before) => b.analysis.groups.find((g: { club: string; build: string }) => g.club === '7I' && g.build === shot.build);
    expect(group(after).kept).toBe(group(before).kept - 1);
    await agent.patch(`/api/shots/${shot.id}`).set(APP_HEADER).send({ decision: null });
  });

  it('the fitting’s player may see the analysis; another shop may not', async () => {
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.get(`/api/fittings/${fittingId}/analysis`)).status).toBe(200);
    expect((await player.patch('/api/shots/1').set(APP_HEADER).send({ decision: 'drop' })).status).toBe(403);
    const other = await signedInAgent(ctx.app, rival.fitter.email);
    expect((await other.get(`/api/fittings/${fittingId}/analysis`)).status).toBe(404);
  });
});
