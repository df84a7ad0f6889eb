import { createHash } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { gzip, gzipSync } from 'node:zlib';
import accepts from 'accepts';
import type { NextFunction, Request, Response } from 'express';
import { ipKeyGenerator, type MemoryStore } from 'express-rate-limit';
import proxyaddr from 'proxy-addr';
import type { Database } from './db/database';
import type { Role } from './db/models/user';
import type { Logger } from './logger';
import { applyFixedHeaders, type FixedHeaders } from './middleware/securityHeaders';
import { hashToken } from './modules/links/tokens';

/**
 * Hot reads: the two answers asked for most under load, the designs list and a read-only link's
 * design, repeated from memory ahead of Express's router.
 *
 * Express always answers first. Its route handlers hand the text they sent to `remember…`, and
 * its session check records which Cookie header belongs to which signed-in role. A later request
 * with the same Cookie header (or the same link token) gets the same text from here, after the
 * same role check, the link's expiry and the link rate limit, with the headers Express would set.
 * Anything else, and any miss, goes to Express as before.
 *
 * Everything kept is tagged with the database's change count taken when Express began the
 * request, and dropped as soon as any write finishes (a save, a sign-out, a revocation, an
 * approval, a link's open counter). It also ages out after MAX_AGE_MS, in case another process
 * wrote to the same file. This holds for one server process per database, as SQLite has it.
 */

const MAX_AGE_MS = 10_000;
/** The compression middleware's threshold: smaller answers go out as they are. */
const GZIP_MIN_BYTES = 1024;
/** Kept answers up to this size are gzipped on the spot (~0.3 ms for 64 KB at level 1). */
const GZIP_AT_ONCE_BYTES = 64 * 1024;
const MAX_SIGNED_IN = 10_000;
const MAX_LINK_BYTES = 32 * 1024 * 1024;
const LIST_PATH = '/api/designs';
const LINK_PATH = /^\/api\/shared\/([A-Za-z0-9_-]{43})$/;

interface Kept {
  keptAt: number;
}

interface Answer extends Kept {
  text: Buffer;
  /** Compressed on first demand, off the request thread. */
  gzipped?: Buffer;
  gzipping?: boolean;
}

interface LinkAnswer extends Answer {
  linkId: number;
  /** When the link (or its class) expires, in ms since the epoch. */
  activeUntil: number | null;
}

interface SignedIn extends Kept {
  role: Role;
  expiresAt: number;
}

/** The link routes' rate limit, shared with express-rate-limit's middleware through its store. */
export interface LinkLimit {
  store: MemoryStore;
  limit: number;
  windowMs: number;
  /** The policy's name in the RateLimit headers (express-rate-limit's `identifier`). */
  name: string;
}

export interface HotReadsOptions {
  db: Database;
  securityHeaders: FixedHeaders | null;
  /** Which designs-list readers are allowed (the list route's roles). */
  listRoles: readonly Role[];
  linkLimit: LinkLimit;
  /** Counts an open of a link served from here, as the link route does. */
  countLinkOpen(linkId: number): void;
  /** Express's compiled `trust proxy` setting, to find the client's address as req.ip does. */
  trustProxy: (address: string, hop: number) => boolean;
  /** One line per answered request when request logging is on. */
  requestLog?: Logger;
}

export type HotReads = ReturnType<typeof createHotReads>;

