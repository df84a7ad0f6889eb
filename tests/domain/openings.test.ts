import { describe, expect, it } from 'vitest';
import { createEmptyDesign } from '@/domain/design/create';
import { generateDesign } from '@/domain/design/generators';
import { addPanel, addProfile } from '@/domain/design/operations';
import { findOpenings, openingBoundedBy } from '@/domain/design/openings';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument, Vec3 } from '@/domain/design/schema';

type P = { id: string; start: Vec3; direction: Vec3; length: number; variantId?: string };
function design(profiles: P[]): DesignDocument {
  return profiles.reduce((d, p) => addProfile(d, p), createEmptyDesign({ name: 'Openings', systemId: 'metric-40' }));
}

/** A 500 x 400 mm rectangle in the XY plane (z = 0) of 40 mm profiles. */
const rectangle: P[] = [
  { id: 'left', start: [-230, 0, 0], direction: [0, 1, 0], length: 400 },
  { id: 'right', start: [230, 0, 0], direction: [0, 1, 0], length: 400 },
  { id: 'bottom', start: [-210, 20, 0], direction: [1, 0, 0], length: 420 },
  { id: 'top', start: [-210, 380, 0], direction: [1, 0, 0], length: 420 },
];

describe('findOpenings', () => {
  it('finds the opening of a rectangle frame with its clear size between inner faces', () => {
    const openings = findOpenings(design(rectangle));
    expect(openings).toHaveLength(1);
    const [o] = openings;
    expect(o.boundedBy).toEqual(['bottom', 'top', 'left', 'right']);
    // Inner faces: x from -210 to 210, y from 40 to 360.
    expect(o.rect).toEqual({ center: [0, 200, 0], normal: 'z', width: 420, height: 320 });
  });

  it('splits a frame with a middle rail into two openings and not the whole', () => {
    const openings = findOpenings(design([...rectangle, { id: 'middle', start: [-210, 200, 0], direction: [1, 0, 0], length: 420 }]));
    expect(openings.map((o) => o.boundedBy.slice(0, 2).join('/')).sort()).toEqual(['bottom/middle', 'middle/top']);
    expect(openings.map((o) => o.rect.height)).toEqual([140, 140]);
  });

  it('finds nothing when one side of the rectangle is missing', () => {
    expect(findOpenings(design(rectangle.slice(0, 3)))).toEqual([]);
  });

  it('finds the six faces of a box frame', () => {
    const box = generateDesign('box-frame', { systemId: 'metric-30', width: 600, depth: 400, height: 500 });
    const openings = findOpenings(box);
    expect(openings).toHaveLength(6);
    expect(openings.map((o) => o.rect.normal).sort()).toEqual(['x', 'x', 'y', 'y', 'z', 'z']);
    const front = openings.find((o) => o.rect.normal === 'z' && o.rect.center[2] < 0)!;
    expect(front.rect.width).toBe(600 - 2 * 30);
    expect(front.rect.height).toBe(500 - 2 * 30);
  });

  it('gives openings that match the panels the generators place', () => {
    const shelves = generateDesign('shelf-unit', { systemId: 'metric-20', width: 600, depth: 300, height: 900, shelves: 3 });
    const openings = findOpenings(shelves);
    for (const panel of shelves.panels) {
      const o = openingBoundedBy(openings, panel.boundedBy!);
      expect(o, panel.label).toBeDefined();
      expect(o!.rect).toEqual(panel.rect);
    }
  });

  it('lets a person drop a captured panel into a found opening', () => {
    const d = design(rectangle);
    const [o] = findOpenings(d);
    const next = addPanel(d, { materialId: 'acrylic', thickness: 6, mounting: 'captured', boundedBy: o.boundedBy, rect: o.rect });
    const parsed = parseDesignDocument(JSON.parse(JSON.stringify(next)));
    expect(parsed.ok).toBe(true);
    expect(next.panels[0]).toMatchObject({ boundedBy: ['bottom', 'top', 'left', 'right'], rect: o.rect });
  });
});
