import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

export interface SignInRateLimit {
  /** Failed sign-ins allowed per address and email within the window (guessing one account's password). */
  signInMax: number;
  /**
   * Failed sign-ins allowed per address over all emails within the window (trying one password on
   * many accounts). Default: twice `signInMax`.
   */
  perAddressMax?: number;
  windowMs: number;
}

export const DEFAULT_SIGN_IN_RATE_LIMIT: SignInRateLimit = { signInMax: 10, perAddressMax: 20, windowMs: 15 * 60 * 1000 };

function limiter(windowMs: number, limit: number, key: (req: Parameters<RequestHandler>[0]) => string, message: string): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: key,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message } });
    },
  });
}

/**
 * Two counters of failed sign-ins (successful ones are not counted): per client address and
 * email, and per client address alone, so spraying one password over many emails is stopped too.
 */
export function signInRateLimiter(limits: SignInRateLimit): RequestHandler {
  const minutes = Math.max(1, Math.round(limits.windowMs / 60000));
  const wait = `Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`;
  const address = (req: Parameters<RequestHandler>[0]) => ipKeyGenerator(req.ip ?? 'unknown');
  const perAddress = limiter(limits.windowMs, limits.perAddressMax ?? limits.signInMax * 2, address, `Too many failed sign-ins from your network. ${wait}`);
  const perAccount = limiter(
    limits.windowMs,
    limits.signInMax,
    (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${address(req)}|${email}`;
    },
    `Too many sign-in attempts. ${wait}`,
  );
  return (req, res, next) => {
    perAddress(req, res, (error?: unknown) => {
      if (error) return next(error);
      perAccount(req, res, next);
    });
  };
}
