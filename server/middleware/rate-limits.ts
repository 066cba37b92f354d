import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type Options, type Store } from 'express-rate-limit';
import { errors } from '../lib/app-error';

/** A fresh store for one limiter (express-rate-limit refuses one store shared by two limiters). */
export type RateLimitStoreFor = (identifier: string) => Store;

const FIFTEEN_MINUTES = 15 * 60_000;

type LimiterOptions = Partial<Options> & Pick<Options, 'limit' | 'windowMs' | 'keyGenerator' | 'identifier'>;

function limiter(storeFor: RateLimitStoreFor, options: LimiterOptions): RequestHandler {
  return rateLimit({
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    store: storeFor(String(options.identifier)),
    ...options,
    handler: (req, _res, next, used) => {
      const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = reset
        ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 1000))
        : used.windowMs / 1000;
      req.log?.warn({ limiter: used.identifier }, 'rate limit reached');
      next(errors.tooMany(seconds));
    },
  });
}

/**
 * The client's address as Express works it out: the socket's, or behind TRUST_PROXY the nearest address no trusted
 * proxy added, so a forged X-Forwarded-For changes nothing either way.
 */
const byAddress = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');
/** The e-mail as sent, when it is text: the limiter runs before validation, and String() of a hostile object throws. */
const byAccount = (req: Request) => {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
};

export interface RateLimits {
  /**
   * Sign-in throttling (ASVS 6.3.x). Only failures count. Three layers so that one address cannot hammer one account,
   * one address cannot spray many accounts, and many addresses cannot brute-force one account; the per-account layer
   * is generous so a victim is slowed, not locked out for long.
   */
  signIn(): RequestHandler[];
  /** Invite acceptance and reset confirmations: per address, every attempt counts. */
  token(identifier: string, limit?: number): RequestHandler;
  /** Reset e-mails to one address: at most a few per hour, however many addresses ask. */
  resetRequest(): RequestHandler[];
}

/** The app's limiters, counting in the stores `storeFor` makes (PostgreSQL in the app, shared by every instance). */
export function createRateLimits(storeFor: RateLimitStoreFor): RateLimits {
  const token = (identifier: string, limit = 20) =>
    limiter(storeFor, { identifier, windowMs: FIFTEEN_MINUTES, limit, keyGenerator: byAddress });
  return {
    signIn: () => [
      limiter(storeFor, {
        identifier: 'sign-in:account+address',
        windowMs: FIFTEEN_MINUTES,
        limit: 10,
        skipSuccessfulRequests: true,
        keyGenerator: (r) => `${byAccount(r)}|${byAddress(r)}`,
      }),
      limiter(storeFor, {
        identifier: 'sign-in:address',
        windowMs: FIFTEEN_MINUTES,
        limit: 50,
        skipSuccessfulRequests: true,
        keyGenerator: byAddress,
      }),
      limiter(storeFor, {
        identifier: 'sign-in:account',
        windowMs: 60 * 60_000,
        limit: 100,
        skipSuccessfulRequests: true,
        keyGenerator: byAccount,
      }),
    ],
    token,
    resetRequest: () => [
      token('reset-request:address', 10),
      limiter(storeFor, {
        identifier: 'reset-request:account',
        windowMs: 60 * 60_000,
        limit: 5,
        keyGenerator: byAccount,
      }),
    ],
  };
}
