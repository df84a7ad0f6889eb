import helmet from 'helmet';
import type { ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';

/**
 * helmet everywhere; the Content Security Policy only in production, where the built client is
 * served (Vite's dev server injects inline scripts). It allows what the 3D viewer needs: workers
 * and images from blob:, data: URLs for textures and exports, inline styles set by R3F.
 */
export function securityHeaders(
  options: { production: boolean; behindTls: boolean },
  /** Headers already recorded for these options (the app shares them with the hot reads). */
  fixed: FixedHeaders | null = recordSecurityHeaders(options),
): RequestHandler {
  return fixed ? setFixedHeaders(fixed) : helmetFor(options);
}

/** Headers to set and to remove on every answer. */
export interface FixedHeaders {
  entries: [string, string | number | readonly string[]][];
  removals: string[];
}

/**
 * helmet's headers are the same for every request with these options, but its chain of a dozen
 * middlewares ran per request (~3 % of the server's CPU under load): run it once against a
 * recording response and set the recorded headers on each request instead. Null if helmet did
 * not finish synchronously (a later version might not), and then it runs per request.
 */
export function recordSecurityHeaders(options: { production: boolean; behindTls: boolean }): FixedHeaders | null {
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
  helmetFor(options)({ headers: {}, method: 'GET', url: '/' } as never, recorder as never, (error?: unknown) => {
    if (error) throw error;
    finished = true;
  });
  return finished ? { entries: [...headers], removals: [...removed] } : null;
}

/** Sets recorded headers on a response (an Express one or a plain Node one). */
export function applyFixedHeaders(res: Pick<ServerResponse, 'setHeader' | 'removeHeader'>, fixed: FixedHeaders): void {
  for (const [name, value] of fixed.entries) res.setHeader(name, value);
  for (const name of fixed.removals) res.removeHeader(name);
}

function setFixedHeaders(fixed: FixedHeaders): RequestHandler {
  return (_req, res, next) => {
    applyFixedHeaders(res, fixed);
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
