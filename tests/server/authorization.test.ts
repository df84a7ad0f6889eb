import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../server/db/models/user';
import { createBuildsService } from '../../server/modules/builds/service';
import { createDesignsService } from '../../server/modules/designs/service';
import { TINY_PNG_DATA_URL, sampleDocument } from './helpers/fixtures';
import { routeTable } from './helpers/routeTable';
import { buildTestApp, CLIENT, type Agent, type TestApp } from './helpers/testApp';

/*
 * How to add a row: every route the app serves needs one entry in MATRIX below, with the status
 * each actor gets. `route` is written exactly as Express knows it ("/api/designs/:id"); a test
 * walks the app's real route table, so a new route without a row (or a row without a route)
 * fails the suite. When read-only links exist, add a 'link' actor with its own column.
 * The client-only catch-all served in production ("GET /{*splat}") is not an API route.
 */

type Actor = Role | 'anonymous';
const ACTORS: Actor[] = ['anonymous', 'owner', 'designer', 'builder', 'customer', 'instructor'];

interface Context {
  t: TestApp;
  designId: number;
  builderId: number;
  /** A build of `buildDesignId` revision 1 assigned to the demo builder. */
  buildId: number;
  buildDesignId: number;
  /** A fresh design by the designer, for deletions. */
  newDesign(): Promise<number>;
  latestRevision(designId: number): Promise<number>;
}

interface Row {
  method: 'get' | 'post' | 'patch' | 'delete';
  route: string;
  path(ctx: Context, actor: Actor): string | Promise<string>;
  body?(ctx: Context, actor: Actor): unknown | Promise<unknown>;
  /** Use a throw-away session (the request ends it). */
  fresh?: boolean;
  expected: Record<Actor, number>;
}

const signedIn = (status: number): Record<Actor, number> => ({
  anonymous: 401, owner: status, designer: status, builder: status, customer: status, instructor: status,
});
const only = (allowed: Role[], status: number): Record<Actor, number> => ({
  anonymous: 401,
  owner: allowed.includes('owner') ? status : 403,
  designer: allowed.includes('designer') ? status : 403,
  builder: allowed.includes('builder') ? status : 403,
  customer: allowed.includes('customer') ? status : 403,
  instructor: allowed.includes('instructor') ? status : 403,
});

