import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleDocument } from './helpers/fixtures';
import { buildTestApp, CLIENT, type Agent, type TestApp } from './helpers/testApp';

const SAVES = 20;

describe('20 saves to one design', () => {
  let t: TestApp;
  let designer: Agent;
  let owner: Agent;
  beforeAll(async () => {
    t = await buildTestApp();
    designer = await t.signIn('designer');
    owner = await t.signIn('owner');
  });
  afterAll(() => t.close());

  async function newDesign(name: string): Promise<number> {
    const response = await designer.post('/api/designs').set(CLIENT).send({ name, systemId: 'metric-40' });
    return response.body.design.id;
  }

  async function storedRevisions(designId: number): Promise<{ number: number; name: string }[]> {
    const rows = await t.db.models.DesignRevision.findAll({ where: { designId }, order: [['number', 'ASC']] });
    return rows.map((row) => ({ number: row.number, name: JSON.parse(row.document).name }));
  }

  it('keeps every one of 20 sequential saves, each based on the one before, numbered 2 to 21', async () => {
    const id = await newDesign('Sequential');
    for (let i = 0; i < SAVES; i += 1) {
      const response = await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: i + 1, document: sampleDocument(`Sequential ${i}`) });
      expect(response.status).toBe(201);
      expect(response.body.revision.number).toBe(i + 2);
    }
    const stored = await storedRevisions(id);
    expect(stored.map((r) => r.number)).toEqual(Array.from({ length: SAVES + 1 }, (_, i) => i + 1));
    expect(stored.at(-1)!.name).toBe(`Sequential ${SAVES - 1}`);
  });

  it('accepts exactly one of 20 racing saves on the same base; the others get 409 and the accepted one is stored', async () => {
    const id = await newDesign('Racing');
    const responses = await Promise.all(
      Array.from({ length: SAVES }, (_, i) =>
        (i % 2 ? owner : designer).post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 1, document: sampleDocument(`Racer ${i}`) }),
      ),
    );
    const accepted = responses.filter((r) => r.status === 201);
    const refused = responses.filter((r) => r.status === 409);
    expect(accepted).toHaveLength(1);
    expect(refused).toHaveLength(SAVES - 1);
    for (const r of refused) expect(r.body.error).toMatchObject({ code: 'stale_revision', latestRevision: 2 });
    const stored = await storedRevisions(id);
    expect(stored.map((r) => r.number)).toEqual([1, 2]);
    expect(stored[1].name).toBe(`Racer ${responses.indexOf(accepted[0])}`);
  });

  it('loses no acknowledged save when 20 racing clients retry on 409 with the latest revision', async () => {
    const id = await newDesign('Retrying');
    const acknowledged: { number: number; name: string }[] = [];
    await Promise.all(
      Array.from({ length: SAVES }, async (_, i) => {
        const agent = i % 2 ? owner : designer;
        let base = 1;
        for (let attempt = 0; attempt < 100; attempt += 1) {
          const response = await agent.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: base, document: sampleDocument(`Writer ${i}`) });
          if (response.status === 201) {
            acknowledged.push({ number: response.body.revision.number, name: `Writer ${i}` });
            return;
          }
          expect(response.status).toBe(409);
          base = response.body.error.latestRevision;
        }
        throw new Error(`Writer ${i} never got its save in`);
      }),
    );
    expect(acknowledged).toHaveLength(SAVES);
    const numbers = acknowledged.map((a) => a.number);
    expect(new Set(numbers).size).toBe(SAVES);
    const stored = await storedRevisions(id);
    expect(stored).toHaveLength(SAVES + 1);
    for (const ack of acknowledged) expect(stored.find((r) => r.number === ack.number)?.name).toBe(ack.name);
    const design = await t.db.models.Design.findByPk(id);
    expect(design!.latestRevision).toBe(SAVES + 1);
  });
});
