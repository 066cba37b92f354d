import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import type { Logger } from 'pino';
import { SMTPServer } from 'smtp-server';
import type { DataSource } from 'typeorm';
import { CapturedMail } from '../modules/mail';

export interface FakeSmtp {
  port: number;
  close(): Promise<void>;
}

const addressText = (a: unknown): string => {
  const v = a as { text?: string } | { text?: string }[] | undefined;
  return Array.isArray(v) ? v.map((x) => x.text ?? '').join(', ') : (v?.text ?? '');
};

/** A local SMTP server for development and tests: every message lands in captured_mail (see /dev/outbox). */
export async function startFakeSmtp(dataSource: DataSource, logger: Logger, port = 0): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 2 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) =>
          dataSource.getRepository(CapturedMail).insert({
            fromAddress: addressText(mail.from),
            toAddress: addressText(mail.to),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
            headers: Object.fromEntries(
              mail.headerLines.map((h) => [
                h.key,
                h.line
                  .slice(h.line.indexOf(':') + 1)
                  .replace(/\r?\n/g, '')
                  .trim(),
              ]),
            ),
            attachments: mail.attachments.map((a) => ({
              filename: a.filename ?? '',
              contentType: a.contentType,
              content: a.content.toString('utf8'),
            })),
          }),
        )
        .then(() => callback())
        .catch((err: Error) => {
          logger.warn({ err: err.message }, 'fake SMTP could not store a message');
          callback(err);
        });
    },
  });
  server.on('error', (err) => logger.warn({ err: err.message }, 'fake SMTP error'));
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const actual = (server.server.address() as AddressInfo).port;
  return { port: actual, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
