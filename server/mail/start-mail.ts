import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from '../config/env';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp';
import { startMailer, type Mailer } from './mailer';

export interface MailInfrastructure {
  mailer: Mailer;
  fakeSmtp: FakeSmtp | undefined;
  close(): Promise<void>;
}

/** Production sends through SMTP_HOST; development and tests start the local fake SMTP server and use it. */
export interface MailTiming {
  pollingIntervalSeconds?: number;
  retryDelaySeconds?: number;
}

export async function startMail(
  config: Config,
  dataSource: DataSource,
  logger: Logger,
  timing: MailTiming = {},
): Promise<MailInfrastructure> {
  let fakeSmtp: FakeSmtp | undefined;
  let host = config.smtp.host;
  let port = config.smtp.port;
  if (!host) {
    if (config.isProduction) throw new Error('SMTP_HOST is required in production');
    fakeSmtp = await startFakeSmtp(dataSource, logger, port);
    host = '127.0.0.1';
    port = fakeSmtp.port;
  }
  const mailer = await startMailer({
    databaseUrl: config.databaseUrl,
    smtpHost: host,
    smtpPort: port,
    from: config.mailFrom,
    logger,
    ...timing,
  });
  return {
    mailer,
    fakeSmtp,
    async close() {
      await mailer.stop();
      await fakeSmtp?.close();
    },
  };
}
