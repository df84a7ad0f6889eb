import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleDocument } from './helpers/fixtures';
import { buildTestApp, CLIENT, dataFingerprint, type Agent, type TestApp } from './helpers/testApp';

/**
 * Throws random and malformed bodies at every write route. Whatever arrives, the server must answer
 * below 500 with an error body a client can read, and the shop's data must stay exactly as it was.
 */

// Values that are never a valid string, number or boolean field of the same kind.
const notAString = fc.oneof(fc.integer(), fc.double(), fc.boolean(), fc.constant(null), fc.array(fc.jsonValue(), { maxLength: 3 }), fc.dictionary(fc.string(), fc.jsonValue(), { maxKeys: 3 }));
const notAPositiveInteger = fc.oneof(
  fc.integer({ max: 0 }),
  fc.double().filter((n) => !Number.isInteger(n) || n <= 0),
  fc.string(),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.integer(), { maxLength: 3 }),
);

/** A valid body with one field replaced by a wrong-typed value. */
function mutate(valid: Record<string, unknown>, wrong: Record<string, fc.Arbitrary<unknown>>): fc.Arbitrary<unknown> {
  return fc.constantFrom(...Object.keys(wrong)).chain((key) => wrong[key].map((value) => ({ ...valid, [key]: value })));
}

/** A valid document with one part broken: a negative length, a string where a number goes, a missing id… */
const brokenDocument = fc
  .tuple(
    fc.constantFrom('length', 'start', 'direction', 'id', 'variantId'),
    fc.oneof(fc.constant(-1), fc.constant(0), fc.constant('12'), fc.constant(null), fc.constant([1, 2]), fc.constant([0, 0, 0]), fc.constant('')),
  )
  // Two pairs are valid after all (an id "12", a start at the origin): they would create a design.
  .filter(([key, value]) => !(key === 'id' && value === '12') && !(key === 'start' && Array.isArray(value) && value.length === 3))
  .map(([key, value]) => {
    const document = sampleDocument('Broken') as unknown as { profiles: Record<string, unknown>[] };
    document.profiles[0] = { ...document.profiles[0], [key]: value };
    return document;
  });

const anyJsonBody = fc.jsonValue({ maxDepth: 3 });

/** A path parameter that is not a usable id: text, percent-garbage, huge or zero numbers. */
const badIdParam = fc.oneof(
  fc.string({ minLength: 1, maxLength: 12 }).filter((s) => !/^[1-9]\d*$/.test(s)).map(encodeURIComponent),
  fc.constantFrom('0', '-1', '1e3', '0x10', '%ff', '%E0%A4%A', '99999999999999999999', '1.5'),
  fc.integer({ min: 100_000, max: 2 ** 40 }).map(String),
);

/** A random query string (write routes take none; it must change nothing). */
const anyQuery = fc.oneof(
  fc.constant(''),
  fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), fc.string({ maxLength: 12 }), { maxKeys: 3 }).map((q) => `?${new URLSearchParams(q).toString()}`),
  fc.constantFrom('?%ff=1', '?a[b]=1', '?__proto__[x]=1', '?a=%E0%A4%A'),
);

/** Text sent as application/json that is not JSON at all. */
const malformedJson = fc.oneof(
  fc.string({ minLength: 1 }).filter((text) => {
    try {
      JSON.parse(text);
      return false;
    } catch {
      return true;
    }
  }),
  fc.constantFrom('{', '{"email":', '[1,2', '{"a":1}}', '\u0000', 'undefined', "{'single':'quotes'}"),
);

type Body = { kind: 'json'; value: unknown } | { kind: 'raw'; text: string };
const bodies = (...specific: fc.Arbitrary<unknown>[]): fc.Arbitrary<Body> =>
  fc.oneof(
    anyJsonBody.map((value) => ({ kind: 'json' as const, value })),
    malformedJson.map((text) => ({ kind: 'raw' as const, text })),
    ...specific.map((arbitrary) => arbitrary.map((value) => ({ kind: 'json' as const, value }))),
  );

