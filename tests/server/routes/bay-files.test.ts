import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { buildFitting, buildPlayer, buildShopWorld } from '@/fixtures/builders';
import { createApp } from '@/server/app';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
let rival: Awaited<ReturnType<typeof buildShopWorld>>;
beforeAll(async () => {
  ctx = await createTestContext({ UPLOAD_MAX_BYTES: String(64 * 1024), UPLOAD_MAX_ROWS: '400' });
  world = await buildShopWorld();
  rival = await buildShopWorld();
});
afterAll(async () => {
  await ctx.close();
});

/** A small invented session: 7 irons with two shafts, speeds in mph, carry in yards, side as L/R. */
function sessionCsv(rows = 12, extra = ''): string {
  const lines = ['Club,Shaft,Ball Speed (mph),Club Speed (mph),Launch (deg),Spin (rpm),Carry (yds),Side (yds)'];
  for (let i = 0; i < rows; i += 1) {
    const shaft = i % 2 ? 'Graphite 65' : 'Steel 105';
    const side = i % 3 === 0 ? `${(i % 5) + 1}.5 L` : `${(i % 4) + 0.5} R`;
    lines.push(`7 Iron,${shaft},${(112 + (i % 5)).toFixed(1)},${(84 + (i % 3)).toFixed(1)},${(17 + (i % 4) * 0.5).toFixed(1)},${6600 + i * 20},${160 + (i % 6)},${side}`);
  }
  return lines.join('\n') + '\n' + extra;
}

const upload = (agent: ReturnType<typeof request.agent>, url: string, csv: string | Buffer, options: unknown = {}, name = 'session.csv') =>
  agent.post(url).set(APP_HEADER).field('options', JSON.stringify(options)).attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), name);

async function shotCount(fittingId: string): Promise<number> {
  const [row] = await ctx.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM shots WHERE fitting_id = ?', { replacements: [fittingId], type: QueryTypes.SELECT });
  return Number(row.n);
}
async function fileCount(fittingId: string): Promise<number> {
  const [row] = await ctx.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM bay_files WHERE fitting_id = ?', { replacements: [fittingId], type: QueryTypes.SELECT });
  return Number(row.n);
}

describe('bay-file preview', () => {
  it('preview of a CSV suggests a mapping with reasons and converts the first rows, storing nothing', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, sessionCsv());
    expect(res.status).toBe(200);
    const byHeader = Object.fromEntries(res.body.suggestions.map((s: { header: string; field: string; unit: string | null }) => [s.header, s]));
    expect(byHeader['Carry (yds)']).toMatchObject({ field: 'carry' });
    expect(byHeader['Club']).toMatchObject({ field: 'club' });
    expect(byHeader['Shaft']).toMatchObject({ field: 'build' });
    expect(res.body.suggestions.every((s: { reason: string }) => s.reason.length > 0)).toBe(true);
    expect(res.body.report).toMatchObject({ rows: 12, imported: 12, rejected: [] });
    // 160 yd = 146.304 m exactly (NIST SP 811: 1 yd = 0.9144 m)
    expect(res.body.shots[0].values.carry).toBeCloseTo(146.304, 6);
    expect(res.body.shots[0].club).toBe('7I');
    expect(res.body.shots[0].values.offline).toBeLessThan(0); // "1.5 L" is left
    expect(await fileCount(world.fitting.id)).toBe(0);
  });

  it('preview without a file answers 400 NO_FILE', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post(`/api/fittings/${world.fitting.id}/bay-files/preview`).set(APP_HEADER).field('options', '{}');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('NO_FILE');
  });

  it('preview of a binary file answers 400 NOT_TEXT', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 1, 2]), {}, 'photo.png');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('NOT_TEXT');
  });

  it('preview of an empty file answers 400 with a code', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, '');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toMatch(/EMPTY|NO_/);
  });

  it('an upload over the size cap answers 413 FILE_TOO_LARGE', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const big = sessionCsv(12) + 'x'.repeat(70 * 1024);
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, big);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('FILE_TOO_LARGE');
  });

  it('an upload over the row cap answers 400 TOO_MANY_ROWS', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, sessionCsv(800));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('TOO_MANY_ROWS');
  });

  it('bad options JSON answers 400', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await agent.post(`/api/fittings/${world.fitting.id}/bay-files/preview`).set(APP_HEADER).field('options', '{nope').attach('file', Buffer.from(sessionCsv()), 'a.csv');
    expect(res.status).toBe(400);
  });
});

