import compression from 'compression';
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { authenticate } from './middleware/authenticate';
import { precompressedStatic } from './middleware/precompressed-static';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { authRouter } from './routes/auth';
import { bagsRouter } from './routes/bags';
import { bayFilesRouter } from './routes/bay-files';
import { chosenBuildsRouter } from './routes/chosen-builds';
import { demoRouter } from './routes/demo';
import { fittingArchiveRouter } from './routes/fitting-archive';
import { fittingsRouter } from './routes/fittings';
import { fittingCourseRouter } from './routes/fitting-course';
import { fittingRequestsRouter } from './routes/fitting-requests';
import { createFittingLimits, type FittingLimits } from './middleware/fitting-rate-limits';
import { invitationsRouter } from './routes/invitations';
import { healthRouter } from './routes/health';
import { playersRouter } from './routes/players';
import { recipesRouter } from './routes/recipes';
import { refuseClosedShop, shopRouter } from './routes/shop';
import { shopMarginsRouter } from './routes/shop-margins';
import { shotsRouter } from './routes/shots';
import { specSheetsRouter } from './routes/spec-sheets';
import { teamRouter } from './routes/team';
import { workshopSettingsRouter } from './routes/workshop-settings';
import { AnalysisCache } from './services/analysis-cache';
import { createRateLimits, type RateLimits } from './middleware/rate-limit';
import { securityHeaders } from './middleware/security-headers';
import type { CommitHooks } from './services/bay-files';
import { createImportPool, type ImportPool } from './services/import-pool';
import { createMailer, type Mailer } from './services/mailer';

export interface AppDeps {
  sequelize: Sequelize;
  config: Config;
  mailer?: Mailer;
  /** Serve the exported web app from config.webDist (production start). */
  serveWeb?: boolean;
  log?: (message: string, error: unknown) => void;
  /** Test hooks into the bay-file commit (failure injection). */
  commitHooks?: CommitHooks;
  /** Worker threads for bay files; by default a pool of config.importThreads (close it with closeApp). */
  importPool?: ImportPool;
  /** Rate limiters; by default kept in this database's rate_limits table. */
  rateLimits?: RateLimits;
  /** Limits of messages and fitting requests; by default in the rate_limits table. */
  fittingLimits?: FittingLimits;
}

const pools = new WeakMap<Express, ImportPool>();

/** Ends what createApp started for an app (its import worker pool, unless one was passed in). */
export async function closeApp(app: Express): Promise<void> {
  await pools.get(app)?.close();
}

/** An exported asset's name with its content hash ("inter-latin-400-normal.<md5>.woff2", "icon.<md5>@2x.png"). */
const HASHED_ASSET = /\.[0-9a-f]{32}(@\dx)?\.[a-z0-9]+$/;

/**
 * Hashed files (everything under _expo/static, and assets named by their hash) never change
 * under their name: cached a year, immutable. Anything else of the web build (favicon,
 * metadata) is revalidated on each use, as index.html is.
 */
function staticCacheHeaders(res: express.Response, filePath: string): void {
  const hashed = filePath.includes(`${path.sep}_expo${path.sep}static${path.sep}`) || HASHED_ASSET.test(path.basename(filePath));
  res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
}

/** Builds the Express app; listening is the caller's business (server/index.ts, tests). */
export function createApp({ sequelize, config, mailer, serveWeb = false, log, commitHooks, importPool, rateLimits, fittingLimits }: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  // One proxy in front (see TRUST_PROXY in the README for the risk when clients can bypass it).
  if (config.trustProxy) app.set('trust proxy', 1);
  app.use(securityHeaders(config));
  // gzip or brotli for API answers and the web app's files (prepared answers come compressed already).
  app.use(compression());
  const pool = importPool ?? createImportPool(config.importThreads);
  if (!importPool) pools.set(app, pool);

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(cookieParser());
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  api.use('/health', healthRouter(sequelize));
  const mail = mailer ?? createMailer(config.mail.smtpUrl, config.mail.from);
  api.use('/demo', demoRouter());
  const limits = rateLimits ?? createRateLimits(sequelize, config);
  api.use(authRouter(config, mail, limits));
  // The public request page answers anyone; asking for a fitting there needs a sign-in (the router checks).
  const remoteLimits = fittingLimits ?? createFittingLimits(sequelize);
  api.use(fittingRequestsRouter(config, mail, remoteLimits));
  // Everything below needs a signed-in user of an open shop; each service checks role and shop again.
  api.use(['/players', '/fittings', '/team', '/recipes', '/bay-files', '/shots', '/builds', '/bag-clubs', '/spec-sheets', '/workshop-settings', '/shop', '/invitations'], authenticate(config), refuseClosedShop);
  api.use(invitationsRouter(config, mail, limits));
  api.use(fittingArchiveRouter());
  api.use('/players', playersRouter(sequelize));
  api.use('/fittings', fittingsRouter(config, mail));
  api.use('/fittings', fittingCourseRouter(sequelize, config, mail, remoteLimits));
  api.use('/team', teamRouter());
  api.use('/recipes', recipesRouter());
  api.use('/shop', shopMarginsRouter());
  api.use('/shop', shopRouter(sequelize));
  api.use(bayFilesRouter(sequelize, config, pool, commitHooks));
  api.use(shotsRouter(sequelize, new AnalysisCache(config.analysisCacheBytes)));
  api.use(bagsRouter(sequelize));
  api.use(chosenBuildsRouter());
  api.use(specSheetsRouter(sequelize, config, mail));
  api.use('/workshop-settings', workshopSettingsRouter());
  api.use(apiNotFound);
  app.use('/api', api);

  if (serveWeb) {
    const root = path.resolve(config.webDist);
    const index = path.join(root, 'index.html');
    app.use(precompressedStatic(root));
    app.use(express.static(root, { index: false, setHeaders: staticCacheHeaders }));
    // SPA fallback: paths without a file extension get the app's index.html.
    app.get('/{*splat}', (req, res, next) => {
      if (path.extname(req.path) || !fs.existsSync(index)) return next();
      res.set('Cache-Control', 'no-cache');
      res.sendFile(index);
    });
  }

  app.use(errorHandler(log));
  return app;
}
