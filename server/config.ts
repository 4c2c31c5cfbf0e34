import { z } from 'zod';

const DEV_JWT_SECRET = 'dev-only-secret-do-not-use-in-production-0000';

const boolFromEnv = z
  .enum(['1', '0', 'true', 'false', 'yes', 'no'])
  .transform((v) => v === '1' || v === 'true' || v === 'yes');

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(8080),
    DB_HOST: z.string().default('127.0.0.1'),
    DB_PORT: z.coerce.number().int().min(1).max(65535).default(3307),
    DB_NAME: z.string().regex(/^[A-Za-z0-9_]+$/).default('ovalyard'),
    DB_USER: z.string().default('ovalyard'),
    DB_PASSWORD: z.string().default('ovalyard-dev'),
    JWT_SECRET: z.string().min(32, 'JWT_SECRET must be at least 32 characters').optional(),
    JWT_TTL: z.string().regex(/^\d+[smhd]$/, 'JWT_TTL like 8h or 30m').default('8h'),
    COOKIE_SECURE: boolFromEnv.optional(),
    SIGN_IN_LIMIT: z.coerce.number().int().min(1).default(10),
    SIGN_IN_ACCOUNT_LIMIT: z.coerce.number().int().min(1).default(10),
    SIGN_IN_WINDOW_MIN: z.coerce.number().min(0.01).default(15),
    IMPORT_THREADS: z.coerce.number().int().min(1).max(16).default(1),
    WEB_DIST: z.string().default('dist'),
    UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).default(20 * 1024 * 1024),
    UPLOAD_MAX_ROWS: z.coerce.number().int().min(1).default(200_000),
    SMTP_URL: z.string().optional(),
    MAIL_FROM: z.string().default('Ovalyard <no-reply@ovalyard.invalid>'),
    APP_URL: z.url({ protocol: /^https?$/, message: 'APP_URL must be an http(s) address like https://fit.example.com' }).optional(),
    TRUST_PROXY: boolFromEnv.default(false),
    WORKERS: z.coerce.number().int().min(1).max(64).default(1),
    ANALYSIS_CACHE_MB: z.coerce.number().min(0).max(4096).default(64),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV !== 'production') return;
    if (!env.JWT_SECRET) {
      ctx.addIssue({ code: 'custom', path: ['JWT_SECRET'], message: 'JWT_SECRET is required in production' });
    } else if (env.JWT_SECRET === DEV_JWT_SECRET) {
      ctx.addIssue({ code: 'custom', path: ['JWT_SECRET'], message: 'JWT_SECRET must not be the development secret' });
    }
    if (!env.APP_URL) {
      ctx.addIssue({ code: 'custom', path: ['APP_URL'], message: 'APP_URL is required in production (the address written into e-mailed links)' });
    }
    if (env.DB_PASSWORD === 'ovalyard-dev') {
      ctx.addIssue({ code: 'custom', path: ['DB_PASSWORD'], message: 'DB_PASSWORD must be set in production' });
    }
  });

export interface Config {
  env: 'development' | 'production' | 'test';
  host: string;
  port: number;
  db: { host: string; port: number; name: string; user: string; password: string };
  jwt: { secret: string; ttl: string };
  /**
   * Secure cookies: true, false, or 'auto' (the default): secure whenever the request came over
   * HTTPS (directly, or through a trusted proxy's X-Forwarded-Proto) or APP_URL is https.
   */
  cookieSecure: boolean | 'auto';
  /** Sign-in attempts per client address, and failed sign-ins per account, per window. */
  signIn: { limit: number; accountLimit: number; windowMs: number };
  /** Worker threads that parse, map and validate bay files. */
  importThreads: number;
  webDist: string;
  upload: { maxBytes: number; maxRows: number };
  mail: { smtpUrl: string | null; from: string };
  /** The address written into e-mailed links: APP_URL, or this server's own address outside production. */
  appUrl: string;
  trustProxy: boolean;
  /** Server processes on this machine (Node's cluster); 1 runs without one. */
  workers: number;
  /** Memory each process may keep for computed analysis answers, in bytes (0: none kept). */
  analysisCacheBytes: number;
}

/**
 * Reads the configuration from the environment.
 * @throws with every problem listed when a value is invalid or unsafe for production
 */
export function loadConfig(source: Record<string, string | undefined> = process.env): Config {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  return {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    db: { host: e.DB_HOST, port: e.DB_PORT, name: e.DB_NAME, user: e.DB_USER, password: e.DB_PASSWORD },
    jwt: { secret: e.JWT_SECRET ?? DEV_JWT_SECRET, ttl: e.JWT_TTL },
    cookieSecure: e.COOKIE_SECURE ?? 'auto',
    signIn: { limit: e.SIGN_IN_LIMIT, accountLimit: e.SIGN_IN_ACCOUNT_LIMIT, windowMs: e.SIGN_IN_WINDOW_MIN * 60_000 },
    importThreads: e.IMPORT_THREADS,
    webDist: e.WEB_DIST,
    upload: { maxBytes: e.UPLOAD_MAX_BYTES, maxRows: e.UPLOAD_MAX_ROWS },
    mail: { smtpUrl: e.SMTP_URL ?? null, from: e.MAIL_FROM },
    // Links never come from the request's Host header (it is the client's to choose).
    appUrl: (e.APP_URL ?? `http://${e.HOST === '0.0.0.0' ? '127.0.0.1' : e.HOST}:${e.PORT}`).replace(/\/+$/, ''),
    trustProxy: e.TRUST_PROXY,
    workers: e.WORKERS,
    analysisCacheBytes: Math.round(e.ANALYSIS_CACHE_MB * 1024 * 1024),
  };
}
