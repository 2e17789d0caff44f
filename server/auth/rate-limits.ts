import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
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
  perAccountFromAddress: RequestHandler;
  perAccount: RequestHandler;
  resetRequests: RequestHandler;
  passwordChange: RequestHandler;
  csrfTokens: RequestHandler;
}

function accountKey(req: Request): string {
  return String(req.body?.email ?? '').trim().toLowerCase();
}

/**
 * Failed sign-ins counted per address, per account from one address, and (more loosely) per
 * account from anywhere, so that one stranger cannot lock an administrator out for long and one
 * busy museum network does not lock itself out.
 */
export function signInLimits(config: Config): SignInLimits {
  const windowMs = config.loginWindowMinutes * 60_000;
  return {
    perAddress: rateLimit({
      windowMs,
      limit: config.loginLimitPerAddress,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: limited('failed sign-in attempts from this network address'),
    }),
    perAccountFromAddress: rateLimit({
      windowMs,
      limit: config.loginLimitPerAccount,
      skipSuccessfulRequests: true,
      standardHeaders: false,
      legacyHeaders: false,
      keyGenerator: (req) => `account:${accountKey(req)}:${ipKeyGenerator(req.ip ?? '')}`,
      handler: limited('failed sign-in attempts for this account'),
    }),
    perAccount: rateLimit({
      windowMs,
      limit: config.loginLimitPerAccount * 4,
      skipSuccessfulRequests: true,
      standardHeaders: false,
      legacyHeaders: false,
      keyGenerator: (req) => `account:${accountKey(req)}`,
      handler: limited('failed sign-in attempts for this account'),
    }),
    passwordChange: rateLimit({
      windowMs,
      limit: config.loginLimitPerAccount,
      skipSuccessfulRequests: true,
      standardHeaders: false,
      legacyHeaders: false,
      keyGenerator: (req) => `password-change:${req.user?.id ?? 'none'}`,
      handler: limited('wrong current passwords'),
    }),
    csrfTokens: rateLimit({
      windowMs: 60_000,
      limit: config.csrfLimitPerMinute,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: limited('security token requests from this network address'),
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
