import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

export interface SignInRateLimit {
  /** Failed sign-ins allowed per address and email within the window. */
  signInMax: number;
  windowMs: number;
}

export const DEFAULT_SIGN_IN_RATE_LIMIT: SignInRateLimit = { signInMax: 10, windowMs: 15 * 60 * 1000 };

/** Counts failed sign-ins per client address and email; successful ones are not counted. */
export function signInRateLimiter(limits: SignInRateLimit): RequestHandler {
  const minutes = Math.max(1, Math.round(limits.windowMs / 60000));
  return rateLimit({
    windowMs: limits.windowMs,
    limit: limits.signInMax,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
    },
    handler: (_req, res) => {
      res.status(429).json({
        error: {
          code: 'rate_limited',
          message: `Too many sign-in attempts. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`,
        },
      });
    },
  });
}
