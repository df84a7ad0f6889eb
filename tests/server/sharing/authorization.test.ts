import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../server/db/models/user';
import { buildTestApp, CLIENT, type Agent, type TestApp } from '../helpers/testApp';

/** Every sharing route × each role, an anonymous visitor, and a visitor holding a read-only link. */
type Actor = Role | 'anonymous' | 'link';
const ACTORS: Actor[] = ['anonymous', 'link', 'owner', 'designer', 'builder', 'customer', 'instructor'];

interface Context {
  t: TestApp;
  designId: number;
  classId: number;
  linkToken: string;
  uploadId: number;
  png: Buffer;
  newLink(): Promise<number>;
  newClass(): Promise<number>;
  newUpload(): Promise<number>;
  latestRevision(): Promise<number>;
}

interface Row {
  method: 'get' | 'post' | 'patch' | 'delete';
  route: string;
  path(ctx: Context): string | Promise<string>;
  body?(ctx: Context): unknown | Promise<unknown>;
  file?: boolean;
  expected: Record<Actor, number>;
}

/** Signed-in roles in `allowed` get `status`; other roles 403; anonymous and link visitors 401. */
const only = (allowed: Role[], status: number, overrides: Partial<Record<Actor, number>> = {}): Record<Actor, number> => ({
  anonymous: 401,
  link: 401,
  owner: allowed.includes('owner') ? status : 403,
  designer: allowed.includes('designer') ? status : 403,
  builder: allowed.includes('builder') ? status : 403,
  customer: allowed.includes('customer') ? status : 403,
  instructor: allowed.includes('instructor') ? status : 403,
  ...overrides,
});
const everyone = (status: number): Record<Actor, number> => Object.fromEntries(ACTORS.map((actor) => [actor, status])) as Record<Actor, number>;
const STAFF: Role[] = ['owner', 'designer'];
const LINK_MAKERS: Role[] = ['owner', 'designer', 'instructor'];
const TEACHERS: Role[] = ['instructor', 'owner'];

const MATRIX: Row[] = [
  { method: 'get', route: '/api/outbox', path: () => '/api/outbox', expected: only(['owner'], 200) },
  { method: 'get', route: '/api/links', path: () => '/api/links', expected: only(LINK_MAKERS, 200) },
  { method: 'get', route: '/api/links/designs', path: () => '/api/links/designs', expected: only(LINK_MAKERS, 200) },
  { method: 'post', route: '/api/links', path: () => '/api/links', body: (ctx) => ({ designId: ctx.designId }), expected: only(LINK_MAKERS, 201) },
  // A designer's link: its creator and the owner may withdraw it; another link maker does not see it.
  { method: 'delete', route: '/api/links/:id', path: async (ctx) => `/api/links/${await ctx.newLink()}`, expected: only(LINK_MAKERS, 200, { instructor: 404 }) },
  { method: 'get', route: '/api/classes', path: () => '/api/classes', expected: only(TEACHERS, 200) },
  { method: 'post', route: '/api/classes', path: () => '/api/classes', body: () => ({ name: 'Matrix class' }), expected: only(TEACHERS, 201) },
  { method: 'get', route: '/api/classes/:id', path: (ctx) => `/api/classes/${ctx.classId}`, expected: only(TEACHERS, 200) },
  { method: 'patch', route: '/api/classes/:id', path: (ctx) => `/api/classes/${ctx.classId}`, body: () => ({ description: 'Changed' }), expected: only(TEACHERS, 200) },
  { method: 'post', route: '/api/classes/:id/links', path: (ctx) => `/api/classes/${ctx.classId}/links`, body: (ctx) => ({ designId: ctx.designId }), expected: only(TEACHERS, 201) },
  { method: 'delete', route: '/api/classes/:id', path: async (ctx) => `/api/classes/${await ctx.newClass()}`, expected: only(TEACHERS, 200) },
  { method: 'get', route: '/api/reviews', path: () => '/api/reviews', expected: only(['customer'], 200) },
  { method: 'get', route: '/api/reviews/:designId', path: (ctx) => `/api/reviews/${ctx.designId}`, expected: only(['customer', ...STAFF], 200) },
  { method: 'post', route: '/api/reviews/:designId/comments', path: (ctx) => `/api/reviews/${ctx.designId}/comments`, body: async (ctx) => ({ revision: await ctx.latestRevision(), body: 'Matrix comment' }), expected: only(['customer', ...STAFF], 201) },
  { method: 'post', route: '/api/reviews/:designId/decisions', path: (ctx) => `/api/reviews/${ctx.designId}/decisions`, body: async (ctx) => ({ revision: await ctx.latestRevision(), decision: 'changes_requested' }), expected: only(['customer'], 201) },
  { method: 'get', route: '/api/designs/:designId/shares', path: (ctx) => `/api/designs/${ctx.designId}/shares`, expected: only(STAFF, 200) },
  { method: 'post', route: '/api/designs/:designId/shares', path: (ctx) => `/api/designs/${ctx.designId}/shares`, body: () => ({ email: 'customer@harborlane.example' }), expected: only(STAFF, 201) },
  { method: 'get', route: '/api/designs/:designId/uploads', path: (ctx) => `/api/designs/${ctx.designId}/uploads`, expected: only(STAFF, 200) },
  { method: 'post', route: '/api/designs/:designId/uploads', path: (ctx) => `/api/designs/${ctx.designId}/uploads`, file: true, expected: only(STAFF, 201) },
  { method: 'get', route: '/api/uploads/:id/file', path: (ctx) => `/api/uploads/${ctx.uploadId}/file`, expected: only(STAFF, 200) },
  { method: 'get', route: '/api/uploads/:id/thumbnail', path: (ctx) => `/api/uploads/${ctx.uploadId}/thumbnail`, expected: only(STAFF, 200) },
  { method: 'delete', route: '/api/uploads/:id', path: async (ctx) => `/api/uploads/${await ctx.newUpload()}`, expected: only(STAFF, 204) },
  { method: 'get', route: '/api/designs/:designId/history', path: (ctx) => `/api/designs/${ctx.designId}/history`, expected: only(STAFF, 200) },
  { method: 'get', route: '/api/designs/:designId/diff', path: (ctx) => `/api/designs/${ctx.designId}/diff?from=1&to=1`, expected: only(STAFF, 200) },
  { method: 'get', route: '/api/designs/:designId/export/:file', path: (ctx) => `/api/designs/${ctx.designId}/export/bom.csv`, expected: only(STAFF, 200) },
  { method: 'post', route: '/api/designs/import', path: () => '/api/designs/import', body: async (ctx) => ({ document: (await ctx.t.anonymous().get(`/api/shared/${ctx.linkToken}`)).body.revision.document }), expected: only(STAFF, 201) },
  { method: 'post', route: '/api/auth/password-reset', path: () => '/api/auth/password-reset', body: () => ({ email: 'nobody@example.com' }), expected: everyone(202) },
  { method: 'post', route: '/api/auth/password-reset/confirm', path: () => '/api/auth/password-reset/confirm', body: () => ({ token: 'not-a-token', newPassword: 'long-enough-password' }), expected: everyone(400) },
  { method: 'get', route: '/api/shared/:token', path: (ctx) => `/api/shared/${ctx.linkToken}`, expected: everyone(200) },
  { method: 'post', route: '/api/shared/:token', path: (ctx) => `/api/shared/${ctx.linkToken}`, body: () => ({}), expected: everyone(403) },
  { method: 'patch', route: '/api/shared/:token', path: (ctx) => `/api/shared/${ctx.linkToken}`, body: () => ({}), expected: everyone(403) },
  { method: 'delete', route: '/api/shared/:token', path: (ctx) => `/api/shared/${ctx.linkToken}`, expected: everyone(403) },
];

