/** What a notification is about. Other modules pass one of these to notify(). */
export const NOTIFICATION_KINDS = [
  'concern.urgent',
  'concern.caution',
  'question.asked',
  'question.answered',
  'mention',
  'mentor-request',
  'assignment',
  'meetup',
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** How a person wants e-mail about one kind: at once, in the morning digest, or never (in-app only). */
export const EMAIL_MODES = ['immediate', 'digest', 'off'] as const;
export type EmailMode = (typeof EMAIL_MODES)[number];

export const DEFAULT_EMAIL_MODES: Record<NotificationKind, EmailMode> = {
  'concern.urgent': 'immediate',
  'concern.caution': 'digest',
  'question.asked': 'digest',
  'question.answered': 'digest',
  mention: 'digest',
  'mentor-request': 'digest',
  assignment: 'digest',
  // A changed time or a freed place is no use in tomorrow's digest.
  meetup: 'immediate',
};

export const NOTIFICATION_KIND_LABELS: Record<NotificationKind, { label: string; hint: string }> = {
  'concern.urgent': { label: 'Urgent water concerns', hint: 'A test result that needs action today.' },
  'concern.caution': { label: 'Water cautions', hint: 'A value drifting the wrong way, worth a look.' },
  'question.asked': { label: 'New questions', hint: 'A mentee asked about one of their tests.' },
  'question.answered': { label: 'Answers', hint: 'Someone answered your question.' },
  mention: { label: 'Mentions', hint: 'Someone named you in a thread.' },
  'mentor-request': { label: 'Mentor requests', hint: 'Members asking for a mentor, and the answers.' },
  assignment: { label: 'Mentor pairings', hint: 'A new mentor or mentee.' },
  meetup: { label: 'Meetups', hint: 'Reminders, changes and cancellations, and a place freeing up for you.' },
};

export const EMAIL_MODE_LABELS: Record<EmailMode, string> = {
  immediate: 'E-mail me right away',
  digest: 'In the morning digest',
  off: 'No e-mail (app only)',
};

/** Unsubscribe links name one kind, every digest kind, or everything. */
export const UNSUBSCRIBE_SCOPES = [...NOTIFICATION_KINDS, 'digest', 'all'] as const;
export type UnsubscribeScope = (typeof UNSUBSCRIBE_SCOPES)[number];

export const NOTIFICATION_PAGE_SIZE = 20;
export const NOTIFICATION_PAGE_MAX = 50;

/** The digest goes out on the first hourly run at or after this local hour, and not after the morning. */
export const DIGEST_LOCAL_HOUR = 7;
export const DIGEST_LATEST_LOCAL_HOUR = 11;
/** Older un-e-mailed notifications are left to the app (e.g. after switching a kind from off to digest). */
export const DIGEST_LOOKBACK_DAYS = 7;
