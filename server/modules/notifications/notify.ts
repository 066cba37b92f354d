import type { EntityManager } from 'typeorm';
import type { NotificationKind } from '@shared/constants/notifications';
import { afterCommit } from '../../db/after-commit';
import type { MailAttachment } from '../../mail/mailer';
import type { NotificationDelivery } from './delivery';
import { immediateMail, type Recipient } from './notification-mail';
import { Notification } from './notification.entity';
import { presentNotification } from './notification.presenter';
import { emailModeFor } from './preferences';

export interface NotifyInput {
  /** Who to tell. People who are not active members of the club (or are disabled) are skipped. */
  userIds: readonly string[];
  clubId: string;
  kind: NotificationKind;
  title: string;
  body?: string;
  /** A path inside the app, starting with a single "/", e.g. `/tanks/<id>`. */
  link: string;
  /** What it is about, e.g. { type: 'Concern', id }. */
  subject?: { type: string; id: string };
  /** Sent with the e-mail of those who get it right away (e.g. a meetup's .ics); the digest leaves them out. */
  attachments?: MailAttachment[];
}

const TITLE_MAX = 200;
const BODY_MAX = 2000;
const clip = (s: string, max: number) => (s.length > max ? `${s.slice(0, max - 1)}…` : s);

/**
 * Records notifications inside the caller's transaction. E-mails for people who chose "right away" are queued in the
 * same transaction (so they exist only if it commits); the live socket event goes out after the commit.
 */
export type Notify = (tx: EntityManager, input: NotifyInput) => Promise<Notification[]>;

/** The app's notify(), delivering through its socket hub and mail queue (createApp builds it once). */
export function createNotifier(delivery: NotificationDelivery): Notify {
  return (tx, input) => notifyThrough(delivery, tx, input);
}

async function notifyThrough(
  delivery: NotificationDelivery,
  tx: EntityManager,
  input: NotifyInput,
): Promise<Notification[]> {
  if (!/^\/(?![/\\])/.test(input.link))
    throw new Error(`notify(): link must be a path inside the app, got "${input.link}"`);
  const wanted = [...new Set(input.userIds)];
  if (!wanted.length) return [];
  const recipients: Recipient[] = await tx.query(
    `SELECT u.id, u.email, u.display_name AS "displayName"
       FROM app_user u JOIN membership m ON m.user_id = u.id AND m.club_id = $1 AND m.status = 'active'
      WHERE u.id = ANY($2::uuid[]) AND u.disabled_at IS NULL`,
    [input.clubId, wanted],
  );
  if (!recipients.length) return [];
  const [club] = (await tx.query(`SELECT name FROM club WHERE id = $1`, [input.clubId])) as {
    name: string;
  }[];
  const clubName = club?.name ?? '';
  const rows = await tx.save(
    Notification,
    recipients.map((r) =>
      tx.create(Notification, {
        userId: r.id,
        clubId: input.clubId,
        kind: input.kind,
        title: clip(input.title.trim() || 'Update', TITLE_MAX),
        body: clip(input.body?.trim() ?? '', BODY_MAX),
        link: input.link,
        subjectType: input.subject?.type ?? null,
        subjectId: input.subject?.id ?? null,
        readAt: null,
        emailedAt: null,
        digestId: null,
      }),
    ),
  );

  const modes = await emailModeFor(
    tx,
    recipients.map((r) => r.id),
    input.kind,
  );
  const now = new Date();
  for (const row of rows) {
    if (modes.get(row.userId) !== 'immediate') continue;
    const to = recipients.find((r) => r.id === row.userId)!;
    const mail = immediateMail({ to, clubName, notification: row, links: delivery.config });
    await delivery.mailer.enqueue(
      input.attachments?.length ? { ...mail, attachments: input.attachments } : mail,
      { db: tx },
    );
    await tx.update(Notification, { id: row.id }, { emailedAt: now });
    row.emailedAt = now;
  }

  afterCommit(tx, () => {
    for (const row of rows)
      delivery.hub.emitToUser(row.userId, 'notification', {
        notification: presentNotification(row, clubName),
      });
  });
  return rows;
}
