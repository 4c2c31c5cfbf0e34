/**
 * The security gaps of the hardening issue, each probed as an attacker would: headers (S1), link
 * poisoning (S2), a token replayed after sign-out (S4), weak passwords (S5), spoofed addresses and
 * guessing one account from many addresses (S7/S8), tokens without or with a very long expiry
 * (S9), cookies over HTTPS (S12).
 */
import jwt from 'jsonwebtoken';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { buildShop, buildUser, TEST_PASSWORD } from '@/fixtures/builders';
import { closeApp, createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import type { MailMessage } from '@/server/services/mailer';
import { createTestContext, type TestContext } from '../../support/test-db';
import { APP_HEADER, signedInAgent } from '../../support/sign-in';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});
const clearLimits = () => ctx.sequelize.query('DELETE FROM rate_limits', { type: QueryTypes.DELETE });
const cookieToken = (res: request.Response) => /ovy_session=([^;]+)/.exec(String(res.headers['set-cookie']))![1];

describe('S1 security headers', () => {
  it('an API answer carries a CSP with frame-ancestors none, nosniff, no Referer and no HSTS over plain http', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    expect(res.headers['content-security-policy']).not.toMatch(/script-src[^;]*unsafe/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-frame-options']).toBe('DENY');
    expect(res.headers['strict-transport-security']).toBeUndefined();
  });

  it('HSTS is sent when the request came over HTTPS through the trusted proxy', async () => {
    const app = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, trustProxy: true }, log: () => {} });
    const res = await request(app).get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(res.headers['strict-transport-security']).toMatch(/^max-age=\d{7,}/);
    await closeApp(app);
  });
});

describe('S2 e-mailed links', () => {
  it('a reset asked with a forged Host header links to APP_URL only', async () => {
    const shop = await buildShop();
    const user = await buildUser(shop, 'fitter');
    const mail: MailMessage[] = [];
    const config = { ...ctx.config, appUrl: 'https://fit.ovalyard.test' };
    const app = createApp({ sequelize: ctx.sequelize, config, mailer: { send: async (m) => void mail.push(m) }, log: () => {} });
    const res = await request(app).post('/api/auth/forgot').set('Host', 'evil.example').set('X-Forwarded-Host', 'evil.example').send({ email: user.email });
    expect(res.status).toBe(204);
    expect(mail).toHaveLength(1);
    expect(mail[0].text).toContain('https://fit.ovalyard.test/reset?token=');
    expect(mail[0].text).not.toContain('evil.example');
    await closeApp(app);
  });

  it('production refuses to start without APP_URL', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40), DB_PASSWORD: 'q'.repeat(20) })).toThrow(/APP_URL/);
  });
});

