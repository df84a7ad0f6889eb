import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, CLIENT, type Agent, type TestApp } from '../helpers/testApp';
import { linkIn, waitForMail } from '../helpers/mail';

const tokenOf = (url: string) => url.split('/view/')[1];

describe('read-only links', () => {
  let t: TestApp;
  let designer: Agent;
  let instructor: Agent;
  let designId: number;

  beforeAll(async () => {
    t = await buildTestApp({});
    designer = await t.signIn('designer');
    instructor = await t.signIn('instructor');
    designId = (await designer.get('/api/designs')).body.designs[0].id;
  });
  afterAll(() => t.close());

  it('makes a 256-bit token shown once and stores only its SHA-256 hash', async () => {
    const made = await designer.post('/api/links').set(CLIENT).send({ designId, label: 'For the shop floor' });
    expect(made.status).toBe(201);
    expect(made.body.token).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 bytes in base64url: 256 bits ≥ the 128 asked
    expect(made.body.url).toContain(`/view/${made.body.token}`);
    const [rows] = await t.db.sequelize.query('SELECT token_hash FROM share_links');
    const stored = JSON.stringify(rows);
    expect(stored).not.toContain(made.body.token);
    expect((rows as { token_hash: string }[])[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('opens without signing in, follows the latest revision and counts opens', async () => {
    const made = await designer.post('/api/links').set(CLIENT).send({ designId });
    const visitor = t.anonymous();
    const first = await visitor.get(`/api/shared/${made.body.token}`);
    expect(first.status).toBe(200);
    expect(first.body.revision.document.profiles.length).toBeGreaterThan(0);
    expect(first.body.link.pinnedRevision).toBeNull();
    expect(first.body.revision.createdBy.displayName).toBe('');
    expect(first.headers['set-cookie']).toBeUndefined();
    await visitor.get(`/api/shared/${made.body.token}`);
    const listed = await designer.get(`/api/links?designId=${designId}`);
    expect(listed.body.links.find((link: { id: number }) => link.id === made.body.link.id).openCount).toBe(2);
  });

  it('sends a link read gzipped when asked, the same text again on a repeat, and plain text to a client that does not accept gzip', async () => {
    const made = await designer.post('/api/links').set(CLIENT).send({ designId });
    const url = `/api/shared/${made.body.token}`;
    const raw = (agent: ReturnType<TestApp['anonymous']>, encoding: string) =>
      agent
        .get(url)
        .set('Accept-Encoding', encoding)
        .buffer(true)
        .parse((response, done) => {
          const chunks: Buffer[] = [];
          response.on('data', (chunk: Buffer) => chunks.push(chunk));
          response.on('end', () => done(null, Buffer.concat(chunks)));
        });
    const first = await raw(t.anonymous(), 'gzip');
    const again = await raw(t.anonymous(), 'gzip');
    expect(first.headers['content-encoding']).toBe('gzip');
    expect(first.headers.vary).toMatch(/Accept-Encoding/i);
    expect(Buffer.compare(first.body as Buffer, again.body as Buffer)).toBe(0);
    // superagent has already inflated the gzip stream (a broken one would have failed the read).
    const text = (first.body as Buffer).toString('utf8');
    expect(JSON.parse(text).revision.document.profiles.length).toBeGreaterThan(0);
    const plain = await raw(t.anonymous(), 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect((plain.body as Buffer).toString('utf8')).toBe(text);
  });

  it('a pinned link keeps showing its revision after a new save', async () => {
    const latest = (await designer.get(`/api/designs/${designId}`)).body;
    const made = await designer.post('/api/links').set(CLIENT).send({ designId, revision: latest.revision.number });
    const saved = await designer.post(`/api/designs/${designId}/revisions`).set(CLIENT).send({ baseRevision: latest.revision.number, document: { ...latest.revision.document, name: 'Renamed after pin' } });
    expect(saved.status).toBe(201);
    const shown = await t.anonymous().get(`/api/shared/${made.body.token}`);
    expect(shown.body.revision.number).toBe(latest.revision.number);
    expect(shown.body.revision.document.name).toBe(latest.revision.document.name);
  });

  it('answers unknown, malformed, expired and revoked tokens with the same 404 body', async () => {
    const revoked = await designer.post('/api/links').set(CLIENT).send({ designId });
    await designer.delete(`/api/links/${revoked.body.link.id}`).set(CLIENT);
    const expiring = await designer.post('/api/links').set(CLIENT).send({ designId, expiresAt: new Date(Date.now() + 60_000).toISOString() });
    await t.db.models.ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: expiring.body.link.id } });
    const answers = await Promise.all(
      [revoked.body.token, expiring.body.token, 'A'.repeat(43), 'short'].map((token) => t.anonymous().get(`/api/shared/${token}`)),
    );
    for (const answer of answers) expect(answer.status).toBe(404);
    expect(new Set(answers.map((answer) => JSON.stringify(answer.body))).size).toBe(1);
  });

  it('refuses every write through a link, with or without the client header', async () => {
    const made = await designer.post('/api/links').set(CLIENT).send({ designId });
    for (const method of ['post', 'put', 'patch', 'delete'] as const) {
      const answer = await t.anonymous()[method](`/api/shared/${made.body.token}`).set(CLIENT).send({ document: {} });
      expect(answer.status).toBe(403);
      expect(answer.body.error.code).toBe('read_only_link');
    }
    // The link gives no session, so the signed-in write routes stay closed too.
    const save = await t.anonymous().post(`/api/designs/${designId}/revisions`).set(CLIENT).send({ baseRevision: 1, document: {} });
    expect(save.status).toBe(401);
  });

  it('e-mails the link when asked', async () => {
    const made = await designer.post('/api/links').set(CLIENT).send({ designId, email: 'visitor@example.com' });
    const mail = await waitForMail(t, (message) => message.to.includes('visitor@example.com'));
    expect(tokenOf(linkIn(mail, '/view/'))).toBe(made.body.token);
  });

  it('only its creator or the owner can revoke a link', async () => {
    const made = await designer.post('/api/links').set(CLIENT).send({ designId });
    expect((await instructor.delete(`/api/links/${made.body.link.id}`).set(CLIENT)).status).toBe(404);
    const owner = await t.signIn('owner');
    expect((await owner.delete(`/api/links/${made.body.link.id}`).set(CLIENT)).body.link.active).toBe(false);
  });

  it('refuses a pinned revision that does not exist and an expiry in the past', async () => {
    expect((await designer.post('/api/links').set(CLIENT).send({ designId, revision: 999 })).status).toBe(400);
    expect((await designer.post('/api/links').set(CLIENT).send({ designId, expiresAt: '2001-01-01T00:00:00Z' })).status).toBe(400);
  });
});

describe('link routes are rate limited', () => {
  it('answers 429 after the limit per address', async () => {
    const t = await buildTestApp({ linkRateLimit: { max: 3, windowMs: 60_000 } });
    try {
      const statuses: number[] = [];
      for (let index = 0; index < 5; index += 1) statuses.push((await t.anonymous().get(`/api/shared/${'B'.repeat(43)}`)).status);
      expect(statuses).toEqual([404, 404, 404, 429, 429]);
    } finally {
      await t.close();
    }
  });
});

describe('classes', () => {
  let t: TestApp;
  let instructor: Agent;
  let designId: number;

  beforeAll(async () => {
    t = await buildTestApp();
    instructor = await t.signIn('instructor');
    designId = (await instructor.get('/api/links/designs')).body.designs[0].id;
  });
  afterAll(() => t.close());

  it('groups links with a description and open counts; revoking the class stops every link in it', async () => {
    const made = await instructor.post('/api/classes').set(CLIENT).send({ name: 'Frames 101', description: 'Week 3: bracing' });
    expect(made.status).toBe(201);
    const classId = made.body.class.id;
    const first = await instructor.post(`/api/classes/${classId}/links`).set(CLIENT).send({ designId });
    const second = await instructor.post(`/api/classes/${classId}/links`).set(CLIENT).send({ designId, label: 'Bench' });
    expect(first.body.link.label).toBe('Frames 101');
    expect((await t.anonymous().get(`/api/shared/${first.body.token}`)).status).toBe(200);

    const listed = (await instructor.get('/api/classes')).body.classes.find((item: { id: number }) => item.id === classId);
    expect(listed.description).toBe('Week 3: bracing');
    expect(listed.links).toHaveLength(2);
    expect(listed.openCount).toBe(1);

    const revoked = await instructor.delete(`/api/classes/${classId}`).set(CLIENT);
    expect(revoked.body.class.active).toBe(false);
    expect(revoked.body.class.links.every((link: { active: boolean }) => !link.active)).toBe(true);
    for (const token of [first.body.token, second.body.token]) expect((await t.anonymous().get(`/api/shared/${token}`)).status).toBe(404);
  });

  it("a class's expiry ends its links", async () => {
    const made = await instructor.post('/api/classes').set(CLIENT).send({ name: 'Short course', expiresAt: new Date(Date.now() + 60_000).toISOString() });
    const link = await instructor.post(`/api/classes/${made.body.class.id}/links`).set(CLIENT).send({ designId });
    expect((await t.anonymous().get(`/api/shared/${link.body.token}`)).status).toBe(200);
    await t.db.models.Class.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: made.body.class.id } });
    expect((await t.anonymous().get(`/api/shared/${link.body.token}`)).status).toBe(404);
  });

  it("an instructor cannot see or change another instructor's class", async () => {
    const made = await instructor.post('/api/classes').set(CLIENT).send({ name: 'Mine' });
    const { User } = t.db.models;
    const other = await User.create({ email: 'second-instructor@example.com', displayName: 'Second', role: 'instructor', passwordHash: (await User.findOne({ where: { role: 'instructor' } }))!.passwordHash });
    const agent = await t.signInAs(other.email, 'slotwise-demo-2026');
    expect((await agent.get(`/api/classes/${made.body.class.id}`)).status).toBe(404);
    expect((await agent.delete(`/api/classes/${made.body.class.id}`).set(CLIENT)).status).toBe(404);
  });
});
