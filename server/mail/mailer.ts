import nodemailer, { type Transporter } from 'nodemailer';
import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { EntityManager } from 'typeorm';
import type { RenderedMail } from './templates';

/** A small text attachment (it travels through the queue as JSON), e.g. a meetup's .ics. */
export interface MailAttachment {
  filename: string;
  contentType: string;
  content: string;
}

export interface OutgoingMail extends RenderedMail {
  to: string;
  /** Extra headers, e.g. List-Unsubscribe. */
  headers?: Record<string, string>;
  attachments?: MailAttachment[];
}

export interface EnqueueOptions {
  /** Queue inside this transaction: the message exists only if the transaction commits. */
  db?: EntityManager;
}

export interface Mailer {
  /** Queues a message; it is sent in the background and retried while SMTP is down. */
  enqueue(mail: OutgoingMail, options?: EnqueueOptions): Promise<void>;
  stop(): Promise<void>;
}

const QUEUE = 'mail-send';

export interface MailerOptions {
  databaseUrl: string;
  smtpHost: string;
  smtpPort: number;
  from: string;
  logger: Logger;
  pollingIntervalSeconds?: number;
  /** First retry delay; pg-boss backs off exponentially from it. */
  retryDelaySeconds?: number;
}

/** Mail through a pg-boss queue on our own PostgreSQL, delivered by nodemailer. */
export async function startMailer(options: MailerOptions): Promise<Mailer> {
  const transport: Transporter = nodemailer.createTransport({
    host: options.smtpHost,
    port: options.smtpPort,
    secure: false,
    ignoreTLS: options.smtpHost === '127.0.0.1',
    connectionTimeout: 5_000,
  });
  const boss = new PgBoss({
    connectionString: options.databaseUrl,
    max: 3,
    application_name: 'shoalwise-mail',
  });
  boss.on('error', (err: Error) => options.logger.warn({ err: err.message }, 'mail queue error'));
  await boss.start();
  await boss.createQueue(QUEUE);
  await boss.work<OutgoingMail>(
    QUEUE,
    { pollingIntervalSeconds: options.pollingIntervalSeconds ?? 1, batchSize: 1 },
    async (jobs) => {
      for (const job of jobs) {
        const m = job.data;
        await transport.sendMail({
          from: options.from,
          to: m.to,
          subject: m.subject,
          text: m.text,
          html: m.html,
          headers: m.headers,
          attachments: m.attachments,
        });
      }
    },
  );
  return {
    async enqueue(mail, enqueueOptions = {}) {
      const tx = enqueueOptions.db;
      const db = tx
        ? {
            executeSql: async (text: string, values: unknown[]) => ({
              rows: (await tx.query(text, values)) as unknown[],
            }),
          }
        : undefined;
      await boss.send(QUEUE, mail, {
        retryLimit: 10,
        retryDelay: options.retryDelaySeconds ?? 5,
        retryBackoff: true,
        db,
      });
    },
    async stop() {
      await boss.stop({ graceful: true, timeout: 5_000, wait: true });
      transport.close();
    },
  };
}
