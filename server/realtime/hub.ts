import type { Server } from 'socket.io';
import { rooms, type ClientToServerEvents, type ServerToClientEvents } from '@shared/events/socket-events';

export type IoServer = Server<
  ClientToServerEvents,
  ServerToClientEvents,
  Record<string, never>,
  { userId: string; sessionId: string }
>;

/**
 * The app's handle on live connections. Created before the HTTP server exists (routers hold it),
 * attached to socket.io once the server listens; with the PostgreSQL adapter it reaches every instance.
 */
export class RealtimeHub {
  private io: IoServer | undefined;

  attach(io: IoServer): void {
    this.io = io;
  }

  /** Sign-out, password reset or disabling: the user's open sockets close at once, on every instance. */
  disconnectUser(userId: string): void {
    this.io?.in(rooms.user(userId)).disconnectSockets(true);
  }

  /**
   * To everyone in the club's room whose permissions, checked now and not at join time, let them see it.
   * Runs across instances: fetchSockets goes through the PostgreSQL adapter.
   */
  async emitToReaders<E extends keyof ServerToClientEvents>(
    clubId: string,
    mayRead: (userId: string) => Promise<boolean>,
    event: E,
    payload: Parameters<ServerToClientEvents[E]>[0],
  ): Promise<number> {
    if (!this.io) return 0;
    const args = [payload] as Parameters<ServerToClientEvents[E]>;
    const sockets = await this.io.in(rooms.club(clubId)).fetchSockets();
    const decisions = new Map<string, Promise<boolean>>();
    let sent = 0;
    for (const socket of sockets) {
      const userId = socket.data.userId;
      if (!decisions.has(userId))
        decisions.set(
          userId,
          mayRead(userId).catch(() => false),
        );
      if (await decisions.get(userId)) {
        socket.emit(event, ...args);
        sent++;
      }
    }
    return sent;
  }

  /** Something only this user may see: their `user:` room on every instance, nobody else. */
  emitToUser<E extends keyof ServerToClientEvents>(
    userId: string,
    event: E,
    payload: Parameters<ServerToClientEvents[E]>[0],
  ): void {
    const args = [payload] as Parameters<ServerToClientEvents[E]>;
    this.io?.to(rooms.user(userId)).emit(event, ...args);
  }
}
