import { Router, type RequestHandler } from 'express';
import { ipKeyGenerator, MemoryStore, rateLimit } from 'express-rate-limit';
import type { HotReads, LinkLimit } from '../../hotReads';
import { DEFAULT_LINK_REQUESTS_PER_MINUTE, type AppConfig } from '../../config';
import { AppError } from '../../middleware/appError';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { publicBaseUrl } from '../../publicUrl';
import { sendRevisionJson } from '../designs/revisionJson';
import type { DesignsService } from '../designs/service';
import type { Mailer } from '../mail/mailService';
import { readOnlyLinkMail } from '../mail/messages';
import { createLinkBodySchema, linkIdParamsSchema, listLinksQuerySchema, tokenParamsSchema } from './schemas';
import { linkNotFound, type LinksService } from './service';

/** Roles that may make read-only links. */
export const LINK_MAKERS = ['owner', 'designer', 'instructor'] as const;

/** /api/links — make, list and withdraw read-only links (owner, designer, instructor). */
export function linksRouter(deps: { links: LinksService; designs: DesignsService; mailer: Mailer; config: AppConfig }): Router {
  const { links, designs, mailer, config } = deps;
  const router = Router();
  router.use(requireRole(...LINK_MAKERS));

  router.get('/', validate({ query: listLinksQuerySchema }), async (req, res) => {
    const { designId } = req.query;
    res.json({ links: await links.list(req.user!, { designId }) });
  });

  /** The designs a link can point at (instructors have no designs list of their own). */
  router.get('/designs', async (_req, res) => {
    const list = await designs.list();
    res.json({ designs: list.map(({ id, name, systemId, latestRevision, thumbnailUrl }) => ({ id, name, systemId, latestRevision, thumbnailUrl })) });
  });

  router.post('/', validate({ body: createLinkBodySchema }), async (req, res) => {
    const body = req.body;
    const created = await links.create(req.user!, body);
    const url = `${publicBaseUrl(req, config)}${created.path}`;
    if (body.email) {
      await mailer.send(readOnlyLinkMail({ to: body.email, designName: created.link.designName, senderName: req.user!.displayName, linkUrl: url, expiresAt: created.link.expiresAt }));
    }
    res.status(201).json({ link: created.link, token: created.token, url });
  });

  router.delete('/:id', validate({ params: linkIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    res.json({ link: await links.revoke(req.user!, id) });
  });

  return router;
}

export interface LinkRateLimit {
  max: number;
  windowMs: number;
}

export const DEFAULT_LINK_RATE_LIMIT: LinkRateLimit = { max: DEFAULT_LINK_REQUESTS_PER_MINUTE, windowMs: 60_000 };

/** The link routes' limit and its counter store, shared by the middleware and the hot reads. */
export function linkLimitOf(limits: LinkRateLimit): LinkLimit {
  return { store: new MemoryStore(), limit: limits.max, windowMs: limits.windowMs, name: 'shared-link-reads' };
}

function linkRateLimiter(limits: LinkLimit): RequestHandler {
  return rateLimit({
    windowMs: limits.windowMs,
    limit: limits.limit,
    store: limits.store,
    identifier: limits.name,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? 'unknown'),
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: 'Too many requests for shared links from this address. Wait a minute and try again.' } });
    },
  });
}

/**
 * /api/shared/:token — what a read-only link shows, without signing in. Mounted before sessions:
 * a link never carries or creates a session. Only GET exists; every other method is refused.
 */
export function sharedRouter(deps: { links: LinksService; limit?: LinkLimit; hotReads?: Pick<HotReads, 'rememberLink'> }): Router {
  const router = Router();
  router.use(linkRateLimiter(deps.limit ?? linkLimitOf(DEFAULT_LINK_RATE_LIMIT)));
  router.use((req, res, next) => {
    res.setHeader('X-Robots-Tag', 'noindex, nofollow');
    if (req.method !== 'GET' && req.method !== 'HEAD') {
      throw new AppError(403, 'read_only_link', 'A shared link is read-only: nothing can be changed through it.');
    }
    next();
  });

  router.get('/:token', validate({ params: tokenParamsSchema }), async (req, res) => {
    const { token } = req.params;
    if (!/^[A-Za-z0-9_-]{43}$/.test(token)) {
      // Malformed tokens take the same path as unknown ones, so the answer time says nothing.
      await deps.links.open('0'.repeat(43)).catch(() => undefined);
      throw linkNotFound();
    }
    const { link, design, revision, opened } = await deps.links.open(token);
    // A visitor sees the revision's number and date, not who saved it.
    const meta = { ...revision.meta, createdBy: { id: 0, displayName: '' }, thumbnailUrl: null };
    const text = sendRevisionJson(res, { link, design }, meta, revision.documentJson);
    if (req.method === 'GET') deps.hotReads?.rememberLink(req, token, text, opened);
  });

  router.use(() => {
    throw linkNotFound();
  });
  return router;
}
