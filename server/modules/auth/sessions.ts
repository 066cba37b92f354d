import type { Request } from 'express';
import type { EntityManager } from 'typeorm';
import { csrfTokenFor } from '../../middleware/csrf';

/** New session id at sign-in (ASVS 7.2.4): regenerate, then set the user, then save before answering. */
export async function startSignedInSession(req: Request, userId: string, clubId?: string): Promise<string> {
  await new Promise<void>((resolve, reject) =>
    req.session.regenerate((err) => (err ? reject(err) : resolve())),
  );
  req.session.userId = userId;
  req.session.signedInAt = Date.now();
  if (clubId) req.session.activeClubId = clubId;
  const token = csrfTokenFor(req);
  await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
  return token;
}

export function destroySession(req: Request): Promise<void> {
  return new Promise((resolve) => (req.session ? req.session.destroy(() => resolve()) : resolve()));
}

/** Ends every session of a user on the server (password reset, disabling), except one if given. */
export async function endSessionsOfUser(
  manager: EntityManager,
  userId: string,
  exceptSid?: string,
): Promise<number> {
  const rows: unknown[] = await manager.query(
    `DELETE FROM "session" WHERE sess->>'userId' = $1 AND ($2::text IS NULL OR sid <> $2) RETURNING sid`,
    [userId, exceptSid ?? null],
  );
  return rows.length;
}