describe('files written for the player\'s hand', () => {
  // A left-hander's session whose file writes club path and face for the hand: 3.5 means 3.5° in-to-out,
  // which for a left-hander points left of the target line (common practice, no source).
  const lefty = 'Club,Ball Speed (mph),Carry (yds),Offline (yds),Club Path (deg),Face Angle (deg)\n7 Iron,114.0,162,6.0,3.5,0.8\n7 Iron,113.2,160,-2.0,-1.5,1.9\n';
  const recipe = { columns: { 'Club Path (deg)': { field: 'clubPath', unit: 'deg', handed: true }, 'Face Angle (deg)': { field: 'faceAngle', unit: 'deg', handed: true } } };

  it('the preview says the player\'s hand; a left-hander\'s handed columns are stored turned round, ground values as written', async () => {
    const player = await buildPlayer(world.shop);
    await player.update({ handedness: 'left' });
    const fitting = await buildFitting(world.shop, player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const preview = await upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, lefty, { recipe });
    expect(preview.status).toBe(200);
    expect(preview.body.hand).toBe('left');
    expect(preview.body.recipe.columns['Club Path (deg)']).toMatchObject({ field: 'clubPath', handed: true });
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, lefty, { recipe });
    expect(res.status).toBe(201);
    const shots = (await agent.get(`/api/fittings/${fitting.id}/shots`).query({ sort: 'row' })).body.shots as { values: Record<string, number> }[];
    expect(shots.map((s) => s.values.clubPath)).toEqual([-3.5, 1.5]);
    expect(shots.map((s) => s.values.faceAngle)).toEqual([-0.8, -1.9]);
    // ground values are the same for both hands: 6 yd right stays right (NIST SP 811: 1 yd = 0.9144 m)
    expect(shots[0].values.offline).toBeCloseTo(6 * 0.9144, 9);
  });

  it('a right-hander\'s handed columns are stored as written', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const preview = await upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, lefty, { recipe });
    expect(preview.body.hand).toBe('right');
    expect(preview.body.shots[0].values.clubPath).toBe(3.5);
  });

  it('a recipe marking L and R letters as written for the hand answers 400', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const bad = { columns: { 'Offline (yds)': { field: 'offline', unit: 'yd', side: 'suffix-LR', handed: true } } };
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, lefty, { recipe: bad });
    expect(res.status).toBe(400);
  });
});

