import { existsSync } from 'node:fs';
import type { TestProject } from 'vitest/node';
import { startServer, type RunningServer } from '@server/boot';
import { loadConfig } from '@server/config/env';
import { ensureDatabase, testDatabaseUrl } from './test-database-url';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
  }
}

let running: RunningServer | undefined;

/** One real server (built client + API) on a free port for the browser suites. */
export default async function setup(project: TestProject) {
  if (!existsSync('dist/client/index.html')) {
    const { build } = await import('vite');
    await build({ logLevel: 'warn' });
  }
  const databaseUrl = testDatabaseUrl('e2e');
  await ensureDatabase(databaseUrl);
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_URL: databaseUrl, PORT: '0' });
  running = await startServer(config);
  await running.dataSource.runMigrations({ transaction: 'each' });
  project.provide('baseUrl', running.url);
  project.provide('databaseUrl', databaseUrl);
  return async () => {
    await running?.close();
  };
}
