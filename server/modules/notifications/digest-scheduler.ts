import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from '../../config/env';
import type { Mailer } from '../../mail/mailer';
import { runDigest } from './digest';

export const DIGEST_QUEUE = 'notification-digest';
/** Every hour on the hour (UTC): whoever's local clock has reached the morning window gets their digest. */
export const DIGEST_CRON = '0 * * * *';

export interface DigestScheduler {
  stop(): Promise<void>;
}

/**
 * The digest job on pg-boss in our own PostgreSQL: the schedule survives restarts, pg-boss hands each hourly run to
 * one worker, and runDigest's claim rows keep it to one e-mail per person per day even if two runs overlap.
 */
export async function startDigestScheduler(p: {
  config: Config;
  dataSource: DataSource;
  mailer: Mailer;
  logger: Logger;
}): Promise<DigestScheduler> {
  const boss = new PgBoss({
    connectionString: p.config.databaseUrl,
    max: 2,
    application_name: 'shoalwise-digest',
  });
  boss.on('error', (err: Error) => p.logger.warn({ err: err.message }, 'digest scheduler error'));
  await boss.start();
  await boss.createQueue(DIGEST_QUEUE);
  await boss.schedule(DIGEST_QUEUE, DIGEST_CRON, {}, { tz: 'UTC', retryLimit: 2, retryDelay: 60 });
  await boss.work(DIGEST_QUEUE, { pollingIntervalSeconds: 30, batchSize: 1 }, async () => {
    const result = await runDigest(p.dataSource, p.mailer, new Date(), p.config);
    if (result.sentTo.length) p.logger.info({ sent: result.sentTo.length }, 'daily digests sent');
  });
  return {
    async stop() {
      await boss.stop({ graceful: true, timeout: 5_000, wait: true });
    },
  };
}
