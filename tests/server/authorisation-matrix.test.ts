/**
 * The authorisation matrix: every API route × every kind of caller, with the status each must get,
 * and the database checked after each write (a refused write changes nothing; an accepted one
 * changes something). The routes are read from the app's router stack: a route without a row
 * here fails the first test.
 *
 * Adding a route: add one row to ROWS below —
 *   'METHOD /api/path/:param': { expect: [anonymous, playerA, playerB, fitterA, ownerA, fitterZ, ownerZ], … }
 * The target is always something of player A in shop A (a remote fitting, so A may upload);
 * shop Z is another shop. `params` fills the path (default: the world's records by name) and may
 * make a fresh record per call where a write uses one up (a bag club at version 1, a sheet to
 * accept); `send` makes the request body (it gets those params; make it differ on every call so
 * an accepted write always changes a row), `write` says the route changes the database. A route
 * whose answer depends on its record's state gets a second row keyed with the state in
 * parentheses ('GET /api/x/:id (a draft)'). A write to a table not yet in `fingerprint()` needs
 * that table added there.
 */
import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { buildBagClub } from '@/fixtures/bag-builders';
import { buildFitting, buildPlayer, buildShop, buildUser } from '@/fixtures/builders';
import { BayFile, Build, ChosenBuild, type Fitting, type Player, Recipe, Session, type Shop, ShopRequestLink, type User } from '@/server/models';
import type { Mailer } from '@/server/services/mailer';
import { insertShots } from '@/server/services/shot-store';
import { invitePlayer } from '@/server/services/invitations';
import { sendSpecSheet } from '@/server/services/spec-sheets';
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
  /** Adds the body (JSON or multipart) to the request; gets the params made for this call. */
  send?: (req: Req, w: World, role: Role, params: Record<string, string>) => Req;
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
  // a new shop per call; the same answer for an address that has an account
  'POST /api/auth/sign-up': { expect: [202, 202, 202, 202, 202, 202, 202], send: (req) => req.send({ shopName: 'Fen Road Fitting', name: 'Odile Marsh', email: `signup-${unique()}@test.example`, password: STRONG }), write: true },
  'POST /api/auth/verify': { expect: [400, 400, 400, 400, 400, 400, 400], send: json({ token: 'x'.repeat(43) }) },
  'POST /api/auth/verify/resend': { expect: [204, 204, 204, 204, 204, 204, 204], send: (req) => req.send({ email: `nobody-${unique()}@test.example` }) },
  'POST /api/auth/invitation': { expect: [400, 400, 400, 400, 400, 400, 400], send: json({ token: 'x'.repeat(43) }) },
  'POST /api/auth/invitation/accept': { expect: [400, 400, 400, 400, 400, 400, 400], send: json({ token: 'x'.repeat(43), password: STRONG }), write: true },
  'GET /api/me': { expect: [401, 200, 200, 200, 200, 200, 200] },
  'PATCH /api/me': { expect: [401, 200, 200, 200, 200, 200, 200], send: json({ units: 'metric' }), write: true },

  'GET /api/players': { expect: [401, 200, 200, 200, 200, 200, 200] },
  'POST /api/players': { expect: [401, 403, 403, 201, 201, 201, 201], send: json({ name: 'Ida Morrow' }), write: true },
  'GET /api/players/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }) },
  'PATCH /api/players/:id': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }), send: (req) => req.send({ handicap: next() % 50 }), write: true },
  'PUT /api/players/:id/archived': { expect: [401, 403, 403, 200, 200, 404, 404], params: async (w) => ({ id: (await buildPlayer(w.shopA)).id }), send: json({ archived: true }), write: true },
  'DELETE /api/players/:id': { expect: [401, 403, 403, 204, 204, 404, 404], params: async (w) => ({ id: (await buildPlayer(w.shopA)).id }), write: true },
  // everything the shop holds about a player: the player themselves and staff
  'GET /api/players/:id/export': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }) },
  'GET /api/players/:id/invitations': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }) },
  'POST /api/players/:id/invitations': {
    expect: [401, 403, 403, 201, 201, 404, 404],
    params: async (w) => ({ id: (await buildPlayer(w.shopA)).id }),
    send: (req) => req.send({ email: `invited-${unique()}@test.example` }),
    write: true,
  },
  // a fresh open invitation of a player of shop A per call (staff may manage those)
  'POST /api/invitations/:id/resend': { expect: [401, 403, 403, 200, 200, 404, 404], params: async (w) => ({ id: (await openInvitation(w)).id }), write: true },
  'DELETE /api/invitations/:id': { expect: [401, 403, 403, 204, 204, 404, 404], params: async (w) => ({ id: (await openInvitation(w)).id }), write: true },
  'PUT /api/fittings/:id/archived': { expect: [401, 403, 403, 200, 200, 404, 404], params: async (w) => ({ id: (await buildFitting(w.shopA, w.playerA, w.fitterA)).id }), send: json({ archived: true }), write: true },
  'DELETE /api/fittings/:id': { expect: [401, 403, 403, 204, 204, 404, 404], params: async (w) => ({ id: (await buildFitting(w.shopA, w.playerA, w.fitterA)).id }), write: true },

  'GET /api/fittings': { expect: [401, 200, 200, 200, 200, 200, 200] },
  'POST /api/fittings': { expect: [401, 403, 403, 201, 201, 400, 400], send: (req, w) => req.send({ playerId: w.playerA.id, date: '2026-11-30', venue: 'indoor' }), write: true },
  'GET /api/fittings/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'PATCH /api/fittings/:id': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }), send: () => null as never, write: true },

  'GET /api/team/invitations': { expect: [401, 403, 403, 403, 200, 403, 200] },
  'POST /api/team/invitations': { expect: [401, 403, 403, 403, 201, 403, 201], send: (req) => req.send({ name: 'Lark Penn', email: `fitter-${unique()}@test.example` }), write: true },
  'GET /api/team': { expect: [401, 403, 403, 200, 200, 200, 200] },
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
  'GET /api/builds/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.buildA.id }) },
  // the exports are staff tools: a player gets 403 before any lookup, another shop 404
  'GET /api/fittings/:id/shots.csv': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'GET /api/fittings/:id/groups.csv': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },

  'GET /api/recipes/:id': { expect: [401, 403, 403, 200, 200, 404, 404], params: (w) => ({ id: w.recipeA.id }) },
  // the owner manages the shop's recipes: a fitter of any shop 403, another shop's owner 404
  'PATCH /api/recipes/:id': { expect: [401, 403, 403, 403, 200, 403, 404], params: (w) => ({ id: w.recipeA.id }), send: (req) => req.send({ name: `Recipe ${unique()}` }), write: true },

  'GET /api/demo': { expect: [200, 200, 200, 200, 200, 200, 200] },

  // each caller's own shop: staff read, the owner writes
  'GET /api/shop/margins': { expect: [401, 403, 403, 200, 200, 200, 200] },
  'PUT /api/shop/margins': { expect: [401, 403, 403, 403, 200, 403, 200], send: (req) => req.send({ margins: {}, fairwayWidthM: 5 + (next() % 95) }), write: true },
  // the shop itself: staff read; the owner sets units, closes (a wrong name here: the matrix's shops stay open), reopens and exports
  'GET /api/shop': { expect: [401, 403, 403, 200, 200, 200, 200] },
  'PATCH /api/shop': { expect: [401, 403, 403, 403, 200, 403, 200], send: json({ defaultUnits: 'metric' }), write: true },
  'POST /api/shop/close': { expect: [401, 403, 403, 403, 400, 403, 400], send: json({ shopName: 'Not this shop' }), write: true },
  'POST /api/shop/reopen': { expect: [401, 403, 403, 403, 409, 403, 409], write: true },
  'GET /api/shop/export': { expect: [401, 403, 403, 403, 200, 403, 200] },
  'GET /api/workshop-settings': { expect: [401, 403, 403, 200, 200, 200, 200] },
  'PUT /api/workshop-settings': {
    expect: [401, 403, 403, 403, 200, 403, 200],
    send: (req) => req.send({ wedgeWearRounds: 1 + (next() % 999), wedgeWearPracticeSessions: 40, staticFitTable: [{ heightFromCm: null, heightToCm: null, wristFromCm: null, wristToCm: null, lengthChangeIn: 0 }] }),
    write: true,
  },

  'GET /api/players/:id/bag': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.playerA.id }) },
  // a player adds to their own bag (a remote intake), never to another's
  'POST /api/players/:id/bag/clubs': { expect: [401, 201, 404, 201, 201, 404, 404], params: (w) => ({ id: w.playerA.id }), send: (req) => req.send({ club: '4I', carryEnteredM: 100 + (next() % 300) }), write: true },
  // a fresh club (version 1) per call: an accepted save raises the version
  'PATCH /api/bag-clubs/:id': {
    expect: [401, 200, 404, 200, 200, 404, 404],
    params: async (w) => ({ id: (await buildBagClub(w.playerA, '9I')).id }),
    send: (req) => req.send({ version: 1, carryEnteredM: 100 + (next() % 300) }),
    write: true,
  },
  // the player records their own wedge's use
  'PATCH /api/bag-clubs/:id/wear': {
    expect: [401, 200, 404, 200, 200, 404, 404],
    params: async (w) => ({ id: (await buildBagClub(w.playerA, 'SW')).id }),
    send: (req) => req.send({ version: 1, roundsSince: next() }),
    write: true,
  },
  'GET /api/bag-clubs/:id/history': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.bagClubA.id }) },

  'GET /api/fittings/:id/chosen-builds': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.chosenFittingA.id }) },
  // a fresh fitting with a build per call; the body chooses that build
  'PUT /api/fittings/:id/chosen-builds': {
    expect: [401, 403, 403, 200, 200, 404, 404],
    params: async (w) => {
      const fitting = await buildFitting(w.shopA, w.playerA, w.fitterA);
      return { id: fitting.id, buildId: (await Build.create({ fittingId: fitting.id, club: 'PW', label: `Choice ${unique()}` })).id };
    },
    send: (req, _w, _role, params) => req.send({ builds: [{ buildId: params.buildId, replacesBagClubId: null }] }),
    write: true,
  },
  // a fresh fitting whose chosen build adds a club (nothing to replace, so no versions to send)
  'POST /api/fittings/:id/chosen-builds/confirm': {
    expect: [401, 403, 403, 200, 200, 404, 404],
    params: async (w) => ({ id: (await chosenFitting(w)).id }),
    send: json({ versions: {} }),
    write: true,
  },

  // the player sees the sheet once sent, never the draft
  'GET /api/fittings/:id/spec-sheet': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.sheetA.fittingId }) },
  'GET /api/fittings/:id/spec-sheet (a draft)': { expect: [401, 404, 404, 200, 200, 404, 404], params: (w) => ({ id: w.chosenFittingA.id }) },
  'POST /api/fittings/:id/spec-sheet/send': { expect: [401, 403, 403, 200, 200, 404, 404], params: async (w) => ({ id: (await chosenFitting(w)).id }), write: true },
  'GET /api/spec-sheets/:id': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.sheetA.id! }) },
  'GET /api/spec-sheets/:id/pdf': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.sheetA.id! }) },
  // only the player accepts their sheet: staff of any shop 403 before the lookup; a fresh sheet per call
  'POST /api/spec-sheets/:id/accept': { expect: [401, 200, 404, 403, 403, 403, 403], params: async (w) => ({ id: (await sentSheet(w)).id! }), write: true },

  // remote fittings: the course, the intake, messages, the player's plain words, the request page
  'GET /api/fittings/:id/plain-words': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.chosenFittingA.id }) },
  'GET /api/fittings/:id/course': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  // staff move the course: a fresh requested fitting per call, moved on to "in progress"
  'POST /api/fittings/:id/course': {
    expect: [401, 403, 403, 200, 200, 404, 404],
    params: async (w) => ({ id: (await requestedFitting(w)).id }),
    send: json({ to: 'in-progress' }),
    write: true,
  },
  'GET /api/fittings/:id/intake': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  // only the player answers the intake: staff of any shop 403 before the lookup
  'PUT /api/fittings/:id/intake': {
    expect: [401, 200, 404, 403, 403, 403, 403],
    params: (w) => ({ id: w.fittingA.id }),
    send: (req) => req.send({ handedness: 'right', heightCm: 150 + (next() % 50), wristToFloorCm: 80, handicap: 10 }),
    write: true,
  },
  'GET /api/fittings/:id/messages': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  'POST /api/fittings/:id/messages': { expect: [401, 201, 404, 201, 201, 404, 404], params: (w) => ({ id: w.fittingA.id }), send: (req) => req.send({ body: `Message ${next()}` }), write: true },
  'POST /api/fittings/:id/messages/read': { expect: [401, 200, 404, 200, 200, 404, 404], params: (w) => ({ id: w.fittingA.id }) },
  // the public page shows the shop's name to anyone; a player of that shop asks, staff 403, another shop 404
  'GET /api/requests/:slug': { expect: [200, 200, 200, 200, 200, 200, 200], params: (w) => ({ slug: w.slugA }) },
  'POST /api/requests/:slug': { expect: [401, 201, 201, 403, 403, 404, 404], params: (w) => ({ slug: w.slugA }), send: (req) => req.send({ note: `Request ${next()}` }), write: true },
  'GET /api/shop/request-link': { expect: [401, 403, 403, 200, 200, 200, 200] },
};

