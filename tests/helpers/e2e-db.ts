import { inject } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDataSource } from '@server/db/data-source';
import { createLogger } from '@server/lib/logger';

/** A direct connection to the browser suites' database, for arranging data and reading captured e-mail. */
export function openE2eDataSource(): Promise<DataSource> {
  return openDataSource(inject('databaseUrl'), createLogger({ logLevel: 'silent' }));
}
