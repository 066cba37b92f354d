import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import type { DestinationStream } from 'pino';
import type { Express, Router } from 'express';
import type { DataSource } from 'typeorm';
import { inject } from 'vitest';
import { createApp } from '@server/app';
import type { Deps } from '@server/deps';
import { loadConfig, type Config } from '@server/config/env';
import { openDataSource } from '@server/db/data-source';
import { guardPool, POOL_DEFAULTS } from '@server/db/pool-errors';
import { createLogger } from '@server/lib/logger';
import { startMail, type MailInfrastructure } from '@server/mail/start-mail';
import { RealtimeHub } from '@server/realtime/hub';

export interface TestApp {
  app: Express;
  api: Router;
  dataSource: DataSource;
  config: Config;
  /** The app's deps object, for tests that call services or notify() directly. */
  deps: Deps;
  mail: MailInfrastructure;
  close(): Promise<void>;
}

export function testConfig(overrides: Record<string, string> = {}): Config {
  return loadConfig({ NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), PORT: '0', ...overrides });
}

/** The real app on the real test database, without a port; photos go to a temporary folder removed on close. */
export async function createTestApp(
  overrides: Record<string, string> = {},
  options: { logTo?: DestinationStream } = {},
): Promise<TestApp> {
  const uploadsDir = mkdtempSync(join(tmpdir(), 'shoalwise-uploads-'));
  const config = testConfig({ UPLOADS_DIR: uploadsDir, ...overrides });
  const logger = createLogger(config, options.logTo);
  const dataSource = await openDataSource(config.databaseUrl, logger);
  const sessionPool = guardPool(
    new pg.Pool({ connectionString: config.databaseUrl, ...POOL_DEFAULTS, max: 3 }),
    logger,
    'sessions',
  );
  const mail = await startMail(config, dataSource, logger, {
    pollingIntervalSeconds: 0.5,
    retryDelaySeconds: 1,
  });
  const { app, api, deps } = createApp({
    config,
    dataSource,
    sessionPool,
    logger,
    mailer: mail.mailer,
    hub: new RealtimeHub(),
  });
  return {
    app,
    api,
    dataSource,
    config,
    deps,
    mail,
    async close() {
      await mail.close().catch(() => undefined);
      await sessionPool.end().catch(() => undefined);
      if (dataSource.isInitialized) await dataSource.destroy();
      rmSync(uploadsDir, { recursive: true, force: true });
    },
  };
}
