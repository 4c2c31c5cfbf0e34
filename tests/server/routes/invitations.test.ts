import request from 'supertest';
import { buildPlayer, buildShopWorld } from '@/fixtures/builders';
import { createApp } from '@/server/app';
import { Player, User } from '@/server/models';
import type { MailMessage } from '@/server/services/mailer';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
const mail: MailMessage[] = [];
let app: ReturnType<typeof createApp>;
beforeAll(async () => {
  ctx = await createTestContext();
  app = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, appUrl: 'http://ovalyard.test' }, mailer: { send: async (m) => void mail.push(m) }, log: () => {} });
});
afterAll(async () => {
  await ctx.close();
});

const PASSWORD = 'copper lantern orchard';
const linkOf = (m: MailMessage) => /\/invite\/([A-Za-z0-9_-]+)/.exec(m.text)?.[1] ?? null;
let n = 0;
const fresh = () => `invitee-${Date.now()}-${++n}@test.example`;
const accept = (token: string, password = PASSWORD) => request(app).post('/api/auth/invitation/accept').set(APP_HEADER).send({ token, password });

describe('invitations', () => {
  it('the owner invites a fitter: a one-use link, the fitter sets a password and is signed in as a fitter of the shop', async () => {
    const w = await buildShopWorld();
    const owner = await signedInAgent(app, w.owner.email);
    const email = fresh();
    const res = await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Tova Ring', email });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ role: 'fitter', email, status: 'open' });
    const token = linkOf(mail.at(-1)!)!;
    expect(mail.at(-1)!.to).toBe(email);
    expect((await owner.get('/api/team/invitations')).body.map((i: { id: string }) => i.id)).toContain(res.body.id);

    const preview = await request(app).post('/api/auth/invitation').set(APP_HEADER).send({ token });
    expect(preview.body).toEqual({ name: 'Tova Ring', email, shopName: w.shop.name, role: 'fitter' });
    const weak = await accept(token, 'password12');
    expect(weak.status).toBe(400);
    expect(weak.body.error.code).toBe('WEAK_PASSWORD');
    const ok = await accept(token);
    expect(ok.status).toBe(201);
    expect(ok.body.user).toMatchObject({ role: 'fitter', shop: { id: w.shop.id } });
    expect(ok.headers['set-cookie']).toBeTruthy();
    const used = await accept(token);
    expect(used.status).toBe(400);
    expect(used.body.error.code).toBe('INVITATION_INVALID');
    expect((await owner.get('/api/team/invitations')).body.map((i: { id: string }) => i.id)).not.toContain(res.body.id);
  });

  it('staff invite a player from their page: accepting links the sign-in to that profile only', async () => {
    const w = await buildShopWorld();
    const fitter = await signedInAgent(app, w.fitter.email);
    const player = await buildPlayer(w.shop, { name: 'Edda Quill' });
    const email = fresh();
    const res = await fitter.post(`/api/players/${player.id}/invitations`).set(APP_HEADER).send({ email });
    expect(res.status).toBe(201);
    expect((await fitter.get(`/api/players/${player.id}/invitations`)).body).toHaveLength(1);
    const ok = await accept(linkOf(mail.at(-1)!)!);
    expect(ok.body.user).toMatchObject({ role: 'player', playerId: player.id });
    expect((await Player.findByPk(player.id))!.email).toBe(email);
    const again = await fitter.post(`/api/players/${player.id}/invitations`).set(APP_HEADER).send({ email: fresh() });
    expect(again.status).toBe(409);
  });

  it('an address with an account in another shop gets the same 201 and an "already have an account" mail, never a link', async () => {
    const w = await buildShopWorld();
    const other = await buildShopWorld();
    const owner = await signedInAgent(app, w.owner.email);
    const taken = await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Someone', email: other.fitter.email });
    const freshRes = await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Someone', email: fresh() });
    expect(taken.status).toBe(201);
    expect(Object.keys(taken.body).sort()).toEqual(Object.keys(freshRes.body).sort());
    const sentToTaken = mail.filter((m) => m.to === other.fitter.email).at(-1)!;
    expect(linkOf(sentToTaken)).toBeNull();
    expect(sentToTaken.text).toMatch(/has an Ovalyard account already/);
    expect((await User.findOne({ where: { email: other.fitter.email } }))!.shopId).toBe(other.shop.id);
  });

  it('resend makes a new link (the old stops working); revoke ends it; expired and unknown links answer the one message', async () => {
    const w = await buildShopWorld();
    const owner = await signedInAgent(app, w.owner.email);
    const inv = await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Pim Vale', email: fresh() });
    const first = linkOf(mail.at(-1)!)!;
    expect((await owner.post(`/api/invitations/${inv.body.id}/resend`).set(APP_HEADER)).status).toBe(200);
    const second = linkOf(mail.at(-1)!)!;
    const messages = new Set<string>();
    const old = await request(app).post('/api/auth/invitation').set(APP_HEADER).send({ token: first });
    messages.add(old.body.error.message);
    expect(old.status).toBe(400);
    expect((await request(app).post('/api/auth/invitation').set(APP_HEADER).send({ token: second })).status).toBe(200);
    expect((await owner.delete(`/api/invitations/${inv.body.id}`).set(APP_HEADER)).status).toBe(204);
    const revoked = await request(app).post('/api/auth/invitation').set(APP_HEADER).send({ token: second });
    messages.add(revoked.body.error.message);
    const unknown = await request(app).post('/api/auth/invitation').set(APP_HEADER).send({ token: 'x'.repeat(43) });
    messages.add(unknown.body.error.message);
    const inv2 = await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Pim Vale', email: fresh() });
    await ctx.sequelize.query('UPDATE invitations SET expires_at = ? WHERE id = ?', { replacements: [new Date(Date.now() - 1000), inv2.body.id] });
    const expired = await accept(linkOf(mail.at(-1)!)!);
    messages.add(expired.body.error.message);
    expect(new Set([old.body.error.code, revoked.body.error.code, unknown.body.error.code, expired.body.error.code])).toEqual(new Set(['INVITATION_INVALID']));
    expect(messages.size).toBe(1);
  });

  it('roles and shops: a fitter may not invite fitters (403), another shop’s invitation and player answer 404, anonymous 401, a bad body 400', async () => {
    const w = await buildShopWorld();
    const z = await buildShopWorld();
    const owner = await signedInAgent(app, w.owner.email);
    const inv = await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Ula Stone', email: fresh() });
    const fitter = await signedInAgent(app, w.fitter.email);
    expect((await fitter.post('/api/team/invitations').set(APP_HEADER).send({ name: 'X', email: fresh() })).status).toBe(403);
    expect((await fitter.post(`/api/invitations/${inv.body.id}/resend`).set(APP_HEADER)).status).toBe(403);
    const ownerZ = await signedInAgent(app, z.owner.email);
    expect((await ownerZ.post(`/api/invitations/${inv.body.id}/resend`).set(APP_HEADER)).status).toBe(404);
    expect((await ownerZ.delete(`/api/invitations/${inv.body.id}`).set(APP_HEADER)).status).toBe(404);
    expect((await ownerZ.post(`/api/players/${w.player.id}/invitations`).set(APP_HEADER).send({ email: fresh() })).status).toBe(404);
    expect((await request(app).get('/api/team/invitations')).status).toBe(401);
    expect((await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: '', email: 'nope' })).status).toBe(400);
    expect((await owner.post('/api/team/invitations').set(APP_HEADER).send({ name: 'Own', email: w.fitter.email })).status).toBe(409);
  });
});
