import 'reflect-metadata';
import pg from 'pg';
import type { Logger } from 'pino';
import { DataSource } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';
import { SnakeNamingStrategy } from './naming-strategy';
import { guardPool, POOL_DEFAULTS } from './pool-errors';

/** The one place the database is described. Entities and migrations are listed, not globbed (globs fail in vitest). */
export function createDataSource(databaseUrl: string): DataSource {
  return new DataSource({
    type: 'postgres',
    driver: pg,
    url: databaseUrl,
    entities,
    migrations,
    migrationsTableName: 'schema_migrations',
    synchronize: false,
    migrationsRun: false,
    namingStrategy: new SnakeNamingStrategy(),
    invalidWhereValuesBehavior: { null: 'throw', undefined: 'throw' },
    extra: { ...POOL_DEFAULTS, max: 10 },
    logging: false,
  });
}

/** Initializes the data source and guards its pool against idle-client crashes. */
export async function openDataSource(databaseUrl: string, logger: Logger): Promise<DataSource> {
  const dataSource = createDataSource(databaseUrl);
  await dataSource.initialize();
  const driver = dataSource.driver as unknown as { master?: pg.Pool };
  if (driver.master) guardPool(driver.master, logger, 'typeorm');
  return dataSource;
}
