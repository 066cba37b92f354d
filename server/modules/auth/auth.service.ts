import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Deps } from '@server/deps';
import { PASSWORD_RESET_VALID_MINUTES } from '@shared/constants/security';
import type { updateProfileSchema } from '@shared/schemas/auth.schema';
import { errors } from '../../lib/app-error';
import { verifyPassword } from '../../lib/passwords';
import { hashToken, newToken } from '../../lib/tokens';
import { passwordResetMail } from '../../mail/templates';
import { audit } from '../audit';
import { findUser, User, userByEmail } from '../users';
import { PasswordReset } from './password-reset.entity';
import { endSessionsOfUser } from './sessions';

const BAD_CREDENTIALS = 'That e-mail and password do not match an account.';

/** The account these credentials open (audited either way); a wrong pair and an unknown e-mail get the same 401. */
export async function checkCredentials(m: EntityManager, email: string, password: string): Promise<User> {
  const user = await userByEmail(m, email);
  const ok = await verifyPassword(user?.passwordHash, password);
  if (!user || !ok || user.disabledAt) {
    await audit(m, {
      actorId: user?.id ?? null,
      action: 'sign-in.failed',
      details: { known: Boolean(user) },
    });
    throw errors.unauthenticated(BAD_CREDENTIALS);
  }
  await audit(m, { actorId: user.id, action: 'sign-in' });
  return user;
}

export async function updateOwnProfile(
  m: EntityManager,
  userId: string,
  changes: z.output<typeof updateProfileSchema>,
): Promise<User> {
  await m.update(User, { id: userId }, changes);
  return (await findUser(m, userId))!;
}

/** A reset link by e-mail for an active account; nothing (and no hint) for any other address. */
export async function requestPasswordReset(
  deps: Pick<Deps, 'dataSource' | 'mailer' | 'config'>,
  email: string,
): Promise<void> {
  const m = deps.dataSource.manager;
  const user = await userByEmail(m, email);
  if (!user || user.disabledAt) return;
  const { token, hash } = newToken();
  await m.insert(PasswordReset, {
    userId: user.id,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + PASSWORD_RESET_VALID_MINUTES * 60_000),
  });
  const link = `${deps.config.baseUrl}/reset-password?token=${encodeURIComponent(token)}`;
  await deps.mailer.enqueue({ to: user.email, ...passwordResetMail({ clubName: 'Shoalwise', link }) });
  await audit(m, { actorId: user.id, action: 'password-reset.requested' });
}

/** Uses a reset link once: the new password is set and every session of the account ends. Returns the user's id. */
export async function confirmPasswordReset(
  tx: EntityManager,
  token: string,
  passwordHash: string,
): Promise<string> {
  const reset = await tx
    .createQueryBuilder(PasswordReset, 'r')
    .setLock('pessimistic_write')
    .where('r.token_hash = :hash', { hash: hashToken(token) })
    .getOne();
  if (!reset) throw errors.notFound('That reset link');
  if (reset.usedAt) throw errors.gone('That reset link was already used. Ask for a new one.');
  if (reset.expiresAt.getTime() < Date.now())
    throw errors.gone('That reset link has expired. Ask for a new one.');
  await tx.update(PasswordReset, { id: reset.id }, { usedAt: new Date() });
  await tx.update(User, { id: reset.userId }, { passwordHash });
  await endSessionsOfUser(tx, reset.userId);
  await audit(tx, { actorId: reset.userId, action: 'password-reset.completed' });
  return reset.userId;
}

/** After a sign-out: the user's open sockets close on every instance, and it is audited. */
export async function signedOut(deps: Pick<Deps, 'dataSource' | 'hub'>, userId: string): Promise<void> {
  deps.hub.disconnectUser(userId);
  await audit(deps.dataSource.manager, { actorId: userId, action: 'sign-out' });
}
