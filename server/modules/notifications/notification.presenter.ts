import type { NotificationView } from '@shared/schemas/notification-views';
import type { Notification } from './notification.entity';

export function presentNotification(n: Notification, clubName: string): NotificationView {
  return {
    id: n.id,
    clubId: n.clubId,
    clubName,
    kind: n.kind,
    title: n.title,
    body: n.body,
    link: n.link,
    subject: n.subjectType && n.subjectId ? { type: n.subjectType, id: n.subjectId } : null,
    createdAt: n.createdAt.toISOString(),
    readAt: n.readAt?.toISOString() ?? null,
  };
}
