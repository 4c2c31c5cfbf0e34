/**
 * The analysis answer kept per fitting revision: entity tags and 304s as HTTP defines them
 * (RFC 9110, HTTP Semantics, 2022: §8.8.3 ETag, §13.1.2 If-None-Match, §15.4.5 304 Not
 * Modified; RFC 9111, HTTP Caching, 2022, §5.2.2.4 no-cache), a fresh answer after every change
 * the analysis depends on, the same answers from two app instances on one database (as two
 * server processes), and the access check before any kept answer.
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import request from 'supertest';
import { buildFitting, buildShopWorld, TEST_PASSWORD } from '@/fixtures/builders';
import { createApp } from '@/server/app';
import { createTestContext, type TestContext } from '../../support/test-db';
import { rawGet } from '../../support/raw-get';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
const demoCsv = fs.readFileSync(path.resolve(__dirname, '../../../fixtures/demo/nell-driver-and-7-iron.csv'));

beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
});
afterAll(async () => {
  await ctx.close();
});

type Agent = Awaited<ReturnType<typeof signedInAgent>>;

async function fittingWithDemo(agent: Agent, name = 'nell.csv'): Promise<{ fittingId: string; bayFileId: string }> {
  const fitting = await buildFitting(world.shop, world.player, world.fitter);
  const res = await agent.post(`/api/fittings/${fitting.id}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', demoCsv, name);
  if (res.status !== 201) throw new Error(JSON.stringify(res.body));
  return { fittingId: fitting.id, bayFileId: res.body.id };
}

/** A second, different invented file (a copy of the demo with the 7 iron carries 5 yd shorter). */
function shorterSevens(): Buffer {
  const lines = demoCsv.toString('utf8').split('\n');
  return Buffer.from(
    lines
      .map((line) => {
        const cells = line.split(',');
        if (cells[1] !== '7 Iron') return line;
        cells[9] = (Number(cells[9]) - 5).toFixed(1);
        return cells.join(',');
      })
      .join('\n'),
  );
}

const analysisOf = (agent: Agent, fittingId: string) => agent.get(`/api/fittings/${fittingId}/analysis`);

/** The answer's compact plot columns as one object per shot (club from the shot's group). */
type PlotShotRow = { id: number; club: string; carry: number; decision: string | null };
function shotsOf(body: { plot: { id: number[]; group: number[]; carry: number[]; decision: (string | null)[] }; analysis: { groups: { club: string }[] } }): PlotShotRow[] {
  return body.plot.id.map((id, i) => ({ id, club: body.analysis.groups[body.plot.group[i]].club, carry: body.plot.carry[i], decision: body.plot.decision[i] }));
}

