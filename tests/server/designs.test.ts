import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TINY_PNG_BASE64, TINY_PNG_DATA_URL, sampleDocument } from './helpers/fixtures';
import { buildTestApp, CLIENT, dataSnapshot, rowCounts, type Agent, type TestApp } from './helpers/testApp';

describe('designs and revisions', () => {
  let t: TestApp;
  let designer: Agent;
  let owner: Agent;
  beforeAll(async () => {
    t = await buildTestApp();
    designer = await t.signIn('designer');
    owner = await t.signIn('owner');
  });
  afterAll(() => t.close());

  it('lists the three seeded demo designs, owned by the designer', async () => {
    const response = await designer.get('/api/designs');
    expect(response.status).toBe(200);
    const byName = Object.fromEntries(response.body.designs.map((d: { name: string; systemId: string }) => [d.name, d]));
    expect(byName['Two-level printer enclosure'].systemId).toBe('metric-40');
    expect(byName['Standing workbench'].systemId).toBe('inch-1.5');
    expect(byName['Plant rack'].systemId).toBe('metric-20');
    expect(byName['Plant rack'].updatedBy.displayName).toBe('Tomasz Reyes');
  });

  it('gives every seeded demo design a drawn picture, so the list shows one before anyone opens the editor', async () => {
    const response = await designer.get('/api/designs');
    const seeded = response.body.designs.filter((d: { name: string }) => ['Two-level printer enclosure', 'Standing workbench', 'Plant rack'].includes(d.name));
    expect(seeded).toHaveLength(3);
    for (const design of seeded as { id: number; thumbnailUrl: string | null }[]) {
      expect(design.thumbnailUrl).toBe(`/api/designs/${design.id}/revisions/1/thumbnail`);
      const picture = await designer.get(design.thumbnailUrl!);
      expect(picture.status).toBe(200);
      expect(picture.headers['content-type']).toBe('image/png');
      const { data, info } = await sharp(Buffer.from(picture.body)).raw().toBuffer({ resolveWithObject: true });
      expect([info.width, info.height]).toEqual([320, 240]);
      // The frame is drawn: a good share of the picture is covered, the rest stays transparent.
      let covered = 0;
      for (let i = 3; i < data.length; i += 4) if (data[i] > 128) covered += 1;
      const share = covered / (info.width * info.height);
      expect(share).toBeGreaterThan(0.08);
      expect(share).toBeLessThan(0.8);
    }
  });

  it('creates an empty design when no document is sent, as revision 1', async () => {
    const response = await designer.post('/api/designs').set(CLIENT).send({ name: '  Bench stand ', systemId: 'metric-30', units: 'in' });
    expect(response.status).toBe(201);
    expect(response.body.design).toMatchObject({ name: 'Bench stand', systemId: 'metric-30', latestRevision: 1, profileCount: 0, thumbnailUrl: null });
    expect(response.body.design.updatedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect(response.body.revision).toMatchObject({ number: 1, message: null, createdBy: { displayName: 'Tomasz Reyes' } });
    expect(response.body.revision.document).toMatchObject({ schemaVersion: 3, name: 'Bench stand', systemId: 'metric-30', units: 'in', profiles: [] });
  });

  it('creates a design from a posted document and counts its profiles', async () => {
    const response = await designer.post('/api/designs').set(CLIENT).send({ name: 'Imported', systemId: 'metric-40', document: sampleDocument('Ignored name', 6) });
    expect(response.status).toBe(201);
    expect(response.body.design.profileCount).toBe(6);
    expect(response.body.revision.document.name).toBe('Imported');
    const got = await designer.get(`/api/designs/${response.body.design.id}`);
    expect(got.body.revision.document.profiles).toHaveLength(6);
  });

  it('gives back exactly the document it stored, from the save answer and from GET', async () => {
    const document = sampleDocument('Round trip', 5);
    const created = await designer.post('/api/designs').set(CLIENT).send({ name: 'Round trip', systemId: 'metric-40' });
    const id = created.body.design.id;
    const saved = await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 1, document, message: 'round trip' });
    expect(saved.status).toBe(201);
    // The save answers with the revision's details only (defect 12: echoing a 2,000-part document was slow).
    expect(saved.body.revision).not.toHaveProperty('document');
    expect(saved.body.revision).toMatchObject({ number: 2, message: 'round trip', profileCount: 5 });
    const latest = await designer.get(`/api/designs/${id}`);
    expect(latest.headers['content-type']).toMatch(/application\/json/);
    expect(latest.body.revision.document).toEqual(document);
    const { profileCount: _count, ...details } = saved.body.revision;
    expect(latest.body.revision).toEqual({ ...details, document });
    const byNumber = await designer.get(`/api/designs/${id}/revisions/2`);
    expect(byNumber.body).toEqual({ revision: latest.body.revision });
  });

  it('refuses an invalid document with 400, a field path into the document, and writes nothing', async () => {
    const before = await rowCounts(t.db);
    const document = sampleDocument('Bad');
    (document.profiles[1] as { length: number }).length = -20;
    const response = await designer.post('/api/designs').set(CLIENT).send({ name: 'Bad', systemId: 'metric-40', document });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('invalid_document');
    expect(response.body.error.fields['document.profiles.1.length']).toMatch(/at least 0.01 mm/);
    expect(await rowCounts(t.db)).toEqual(before);
  });

  it.each([
    [{ systemId: 'metric-40' }, 'name'],
    [{ name: 'X', systemId: 'metric-99' }, 'systemId'],
    [{ name: 'X'.repeat(121), systemId: 'metric-40' }, 'name'],
    [{ name: 'X', systemId: 'metric-40', units: 'cubits' }, 'units'],
  ])('refuses the bad new-design body %j with a message for %s and no new rows', async (body, field) => {
    const before = await rowCounts(t.db);
    const response = await designer.post('/api/designs').set(CLIENT).send(body);
    expect(response.status).toBe(400);
    expect(response.body.error.fields[field]).toMatch(/\w/);
    expect(await rowCounts(t.db)).toEqual(before);
  });

  it('saves a revision on the latest one with a thumbnail and a message', async () => {
    const created = await designer.post('/api/designs').set(CLIENT).send({ name: 'Saved twice', systemId: 'metric-40' });
    const id = created.body.design.id;
    const save = await designer
      .post(`/api/designs/${id}/revisions`)
      .set(CLIENT)
      .send({ baseRevision: 1, document: sampleDocument('Saved twice, renamed', 3), thumbnail: TINY_PNG_DATA_URL, message: 'Added three rails' });
    expect(save.status).toBe(201);
    expect(save.body.revision).toMatchObject({ number: 2, message: 'Added three rails', thumbnailUrl: `/api/designs/${id}/revisions/2/thumbnail` });

    const latest = await designer.get(`/api/designs/${id}`);
    expect(latest.body.design).toMatchObject({ latestRevision: 2, name: 'Saved twice, renamed', profileCount: 3, thumbnailUrl: `/api/designs/${id}/revisions/2/thumbnail` });

    const picture = await designer.get(`/api/designs/${id}/revisions/2/thumbnail`);
    expect(picture.status).toBe(200);
    expect(picture.headers['content-type']).toBe('image/png');
    expect(picture.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.from(picture.body).equals(Buffer.from(TINY_PNG_BASE64, 'base64'))).toBe(true);
    expect((await designer.get(`/api/designs/${id}/revisions/1/thumbnail`)).status).toBe(404);

    const list = await designer.get(`/api/designs/${id}/revisions`);
    expect(list.body.revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(list.body.revisions[0]).not.toHaveProperty('document');
    const first = await designer.get(`/api/designs/${id}/revisions/1`);
    expect(first.body.revision.document.name).toBe('Saved twice');
  });

  it('refuses a stale save with 409 stale_revision and the latest number, and loses nothing', async () => {
    const created = await designer.post('/api/designs').set(CLIENT).send({ name: 'Contested', systemId: 'metric-40' });
    const id = created.body.design.id;
    const ownerSave = await owner.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 1, document: sampleDocument('Owner version', 2) });
    expect(ownerSave.status).toBe(201);
    const before = await dataSnapshot(t.db);

    const stale = await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 1, document: sampleDocument('Designer version', 5) });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: 'stale_revision', latestRevision: 2 });
    expect(stale.body.error.message).toMatch(/revision 2/);
    expect(await dataSnapshot(t.db)).toBe(before);
    const latest = await designer.get(`/api/designs/${id}`);
    expect(latest.body.revision.document.name).toBe('Owner version');

    const rebased = await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 2, document: sampleDocument('Designer version', 5) });
    expect(rebased.status).toBe(201);
    expect(rebased.body.revision.number).toBe(3);
  });

  it.each([
    ['text that only claims to be PNG', `data:image/png;base64,${Buffer.from('GIF89a not really a png at all').toString('base64')}`, /not a PNG/],
    ['a JPEG data URL', 'data:image/jpeg;base64,/9j/4AAQSkZJRg==', /PNG data URL/],
    ['broken base64', 'data:image/png;base64,@@@@', /base64/],
    ['a PNG over 400 KB', `data:image/png;base64,${Buffer.concat([Buffer.from(TINY_PNG_BASE64, 'base64'), Buffer.alloc(401 * 1024)]).toString('base64')}`, /400 KB/],
  ])('refuses a thumbnail that is %s and writes nothing', async (_what, thumbnail, message) => {
    const before = await rowCounts(t.db);
    const response = await designer.post('/api/designs/1/revisions').set(CLIENT).send({ baseRevision: 1, document: sampleDocument(), thumbnail });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.thumbnail).toMatch(message);
    expect(await rowCounts(t.db)).toEqual(before);
  });

  it('refuses a save without baseRevision or document, naming each field', async () => {
    const response = await designer.post('/api/designs/1/revisions').set(CLIENT).send({ message: 'forgot everything' });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['baseRevision', 'document']);
  });

  it('deletes a design: it leaves the list and answers 404 afterwards', async () => {
    const created = await designer.post('/api/designs').set(CLIENT).send({ name: 'Short-lived', systemId: 'metric-20' });
    const id = created.body.design.id;
    expect((await designer.delete(`/api/designs/${id}`).set(CLIENT)).status).toBe(204);
    expect((await designer.get(`/api/designs/${id}`)).status).toBe(404);
    const list = await designer.get('/api/designs');
    expect(list.body.designs.some((d: { id: number }) => d.id === id)).toBe(false);
    const save = await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 1, document: sampleDocument() });
    expect(save.status).toBe(404);
  });

  it('answers 404 for a design that does not exist and 400 for an id that is not a number', async () => {
    expect((await designer.get('/api/designs/424242')).status).toBe(404);
    expect((await designer.get('/api/designs/1/revisions/99')).status).toBe(404);
    const bad = await designer.get('/api/designs/first');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['params.id']).toMatch(/whole number/);
  });
});
