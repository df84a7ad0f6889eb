import helmet from 'helmet';
import type { RequestHandler } from 'express';

/**
 * helmet everywhere; the Content Security Policy only in production, where the built client is
 * served (Vite's dev server injects inline scripts). It allows what the 3D viewer needs: workers
 * and images from blob:, data: URLs for textures and exports, inline styles set by R3F.
 */
export function securityHeaders(options: { production: boolean; behindTls: boolean }): RequestHandler {
  return fixedHeaders(helmetFor(options));
}

/**
 * helmet's headers are the same for every request with these options, but its chain of a dozen
 * middlewares ran per request (~3 % of the server's CPU under load): run it once against a
 * recording response and set the recorded headers on each request instead.
 */
function fixedHeaders(middleware: RequestHandler): RequestHandler {
  const headers = new Map<string, string | number | readonly string[]>();
  const removed = new Set<string>();
  const recorder = {
    setHeader(name: string, value: string | number | readonly string[]) {
      headers.set(name, value);
      removed.delete(name);
      return recorder;
    },
    removeHeader(name: string) {
      headers.delete(name);
      removed.add(name);
    },
    getHeader: (name: string) => headers.get(name),
  };
  let finished = false;
  middleware({ headers: {}, method: 'GET', url: '/' } as never, recorder as never, (error?: unknown) => {
    if (error) throw error;
    finished = true;
  });
  // helmet is synchronous; if a later version is not, fall back to running it per request.
  if (!finished) return middleware;
  const entries = [...headers];
  const removals = [...removed];
  return (_req, res, next) => {
    for (const [name, value] of entries) res.setHeader(name, value);
    for (const name of removals) res.removeHeader(name);
    next();
  };
}

/** helmet itself, run per request (the tests compare its headers with the fixed ones). */
export function helmetFor(options: { production: boolean; behindTls: boolean }): RequestHandler {
  return helmet({
    contentSecurityPolicy: options.production
      ? {
          useDefaults: false,
          directives: {
            defaultSrc: ["'self'"],
            scriptSrc: ["'self'"],
            styleSrc: ["'self'", "'unsafe-inline'"],
            imgSrc: ["'self'", 'data:', 'blob:'],
            fontSrc: ["'self'", 'data:'],
            connectSrc: ["'self'", 'blob:', 'data:'],
            workerSrc: ["'self'", 'blob:'],
            objectSrc: ["'none'"],
            baseUri: ["'self'"],
            formAction: ["'self'"],
            frameAncestors: ["'self'"],
            ...(options.behindTls ? { upgradeInsecureRequests: [] } : {}),
          },
        }
      : false,
    // HSTS only makes sense when the site is actually reached over TLS.
    strictTransportSecurity: options.behindTls,
  });
}
