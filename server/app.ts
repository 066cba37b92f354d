import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import express, { type Express, type RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import type { Config } from './config/env';
import { securityHeaders } from './config/security-headers';
import { apiNotFound, errorHandler } from './middleware/errors';
import { healthRouter } from './modules/health/health.router';

export interface AppDeps {
  config: Config;
  dataSource: DataSource;
  sessionPool: Pool;
  logger: Logger;
}

export interface CreatedApp {
  app: Express;
}

const clientDist = fileURLToPath(new URL('../dist/client', import.meta.url));

function serveClient(app: Express): void {
  if (!existsSync(`${clientDist}/index.html`)) {
    app.get('/{*splat}', (_req, res) => {
      res.status(503).type('text').send('The client is not built yet: run `npm run build` (./scripts/start does it).');
    });
    return;
  }
  app.use(express.static(clientDist, { index: false, maxAge: '1h' }));
  const spa: RequestHandler = (_req, res) => {
    res.set('Cache-Control', 'no-cache').sendFile(`${clientDist}/index.html`);
  };
  app.get('/{*splat}', spa);
}

/** Builds the Express app without listening, so tests can mount it directly. */
export function createApp(deps: AppDeps): CreatedApp {
  const { config, dataSource, logger } = deps;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', false);
  app.use(pinoHttp({ logger, autoLogging: config.env !== 'test' }));
  app.use(securityHeaders(config.isProduction));
  app.use(express.json({ limit: '200kb' }));

  const api = express.Router();
  api.use(healthRouter(dataSource));
  api.use(apiNotFound);
  app.use('/api', api);

  serveClient(app);
  app.use(errorHandler({ exposeStack: config.env === 'development' }));
  return { app };
}
