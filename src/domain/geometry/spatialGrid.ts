/**
 * Uniform-grid spatial index over axis-aligned boxes: the broad phase for interference and
 * "what touches this profile end" queries. Building is O(n); pair enumeration visits each
 * candidate pair once (it is reported only by the cell holding the corner of the pair's overlap).
 */
import { distancePointToCorners, type Box } from './box';

/** Cell keys stay below 2^30 so they are small integers (fast Map keys, no boxed doubles). */
const MAX_CELLS = 1 << 30;
/** Entries per box allowed on average before the cells are made coarser. */
const MAX_AVERAGE_CELLS_PER_BOX = 12;

export class UniformGrid {
  readonly cellSize: number;
  /** The boxes' corners, six numbers per box (min x, y, z, max x, y, z): read in the hot loops without a field load per number. */
  private readonly corners: Float64Array;
  private readonly margin: number;
  private readonly originX: number;
  private readonly originY: number;
  private readonly originZ: number;
  /**
   * The cells as one table: cell `s` (numbered in the order cells were first filled) has key
   * `cellKeys[s]` and holds boxes `cellItems[cellStart[s]]` up to `cellItems[cellStart[s + 1]]`,
   * in box order; `cellSlot` maps a key to its cell. No list per cell (thousands of small arrays
   * grown by push, all alive while the grid is).
   */
  private readonly cellSlot = new Map<number, number>();
  private cellKeys: Int32Array = new Int32Array(0);
  private cellStart: Int32Array = new Int32Array(1);
  private cellItems: Int32Array = new Int32Array(0);
  /** Cells along y and z: key = (x · ny + y) · nz + z. */
  private readonly ny: number;
  private readonly nz: number;
  private readonly nx: number;
  private readonly stamps: Int32Array;
  private stamp = 0;

  /** The smallest box holding every indexed box (the empty box without any). */
  private readonly extent: Box;

  /**
   * @param boxes items to index, addressed by their array index; or their corners already laid out
   *   as `corners` is (six numbers per box), which the grid then keeps without a copy
   * @param margin mm added around every box, so "touching within margin" counts as near
   * @param cellSize mm; default from the boxes' typical size
   */
  constructor(boxes: readonly Box[] | Float64Array, options: { margin?: number; cellSize?: number } = {}) {
    this.margin = options.margin ?? 0;
    const corners = boxes instanceof Float64Array ? boxes : cornersOf(boxes);
    const count = corners.length / 6;
    this.stamps = new Int32Array(count);
    this.corners = corners;
    let minX = Infinity;
    let minY = Infinity;
    let minZ = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    let maxZ = -Infinity;
    for (let o = 0; o < corners.length; o += 6) {
      if (corners[o] < minX) minX = corners[o];
      if (corners[o + 1] < minY) minY = corners[o + 1];
      if (corners[o + 2] < minZ) minZ = corners[o + 2];
      if (corners[o + 3] > maxX) maxX = corners[o + 3];
      if (corners[o + 4] > maxY) maxY = corners[o + 4];
      if (corners[o + 5] > maxZ) maxZ = corners[o + 5];
    }
    this.extent = { minX, minY, minZ, maxX, maxY, maxZ };
    const m = this.margin;
    this.originX = (Number.isFinite(minX) ? minX : 0) - m - 1;
    this.originY = (Number.isFinite(minY) ? minY : 0) - m - 1;
    this.originZ = (Number.isFinite(minZ) ? minZ : 0) - m - 1;
    const spanX = Number.isFinite(maxX) ? maxX - minX + 2 * m + 2 : 1;
    const spanY = Number.isFinite(maxY) ? maxY - minY + 2 * m + 2 : 1;
    const spanZ = Number.isFinite(maxZ) ? maxZ - minZ + 2 * m + 2 : 1;
    let cellSize = Math.max(options.cellSize ?? defaultCellSize(corners), 1e-3);
    const cellsFor = (size: number) => (Math.floor(spanX / size) + 1) * (Math.floor(spanY / size) + 1) * (Math.floor(spanZ / size) + 1);
    while (cellsFor(cellSize) >= MAX_CELLS) cellSize *= 2;
    // Coarsen until the total number of cell entries stays proportional to n.
    for (;;) {
      let entries = 0;
      for (let i = 0; i < count; i++) entries += this.cellCount(i, cellSize);
      if (entries <= Math.max(64, MAX_AVERAGE_CELLS_PER_BOX * count)) break;
      cellSize *= 2;
    }
    this.cellSize = cellSize;
    this.nx = Math.floor(spanX / cellSize) + 1;
    this.ny = Math.floor(spanY / cellSize) + 1;
    this.nz = Math.floor(spanZ / cellSize) + 1;
    this.fillCells(count);
  }

