import type { Server as HttpServer, IncomingMessage } from 'node:http';
import { createAdapter } from '@socket.io/postgres-adapter';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import { Server } from 'socket.io';
import type { DataSource } from 'typeorm';
import { rooms } from '@shared/events/socket-events';
import type { Config } from '../config/env';
import { releaseDroppedListenClients } from './adapter-pool';
import type { IoServer, RealtimeHub } from './hub';
import { watchSocketSessions } from './session-watch';

/** Browsers always send Origin on a WebSocket (ASVS 4.4.1); only our own origins may open one. */
export function allowedOrigins(config: Config): Set<string> {
  const origins = new Set([new URL(config.baseUrl).origin]);
  if (!config.isProduction) {
    origins.add(`http://127.0.0.1:${config.port}`);
    origins.add(`http://localhost:${config.port}`);
  }
  return origins;
}

/** No Origin (not a browser, still needs the session cookie), a configured origin, or the page's own origin. */
function originAllowed(origin: string | undefined, host: string | undefined, origins: Set<string>): boolean {
  if (origin === undefined) return true;
  if (origins.has(origin)) return true;
  try {
    return host !== undefined && new URL(origin).host === host;
  } catch {
    return false;
  }
}

interface SessionRequest extends IncomingMessage {
  session?: { userId?: string };
  sessionID?: string;
}

export function startRealtime(p: {
  httpServer: HttpServer;
  sessionMiddleware: RequestHandler;
  hub: RealtimeHub;
  dataSource: DataSource;
  adapterPool: Pool;
  config: Config;
  logger: Logger;
}): IoServer {
  const origins = allowedOrigins(p.config);
  const io: IoServer = new Server(p.httpServer, {
    serveClient: false,
    maxHttpBufferSize: 16_384,
    allowRequest: (req, callback) => {
      callback(null, originAllowed(req.headers.origin, req.headers.host, origins));
    },
    adapter: createAdapter(releaseDroppedListenClients(p.adapterPool) as Pool, {
      tableName: 'socket_io_attachments',
    }),
  });
  // The same express-session as the HTTP API: no second sign-in, no token in the URL.
  io.engine.use(p.sessionMiddleware);
  io.use(async (socket, next) => {
    const { session, sessionID } = socket.request as SessionRequest;
    const userId = session?.userId;
    if (!userId || !sessionID) return next(new Error('unauthenticated'));
    try {
      const clubs: { clubId: string }[] = await p.dataSource.query(
        `SELECT club_id AS "clubId" FROM membership WHERE user_id = $1 AND status = 'active'`,
        [userId],
      );
      socket.data.userId = userId;
      socket.data.sessionId = sessionID;
      await socket.join([rooms.user(userId), ...clubs.map((c) => rooms.club(c.clubId))]);
      next();
    } catch (err) {
      p.logger.warn({ err: (err as Error).message }, 'socket handshake failed');
      next(new Error('unavailable'));
    }
  });
  p.hub.attach(io);
  const stopWatching = watchSocketSessions({
    io,
    dataSource: p.dataSource,
    intervalMs: p.config.socketSessionCheckSeconds * 1000,
    logger: p.logger,
  });
  p.httpServer.once('close', stopWatching);
  return io;
}