/** The route a row's key names (a key may add the record's state in parentheses). */
const routeOf = (key: string) => key.replace(/ \([^)]*\)$/, '');

// Bodies that must differ on every call, so an accepted write always changes a row.
let counter = 0;
const next = () => ++counter;
ROWS['PATCH /api/fittings/:id'].send = (req) => req.send({ notes: `note ${next()}` });
ROWS['PATCH /api/team/:id'].send = (req) => req.send({ name: `Fitter ${next()}` });
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

/** A fresh fitting of player A with one build chosen, added to the bag beside the others. */
async function chosenFitting(w: { shopA: Shop; playerA: Player; fitterA: User }): Promise<Fitting> {
  const fitting = await buildFitting(w.shopA, w.playerA, w.fitterA);
  const build = await Build.create({ fittingId: fitting.id, club: 'DR', label: `Choice ${unique()}`, loftDeg: 10.5 });
  await ChosenBuild.create({ fittingId: fitting.id, buildId: build.id, club: build.club, replacesBagClubId: null });
  return fitting;
}

/** A fresh remote fitting of player A at "requested". */
async function requestedFitting(w: { shopA: Shop; playerA: Player; fitterA: User }): Promise<Fitting> {
  const fitting = await buildFitting(w.shopA, w.playerA, w.fitterA, { remote: true });
  await fitting.update({ courseStep: 'requested' });
  return fitting;
}

