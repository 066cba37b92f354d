import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import pg from 'pg';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { createApp } from './app';
import type { Config } from './config/env';
import type { Deps } from './deps';
import { openDataSource } from './db/data-source';
import { guardPool, POOL_DEFAULTS } from './db/pool-errors';
import { answerUnreadableRequests } from './lib/client-error';
import { createLogger } from './lib/logger';
import { pruneRateLimitHits } from './lib/rate-limit-store';
import { startMail } from './mail/start-mail';
import { startMeetupReminders } from './modules/meetups';
import { startDigestScheduler } from './modules/notifications';
import { RealtimeHub } from './realtime/hub';
import { startRealtime } from './realtime/realtime';

export interface RunningServer {
  url: string;
  server: Server;
  dataSource: DataSource;
  deps: Deps;
  logger: Logger;
  close(): Promise<void>;
}

/** Opens the database, builds the app and listens. Used by server/index.ts and by tests that need a real port. */
export async function startServer(config: Config): Promise<RunningServer> {
  const logger = createLogger(config);
  const dataSource = await openDataSource(config.databaseUrl, logger);
  const sessionPool = guardPool(
    new pg.Pool({ connectionString: config.databaseUrl, ...POOL_DEFAULTS, max: 5 }),
    logger,
    'sessions',
  );
  const mail = await startMail(config, dataSource, logger);
  const digest = await startDigestScheduler({ config, dataSource, mailer: mail.mailer, logger });
  const hub = new RealtimeHub();
  const { app, sessionMiddleware, deps } = createApp({
    config,
    dataSource,
    sessionPool,
    logger,
    mailer: mail.mailer,
    hub,
  });
  const reminders = await startMeetupReminders({ deps, logger });
  const server = createServer(app);
  answerUnreadableRequests(server);
  // The adapter holds one client for LISTEN: a pool of its own keeps it from starving requests.
  const adapterPool = guardPool(
    new pg.Pool({ connectionString: config.databaseUrl, ...POOL_DEFAULTS, query_timeout: undefined, max: 2 }),
    logger,
    'socket-adapter',
  );
  const io = startRealtime({
    httpServer: server,
    sessionMiddleware,
    hub,
    dataSource,
    adapterPool,
    config,
    logger,
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(config.port, config.host, () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  // Every instance may prune: the DELETE only removes windows that ended an hour ago.
  const pruning = setInterval(
    () => void pruneRateLimitHits(dataSource).catch(() => undefined),
    3_600_000,
  ).unref();

  let closing: Promise<void> | undefined;
  const close = () =>
    (closing ??= (async () => {
      clearInterval(pruning);
      await new Promise<void>((resolve) => io.close(() => resolve()));
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeIdleConnections();
        setTimeout(() => server.closeAllConnections(), 5_000).unref();
      });
      await digest.stop().catch(() => undefined);
      await reminders.stop().catch(() => undefined);
      await mail.close().catch(() => undefined);
      await adapterPool.end().catch(() => undefined);
      await sessionPool.end().catch(() => undefined);
      await dataSource.destroy().catch(() => undefined);
    })());

  return { url: `http://${config.host}:${port}`, server, dataSource, deps, logger, close };
}
