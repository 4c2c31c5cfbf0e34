import { loadConfig } from '@/server/config';

describe('loadConfig', () => {
  it('loadConfig in production without JWT_SECRET refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', DB_PASSWORD: 'x'.repeat(20) })).toThrow(/JWT_SECRET is required/);
  });
  it('loadConfig in production with the development DB password refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40) })).toThrow(/DB_PASSWORD/);
  });
  it('loadConfig in production with safe values gives secure cookies', () => {
    const config = loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40), DB_PASSWORD: 'q'.repeat(20) });
    expect(config.cookieSecure).toBe(true);
  });
  it('loadConfig with a short secret lists the problem', () => {
    expect(() => loadConfig({ JWT_SECRET: 'short' })).toThrow(/at least 32/);
  });
  it('loadConfig in development gives usable defaults', () => {
    const config = loadConfig({});
    expect(config.port).toBe(8080);
    expect(config.cookieSecure).toBe(false);
  });
});
