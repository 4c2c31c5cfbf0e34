import request from 'supertest';
import { buildShopWorld } from '@/fixtures/builders';
import { createApp } from '@/server/app';
import { Fitting, Player, Shop, User } from '@/server/models';
import type { MailMessage } from '@/server/services/mailer';
import { purgeClosedShops, SHOP_GRACE_DAYS } from '@/server/services/shops';
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
const verifyTokenOf = (m: MailMessage) => /verify\?token=([A-Za-z0-9_-]+)/.exec(m.text)![1];
let n = 0;
const fresh = () => `owner-${Date.now()}-${++n}@test.example`;
const signUp = (email: string, shopName = 'Heron Lane Fitting') => request(app).post('/api/auth/sign-up').set(APP_HEADER).send({ shopName, name: 'Maren Tolle', email, password: PASSWORD });

describe('sign-up', () => {
  it('sign-up, a fresh address, makes the shop and an unconfirmed owner and mails a one-use link; sign-in waits for it', async () => {
    const email = fresh();
    const res = await signUp(email);
    expect(res.status).toBe(202);
    const owner = await User.findOne({ where: { email } });
    expect(owner!.role).toBe('owner');
    expect(owner!.emailVerifiedAt).toBeNull();
    expect((await Shop.findByPk(owner!.shopId))!.name).toBe('Heron Lane Fitting');
    const m = mail.at(-1)!;
    expect(m.to).toBe(email);
    const token = verifyTokenOf(m);

    const early = await request(app).post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(early.status).toBe(403);
    expect(early.body.error.code).toBe('EMAIL_NOT_VERIFIED');

    expect((await request(app).post('/api/auth/verify').set(APP_HEADER).send({ token })).status).toBe(204);
    const again = await request(app).post('/api/auth/verify').set(APP_HEADER).send({ token });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('VERIFY_LINK_INVALID');
    const agent = await signedInAgent(app, email, PASSWORD);
    const me = await agent.get('/api/me');
    expect(me.body).toMatchObject({ role: 'owner', shop: { name: 'Heron Lane Fitting', closedAt: null } });
  });

  it('sign-up, an address with an account, answers the same 202 and mails "you already have an account", making nothing', async () => {
    const { owner } = await buildShopWorld();
    const shops = await Shop.count();
    const res = await signUp(owner.email);
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ sent: true });
    expect(await Shop.count()).toBe(shops);
    expect(mail.at(-1)!.to).toBe(owner.email);
    expect(mail.at(-1)!.text).not.toMatch(/verify\?token=/);
    expect(mail.at(-1)!.subject).toMatch(/already have/);
  });

  it('sign-up, a weak password or a missing shop name, answers 400 and makes nothing', async () => {
    const weak = await request(app).post('/api/auth/sign-up').set(APP_HEADER).send({ shopName: 'Ash Shop', name: 'Ida', email: fresh(), password: 'password12' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.code).toBe('WEAK_PASSWORD');
    const missing = await request(app).post('/api/auth/sign-up').set(APP_HEADER).send({ name: 'Ida', email: fresh(), password: PASSWORD });
    expect(missing.status).toBe(400);
  });

  it('verify, an expired link, answers 400 VERIFY_LINK_INVALID', async () => {
    const email = fresh();
    await signUp(email);
    const token = verifyTokenOf(mail.at(-1)!);
    await ctx.sequelize.query('UPDATE email_verifications SET expires_at = ? WHERE user_id = (SELECT id FROM users WHERE email = ?)', { replacements: [new Date(Date.now() - 1000), email] });
    const res = await request(app).post('/api/auth/verify').set(APP_HEADER).send({ token });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VERIFY_LINK_INVALID');
  });

  it('verify/resend, an unconfirmed address, mails a new link; any other address answers the same 204 with no link', async () => {
    const email = fresh();
    await signUp(email);
    const before = mail.length;
    expect((await request(app).post('/api/auth/verify/resend').set(APP_HEADER).send({ email })).status).toBe(204);
    expect(mail.length).toBe(before + 1);
    expect(verifyTokenOf(mail.at(-1)!)).not.toBe(verifyTokenOf(mail.at(-2)!));
    expect((await request(app).post('/api/auth/verify/resend').set(APP_HEADER).send({ email: 'nobody-here@test.example' })).status).toBe(204);
    expect(mail.length).toBe(before + 1);
    expect((await request(app).post('/api/auth/verify/resend').set(APP_HEADER).send({ email: 'nope' })).status).toBe(400);
  });

  it('sign-up, more than the limit of messages to one address, answers 429', async () => {
    const limited = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, signIn: { limit: 1000, accountLimit: 2, windowMs: 60_000 } }, mailer: { send: async () => {} }, log: () => {} });
    const email = fresh();
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push((await request(limited).post('/api/auth/verify/resend').set(APP_HEADER).send({ email })).status);
    expect(statuses.slice(0, 3)).toEqual([204, 204, 204]);
    expect(statuses.at(-1)).toBe(429);
  });
});

