import { Router } from 'express';
import type { Deps } from '@server/deps';
import { DEFAULT_EMAIL_MODES } from '@shared/constants/notifications';
import type { NotificationPage, NotificationPreferencesView } from '@shared/schemas/notification-views';
import {
  listNotificationsQuery,
  notificationParams,
  updateNotificationPreferencesSchema,
} from '@shared/schemas/notification.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { requireSignIn, viewerOf } from '../../middleware/viewer';
import {
  findNotification,
  markAllRead,
  markRead,
  notificationsPage,
  unreadCount,
} from './notification.queries';
import { presentNotification } from './notification.presenter';
import { changeEmailModes, emailModesOf } from './preferences';

export function notificationRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const m = dataSource.manager;
  const router = Router();

  const list = { query: listNotificationsQuery };
  router.get('/me/notifications', requireSignIn, validate(list), async (req, res) => {
    const { query } = inputOf(res, list);
    const userId = viewerOf(req).user.id;
    const page = await notificationsPage(m, userId, query);
    const body: NotificationPage = {
      notifications: page.items.map((n) => presentNotification(n, n.clubName)),
      unreadCount: await unreadCount(m, userId),
      nextCursor: page.nextCursor,
    };
    res.json(body);
  });

  router.post('/me/notifications/read-all', requireSignIn, async (req, res) => {
    const userId = viewerOf(req).user.id;
    const updated = await markAllRead(m, userId);
    res.json({ updated, unreadCount: await unreadCount(m, userId) });
  });

  const one = { params: notificationParams };
  router.post('/me/notifications/:id/read', requireSignIn, validate(one), async (req, res) => {
    const { params } = inputOf(res, one);
    const userId = viewerOf(req).user.id;
    await markRead(m, userId, params.id);
    const row = await findNotification(m, userId, params.id);
    if (!row) throw errors.notFound('That notification');
    res.json({
      notification: presentNotification(row, row.clubName),
      unreadCount: await unreadCount(m, userId),
    });
  });

  router.get('/me/notification-preferences', requireSignIn, async (req, res) => {
    const body: NotificationPreferencesView = {
      preferences: await emailModesOf(m, viewerOf(req).user.id),
      defaults: DEFAULT_EMAIL_MODES,
    };
    res.json(body);
  });

  const prefs = { body: updateNotificationPreferencesSchema };
  router.patch('/me/notification-preferences', requireSignIn, validate(prefs), async (req, res) => {
    const { body } = inputOf(res, prefs);
    const userId = viewerOf(req).user.id;
    const preferences = await dataSource.transaction((tx) => changeEmailModes(tx, userId, body));
    const answer: NotificationPreferencesView = { preferences, defaults: DEFAULT_EMAIL_MODES };
    res.json(answer);
  });

  return router;
}