describe('bay-file commit', () => {
  it('commit stores the file, its shots and builds; the same file again answers 409', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, sessionCsv(), { saveRecipeAs: 'Bay 2 export' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ rowCount: 12, shotCount: 12, fileName: 'session.csv' });
    expect(res.body.report.groups).toEqual(expect.arrayContaining([{ club: '7I', build: 'Steel 105', n: 6 }, { club: '7I', build: 'Graphite 65', n: 6 }]));
    expect(await shotCount(fitting.id)).toBe(12);
    const builds = await agent.get(`/api/fittings/${fitting.id}/builds`);
    expect(builds.body.map((b: { label: string }) => b.label).sort()).toEqual(['Graphite 65', 'Steel 105']);
    const recipes = await agent.get('/api/recipes');
    expect(recipes.body.map((r: { name: string }) => r.name)).toContain('Bay 2 export');
    const again = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, sessionCsv());
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('DUPLICATE_FILE');
    const fittingView = await agent.get(`/api/fittings/${fitting.id}`);
    expect(fittingView.body.shotCount).toBe(12);
  });

  it('a row that cannot be read is reported with its row number and not stored; the others are', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const csv = sessionCsv(6, '7 Iron,Steel 105,fast,85,17,6600,160,2 R\n');
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, csv);
    expect(res.status).toBe(201);
    expect(res.body.shotCount).toBe(6);
    expect(res.body.report.rejected).toHaveLength(1);
    expect(res.body.report.rejected[0]).toMatchObject({ row: 7 });
    expect(res.body.report.rejected[0].reason).toMatch(/fast|number|read/i);
    expect(await shotCount(fitting.id)).toBe(6);
  });

  it('a failure in the middle of storing leaves no bay file and no shot behind', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const failing = createApp({
      sequelize: ctx.sequelize,
      config: ctx.config,
      log: () => {},
      commitHooks: {
        afterChunk: () => {
          throw new Error('injected failure after the first chunk');
        },
      },
    });
    const agent = await signedInAgent(failing, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, sessionCsv(300));
    expect(res.status).toBe(500);
    expect(await fileCount(fitting.id)).toBe(0);
    expect(await shotCount(fitting.id)).toBe(0);
  });

  it('one build for the whole file overrides the build column', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, sessionCsv(), { builds: { mode: 'file', build: 'Test head B' } });
    expect(res.status).toBe(201);
    expect(res.body.report.groups).toEqual([{ club: '7I', build: 'Test head B', n: 12 }]);
  });

  it('re-mapping a file replaces its shots in one go and keeps the fitter’s decisions by row', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const created = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, sessionCsv());
    const shots = (await agent.get(`/api/fittings/${fitting.id}/shots`)).body.shots;
    expect(shots).toHaveLength(12);
    const first = shots.find((s: { row: number }) => s.row === 1);
    expect((await agent.patch(`/api/shots/${first.id}`).set(APP_HEADER).send({ decision: 'drop' })).status).toBe(200);
    const recipe = { ...created.body.recipe, columns: { ...created.body.recipe.columns, 'Carry (yds)': { field: 'carry', unit: 'm' } } };
    const res = await agent.put(`/api/bay-files/${created.body.id}/recipe`).set(APP_HEADER).send({ recipe });
    expect(res.status).toBe(200);
    const after = (await agent.get(`/api/fittings/${fitting.id}/shots`)).body.shots;
    expect(after).toHaveLength(12);
    const row1 = after.find((s: { row: number }) => s.row === 1);
    expect(row1.values.carry).toBeCloseTo(160, 9); // now read as metres
    expect(row1.decision).toBe('drop');
  });

  it('deleting a bay file removes its shots', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const created = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, sessionCsv());
    expect((await agent.delete(`/api/bay-files/${created.body.id}`).set(APP_HEADER)).status).toBe(204);
    expect(await shotCount(fitting.id)).toBe(0);
  });
});

describe('bay-file access', () => {
  it('a player may not upload to a fitting that is not remote (403), but may to their remote one', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    const denied = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, sessionCsv());
    expect(denied.status).toBe(403);
    const remote = await buildFitting(world.shop, world.player, world.fitter, { remote: true });
    const ok = await upload(agent, `/api/fittings/${remote.id}/bay-files`, sessionCsv());
    expect(ok.status).toBe(201);
  });

  it('a player may not upload to another player’s remote fitting (404)', async () => {
    const other = await buildFitting(world.shop, world.otherPlayer, world.fitter, { remote: true });
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await upload(agent, `/api/fittings/${other.id}/bay-files/preview`, sessionCsv())).status).toBe(404);
  });

  it('another shop’s fitter gets 404 on preview, list, shots and the raw file', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const own = await signedInAgent(ctx.app, world.fitter.email);
    const created = await upload(own, `/api/fittings/${fitting.id}/bay-files`, sessionCsv());
    const agent = await signedInAgent(ctx.app, rival.fitter.email);
    expect((await upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, sessionCsv())).status).toBe(404);
    expect((await agent.get(`/api/fittings/${fitting.id}/bay-files`)).status).toBe(404);
    expect((await agent.get(`/api/fittings/${fitting.id}/shots`)).status).toBe(404);
    expect((await agent.get(`/api/bay-files/${created.body.id}/raw`)).status).toBe(404);
    expect((await agent.delete(`/api/bay-files/${created.body.id}`).set(APP_HEADER)).status).toBe(404);
  });

  it('without a session every bay-file route answers 401', async () => {
    expect((await request(ctx.app).get(`/api/fittings/${world.fitting.id}/bay-files`)).status).toBe(401);
    expect((await request(ctx.app).get('/api/recipes')).status).toBe(401);
  });

  it('a player may not list or save the shop’s recipes (403)', async () => {
    const agent = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await agent.get('/api/recipes')).status).toBe(403);
  });
});