describe('/api/shop', () => {
  it('GET, staff of the shop, answers the shop; a player 403; anonymous 401', async () => {
    const w = await buildShopWorld();
    const fitter = await signedInAgent(app, w.fitter.email);
    const res = await fitter.get('/api/shop');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: w.shop.id, closedAt: null, graceDays: SHOP_GRACE_DAYS, defaultUnits: 'imperial' });
    expect((await (await signedInAgent(app, w.playerUser.email)).get('/api/shop')).status).toBe(403);
    expect((await request(app).get('/api/shop')).status).toBe(401);
  });

  it('PATCH, the owner, sets the default units new people start with; a fitter 403; a bad unit 400', async () => {
    const w = await buildShopWorld();
    const owner = await signedInAgent(app, w.owner.email);
    const res = await owner.patch('/api/shop').set(APP_HEADER).send({ defaultUnits: 'metric', defaultTemperatureUnit: 'f' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ defaultUnits: 'metric', defaultTemperatureUnit: 'f', defaultLengthUnit: null });
    expect((await owner.patch('/api/shop').set(APP_HEADER).send({ defaultUnits: 'furlongs' })).status).toBe(400);
    expect((await (await signedInAgent(app, w.fitter.email)).patch('/api/shop').set(APP_HEADER).send({ defaultUnits: 'metric' })).status).toBe(403);
  });

  it('close, the typed name, closes the shop: its people are signed out and refused, the owner may only reopen or export', async () => {
    const w = await buildShopWorld();
    const owner = await signedInAgent(app, w.owner.email);
    const fitter = await signedInAgent(app, w.fitter.email);
    const wrong = await owner.post('/api/shop/close').set(APP_HEADER).send({ shopName: 'Not the name' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.code).toBe('SHOP_NAME_MISMATCH');
    expect((await fitter.post('/api/shop/close').set(APP_HEADER).send({ shopName: w.shop.name })).status).toBe(403);

    const closed = await owner.post('/api/shop/close').set(APP_HEADER).send({ shopName: w.shop.name.toUpperCase() });
    expect(closed.status).toBe(200);
    const days = (Date.parse(closed.body.purgeAfter) - Date.parse(closed.body.closedAt)) / 86_400_000;
    expect(days).toBeCloseTo(SHOP_GRACE_DAYS, 6);
    expect((await fitter.get('/api/me')).status).toBe(401);
    const refused = await request(app).post('/api/auth/sign-in').send({ email: w.fitter.email, password: 'correct horse battery' });
    expect(refused.body.error.code).toBe('SHOP_CLOSED');
    expect((await owner.get('/api/players')).body.error.code).toBe('SHOP_CLOSED');
    expect((await owner.get('/api/me')).body.shop.closedAt).not.toBeNull();
    expect((await owner.get('/api/shop/export')).status).toBe(200);

    expect((await owner.post('/api/shop/reopen').set(APP_HEADER)).status).toBe(200);
    expect((await owner.get('/api/players')).status).toBe(200);
    expect((await owner.post('/api/shop/reopen').set(APP_HEADER)).status).toBe(409);
  });

  it('purgeClosedShops deletes a closed shop past its grace period with its rows, and nothing else', async () => {
    const gone = await buildShopWorld();
    const kept = await buildShopWorld();
    const now = new Date();
    await gone.shop.update({ closedAt: new Date(now.getTime() - 31 * 86_400_000), purgeAfter: new Date(now.getTime() - 86_400_000) });
    await kept.shop.update({ closedAt: now, purgeAfter: new Date(now.getTime() + 30 * 86_400_000) });
    expect(await purgeClosedShops(now)).toBe(1);
    expect(await Shop.findByPk(gone.shop.id)).toBeNull();
    expect(await User.count({ where: { shopId: gone.shop.id } })).toBe(0);
    expect(await Player.count({ where: { shopId: gone.shop.id } })).toBe(0);
    expect(await Fitting.count({ where: { shopId: gone.shop.id } })).toBe(0);
    expect(await Shop.findByPk(kept.shop.id)).not.toBeNull();
  });
});
