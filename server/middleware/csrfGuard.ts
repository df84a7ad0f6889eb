import type { RequestHandler } from 'express';
import { AppError } from './appError';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request defence for state-changing /api calls, alongside SameSite=Lax cookies:
 * a custom header a cross-site form cannot send, and an Origin (when the browser sends one) that
 * names this server.
 */
export const csrfGuard: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  if (req.get('x-slotwise-client') !== '1') {
    throw new AppError(403, 'csrf', 'This request was refused because it did not come from the Slotwise app. Reload the page and try again.');
  }
  const origin = req.get('origin');
  if (origin !== undefined && !originMatchesHost(origin, req.host)) {
    throw new AppError(403, 'csrf', 'This request came from another site and was refused.');
  }
  next();
};

function originMatchesHost(origin: string, host: string | undefined): boolean {
  if (!host) return false;
  try {
    return new URL(origin).host === host.toLowerCase();
  } catch {
    return false; // "null" or garbage
  }
}
