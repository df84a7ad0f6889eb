import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createEmptyDesign } from '@/domain/design/create';
import { generateDesign } from '@/domain/design/generators';
import { parseDesignDocument } from '@/domain/design/parse';
import { defaultCatalogue } from '@/domain/catalogue';
import { CURRENT_SCHEMA_VERSION, type DesignDocument } from '@/domain/design/schema';
import { designDocumentJsonSchemaText } from '@/domain/design/writeJsonSchema';

const docsDir = fileURLToPath(new URL('../../docs/', import.meta.url));

function exampleFromDocs(): unknown {
  const md = readFileSync(`${docsDir}design-format.md`, 'utf8');
  const block = md.match(/```json\n([\s\S]*?)```/);
  if (!block) throw new Error('design-format.md has no JSON example');
  return JSON.parse(block[1]);
}

function baseDesign(): DesignDocument {
  const parsed = parseDesignDocument(exampleFromDocs());
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.design;
}

function errorsOf(json: unknown) {
  const r = parseDesignDocument(json);
  return r.ok ? [] : r.errors;
}

describe('parseDesignDocument', () => {
  it('accepts the table frame example of the format documentation and fills in defaults', () => {
    const design = baseDesign();
    expect(design.profiles).toHaveLength(8);
    expect(design.joints).toHaveLength(8);
    expect(design.settings.kerf).toBe(3);
    expect(design.profiles[0].rollDeg).toBe(0);
    expect(design.joints[0].fastenerHead).toBe('button');
  });

  it('migrates a version 0 document with from/to profiles to start, direction and length', () => {
    const v0 = {
      schemaVersion: 0,
      name: 'Old rail',
      systemId: 'metric-40',
      profiles: [{ id: 'p-1', variantId: 'm40-40x40', from: [0, 100, 0], to: [0, 100, -500] }],
    };
    const r = parseDesignDocument(v0);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.design.schemaVersion).toBe(CURRENT_SCHEMA_VERSION);
    expect(r.design.profiles[0]).toMatchObject({ start: [0, 100, 0], direction: [0, 0, -1], length: 500 });
    expect(r.design.profiles[0]).not.toHaveProperty('from');
  });

  it('explains a version 0 profile whose ends coincide', () => {
    const errors = errorsOf({ schemaVersion: 0, name: 'x', systemId: 'metric-40', profiles: [{ id: 'p', variantId: 'm40-40x40', from: [1, 2, 3], to: [1, 2, 3] }] });
    expect(errors).toEqual([{ path: 'profiles.0', message: expect.stringMatching(/no length/) }]);
  });

  it('refuses a document from a newer version and one without a version, saying what to do', () => {
    expect(errorsOf({ schemaVersion: 99, name: 'x', systemId: 'metric-40' })[0].message).toMatch(/newer Slotwise/);
    expect(errorsOf({ name: 'x', systemId: 'metric-40' })[0]).toEqual({ path: 'schemaVersion', message: expect.stringMatching(/"schemaVersion": 3/) });
  });

  it('refuses text that is not JSON and JSON that is not an object', () => {
    expect(errorsOf('{ nope')[0].message).toMatch(/not valid JSON/);
    expect(errorsOf([1, 2])[0].message).toMatch(/JSON object/);
  });

  it('points at the field of a shape error with a dotted path', () => {
    const json = exampleFromDocs() as { profiles: { length: number }[] };
    json.profiles[2].length = -5;
    expect(errorsOf(json)).toContainEqual({ path: 'profiles.2.length', message: 'Must be at least 0.01 mm' });
  });

  it('rejects an id used twice anywhere in the document', () => {
    const json = exampleFromDocs() as { joints: { id: string }[]; accessories: { id: string }[] };
    json.accessories[0].id = 'j-1';
    const errors = errorsOf(json);
    expect(errors).toContainEqual({ path: 'accessories.0.id', message: expect.stringMatching(/"j-1" is already used at joints\.0\.id/) });
  });

  it('rejects references to parts that do not exist', () => {
    const design = baseDesign();
    const broken = {
      ...design,
      joints: [{ ...design.joints[0], members: [{ profileId: 'ghost', at: 'start' }, design.joints[0].members[1]] }, ...design.joints.slice(1)],
      panels: [
        {
          id: 'panel-1', materialId: 'acrylic', thickness: 6, mounting: 'captured', role: 'panel', cutouts: [],
          boundedBy: ['rail-back', 'rail-front', 'leg-bl', 'nowhere'],
          rect: { center: [0, 700, 0], normal: 'y', width: 520, height: 320 },
        },
      ],
      accessories: [...design.accessories, { id: 'acc-x', kind: 'handle', partId: 'm40-handle', panelId: 'panel-404', quantity: 1 }],
      steps: [{ id: 'step-1', title: 'Frame', partIds: ['leg-bl', 'phantom'] }],
      loadCases: [{ id: 'lc', name: 'Load', support: 'simple', loads: [{ kind: 'point', profileId: 'missing', along: 10, force: 100, direction: [0, -1, 0] }] }],
    };
    const paths = errorsOf(broken).map((e) => e.path);
    expect(paths).toEqual(
      expect.arrayContaining(['joints.0.members.0.profileId', 'panels.0.boundedBy.3', 'accessories.8.panelId', 'steps.0.partIds.1', 'loadCases.0.loads.0.profileId']),
    );
  });

  it('rejects catalogue ids the catalogue does not have', () => {
    const design = baseDesign();
    const broken = {
      ...design,
      systemId: 'metric-99',
      profiles: [{ ...design.profiles[0], variantId: 'm40-40x41' }, ...design.profiles.slice(1)],
      joints: [{ ...design.joints[0], connectorId: 'm40-glue' }, ...design.joints.slice(1)],
      accessories: [{ ...design.accessories[0], partId: 'm40-rocket' }, ...design.accessories.slice(1)],
    };
    const errors = errorsOf(broken);
    expect(errors.map((e) => e.path)).toEqual(expect.arrayContaining(['systemId', 'profiles.0.variantId', 'joints.0.connectorId', 'accessories.0.partId']));
    expect(errors.find((e) => e.path === 'profiles.0.variantId')!.message).toMatch(/unknown profile variant "m40-40x41"/);
  });
});