export function createHotReads(options: HotReadsOptions) {
  const { db } = options;
  const startedAt = new WeakMap<IncomingMessage, number>();
  const signedIn = new Map<string, SignedIn>();
  const links = new Map<string, LinkAnswer>();
  let linkBytes = 0;
  let list: Answer | undefined;
  let generation = db.changeCount();
  const hits = { list: 0, link: 0 };

  /** Drops everything once a write has finished since it was kept. */
  function current(): void {
    const now = db.changeCount();
    if (now === generation) return;
    generation = now;
    signedIn.clear();
    links.clear();
    linkBytes = 0;
    list = undefined;
  }

  const fresh = <T extends Kept>(kept: T | undefined, now: number): T | undefined => (kept && now - kept.keptAt < MAX_AGE_MS ? kept : undefined);

  /** The change count at the start of the request, if nothing has been written since. */
  function unchangedSince(req: Request): boolean {
    current();
    return startedAt.get(req) === generation;
  }

  /**
   * Compresses a kept answer at the API's compression level: at once when it is small (well under
   * a millisecond), so the requests right behind it need not wait; larger ones off the request thread.
   */
  function compress(answer: Answer): void {
    if (answer.text.length < GZIP_MIN_BYTES || answer.gzipping) return;
    answer.gzipping = true;
    if (answer.text.length <= GZIP_AT_ONCE_BYTES) {
      answer.gzipped = gzipSync(answer.text, { level: 1 });
      return;
    }
    gzip(answer.text, { level: 1 }, (error, gzipped) => {
      if (!error) answer.gzipped = gzipped;
    });
  }

  /** The body to send and whether it is gzipped, or null to let Express answer (gzip not ready yet). */
  function bodyFor(req: IncomingMessage, answer: Answer): { body: Buffer; gzipped: boolean } | null {
    if (answer.text.length < GZIP_MIN_BYTES) return { body: answer.text, gzipped: false };
    const encoding = accepts(req).encoding(['gzip', 'deflate', 'identity']);
    if (encoding === 'identity') return { body: answer.text, gzipped: false };
    if (encoding !== 'gzip') return null;
    if (answer.gzipped) return { body: answer.gzipped, gzipped: true };
    compress(answer);
    return null;
  }

  function send(req: IncomingMessage, res: ServerResponse, answer: Answer, extraHeaders: Record<string, string>, began: number): boolean {
    const chosen = bodyFor(req, answer);
    if (!chosen) return false;
    if (options.securityHeaders) applyFixedHeaders(res, options.securityHeaders);
    res.setHeader('Cache-Control', 'no-store');
    for (const [name, value] of Object.entries(extraHeaders)) res.setHeader(name, value);
    res.setHeader('Content-Type', 'application/json; charset=utf-8');
    res.setHeader('Vary', 'Accept-Encoding');
    if (chosen.gzipped) res.setHeader('Content-Encoding', 'gzip');
    res.setHeader('Content-Length', chosen.body.length);
    res.statusCode = 200;
    res.end(chosen.body);
    if (options.requestLog) {
      const ms = Math.round((performance.now() - began) * 10) / 10;
      options.requestLog.info('Request', { method: req.method, url: req.url, status: 200, ms });
    }
    return true;
  }

  function listAnswer(req: IncomingMessage, res: ServerResponse, now: number, began: number): boolean {
    const cookie = req.headers.cookie;
    const answer = fresh(list, now);
    if (!cookie || !answer) return false;
    const who = fresh(signedIn.get(cookie), now);
    if (!who || who.expiresAt <= now || !options.listRoles.includes(who.role)) return false;
    if (!send(req, res, answer, {}, began)) return false;
    hits.list++;
    return true;
  }

  /** Answers a kept link read, or calls `fallback` (also when the address is over its limit). */
  function linkAnswer(req: IncomingMessage, res: ServerResponse, token: string, now: number, began: number, fallback: () => void): boolean {
    const answer = fresh(links.get(hashToken(token)), now);
    if (!answer || (answer.activeUntil !== null && answer.activeUntil <= now)) return false;
    const { store, limit } = options.linkLimit;
    const key = ipKeyGenerator(proxyaddr(req, options.trustProxy));
    void (async () => {
      const { totalHits, resetTime } = await store.increment(key);
      // Over the limit, or the gzip is not ready: undo the count and let Express count and answer.
      const headers = totalHits <= limit ? rateLimitHeaders(key, totalHits, resetTime, options.linkLimit) : null;
      if (!headers || !send(req, res, answer, { 'X-Robots-Tag': 'noindex, nofollow', ...headers }, began)) {
        await store.decrement(key);
        fallback();
        return;
      }
      options.countLinkOpen(answer.linkId);
      hits.link++;
    })().catch(fallback);
    return true;
  }

  return {
    /** Answers from memory when it can; otherwise marks the request's start and calls `fallback` (Express). */
    serve(req: IncomingMessage, res: ServerResponse, fallback: () => void): void {
      const handOn = () => {
        current();
        startedAt.set(req, generation);
        fallback();
      };
      if (req.method !== 'GET' || req.url === undefined) return handOn();
      const began = performance.now();
      current();
      const now = Date.now();
      if (req.url === LIST_PATH) {
        if (!listAnswer(req, res, now, began)) handOn();
        return;
      }
      const link = LINK_PATH.exec(req.url);
      if (link && linkAnswer(req, res, link[1], now, began, handOn)) return;
      handOn();
    },

    /** Middleware after passport's session: records which Cookie header is which signed-in role. */
    rememberSignedIn(req: Request, _res: Response, next: NextFunction): void {
      const cookie = req.headers.cookie;
      const expires = req.session?.cookie?.expires;
      if (req.method === 'GET' && req.user && cookie && expires && unchangedSince(req)) {
        if (signedIn.size >= MAX_SIGNED_IN) signedIn.clear();
        signedIn.set(cookie, { role: req.user.role, expiresAt: new Date(expires).getTime(), keptAt: Date.now() });
      }
      next();
    },

    /** The designs list's JSON text, as the list route sent it. */
    rememberDesignsList(req: Request, text: string): void {
      if (!unchangedSince(req)) return;
      list = { text: Buffer.from(text), keptAt: Date.now() };
      compress(list);
    },

    /** A link read's JSON text, as the link route sent it. */
    rememberLink(req: Request, token: string, text: string, link: { id: number; activeUntil: number | null }): void {
      if (!unchangedSince(req)) return;
      const answer: LinkAnswer = { text: Buffer.from(text), keptAt: Date.now(), linkId: link.id, activeUntil: link.activeUntil };
      if (answer.text.length > MAX_LINK_BYTES / 4) return;
      const hash = hashToken(token);
      const previous = links.get(hash);
      if (previous) linkBytes -= previous.text.length;
      links.set(hash, answer);
      linkBytes += answer.text.length;
      compress(answer);
      for (const [oldHash, old] of links) {
        if (linkBytes <= MAX_LINK_BYTES) break;
        links.delete(oldHash);
        linkBytes -= old.text.length;
      }
    },

    /** How many answers came from memory (tests read these). */
    hits: () => ({ ...hits }),
  };
}

/** The draft-8 RateLimit headers express-rate-limit sets (same text, so both paths agree). */
function rateLimitHeaders(key: string, totalHits: number, resetTime: Date | undefined, limit: LinkLimit): Record<string, string> {
  const windowSeconds = Math.ceil(limit.windowMs / 1000);
  const resetSeconds = resetTime ? Math.max(0, Math.ceil((resetTime.getTime() - Date.now()) / 1000)) : windowSeconds;
  const partitionKey = Buffer.from(createHash('sha256').update(key).digest('hex').slice(0, 12)).toString('base64');
  return {
    RateLimit: `"${limit.name}"; r=${Math.max(limit.limit - totalHits, 0)}; t=${resetSeconds}`,
    'RateLimit-Policy': `"${limit.name}"; q=${limit.limit}; w=${windowSeconds}; pk=:${partitionKey}:`,
  };
}
