import type { Request, RequestHandler } from 'express';
import { rateLimit, type Options } from 'express-rate-limit';
import type { Config } from '../config.js';
import { RateLimitedError } from '../http/errors.js';

function limited(what: string): Options['handler'] {
  return (req, _res, next) => {
    const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
    const seconds = Math.max(1, Math.ceil(((reset?.getTime() ?? Date.now() + 60_000) - Date.now()) / 1000));
    const minutes = Math.ceil(seconds / 60);
    next(new RateLimitedError(`Too many ${what}. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`, seconds));
  };
}

export interface SignInLimits {
  perAddress: RequestHandler;
  perAccount: RequestHandler;
  resetRequests: RequestHandler;
}

/** Sign-in limits per address (every attempt) and per account (failed attempts only). */
export function signInLimits(config: Config): SignInLimits {
  const windowMs = config.loginWindowMinutes * 60_000;
  return {
    perAddress: rateLimit({
      windowMs,
      limit: config.loginLimitPerAddress,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: limited('sign-in attempts from this network address'),
    }),
    perAccount: rateLimit({
      windowMs,
      limit: config.loginLimitPerAccount,
      skipSuccessfulRequests: true,
      standardHeaders: false,
      legacyHeaders: false,
      keyGenerator: (req) => `account:${String(req.body?.email ?? '').trim().toLowerCase()}`,
      handler: limited('failed sign-in attempts for this account'),
    }),
    resetRequests: rateLimit({
      windowMs,
      limit: config.loginLimitPerAddress,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: limited('password reset requests from this network address'),
    }),
  };
}
