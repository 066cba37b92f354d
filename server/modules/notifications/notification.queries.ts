import type { EntityManager } from 'typeorm';
import { Notification } from './notification.entity';

// Notifications of a club the person is no longer an active member of are not shown (nor counted).
const visible = (user: string) =>
  `n.user_id = ${user} AND EXISTS (SELECT 1 FROM membership m WHERE m.user_id = n.user_id AND m.club_id = n.club_id AND m.status = 'active')`;

export type NotificationRow = Notification & { clubName: string };

const visibleTo = (m: EntityManager, userId: string) =>
  m.createQueryBuilder(Notification, 'n').where(visible(':userId'), { userId });

export const unreadCount = (m: EntityManager, userId: string) =>
  visibleTo(m, userId).andWhere('n.read_at IS NULL').getCount();

async function load(
  m: EntityManager,
  userId: string,
  where: string,
  params: Record<string, unknown>,
  limit: number,
): Promise<NotificationRow[]> {
  const { entities, raw } = await visibleTo(m, userId)
    .innerJoin('club', 'c', 'c.id = n.club_id')
    .addSelect('c.name', 'club_name')
    .andWhere(where, params)
    .orderBy('n.created_at', 'DESC')
    .addOrderBy('n.id', 'DESC')
    .limit(limit)
    .getRawAndEntities<{ n_id: string; club_name: string }>();
  const names = new Map(raw.map((r) => [r.n_id, r.club_name]));
  return entities.map((e) => Object.assign(e, { clubName: names.get(e.id) ?? '' }));
}

/** The person's notifications, newest first, with one more than the page to tell whether another follows. */
export async function notificationsPage(
  m: EntityManager,
  userId: string,
  q: { unreadOnly?: boolean; before?: string; limit: number },
): Promise<{ items: NotificationRow[]; nextCursor: string | null }> {
  const conditions = ['TRUE'];
  if (q.unreadOnly) conditions.push('n.read_at IS NULL');
  // Keyset paging on (created_at, id) read from the cursor's own row: no timestamp rounding in the cursor.
  if (q.before)
    conditions.push(
      `(n.created_at, n.id) < (SELECT b.created_at, b.id FROM notification b WHERE b.id = :before AND b.user_id = :userId)`,
    );
  const rows = await load(
    m,
    userId,
    conditions.join(' AND '),
    q.before ? { before: q.before } : {},
    q.limit + 1,
  );
  const items = rows.slice(0, q.limit);
  return { items, nextCursor: rows.length > q.limit ? items[items.length - 1]!.id : null };
}

export async function findNotification(
  m: EntityManager,
  userId: string,
  id: string,
): Promise<NotificationRow | undefined> {
  const [row] = await load(m, userId, 'n.id = :id', { id }, 1);
  return row;
}

/** Marks every visible unread notification read; says how many. */
export async function markAllRead(m: EntityManager, userId: string): Promise<number> {
  const result = await m.query(
    `UPDATE notification n SET read_at = now() WHERE ${visible('$1')} AND n.read_at IS NULL`,
    [userId],
  );
  return Array.isArray(result) ? Number(result[1] ?? 0) : 0;
}

/** Marks one read (the first time only: marking twice keeps the first time). */
export async function markRead(m: EntityManager, userId: string, id: string): Promise<void> {
  await m.query(
    `UPDATE notification n SET read_at = now() WHERE ${visible('$1')} AND n.id = $2 AND n.read_at IS NULL`,
    [userId, id],
  );
}
