import { createHmac } from 'node:crypto';
import { UNSUBSCRIBE_SCOPES, type UnsubscribeScope } from '@shared/constants/notifications';
import { safeEqual } from '../../lib/tokens';

export interface UnsubscribeClaim {
  userId: string;
  scope: UnsubscribeScope;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// A key of its own, derived from the session secret, so a signature made here is worthless anywhere else.
const keyFrom = (secret: string) =>
  createHmac('sha256', secret).update('shoalwise:unsubscribe-link:v1').digest();

const sign = (secret: string, payload: string) =>
  createHmac('sha256', keyFrom(secret)).update(payload).digest('base64url');

/**
 * `<base64url(userId:scope)>.<HMAC-SHA256>`. No expiry: an unsubscribe link in an old e-mail must keep working,
 * and all it can ever do is turn e-mail off for the person it was sent to.
 */
export function signUnsubscribeToken(secret: string, claim: UnsubscribeClaim): string {
  const payload = Buffer.from(`${claim.userId}:${claim.scope}`, 'utf8').toString('base64url');
  return `${payload}.${sign(secret, payload)}`;
}

/** The claim of a genuine token, or null for anything tampered, truncated or made up. */
export function verifyUnsubscribeToken(secret: string, token: string): UnsubscribeClaim | null {
  const [payload, signature, extra] = token.split('.');
  if (!payload || !signature || extra !== undefined) return null;
  if (!safeEqual(signature, sign(secret, payload))) return null;
  const [userId, scope] = Buffer.from(payload, 'base64url').toString('utf8').split(':');
  if (!userId || !UUID.test(userId)) return null;
  if (!(UNSUBSCRIBE_SCOPES as readonly string[]).includes(scope ?? '')) return null;
  return { userId, scope: scope as UnsubscribeScope };
}

export function unsubscribeUrl(baseUrl: string, secret: string, claim: UnsubscribeClaim): string {
  return `${baseUrl}/api/unsubscribe?token=${encodeURIComponent(signUnsubscribeToken(secret, claim))}`;
}
