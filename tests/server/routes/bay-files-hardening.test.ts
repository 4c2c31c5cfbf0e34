/**
 * The bay-file defects of the hardening issue, each reproduced: names that preview and commit
 * read alike (D3), text that fits its columns (D4), a cut-off upload (D5), a large file off the
 * event loop (D6), imports at the same moment (D7), who may re-map a file, the raw download, the
 * one rule for recipe names, and a database failure that is not "not found".
 */
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { MAX_COLUMNS } from '@/analysis/import/import-limits';
import { generateBayFile } from '@/scripts/bench/import';
import { closeApp, createApp } from '@/server/app';
import { createSequelize } from '@/server/db';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
beforeAll(async () => {
  ctx = await createTestContext({ UPLOAD_MAX_BYTES: String(24 * 1024 * 1024), UPLOAD_MAX_ROWS: '200000' });
  world = await buildShopWorld();
});
afterAll(async () => {
  await ctx.close();
});

const upload = (agent: ReturnType<typeof request.agent>, url: string, csv: string, options: unknown = {}, name = 'session.csv') =>
  agent.post(url).set(APP_HEADER).field('options', JSON.stringify(options)).attach('file', Buffer.from(csv), name);

async function count(sql: string, id: string): Promise<number> {
  const [row] = await ctx.sequelize.query<{ n: number }>(sql, { replacements: [id], type: QueryTypes.SELECT });
  return Number(row.n);
}
const shotsOf = (fittingId: string) => count('SELECT COUNT(*) AS n FROM shots WHERE fitting_id = ?', fittingId);
const filesOf = (fittingId: string) => count('SELECT COUNT(*) AS n FROM bay_files WHERE fitting_id = ?', fittingId);
const buildsOf = (fittingId: string) => count('SELECT COUNT(*) AS n FROM builds WHERE fitting_id = ?', fittingId);

describe('D3: names in preview and commit', () => {
  it('builds that differ only in case or accents: preview shows three groups and commit stores three builds (201)', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const csv = 'Club,Shaft,Carry (m)\n7 Iron,Steel,150\n7 Iron,steel,151\n7 Iron,Stéel,152\n';
    const preview = await upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, csv);
    expect(preview.status).toBe(200);
    expect(preview.body.report.groups).toHaveLength(3);
    const commit = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, csv);
    expect(commit.status).toBe(201);
    expect(await buildsOf(fitting.id)).toBe(3);
  });

  it('two long build labels sharing their first 80 characters: preview shows one group and commit stores one build', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const stem = 'Graphite '.repeat(10);
    const csv = `Club,Shaft,Carry (m)\n7 Iron,${stem}one,150\n7 Iron,${stem}two,151\n${'x'.repeat(50)},Steel,150\n${'x'.repeat(40)}y,Steel,150\n`;
    const preview = await upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, csv);
    expect(preview.body.report.groups).toHaveLength(2);
    const commit = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, csv);
    expect(commit.status).toBe(201);
    expect(await buildsOf(fitting.id)).toBe(2);
  });
});

describe('D4: stored text within its columns', () => {
  it(`a 60 KB file with 1,502 columns answers 400 TOO_MANY_COLUMNS (the cap is ${MAX_COLUMNS}), not 500`, async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const header = ['Club', 'Carry (m)', ...Array.from({ length: 1500 }, (_, i) => `Extra column ${i}`)].join(',');
    const row = ['7 Iron', '150', ...Array.from({ length: 1500 }, () => '1')].join(',');
    const res = await upload(agent, `/api/fittings/${world.fitting.id}/bay-files`, `${header}\n${row}\n${row}\n`);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('TOO_MANY_COLUMNS');
  });

  it(`a file of ${MAX_COLUMNS} columns with 200-character headers commits and its recipe saves (a recipe over 64 KB)`, async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const extra = Array.from({ length: MAX_COLUMNS - 2 }, (_, i) => `Extra ${String(i).padStart(4, '0')} ${'h'.repeat(188)}`);
    const header = ['Club', 'Carry (m)', ...extra].join(',');
    const row = ['7 Iron', '150', ...extra.map(() => '1')].join(',');
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, `${header}\n${row}\n`, { saveRecipeAs: 'Wide export' });
    expect(res.body).toMatchObject({ shotCount: 1 });
    expect(res.status).toBe(201);
    const [saved] = await ctx.sequelize.query<{ n: number }>('SELECT LENGTH(recipe) AS n FROM recipes WHERE shop_id = ? AND name = ?', {
      replacements: [world.shop.id, 'Wide export'],
      type: QueryTypes.SELECT,
    });
    expect(Number(saved.n)).toBeGreaterThan(65_535);
  });
});