// The allow/deny table: every route × every actor → expected status.
const MATRIX: Row[] = [
  { method: 'get', route: '/api/health', path: () => '/api/health', expected: { anonymous: 200, owner: 200, designer: 200, builder: 200, customer: 200, instructor: 200 } },
  {
    method: 'post', route: '/api/auth/sign-in', path: () => '/api/auth/sign-in', fresh: true,
    body: () => ({ email: 'builder@harborlane.example', password: 'slotwise-demo-2026' }),
    expected: { anonymous: 200, owner: 200, designer: 200, builder: 200, customer: 200, instructor: 200 },
  },
  // Who is signed in: everyone gets an answer; an anonymous visitor's is { user: null }.
  { method: 'get', route: '/api/auth/me', path: () => '/api/auth/me', expected: { anonymous: 200, owner: 200, designer: 200, builder: 200, customer: 200, instructor: 200 } },
  { method: 'patch', route: '/api/auth/me', path: () => '/api/auth/me', body: () => ({}), expected: signedIn(200) },
  // A wrong current password: signed-in users reach the check (400), anonymous visitors do not.
  { method: 'post', route: '/api/auth/me/password', path: () => '/api/auth/me/password', body: () => ({ currentPassword: 'wrong-password', newPassword: 'another-password-1' }), expected: signedIn(400) },
  { method: 'post', route: '/api/auth/sign-out', path: () => '/api/auth/sign-out', fresh: true, expected: { anonymous: 204, owner: 204, designer: 204, builder: 204, customer: 204, instructor: 204 } },
  { method: 'get', route: '/api/users', path: () => '/api/users', expected: only(['owner'], 200) },
  {
    method: 'post', route: '/api/users', path: () => '/api/users',
    body: (_ctx, actor) => ({ email: `made-by-${actor}@harborlane.example`, displayName: 'New Person', role: 'builder', password: 'a-long-password-1' }),
    expected: only(['owner'], 201),
  },
  { method: 'patch', route: '/api/users/:id', path: (ctx) => `/api/users/${ctx.builderId}`, body: () => ({ displayName: 'Ines Varga' }), expected: only(['owner'], 200) },
  { method: 'get', route: '/api/designs', path: () => '/api/designs', expected: only(['owner', 'designer'], 200) },
  { method: 'post', route: '/api/designs', path: () => '/api/designs', body: () => ({ name: 'Matrix design', systemId: 'metric-30' }), expected: only(['owner', 'designer'], 201) },
  { method: 'get', route: '/api/designs/:id', path: (ctx) => `/api/designs/${ctx.designId}`, expected: only(['owner', 'designer'], 200) },
  { method: 'get', route: '/api/designs/:id/revisions', path: (ctx) => `/api/designs/${ctx.designId}/revisions`, expected: only(['owner', 'designer'], 200) },
  { method: 'get', route: '/api/designs/:id/revisions/:number', path: (ctx) => `/api/designs/${ctx.designId}/revisions/1`, expected: only(['owner', 'designer'], 200) },
  { method: 'get', route: '/api/designs/:id/revisions/:number/thumbnail', path: (ctx) => `/api/designs/${ctx.designId}/revisions/1/thumbnail`, expected: only(['owner', 'designer'], 200) },
  {
    method: 'post', route: '/api/designs/:id/revisions', path: (ctx) => `/api/designs/${ctx.designId}/revisions`,
    body: async (ctx) => ({ baseRevision: await ctx.latestRevision(ctx.designId), document: sampleDocument('Matrix frame') }),
    expected: only(['owner', 'designer'], 201),
  },
  { method: 'delete', route: '/api/designs/:id', path: (ctx) => ctx.newDesign().then((id) => `/api/designs/${id}`), expected: only(['owner', 'designer'], 204) },
  { method: 'get', route: '/api/builds', path: () => '/api/builds', expected: only(['owner', 'designer', 'builder'], 200) },
  { method: 'get', route: '/api/builds/builders', path: () => '/api/builds/builders', expected: only(['owner', 'designer'], 200) },
  { method: 'post', route: '/api/builds', path: () => '/api/builds', body: (ctx) => ({ designId: ctx.designId, builderIds: [ctx.builderId] }), expected: only(['owner', 'designer'], 201) },
  { method: 'get', route: '/api/builds/:id', path: (ctx) => `/api/builds/${ctx.buildId}`, expected: only(['owner', 'designer', 'builder'], 200) },
  { method: 'patch', route: '/api/builds/:id', path: (ctx) => `/api/builds/${ctx.buildId}`, body: () => ({ note: 'Matrix note' }), expected: only(['owner', 'designer'], 200) },
  { method: 'post', route: '/api/builds/:id/state', path: (ctx) => `/api/builds/${ctx.buildId}/state`, body: () => ({ state: 'cutting' }), expected: only(['owner', 'designer', 'builder'], 200) },
  {
    method: 'post', route: '/api/builds/:id/progress', path: (ctx) => `/api/builds/${ctx.buildId}/progress`,
    body: (_ctx, actor) => ({ revision: 1, ticks: [{ clientId: `matrix-${actor}-tick`, kind: 'cut', itemKey: 'p1', done: true }] }),
    expected: only(['builder'], 200),
  },
  // The builder is assigned to a build of this revision, so may read it (and only it).
  { method: 'get', route: '/api/designs/:id/revisions/:number (assigned build)', path: (ctx) => `/api/designs/${ctx.buildDesignId}/revisions/1`, expected: only(['owner', 'designer', 'builder'], 200) },
  { method: 'get', route: '/api/designs/:id (assigned build)', path: (ctx) => `/api/designs/${ctx.buildDesignId}`, expected: only(['owner', 'designer'], 200) },
  { method: 'post', route: '/api/analysis', path: () => '/api/analysis', body: () => ({ document: sampleDocument('Analysed') }), expected: signedIn(200) },
];

