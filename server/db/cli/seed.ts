import { loadConfig } from '../../config/env';
import { createLogger } from '../../lib/logger';
import { openDataSource } from '../data-source';
import { seedDemoClub } from '../seeds/demo-club';

const config = loadConfig();
const dataSource = await openDataSource(config.databaseUrl, createLogger(config));
try {
  const result = await seedDemoClub(dataSource);
  console.log(result.created ? 'seeded the demo club' : 'the demo club is already there');
} finally {
  await dataSource.destroy();
}
