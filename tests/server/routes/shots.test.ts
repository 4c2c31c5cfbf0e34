import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { buildFitting, buildPlayer, buildShopWorld, buildUser } from '@/fixtures/builders';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
let fittingId: string;
let otherPlayerEmail: string;
beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildShopWorld();
  rival = await buildShopWorld();
  fittingId = (await buildFitting(world.shop, world.player, world.fitter)).id;
  const user = await buildUser(world.shop, 'player');
  await buildPlayer(world.shop, { userId: user.id });
  otherPlayerEmail = user.email;
  // The demo's invented driver and 7-iron session, and a file whose build name looks like a
  // spreadsheet formula (invented; for the CSV-injection check).
  const agent = await signedInAgent(ctx.app, world.fitter.email);
  const demo = fs.readFileSync(path.resolve(__dirname, '../../../fixtures/demo/nell-driver-and-7-iron.csv'));
  expect((await agent.post(`/api/fittings/${fittingId}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', demo, 'nell.csv')).status).toBe(201);
  const hostile = ['Club,Build,Carry (yds),Offline (yds)', '9 Iron,=HYPERLINK("http://x"),130,2', '9 Iron,=HYPERLINK("http://x"),128,-1', '9 Iron,=HYPERLINK("http://x"),131,0'].join('\n');
  expect((await agent.post(`/api/fittings/${fittingId}/bay-files`).set(APP_HEADER).field('options', '{}').attach('file', Buffer.from(hostile), 'odd.csv')).status).toBe(201);
});
afterAll(async () => {
  await ctx.close();
});

describe('GET /api/fittings/:id/shots', () => {
  it('shots as a fitter gives the first page with every field, derived fields and strays', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/shots`).query({ limit: 10 });
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(47);
    expect(res.body.shots).toHaveLength(10);
    expect(res.body.fields).toEqual(expect.arrayContaining(['clubSpeed', 'ballSpeed', 'smashFactor', 'carry', 'offline', 'apexHeight', 'descentAngle']));
    const first = res.body.shots[0];
    expect(first.derived).toContain('smashFactor');
    expect(first.values.smashFactor).toBeCloseTo(first.values.ballSpeed / first.values.clubSpeed, 12);
    const flagged = (await agent.get(`/api/fittings/${fittingId}/shots`).query({ sort: 'stray', limit: 500 })).body.shots.filter((s: { stray: unknown }) => s.stray);
    expect(flagged.length).toBeGreaterThan(0);
    // Reasons in the user's units (yards by default).
    expect(flagged.some((s: { stray: { reason: string } }) => / yd|mph|°|smash/.test(s.stray.reason))).toBe(true);
  });

  it('shots sorted by carry descending come longest first, shots without carry last', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/shots`).query({ sort: 'carry', dir: 'desc', limit: 500 });
    const carries = res.body.shots.map((s: { values: { carry?: number } }) => s.values.carry);
    const sorted = [...carries].sort((a, b) => b - a);
    expect(carries).toEqual(sorted);
    expect(carries[0]).toBeGreaterThan(200 * YD);
  });

  it('shots of one club in pages of 5 join up to the whole club', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const ids: number[] = [];
    for (let offset = 0; offset < 20; offset += 5) {
      const page = await agent.get(`/api/fittings/${fittingId}/shots`).query({ club: '7I', offset, limit: 5 });
      expect(page.body.total).toBe(20);
      ids.push(...page.body.shots.map((s: { id: number }) => s.id));
    }
    expect(new Set(ids).size).toBe(20);
  });

  it.each([{ limit: '0' }, { limit: '501' }, { sort: 'nope' }, { dir: 'sideways' }, { offset: '-1' }])('shots with %j answers 400', async (query) => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    expect((await agent.get(`/api/fittings/${fittingId}/shots`).query(query)).status).toBe(400);
  });

  it('shots without signing in answers 401; of an unknown fitting 404', async () => {
    expect((await request(ctx.app).get(`/api/fittings/${fittingId}/shots`)).status).toBe(401);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    expect((await agent.get('/api/fittings/00000000-0000-4000-8000-000000000000/shots')).status).toBe(404);
  });

  it('shots as the fitting’s player answers 200; another player or another shop answers 404', async () => {
    expect((await (await signedInAgent(ctx.app, world.playerUser.email)).get(`/api/fittings/${fittingId}/shots`)).status).toBe(200);
    expect((await (await signedInAgent(ctx.app, otherPlayerEmail)).get(`/api/fittings/${fittingId}/shots`)).status).toBe(404);
    expect((await (await signedInAgent(ctx.app, rival.fitter.email)).get(`/api/fittings/${fittingId}/shots`)).status).toBe(404);
    expect((await (await signedInAgent(ctx.app, rival.owner.email)).get(`/api/fittings/${fittingId}/shots`)).status).toBe(404);
  });
});

describe('GET /api/fittings/:id/shots.csv and groups.csv', () => {
  // OWASP, "CSV Injection": a cell starting with = is written with a leading apostrophe.
  it('shots.csv as a fitter is a CSV download in yards with formula-looking cells neutralised', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.get(`/api/fittings/${fittingId}/shots.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="shots-/);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toMatch(/^File,Row,Club,Build,.*Carry \(yd\).*Offline \(yd, \+ right\).*,Derived fields,Stray,Stray reason,Decision,In the figures$/);
    expect(lines).toHaveLength(47 + 2); // header, 47 shots, the final line end
    expect(res.text).toContain(`"'=HYPERLINK(""http://x"")"`);
    expect(res.text).not.toMatch(/(^|,)=HYPERLINK/m);
  });

  it('groups.csv as the owner gives one line per group with means, sds and odds', async () => {
    const agent = await signedInAgent(ctx.app, world.owner.email);
    const res = await agent.get(`/api/fittings/${fittingId}/groups.csv`);
    expect(res.status).toBe(200);
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toMatch(/^Club,Build,Shots,Kept,.*Fairway odds,Green odds$/);
    expect(lines).toHaveLength(1 + 5); // driver × 2, 7 iron × 2, 9 iron × 1
    expect(lines[1]).toMatch(/^Driver,/);
  });

  it('the exports as a player answer 403, for another shop 404, signed out 401', async () => {
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.get(`/api/fittings/${fittingId}/shots.csv`)).status).toBe(403);
    expect((await player.get(`/api/fittings/${fittingId}/groups.csv`)).status).toBe(403);
    const other = await signedInAgent(ctx.app, rival.owner.email);
    expect((await other.get(`/api/fittings/${fittingId}/shots.csv`)).status).toBe(404);
    expect((await other.get(`/api/fittings/${fittingId}/groups.csv`)).status).toBe(404);
    expect((await request(ctx.app).get(`/api/fittings/${fittingId}/groups.csv`)).status).toBe(401);
  });

  it('the exports of an id that is not a fitting id answer 400', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    expect((await agent.get('/api/fittings/not-an-id/shots.csv')).status).toBe(400);
  });
});