describe('authorization matrix: every route against every role and an anonymous visitor', () => {
  const ctx = {} as Context;
  const agents = new Map<Actor, Agent>();

  beforeAll(async () => {
    const t = await buildTestApp();
    const designs = createDesignsService(t.db);
    const designer = (await t.db.models.User.findByPk(await t.userId('designer')))!;
    const created = await designs.create(designer, sampleDocument('Matrix base'), {
      thumbnail: Buffer.from(TINY_PNG_DATA_URL.split(',')[1], 'base64'),
    });
    const buildDesign = await designs.create(designer, sampleDocument('Matrix build'));
    const build = await createBuildsService(t.db).create(designer, { designId: buildDesign.design.id, builderIds: [await t.userId('builder')] });
    Object.assign(ctx, {
      t,
      buildId: build.build.id,
      buildDesignId: buildDesign.design.id,
      designId: created.design.id,
      builderId: await t.userId('builder'),
      newDesign: async () => (await designs.create(designer, sampleDocument('To delete'))).design.id,
      latestRevision: async (id: number) => (await t.db.models.Design.findByPk(id))!.latestRevision,
    });
    for (const actor of ACTORS) agents.set(actor, actor === 'anonymous' ? t.anonymous() : await t.signIn(actor));
  });
  afterAll(() => ctx.t.close());

  it('has exactly one row for every route in the app’s real route table', () => {
    const served = routeTable(ctx.t.app).filter((route) => route.includes(' /api'));
    const labels = MATRIX.map((row) => `${row.method.toUpperCase()} ${row.route}`).sort();
    expect(new Set(labels).size, 'a route has two rows with the same label').toBe(labels.length);
    // A row may test one route in a named situation: "GET /api/designs/:id (assigned build)".
    // The sharing routes (links, classes, reviews, uploads, mail) have their own matrix with a link
    // holder as an extra actor: tests/server/sharing/authorization.test.ts. Its rows count here too.
    const sharingSource = readFileSync(fileURLToPath(new URL('./sharing/authorization.test.ts', import.meta.url)), 'utf8');
    const sharingRows = [...sharingSource.matchAll(/\{ method: '(\w+)', route: '([^']+)'/g)].map((m) => `${m[1].toUpperCase()} ${m[2]}`);
    expect(sharingRows.length, 'the sharing matrix was found').toBeGreaterThan(20);
    const rows = [...labels, ...sharingRows].map((label) => label.replace(/ \(.*\)$/, ''));
    expect(served.filter((route) => !rows.includes(route)), 'routes without a row in MATRIX').toEqual([]);
    // Rows may also try another method on a served path (a read-only link refusing writes).
    const servedPaths = new Set(served.map((route) => route.split(' ')[1]));
    expect(rows.filter((route) => !served.includes(route) && !servedPaths.has(route.split(' ')[1])), 'rows for routes the app does not serve').toEqual([]);
  });

  const cases = MATRIX.flatMap((row) => ACTORS.map((actor) => ({ row, actor, status: row.expected[actor] })));

  it.each(cases)('$actor gets $status from $row.method $row.route', async ({ row, actor, status }) => {
    const agent = row.fresh ? (actor === 'anonymous' ? ctx.t.anonymous() : await ctx.t.signIn(actor)) : agents.get(actor)!;
    const path = await row.path(ctx, actor);
    let call = agent[row.method](path).set(CLIENT);
    if (row.body) call = call.send((await row.body(ctx, actor)) as object);
    const response = await call;
    expect(response.status, JSON.stringify(response.body)).toBe(status);
    if (status === 403) expect(response.body.error.code).toBe('forbidden');
    if (status === 401) expect(response.body.error.code).toBe('unauthenticated');
  });

  it('lets a designer delete only designs they created', async () => {
    const otherDesigner = await ctx.t.signIn('owner').then(async (owner) => {
      const made = await owner.post('/api/users').set(CLIENT).send({ email: 'second.designer@harborlane.example', displayName: 'Second Designer', role: 'designer', password: 'second-designer-pw' });
      expect(made.status).toBe(201);
      return ctx.t.signInAs('second.designer@harborlane.example', 'second-designer-pw');
    });
    const designId = await ctx.newDesign();
    const refused = await otherDesigner.delete(`/api/designs/${designId}`).set(CLIENT);
    expect(refused.status).toBe(403);
    expect((await agents.get('designer')!.get(`/api/designs/${designId}`)).status).toBe(200);
  });
});
