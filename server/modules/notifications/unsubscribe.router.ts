import { Router, type Request, type Response } from 'express';
import type { Deps } from '@server/deps';
import { NOTIFICATION_KIND_LABELS, type UnsubscribeScope } from '@shared/constants/notifications';
import { unsubscribeQuery } from '@shared/schemas/notification.schema';
import { findUser } from '../users';
import { unsubscribe } from './preferences';
import { unsubscribePage } from './unsubscribe-page';
import { verifyUnsubscribeToken, type UnsubscribeClaim } from './unsubscribe-token';

const scopeText = (scope: UnsubscribeScope) =>
  scope === 'all'
    ? 'every Shoalwise e-mail'
    : scope === 'digest'
      ? 'the daily digest'
      : `"${NOTIFICATION_KIND_LABELS[scope].label}" e-mails`;

const refuse = (res: Response) =>
  res
    .status(400)
    .type('html')
    .send(
      unsubscribePage({
        title: 'This link does not work',
        paragraphs: [
          'The unsubscribe link is incomplete or was changed. Copy the whole link from the e-mail, or sign in and choose your e-mails in your profile.',
        ],
      }),
    );

/**
 * The unsubscribe link from e-mails: works without signing in, because the signed token names the person.
 * GET only shows a confirmation button (link scanners in mail clients follow GETs); POST turns the e-mails off,
 * which is also what a mail client's one-click unsubscribe (RFC 8058) sends.
 */
export function unsubscribeRouter(deps: Pick<Deps, 'dataSource' | 'config'>): Router {
  const { dataSource, config } = deps;
  const router = Router();

  const claimOf = async (req: Request): Promise<{ claim: UnsubscribeClaim; token: string } | null> => {
    const parsed = unsubscribeQuery.safeParse(req.query);
    if (!parsed.success) return null;
    const claim = verifyUnsubscribeToken(config.sessionSecret, parsed.data.token);
    if (!claim) return null;
    const user = await findUser(dataSource.manager, claim.userId);
    return user ? { claim, token: parsed.data.token } : null;
  };

  router.get('/unsubscribe', async (req, res) => {
    const found = await claimOf(req);
    if (!found) return refuse(res);
    res.type('html').send(
      unsubscribePage({
        title: 'Stop these e-mails?',
        paragraphs: [
          `You will no longer get ${scopeText(found.claim.scope)}. Notifications still show in the app.`,
        ],
        form: {
          action: `/api/unsubscribe?token=${encodeURIComponent(found.token)}`,
          button: 'Yes, stop them',
        },
      }),
    );
  });

  router.post('/unsubscribe', async (req, res) => {
    const found = await claimOf(req);
    if (!found) return refuse(res);
    const { userId, scope } = found.claim;
    const kinds = await dataSource.transaction((tx) => unsubscribe(tx, userId, scope));
    res.type('html').send(
      unsubscribePage({
        title: 'Done: e-mails stopped',
        paragraphs: [
          `You will no longer get ${scopeText(scope)}${kinds.length === 0 ? ' (there were none to stop)' : ''}.`,
          'You can turn them back on at any time in your profile.',
        ],
      }),
    );
  });

  return router;
}