describe('D5: a cut-off upload', () => {
  it('a multipart body that ends before its closing boundary answers 400 BAD_UPLOAD', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const body = '--XYZ\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\nContent-Type: text/csv\r\n\r\nClub,Carry (m)\r\n7 Iron,15';
    const res = await agent
      .post(`/api/fittings/${world.fitting.id}/bay-files/preview`)
      .set(APP_HEADER)
      .set('Content-Type', 'multipart/form-data; boundary=XYZ')
      .send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_UPLOAD');
  });
});

describe('D6: a 200,000-row file does not hold up other requests', () => {
  // While the file is read, a health check is asked every 25 ms. With the reading on the event
  // loop no check could finish before the import's answer; in the worker pool many do.
  async function healthChecksDuring(send: () => Promise<request.Response>): Promise<{ res: request.Response; answeredBefore: number }> {
    let done = false;
    let answeredBefore = 0;
    const poll = (async () => {
      while (!done) {
        const t = request(ctx.app).get('/api/health');
        await t;
        if (!done) answeredBefore++;
        await new Promise((r) => setTimeout(r, 25));
      }
    })();
    const res = await send();
    done = true;
    await poll;
    return { res, answeredBefore };
  }

  it('preview of 200,000 rows and commit of 50,000 answer while health checks keep being answered', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const csv = generateBayFile(200_000);
    const preview = await healthChecksDuring(() => upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, csv));
    expect(preview.res.status).toBe(200);
    expect(preview.res.body.report.imported).toBeGreaterThan(190_000);
    expect(preview.answeredBefore).toBeGreaterThanOrEqual(3);
    const commit = await healthChecksDuring(() => upload(agent, `/api/fittings/${fitting.id}/bay-files`, generateBayFile(50_000)));
    expect(commit.res.status).toBe(201);
    expect(commit.answeredBefore).toBeGreaterThanOrEqual(3);
    expect(await shotsOf(fitting.id)).toBe(commit.res.body.shotCount);
  }, 180_000);
});

describe('D7: imports into one fitting at the same moment', () => {
  const session = (seed: number) => {
    const lines = ['Club,Shaft,Ball Speed (mph),Carry (yds)'];
    for (let i = 0; i < 40; i++) lines.push(`${i % 2 ? 'Driver' : '7 Iron'},${['Steel 105', 'Graphite 65', 'Graphite 75'][i % 3]},${120 + ((seed * 7 + i) % 30)},${150 + ((seed + i) % 40)}`);
    return `${lines.join('\n')}\n`;
  };

  it('six different files at once all store (201), with every shot and one build per name', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const answers = await Promise.all(Array.from({ length: 6 }, (_, i) => upload(agent, `/api/fittings/${fitting.id}/bay-files`, session(i), {}, `s${i}.csv`)));
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201, 201, 201, 201]);
    expect(await filesOf(fitting.id)).toBe(6);
    expect(await shotsOf(fitting.id)).toBe(240);
    expect(await buildsOf(fitting.id)).toBe(6); // 2 clubs × 3 shafts
  });

  it('the same file twice at once stores once; the other answers 409 DUPLICATE_FILE', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const answers = await Promise.all([0, 1].map(() => upload(agent, `/api/fittings/${fitting.id}/bay-files`, session(99))));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
    expect(answers.find((a) => a.status === 409)!.body.error.code).toBe('DUPLICATE_FILE');
    expect(await filesOf(fitting.id)).toBe(1);
    expect(await shotsOf(fitting.id)).toBe(40);
  });
});

describe('who may re-map a file', () => {
  it('on a remote fitting the player may re-map the file they uploaded (200) but not the fitter’s (403)', async () => {
    const remote = await buildFitting(world.shop, world.player, world.fitter, { remote: true });
    const fitter = await signedInAgent(ctx.app, world.fitter.email);
    const player = await signedInAgent(ctx.app, world.playerUser.email);
    const csv = 'Club,Carry (m),Side (m)\n7 Iron,150,2\n7 Iron,152,-1\n';
    const byFitter = await upload(fitter, `/api/fittings/${remote.id}/bay-files`, csv);
    const byPlayer = await upload(player, `/api/fittings/${remote.id}/bay-files`, csv.replace('152', '153'));
    expect([byFitter.status, byPlayer.status]).toEqual([201, 201]);
    const recipe = { columns: { 'Side (m)': { field: 'offline', unit: 'm', side: 'signed-left-positive' } } };
    const refused = await player.put(`/api/bay-files/${byFitter.body.id}/recipe`).set(APP_HEADER).send({ recipe });
    expect(refused.status).toBe(403);
    const own = await player.put(`/api/bay-files/${byPlayer.body.id}/recipe`).set(APP_HEADER).send({ recipe });
    expect(own.status).toBe(200);
    expect((await fitter.put(`/api/bay-files/${byPlayer.body.id}/recipe`).set(APP_HEADER).send({ recipe })).status).toBe(200);
  });
});

