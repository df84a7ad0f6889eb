/**
 * Small, correct designs built by hand for the check and output tests, and helpers to break them.
 * Metric 40 system; lengths mm; Y up.
 */
import { designDocumentSchema, type DesignDocument, type DesignDocumentInput } from '@/domain/design/schema';

export interface BoxFrameOptions {
  width?: number;
  depth?: number;
  height?: number;
  /** Rail height of the lower rails (axis), mm. */
  lowerRailY?: number;
  backPanel?: boolean;
  panelThickness?: number;
  panelMaterial?: string;
  /** Connector kind for rail-to-leg joints. */
  jointKind?: 'corner-bracket' | 'concealed-connector';
}

const V = 'm40-40x40';

/**
 * A four-legged box frame: legs on leveling feet with end caps on top, rails at two levels
 * joined to the legs' faces, an optional captured back panel.
 */
export function boxFrame(o: BoxFrameOptions = {}): DesignDocument {
  const W = o.width ?? 800;
  const D = o.depth ?? 500;
  const H = o.height ?? 900;
  const yLow = o.lowerRailY ?? 100;
  const yTop = H - 20;
  const kind = o.jointKind ?? 'corner-bracket';
  const connectorId = kind === 'corner-bracket' ? 'm40-corner-bracket' : 'm40-concealed-connector';
  const legs = [
    ['L1', 20, 20],
    ['L2', W - 20, 20],
    ['L3', W - 20, D - 20],
    ['L4', 20, D - 20],
  ] as const;
  const profiles: DesignDocumentInput['profiles'] = [];
  const accessories: DesignDocumentInput['accessories'] = [];
  const joints: DesignDocumentInput['joints'] = [];
  for (const [id, x, z] of legs) {
    profiles.push({
      id,
      variantId: V,
      length: H,
      start: [x, 0, z],
      direction: [0, 1, 0],
      machining: [{ id: `${id}-tap`, kind: 'end-tap', fromEnd: 'start', offset: 0, face: 0 }],
    });
    accessories.push({ id: `${id}-foot`, kind: 'leveling-foot', partId: 'm40-leveling-foot', profileId: id, end: 'start' });
    accessories.push({ id: `${id}-cap`, kind: 'end-cap', partId: 'm40-end-cap', profileId: id, end: 'end' });
  }
  const rail = (id: string, along: 'x' | 'z', fixed: number, y: number, a: string, b: string) => {
    const length = along === 'x' ? W - 80 : D - 80;
    const start: [number, number, number] = along === 'x' ? [40, y, fixed] : [fixed, y, 40];
    const machining =
      kind === 'concealed-connector'
        ? (['start', 'end'] as const).map((end) => ({ id: `${id}-cb-${end}`, kind: 'access-counterbore' as const, fromEnd: end, offset: 20, face: 1, diameter: 10 }))
        : [];
    profiles.push({ id, variantId: V, length, start, direction: along === 'x' ? [1, 0, 0] : [0, 0, 1], machining });
    joints.push({ id: `J-${id}-s`, kind, connectorId, members: [{ profileId: id, at: 'start' }, { profileId: a, at: 'span', along: y }] });
    joints.push({ id: `J-${id}-e`, kind, connectorId, members: [{ profileId: id, at: 'end' }, { profileId: b, at: 'span', along: y }] });
  };
  rail('RXF-low', 'x', 20, yLow, 'L1', 'L2');
  rail('RXB-low', 'x', D - 20, yLow, 'L4', 'L3');
  rail('RZL-low', 'z', 20, yLow, 'L1', 'L4');
  rail('RZR-low', 'z', W - 20, yLow, 'L2', 'L3');
  rail('RXF-top', 'x', 20, yTop, 'L1', 'L2');
  rail('RXB-top', 'x', D - 20, yTop, 'L4', 'L3');
  rail('RZL-top', 'z', 20, yTop, 'L1', 'L4');
  rail('RZR-top', 'z', W - 20, yTop, 'L2', 'L3');

  const panels: DesignDocumentInput['panels'] = [];
  if (o.backPanel) {
    const bottom = yLow + 20;
    const top = yTop - 20;
    panels.push({
      id: 'BACK',
      materialId: o.panelMaterial ?? 'acrylic',
      thickness: o.panelThickness ?? 6,
      mounting: 'captured',
      boundedBy: ['RXB-low', 'RXB-top', 'L4', 'L3'],
      rect: { center: [W / 2, (bottom + top) / 2, D - 20], normal: 'z', width: W - 80, height: top - bottom },
    });
  }
  return designDocumentSchema.parse({
    schemaVersion: 2,
    name: 'Test box frame',
    systemId: 'metric-40',
    profiles,
    joints,
    panels,
    accessories,
  });
}

/** A copy of the design with every part moved by `offset` mm. */
export function translateDesign(design: DesignDocument, offset: [number, number, number]): DesignDocument {
  const add = (p: readonly number[]): [number, number, number] => [p[0] + offset[0], p[1] + offset[1], p[2] + offset[2]];
  return {
    ...design,
    profiles: design.profiles.map((p) => ({ ...p, start: add(p.start) })),
    panels: design.panels.map((p) => ({ ...p, rect: { ...p.rect, center: add(p.rect.center) } })),
  };
}

export function withProfileChange(design: DesignDocument, id: string, change: (p: DesignDocument['profiles'][number]) => DesignDocument['profiles'][number]): DesignDocument {
  return { ...design, profiles: design.profiles.map((p) => (p.id === id ? change(p) : p)) };
}
