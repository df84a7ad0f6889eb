import helmet from 'helmet';
import type { RequestHandler } from 'express';

/**
 * helmet everywhere; the Content Security Policy only in production, where the built client is
 * served (Vite's dev server injects inline scripts). It allows what the 3D viewer needs: workers
 * and images from blob:, data: URLs for textures and exports, inline styles set by R3F.
 */
export function securityHeaders(options: { production: boolean; behindTls: boolean }): RequestHandler {
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