describe('the raw download', () => {
  it('comes as an attachment with nosniff, formula cells neutralised (OWASP, "CSV Injection") and numbers as written', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const csv = 'Club,Note,Carry (m),Side (m)\n7 Iron,"=HYPERLINK(""http://evil.example"",""x"")",150,-2.50\n7 Iron,@SUM(A1),151,+1\n';
    const created = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, csv, {}, 'odd.csv');
    expect(created.status).toBe(201);
    const raw = await agent.get(`/api/bay-files/${created.body.id}/raw`);
    expect(raw.status).toBe(200);
    expect(raw.headers['x-content-type-options']).toBe('nosniff');
    expect(raw.headers['content-disposition']).toMatch(/^attachment; filename="?odd\.csv"?/);
    expect(raw.text).toContain(`"'=HYPERLINK(""http://evil.example"",""x"")"`);
    expect(raw.text).toContain(`'@SUM(A1)`);
    expect(raw.text).toContain(',-2.50\n');
    expect(raw.text).not.toMatch(/(^|,)=HYPERLINK/m);
  });
});

describe('one rule for recipe names', () => {
  it('a commit that would save a recipe under a taken name answers 409 RECIPE_NAME_TAKEN and stores nothing; preview warns first', async () => {
    const fitting = await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const saved = await agent.post('/api/recipes').set(APP_HEADER).send({ name: 'Bay two', recipe: { columns: { 'Carry (m)': { field: 'carry', unit: 'm' } } } });
    expect(saved.status).toBe(201);
    const csv = 'Club,Carry (m)\n7 Iron,150\n';
    const preview = await upload(agent, `/api/fittings/${fitting.id}/bay-files/preview`, csv, { saveRecipeAs: 'Bay two' });
    expect(preview.body.recipeNameTaken).toBe(true);
    const res = await upload(agent, `/api/fittings/${fitting.id}/bay-files`, csv, { saveRecipeAs: 'Bay two' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('RECIPE_NAME_TAKEN');
    expect(await filesOf(fitting.id)).toBe(0);
    const again = await agent.post('/api/recipes').set(APP_HEADER).send({ name: 'Bay two', recipe: { columns: {} } });
    expect(again.status).toBe(409);
  });
});

describe('a database failure is not "not found"', () => {
  it('with the database out of reach a bay file, a fitting, its shots and builds answer 503 UNAVAILABLE, not 404', async () => {
    const agent = await signedInAgent(ctx.app, world.fitter.email);
    const list = await agent.get(`/api/fittings/${world.fitting.id}/bay-files`);
    expect(list.status).toBe(200);
    // a second app on a database server that does not answer (a closed port), with a valid token
    const sign = await request(ctx.app).post('/api/auth/sign-in').send({ email: world.fitter.email, password: 'correct horse battery' });
    const token = /ovy_session=([^;]+)/.exec(String(sign.headers['set-cookie']))![1];
    const gone = createSequelize({ ...ctx.config.db, port: 1 });
    const app = createApp({ sequelize: gone, config: ctx.config, log: () => {} });
    const res = await request(app).get(`/api/bay-files/00000000-0000-4000-8000-000000000000`).set('Authorization', `Bearer ${token}`);
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('UNAVAILABLE');
    // The same for a fitting, its shots and its builds (fittings.ts and shots.ts services).
    for (const url of [`/api/fittings/${world.fitting.id}`, `/api/fittings/${world.fitting.id}/shots`, `/api/fittings/${world.fitting.id}/builds`]) {
      const r = await request(app).get(url).set('Authorization', `Bearer ${token}`);
      expect([url, r.status, r.body.error?.code]).toEqual([url, 503, 'UNAVAILABLE']);
    }
    const patch = await request(app).patch('/api/shots/00000000-0000-4000-8000-000000000000').set('Authorization', `Bearer ${token}`).send({ decision: 'drop' });
    expect([patch.status, patch.body.error?.code]).toEqual([503, 'UNAVAILABLE']);
    await closeApp(app);
    await gone.close();
  });
});