describe('saved recipes with edits', () => {
  it('a preview with a saved recipe and an edit that takes a field from a saved column gives that column up', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const saved = await agent.post('/api/recipes').set(APP_HEADER).send({
      name: `Two carries ${Date.now()}`,
      recipe: { columns: { 'Carry (yds)': { field: 'carry', unit: 'yd' }, 'Side (yds)': { field: 'offline', unit: 'yd', side: 'suffix-LR' } } },
    });
    expect(saved.status).toBe(201);
    const csv = 'Club,Carry (yds),Carry (m),Side (yds)\n7 Iron,160,150,2 L\n7 Iron,162,151,1 R\n7 Iron,158,149,0.5 L\n';
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, csv, {
      recipeId: saved.body.id,
      recipe: { columns: { 'Carry (m)': { field: 'carry', unit: 'm' } } },
    });
    expect(res.status).toBe(200);
    expect(res.body.recipe.columns['Carry (yds)'].field).toBe('ignore');
    expect(res.body.shots[0].values.carry).toBe(150);
  });
});

describe('bay-file encodings', () => {
  it('a UTF-16 file with a byte-order mark and a Windows-1252 file both preview', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const csv = sessionCsv(4);
    const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(csv, 'utf16le')]);
    const a = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, utf16);
    expect(a.status).toBe(200);
    expect(a.body.report.imported).toBe(4);
    const latin = Buffer.from(csv.replace('Launch (deg)', 'Launch (\u00b0)'), 'latin1'); // ° as the single byte 0xB0
    const b = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files/preview`, latin);
    expect(b.status).toBe(200);
    expect(b.body.report.imported).toBe(4);
    expect(b.body.suggestions.find((s: { header: string }) => s.header === 'Launch (°)').field).toBe('launchAngle');
  });
});

describe('builds', () => {
  it('shots with no build name get a build record; its loft reaches the ladder', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const csv = ['Club,Carry (m),Side (m),Ball Speed (m/s)', ...[0, 1, 2, 3].flatMap((i) => [`PW,${110 + i},${i - 1.5},40`, `GW,${100 + i},${1.5 - i},37`])].join('\n');
    expect((await upload(agent, `/api/fittings/${fitting.id}/bay-files`, csv)).status).toBe(201);
    const builds = (await agent.get(`/api/fittings/${fitting.id}/builds`)).body as { id: string; club: string; label: string }[];
    expect(builds.map((b) => `${b.club}|${b.label}`).sort()).toEqual(['GW|', 'PW|']);
    for (const [club, loft] of [['PW', 46], ['GW', 52]] as const) {
      const id = builds.find((b) => b.club === club)!.id;
      expect((await agent.patch(`/api/builds/${id}`).set(APP_HEADER).send({ loftDeg: loft })).status).toBe(200);
    }
    const specs = { loftDeg: 46, lieDeg: 63.5, lengthIn: 35.5, shaftWeightG: 120, torqueDeg: 1.8, addedMassG: 2 };
    const pw = builds.find((b) => b.club === 'PW')!.id;
    const saved = await agent.patch(`/api/builds/${pw}`).set(APP_HEADER).send(specs);
    expect(saved.body).toMatchObject(specs); // each number in its own column
    expect((await agent.get(`/api/fittings/${fitting.id}/builds`)).body.find((b: { id: string }) => b.id === pw)).toMatchObject(specs);
    const ladder = (await agent.get(`/api/fittings/${fitting.id}/analysis`)).body.analysis.ladder;
    expect(ladder[0]).toMatchObject({ club: 'PW', loftDeg: 46, loftStepToNextDeg: 6 });
    const rival2 = await signedInAgent(ctx.app, rival.fitter.email);
    expect((await rival2.patch(`/api/builds/${builds[0].id}`).set(APP_HEADER).send({ loftDeg: 40 })).status).toBe(404);
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    expect((await player.patch(`/api/builds/${builds[0].id}`).set(APP_HEADER).send({ loftDeg: 40 })).status).toBe(403);
  });
});
