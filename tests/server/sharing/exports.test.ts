import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { analyzeDesign } from '../../../src/domain/analysis/analyze';
import { demoDesigns } from '../../../src/domain/fixtures';
import { buildTestApp, CLIENT, type Agent, type TestApp } from '../helpers/testApp';

describe('exports, import and revision diff', () => {
  let t: TestApp;
  let designer: Agent;

  beforeAll(async () => {
    t = await buildTestApp();
    designer = await t.signIn('designer');
  });
  afterAll(() => t.close());

  it.each(demoDesigns.map((design) => [design.name, design] as const))('exporting then importing "%s" gives back the same document', async (_name, design) => {
    const created = await designer.post('/api/designs/import').set(CLIENT).send({ document: design });
    expect(created.status).toBe(201);
    const exported = await designer.get(`/api/designs/${created.body.design.id}/export/design.json`).buffer(true).parse((res, callback) => {
      let text = '';
      res.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
      res.on('end', () => callback(null, text));
    });
    expect(exported.headers['content-disposition']).toMatch(/^attachment; filename="?[a-z0-9-]+-r1\.json"?$/);
    const reimported = await designer.post('/api/designs/import').set(CLIENT).send({ document: JSON.parse(exported.body as string) });
    const again = await designer.get(`/api/designs/${reimported.body.design.id}`);
    expect(again.body.revision.document).toEqual(design);
  });

  it('refuses a broken file with the path of the problem, and writes nothing', async () => {
    const before = await t.db.models.Design.count();
    const bad = structuredClone(demoDesigns[0]) as unknown as { profiles: { length: unknown }[] };
    bad.profiles[0].length = 'long';
    const answer = await designer.post('/api/designs/import').set(CLIENT).send({ document: bad });
    expect(answer.status).toBe(400);
    expect(answer.body.error.code).toBe('invalid_document');
    expect(Object.keys(answer.body.error.fields)).toContain('document.profiles.0.length');
    expect(await t.db.models.Design.count()).toBe(before);
  });

  it('exports the bill of materials and cut list as CSV whose quantities match the analysis', async () => {
    const created = await designer.post('/api/designs/import').set(CLIENT).send({ document: demoDesigns[0] });
    const id = created.body.design.id;
    const analysis = (await designer.post('/api/analysis').set(CLIENT).send({ document: demoDesigns[0] })).body.analysis;
    const bom = await designer.get(`/api/designs/${id}/export/bom.csv`);
    expect(bom.headers['content-type']).toMatch(/^text\/csv/);
    const bomRows = Papa.parse<Record<string, string>>(bom.text, { header: true, skipEmptyLines: true }).data;
    expect(bomRows.length).toBe(analysis.bom.length);
    const cut = await designer.get(`/api/designs/${id}/export/cutlist.csv`);
    const cutRows = Papa.parse<Record<string, string>>(cut.text, { header: true, skipEmptyLines: true }).data;
    expect(cutRows.reduce((sum, row) => sum + Number(row.quantity), 0)).toBe(demoDesigns[0].profiles.length);
  });

  it('compares two revisions: a lengthened profile shows as one cut length less and one more', async () => {
    const created = await designer.post('/api/designs/import').set(CLIENT).send({ document: demoDesigns[0] });
    const id = created.body.design.id;
    const changed = structuredClone(demoDesigns[0]);
    const profile = changed.profiles[0];
    const oldLength = profile.length;
    profile.length = oldLength + 37;
    const saved = await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: 1, document: changed });
    if (saved.status !== 201) {
      // A longer profile may collide with its neighbours; the check refuses only invalid documents, not clashes.
      expect(saved.status).toBe(201);
    }
    const diff = (await designer.get(`/api/designs/${id}/diff?from=1&to=2`)).body;
    expect(diff.cutList).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ variantId: profile.variantId, length: Math.round((oldLength + 37) * 10) / 10, change: 1 }),
      ]),
    );
    expect(diff.cutList.some((row: { change: number }) => row.change === -1)).toBe(true);
    const code = analyzeDesign(demoDesigns[0]).bom.find((line) => line.partIds?.includes(profile.id))!.code;
    const metres = diff.bom.find((row: { code: string }) => row.code === code);
    // 37 mm more of that profile, in metres; the bill of materials rounds metres to 10 mm.
    expect(Math.abs(metres.change - 0.037)).toBeLessThanOrEqual(0.01);
  });
});
