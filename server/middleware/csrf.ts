import { randomBytes } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error';
import { safeEqual } from '../lib/tokens';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Synchronizer token kept in the session (ASVS 3.5.1): GET /api/csrf hands it out, unsafe requests echo it. */
export function csrfTokenFor(req: Request): string {
  req.session.csrfToken ??= randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const sent = req.get('X-CSRF-Token');
  const expected = req.session?.csrfToken;
  if (!sent || !expected || !safeEqual(sent, expected)) {
    return next(
      new AppError({
        code: 'csrf_invalid',
        status: 403,
        message: 'Your page is out of date. Reload it and try again.',
      }),
    );
  }
  next();
};