describe('sharing routes: authorization for each role, anonymous visitors and read-only links', () => {
  const ctx = {} as Context;
  const agents = new Map<Actor, Agent>();

  beforeAll(async () => {
    const t = await buildTestApp();
    ctx.t = t;
    const designer = await t.signIn('designer');
    const instructor = await t.signIn('instructor');
    ctx.designId = (await designer.get('/api/designs')).body.designs[0].id;
    await designer.post(`/api/designs/${ctx.designId}/shares`).set(CLIENT).send({ email: 'customer@harborlane.example' });
    ctx.classId = (await instructor.post('/api/classes').set(CLIENT).send({ name: 'Matrix' })).body.class.id;
    ctx.linkToken = (await designer.post('/api/links').set(CLIENT).send({ designId: ctx.designId })).body.token;
    ctx.png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#888' } }).png().toBuffer();
    ctx.newLink = async () => (await designer.post('/api/links').set(CLIENT).send({ designId: ctx.designId })).body.link.id;
    ctx.newClass = async () => (await instructor.post('/api/classes').set(CLIENT).send({ name: 'Throw-away' })).body.class.id;
    ctx.newUpload = async () => (await designer.post(`/api/designs/${ctx.designId}/uploads`).set(CLIENT).attach('file', ctx.png, { filename: 'm.png', contentType: 'image/png' })).body.upload.id;
    ctx.uploadId = await ctx.newUpload();
    ctx.latestRevision = async () => (await t.db.models.Design.findByPk(ctx.designId))!.latestRevision;
    for (const actor of ACTORS) {
      if (actor === 'anonymous') agents.set(actor, t.anonymous());
      else if (actor === 'link') {
        const visitor = t.anonymous();
        await visitor.get(`/api/shared/${ctx.linkToken}`);
        agents.set(actor, visitor);
      } else agents.set(actor, await t.signIn(actor));
    }
  });
  afterAll(() => ctx.t.close());

  for (const row of MATRIX) {
    it(`${row.method.toUpperCase()} ${row.route}: ${ACTORS.map((actor) => `${actor} ${row.expected[actor]}`).join(', ')}`, async () => {
      const seen: Record<string, number> = {};
      for (const actor of ACTORS) {
        const agent = agents.get(actor)!;
        let request = agent[row.method](await row.path(ctx)).set(CLIENT);
        if (row.file) request = request.attach('file', ctx.png, { filename: 'matrix.png', contentType: 'image/png' });
        else if (row.body) request = request.send((await row.body(ctx)) as object);
        seen[actor] = (await request).status;
      }
      expect(seen).toEqual(row.expected);
    });
  }
});
