import type { RequestHandler } from 'express';

/**
 * Lets other sites frame this route (the read-only link viewer) and no other: replaces the
 * policy's frame-ancestors with * and drops X-Frame-Options, which helmet set for every page.
 */
export const embeddable: RequestHandler = (_req, res, next) => {
  const policy = res.getHeader('Content-Security-Policy');
  if (typeof policy === 'string') res.setHeader('Content-Security-Policy', policy.replace(/frame-ancestors [^;]*/, 'frame-ancestors *'));
  res.removeHeader('X-Frame-Options');
  next();
};
