import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultCatalogue, getSystem, getVariant } from '@/domain/catalogue';
import { freeEnds } from '@/domain/design/endTreatments';
import { generateDesign, generators, GeneratorParamsError, tryGenerateDesign } from '@/domain/design/generators';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument } from '@/domain/design/schema';
import { demoDesigns } from '@/domain/fixtures';
import { demoDesignBuilders } from '@/domain/fixtures/demoDesigns';
import { profileBoundingBox } from '@/domain/geometry/profileGeometry';

/** Pairs of profiles whose boxes overlap by more than 0.01 mm (all pairs: fine for small designs). */
function overlappingProfiles(design: DesignDocument): string[] {
  const boxes = design.profiles.map((p) => {
    const v = getVariant(defaultCatalogue, p.variantId)!;
    return { id: p.id, b: profileBoundingBox(p, v.width, v.height) };
  });
  const out: string[] = [];
  for (let i = 0; i < boxes.length; i++)
    for (let j = i + 1; j < boxes.length; j++) {
      const a = boxes[i].b;
      const c = boxes[j].b;
      const overlap = Math.min(
        Math.min(a.maxX, c.maxX) - Math.max(a.minX, c.minX),
        Math.min(a.maxY, c.maxY) - Math.max(a.minY, c.minY),
        Math.min(a.maxZ, c.maxZ) - Math.max(a.minZ, c.minZ),
      );
      if (overlap > 0.01) out.push(`${boxes[i].id}/${boxes[j].id}`);
    }
  return out;
}

function stepIndexOf(design: DesignDocument): Map<string, number> {
  const index = new Map<string, number>();
  design.steps.forEach((s, i) => s.partIds.forEach((id) => index.set(id, i)));
  return index;
}

function expectSoundFrame(design: DesignDocument) {
  const parsed = parseDesignDocument(JSON.parse(JSON.stringify(design)));
  expect(parsed.ok ? [] : parsed.errors).toEqual([]);
  expect(overlappingProfiles(design)).toEqual([]);
  expect(freeEnds(design)).toEqual([]);
  const system = getSystem(defaultCatalogue, design.systemId)!;
  for (const panel of design.panels.filter((p) => p.mounting === 'captured')) {
    expect(panel.thickness, panel.label).toBeLessThan(system.slotOpening);
  }
}

