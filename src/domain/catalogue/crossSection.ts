/**
 * Slotwise's own parametric T-slot cross-section, drawn as a light extrusion: thin outer walls,
 * one T-slot (opening, lips, undercut chamber with a tapered floor) centred on every cell face, a
 * thin-walled centre tube, diagonal webs from the tube to the corners, and hollow cells between
 * them. mm, centred on the origin; local x = width, local y = height; cells are stacked along y.
 * Outline counter-clockwise, holes clockwise. Where two cells meet, the face between them carries a
 * closed hollow in place of the two slots, so there is no solid bridge.
 *
 * Wall thicknesses are shares of the cell size (our own drawing, tuned so mass per metre and second
 * moments land near typical light profiles of each size; see docs/engineering.md and the catalogue
 * tests for the figures).
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
const ARC_SEGMENTS = 4;
/** Share of the chamber depth (below the lips) that has straight sides before the floor tapers. */
const CHAMBER_STRAIGHT_SHARE = 0.35;
/** Half-width of the chamber floor as a share of the slot opening's half-width. */
const FLOOR_SHARE = 0.8;
/** Wall thicknesses as shares of the cell size (our own drawing). */
export const WALL_SHARES = {
  /** Outer wall behind the faces, beside the slot. */
  outer: 0.038,
  /** Chamber side and floor walls. */
  chamber: 0.032,
  /** Diagonal webs, measured across the web. */
  web: 0.035,
  /** Centre tube wall around the bore. */
  tube: 0.04,
} as const;

/**
 * Double-cell profiles are drawn with thinner walls than two square ones side by side: typical
 * light 40 x 80 profiles weigh less than two 40 x 40 (figures in docs/engineering.md, from memory).
 */
export const DOUBLE_CELL_WALL_SCALE = 0.7;

type P = [number, number];

