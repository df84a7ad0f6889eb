/**
 * Bench-side generator: a floor grid of box cells (metric 40), each a correct frame of four legs
 * on feet and eight rails joined with inside corner brackets, with captured back and side panels.
 * About 12 profiles, 16 connectors, 32 screws, 32 T-nuts and 1.8 panels per cell, so 2,000
 * profiles come with ~8,000 connectors and screws and ~300 panels (quality.md workload).
 * `overlapEvery` adds a deliberately overlapping profile in every n-th cell so the interference
 * check has something to find.
 */
import { designDocumentSchema, type DesignDocument } from '../src/domain/design/schema';

type Profile = DesignDocument['profiles'][number];
type Joint = DesignDocument['joints'][number];
type Panel = DesignDocument['panels'][number];
type Accessory = DesignDocument['accessories'][number];

const V = 'm40-40x40';
const CELL_W = 600;
const CELL_D = 400;
const CELL_H = 600;
const GAP = 20;
const PROFILES_PER_CELL = 12;

export interface LargeFrameOptions {
  profiles: number;
  overlapEvery?: number;
}

export function largeFrame(o: LargeFrameOptions): DesignDocument {
  const cells = Math.max(1, Math.round(o.profiles / PROFILES_PER_CELL));
  const columns = Math.ceil(Math.sqrt(cells));
  const profiles: Profile[] = [];
  const joints: Joint[] = [];
  const panels: Panel[] = [];
  const accessories: Accessory[] = [];
  const profile = (id: string, length: number, start: [number, number, number], direction: [number, number, number], machining: Profile['machining'] = []): void => {
    profiles.push({ id, variantId: V, length, start, direction, rollDeg: 0, machining });
  };
  const bracket = (id: string, railId: string, at: 'start' | 'end', legId: string, along: number): void => {
    joints.push({
      id,
      kind: 'corner-bracket',
      connectorId: 'm40-corner-bracket',
      members: [
        { profileId: railId, at },
        { profileId: legId, at: 'span', along },
      ],
      fastenerHead: 'button',
      tNut: 'drop-in',
      quantity: 1,
    });
  };
  for (let c = 0; c < cells; c++) {
    const ox = (c % columns) * (CELL_W + GAP);
    const oz = Math.floor(c / columns) * (CELL_D + GAP);
    const p = `c${c}-`;
    const legs: [string, number, number][] = [
      [`${p}L1`, ox + 20, oz + 20],
      [`${p}L2`, ox + CELL_W - 20, oz + 20],
      [`${p}L3`, ox + CELL_W - 20, oz + CELL_D - 20],
      [`${p}L4`, ox + 20, oz + CELL_D - 20],
    ];
    for (const [id, x, z] of legs) {
      profile(id, CELL_H, [x, 0, z], [0, 1, 0], [{ id: `${id}-tap`, kind: 'end-tap', fromEnd: 'start', offset: 0, face: 0 }]);
      accessories.push({ id: `${id}-foot`, kind: 'leveling-foot', partId: 'm40-leveling-foot', profileId: id, end: 'start', quantity: 1 });
      accessories.push({ id: `${id}-cap`, kind: 'end-cap', partId: 'm40-end-cap', profileId: id, end: 'end', quantity: 1 });
    }
    const rail = (name: string, along: 'x' | 'z', fixed: number, y: number, a: string, b: string) => {
      const id = `${p}${name}`;
      const length = along === 'x' ? CELL_W - 80 : CELL_D - 80;
      profile(id, length, along === 'x' ? [ox + 40, y, fixed] : [fixed, y, oz + 40], along === 'x' ? [1, 0, 0] : [0, 0, 1]);
      bracket(`${id}-js`, id, 'start', a, y);
      bracket(`${id}-je`, id, 'end', b, y);
    };
    const yLow = 100;
    const yTop = CELL_H - 20;
    for (const [level, y] of [
      ['low', yLow],
      ['top', yTop],
    ] as const) {
      rail(`XF-${level}`, 'x', oz + 20, y, `${p}L1`, `${p}L2`);
      rail(`XB-${level}`, 'x', oz + CELL_D - 20, y, `${p}L4`, `${p}L3`);
      rail(`ZL-${level}`, 'z', ox + 20, y, `${p}L1`, `${p}L4`);
      rail(`ZR-${level}`, 'z', ox + CELL_W - 20, y, `${p}L2`, `${p}L3`);
    }
    const bottom = yLow + 20;
    const top = yTop - 20;
    panels.push({
      id: `${p}back`,
      materialId: 'acrylic',
      thickness: 6,
      mounting: 'captured',
      role: 'panel',
      boundedBy: [`${p}XB-low`, `${p}XB-top`, `${p}L4`, `${p}L3`],
      rect: { center: [ox + CELL_W / 2, (bottom + top) / 2, oz + CELL_D - 20], normal: 'z', width: CELL_W - 80, height: top - bottom },
      cutouts: [],
    });
    if (c % 5 !== 0) {
      panels.push({
        id: `${p}side`,
        materialId: 'polycarbonate',
        thickness: 6,
        mounting: 'captured',
        role: 'panel',
        boundedBy: [`${p}ZR-low`, `${p}ZR-top`, `${p}L2`, `${p}L3`],
        // Normal x: width runs along y, height along z (schema: the other axes in x, y, z order).
        rect: { center: [ox + CELL_W - 20, (bottom + top) / 2, oz + CELL_D / 2], normal: 'x', width: top - bottom, height: CELL_D - 80 },
        cutouts: [],
      });
    }
    if (o.overlapEvery && c % o.overlapEvery === 0) {
      // A stray rail pushed 10 mm into the low front rail: an interference error to find.
      const id = `${p}stray`;
      profile(id, CELL_W - 80, [ox + 40, yLow + 30, oz + 20], [1, 0, 0]);
      accessories.push({ id: `${id}-cap-s`, kind: 'end-cap', partId: 'm40-end-cap', profileId: id, end: 'start', quantity: 1 });
      accessories.push({ id: `${id}-cap-e`, kind: 'end-cap', partId: 'm40-end-cap', profileId: id, end: 'end', quantity: 1 });
    }
  }
  const base = designDocumentSchema.parse({ schemaVersion: 3, name: `Generated frame, ${profiles.length} profiles`, systemId: 'metric-40' });
  return {
    ...base,
    profiles,
    joints,
    panels,
    accessories,
    loadCases: [
      {
        id: 'shelf',
        name: 'Equipment on the first cells',
        support: 'simple',
        tipOverHeight: 1000,
        loads: profiles
          .filter((p) => p.id.endsWith('XF-top'))
          .slice(0, 20)
          .map((p) => ({ kind: 'point' as const, profileId: p.id, along: p.length / 2, force: 300, direction: [0, -1, 0] as [number, number, number] })),
      },
    ],
  };
}
