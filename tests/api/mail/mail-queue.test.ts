import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeSmtp } from '@server/mail/fake-smtp';
import { createLogger } from '@server/lib/logger';
import { resetDatabase } from '@tests/helpers/db';
import { waitForMail } from '@tests/helpers/mail';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

describe('the mail queue', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(() => resetDatabase(t.dataSource));

  it('when enqueued, then the message reaches SMTP with a text and an HTML part', async () => {
    await t.mail.mailer.enqueue({
      to: 'queue@test.example',
      subject: 'Hello',
      text: 'plain part',
      html: '<p>html part</p>',
    });
    const mail = await waitForMail(t.dataSource, 'queue@test.example');
    expect(mail).toMatchObject({
      subject: 'Hello',
      text: expect.stringContaining('plain part'),
      html: expect.stringContaining('html part'),
    });
  });

  it('when SMTP is down for a while, then the message is retried and delivered once it is back', async () => {
    const smtp = t.mail.fakeSmtp!;
    const port = smtp.port;
    await smtp.close();
    await t.mail.mailer.enqueue({
      to: 'patient@test.example',
      subject: 'Still coming',
      text: 'x',
      html: '<p>x</p>',
    });
    await new Promise((r) => setTimeout(r, 1_500));
    await expect(waitForMail(t.dataSource, 'patient@test.example', 200)).rejects.toThrow(/no e-mail/);
    const again = await startFakeSmtp(t.dataSource, createLogger({ logLevel: 'silent' }), port);
    try {
      const mail = await waitForMail(t.dataSource, 'patient@test.example', 15_000);
      expect(mail.subject).toBe('Still coming');
      const copies: { n: number }[] = await t.dataSource.query(
        `SELECT count(*)::int AS n FROM captured_mail WHERE to_address ILIKE '%patient@%'`,
      );
      expect(copies[0]!.n).toBe(1);
    } finally {
      await again.close();
    }
  });
});