describe('random and malformed bodies at every write route', () => {
  let t: TestApp;
  let owner: Agent;
  let designId: number;
  let builderId: number;

  beforeAll(async () => {
    t = await buildTestApp();
    owner = await t.signIn('owner');
    builderId = await t.userId('builder');
    const created = await owner.post('/api/designs').set(CLIENT).send({ name: 'Property target', systemId: 'metric-40', document: sampleDocument('Property target') });
    designId = created.body.design.id;
  });
  afterAll(() => t.close());

  const routes: { name: string; method: 'post' | 'patch' | 'delete'; path: () => fc.Arbitrary<string>; body: () => fc.Arbitrary<Body>; anonymous?: boolean }[] = [
    {
      name: 'POST /api/auth/sign-in', method: 'post', anonymous: true, path: () => fc.constant('/api/auth/sign-in'),
      body: () => bodies(mutate({ email: 'owner@harborlane.example', password: 'slotwise-demo-2026' }, { email: notAString, password: notAString })),
    },
    { name: 'POST /api/auth/sign-out (anonymous)', method: 'post', anonymous: true, path: () => fc.constant('/api/auth/sign-out'), body: () => bodies() },
    {
      name: 'PATCH /api/auth/me', method: 'patch', path: () => fc.constant('/api/auth/me'),
      body: () => bodies(mutate({ displayName: 'Noor Okafor', preferences: { units: 'mm' } }, { displayName: notAString, preferences: fc.oneof(notAString, fc.record({ units: fc.string().filter((u) => u !== 'mm' && u !== 'in') })) })),
    },
    {
      name: 'POST /api/auth/me/password', method: 'post', path: () => fc.constant('/api/auth/me/password'),
      body: () => bodies(mutate({ currentPassword: 'slotwise-demo-2026', newPassword: 'a-perfectly-fine-password' }, { currentPassword: notAString, newPassword: fc.oneof(notAString, fc.string({ maxLength: 9 })) })),
    },
    {
      name: 'POST /api/users', method: 'post', path: () => fc.constant('/api/users'),
      body: () => bodies(mutate({ email: 'new.person@harborlane.example', displayName: 'New Person', role: 'builder', password: 'new-person-password' }, { email: fc.oneof(notAString, fc.string().filter((s) => !s.includes('@'))), displayName: notAString, role: fc.oneof(notAString, fc.constantFrom('admin', 'Owner', '')), password: fc.oneof(notAString, fc.string({ maxLength: 9 })) })),
    },
    {
      name: 'PATCH /api/users/:id (bad ids)', method: 'patch', path: () => badIdParam.map((id) => `/api/users/${id}`),
      body: () => bodies(fc.constant({ displayName: 'Ines Varga' })),
    },
    {
      name: 'POST /api/designs/:id/revisions (bad ids)', method: 'post', path: () => badIdParam.map((id) => `/api/designs/${id}/revisions`),
      body: () => bodies(fc.constant({ baseRevision: 1, document: sampleDocument('Property target') })),
    },
    {
      name: 'PATCH /api/users/:id', method: 'patch', path: () => fc.constant(`/api/users/${builderId}`),
      body: () => bodies(mutate({ displayName: 'Ines Varga', role: 'builder', active: true }, { displayName: notAString, role: fc.oneof(notAString, fc.constantFrom('root', '')), active: fc.oneof(fc.string(), fc.integer(), fc.constant(null)) })),
    },
    {
      name: 'POST /api/designs', method: 'post', path: () => fc.constant('/api/designs'),
      body: () => bodies(mutate({ name: 'New', systemId: 'metric-40', units: 'mm' }, { name: notAString, systemId: fc.oneof(notAString, fc.string().filter((s) => !s.startsWith('metric') && !s.startsWith('inch'))), units: fc.oneof(notAString, fc.constantFrom('cm', 'ft')), document: fc.oneof(anyJsonBody.filter((v) => v !== undefined), brokenDocument) })),
    },
    {
      name: 'POST /api/designs/:id/revisions', method: 'post', path: () => fc.constant(`/api/designs/${designId}/revisions`),
      body: () => bodies(mutate({ baseRevision: 1, document: sampleDocument('Property target'), message: 'ok' }, { baseRevision: notAPositiveInteger, document: fc.oneof(anyJsonBody, brokenDocument), thumbnail: fc.oneof(notAString, fc.string(), fc.base64String().map((b) => `data:image/png;base64,${b}`)), message: notAString })),
    },
    {
      name: 'DELETE /api/designs/:id', method: 'delete',
      path: () => fc.oneof(fc.string({ minLength: 1 }).filter((s) => !/^[1-9]\d*$/.test(s)), fc.integer({ min: 1_000, max: 2 ** 40 }).map(String)).map((id) => `/api/designs/${encodeURIComponent(id)}`),
      body: () => bodies(),
    },
    {
      name: 'POST /api/analysis', method: 'post', path: () => fc.constant('/api/analysis'),
      body: () => bodies(fc.oneof(anyJsonBody, brokenDocument).map((document) => ({ document }))),
    },
  ];

  it.each(routes)('$name never answers 5xx and never changes the data (row counts and checksum)', async (route) => {
    const before = await dataFingerprint(t.db);
    const agent = route.anonymous ? t.anonymous() : owner;
    await fc.assert(
      fc.asyncProperty(route.path(), anyQuery, route.body(), async (path, query, body) => {
        let call = agent[route.method](`${path}${query}`).set(CLIENT).set('Content-Type', 'application/json');
        call = call.send(body.kind === 'raw' ? body.text : JSON.stringify(body.value));
        const response = await call;
        expect(response.status, `${route.name} ${JSON.stringify(body)} → ${JSON.stringify(response.body)}`).toBeLessThan(500);
        if (response.status >= 400) {
          expect(response.body.error.code).toEqual(expect.any(String));
          expect(response.body.error.message).toMatch(/\w/);
        }
        expect(await dataFingerprint(t.db)).toEqual(before);
      }),
      { numRuns: 30 },
    );
    expect(t.loggedErrors).toEqual([]);
    expect((await owner.get('/api/auth/me')).status).toBe(200);
  });
});