const quietMailer: Mailer = { async send() {} };

/** A fresh open invitation to a new player of shop A (through the service, as fitter A). */
async function openInvitation(w: { shopA: Shop; fitterA: User }) {
  const player = await buildPlayer(w.shopA);
  const actor = { id: w.fitterA.id, role: w.fitterA.role, shopId: w.shopA.id, playerId: null, units: w.fitterA.units };
  return invitePlayer(actor, player.id, `open-${unique()}@test.example`, 'https://ovalyard.test', quietMailer);
}

/** A fresh spec sheet sent to player A (through the service, as fitter A). */
async function sentSheet(w: { shopA: Shop; playerA: Player; fitterA: User }) {
  const fitting = await chosenFitting(w);
  const actor = { id: w.fitterA.id, role: w.fitterA.role, shopId: w.shopA.id, playerId: null, units: w.fitterA.units };
  return sendSpecSheet(ctx.sequelize, actor, fitting.id, quietMailer, 'https://ovalyard.test');
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
  await playerA.update({ email: `player-a-${unique()}@test.example` }); // a sheet is sent to it
  await buildPlayer(shopA, { userId: userB.id });
  const fittingA = await buildFitting(shopA, playerA, fitterA, { remote: true });
  const partial = { shopA, fittingA, fitterA };
  const bayFileA = await storeBayFile(partial);
  const buildA = await Build.create({ fittingId: fittingA.id, club: '7I', label: '' });
  const recipeA = await Recipe.create({ shopId: shopA.id, name: `r-${unique()}`, recipe: '{"columns":{}}', createdBy: fitterA.id });
  const bagClubA = await buildBagClub(playerA, '7I', { loftDeg: 34 });
  const chosenFittingA = await chosenFitting({ shopA, playerA, fitterA });
  const sheetA = await sentSheet({ shopA, playerA, fitterA });
  const { slug: slugA } = await ShopRequestLink.create({ shopId: shopA.id, slug: `shop-a-${unique()}` });
  const users: Record<Exclude<Role, 'anonymous'>, User> = { playerA: userA, playerB: userB, fitterA, ownerA, fitterZ, ownerZ };
  return { shopA, shopZ, users, playerA, fitterA, fittingA, bayFileA, buildA, recipeA, bagClubA, chosenFittingA, sheetA, slugA };
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
    `CHECKSUM TABLE shops, users, players, fittings, bay_files, shots, builds, recipes, password_resets, shop_margins,
       bag_clubs, bag_club_history, chosen_builds, chosen_take_outs, chosen_build_confirmations, spec_sheets, workshop_settings,
       email_verifications, invitations,
       fitting_course_steps, fitting_intakes, fitting_messages, fitting_message_reads, shop_request_links`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => `${r.Table}:${String(r.Checksum)}`).join(' ');
}