  /** Bottom of indexed box `i` (its min y), mm. */
  minY(i: number): number {
    return this.corners[i * 6 + 1];
  }

  /** Top of indexed box `i` (its max y), mm. */
  maxY(i: number): number {
    return this.corners[i * 6 + 4];
  }

  /**
   * The smallest box holding every indexed box, as a new object: what growing the empty box by each
   * one in turn (`expandBoxInPlace`) gives, worked out once when the grid is built.
   */
  bounds(): Box {
    const e = this.extent;
    return { minX: e.minX, minY: e.minY, minZ: e.minZ, maxX: e.maxX, maxY: e.maxY, maxZ: e.maxZ };
  }

  /** Indexed box `i` as a new box object (the grid keeps only the corners). */
  box(i: number): Box {
    return boxAt(this.corners, i);
  }

  /**
   * Calls `visit(i, j)` with i < j once for every pair whose (margin-grown) boxes overlap; stops
   * when `visit` returns true.
   */
  forEachNearPair(visit: (i: number, j: number) => unknown): void {
    const s = this.cellSize;
    const m = this.margin;
    const c = this.corners;
    const items = this.cellItems;
    const starts = this.cellStart;
    for (let cell = 0; cell < this.cellKeys.length; cell++) {
      const first = starts[cell];
      const end = starts[cell + 1];
      if (end - first < 2) continue;
      const key = this.cellKeys[cell];
      const cz = key % this.nz;
      const cy = Math.floor(key / this.nz) % this.ny;
      const cx = Math.floor(key / (this.nz * this.ny));
      for (let a = first; a < end; a++) {
        const i = items[a];
        const oi = i * 6;
        for (let b = a + 1; b < end; b++) {
          const j = items[b];
          const oj = j * 6;
          // Box corners at offsets 0..2 (min x, y, z) and 3..5 (max x, y, z).
          if (c[oi] - m > c[oj + 3] + m || c[oj] - m > c[oi + 3] + m) continue;
          if (c[oi + 1] - m > c[oj + 4] + m || c[oj + 1] - m > c[oi + 4] + m) continue;
          if (c[oi + 2] - m > c[oj + 5] + m || c[oj + 2] - m > c[oi + 5] + m) continue;
          // Report the pair only from the cell containing the low corner of the overlap.
          const ox = Math.floor((Math.max(c[oi], c[oj]) - m - this.originX) / s);
          if (ox !== cx) continue;
          const oy = Math.floor((Math.max(c[oi + 1], c[oj + 1]) - m - this.originY) / s);
          if (oy !== cy) continue;
          const oz = Math.floor((Math.max(c[oi + 2], c[oj + 2]) - m - this.originZ) / s);
          if (oz !== cz) continue;
          if ((i < j ? visit(i, j) : visit(j, i)) === true) return;
        }
      }
    }
  }

