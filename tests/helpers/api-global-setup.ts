import type { TestProject } from 'vitest/node';
import { createLogger } from '@server/lib/logger';
import { openDataSource } from '@server/db/data-source';
import { testDatabaseUrl } from './test-database-url';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

/** Migrates the throw-away test database once for the whole API run. */
export default async function setup(project: TestProject) {
  const databaseUrl = testDatabaseUrl();
  const dataSource = await openDataSource(databaseUrl, createLogger({ logLevel: 'silent' }));
  await dataSource.runMigrations({ transaction: 'each' });
  await dataSource.destroy();
  project.provide('databaseUrl', databaseUrl);
}
