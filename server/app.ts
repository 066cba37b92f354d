import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import express, { type Express, type RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import type { Config } from './config/env';
import { securityHeaders } from './config/security-headers';
import { createSessionMiddleware } from './config/session';
import { enableAfterCommit } from './db/after-commit';
import type { Deps } from './deps';
import type { Mailer } from './mail/mailer';
import { csrfProtection } from './middleware/csrf';
import { createRateLimits } from './middleware/rate-limits';
import { errWithoutValues } from './lib/logger';
import { PostgresRateLimitStore } from './lib/rate-limit-store';
import { rejectUnstorableText } from './middleware/storable-text';
import { apiNotFound, errorHandler } from './middleware/errors';
import { attachViewer } from './middleware/viewer';
import { authRouter } from './modules/auth';
import { careProfileRouter } from './modules/care';
import { clubRouter } from './modules/clubs';
import { concernRouter, judgeConcerns } from './modules/concerns';
import { csvExportRouter, csvImportRouter, IMPORT_ROUTES_PREFIX } from './modules/csv';
import { deskRouter } from './modules/desk';
import { healthRouter } from './modules/health';
import { homeRouter } from './modules/home';
import { inviteRouter } from './modules/invites';
import { outboxRouter } from './modules/mail';
import { calendarFeedRouter, meetupsRouter } from './modules/meetups';
import { assignmentRouter, mentorCapacityRouter, mentorRequestRouter } from './modules/mentorship';
import {
  createNotifier,
  notificationRouter,
  tellMentorsOfConcerns,
  unsubscribeRouter,
} from './modules/notifications';
import { questionRouter } from './modules/questions';
import {
  livestockRouter,
  photoRouter,
  TankChanges,
  tankEventRouter,
  tankRouter,
  timelineRouter,
  waterTestRouter,
} from './modules/tanks';
import type { RealtimeHub } from './realtime/hub';
import { announceTankChanges } from './realtime/tank-announcer';
import { CSV_MAX_BYTES } from '@shared/schemas/csv-import.schema';

/** What the process hands the app: configuration and the connections it opened. */
export interface AppInfrastructure {
  config: Config;
  dataSource: DataSource;
  sessionPool: Pool;
  logger: Logger;
  mailer: Mailer;
  hub: RealtimeHub;
}

/**
 * The deps object every router and service gets, built once per app. Here, and only here, the tank-changed seam
 * gets its judge (concerns re-judge the tank) and its listeners (mentors are notified, watchers hear it live).
 */
export function buildDeps(infra: Pick<AppInfrastructure, 'config' | 'dataSource' | 'mailer' | 'hub'>): Deps {
  const { config, dataSource, mailer, hub } = infra;
  enableAfterCommit(dataSource);
  const notify = createNotifier({ hub, mailer, config });
  const tankChanges = new TankChanges(judgeConcerns)
    .listen(tellMentorsOfConcerns(notify))
    .listen(announceTankChanges(hub));
  const rateLimits = createRateLimits((identifier) => new PostgresRateLimitStore(dataSource, identifier));
  return { config, dataSource, mailer, hub, notify, tankChanges, rateLimits };
}

export interface CreatedApp {
  app: Express;
  /** The same session middleware, for socket.io's engine. */
  sessionMiddleware: RequestHandler;
  /** The API router; every module router is mounted on it at '/', so route paths are whole (the route table reads them). */
  api: express.Router;
  deps: Deps;
}

const redactTokens = (url: string) =>
  url
    .replace(/\/invites\/[^/?]+/, '/invites/[token]')
    .replace(/\/calendar-feeds\/[^/?]+/, '/calendar-feeds/[token]')
    .replace(/token=[^&]+/g, 'token=[redacted]');

const clientDist = fileURLToPath(new URL('../dist/client', import.meta.url));

function serveClient(app: Express): void {
  if (!existsSync(`${clientDist}/index.html`)) {
    app.get('/{*splat}', (_req, res) => {
      res
        .status(503)
        .type('text')
        .send('The client is not built yet: run `npm run build` (./scripts/start does it).');
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
export function createApp(infra: AppInfrastructure): CreatedApp {
  const { config, logger } = infra;
  const deps = buildDeps(infra);
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);
  app.use(
    pinoHttp({
      logger,
      autoLogging: config.env !== 'test',
      // Method, path and status only: no headers, cookies or tokens in the logs (ASVS 16.2).
      serializers: {
        req: (r: { method: string; url: string }) => ({ method: r.method, url: redactTokens(r.url) }),
        res: (r: { statusCode: number }) => ({ statusCode: r.statusCode }),
        // pino-http replaces the logger's own err serializer: give it the one that drops query values.
        err: errWithoutValues,
      },
    }),
  );
  app.use(securityHeaders(config.isProduction));

  const { middleware: sessionMiddleware } = createSessionMiddleware(config, infra.sessionPool);
  const api = express.Router();
  // A CSV import carries the whole file as a JSON string; JSON escaping can double it. Everything else stays small.
  // The import checks its file's content itself (binary data, broken UTF-8) and says so in the file's terms.
  api.use(
    IMPORT_ROUTES_PREFIX,
    express.json({ limit: CSV_MAX_BYTES * 2 + 64 * 1024 }),
    rejectUnstorableText({ ownRules: ['csv'] }),
  );
  api.use(express.json({ limit: '200kb' }));
  api.use(rejectUnstorableText());
  api.use(healthRouter(deps));
  // Before the session and CSRF check: the signed token in the e-mail link is the only credential it takes.
  api.use(unsubscribeRouter(deps));
  api.use(calendarFeedRouter(deps));
  api.use(sessionMiddleware);
  api.use(csrfProtection);
  api.use(attachViewer(deps.dataSource));
  for (const router of [
    authRouter,
    clubRouter,
    inviteRouter,
    assignmentRouter,
    mentorRequestRouter,
    mentorCapacityRouter,
    notificationRouter,
    careProfileRouter,
    concernRouter,
    deskRouter,
    homeRouter,
    tankRouter,
    livestockRouter,
    waterTestRouter,
    tankEventRouter,
    timelineRouter,
    photoRouter,
    questionRouter,
    csvImportRouter,
    csvExportRouter,
    meetupsRouter,
  ]) {
    api.use(router(deps));
  }
  if (!config.isProduction) app.use(outboxRouter(deps));
  api.use(apiNotFound);
  app.use('/api', api);

  serveClient(app);
  app.use(errorHandler({ exposeStack: config.env === 'development' }));
  return { app, sessionMiddleware, api, deps };
}
