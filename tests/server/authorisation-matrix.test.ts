/**
 * The authorisation matrix: every API route × every kind of caller, with the status each must get,
 * and the database checked after each write (a refused write changes nothing; an accepted one
 * changes something). The routes are read from the app's router stack: a route without a row
 * here fails the first test.
 *
 * Adding a route: add one row to ROWS below —
 *   'METHOD /api/path/:param': { expect: [anonymous, playerA, playerB, fitterA, ownerA, fitterZ, ownerZ], … }
 * The target is always something of player A in shop A (a remote fitting, so A may upload);
 * shop Z is another shop. `params` fills the path (default: the world's records by name),
 * `send` makes the request body, `write` says the route changes the database.
 */
import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { buildFitting, buildPlayer, buildShop, buildUser } from '@/fixtures/builders';
import { BayFile, Build, Recipe, Session, type User } from '@/server/models';
import { insertShots } from '@/server/services/shot-store';
import { signSessionToken } from '@/server/services/tokens';
import { listRoutes } from '../support/route-list';
import { createTestContext, type TestContext } from '../support/test-db';

const ROLES = ['anonymous', 'playerA', 'playerB', 'fitterA', 'ownerA', 'fitterZ', 'ownerZ'] as const;
type Role = (typeof ROLES)[number];
type World = Awaited<ReturnType<typeof buildWorld>>;
type Req = ReturnType<typeof request.agent> extends infer _ ? request.Test : never;

interface Row {
  /** Status per role, in ROLES order. */
  expect: [number, number, number, number, number, number, number];
  /** Path parameters; may make fresh records for each call (a delete, a new account). */
  params?: (w: World, role: Role) => Promise<Record<string, string>> | Record<string, string>;
  /** Adds the body (JSON or multipart) to the request. */
  send?: (req: Req, w: World, role: Role) => Req;
  /** The route changes the database when it succeeds. */
  write?: boolean;
}

const unique = () => randomBytes(5).toString('hex');
const STRONG = 'copper lantern orchard';
const csv = () => `Club,Carry (m),Side (m)\n7 Iron,${150 + Math.floor(Math.random() * 1000) / 10},2\n7 Iron,151,-1\n# ${unique()}\n`;
const multipart = (req: Req) => req.field('options', '{}').attach('file', Buffer.from(csv()), 'm.csv');
const json = (body: unknown) => (req: Req) => req.send(body as object);

