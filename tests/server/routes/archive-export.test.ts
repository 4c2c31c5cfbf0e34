import { inflateRawSync } from 'node:zlib';
import request from 'supertest';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { Fitting, Player, User } from '@/server/models';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

/** The files of a zip by their central directory (PKWARE APPNOTE 6.3.x, section 4.3.12), stored or deflated. */
function unzip(zip: Buffer): Map<string, string> {
  const files = new Map<string, string>();
  const eocd = zip.lastIndexOf(Buffer.from([0x50, 0x4b, 0x05, 0x06]));
  const count = zip.readUInt16LE(eocd + 10);
  let at = zip.readUInt32LE(eocd + 16);
  for (let i = 0; i < count; i++) {
    const method = zip.readUInt16LE(at + 10);
    const size = zip.readUInt32LE(at + 20);
    const nameLength = zip.readUInt16LE(at + 28);
    const extra = zip.readUInt16LE(at + 30);
    const comment = zip.readUInt16LE(at + 32);
    const local = zip.readUInt32LE(at + 42);
    const name = zip.toString('utf8', at + 46, at + 46 + nameLength);
    const start = local + 30 + zip.readUInt16LE(local + 26) + zip.readUInt16LE(local + 28);
    const data = zip.subarray(start, start + size);
    files.set(name, (method === 8 ? inflateRawSync(data) : data).toString('utf8'));
    at += 46 + nameLength + extra + comment;
  }
  return files;
}

describe('archive and delete', () => {
  it('archiving a player hides them from the list unless asked; a player may not (403), another shop 404, a bad body 400', async () => {
    const w = await buildShopWorld();
    const z = await buildShopWorld();
    const fitter = await signedInAgent(app(), w.fitter.email);
    const res = await fitter.put(`/api/players/${w.otherPlayer.id}/archived`).set(APP_HEADER).send({ archived: true });
    expect(res.status).toBe(200);
    expect(res.body.archived).toBe(true);
    const ids = async (query: string) => (await fitter.get(`/api/players${query}`)).body.map((p: { id: string }) => p.id);
    expect(await ids('')).not.toContain(w.otherPlayer.id);
    expect(await ids('?archived=show')).toContain(w.otherPlayer.id);
    expect(await ids('?archived=only')).toEqual([w.otherPlayer.id]);
    expect((await fitter.get('/api/players?archived=maybe')).status).toBe(400);
    expect((await fitter.put(`/api/players/${w.otherPlayer.id}/archived`).set(APP_HEADER).send({ archived: 'yes' })).status).toBe(400);
    expect((await (await signedInAgent(app(), w.playerUser.email)).put(`/api/players/${w.player.id}/archived`).set(APP_HEADER).send({ archived: true })).status).toBe(403);
    expect((await (await signedInAgent(app(), z.fitter.email)).put(`/api/players/${w.player.id}/archived`).set(APP_HEADER).send({ archived: true })).status).toBe(404);
  });

  it('the players list, searched by e-mail and sorted by name descending, answers those in that order', async () => {
    const w = await buildShopWorld();
    await w.player.update({ name: 'Aster Lund', email: 'aster@club.test' });
    await w.otherPlayer.update({ name: 'Zora Lund', email: 'zora@club.test' });
    const fitter = await signedInAgent(app(), w.fitter.email);
    const res = await fitter.get('/api/players?q=club.test&sort=name-desc');
    expect(res.body.map((p: { name: string }) => p.name)).toEqual(['Zora Lund', 'Aster Lund']);
    expect((await fitter.get('/api/players?sort=sideways')).status).toBe(400);
  });

  it('deleting a player removes their fittings, shots and sign-in; archiving and deleting a fitting works the same way', async () => {
    const w = await buildShopWorld();
    const fitter = await signedInAgent(app(), w.fitter.email);
    const extra = await buildFitting(w.shop, w.otherPlayer, w.fitter);
    const archived = await fitter.put(`/api/fittings/${extra.id}/archived`).set(APP_HEADER).send({ archived: true });
    expect(archived.body.archived).toBe(true);
    expect((await fitter.get('/api/fittings')).body.map((f: { id: string }) => f.id)).not.toContain(extra.id);
    expect((await fitter.get('/api/fittings?archived=only')).body.map((f: { id: string }) => f.id)).toEqual([extra.id]);
    expect((await fitter.delete(`/api/fittings/${extra.id}`).set(APP_HEADER)).status).toBe(204);
    expect(await Fitting.findByPk(extra.id)).toBeNull();
    expect((await fitter.delete(`/api/fittings/${extra.id}`).set(APP_HEADER)).status).toBe(404);

    expect((await fitter.delete(`/api/players/${w.player.id}`).set(APP_HEADER)).status).toBe(204);
    expect(await Player.findByPk(w.player.id)).toBeNull();
    expect(await Fitting.count({ where: { playerId: w.player.id } })).toBe(0);
    expect(await User.findByPk(w.playerUser.id)).toBeNull();
    expect(await User.findByPk(w.fitter.id)).not.toBeNull();
  });
});

describe('exports', () => {
  it('the shop export, the owner, is a zip with JSON and CSV per table, formulas neutralised and no password hashes', async () => {
    const w = await buildShopWorld();
    await w.player.update({ name: '=HYPERLINK("http://x")' });
    const owner = await signedInAgent(app(), w.owner.email);
    const res = await owner.get('/api/shop/export').buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/zip/);
    const files = unzip(res.body as Buffer);
    expect(files.has('json/players.json')).toBe(true);
    expect(files.has('csv/shots.csv')).toBe(true);
    const players = JSON.parse(files.get('json/players.json')!) as { id: string }[];
    expect(players.map((p) => p.id).sort()).toEqual([w.player.id, w.otherPlayer.id].sort());
    // OWASP, "CSV Injection": a cell starting with = is written with a leading apostrophe
    expect(files.get('csv/players.csv')).toContain(`"'=HYPERLINK(""http://x"")"`);
    expect(files.get('json/users.json')).not.toContain('password_hash');
    expect((await (await signedInAgent(app(), w.fitter.email)).get('/api/shop/export')).status).toBe(403);
  });

  it('a player’s export: the player themselves and staff 200, another player and another shop 404, anonymous 401', async () => {
    const w = await buildShopWorld();
    const z = await buildShopWorld();
    const own = await (await signedInAgent(app(), w.playerUser.email)).get(`/api/players/${w.player.id}/export`).buffer(true).parse(binary);
    expect(own.status).toBe(200);
    const files = unzip(own.body as Buffer);
    expect(JSON.parse(files.get('json/person.json')!)[0].id).toBe(w.player.id);
    expect(JSON.parse(files.get('json/fittings.json')!).map((f: { id: string }) => f.id)).toEqual([w.fitting.id]);
    expect((await (await signedInAgent(app(), w.playerUser.email)).get(`/api/players/${w.otherPlayer.id}/export`)).status).toBe(404);
    expect((await (await signedInAgent(app(), w.fitter.email)).get(`/api/players/${w.player.id}/export`)).status).toBe(200);
    expect((await (await signedInAgent(app(), z.owner.email)).get(`/api/players/${w.player.id}/export`)).status).toBe(404);
    expect((await request(app()).get(`/api/players/${w.player.id}/export`)).status).toBe(401);
    expect((await (await signedInAgent(app(), w.fitter.email)).get('/api/players/not-an-id/export')).status).toBe(400);
  });
});

function app() {
  return ctx.app;
}
