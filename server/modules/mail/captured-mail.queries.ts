import type { EntityManager } from 'typeorm';
import { CapturedMail } from './captured-mail.entity';

/** What the development mail server caught, newest first. */
export async function capturedMails(m: EntityManager, take: number): Promise<CapturedMail[]> {
  return m.find(CapturedMail, { order: { receivedAt: 'DESC' }, take });
}
