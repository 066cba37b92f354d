import { loadConfig } from '../../config/env';
import { createLogger } from '../../lib/logger';
import { openDataSource } from '../data-source';

const config = loadConfig();
const logger = createLogger(config);
const dataSource = await openDataSource(config.databaseUrl, logger);
try {
  const ran = await dataSource.runMigrations({ transaction: 'each' });
  console.log(ran.length ? `applied ${ran.map((m) => m.name).join(', ')}` : 'schema is up to date');
} finally {
  await dataSource.destroy();
}