const ROWS: Record<string, Row> = {
  'GET /api/health': { expect: [200, 200, 200, 200, 200, 200, 200] },
  'POST /api/auth/sign-in': { expect: [401, 401, 401, 401, 401, 401, 401], send: (req) => req.send({ email: `nobody-${unique()}@test.example`, password: 'not the password' }) },
  'POST /api/auth/sign-out': { expect: [204, 204, 204, 204, 204, 204, 204] },
  'POST /api/auth/forgot': { expect: [204, 204, 204, 204, 204, 204, 204], send: (req) => req.send({ email: `nobody-${unique()}@test.example` }) },
  'POST /api/auth/reset': { expect: [400, 400, 400, 400, 400, 400, 400], send: json({ token: 'x'.repeat(40), password: STRONG }) },
  'POST /api/auth/sign-out-everywhere': { expect: [401, 204, 204, 204, 204, 204, 204], write: true },
  'GET /api/me': { expect: [401, 200, 200, 200, 200, 200, 200] },
  'PATCH /api/me': { expect: [401, 200, 200, 200, 200, 200, 200], send: json({ units: 'metric' }), write: true },

  'GET /api/players': { expect: [401, 200, 200, 200, 200, 200, 200] },
  'POST /api/players': { expect: [401, 403, 403, 201, 201, 201, 201], send: json({ name: 'Ida Morrow' }), write: true },
  'GET /api/players/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }) },
  'PATCH /api/players/:id': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }), send: (req) => req.send({ handicap: next() % 50 }), write: true },
  'POST /api/players/:id/account': {
    expect: [401, 403, 403, 201, 201, 404, 404],
    params: async (w) => ({ id: (await buildPlayer(w.shopA)).id }),
    send: (req) => req.send({ email: `new-${unique()}@test.example`, password: STRONG }),
    write: true,
  },

  'GET /api/fittings': { expect: [401, 200, 200, 200, 200, 200, 200] },
  'POST /api/fittings': { expect: [401, 403, 403, 201, 201, 400, 400], send: (req, w) => req.send({ playerId: w.playerA.id, date: '2026-11-30', venue: 'indoor' }), write: true },
  'GET /api/fittings/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'PATCH /api/fittings/:id': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }), send: () => null as never, write: true },

  'GET /api/team': { expect: [401, 403, 403, 200, 200, 200, 200] },
  'POST /api/team': { expect: [401, 403, 403, 403, 201, 403, 201], send: json({ name: 'Bram Oakes', email: 'placeholder', password: STRONG }), write: true },
  'PATCH /api/team/:id': { expect: [401, 403, 403, 403, 200, 403, 404], params: (w) => ({ id: w.fitterA.id }), send: () => null as never, write: true },

  'GET /api/recipes': { expect: [401, 403, 403, 200, 200, 200, 200] },
  'POST /api/recipes': { expect: [401, 403, 403, 201, 201, 201, 201], send: () => null as never, write: true },
  'DELETE /api/recipes/:id': {
    expect: [401, 403, 403, 204, 204, 404, 404],
    params: async (w) => ({ id: (await Recipe.create({ shopId: w.shopA.id, name: `r-${unique()}`, recipe: '{"columns":{}}', createdBy: w.fitterA.id })).id }),
    write: true,
  },

  'GET /api/fittings/:id/bay-files': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'POST /api/fittings/:id/bay-files/preview': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }), send: multipart },
  'POST /api/fittings/:id/bay-files': { expect: [401, 201, 404, 201, 201, 404, 404], params: (w) => ({ id: w.fittingA.id }), send: multipart, write: true },
  'GET /api/bay-files/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.bayFileA.id }) },
  'GET /api/bay-files/:id/raw': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.bayFileA.id }) },
  // a player re-maps only the files they uploaded; this one is the fitter's
  'PUT /api/bay-files/:id/recipe': {
    expect: [401, 403, 404, 200, 200, 404, 404],
    params: (w) => ({ id: w.bayFileA.id }),
    send: json({ recipe: { columns: { 'Side (m)': { field: 'offline', unit: 'm', side: 'signed-left-positive' } } } }),
    write: true,
  },
  'DELETE /api/bay-files/:id': { expect: [401, 403, 403, 204, 204, 404, 404], params: async (w) => ({ id: (await storeBayFile(w)).id }), write: true },

  'GET /api/fittings/:id/shots': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'GET /api/fittings/:id/analysis': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'PATCH /api/shots/:shotId': { expect: [401, 403, 403, 200, 200, 404, 404], params: async (w) => ({ shotId: String(await firstShot((await storeBayFile(w)).id)) }), send: json({ decision: 'drop' }), write: true },
  'GET /api/fittings/:id/builds': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'PATCH /api/builds/:id': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.buildA.id }), send: () => null as never, write: true },
};

// Bodies that must differ on every call, so an accepted write always changes a row.
let counter = 0;
const next = () => ++counter;
ROWS['PATCH /api/fittings/:id'].send = (req) => req.send({ notes: `note ${next()}` });
ROWS['PATCH /api/team/:id'].send = (req) => req.send({ name: `Fitter ${next()}` });
ROWS['POST /api/team'].send = (req) => req.send({ name: 'Bram Oakes', email: `bram-${unique()}@test.example`, password: STRONG });
ROWS['POST /api/recipes'].send = (req) => req.send({ name: `Recipe ${unique()}`, recipe: { columns: { 'Carry (m)': { field: 'carry', unit: 'm' } } } });
ROWS['PATCH /api/builds/:id'].send = (req) => req.send({ notes: `spec ${next()}` });

let ctx: TestContext;
let world: World;

async function storeBayFile(w: { fittingA: { id: string }; fitterA: User }) {
  const text = csv();
  const file = await BayFile.create({
    fittingId: w.fittingA.id,
    uploadedBy: w.fitterA.id,
    fileName: 'stored.csv',
    contentHash: randomBytes(32).toString('hex'),
    rawText: text,
    recipe: JSON.stringify({ delimiter: ',', columns: {} }),
    report: JSON.stringify({ rows: 2, imported: 2, rejected: [], skipped: [], warnings: [], unknownClubs: [], groups: [] }),
    rowCount: 2,
    shotCount: 2,
  });
  await ctx.sequelize.transaction((t) =>
    insertShots(t, file.id, w.fittingA.id, [
      { row: 1, club: '7I', build: null, values: { carry: 150 }, derived: [] },
      { row: 2, club: '7I', build: null, values: { carry: 151 }, derived: [] },
    ]),
  );
  return file;
}