  /**
   * Calls `visit(i)` once for each indexed box within `margin` (+ the grid margin) of `query`;
   * stops early when `visit` returns true (a first-match search stays O(1) among stacked boxes).
   */
  forEachNear(query: Box, visit: (i: number) => unknown, margin = 0): void {
    const stamp = ++this.stamp;
    const s = this.cellSize;
    const m = this.margin + margin;
    const c = this.corners;
    const items = this.cellItems;
    const starts = this.cellStart;
    const qMinX = query.minX;
    const qMinY = query.minY;
    const qMinZ = query.minZ;
    const qMaxX = query.maxX;
    const qMaxY = query.maxY;
    const qMaxZ = query.maxZ;
    const x0 = this.cellIndex(query.minX - m, this.originX, s, this.nx);
    const x1 = this.cellIndex(query.maxX + m, this.originX, s, this.nx);
    const y0 = this.cellIndex(query.minY - m, this.originY, s, this.ny);
    const y1 = this.cellIndex(query.maxY + m, this.originY, s, this.ny);
    const z0 = this.cellIndex(query.minZ - m, this.originZ, s, this.nz);
    const z1 = this.cellIndex(query.maxZ + m, this.originZ, s, this.nz);
    for (let x = x0; x <= x1; x++) {
      for (let y = y0; y <= y1; y++) {
        for (let z = z0; z <= z1; z++) {
          const cell = this.cellSlot.get((x * this.ny + y) * this.nz + z);
          if (cell === undefined) continue;
          for (let k = starts[cell], end = starts[cell + 1]; k < end; k++) {
            const i = items[k];
            if (this.stamps[i] === stamp) continue;
            this.stamps[i] = stamp;
            const o = i * 6;
            if (c[o] > qMaxX + m || qMinX > c[o + 3] + m) continue;
            if (c[o + 1] > qMaxY + m || qMinY > c[o + 4] + m) continue;
            if (c[o + 2] > qMaxZ + m || qMinZ > c[o + 5] + m) continue;
            if (visit(i) === true) return;
          }
        }
      }
    }
  }

  /**
   * How deep indexed boxes `i` and `j` interpenetrate, mm: `boxPenetration` read from the grid's
   * own copy of the corners (no box objects in the pair loop).
   */
  penetration(i: number, j: number): number {
    const c = this.corners;
    const a = i * 6;
    const b = j * 6;
    const ox = Math.min(c[a + 3], c[b + 3]) - Math.max(c[a], c[b]);
    const oy = Math.min(c[a + 4], c[b + 4]) - Math.max(c[a + 1], c[b + 1]);
    const oz = Math.min(c[a + 5], c[b + 5]) - Math.max(c[a + 2], c[b + 2]);
    return Math.min(ox, oy, oz);
  }

  /** Distance (mm) from point `p` to indexed box `i` (0 inside), as `distancePointToBox`. */
  distanceToPoint(i: number, p: readonly [number, number, number]): number {
    const c = this.corners;
    const o = i * 6;
    return distancePointToCorners(p, c[o], c[o + 1], c[o + 2], c[o + 3], c[o + 4], c[o + 5]);
  }

  /** `boxPenetration` of indexed box `i` and `box`, mm. */
  penetrationWith(i: number, box: Box): number {
    const c = this.corners;
    const a = i * 6;
    const ox = Math.min(c[a + 3], box.maxX) - Math.max(c[a], box.minX);
    const oy = Math.min(c[a + 4], box.maxY) - Math.max(c[a + 1], box.minY);
    const oz = Math.min(c[a + 5], box.maxZ) - Math.max(c[a + 2], box.minZ);
    return Math.min(ox, oy, oz);
  }

  /** Cell index along one axis, clamped to the grid (queries may reach outside it). */
  private cellIndex(value: number, origin: number, size: number, count: number): number {
    const c = Math.floor((value - origin) / size);
    return c < 0 ? 0 : c >= count ? count - 1 : c;
  }

  private cellCount(i: number, size: number): number {
    const m = this.margin;
    const c = this.corners;
    const o = i * 6;
    const nx = Math.floor((c[o + 3] + m - this.originX) / size) - Math.floor((c[o] - m - this.originX) / size) + 1;
    const ny = Math.floor((c[o + 4] + m - this.originY) / size) - Math.floor((c[o + 1] - m - this.originY) / size) + 1;
    const nz = Math.floor((c[o + 5] + m - this.originZ) / size) - Math.floor((c[o + 2] - m - this.originZ) / size) + 1;
    return nx * ny * nz;
  }

