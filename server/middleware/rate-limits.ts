import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
import { errors } from '../lib/app-error';

const FIFTEEN_MINUTES = 15 * 60_000;

function limiter(options: Partial<Options> & Pick<Options, 'limit' | 'windowMs' | 'keyGenerator'>): RequestHandler {
  return rateLimit({
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    ...options,
    handler: (req, _res, next, used) => {
      const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = reset ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 1000)) : used.windowMs / 1000;
      req.log?.warn({ limiter: used.identifier }, 'rate limit reached');
      next(errors.tooMany(seconds));
    },
  });
}

/** The socket address only: `trust proxy` is off, so a forged X-Forwarded-For changes nothing. */
const byAddress = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');
const byAccount = (req: Request) => String((req.body as { email?: unknown })?.email ?? '').trim().toLowerCase();

/**
 * Sign-in throttling (ASVS 6.3.x). Only failures count. Three layers so that one address cannot hammer one account,
 * one address cannot spray many accounts, and many addresses cannot brute-force one account; the per-account layer
 * is generous so a victim is slowed, not locked out for long.
 */
export function signInLimiters(): RequestHandler[] {
  return [
    limiter({ identifier: 'sign-in:account+address', windowMs: FIFTEEN_MINUTES, limit: 10, skipSuccessfulRequests: true, keyGenerator: (r) => `${byAccount(r)}|${byAddress(r)}` }),
    limiter({ identifier: 'sign-in:address', windowMs: FIFTEEN_MINUTES, limit: 50, skipSuccessfulRequests: true, keyGenerator: byAddress }),
    limiter({ identifier: 'sign-in:account', windowMs: 60 * 60_000, limit: 100, skipSuccessfulRequests: true, keyGenerator: byAccount }),
  ];
}

/** Invite acceptance and reset requests: per address, every attempt counts. */
export function tokenLimiter(identifier: string, limit = 20): RequestHandler {
  return limiter({ identifier, windowMs: FIFTEEN_MINUTES, limit, keyGenerator: byAddress });
}

/** Reset e-mails to one address: at most a few per hour, however many addresses ask. */
export function resetRequestLimiters(): RequestHandler[] {
  return [
    tokenLimiter('reset-request:address', 10),
    limiter({ identifier: 'reset-request:account', windowMs: 60 * 60_000, limit: 5, keyGenerator: byAccount }),
  ];
}
