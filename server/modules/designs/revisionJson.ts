import { createHash } from 'node:crypto';
import { gzip } from 'node:zlib';
import type { Response } from 'express';
import type { RevisionMeta } from './present';

const PLACEHOLDER = '__slotwise_stored_document__';

/** Gzipped answers kept, by the SHA-256 of the answer's text; bounded by their total size. */
const GZIP_CACHE_MAX_BYTES = 16 * 1024 * 1024;
/** Answers smaller than this go out as they are (the compression middleware's own threshold). */
const GZIP_MIN_BYTES = 1024;
const gzipCache = new Map<string, Buffer>();
let gzipCacheBytes = 0;

function remember(key: string, value: Buffer): void {
  if (value.length > GZIP_CACHE_MAX_BYTES / 4) return;
  gzipCache.set(key, value);
  gzipCacheBytes += value.length;
  for (const [oldKey, oldValue] of gzipCache) {
    if (gzipCacheBytes <= GZIP_CACHE_MAX_BYTES) break;
    gzipCache.delete(oldKey);
    gzipCacheBytes -= oldValue.length;
  }
}

/**
 * Answers `{ ...outer, revision: { ...meta, document } }` with the document spliced in as the JSON
 * text already stored, skipping a parse and re-serialisation that costs tens of milliseconds for a
 * 2,000-part design. The stored text was written by JSON.stringify of a parsed document.
 *
 * A revision never changes, and a link or design read sends the same text again and again, so the
 * gzipped answer is kept (least recently used first out) by the hash of its text: a repeat costs a
 * hash instead of a compression. A client that does not accept gzip gets the text. Returns the
 * answer's JSON text.
 */
export function sendRevisionJson(res: Response, outer: Record<string, unknown>, meta: RevisionMeta, documentJson: string): string {
  const text = JSON.stringify({ ...outer, revision: { ...meta, document: PLACEHOLDER } });
  // `revision` is the last key and `document` its last key, so the last placeholder is ours.
  const at = text.lastIndexOf(`"${PLACEHOLDER}"`);
  const body = `${text.slice(0, at)}${documentJson}${text.slice(at + PLACEHOLDER.length + 2)}`;
  res.type('application/json');
  res.vary('Accept-Encoding');
  if (body.length < GZIP_MIN_BYTES || res.req.acceptsEncodings('gzip', 'identity') !== 'gzip') {
    res.send(body);
    return body;
  }
  const key = createHash('sha256').update(body).digest('base64');
  const sendGzipped = (gzipped: Buffer) => {
    // The compression middleware leaves an answer that already has a Content-Encoding alone.
    res.setHeader('Content-Encoding', 'gzip');
    res.send(gzipped);
  };
  const cached = gzipCache.get(key);
  if (cached) {
    gzipCache.delete(key);
    gzipCache.set(key, cached);
    sendGzipped(cached);
    return body;
  }
  // Compressed off the request thread (libuv's pool), at the level the API's middleware uses.
  gzip(body, { level: 1 }, (error, gzipped) => {
    if (error) {
      res.send(body);
      return;
    }
    remember(key, gzipped);
    sendGzipped(gzipped);
  });
  return body;
}
