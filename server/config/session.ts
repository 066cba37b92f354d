import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { Pool } from 'pg';
import { SESSION_ABSOLUTE_HOURS, SESSION_IDLE_MINUTES } from '@shared/constants/security';
import type { Config } from './env';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    /** When the signed-in session began; sessions end SESSION_ABSOLUTE_HOURS later whatever the activity. */
    signedInAt?: number;
    csrfToken?: string;
    activeClubId?: string;
  }
}

export const SESSION_COOKIE = { production: '__Host-shoalwise', development: 'shoalwise.sid' } as const;
export const IDLE_MS = SESSION_IDLE_MINUTES * 60_000;
export const ABSOLUTE_MS = SESSION_ABSOLUTE_HOURS * 3_600_000;

export function createSessionMiddleware(config: Config, pool: Pool) {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: 'session',
    createTableIfMissing: false,
    pruneSessionInterval: config.env === 'test' ? false : 15 * 60,
    errorLog: () => undefined,
  });
  const middleware = session({
    name: config.isProduction ? SESSION_COOKIE.production : SESSION_COOKIE.development,
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true, // every request pushes the idle expiry forward
    // 'keep', not 'destroy': when loading the session fails (the database is down), req.session is unset and
    // 'destroy' would delete the stored session at the end of that request, signing the person out. Sign-out
    // and password resets end sessions explicitly (sessions.ts).
    unset: 'keep',
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.isProduction,
      path: '/',
      maxAge: IDLE_MS,
    },
  });
  return { middleware, store };
}
