import request from 'supertest';
import { buildShop, buildUser, TEST_PASSWORD } from '@/fixtures/builders';
import { createApp } from '@/server/app';
import { PasswordReset } from '@/server/models';
import type { MailMessage } from '@/server/services/mailer';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
const mail: MailMessage[] = [];
let app: ReturnType<typeof createApp>;
beforeAll(async () => {
  ctx = await createTestContext();
  app = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, appUrl: 'https://ovalyard.test' }, mailer: { send: async (m) => void mail.push(m) }, log: () => {} });
});
afterAll(async () => {
  await ctx.close();
});

const tokenOf = (m: MailMessage) => /reset\?token=([A-Za-z0-9_-]+)/.exec(m.text)![1];

describe('password reset', () => {
  it('forgot for an account e-mails a one-hour link to the configured address and answers 204', async () => {
    const user = await buildUser(await buildShop(), 'player');
    const res = await request(app).post('/api/auth/forgot').set(APP_HEADER).send({ email: user.email.toUpperCase() });
    expect(res.status).toBe(204);
    const m = mail.at(-1)!;
    expect(m.to).toBe(user.email);
    expect(m.text).toMatch(/https:\/\/ovalyard\.test\/reset\?token=/);
    const stored = await PasswordReset.findOne({ where: { userId: user.id } });
    expect(stored!.tokenHash).not.toContain(tokenOf(m)); // only the hash is stored
    expect(stored!.expiresAt.getTime() - stored!.createdAt.getTime()).toBeCloseTo(3_600_000, -3);
  });

  it('forgot for an unknown e-mail answers the same 204 and sends nothing', async () => {
    const before = mail.length;
    const res = await request(app).post('/api/auth/forgot').set(APP_HEADER).send({ email: 'nobody@test.example' });
    expect(res.status).toBe(204);
    expect(mail.length).toBe(before);
  });

  it('forgot with a malformed e-mail answers 400', async () => {
    expect((await request(app).post('/api/auth/forgot').set(APP_HEADER).send({ email: 'nope' })).status).toBe(400);
  });

  it('reset with the link sets the password, ends old sessions and cannot be used twice', async () => {
    const user = await buildUser(await buildShop(), 'fitter');
    const old = await signedInAgent(app, user.email);
    await request(app).post('/api/auth/forgot').set(APP_HEADER).send({ email: user.email });
    const token = tokenOf(mail.at(-1)!);
    const short = await request(app).post('/api/auth/reset').set(APP_HEADER).send({ token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details[0].path).toEqual(['password']);
    expect((await request(app).post('/api/auth/reset').set(APP_HEADER).send({ token, password: 'a new long password' })).status).toBe(204);
    expect((await old.get('/api/me')).status).toBe(401);
    await signedInAgent(app, user.email, 'a new long password');
    const bad = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(bad.status).toBe(401);
    const again = await request(app).post('/api/auth/reset').set(APP_HEADER).send({ token, password: 'another long password' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('RESET_LINK_INVALID');
  });

  it('reset with an expired or unknown link answers 400 RESET_LINK_INVALID', async () => {
    const user = await buildUser(await buildShop(), 'owner');
    await request(app).post('/api/auth/forgot').set(APP_HEADER).send({ email: user.email });
    const token = tokenOf(mail.at(-1)!);
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    const expired = await request(app).post('/api/auth/reset').set(APP_HEADER).send({ token, password: 'a new long password' });
    expect(expired.body.error.code).toBe('RESET_LINK_INVALID');
    const unknown = await request(app).post('/api/auth/reset').set(APP_HEADER).send({ token: 'x'.repeat(43), password: 'a new long password' });
    expect(unknown.body.error.code).toBe('RESET_LINK_INVALID');
  });
});
