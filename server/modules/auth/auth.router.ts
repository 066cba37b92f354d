import { Router } from 'express';
import type { Deps } from '@server/deps';
import { packAbilityRules } from '@shared/abilities';
import {
  requestPasswordResetSchema,
  resetPasswordSchema,
  signInSchema,
  updateProfileSchema,
} from '@shared/schemas/auth.schema';
import { hashPassword } from '../../lib/passwords';
import { csrfTokenFor } from '../../middleware/csrf';
import { inputOf, validate } from '../../middleware/validate';
import { requireSignIn, viewerOf } from '../../middleware/viewer';
import { findUser, presentUser } from '../users';
import {
  checkCredentials,
  confirmPasswordReset,
  requestPasswordReset,
  signedOut,
  updateOwnProfile,
} from './auth.service';
import { destroySession, startSignedInSession } from './sessions';

export function authRouter(
  deps: Pick<Deps, 'dataSource' | 'mailer' | 'config' | 'hub' | 'rateLimits'>,
): Router {
  const { dataSource, config, hub } = deps;
  const router = Router();

  router.get('/csrf', (req, res) => {
    const token = csrfTokenFor(req);
    req.session.save(() => res.json({ token }));
  });

  const signIn = { body: signInSchema };
  router.post('/session', ...deps.rateLimits.signIn(), validate(signIn), async (req, res) => {
    const { email, password } = inputOf(res, signIn).body;
    const user = await checkCredentials(dataSource.manager, email, password);
    const csrfToken = await startSignedInSession(req, user.id);
    res.json({ user: presentUser(user), csrfToken });
  });

  router.delete('/session', async (req, res) => {
    const userId = req.session?.userId;
    await destroySession(req);
    res.clearCookie(config.isProduction ? '__Host-shoalwise' : 'shoalwise.sid', { path: '/' });
    if (userId) await signedOut(deps, userId);
    res.status(204).end();
  });

  router.get('/me', requireSignIn, (req, res) => {
    const { user, memberships, ability } = viewerOf(req);
    res.json({
      user: presentUser(user),
      memberships: memberships.map((m) => ({
        clubId: m.clubId,
        clubName: m.clubName,
        clubSlug: m.clubSlug,
        role: m.role,
        status: m.status,
      })),
      activeClubId:
        req.session.activeClubId ?? memberships.find((m) => m.status === 'active')?.clubId ?? null,
      rules: packAbilityRules(ability.rules),
    });
  });

  const profile = { body: updateProfileSchema };
  router.patch('/me', requireSignIn, validate(profile), async (req, res) => {
    const fresh = await updateOwnProfile(
      dataSource.manager,
      viewerOf(req).user.id,
      inputOf(res, profile).body,
    );
    res.json({ user: presentUser(fresh) });
  });

  const resetRequest = { body: requestPasswordResetSchema };
  router.post(
    '/password-resets',
    ...deps.rateLimits.resetRequest(),
    validate(resetRequest),
    async (req, res) => {
      await requestPasswordReset(deps, inputOf(res, resetRequest).body.email);
      // The same answer whether or not the address has an account (ASVS 6.3.8).
      res.status(202).json({ message: 'If that address has an account, a reset link is on its way.' });
    },
  );

  const resetConfirm = { body: resetPasswordSchema };
  router.post(
    '/password-resets/confirm',
    deps.rateLimits.token('reset-confirm'),
    validate(resetConfirm),
    async (req, res) => {
      const { token, password } = inputOf(res, resetConfirm).body;
      const passwordHash = await hashPassword(password);
      const userId = await dataSource.transaction((tx) => confirmPasswordReset(tx, token, passwordHash));
      hub.disconnectUser(userId);
      const user = (await findUser(dataSource.manager, userId))!;
      const csrfToken = await startSignedInSession(req, userId);
      res.json({ user: presentUser(user), csrfToken });
    },
  );

  return router;
}
