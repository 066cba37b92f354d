import { Router } from 'express';
import type { Deps } from '@server/deps';
import { DEFAULT_EMAIL_MODES } from '../../../shared/constants/notifications';
import type { NotificationPage, NotificationPreferencesView } from '../../../shared/schemas/notification-views';
import { listNotificationsQuery, notificationParams, updateNotificationPreferencesSchema } from '../../../shared/schemas/notification.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { requireSignIn, viewerOf } from '../../middleware/viewer';
import { audit } from '../audit';
import { Notification } from './notification.entity';
import { presentNotification } from './notification.presenter';
import { emailModesOf, setEmailModes } from './preferences';

// Notifications of a club the person is no longer an active member of are not shown (nor counted).
const visible = (user: string) =>
  `n.user_id = ${user} AND EXISTS (SELECT 1 FROM membership m WHERE m.user_id = n.user_id AND m.club_id = n.club_id AND m.status = 'active')`;

type Row = Notification & { clubName: string };

export function notificationRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const visibleTo = (userId: string) => dataSource.getRepository(Notification).createQueryBuilder('n').where(visible(':userId'), { userId });
  const unreadCount = (userId: string) => visibleTo(userId).andWhere('n.read_at IS NULL').getCount();

  const load = async (userId: string, where: string, params: Record<string, unknown>, limit: number): Promise<Row[]> => {
    const { entities, raw } = await visibleTo(userId)
      .innerJoin('club', 'c', 'c.id = n.club_id')
      .addSelect('c.name', 'club_name')
      .andWhere(where, params)
      .orderBy('n.created_at', 'DESC')
      .addOrderBy('n.id', 'DESC')
      .limit(limit)
      .getRawAndEntities<{ n_id: string; club_name: string }>();
    const names = new Map(raw.map((r) => [r.n_id, r.club_name]));
    return entities.map((e) => Object.assign(e, { clubName: names.get(e.id) ?? '' }));
  };

  const list = { query: listNotificationsQuery };
  router.get('/me/notifications', requireSignIn, validate(list), async (req, res) => {
    const { query } = inputOf(res, list);
    const userId = viewerOf(req).user.id;
    const conditions = ['TRUE'];
    if (query.unreadOnly) conditions.push('n.read_at IS NULL');
    // Keyset paging on (created_at, id) read from the cursor's own row: no timestamp rounding in the cursor.
    if (query.before) conditions.push(`(n.created_at, n.id) < (SELECT b.created_at, b.id FROM notification b WHERE b.id = :before AND b.user_id = :userId)`);
    const rows = await load(userId, conditions.join(' AND '), query.before ? { before: query.before } : {}, query.limit + 1);
    const page = rows.slice(0, query.limit);
    const body: NotificationPage = {
      notifications: page.map((n) => presentNotification(n, n.clubName)),
      unreadCount: await unreadCount(userId),
      nextCursor: rows.length > query.limit ? page[page.length - 1]!.id : null,
    };
    res.json(body);
  });

  router.post('/me/notifications/read-all', requireSignIn, async (req, res) => {
    const userId = viewerOf(req).user.id;
    const result = await dataSource.query(`UPDATE notification n SET read_at = now() WHERE ${visible('$1')} AND n.read_at IS NULL`, [userId]);
    const updated = Array.isArray(result) ? Number(result[1] ?? 0) : 0;
    res.json({ updated, unreadCount: await unreadCount(userId) });
  });

  const one = { params: notificationParams };
  router.post('/me/notifications/:id/read', requireSignIn, validate(one), async (req, res) => {
    const { params } = inputOf(res, one);
    const userId = viewerOf(req).user.id;
    await dataSource.query(`UPDATE notification n SET read_at = now() WHERE ${visible('$1')} AND n.id = $2 AND n.read_at IS NULL`, [userId, params.id]);
    const [row] = await load(userId, 'n.id = :id', { id: params.id }, 1);
    if (!row) throw errors.notFound('That notification');
    res.json({ notification: presentNotification(row, row.clubName), unreadCount: await unreadCount(userId) });
  });

  router.get('/me/notification-preferences', requireSignIn, async (req, res) => {
    const body: NotificationPreferencesView = { preferences: await emailModesOf(dataSource.manager, viewerOf(req).user.id), defaults: DEFAULT_EMAIL_MODES };
    res.json(body);
  });

  const prefs = { body: updateNotificationPreferencesSchema };
  router.patch('/me/notification-preferences', requireSignIn, validate(prefs), async (req, res) => {
    const { body } = inputOf(res, prefs);
    const userId = viewerOf(req).user.id;
    const preferences = await dataSource.transaction(async (tx) => {
      const saved = await setEmailModes(tx, userId, body);
      await audit(tx, { actorId: userId, action: 'notification-preferences.changed', targetType: 'User', targetId: userId, details: { changes: body } });
      return saved;
    });
    const answer: NotificationPreferencesView = { preferences, defaults: DEFAULT_EMAIL_MODES };
    res.json(answer);
  });

  return router;
}
