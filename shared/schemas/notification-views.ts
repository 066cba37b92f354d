import type { EmailMode, NotificationKind } from '../constants/notifications';
import type { MentorRequestState } from '../constants/mentorship';

/** What the API answers with. Times are ISO strings; links are paths inside the app. */
export interface NotificationView {
  id: string;
  clubId: string;
  clubName: string;
  kind: NotificationKind;
  title: string;
  body: string;
  link: string;
  subject: { type: string; id: string } | null;
  createdAt: string;
  readAt: string | null;
}

export interface NotificationPage {
  notifications: NotificationView[];
  unreadCount: number;
  /** The id to pass as `before` for the next (older) page; null on the last page. */
  nextCursor: string | null;
}

export interface NotificationPreferencesView {
  preferences: Record<NotificationKind, EmailMode>;
  defaults: Record<NotificationKind, EmailMode>;
}

export interface PersonRef {
  userId: string;
  displayName: string;
}

export interface MentorRequestView {
  id: string;
  clubId: string;
  requester: PersonRef;
  preferredMentor: PersonRef | null;
  note: string;
  state: MentorRequestState;
  declineReason: string | null;
  decidedAt: string | null;
  assignmentId: string | null;
  createdAt: string;
}

export interface MyMentorRequestView {
  request: MentorRequestView | null;
  mentor: PersonRef | null;
}
