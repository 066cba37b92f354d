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
import type { Mailer } from './mail/mailer';
import type { RealtimeHub } from './realtime/hub';
import { csrfProtection } from './middleware/csrf';
import { rejectUnstorableText } from './middleware/storable-text';
import { apiNotFound, errorHandler } from './middleware/errors';
import { attachViewer } from './middleware/viewer';
import { authRouter } from './modules/auth/auth.router';
import { careProfileRouter } from './modules/care/care-profile.router';
import { concernRouter } from './modules/concerns/concern.router';
import { deskRouter } from './modules/desk/desk.router';
import { clubRouter } from './modules/clubs/club.router';
import { healthRouter } from './modules/health/health.router';
import { inviteRouter } from './modules/invites/invite.router';
import { outboxRouter } from './modules/mail/outbox.router';
import { assignmentRouter } from './modules/mentorship/assignment.router';
import { mentorCapacityRouter } from './modules/mentorship/mentor-capacity.router';
import { mentorRequestRouter } from './modules/mentorship/mentor-request.router';
import { attachNotificationDelivery } from './modules/notifications/delivery';
import { notificationRouter } from './modules/notifications/notification.router';
import { unsubscribeRouter } from './modules/notifications/unsubscribe.router';
import { csvExportRouter } from './modules/csv/csv-export.router';
import { csvImportRouter, IMPORT_ROUTES_PREFIX } from './modules/csv/csv-import.router';
import { photoRouter } from './modules/photos/photo.router';
import { unansweredCountsByTank } from './modules/questions/question.queries';
import { questionRouter } from './modules/questions/question.router';
import { livestockRouter } from './modules/tanks/livestock.router';
import { tankEventRouter } from './modules/tanks/tank-event.router';
import { tankRouter } from './modules/tanks/tank.router';
import { timelineRouter } from './modules/tanks/timeline.router';
import { waterTestRouter } from './modules/tanks/water-test.router';
import { CSV_MAX_BYTES } from '../shared/schemas/csv-import.schema';

export interface AppDeps {
  config: Config;
  dataSource: DataSource;
  sessionPool: Pool;
  logger: Logger;
  mailer: Mailer;
  hub: RealtimeHub;
}

export interface CreatedApp {
  app: Express;
  /** The same session middleware, for socket.io's engine. */
  sessionMiddleware: RequestHandler;
  /** The API router; every module router is mounted on it at '/', so route paths are whole (the route table reads them). */
  api: express.Router;
}

const redactTokens = (url: string) => url.replace(/\/invites\/[^/?]+/, '/invites/[token]').replace(/token=[^&]+/g, 'token=[redacted]');

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
  const { config, dataSource, logger, mailer, hub } = deps;
  attachNotificationDelivery(dataSource, { hub, mailer, config });
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', false);
  app.use(
    pinoHttp({
      logger,
      autoLogging: config.env !== 'test',
      // Method, path and status only: no headers, cookies or tokens in the logs (ASVS 16.2).
      serializers: {
        req: (r: { method: string; url: string }) => ({ method: r.method, url: redactTokens(r.url) }),
        res: (r: { statusCode: number }) => ({ statusCode: r.statusCode }),
      },
    }),
  );
  app.use(securityHeaders(config.isProduction));

  const { middleware: sessionMiddleware } = createSessionMiddleware(config, deps.sessionPool);
  const api = express.Router();
  // A CSV import carries the whole file as a JSON string; JSON escaping can double it. Everything else stays small.
  api.use(IMPORT_ROUTES_PREFIX, express.json({ limit: CSV_MAX_BYTES * 2 + 64 * 1024 }));
  api.use(express.json({ limit: '200kb' }));
  api.use(rejectUnstorableText);
  api.use(healthRouter(dataSource));
  // Before the session and CSRF check: the signed token in the e-mail link is the only credential it takes.
  api.use(unsubscribeRouter({ dataSource, config }));
  api.use(sessionMiddleware);
  api.use(csrfProtection);
  api.use(attachViewer(dataSource));
  api.use(authRouter({ dataSource, mailer, config, hub }));
  api.use(clubRouter({ dataSource }));
  api.use(inviteRouter({ dataSource, mailer, config }));
  api.use(assignmentRouter({ dataSource }));
  api.use(mentorRequestRouter({ dataSource }));
  api.use(mentorCapacityRouter({ dataSource }));
  api.use(notificationRouter({ dataSource }));
  api.use(careProfileRouter({ dataSource }));
  api.use(concernRouter({ dataSource }));
  api.use(deskRouter({ dataSource, unansweredCounts: unansweredCountsByTank }));
  api.use(tankRouter({ dataSource }));
  api.use(livestockRouter({ dataSource, uploadsDir: config.uploadsDir }));
  api.use(waterTestRouter({ dataSource, uploadsDir: config.uploadsDir }));
  api.use(tankEventRouter({ dataSource, uploadsDir: config.uploadsDir }));
  api.use(timelineRouter({ dataSource }));
  api.use(photoRouter({ dataSource, uploadsDir: config.uploadsDir }));
  api.use(questionRouter({ dataSource }));
  api.use(csvImportRouter({ dataSource }));
  api.use(csvExportRouter({ dataSource }));
  if (!config.isProduction) app.use(outboxRouter({ dataSource }));
  api.use(apiNotFound);
  app.use('/api', api);

  serveClient(app);
  app.use(errorHandler({ exposeStack: config.env === 'development' }));
  return { app, sessionMiddleware, api };
}
