import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { ABSOLUTE_MS } from '../config/session';
import type { IoServer } from './hub';

/**
 * A socket's session is a snapshot from its handshake (SECURITY.md): a session that ends without a sign-out on this
 * server (idle or absolute expiry, sessions ended when an account is disabled, a row removed by hand) would leave the
 * socket open. Every `intervalMs` the sockets of this instance are checked against the session store and those whose
 * session is gone are disconnected (ASVS 7.4.1). Sign-out and password resets still close sockets at once.
 */
export function watchSocketSessions(p: {
  io: IoServer;
  dataSource: DataSource;
  intervalMs: number;
  logger: Logger;
}): () => void {
  let running = false;
  const check = async () => {
    if (running) return;
    running = true;
    try {
      const sockets = [...p.io.of('/').sockets.values()];
      if (!sockets.length) return;
      const sids = [...new Set(sockets.map((s) => s.data.sessionId))];
      const live: { sid: string; userId: string }[] = await p.dataSource.query(
        `SELECT sid, sess->>'userId' AS "userId" FROM "session"
          WHERE sid = ANY($1) AND expire > now() AND (sess->>'signedInAt')::bigint > $2`,
        [sids, Date.now() - ABSOLUTE_MS],
      );
      const owner = new Map(live.map((r) => [r.sid, r.userId]));
      for (const socket of sockets) {
        if (owner.get(socket.data.sessionId) !== socket.data.userId) socket.disconnect(true);
      }
    } catch (err) {
      // The store cannot be read (database down): keep the sockets; every event is still checked when it is sent.
      p.logger.warn({ err: (err as Error).message }, 'socket session check failed');
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void check(), p.intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
