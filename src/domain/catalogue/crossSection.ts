/**
 * Slotwise's own parametric T-slot cross-section: an outer rectangle of square cells, one T-slot
 * (opening, lips, undercut chamber with a tapered floor) centred on every cell face, a centre bore
 * per cell and a hollow core in each cell corner. mm, centred on the origin; local x = width,
 * local y = height; cells are stacked along y. Outline counter-clockwise, holes clockwise.
 */
import type { Point2 } from '../structure/sectionProperties';

export interface SlotDrawing {
  /** Cell size (square), mm. */
  cellSize: number;
  slotOpening: number;
  lipThickness: number;
  chamberWidth: number;
  slotDepth: number;
  centreBoreDiameter: number;
}

const BORE_SEGMENTS = 16;
/** Share of the chamber depth (below the lips) that has straight sides before the floor tapers. */
const CHAMBER_STRAIGHT_SHARE = 0.35;
/** Web between a slot chamber and a corner core, as a share of the cell size (our own drawing). */
const CORE_WEB_SHARE = 0.04;

/** Slot points in face coordinates: u along the direction of travel, v inward from the face. */
function slotPoints(d: SlotDrawing): [number, number][] {
  const w = d.slotOpening / 2;
  const c = d.chamberWidth / 2;
  const t = d.lipThickness;
  const straight = t + (d.slotDepth - t) * CHAMBER_STRAIGHT_SHARE;
  const floor = w * 0.8;
  return [
    [-w, 0],
    [-w, t],
    [-c, t],
    [-c, straight],
    [-floor, d.slotDepth],
    [floor, d.slotDepth],
    [c, straight],
    [c, t],
    [w, t],
    [w, 0],
  ];
}

/**
 * Outer outline of `cells` square cells stacked along y. Walks counter-clockwise face by face,
 * dropping a slot into every cell face it passes.
 */
function outline(d: SlotDrawing, cells: number): Point2[] {
  const hw = d.cellSize / 2;
  const hh = (d.cellSize * cells) / 2;
  const chamfer = d.cellSize * 0.02;
  const cellCentres = Array.from({ length: cells }, (_, i) => -hh + d.cellSize * (i + 0.5));
  const slot = slotPoints(d);
  const points: Point2[] = [];
  // Each face: start corner, travel direction, inward normal, slot centres along the travel.
  const faces: { from: [number, number]; along: [number, number]; inward: [number, number]; length: number; slots: number[] }[] = [
    { from: [hw, -hh], along: [0, 1], inward: [-1, 0], length: 2 * hh, slots: cellCentres.map((y) => y + hh) },
    { from: [hw, hh], along: [-1, 0], inward: [0, -1], length: 2 * hw, slots: [hw] },
    { from: [-hw, hh], along: [0, -1], inward: [1, 0], length: 2 * hh, slots: cellCentres.map((y) => hh - y).reverse() },
    { from: [-hw, -hh], along: [1, 0], inward: [0, 1], length: 2 * hw, slots: [hw] },
  ];
  for (const f of faces) {
    const at = (s: number, v: number): Point2 => [
      f.from[0] + f.along[0] * s + f.inward[0] * v,
      f.from[1] + f.along[1] * s + f.inward[1] * v,
    ];
    points.push(at(chamfer, 0));
    for (const s of f.slots) for (const [u, v] of slot) points.push(at(s + u, v));
    points.push(at(f.length - chamfer, 0));
  }
  return points.map(([x, y]) => [round(x), round(y)] as Point2);
}

function circle(cx: number, cy: number, r: number): Point2[] {
  // Clockwise, as a hole.
  return Array.from({ length: BORE_SEGMENTS }, (_, i) => {
    const a = (-2 * Math.PI * i) / BORE_SEGMENTS;
    return [round(cx + r * Math.cos(a)), round(cy + r * Math.sin(a))] as Point2;
  });
}

/** Hollow core in one cell corner, between the two slot chambers and the outer walls. */
function cornerCore(d: SlotDrawing, cx: number, cy: number, sx: number, sy: number): Point2[] | null {
  const inner = d.chamberWidth / 2 + d.cellSize * CORE_WEB_SHARE;
  const outer = d.cellSize / 2 - d.lipThickness;
  if (outer - inner < 1) return null;
  const cut = (outer - inner) * 0.35;
  const local: [number, number][] = [
    [inner + cut, inner],
    [outer, inner],
    [outer, outer],
    [inner, outer],
    [inner, inner + cut],
  ];
  const pts = local.map(([x, y]) => [round(cx + sx * x), round(cy + sy * y)] as Point2);
  // Keep holes clockwise whatever the mirror.
  return sx * sy > 0 ? pts.reverse() : pts;
}

export function drawCrossSection(d: SlotDrawing, cells: 1 | 2): { outline: Point2[]; holes: Point2[][] } {
  const hh = (d.cellSize * cells) / 2;
  const holes: Point2[][] = [];
  for (let i = 0; i < cells; i++) {
    const cy = -hh + d.cellSize * (i + 0.5);
    holes.push(circle(0, cy, d.centreBoreDiameter / 2));
    for (const [sx, sy] of [
      [1, 1],
      [-1, 1],
      [-1, -1],
      [1, -1],
    ] as const) {
      const core = cornerCore(d, 0, cy, sx, sy);
      if (core) holes.push(core);
    }
  }
  return { outline: outline(d, cells), holes };
}

function round(v: number): number {
  return Math.round(v * 1e4) / 1e4;
}
