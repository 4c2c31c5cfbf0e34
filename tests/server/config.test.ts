import { loadConfig } from '@/server/config';

describe('loadConfig', () => {
  it('loadConfig in production without JWT_SECRET refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', DB_PASSWORD: 'x'.repeat(20) })).toThrow(/JWT_SECRET is required/);
  });
  it('loadConfig in production with the development DB password refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40) })).toThrow(/DB_PASSWORD/);
  });
  it('loadConfig in production without APP_URL refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40), DB_PASSWORD: 'q'.repeat(20) })).toThrow(/APP_URL is required/);
  });
  it('loadConfig with an APP_URL that is not an http(s) address refuses to start', () => {
    expect(() => loadConfig({ APP_URL: 'javascript:alert(1)' })).toThrow(/APP_URL/);
  });
  it('loadConfig in production with safe values decides cookie security per request', () => {
    const config = loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40), DB_PASSWORD: 'q'.repeat(20), APP_URL: 'https://fit.example.com/' });
    expect(config.cookieSecure).toBe('auto');
    expect(config.appUrl).toBe('https://fit.example.com');
  });
  it('loadConfig with COOKIE_SECURE=0 never marks cookies secure', () => {
    expect(loadConfig({ COOKIE_SECURE: '0' }).cookieSecure).toBe(false);
  });
  it('loadConfig with a short secret lists the problem', () => {
    expect(() => loadConfig({ JWT_SECRET: 'short' })).toThrow(/at least 32/);
  });
  it('loadConfig in development gives usable defaults', () => {
    const config = loadConfig({});
    expect(config.port).toBe(8080);
    expect(config.appUrl).toBe('http://127.0.0.1:8080');
  });
});
