import type { DataSource } from 'typeorm';
import { CapturedMail } from '@server/modules/mail/captured-mail.entity';

/** Waits until the fake SMTP server has stored a message to `to` (it arrives through the real queue and SMTP). */
export async function waitForMail(ds: DataSource, to: string, timeoutMs = 8_000): Promise<CapturedMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const mail = await ds
      .getRepository(CapturedMail)
      .createQueryBuilder('m')
      .where('m.to_address ILIKE :to', { to: `%${to}%` })
      .orderBy('m.received_at', 'DESC')
      .getOne();
    if (mail) return mail;
    if (Date.now() > deadline) throw new Error(`no e-mail to ${to} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

export function linkIn(mail: CapturedMail, pathPart: string): URL {
  const match = mail.text.match(new RegExp(`https?://\\S*${pathPart}\\S*`));
  if (!match) throw new Error(`no ${pathPart} link in: ${mail.text}`);
  return new URL(match[0]);
}