describe('GET /api/fittings/:id/analysis, kept per revision', () => {
  it('analysis answer carries a weak entity tag and is revalidated on each use', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const { fittingId } = await fittingWithDemo(agent);
    const res = await analysisOf(agent, fittingId);
    expect(res.status).toBe(200);
    expect(res.headers.etag).toMatch(/^W\/"[A-Za-z0-9_-]{32}"$/);
    expect(res.headers['cache-control']).toBe('private, no-cache');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
  });

  it('analysis with If-None-Match of the current tag answers 304 with no body', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const { fittingId } = await fittingWithDemo(agent);
    const first = await analysisOf(agent, fittingId);
    const again = await analysisOf(agent, fittingId).set('If-None-Match', first.headers.etag);
    expect(again.status).toBe(304);
    expect(again.text ?? '').toBe('');
    const stale = await analysisOf(agent, fittingId).set('If-None-Match', 'W/"not-the-current-one"');
    expect(stale.status).toBe(200);
    expect(stale.body).toEqual(first.body);
  });

  it('analysis with gzip or brotli accepted comes compressed and decodes to the same answer', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const { fittingId } = await fittingWithDemo(agent);
    const plain = await analysisOf(agent, fittingId).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    const signIn = await request(ctx.app).post('/api/auth/sign-in').send({ email: world.fitter.email, password: TEST_PASSWORD });
    const cookie = (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    const raw = (encoding: string) => rawGet(ctx.app, `/api/fittings/${fittingId}/analysis`, { cookie, 'accept-encoding': encoding });
    const gz = await raw('gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    // Decoded by Node's zlib, the reference implementation of the formats (RFC 1952, RFC 7932).
    expect(JSON.parse(zlib.gunzipSync(gz.body).toString('utf8'))).toEqual(plain.body);
    const br = await raw('gzip, deflate, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(JSON.parse(zlib.brotliDecompressSync(br.body).toString('utf8'))).toEqual(plain.body);
    expect(br.body.length).toBeLessThan(Number(plain.headers['content-length']) / 3);
  });

  it('analysis from a second app on the same database gives the same tag, and follows its changes', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const { fittingId } = await fittingWithDemo(agent);
    const secondApp = createApp({ sequelize: ctx.sequelize, config: ctx.config, log: () => {} });
    const other = await signedInAgent(secondApp, world.fitter.email);
    const a1 = await analysisOf(agent, fittingId);
    const b1 = await analysisOf(other, fittingId);
    expect(b1.headers.etag).toBe(a1.headers.etag);
    const shot = shotsOf(a1.body)[0];
    expect((await agent.patch(`/api/shots/${shot.id}`).set(APP_HEADER).send({ decision: 'drop' })).status).toBe(200);
    const b2 = await analysisOf(other, fittingId);
    expect(b2.headers.etag).not.toBe(b1.headers.etag);
    expect(shotsOf(b2.body).find((s) => s.id === shot.id)!.decision).toBe('drop');
  });

  describe('analysis after each change it depends on is computed again', () => {
    let agent: Agent;
    beforeAll(async () => {
      agent = await signedInAgent(ctx.app, world.fitter.email);
    });

    it('analysis after a stray decision shows the decision', async () => {
      const { fittingId } = await fittingWithDemo(agent);
      const before = await analysisOf(agent, fittingId);
      const shot = shotsOf(before.body).find((s) => s.club === '7I')!;
      await agent.patch(`/api/shots/${shot.id}`).set(APP_HEADER).send({ decision: 'drop' });
      const after = await analysisOf(agent, fittingId).set('If-None-Match', before.headers.etag);
      expect(after.status).toBe(200);
      expect(shotsOf(after.body).find((s) => s.id === shot.id)!.decision).toBe('drop');
    });

    it('analysis after another bay file counts its shots', async () => {
      const { fittingId } = await fittingWithDemo(agent);
      const before = await analysisOf(agent, fittingId);
      const res = await agent.post(`/api/fittings/${fittingId}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', shorterSevens(), 'second.csv');
      expect(res.status).toBe(201);
      const after = await analysisOf(agent, fittingId).set('If-None-Match', before.headers.etag);
      expect(after.status).toBe(200);
      expect(shotsOf(after.body)).toHaveLength(2 * shotsOf(before.body).length);
    });

    it('analysis after a bay file is deleted drops its shots', async () => {
      const { fittingId } = await fittingWithDemo(agent);
      const second = await agent.post(`/api/fittings/${fittingId}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', shorterSevens(), 'second.csv');
      const before = await analysisOf(agent, fittingId);
      expect((await agent.delete(`/api/bay-files/${second.body.id}`).set(APP_HEADER)).status).toBe(204);
      const after = await analysisOf(agent, fittingId).set('If-None-Match', before.headers.etag);
      expect(after.status).toBe(200);
      expect(shotsOf(after.body)).toHaveLength(shotsOf(before.body).length / 2);
    });

    it('analysis after a re-map reads the carries in the new unit', async () => {
      const { fittingId, bayFileId } = await fittingWithDemo(agent);
      const before = await analysisOf(agent, fittingId);
      const file = (await agent.get(`/api/bay-files/${bayFileId}`)).body;
      const recipe = { ...file.recipe, columns: { ...file.recipe.columns, 'Carry (yds)': { field: 'carry', unit: 'm' } } };
      expect((await agent.put(`/api/bay-files/${bayFileId}/recipe`).set(APP_HEADER).send({ recipe })).status).toBe(200);
      const after = await analysisOf(agent, fittingId).set('If-None-Match', before.headers.etag);
      expect(after.status).toBe(200);
      // Metres read where yards were: 1 yd = 0.9144 m exactly (International Yard and Pound Agreement, 1959).
      expect(shotsOf(after.body)[0].carry / shotsOf(before.body)[0].carry).toBeCloseTo(1 / 0.9144, 6);
    });

    it('analysis after a build’s loft is edited shows the loft in the ladder', async () => {
      const { fittingId } = await fittingWithDemo(agent);
      const before = await analysisOf(agent, fittingId);
      const builds = (await agent.get(`/api/fittings/${fittingId}/builds`)).body as { id: string; club: string }[];
      for (const driver of builds.filter((b) => b.club === 'DR')) {
        expect((await agent.patch(`/api/builds/${driver.id}`).set(APP_HEADER).send({ loftDeg: 9.5 })).status).toBe(200);
      }
      const after = await analysisOf(agent, fittingId).set('If-None-Match', before.headers.etag);
      expect(after.status).toBe(200);
      expect(after.body.analysis.ladder.find((r: { club: string }) => r.club === 'DR').loftDeg).toBe(9.5);
    });

    it('analysis after the fitting’s conditions are edited uses the new air', async () => {
      const { fittingId } = await fittingWithDemo(agent);
      const before = await analysisOf(agent, fittingId);
      expect((await agent.patch(`/api/fittings/${fittingId}`).set(APP_HEADER).send({ altitudeM: 1200 })).status).toBe(200);
      const after = await analysisOf(agent, fittingId).set('If-None-Match', before.headers.etag);
      expect(after.status).toBe(200);
      expect(after.body.air.measured.altitudeM).toBe(1200);
    });
  });

  it('analysis kept for one shop is never served to another: 404, with or without its tag', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const { fittingId } = await fittingWithDemo(agent);
    const kept = await analysisOf(agent, fittingId);
    const other = await signedInAgent(ctx.app, rival.fitter.email);
    expect((await analysisOf(other, fittingId)).status).toBe(404);
    expect((await analysisOf(other, fittingId).set('If-None-Match', kept.headers.etag)).status).toBe(404);
    expect((await request(ctx.app).get(`/api/fittings/${fittingId}/analysis`).set('If-None-Match', kept.headers.etag)).status).toBe(401);
  });

  it('sign-out asks the browser to drop the answers it kept', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post('/api/auth/sign-out').set(APP_HEADER);
    expect(res.status).toBe(204);
    // W3C, Clear Site Data (Working Draft, 2017), §3.1: the "cache" type.
    expect(res.headers['clear-site-data']).toBe('"cache"');
  });

  it('analysis kept for the fitter is the same answer its player gets; another player gets 404', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const { fittingId } = await fittingWithDemo(agent);
    const kept = await analysisOf(agent, fittingId);
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    const mine = await analysisOf(player, fittingId);
    expect(mine.status).toBe(200);
    expect(mine.body).toEqual(kept.body);
    const stranger = await signedInAgent(ctx.app, rival.playerUser.email);
    expect((await analysisOf(stranger, fittingId)).status).toBe(404);
  });
});
