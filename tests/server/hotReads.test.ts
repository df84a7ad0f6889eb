import { brotliDecompressSync } from 'node:zlib';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hotReadsOf } from '../../server/app';
import { buildTestApp, CLIENT, type Agent, type TestApp } from './helpers/testApp';

/**
 * The hot reads (server/hotReads.ts) repeat the designs list and link reads from memory. Each
 * test asks Express first, then asks again and checks that the repeat came from memory with the
 * same status, headers and body, and that every write, sign-out, revocation or expiry is seen.
 */

/** Headers that may differ between two answers of the same content. */
const VARYING = new Set(['date', 'connection', 'keep-alive', 'ratelimit']);
const stable = (response: Response) => Object.fromEntries(Object.entries(response.headers).filter(([name]) => !VARYING.has(name)));

const rawBody = (request: ReturnType<Agent['get']>) =>
  request.buffer(true).parse((response, done) => {
    const chunks: Buffer[] = [];
    response.on('data', (chunk: Buffer) => chunks.push(chunk));
    response.on('end', () => done(null, Buffer.concat(chunks)));
  });

describe('hot reads', () => {
  let t: TestApp;
  let designer: Agent;
  const hits = () => hotReadsOf(t.app)!.hits();

  beforeAll(async () => {
    t = await buildTestApp({ linkRateLimit: { max: 1000, windowMs: 60_000 } });
    designer = await t.signIn('designer');
  });
  afterAll(() => t.close());

  it('repeats the designs list from memory with the same headers and body, plain, gzipped and brotli', async () => {
    // A list over 1 KB, so the compression middleware compresses it.
    for (let i = 0; i < 4; i++) {
      expect((await designer.post('/api/designs').set(CLIENT).send({ name: `Hot reads ${i}`, systemId: 'metric-40' })).status).toBe(201);
    }
    for (const encoding of ['identity', 'gzip', 'gzip, deflate, br']) {
      const before = hits().list;
      const first = await rawBody(designer.get('/api/designs').set('Accept-Encoding', encoding));
      // The gzip is made off the request thread on first demand; give it a moment.
      await new Promise((resolve) => setTimeout(resolve, 50));
      await designer.get('/api/designs').set('Accept-Encoding', encoding);
      const repeat = await rawBody(designer.get('/api/designs').set('Accept-Encoding', encoding));
      expect(hits().list).toBeGreaterThan(before);
      expect(repeat.status).toBe(200);
      expect(stable(repeat)).toEqual(stable(first));
      expect(first.headers['content-encoding']).toBe(encoding === 'identity' ? undefined : encoding === 'gzip' ? 'gzip' : 'br');
      // superagent inflates gzip itself; brotli is decoded here if it did not.
      const text = (response: Response) => {
        const bytes = response.body as Buffer;
        return response.headers['content-encoding'] === 'br' && bytes[0] !== 0x7b ? brotliDecompressSync(bytes).toString('utf8') : bytes.toString('utf8');
      };
      expect(text(repeat)).toBe(text(first));
      expect(JSON.parse(text(repeat)).designs.length).toBeGreaterThan(4);
      expect(repeat.headers['cache-control']).toBe('no-store');
      expect(repeat.headers['x-content-type-options']).toBe('nosniff');
    }
  });

  it('shows a save in the next list at once', async () => {
    const listed = (await designer.get('/api/designs')).body.designs as { id: number; name: string; latestRevision: number }[];
    await designer.get('/api/designs');
    const design = listed[0];
    const { body } = await designer.get(`/api/designs/${design.id}`);
    const saved = await designer
      .post(`/api/designs/${design.id}/revisions`)
      .set(CLIENT)
      .send({ baseRevision: design.latestRevision, document: body.revision.document, message: 'hot reads test' });
    expect(saved.status).toBe(201);
    const after = (await designer.get('/api/designs')).body.designs as typeof listed;
    expect(after.find((d) => d.id === design.id)!.latestRevision).toBe(design.latestRevision + 1);
  });

  it('repeats a design read from memory, gzipped or not, and shows the next save at once', async () => {
    const listed = (await designer.get('/api/designs')).body.designs as { id: number; profileCount: number; latestRevision: number }[];
    const design = listed.find((d) => d.profileCount > 0)!;
    const url = `/api/designs/${design.id}`;
    for (const encoding of ['gzip', 'identity']) {
      const first = await rawBody(designer.get(url).set('Accept-Encoding', encoding));
      const before = hits().design;
      const repeat = await rawBody(designer.get(url).set('Accept-Encoding', encoding));
      expect(hits().design).toBe(before + 1);
      expect(stable(repeat)).toEqual(stable(first));
      expect(repeat.headers['content-encoding']).toBe(encoding === 'gzip' ? 'gzip' : undefined);
      expect(repeat.body.toString()).toBe(first.body.toString());
    }
    const read = JSON.parse((await rawBody(designer.get(url).set('Accept-Encoding', 'identity'))).body.toString());
    const saved = await designer.post(`${url}/revisions`).set(CLIENT).send({ baseRevision: read.revision.number, document: { ...read.revision.document, name: 'Renamed by the hot reads test' } });
    expect(saved.status).toBe(201);
    const after = (await designer.get(url)).body;
    expect(after.revision.number).toBe(read.revision.number + 1);
    expect(after.revision.document.name).toBe('Renamed by the hot reads test');
    // Another role never gets it from memory: a builder not assigned to it, and a stranger.
    const builder = await t.signIn('builder');
    expect((await builder.get(url)).status).toBe(403);
    expect((await t.anonymous().get(url)).status).toBe(401);
  });

  it('never serves the list to a role that may not read it, to a stranger, or after signing out', async () => {
    const builder = await t.signIn('builder');
    for (let i = 0; i < 3; i++) expect((await builder.get('/api/designs')).status).toBe(403);
    for (let i = 0; i < 2; i++) expect((await t.anonymous().get('/api/designs')).status).toBe(401);
    const leaving = await t.signIn('owner');
    expect((await leaving.get('/api/designs')).status).toBe(200);
    const before = hits().list;
    expect((await leaving.get('/api/designs')).status).toBe(200);
    expect(hits().list).toBe(before + 1);
    expect((await leaving.post('/api/auth/sign-out').set(CLIENT)).status).toBeLessThan(300);
    expect((await leaving.get('/api/designs')).status).toBe(401);
    expect(hits().list).toBe(before + 1);
  });

  describe('link reads', () => {
    let designId: number;
    beforeAll(async () => {
      // A demo design with profiles (answers over 1 KB are gzipped).
      const designs = (await designer.get('/api/designs')).body.designs as { id: number; profileCount: number }[];
      designId = designs.find((design) => design.profileCount > 0)!.id;
    });
    const makeLink = async (extra: Record<string, unknown> = {}) => {
      const made = await designer.post('/api/links').set(CLIENT).send({ designId, ...extra });
      expect(made.status).toBe(201);
      return made.body as { token: string; link: { id: number } };
    };

    it('repeats a link read from memory with the same headers and body, and counts every open', async () => {
      const { token, link } = await makeLink();
      const url = `/api/shared/${token}`;
      const first = await rawBody(t.anonymous().get(url).set('Accept-Encoding', 'gzip'));
      await new Promise((resolve) => setTimeout(resolve, 50));
      const before = hits().link;
      const repeat = await rawBody(t.anonymous().get(url).set('Accept-Encoding', 'gzip'));
      const plain = await rawBody(t.anonymous().get(url).set('Accept-Encoding', 'identity'));
      expect(hits().link).toBe(before + 2);
      expect(stable(repeat)).toEqual(stable(first));
      expect(repeat.headers['x-robots-tag']).toBe('noindex, nofollow');
      expect(repeat.headers['ratelimit-policy']).toBe(first.headers['ratelimit-policy']);
      expect(repeat.headers.ratelimit).toMatch(/^"shared-link-reads"; r=\d+; t=\d+$/);
      expect(repeat.headers['content-encoding']).toBe('gzip');
      expect(plain.headers['content-encoding']).toBeUndefined();
      expect(repeat.body.toString()).toBe(first.body.toString());
      expect(plain.body.toString()).toBe(first.body.toString());
      const listed = await designer.get(`/api/links?designId=${designId}`);
      expect(listed.body.links.find((l: { id: number }) => l.id === link.id).openCount).toBe(3);
    });

    it('stops answering a link the moment it is withdrawn', async () => {
      const { token, link } = await makeLink();
      const url = `/api/shared/${token}`;
      expect((await t.anonymous().get(url).set('Accept-Encoding', 'identity')).status).toBe(200);
      const before = hits().link;
      expect((await t.anonymous().get(url).set('Accept-Encoding', 'identity')).status).toBe(200);
      expect(hits().link).toBe(before + 1);
      expect((await designer.delete(`/api/links/${link.id}`).set(CLIENT)).status).toBe(200);
      const gone = await t.anonymous().get(url);
      expect(gone.status).toBe(404);
      expect(gone.body.error.code).toBe('not_found');
    });

    it('stops answering a link the moment it expires', async () => {
      const { token } = await makeLink({ expiresAt: new Date(Date.now() + 1500).toISOString() });
      const url = `/api/shared/${token}`;
      expect((await t.anonymous().get(url).set('Accept-Encoding', 'identity')).status).toBe(200);
      const before = hits().link;
      expect((await t.anonymous().get(url).set('Accept-Encoding', 'identity')).status).toBe(200);
      expect(hits().link).toBe(before + 1);
      await new Promise((resolve) => setTimeout(resolve, 1600));
      expect((await t.anonymous().get(url)).status).toBe(404);
    });
  });
});

describe('hot reads under the link rate limit', () => {
  it('counts answers from memory against the limit and refuses the one over it as Express does', async () => {
    const t = await buildTestApp({ linkRateLimit: { max: 4, windowMs: 60_000 } });
    try {
      const designer = await t.signIn('designer');
      const designId = (await designer.get('/api/designs')).body.designs[0].id;
      const { token } = (await designer.post('/api/links').set(CLIENT).send({ designId })).body;
      const visitor = t.anonymous();
      const statuses: number[] = [];
      const remaining: string[] = [];
      for (let i = 0; i < 6; i++) {
        const response = await visitor.get(`/api/shared/${token}`);
        statuses.push(response.status);
        remaining.push(String(response.headers.ratelimit).replace(/; t=\d+$/, ''));
      }
      expect(statuses).toEqual([200, 200, 200, 200, 429, 429]);
      expect(remaining.slice(0, 4)).toEqual([3, 2, 1, 0].map((r) => `"shared-link-reads"; r=${r}`));
      expect(hotReadsOf(t.app)!.hits().link).toBeGreaterThanOrEqual(3);
    } finally {
      await t.close();
    }
  });
});
