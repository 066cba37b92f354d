import type { DataSource } from 'typeorm';
import { CapturedMail } from '@server/modules/mail/captured-mail.entity';

/** Every captured e-mail to an address, oldest first. */
export function mailsTo(ds: DataSource, to: string): Promise<CapturedMail[]> {
  return ds
    .getRepository(CapturedMail)
    .createQueryBuilder('m')
    .where('m.to_address ILIKE :to', { to: `%${to}%` })
    .orderBy('m.received_at', 'ASC')
    .getMany();
}

/** Waits until `count` e-mails to `to` have arrived, then a little longer so that an extra one would show up too. */
export async function settledMailsTo(
  ds: DataSource,
  to: string,
  count: number,
  timeoutMs = 8_000,
): Promise<CapturedMail[]> {
  const deadline = Date.now() + timeoutMs;
  while ((await mailsTo(ds, to)).length < count && Date.now() < deadline)
    await new Promise((r) => setTimeout(r, 100));
  await new Promise((r) => setTimeout(r, 1_500));
  return mailsTo(ds, to);
}
