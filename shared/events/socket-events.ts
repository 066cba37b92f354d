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
  /**
   * Something about a tank changed: its readings, animals, settings, concerns or questions. Sent after the commit to
   * the people who may watch that tank, checked when it is sent. The desk, the question list and thread, and the
   * ask-about-a-reading panel refetch on it; the tank page refreshes after its own saves.
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
