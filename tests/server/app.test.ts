/**
 * What the app sets for caching and compression of the web build and the API:
 * - RFC 8246 (HTTP Immutable Responses, 2017): `immutable` for files whose name changes with
 *   their content; RFC 9111 (HTTP Caching, 2022) §5.2.2.4 no-cache / §5.2.2.5 no-store;
 * - RFC 9110 (HTTP Semantics, 2022) §8.4 Content-Encoding, decoded here by Node's zlib.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import request from 'supertest';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { createApp } from '@/server/app';
import { rawGet } from '../support/raw-get';
import { signedInAgent } from '../support/sign-in';
import { createTestContext, type TestContext } from '../support/test-db';

let ctx: TestContext;
let dist: string;
let web: ReturnType<typeof createApp>;
const HASH = '0123456789abcdef0123456789abcdef';
const script = `console.log(${JSON.stringify('an invented script '.repeat(200))});`;

beforeAll(async () => {
  ctx = await createTestContext();
  dist = fs.mkdtempSync(path.join(os.tmpdir(), 'ovy-dist-'));
  const write = (rel: string, body: string) => {
    fs.mkdirSync(path.dirname(path.join(dist, rel)), { recursive: true });
    fs.writeFileSync(path.join(dist, rel), body);
  };
  write('index.html', `<!DOCTYPE html><html><body><div id="root"></div><script src="/_expo/static/js/web/entry-${HASH}.js" defer></script></body></html>`);
  write(`_expo/static/js/web/entry-${HASH}.js`, script);
  write(`_expo/static/js/web/common-${HASH}.js`, script);
  fs.writeFileSync(path.join(dist, `_expo/static/js/web/common-${HASH}.js.br`), zlib.brotliCompressSync(script));
  fs.writeFileSync(path.join(dist, `_expo/static/js/web/common-${HASH}.js.gz`), zlib.gzipSync(script));
  write(`assets/node_modules/@fontsource/inter/files/inter-latin-400-normal.${HASH}.woff2`, 'wOF2 invented bytes');
  write('favicon.ico', 'icon');
  web = createApp({ sequelize: ctx.sequelize, config: { ...ctx.config, webDist: dist }, serveWeb: true, log: () => {} });
});
afterAll(async () => {
  fs.rmSync(dist, { recursive: true, force: true });
  await ctx.close();
});

describe('createApp, web build', () => {
  it('static hashed script is cached a year as immutable and sent gzip-compressed when asked', async () => {
    const res = await request(web).get(`/_expo/static/js/web/entry-${HASH}.js`).set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.text).toBe(script); // supertest decodes gzip with Node's zlib
  });

  it('static script with a brotli copy from the build is sent as that copy, decoding to the script', async () => {
    const res = await rawGet(web, `/_expo/static/js/web/common-${HASH}.js`, { 'accept-encoding': 'gzip, deflate, br' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^(text|application)\/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    // Decoded by Node's zlib (RFC 7932, Brotli Compressed Data Format, 2016).
    expect(zlib.brotliDecompressSync(res.body).toString('utf8')).toBe(script);
  });

  it('static script with a build copy goes out plain to a client that takes no compression', async () => {
    const res = await request(web).get(`/_expo/static/js/web/common-${HASH}.js`).set('Accept-Encoding', 'identity');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.text).toBe(script);
  });

  it('static hashed font asset is cached a year as immutable', async () => {
    const res = await request(web).get(`/assets/node_modules/@fontsource/inter/files/inter-latin-400-normal.${HASH}.woff2`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('static file without a hash in its name is revalidated', async () => {
    const res = await request(web).get('/favicon.ico');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
  });

  it('page address without a file answers the app page, revalidated', async () => {
    const res = await request(web).get('/sign-in');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<div id="root">');
    expect(res.headers['cache-control']).toBe('no-cache');
  });
});

describe('createApp, API', () => {
  it('api answer is never stored by caches', async () => {
    const res = await request(web).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('api answer of more than a kilobyte is compressed when the client takes gzip', async () => {
    const world = await buildShopWorld();
    for (let i = 0; i < 4; i++) await buildFitting(world.shop, world.player, world.fitter);
    const agent = await signedInAgent(web, world.owner.email);
    const plain = await agent.get('/api/fittings').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(Number(plain.headers['content-length'])).toBeGreaterThan(1024);
    const res = await agent.get('/api/fittings').set('Accept-Encoding', 'gzip');
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.body).toEqual(plain.body); // supertest decodes gzip with Node's zlib
    expect(res.headers['cache-control']).toBe('no-store');
  });
});
