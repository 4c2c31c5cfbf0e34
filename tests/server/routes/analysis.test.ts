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
    // Compact per-shot columns for the plots, not one object per shot.
    expect(res.body.shots).toBeUndefined();
    for (const column of ['id', 'row', 'group', 'carry', 'offline', 'ballSpeed', 'launchAngle', 'spinRate', 'decision', 'stray']) {
      expect(res.body.plot[column]).toHaveLength(44);
    }
    expect(res.body.analysis.ladder.map((r: { club: string }) => r.club)).toEqual(['DR', '7I']);
    // The ladder's driver and 7-iron are not neighbours (the clubs between were not hit): no flag.
    expect(res.body.analysis.ladder[0].gapFlag).toBeNull();
  });

  it('analysis gives each group its on-target odds at the shop’s targets', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/analysis`);
    for (const g of res.body.analysis.groups) {
      expect(g.odds.fairway.widthM).toBeCloseTo(30 * 0.9144, 9);
      expect(g.odds.green.radiusM).toBeCloseTo(12 * 0.9144, 9);
      expect(g.odds.fairway.p).toBeGreaterThan(0);
    }
    const asked = await agent.get(`/api/fittings/${fittingId}/analysis`).query({ fairwayWidthM: 20, greenRadiusM: 5, targetClub: '7I', targetCarryM: 120 });
    const seven = asked.body.analysis.groups.find((g: { club: string }) => g.club === '7I');
    expect(seven.odds.fairway.widthM).toBe(20);
    expect(seven.odds.green).toMatchObject({ radiusM: 5, carryM: 120 });
  });

  it('analysis with a and b gives the head-to-head of two builds', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/analysis`).query({ a: '7I|Steel 105 S', b: '7I|Graphite 75 R' });
    expect(res.status).toBe(200);
    const h = res.body.analysis.headToHead;
    expect(h.a).toEqual({ club: '7I', build: 'Steel 105 S' });
    expect(h.fields.carry.diff).toBeCloseTo(h.fields.carry.meanA - h.fields.carry.meanB, 9);
    expect(h.fields.carry.ci95[0]).toBeLessThan(h.fields.carry.diff);
    expect(['equivalent', 'clear', 'unclear']).toContain(h.fields.carry.verdict);
    expect(h.spread.fields.offline.method).toMatch(/Brown–Forsythe/);
    expect(h.summary).toMatch(/Overall: /);
  });

  it('analysis head-to-head reads verdicts by the shop’s margins', async () => {
    const owner = await signedInAgent(ctx.app, world.owner.email);
    await owner.put('/api/shop/margins').set(APP_HEADER).send({ margins: { carry: 50 } });
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const h = (await agent.get(`/api/fittings/${fittingId}/analysis`).query({ a: '7I|Steel 105 S', b: '7I|Graphite 75 R' })).body.analysis.headToHead;
    expect(h.fields.carry.margin).toBe(50);
    expect(h.fields.carry.verdict).toBe('equivalent');
    await owner.put('/api/shop/margins').set(APP_HEADER).send({ margins: {} });
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
    // …and the strays stay the measured ones: normalising moves numbers, never the set of shots.
    const strayRows = (b: typeof measured) => b.analysis.groups.map((g: { strays: { row: number }[] }) => g.strays.map((x) => x.row));
    expect(strayRows(high)).toEqual(strayRows(measured));
    expect(high.analysis.groups.map((g: { kept: number }) => g.kept)).toEqual(measured.analysis.groups.map((g: { kept: number }) => g.kept));
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
    const plot = before.plot;
    const i = plot.id.findIndex((_: number, k: number) => before.analysis.groups[plot.group[k]].club === '7I' && plot.stray[k] === null);
    const shotId = plot.id[i];
    const groupIndex = plot.group[i];
    await agent.patch(`/api/shots/${shotId}`).set(APP_HEADER).send({ decision: 'drop' });
    const after = (await agent.get(`/api/fittings/${fittingId}/analysis`)).body;
    expect(after.analysis.groups[groupIndex].kept).toBe(before.analysis.groups[groupIndex].kept - 1);
    expect(after.plot.decision[i]).toBe('drop');
    await agent.patch(`/api/shots/${shotId}`).set(APP_HEADER).send({ decision: null });
  });

  it('the fitting’s player may see the analysis; another shop may not', async () => {
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.get(`/api/fittings/${fittingId}/analysis`)).status).toBe(200);
    expect((await player.patch('/api/shots/1').set(APP_HEADER).send({ decision: 'drop' })).status).toBe(403);
    const other = await signedInAgent(ctx.app, rival.fitter.email);
    expect((await other.get(`/api/fittings/${fittingId}/analysis`)).status).toBe(404);
  });
});