  /**
   * Puts every box in the cells it covers. One pass over the boxes numbers the cells and notes each
   * (cell, box) entry; a second over the entries writes each box into its cell's run of
   * `cellItems`. Every table ends at its final length.
   */
  private fillCells(count: number): void {
    const s = this.cellSize;
    const m = this.margin;
    const c = this.corners;
    const slots = this.cellSlot;
    let entryCell: Int32Array<ArrayBuffer> = new Int32Array(Math.max(64, count * 2));
    let entryBox: Int32Array<ArrayBuffer> = new Int32Array(entryCell.length);
    let sizes: Int32Array<ArrayBuffer> = new Int32Array(64);
    let keys: Int32Array<ArrayBuffer> = new Int32Array(64);
    let cellCount = 0;
    let e = 0;
    for (let i = 0; i < count; i++) {
      const o = i * 6;
      const x0 = this.cellIndex(c[o] - m, this.originX, s, this.nx);
      const x1 = this.cellIndex(c[o + 3] + m, this.originX, s, this.nx);
      const y0 = this.cellIndex(c[o + 1] - m, this.originY, s, this.ny);
      const y1 = this.cellIndex(c[o + 4] + m, this.originY, s, this.ny);
      const z0 = this.cellIndex(c[o + 2] - m, this.originZ, s, this.nz);
      const z1 = this.cellIndex(c[o + 5] + m, this.originZ, s, this.nz);
      for (let x = x0; x <= x1; x++) {
        for (let y = y0; y <= y1; y++) {
          for (let z = z0; z <= z1; z++) {
            const key = (x * this.ny + y) * this.nz + z;
            let cell = slots.get(key);
            if (cell === undefined) {
              cell = cellCount++;
              if (cell === sizes.length) {
                sizes = grown(sizes);
                keys = grown(keys);
              }
              keys[cell] = key;
              slots.set(key, cell);
            }
            sizes[cell] += 1;
            if (e === entryCell.length) {
              entryCell = grown(entryCell);
              entryBox = grown(entryBox);
            }
            entryCell[e] = cell;
            entryBox[e] = i;
            e++;
          }
        }
      }
    }
    const start = new Int32Array(cellCount + 1);
    for (let cell = 0; cell < cellCount; cell++) start[cell + 1] = start[cell] + sizes[cell];
    const next = start.slice(0, cellCount);
    const items = new Int32Array(e);
    for (let k = 0; k < e; k++) items[next[entryCell[k]]++] = entryBox[k];
    this.cellKeys = keys.slice(0, cellCount);
    this.cellStart = start;
    this.cellItems = items;
  }
}

/** A copy of `list` twice as long (the new half zero). */
function grown(list: Int32Array<ArrayBuffer>): Int32Array<ArrayBuffer> {
  const bigger = new Int32Array(list.length * 2);
  bigger.set(list);
  return bigger;
}

/** Box `i` of a corner table (six numbers per box, as the grid keeps them) as a new box object. */
export function boxAt(corners: Float64Array, i: number): Box {
  const o = i * 6;
  return { minX: corners[o], minY: corners[o + 1], minZ: corners[o + 2], maxX: corners[o + 3], maxY: corners[o + 4], maxZ: corners[o + 5] };
}

/** Six numbers per box (min x, y, z, max x, y, z), in the boxes' order. */
function cornersOf(boxes: readonly Box[]): Float64Array {
  const corners = new Float64Array(boxes.length * 6);
  for (let i = 0, o = 0; i < boxes.length; i++, o += 6) {
    const b = boxes[i];
    corners[o] = b.minX;
    corners[o + 1] = b.minY;
    corners[o + 2] = b.minZ;
    corners[o + 3] = b.maxX;
    corners[o + 4] = b.maxY;
    corners[o + 5] = b.maxZ;
  }
  return corners;
}

/** Median of each box's longest side (`corners` as the grid keeps them): long members then span only a few cells. */
function defaultCellSize(corners: Float64Array): number {
  const count = corners.length / 6;
  if (count === 0) return 100;
  const step = Math.max(1, Math.floor(count / 512));
  const sizes: number[] = [];
  for (let i = 0; i < count; i += step) {
    const o = i * 6;
    sizes.push(Math.max(corners[o + 3] - corners[o], corners[o + 4] - corners[o + 1], corners[o + 5] - corners[o + 2]));
  }
  sizes.sort((a, b) => a - b);
  return Math.max(sizes[sizes.length >> 1], 1);
}
