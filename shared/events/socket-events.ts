import type { Severity } from '../care/types';
import type { NotificationView } from '../schemas/notification-views';

export interface TankChangedPayload {
  clubId: string;
  tankId: string;
  raised: number;
  cleared: number;
  /** The worst severity among newly raised or worsened concerns, if any. */
  worst: Severity | null;
}

/** Socket event names and payloads, shared by the server and the browser. Sockets notify; queries stay the store. */
export interface ServerToClientEvents {
  /** Something the viewer may see changed; the client refetches the named query groups. */
  changed: (payload: { scope: string; clubId?: string; id?: string }) => void;
  /**
   * A tank's readings or concerns changed. Sent only to people who may read that tank, checked when it is sent;
   * the desk and the tank page refetch.
   */
  tankChanged: (payload: TankChangedPayload) => void;
  /** Concerns on a tank were raised, worsened or cleared (same audience as tankChanged): for highlights and sounds. */
  concern: (payload: TankChangedPayload) => void;
  /** A new notification for this user (sent to their `user:` room only). */
  notification: (payload: { notification: NotificationView }) => void;
}

// The browser sends nothing over the socket yet: every change goes through the HTTP API.
export type ClientToServerEvents = Record<string, never>;

export const rooms = {
  user: (userId: string) => `user:${userId}`,
  club: (clubId: string) => `club:${clubId}`,
};