describe('generators', () => {
  it('lists five generators with names, parameter schemas and defaults that validate', () => {
    expect(generators.map((g) => g.id)).toEqual(['box-frame', 'table', 'shelf-unit', 'cabinet', 'enclosure']);
    for (const g of generators) {
      expect(g.name.length).toBeGreaterThan(3);
      expect(g.paramsSchema.safeParse(g.defaults).success, g.id).toBe(true);
    }
  });

  it('produces designs from the defaults that parse, have every end joined or capped and no overlapping profiles', () => {
    for (const g of generators) expectSoundFrame(generateDesign(g.id, g.defaults));
  });

  it('produces sound frames for random sizes in every system', () => {
    const arbitrary = fc.record({
      kind: fc.constantFrom('box-frame', 'table', 'shelf-unit', 'cabinet', 'enclosure'),
      systemId: fc.constantFrom('inch-1.0', 'inch-1.5', 'metric-20', 'metric-30', 'metric-40', 'metric-45'),
      width: fc.integer({ min: 300, max: 2400 }),
      depth: fc.integer({ min: 300, max: 1200 }),
      height: fc.integer({ min: 800, max: 2400 }),
      feet: fc.constantFrom('leveling-foot', 'caster', 'none'),
    });
    fc.assert(
      fc.property(arbitrary, ({ kind, ...params }) => {
        expectSoundFrame(generateDesign(kind, params));
      }),
      { numRuns: 30 },
    );
  });

  it('uses a 40 x 80 rail variant upright without overlaps', () => {
    const d = generateDesign('box-frame', { systemId: 'metric-40', variantId: 'm40-40x80', width: 800, depth: 600, height: 700, panels: 'walls' });
    expectSoundFrame(d);
    expect(d.profiles.filter((p) => p.variantId === 'm40-40x80')).toHaveLength(8);
  });

  it('gives every profile, joint and panel exactly one assembly step', () => {
    for (const g of generators) {
      const d = generateDesign(g.id, g.defaults);
      const placed = d.steps.flatMap((s) => s.partIds);
      for (const id of [...d.profiles, ...d.joints, ...d.panels, ...d.accessories].map((x) => x.id)) {
        expect(placed.filter((x) => x === id), `${g.id}: ${id}`).toHaveLength(1);
      }
    }
  });

  it('places each captured panel before a member that closes its slot', () => {
    for (const kind of ['box-frame', 'table', 'shelf-unit', 'enclosure']) {
      const d = generateDesign(kind, { ...generators.find((g) => g.id === kind)!.defaults, panels: 'closed' });
      const at = stepIndexOf(d);
      for (const panel of d.panels.filter((p) => p.mounting === 'captured')) {
        const closing = Math.max(...panel.boundedBy!.map((id) => at.get(id)!));
        expect(at.get(panel.id)!, `${kind}: ${panel.label}`).toBeLessThan(closing);
      }
    }
  });

  it('builds the cabinet from two side frames that are joined from the sides after the shelves go in', () => {
    const d = generateDesign('cabinet', { systemId: 'metric-30', width: 800, depth: 500, height: 1000, shelves: 2 });
    expect(d.subAssemblies).toHaveLength(2);
    const [left, right] = d.subAssemblies;
    expect(left).toMatchObject({ name: 'Left side frame', buildOrientation: 'on-side', joinDirection: [1, 0, 0] });
    expect(right).toMatchObject({ name: 'Right side frame', buildOrientation: 'on-side', joinDirection: [-1, 0, 0] });
    expect(left.profileIds).toHaveLength(2 + 4);
    const joinStep = d.steps.findIndex((s) => s.subAssemblyId === right.id && s.kind === 'join');
    expect(joinStep).toBeGreaterThan(0);
    const at = stepIndexOf(d);
    const inside = d.panels.filter((p) => p.role === 'shelf' || p.label?.startsWith('Back'));
    expect(inside.length).toBeGreaterThan(2);
    for (const p of inside) expect(at.get(p.id)!).toBeLessThan(joinStep);
  });

  it('hangs each enclosure door on hinges with a handle and a latch', () => {
    const d = generateDesign('enclosure', { systemId: 'metric-40', width: 700, depth: 650, height: 1400, compartments: 2 });
    const doors = d.panels.filter((p) => p.role === 'door');
    expect(doors).toHaveLength(2);
    for (const door of doors) {
      const parts = d.accessories.filter((a) => a.panelId === door.id).map((a) => a.kind).sort();
      expect(parts).toEqual(['handle', 'hinge', 'hinge', 'latch']);
      expect(door.mounting).toBe('face');
    }
  });

  it('explains parameters it cannot build, naming the profile size', () => {
    const r = tryGenerateDesign('box-frame', { systemId: 'metric-40', width: 100, depth: 400, height: 60 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toContainEqual({ path: 'width', message: 'Width must be at least 3 × the profile size (120 mm)' });
    expect(r.errors.find((e) => e.path === 'height')!.message).toMatch(/^Height must be at least 120 mm/);
    expect(() => generateDesign('table', { systemId: 'metric-40', variantId: 'in-1x2', width: 900, depth: 600, height: 800 })).toThrow(GeneratorParamsError);
    expect(tryGenerateDesign('rocket', {})).toEqual({ ok: false, errors: [{ path: '', message: expect.stringMatching(/Unknown generator "rocket"/) }] });
    const shelves = tryGenerateDesign('shelf-unit', { systemId: 'metric-45', width: 800, depth: 400, height: 600, shelves: 12 });
    expect(shelves.ok ? '' : shelves.errors[0].message).toMatch(/Too many shelves/);
    const thick = tryGenerateDesign('table', { systemId: 'metric-20', width: 600, depth: 400, height: 700, shelfMaterialId: 'plywood' });
    expect(thick.ok ? [] : thick.errors).toEqual([{ path: 'shelfMaterialId', message: expect.stringMatching(/not listed thin enough for the Metric 20 mm slot \(6 mm opening\)/) }]);
  });
});

describe('demo designs of Harbor Lane Fabrication', () => {
  it('holds the three demo designs in their systems, each with a load case', () => {
    expect(demoDesigns.map((d) => [d.name, d.systemId])).toEqual([
      ['Two-level printer enclosure', 'metric-40'],
      ['Standing workbench', 'inch-1.5'],
      ['Plant rack', 'metric-20'],
    ]);
    for (const d of demoDesigns) {
      expectSoundFrame(d);
      expect(d.loadCases.length).toBeGreaterThan(0);
    }
  });

  it('loads the printer enclosure with 40 kg and gives it acrylic doors', () => {
    const d = demoDesigns[0];
    const total = d.loadCases[0].loads.reduce((sum, l) => sum + (l.kind === 'uniform' ? l.totalForce : l.force), 0);
    // 40 kg x standard gravity 9.80665 m/s² (exact by definition).
    expect(total).toBeCloseTo(40 * 9.80665, 2);
    expect(d.panels.filter((p) => p.role === 'door').every((p) => p.materialId === 'acrylic')).toBe(true);
  });

  it('gives the workbench a lower shelf and the plant rack three shelves', () => {
    expect(demoDesigns[1].panels.filter((p) => p.role === 'shelf' && p.mounting === 'captured')).toHaveLength(1);
    expect(demoDesigns[2].panels.filter((p) => p.role === 'shelf')).toHaveLength(3);
  });

  it('keeps the committed fixture files equal to what the generators make now', () => {
    for (const [file, build] of Object.entries(demoDesignBuilders)) {
      const committed = readFileSync(fileURLToPath(new URL(`../../src/domain/fixtures/${file}`, import.meta.url)), 'utf8');
      const parsed = parseDesignDocument(JSON.parse(JSON.stringify(build())));
      expect(parsed.ok).toBe(true);
      expect(committed === `${JSON.stringify(parsed.ok && parsed.design, null, 2)}\n`, `${file} is stale: run npx tsx src/domain/fixtures/writeFixtures.ts`).toBe(true);
    }
  });
});
