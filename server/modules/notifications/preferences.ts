import { In, type EntityManager } from 'typeorm';
import {
  DEFAULT_EMAIL_MODES,
  NOTIFICATION_KINDS,
  type EmailMode,
  type NotificationKind,
  type UnsubscribeScope,
} from '@shared/constants/notifications';
import { audit } from '../audit';
import { NotificationPreference } from './notification-preference.entity';

export type EmailModes = Record<NotificationKind, EmailMode>;

/** Every kind with the person's choice, or the default where they made none. */
export async function emailModesOf(manager: EntityManager, userId: string): Promise<EmailModes> {
  const rows = await manager.findBy(NotificationPreference, { userId });
  const modes = { ...DEFAULT_EMAIL_MODES };
  for (const r of rows) modes[r.kind] = r.emailMode;
  return modes;
}

/** The e-mail mode for one kind, for several people at once. */
export async function emailModeFor(
  manager: EntityManager,
  userIds: string[],
  kind: NotificationKind,
): Promise<Map<string, EmailMode>> {
  const rows = userIds.length
    ? await manager.findBy(NotificationPreference, { userId: In(userIds), kind })
    : [];
  const chosen = new Map(rows.map((r) => [r.userId, r.emailMode]));
  return new Map(userIds.map((id) => [id, chosen.get(id) ?? DEFAULT_EMAIL_MODES[kind]]));
}

export async function setEmailModes(
  manager: EntityManager,
  userId: string,
  changes: Partial<EmailModes>,
): Promise<EmailModes> {
  const rows = Object.entries(changes).map(([kind, emailMode]) => ({
    userId,
    kind: kind as NotificationKind,
    emailMode: emailMode as EmailMode,
  }));
  if (rows.length) await manager.upsert(NotificationPreference, rows, ['userId', 'kind']);
  return emailModesOf(manager, userId);
}

/** The person changes their e-mail choices (audited). */
export async function changeEmailModes(
  tx: EntityManager,
  userId: string,
  changes: Partial<EmailModes>,
): Promise<EmailModes> {
  const saved = await setEmailModes(tx, userId, changes);
  await audit(tx, {
    actorId: userId,
    action: 'notification-preferences.changed',
    targetType: 'User',
    targetId: userId,
    details: { changes },
  });
  return saved;
}

/** What an unsubscribe link turns off (audited): one kind, every kind now in the digest, or every kind. */
export async function unsubscribe(
  manager: EntityManager,
  userId: string,
  scope: UnsubscribeScope,
): Promise<NotificationKind[]> {
  const current = await emailModesOf(manager, userId);
  const kinds =
    scope === 'all'
      ? [...NOTIFICATION_KINDS]
      : scope === 'digest'
        ? NOTIFICATION_KINDS.filter((k) => current[k] === 'digest')
        : [scope];
  await setEmailModes(manager, userId, Object.fromEntries(kinds.map((k) => [k, 'off'])));
  await audit(manager, {
    actorId: userId,
    action: 'notification-preferences.unsubscribed',
    targetType: 'User',
    targetId: userId,
    details: { scope, kinds },
  });
  return kinds;
}
