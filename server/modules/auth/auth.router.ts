import { Router } from 'express';
import type { Deps } from '@server/deps';
import { packAbilityRules } from '../../../shared/abilities';
import { PASSWORD_RESET_VALID_MINUTES } from '../../../shared/constants/security';
import { requestPasswordResetSchema, resetPasswordSchema, signInSchema, updateProfileSchema } from '../../../shared/schemas/auth.schema';
import { errors } from '../../lib/app-error';
import { hashPassword, verifyPassword } from '../../lib/passwords';
import { hashToken, newToken } from '../../lib/tokens';
import { passwordResetMail } from '../../mail/templates';
import { csrfTokenFor } from '../../middleware/csrf';
import { inputOf, validate } from '../../middleware/validate';
import { requireSignIn, viewerOf } from '../../middleware/viewer';
import { audit } from '../audit';
import { presentUser, User } from '../users';
import { PasswordReset } from './password-reset.entity';
import { destroySession, endSessionsOfUser, startSignedInSession } from './sessions';

const BAD_CREDENTIALS = 'That e-mail and password do not match an account.';

export function authRouter(deps: Pick<Deps, 'dataSource' | 'mailer' | 'config' | 'hub' | 'rateLimits'>): Router {
  const { dataSource, mailer, config, hub } = deps;
  const users = dataSource.getRepository(User);
  const router = Router();

  router.get('/csrf', (req, res) => {
    const token = csrfTokenFor(req);
    req.session.save(() => res.json({ token }));
  });

  const signIn = { body: signInSchema };
  router.post('/session', ...deps.rateLimits.signIn(), validate(signIn), async (req, res) => {
    const { email, password } = inputOf(res, signIn).body;
    const user = await users.createQueryBuilder('u').where('lower(u.email) = :email', { email }).getOne();
    const ok = await verifyPassword(user?.passwordHash, password);
    if (!user || !ok || user.disabledAt) {
      await audit(dataSource.manager, { actorId: user?.id ?? null, action: 'sign-in.failed', details: { known: Boolean(user) } });
      throw errors.unauthenticated(BAD_CREDENTIALS);
    }
    const csrfToken = await startSignedInSession(req, user.id);
    await audit(dataSource.manager, { actorId: user.id, action: 'sign-in' });
    res.json({ user: presentUser(user), csrfToken });
  });

  router.delete('/session', async (req, res) => {
    const userId = req.session?.userId;
    await destroySession(req);
    res.clearCookie(config.isProduction ? '__Host-shoalwise' : 'shoalwise.sid', { path: '/' });
    if (userId) {
      hub.disconnectUser(userId);
      await audit(dataSource.manager, { actorId: userId, action: 'sign-out' });
    }
    res.status(204).end();
  });

  router.get('/me', requireSignIn, (req, res) => {
    const { user, memberships, ability } = viewerOf(req);
    res.json({
      user: presentUser(user),
      memberships: memberships.map((m) => ({ clubId: m.clubId, clubName: m.clubName, clubSlug: m.clubSlug, role: m.role, status: m.status })),
      activeClubId: req.session.activeClubId ?? memberships.find((m) => m.status === 'active')?.clubId ?? null,
      rules: packAbilityRules(ability.rules),
    });
  });

  const profile = { body: updateProfileSchema };
  router.patch('/me', requireSignIn, validate(profile), async (req, res) => {
    const { user } = viewerOf(req);
    await users.update({ id: user.id }, inputOf(res, profile).body);
    const fresh = await users.findOneByOrFail({ id: user.id });
    res.json({ user: presentUser(fresh) });
  });

  const resetRequest = { body: requestPasswordResetSchema };
  router.post('/password-resets', ...deps.rateLimits.resetRequest(), validate(resetRequest), async (req, res) => {
    const { email } = inputOf(res, resetRequest).body;
    const user = await users.createQueryBuilder('u').where('lower(u.email) = :email', { email }).getOne();
    if (user && !user.disabledAt) {
      const { token, hash } = newToken();
      await dataSource.getRepository(PasswordReset).insert({
        userId: user.id,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + PASSWORD_RESET_VALID_MINUTES * 60_000),
      });
      const link = `${config.baseUrl}/reset-password?token=${encodeURIComponent(token)}`;
      await mailer.enqueue({ to: user.email, ...passwordResetMail({ clubName: 'Shoalwise', link }) });
      await audit(dataSource.manager, { actorId: user.id, action: 'password-reset.requested' });
    }
    // The same answer whether or not the address has an account (ASVS 6.3.8).
    res.status(202).json({ message: 'If that address has an account, a reset link is on its way.' });
  });

  const resetConfirm = { body: resetPasswordSchema };
  router.post('/password-resets/confirm', deps.rateLimits.token('reset-confirm'), validate(resetConfirm), async (req, res) => {
    const { token, password } = inputOf(res, resetConfirm).body;
    const passwordHash = await hashPassword(password);
    const userId = await dataSource.transaction(async (tx) => {
      const reset = await tx
        .getRepository(PasswordReset)
        .createQueryBuilder('r')
        .setLock('pessimistic_write')
        .where('r.token_hash = :hash', { hash: hashToken(token) })
        .getOne();
      if (!reset) throw errors.notFound('That reset link');
      if (reset.usedAt) throw errors.gone('That reset link was already used. Ask for a new one.');
      if (reset.expiresAt.getTime() < Date.now()) throw errors.gone('That reset link has expired. Ask for a new one.');
      await tx.update(PasswordReset, { id: reset.id }, { usedAt: new Date() });
      await tx.update(User, { id: reset.userId }, { passwordHash });
      await endSessionsOfUser(tx, reset.userId);
      await audit(tx, { actorId: reset.userId, action: 'password-reset.completed' });
      return reset.userId;
    });
    hub.disconnectUser(userId);
    const user = await users.findOneByOrFail({ id: userId });
    const csrfToken = await startSignedInSession(req, userId);
    res.json({ user: presentUser(user), csrfToken });
  });

  return router;
}
