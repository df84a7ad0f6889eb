import type { Request } from 'express';
import type { AppConfig } from './config';

/** The base address for links in e-mails: PUBLIC_URL when set, else the address the request came to. */
export function publicBaseUrl(req: Pick<Request, 'protocol' | 'get'>, config: AppConfig): string {
  if (config.publicUrl) return config.publicUrl;
  return `${req.protocol}://${req.get('host') ?? 'localhost'}`;
}
