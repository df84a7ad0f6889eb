import { createHash } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { brotliCompress, brotliCompressSync, constants as zlibConstants, gzip, gzipSync } from 'node:zlib';
import accepts from 'accepts';
import Negotiator from 'negotiator';
import type { NextFunction, Request, Response } from 'express';
import { ipKeyGenerator, type MemoryStore } from 'express-rate-limit';
import proxyaddr from 'proxy-addr';
import type { Database } from './db/database';
import type { Role } from './db/models/user';
import type { Logger } from './logger';
import { applyFixedHeaders, type FixedHeaders } from './middleware/securityHeaders';
import { hashToken } from './modules/links/tokens';

/**
 * Hot reads: the answers asked for most, the designs list, a design's latest revision (every
 * editor and viewer opens it) and a read-only link's design, repeated from memory ahead of
 * Express's router.
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
const COMPRESS_MIN_BYTES = 1024;
/** Kept answers up to this size are compressed on the spot (~0.3 ms for 64 KB). */
const COMPRESS_AT_ONCE_BYTES = 64 * 1024;
/** The compression middleware's settings for API answers (server/app.ts) and its brotli default. */
const GZIP_OPTIONS = { level: 1 };
const BROTLI_OPTIONS = { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4 } };
/** The compression middleware's negotiation (compression/index.js): brotli first, then gzip. */
const SUPPORTED_ENCODINGS = ['br', 'gzip', 'deflate', 'identity'];
const PREFERRED_ENCODINGS = ['br', 'gzip'];

/** The encoding the compression middleware picks for the designs list. */
function listEncoding(req: IncomingMessage): string | undefined {
  if (!req.headers['accept-encoding']) return 'identity';
  return new Negotiator(req).encoding(SUPPORTED_ENCODINGS, PREFERRED_ENCODINGS);
}

/** The encoding a revision answer takes (sendRevisionJson): gzip if accepted, else the text. */
function revisionEncoding(req: IncomingMessage): string {
  return accepts(req).encodings('gzip', 'identity') === 'gzip' ? 'gzip' : 'identity';
}
const MAX_SIGNED_IN = 10_000;
/** Kept design and link reads, each kind at most this much text (oldest out first). */
const MAX_KEPT_BYTES = 32 * 1024 * 1024;
const LIST_PATH = '/api/designs';
const DESIGN_PATH = /^\/api\/designs\/([1-9][0-9]{0,15})$/;
const LINK_PATH = /^\/api\/shared\/([A-Za-z0-9_-]{43})$/;

interface Kept {
  keptAt: number;
}

type Encoding = 'gzip' | 'br';