beforeAll(async () => {
  // Without SMTP_URL the app's mailer writes each message to console.log; the app keeps the
  // function it was given, so a silenced one keeps the sends of the matrix out of the output.
  const quiet = jest.spyOn(console, 'log').mockImplementation(() => {});
  ctx = await createTestContext();
  quiet.mockRestore();
  world = await buildWorld();
});
afterAll(async () => {
  await ctx.close();
});

describe('authorisation matrix', () => {
  it('every route of the app has a row in the matrix (and every row a route)', () => {
    const routes = listRoutes(ctx.app);
    const rowRoutes = new Set(Object.keys(ROWS).map(routeOf));
    expect(routes.filter((r) => !rowRoutes.has(r))).toEqual([]);
    expect(Object.keys(ROWS).filter((r) => !routes.includes(routeOf(r)))).toEqual([]);
  });

  const cells = Object.entries(ROWS).flatMap(([route, row]) => ROLES.map((role, i) => [route, role, row.expect[i]] as const));

  it.each(cells)('%s as %s answers %i', async (route, role, status) => {
    const row = ROWS[route];
    const [method, template] = routeOf(route).split(' ');
    const params = row.params ? await row.params(world, role) : {};
    const path = template.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(params[name]));
    const token = await tokenFor(role);
    const before = row.write ? await fingerprint() : '';
    let req = (request(ctx.app) as unknown as Record<string, (p: string) => Req>)[method.toLowerCase()](path);
    if (token) req = req.set('Authorization', `Bearer ${token}`);
    if (row.send) req = row.send(req, world, role, params);
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
