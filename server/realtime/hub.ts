import type { Server } from 'socket.io';
import { rooms, type ClientToServerEvents, type ServerToClientEvents } from '../../shared/events/socket-events';

export type IoServer = Server<ClientToServerEvents, ServerToClientEvents, Record<string, never>, { userId: string }>;

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
}