interface Answer extends Kept {
  text: Buffer;
  /** Compressed copies, made on first demand (see compress). */
  encoded: Partial<Record<Encoding, Buffer>>;
  encoding: Partial<Record<Encoding, boolean>>;
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

/** Answers by key, bounded by their total text (the oldest kept goes first). */
function keptAnswers<K, T extends Answer>() {
  const map = new Map<K, T>();
  let bytes = 0;
  return {
    get: (key: K) => map.get(key),
    set(key: K, answer: T): void {
      const previous = map.get(key);
      if (previous) {
        bytes -= previous.text.length;
        map.delete(key);
      }
      map.set(key, answer);
      bytes += answer.text.length;
      for (const [oldKey, old] of map) {
        if (bytes <= MAX_KEPT_BYTES) break;
        map.delete(oldKey);
        bytes -= old.text.length;
      }
    },
    clear(): void {
      map.clear();
      bytes = 0;
    },
  };
}

export function createHotReads(options: HotReadsOptions) {
  const { db } = options;
  const startedAt = new WeakMap<IncomingMessage, number>();
  const signedIn = new Map<string, SignedIn>();
  const links = keptAnswers<string, LinkAnswer>();
  const designs = keptAnswers<number, Answer>();
  let list: Answer | undefined;
  let generation = db.changeCount();
  const hits = { list: 0, design: 0, link: 0 };

  /** Drops everything once a write has finished since it was kept. */
  function current(): void {
    const now = db.changeCount();
    if (now === generation) return;
    generation = now;
    signedIn.clear();
    links.clear();
    designs.clear();
    list = undefined;
  }

  /**
   * The answer to keep for `text`: the one already kept if it holds the same text (its compressed
   * copies stay), else a new one, compressed now in the encodings Express's path uses.
   */
  function keep(kept: Answer | undefined, text: string, encodings: Encoding[] = ['br', 'gzip']): Answer {
    if (kept && kept.text.toString('utf8') === text) return { ...kept, keptAt: Date.now() };
    const answer: Answer = { text: Buffer.from(text), keptAt: Date.now(), encoded: {}, encoding: {} };
    if (answer.text.length >= COMPRESS_MIN_BYTES) for (const encoding of encodings) compress(answer, encoding);
    return answer;
  }

  const fresh = <T extends Kept>(kept: T | undefined, now: number): T | undefined => (kept && now - kept.keptAt < MAX_AGE_MS ? kept : undefined);

  /** The change count at the start of the request, if nothing has been written since. */
  function unchangedSince(req: IncomingMessage): boolean {
    current();
    return startedAt.get(req) === generation;
  }

  /**
   * Compresses a kept answer as the API's compression middleware would (gzip level 1, brotli
   * quality 4): at once when it is small (well under a millisecond), so the requests right behind
   * it need not wait; larger ones off the request thread, and Express answers meanwhile.
   */
  function compress(answer: Answer, encoding: Encoding): void {
    if (answer.encoding[encoding]) return;
    answer.encoding[encoding] = true;
    const done = (error: Error | null, bytes: Buffer) => {
      if (!error) answer.encoded[encoding] = bytes;
    };
    if (encoding === 'gzip') {
      if (answer.text.length <= COMPRESS_AT_ONCE_BYTES) done(null, gzipSync(answer.text, GZIP_OPTIONS));
      else gzip(answer.text, GZIP_OPTIONS, done);
    } else if (answer.text.length <= COMPRESS_AT_ONCE_BYTES) done(null, brotliCompressSync(answer.text, BROTLI_OPTIONS));
    else brotliCompress(answer.text, BROTLI_OPTIONS, done);
  }

  /**
   * The body to send and its encoding, or null to let Express answer (an encoding not kept, or
   * not ready yet). `chosen` is the encoding Express's path would pick for this request.
   */
  function bodyFor(answer: Answer, chosen: string | undefined): { body: Buffer; encoding: Encoding | null } | null {
    if (answer.text.length < COMPRESS_MIN_BYTES || chosen === 'identity') return { body: answer.text, encoding: null };
    if (chosen !== 'gzip' && chosen !== 'br') return null;
    const body = answer.encoded[chosen];
    if (body) return { body, encoding: chosen };
    compress(answer, chosen);
    return null;
  }

  function send(req: IncomingMessage, res: ServerResponse, answer: Answer, encoding: string | undefined, extraHeaders: Record<string, string>, began: number): boolean {
    const chosen = bodyFor(answer, encoding);
    if (!chosen) return false;
    if (options.securityHeaders) applyFixedHeaders(res, options.securityHeaders);
    res.setHeader('Cache-Control', 'no-store');
    for (const [name, value] of Object.entries(extraHeaders)) res.setHeader(name, value);
    res.setHeader('Content-Type', 'application/json; charset=utf-8');
    res.setHeader('Vary', 'Accept-Encoding');
    if (chosen.encoding) res.setHeader('Content-Encoding', chosen.encoding);
    res.setHeader('Content-Length', chosen.body.length);
    res.statusCode = 200;
    res.end(chosen.body);
    if (options.requestLog) {
      const ms = Math.round((performance.now() - began) * 10) / 10;
      options.requestLog.info('Request', { method: req.method, url: req.url, status: 200, ms });
    }
    return true;
  }

  /** Whether the request's Cookie header belongs to someone who may read designs. */
  function staffCookie(req: IncomingMessage, now: number): boolean {
    const cookie = req.headers.cookie;
    const who = cookie ? fresh(signedIn.get(cookie), now) : undefined;
    return who !== undefined && who.expiresAt > now && options.listRoles.includes(who.role);
  }

  function listAnswer(req: IncomingMessage, res: ServerResponse, now: number, began: number): boolean {
    const answer = fresh(list, now);
    if (!answer || !staffCookie(req, now) || !send(req, res, answer, listEncoding(req), {}, began)) return false;
    hits.list++;
    return true;
  }

  function designAnswer(req: IncomingMessage, res: ServerResponse, id: number, now: number, began: number): boolean {
    const answer = fresh(designs.get(id), now);
    if (!answer || !staffCookie(req, now) || !send(req, res, answer, revisionEncoding(req), {}, began)) return false;
    hits.design++;
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
      if (!headers || !send(req, res, answer, revisionEncoding(req), { 'X-Robots-Tag': 'noindex, nofollow', ...headers }, began)) {
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
      const design = DESIGN_PATH.exec(req.url);
      if (design) {
        if (!designAnswer(req, res, Number(design[1]), now, began)) handOn();
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
    rememberDesignsList(req: IncomingMessage, text: string): void {
      if (!unchangedSince(req)) return;
      list = keep(list, text);
    },

    /** A design read's JSON text (its latest revision), as the design route sent it. */
    rememberDesign(req: IncomingMessage, id: number, text: string): void {
      if (!unchangedSince(req) || Buffer.byteLength(text) > MAX_KEPT_BYTES / 4) return;
      designs.set(id, keep(designs.get(id), text, ['gzip']));
    },

    /** A link read's JSON text, as the link route sent it. */
    rememberLink(req: IncomingMessage, token: string, text: string, link: { id: number; activeUntil: number | null }): void {
      if (!unchangedSince(req) || Buffer.byteLength(text) > MAX_KEPT_BYTES / 4) return;
      const hash = hashToken(token);
      links.set(hash, { ...keep(links.get(hash), text, ['gzip']), linkId: link.id, activeUntil: link.activeUntil });
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