describe('S4 sign-out ends the session on the server', () => {
  it('a token copied before sign-out answers 401 when replayed after it; another session of the user goes on', async () => {
    const shop = await buildShop();
    const user = await buildUser(shop, 'fitter');
    const first = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    const second = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    const stolen = cookieToken(first);
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${stolen}`)).status).toBe(200);
    const out = await request(ctx.app).post('/api/auth/sign-out').set('Cookie', `ovy_session=${stolen}`).set(APP_HEADER);
    expect(out.status).toBe(204);
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${stolen}`)).status).toBe(401);
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${cookieToken(second)}`)).status).toBe(200);
  });
});

describe('S5 weak passwords', () => {
  // Through the shop sign-up (the one place besides invitations and resets where a password is set).
  const signUp = (name: string, email: string, password: string) =>
    request(ctx.app).post('/api/auth/sign-up').set(APP_HEADER).send({ shopName: `Shop of ${name}`, name, email, password });

  it.each([['ten spaces', '          '], ['a sequence', '1234567890'], ['a common word and digits', 'password12']])(
    'a new owner with %s as password answers 400 WEAK_PASSWORD with the reason on the field',
    async (_, password) => {
      const res = await signUp('Wren Aske', `wren-${Date.now()}@test.example`, password);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('WEAK_PASSWORD');
      expect(res.body.error.details[0]).toMatchObject({ path: ['password'], message: expect.stringContaining('too easy to guess') });
    },
  );

  it('a password made of the user’s own name and e-mail is refused; an unrelated passphrase is accepted', async () => {
    const own = await signUp('Tamsin Vell', 'tamsinvell@test.example', 'tamsinvell1');
    expect(own.body.error.code).toBe('WEAK_PASSWORD');
    const ok = await signUp('Tamsin Vell', 'tamsinvell@test.example', 'copper lantern orchard');
    expect(ok.status).toBe(202);
  });
});

describe('S7/S8 rate limits per address and per account, shared by processes', () => {
  it('without TRUST_PROXY a forged X-Forwarded-For does not give a fresh limit', async () => {
    await clearLimits();
    const app = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, signIn: { limit: 3, accountLimit: 100, windowMs: 60_000 } }, log: () => {} });
    const codes: number[] = [];
    for (let i = 0; i < 5; i++) {
      codes.push((await request(app).post('/api/auth/sign-in').set('X-Forwarded-For', `203.0.113.${i}`).send({ email: `nobody${i}@test.example`, password: 'wrong' })).status);
    }
    expect(codes).toEqual([401, 401, 401, 429, 429]);
    await closeApp(app);
  });

  it('failed sign-ins on one account from many addresses, through two API processes on one database, stop at the account limit', async () => {
    await clearLimits();
    const shop = await buildShop();
    const user = await buildUser(shop, 'player');
    const config = { ...ctx.config, trustProxy: true, signIn: { limit: 100, accountLimit: 4, windowMs: 60_000 } };
    const a = createApp({ sequelize: ctx.sequelize, config, log: () => {} });
    const b = createApp({ sequelize: ctx.sequelize, config, log: () => {} });
    const codes: number[] = [];
    for (let i = 0; i < 6; i++) {
      const app = i % 2 ? b : a;
      codes.push((await request(app).post('/api/auth/sign-in').set('X-Forwarded-For', `198.51.100.${i}`).send({ email: user.email, password: `guess number ${i}` })).status);
    }
    expect(codes).toEqual([401, 401, 401, 401, 429, 429]);
    // the right password is refused too while the account is locked: a guesser learns nothing
    const right = await request(a).post('/api/auth/sign-in').set('X-Forwarded-For', '198.51.100.99').send({ email: user.email, password: TEST_PASSWORD });
    expect(right.status).toBe(429);
    expect(right.headers['retry-after']).toMatch(/^\d+$/);
    await closeApp(a);
    await closeApp(b);
  });
});

describe('S9 token age', () => {
  const sign = async (options: jwt.SignOptions, payload: Record<string, unknown> = {}) => {
    const shop = await buildShop();
    const user = await buildUser(shop, 'fitter');
    const signed = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    const sid = (jwt.decode(cookieToken(signed)) as { sid: string }).sid;
    return jwt.sign({ ver: 0, sid, ...payload }, ctx.config.jwt.secret, { algorithm: 'HS256', subject: user.id, issuer: 'ovalyard', ...options });
  };

  it('a well-signed token without exp answers 401', async () => {
    const token = await sign({});
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(401);
  });

  it('a well-signed token with a ten-year exp answers 401', async () => {
    const token = await sign({ expiresIn: '3650d' });
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(401);
  });

  it('a token issued longer ago than JWT_TTL answers 401 even with exp ahead', async () => {
    const nineHoursAgo = Math.floor(Date.now() / 1000) - 9 * 3600;
    const token = await sign({}, { iat: nineHoursAgo, exp: nineHoursAgo + 3650 * 86400 });
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(401);
  });

  it('a token of the configured age answers 200 (the check above is not everything refused)', async () => {
    const token = await sign({ expiresIn: '8h' });
    expect((await request(ctx.app).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(200);
  });
});

describe('S12 secure cookies over HTTPS', () => {
  it('the session cookie is Secure when the request came over HTTPS, and not over plain http', async () => {
    const shop = await buildShop();
    const user = await buildUser(shop, 'fitter');
    const app = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, trustProxy: true, cookieSecure: 'auto' }, log: () => {} });
    const https = await request(app).post('/api/auth/sign-in').set('X-Forwarded-Proto', 'https').send({ email: user.email, password: TEST_PASSWORD });
    const http = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(String(https.headers['set-cookie'])).toMatch(/; Secure/);
    expect(String(http.headers['set-cookie'])).not.toMatch(/; Secure/);
    await closeApp(app);
  });
});
