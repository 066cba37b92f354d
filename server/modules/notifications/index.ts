/** Notifications: in the app, by e-mail right away or in the daily digest, and the unsubscribe link. */
export { Notification } from './notification.entity';
export { NotificationDigest } from './notification-digest.entity';
export { NotificationPreference } from './notification-preference.entity';
export { notificationRouter } from './notification.router';
export { unsubscribeRouter } from './unsubscribe.router';
export { createNotifier, type Notify, type NotifyInput } from './notify';
export { tellMentorsOfConcerns } from './concern-notices';
export { startDigestScheduler } from './digest-scheduler';
