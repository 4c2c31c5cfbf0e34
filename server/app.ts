import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { authenticate } from './middleware/authenticate';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { authRouter } from './routes/auth';
import { bayFilesRouter } from './routes/bay-files';
import { fittingsRouter } from './routes/fittings';
import { healthRouter } from './routes/health';
import { playersRouter } from './routes/players';
import { recipesRouter } from './routes/recipes';
import { shopMarginsRouter } from './routes/shop-margins';
import { shotsRouter } from './routes/shots';
import { teamRouter } from './routes/team';
import type { CommitHooks } from './services/bay-files';
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
}

/** Builds the Express app; listening is the caller's business (server/index.ts, tests). */
export function createApp({ sequelize, config, mailer, serveWeb = false, log, commitHooks }: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) app.set('trust proxy', 1);

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(cookieParser());
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  api.use('/health', healthRouter(sequelize));
  api.use(authRouter(config, mailer ?? createMailer(config.mail.smtpUrl, config.mail.from)));
  // Everything below needs a signed-in user; each service checks role and shop again.
  api.use(['/players', '/fittings', '/team', '/recipes', '/bay-files', '/shots', '/builds', '/shop'], authenticate(config));
  api.use('/players', playersRouter());
  api.use('/fittings', fittingsRouter());
  api.use('/team', teamRouter());
  api.use('/recipes', recipesRouter());
  api.use('/shop', shopMarginsRouter());
  api.use(bayFilesRouter(sequelize, config, commitHooks));
  api.use(shotsRouter(sequelize));
  api.use(apiNotFound);
  app.use('/api', api);

  if (serveWeb) {
    const root = path.resolve(config.webDist);
    const index = path.join(root, 'index.html');
    app.use(express.static(root, { index: false, maxAge: '1h' }));
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