/** Slot points in face coordinates: u along the direction of travel, v inward from the face. */
function slotPoints(d: SlotDrawing): P[] {
  const w = d.slotOpening / 2;
  const c = d.chamberWidth / 2;
  const t = d.lipThickness;
  const straight = t + (d.slotDepth - t) * CHAMBER_STRAIGHT_SHARE;
  const floor = w * FLOOR_SHARE;
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
  const faces: { from: P; along: P; inward: P; length: number; slots: number[] }[] = [
    { from: [hw, -hh], along: [0, 1], inward: [-1, 0], length: 2 * hh, slots: cellCentres.map((y) => y + hh) },
    { from: [hw, hh], along: [-1, 0], inward: [0, -1], length: 2 * hw, slots: [hw] },
    { from: [-hw, hh], along: [0, -1], inward: [1, 0], length: 2 * hh, slots: cellCentres.map((y) => hh - y).reverse() },
    { from: [-hw, -hh], along: [1, 0], inward: [0, 1], length: 2 * hw, slots: [hw] },
  ];
  for (const f of faces) {
    const at = (s: number, v: number): Point2 => [f.from[0] + f.along[0] * s + f.inward[0] * v, f.from[1] + f.along[1] * s + f.inward[1] * v];
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

/** Intersection of the lines p1 + s·d1 and p2 + t·d2, or null when parallel. */
function intersect(p1: P, d1: P, p2: P, d2: P): P | null {
  const det = d1[0] * d2[1] - d1[1] * d2[0];
  if (Math.abs(det) < 1e-12) return null;
  const s = ((p2[0] - p1[0]) * d2[1] - (p2[1] - p1[1]) * d2[0]) / det;
  return [p1[0] + s * d1[0], p1[1] + s * d1[1]];
}

/** Signed area (positive counter-clockwise). */
function signedArea(points: P[]): number {
  let a = 0;
  for (let i = 0; i < points.length; i++) {
    const p = points[i];
    const q = points[(i + 1) % points.length];
    a += p[0] * q[1] - q[0] * p[1];
  }
  return a / 2;
}

/**
 * The hollows of one half-quadrant, in cell coordinates with the slot face at y = +h and the
 * corner at (+h, +h); the diagonal web runs along y = x. `innerFace` marks a face shared with the
 * next cell (half the outer wall on each side, no lip).
 */
function halfQuadrantHollows(d: SlotDrawing, innerFace: boolean, scale: number): P[][] {
  const h = d.cellSize / 2;
  const tw = d.cellSize * WALL_SHARES.outer * scale * (innerFace ? 0.5 : 1);
  const tc = d.cellSize * WALL_SHARES.chamber * scale;
  const e = (d.cellSize * WALL_SHARES.web * scale) / 2 / Math.SQRT1_2; // vertical offset of the web face from y = x
  const c = d.chamberWidth / 2;
  const lip = innerFace ? 0 : d.lipThickness;
  const hollows: P[][] = [];

  // Corner hollow: right of the chamber wall, under the outer wall, above the diagonal web.
  const xLeft = c + tc;
  const yTop = h - Math.max(tw, innerFace ? 0 : 0);
  const corner: P[] = [
    [xLeft, yTop],
    [xLeft, xLeft + e],
    [yTop - e, yTop],
  ];
  if (yTop - e - xLeft > 0.5 && yTop > lip) hollows.push(corner);

  // Wedge hollow: under the chamber floor, above the diagonal web, outside the centre tube.
  const yStraight = h - (lip + (d.slotDepth - lip) * CHAMBER_STRAIGHT_SHARE);
  const f = (d.slotOpening / 2) * FLOOR_SHARE;
  const yFloor = h - d.slotDepth;
  const floorDir: P = [f - c, yFloor - yStraight];
  const len = Math.hypot(floorDir[0], floorDir[1]);
  const normal: P = [-floorDir[1] / len, floorDir[0] / len]; // points away from the chamber (down-right)
  const floorOffset: P = [c + normal[0] * tc, yStraight + normal[1] * tc];
  const apex = intersect(floorOffset, floorDir, [0, e], [1, 1]);
  const flatY = yFloor - tc;
  const rTube = d.centreBoreDiameter / 2 + d.cellSize * WALL_SHARES.tube * scale;
  const xAxis = tc / 2;
  if (apex && flatY > rTube + 0.3 && apex[1] > flatY) {
    const q1 = intersect(floorOffset, floorDir, [0, flatY], [1, 0]);
    // Where the web face y = x + e meets the tube circle x² + y² = r².
    const disc = 2 * rTube * rTube - e * e;
    if (q1 && disc > 0 && q1[0] > xAxis) {
      const xc = (-e + Math.sqrt(disc)) / 2;
      const webOnTube: P = [xc, xc + e];
      const yAxisOnTube = Math.sqrt(Math.max(0, rTube * rTube - xAxis * xAxis));
      const start = Math.atan2(yAxisOnTube, xAxis);
      const end = Math.atan2(webOnTube[1], webOnTube[0]);
      const arc: P[] = [];
      for (let i = 0; i <= ARC_SEGMENTS; i++) {
        const a = start + ((end - start) * i) / ARC_SEGMENTS;
        arc.push([rTube * Math.cos(a), rTube * Math.sin(a)]);
      }
      // Past the chamber wall (x = c) the wedge stops, leaving a wall of tc to the corner hollow.
      const top: P[] = apex[0] > c ? [[c, c + e], intersect(floorOffset, floorDir, [c, 0], [0, 1])!] : [apex];
      const wedge: P[] = [...top, q1, [xAxis, flatY], ...arc];
      if (apex[0] > webOnTube[0] && top[top.length - 1][1] > c + e - 1e-9 && Math.abs(signedArea(wedge)) > 0.5) hollows.push(wedge);
    }
  }
  return hollows;
}

/** A closed hollow in place of the two slots where cells meet (centred on y = 0 of the joint). */
function jointHollow(d: SlotDrawing): P[] {
  const c = d.chamberWidth / 2;
  const f = (d.slotOpening / 2) * FLOOR_SHARE;
  const s = d.slotDepth * CHAMBER_STRAIGHT_SHARE;
  const depth = d.slotDepth;
  return [
    [-f, -depth],
    [f, -depth],
    [c, -s],
    [c, s],
    [f, depth],
    [-f, depth],
    [-c, s],
    [-c, -s],
  ];
}

/** Maps a point from the half-quadrant frame (slot face +y, corner +x+y) into the cell. */
type Transform = (p: P) => P;

export function drawCrossSection(d: SlotDrawing, cells: 1 | 2): { outline: Point2[]; holes: Point2[][] } {
  const hh = (d.cellSize * cells) / 2;
  const holes: Point2[][] = [];
  const addHole = (points: P[], map: Transform) => {
    const mapped = points.map(map);
    // Holes clockwise whatever the mirror.
    const ordered = signedArea(mapped) > 0 ? mapped.reverse() : mapped;
    holes.push(ordered.map(([x, y]) => [round(x), round(y)] as Point2));
  };
  for (let i = 0; i < cells; i++) {
    const cy = -hh + d.cellSize * (i + 0.5);
    holes.push(circle(0, cy, d.centreBoreDiameter / 2));
    const topInner = i < cells - 1;
    const bottomInner = i > 0;
    // Eight half-quadrants: for each face (top, bottom, right, left) and each side of its slot.
    const faces: { inner: boolean; map: Transform }[] = [
      { inner: topInner, map: ([x, y]) => [x, cy + y] },
      { inner: topInner, map: ([x, y]) => [-x, cy + y] },
      { inner: bottomInner, map: ([x, y]) => [x, cy - y] },
      { inner: bottomInner, map: ([x, y]) => [-x, cy - y] },
      { inner: false, map: ([x, y]) => [y, cy + x] },
      { inner: false, map: ([x, y]) => [y, cy - x] },
      { inner: false, map: ([x, y]) => [-y, cy + x] },
      { inner: false, map: ([x, y]) => [-y, cy - x] },
    ];
    for (const face of faces) for (const hollow of halfQuadrantHollows(d, face.inner, cells === 2 ? DOUBLE_CELL_WALL_SCALE : 1)) addHole(hollow, face.map);
  }
  for (let i = 1; i < cells; i++) {
    const y0 = -hh + d.cellSize * i;
    addHole(jointHollow(d), ([x, y]) => [x, y0 + y]);
  }
  return { outline: outline(d, cells), holes };
}

function round(v: number): number {
  return Math.round(v * 1e4) / 1e4;
}
