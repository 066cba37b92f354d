import { In, type DataSource, type EntityManager } from 'typeorm';
import {
  DEFAULT_EMAIL_MODES,
  DIGEST_LATEST_LOCAL_HOUR,
  DIGEST_LOCAL_HOUR,
  DIGEST_LOOKBACK_DAYS,
} from '@shared/constants/notifications';
import type { Mailer } from '../../mail/mailer';
import { localDayAndHour } from './local-day';
import { digestMail, type MailLinks, type Recipient } from './notification-mail';
import { Notification } from './notification.entity';

export interface DigestResult {
  /** Users whose digest this call sent. */
  sentTo: string[];
  /** Users who were due but whose digest for that local day had already been claimed (by another call or worker). */
  alreadyClaimed: string[];
}

interface Candidate extends Recipient {
  timeZone: string;
}

/**
 * Un-e-mailed, unread and recent notifications of `n`, in a club where the person is still an active member,
 * of a kind the person gets in the digest. `now`, `days` and `defaults` name the query's placeholders.
 */
const pending = (p: { now: string; days: string; defaults: string }) => `
  n.emailed_at IS NULL AND n.read_at IS NULL
  AND n.created_at <= ${p.now}::timestamptz AND n.created_at > ${p.now}::timestamptz - make_interval(days => ${p.days})
  AND EXISTS (SELECT 1 FROM membership m WHERE m.user_id = n.user_id AND m.club_id = n.club_id AND m.status = 'active')
  AND COALESCE((SELECT p.email_mode FROM notification_preference p WHERE p.user_id = n.user_id AND p.kind = n.kind),
               ${p.defaults}::jsonb ->> n.kind) = 'digest'`;

const DEFAULTS = JSON.stringify(DEFAULT_EMAIL_MODES);

async function candidates(ds: DataSource, now: Date): Promise<Candidate[]> {
  return ds.query(
    `SELECT u.id, u.email, u.display_name AS "displayName", u.time_zone AS "timeZone"
       FROM app_user u
      WHERE u.disabled_at IS NULL
        AND EXISTS (SELECT 1 FROM notification n WHERE n.user_id = u.id AND ${pending({ now: '$1', days: '$2', defaults: '$3' })})
      ORDER BY u.id`,
    [now.toISOString(), DIGEST_LOOKBACK_DAYS, DEFAULTS],
  );
}

/** Claims (user, local date) and queues that user's digest in the same transaction; false if it was already claimed. */
async function sendOne(
  tx: EntityManager,
  mailer: Mailer,
  links: MailLinks,
  user: Candidate,
  localDate: string,
  now: Date,
): Promise<boolean> {
  // Concurrent workers block on the unique index here; the one that comes second gets DO NOTHING once the first commits.
  const claimed: { id: string }[] = await tx.query(
    `INSERT INTO notification_digest (user_id, digest_date, created_at) VALUES ($1, $2, $3)
       ON CONFLICT (user_id, digest_date) DO NOTHING RETURNING id`,
    [user.id, localDate, now.toISOString()],
  );
  const digestId = claimed[0]?.id;
  if (!digestId) return false;
  // TypeORM answers an UPDATE … RETURNING with [rows, affected].
  const [marked]: [{ id: string; clubName: string }[], number] = await tx.query(
    `UPDATE notification n SET emailed_at = $2::timestamptz, digest_id = $5
       FROM club c
      WHERE c.id = n.club_id AND n.user_id = $1 AND ${pending({ now: '$2', days: '$3', defaults: '$4' })}
      RETURNING n.id, c.name AS "clubName"`,
    [user.id, now.toISOString(), DIGEST_LOOKBACK_DAYS, DEFAULTS, digestId],
  );
  await tx.query(`UPDATE notification_digest SET notification_count = $2 WHERE id = $1`, [
    digestId,
    marked.length,
  ]);
  if (!marked.length) return true;
  const clubOf = new Map(marked.map((r) => [r.id, r.clubName]));
  const list = await tx.find(Notification, {
    where: { id: In([...clubOf.keys()]) },
    order: { createdAt: 'ASC', id: 'ASC' },
  });
  const items = list.map((n) => ({ clubName: clubOf.get(n.id) ?? '', notification: n }));
  await mailer.enqueue(digestMail({ to: user, items, localDate, links }), { db: tx });
  return true;
}

/**
 * The daily digest. Everyone whose local time at `now` is in the morning window (07:00–11:59) and who has pending
 * digest notifications gets one e-mail for that local day. Safe to run concurrently and as often as you like:
 * the (user, date) claim row and the e-mail job commit together or not at all.
 */
export async function runDigest(
  dataSource: DataSource,
  mailer: Mailer,
  now: Date,
  links: MailLinks,
): Promise<DigestResult> {
  const result: DigestResult = { sentTo: [], alreadyClaimed: [] };
  for (const user of await candidates(dataSource, now)) {
    const { date, hour } = localDayAndHour(now, user.timeZone);
    if (hour < DIGEST_LOCAL_HOUR || hour > DIGEST_LATEST_LOCAL_HOUR) continue;
    const sent = await dataSource.transaction((tx) => sendOne(tx, mailer, links, user, date, now));
    (sent ? result.sentTo : result.alreadyClaimed).push(user.id);
  }
  return result;
}