describe('createEmptyDesign', () => {
  it('starts a design in the chosen system with its alloy, demo stock length and unit family', () => {
    const d = createEmptyDesign({ name: 'New bench', systemId: 'inch-1.5' });
    expect(d).toMatchObject({ schemaVersion: 3, name: 'New bench', systemId: 'inch-1.5', units: 'in', profiles: [] });
    expect(d.settings.stockLength).toBeGreaterThan(3000);
    expect(parseDesignDocument(JSON.parse(JSON.stringify(d)))).toEqual({ ok: true, design: d });
    expect(createEmptyDesign({ name: 'x', systemId: 'metric-20', units: 'in' }).units).toBe('in');
  });

  it('refuses a system the catalogue does not have', () => {
    expect(() => createEmptyDesign({ name: 'x', systemId: 'metric-99' })).toThrow(/Unknown profile system "metric-99"/);
  });
});

describe('export and import', () => {
  it('a generated design survives JSON export and import unchanged', () => {
    const systems = fc.constantFrom('inch-1.0', 'inch-1.5', 'metric-20', 'metric-30', 'metric-40', 'metric-45');
    const arbitrary = fc.record({
      kind: fc.constantFrom('box-frame', 'table', 'shelf-unit', 'cabinet', 'enclosure'),
      systemId: systems,
      width: fc.integer({ min: 400, max: 2000 }),
      depth: fc.integer({ min: 300, max: 1200 }),
      height: fc.integer({ min: 900, max: 2200 }),
      feet: fc.constantFrom('leveling-foot', 'caster', 'none'),
    });
    fc.assert(
      fc.property(arbitrary, ({ kind, ...params }) => {
        const design = generateDesign(kind, params);
        const text = JSON.stringify(design);
        const back = parseDesignDocument(JSON.parse(text));
        expect(back.ok).toBe(true);
        if (back.ok) expect(back.design).toEqual(design);
        expect(JSON.stringify(back.ok && back.design) === text).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});

describe('published JSON Schema', () => {
  it('the committed docs/design-format.schema.json equals the one generated from the zod schema', () => {
    const committed = readFileSync(`${docsDir}design-format.schema.json`, 'utf8');
    expect(committed).toBe(designDocumentJsonSchemaText());
  });
});

describe('inch catalogue ids named by nominal size (schema version 2)', () => {
  it('migrates a stored version 1 document to the new ids on read, leaving the user’s own ids and labels alone', () => {
    const stored = {
      schemaVersion: 1,
      name: 'Old inch bench',
      systemId: 'inch-1.5',
      units: 'in',
      profiles: [
        { id: 'i15-leg', label: 'i15 leg', variantId: 'i15-1.5x1.5', length: 900, start: [0, 0, 0], direction: [0, 1, 0] },
        { id: 'rail', variantId: 'i15-1.5x3', length: 600, start: [19.05, 880, 0], direction: [1, 0, 0] },
      ],
      joints: [{ id: 'j1', kind: 'corner-bracket', connectorId: 'i15-corner-bracket', members: [{ profileId: 'rail', at: 'start' }, { profileId: 'i15-leg', at: 'span', along: 880 }] }],
      accessories: [{ id: 'foot', kind: 'leveling-foot', partId: 'i15-leveling-foot', profileId: 'i15-leg', end: 'start' }],
    };
    const r = parseDesignDocument(stored);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.design.schemaVersion).toBe(CURRENT_SCHEMA_VERSION);
    expect(r.design.profiles.map((p) => p.variantId)).toEqual(['in-1.5x1.5', 'in-1.5x3']);
    expect(r.design.joints[0].connectorId).toBe('in1.5-corner-bracket');
    expect(r.design.accessories[0].partId).toBe('in1.5-leveling-foot');
    expect(r.design.profiles[0].id).toBe('i15-leg');
    expect(r.design.profiles[0].label).toBe('i15 leg');
    expect(r.design.joints[0].members[1].profileId).toBe('i15-leg');
  });

  it('names the inch variants by nominal size', () => {
    expect(defaultCatalogue.variants.filter((v) => v.systemId.startsWith('inch')).map((v) => v.name)).toEqual([
      '1 in square profile',
      '1 x 2 in profile',
      '1.5 in square profile',
      '1.5 x 3 in profile',
    ]);
  });
});