async function firstShot(bayFileId: string): Promise<number> {
  const [shot] = await ctx.sequelize.query<{ id: number }>('SELECT id FROM shots WHERE bay_file_id = ? ORDER BY id LIMIT 1', { replacements: [bayFileId], type: QueryTypes.SELECT });
  return Number(shot.id);
}

async function buildWorld() {
  const shopA = await buildShop();
  const shopZ = await buildShop();
  const ownerA = await buildUser(shopA, 'owner');
  const fitterA = await buildUser(shopA, 'fitter');
  const userA = await buildUser(shopA, 'player');
  const userB = await buildUser(shopA, 'player');
  const ownerZ = await buildUser(shopZ, 'owner');
  const fitterZ = await buildUser(shopZ, 'fitter');
  const playerA = await buildPlayer(shopA, { userId: userA.id });
  await buildPlayer(shopA, { userId: userB.id });
  const fittingA = await buildFitting(shopA, playerA, fitterA, { remote: true });
  const partial = { shopA, fittingA, fitterA };
  const bayFileA = await storeBayFile(partial);
  const buildA = await Build.create({ fittingId: fittingA.id, club: '7I', label: '' });
  const users: Record<Exclude<Role, 'anonymous'>, User> = { playerA: userA, playerB: userB, fitterA, ownerA, fitterZ, ownerZ };
  return { shopA, shopZ, users, playerA, fitterA, fittingA, bayFileA, buildA };
}

/** A fresh session token for a role (sign-out and sign-out-everywhere end sessions as they go). */
async function tokenFor(role: Role): Promise<string | null> {
  if (role === 'anonymous') return null;
  const user = await world.users[role].reload();
  const session = await Session.create({ userId: user.id, expiresAt: new Date(Date.now() + 3_600_000), endedAt: null });
  return signSessionToken(ctx.config, { sub: user.id, ver: user.tokenVersion, sid: session.id });
}

/** A fingerprint of every table a request may change (sessions and rate limits aside: requests make those). */
async function fingerprint(): Promise<string> {
  const rows = await ctx.sequelize.query<{ Table: string; Checksum: number | bigint }>(
    'CHECKSUM TABLE shops, users, players, fittings, bay_files, shots, builds, recipes, password_resets',
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => `${r.Table}:${String(r.Checksum)}`).join(' ');
}

beforeAll(async () => {
  ctx = await createTestContext();
  world = await buildWorld();
});
afterAll(async () => {
  await ctx.close();
});

describe('authorisation matrix', () => {
  it('every route of the app has a row in the matrix (and every row a route)', () => {
    const routes = listRoutes(ctx.app);
    expect(routes.filter((r) => !(r in ROWS))).toEqual([]);
    expect(Object.keys(ROWS).filter((r) => !routes.includes(r))).toEqual([]);
  });

  const cells = Object.entries(ROWS).flatMap(([route, row]) => ROLES.map((role, i) => [route, role, row.expect[i]] as const));

  it.each(cells)('%s as %s answers %i', async (route, role, status) => {
    const row = ROWS[route];
    const [method, template] = route.split(' ');
    const params = row.params ? await row.params(world, role) : {};
    const path = template.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(params[name]));
    const token = await tokenFor(role);
    const before = row.write ? await fingerprint() : '';
    let req = (request(ctx.app) as unknown as Record<string, (p: string) => Req>)[method.toLowerCase()](path);
    if (token) req = req.set('Authorization', `Bearer ${token}`);
    if (row.send) req = row.send(req, world, role);
    const res = await req;
    expect({ status: res.status, code: res.body?.error?.code }).toMatchObject({ status });
    if (res.status >= 500) throw new Error(`5xx: ${JSON.stringify(res.body)}`);
    if (row.write) {
      const after = await fingerprint();
      if (status < 300) expect(after).not.toBe(before);
      else expect(after).toBe(before);
    }
  });
});
