import sharp from 'sharp';
import { defaultCatalogue, getPanelMaterial, getVariant } from '../../../src/domain/catalogue';
import type { DesignDocument } from '../../../src/domain/design/schema';
import { panelAxes } from '../../../src/domain/geometry/panelGeometry';
import { sectionAxes } from '../../../src/domain/geometry/profileGeometry';
import { addScaled, cross, dot, normalize, scale, type Vec3 } from '../../../src/domain/geometry/vectors';

/**
 * A picture of a design drawn on the server, for designs that were never opened in the editor (the
 * demo designs at seed time): every profile and panel as a solid box in the three-quarter view from
 * the front right (front is −Z), flat-shaded in the profiles' metal colour with crease lines, on a
 * transparent background. A small depth-buffered rasteriser draws it at three times the size and
 * sharp scales it down (that smooths the edges) and writes the PNG. Deterministic: the same design
 * gives the same bytes.
 */

/** Width and height of the picture, px (the editor's saved pictures are 320 px wide too). */
export const SKETCH_SIZE = { width: 320, height: 240 } as const;
const SUPERSAMPLE = 2;
/** Share of the picture left empty around the design, each side. */
const MARGIN = 0.07;

/** Profile metal, the same colour as the 3D viewer's aluminium. */
const METAL: Rgb = [0xd4, 0xd9, 0xde];
const CREASE: Rgb = [0x5b, 0x63, 0x6b];
/** The three-quarter view looks from front (−Z), right (+X) and above (+Y). */
const FROM: Vec3 = normalize([1, 0.75, -1.35]);
/** Light from above, a little from the front left. */
const LIGHT: Vec3 = normalize([-0.35, 1, -0.55]);

type Rgb = [number, number, number];

interface Solid {
  centre: Vec3;
  /** Three half-extent vectors, mm, along the box's own axes. */
  half: [Vec3, Vec3, Vec3];
  colour: Rgb;
  /** 1 for profiles and opaque sheet; below 1 for clear and tinted sheet. */
  opacity: number;
}

/** The solids of a design: profiles by their variant's section, panels by their rectangle and thickness (mm). */
export function designSolids(design: DesignDocument): Solid[] {
  const solids: Solid[] = [];
  for (const profile of design.profiles) {
    const variant = getVariant(defaultCatalogue, profile.variantId);
    const width = variant?.width ?? 40;
    const height = variant?.height ?? 40;
    const axes = sectionAxes(profile.direction, profile.rollDeg);
    solids.push({
      centre: addScaled(profile.start, axes.axis, profile.length / 2),
      half: [scale(axes.axis, profile.length / 2), scale(axes.u, width / 2), scale(axes.v, height / 2)],
      colour: METAL,
      opacity: 1,
    });
  }
  for (const panel of design.panels) {
    const material = getPanelMaterial(defaultCatalogue, panel.materialId);
    const { n, w, h } = panelAxes(panel.rect.normal);
    const along = (index: number, size: number): Vec3 => {
      const v: Vec3 = [0, 0, 0];
      v[index] = size / 2;
      return v;
    };
    const opacity = material ? (material.appearance === 'opaque' ? 1 : Math.max(0.35, Math.min(1, material.opacity + 0.15))) : 1;
    solids.push({
      centre: [...panel.rect.center] as Vec3,
      half: [along(n, panel.thickness), along(w, panel.rect.width), along(h, panel.rect.height)],
      colour: material ? hexToRgb(material.color) : [0xb0, 0xb6, 0xbb],
      opacity,
    });
  }
  return solids;
}

/** The design's picture as PNG bytes, SKETCH_SIZE; a design with no parts gives an empty (transparent) picture. */
export async function sketchDesignPng(design: DesignDocument): Promise<Buffer> {
  const { rgba, width, height } = rasterise(designSolids(design), SKETCH_SIZE.width * SUPERSAMPLE, SKETCH_SIZE.height * SUPERSAMPLE);
  return sharp(rgba, { raw: { width, height, channels: 4 } })
    .resize(SKETCH_SIZE.width, SKETCH_SIZE.height, { kernel: 'lanczos3' })
    .png({ compressionLevel: 9 })
    .toBuffer();
}

/** The picture as a data URL, the form a save sends. */
export async function sketchDesignDataUrl(design: DesignDocument): Promise<string> {
  return `data:image/png;base64,${(await sketchDesignPng(design)).toString('base64')}`;
}

interface Face {
  /** Four corners in screen space: x, y px and depth (larger is farther). */
  corners: [number, number, number][];
  colour: Rgb;
  opacity: number;
  id: number;
}

function rasterise(solids: Solid[], width: number, height: number): { rgba: Buffer; width: number; height: number } {
  const rgba = Buffer.alloc(width * height * 4);
  if (solids.length === 0) return { rgba, width, height };

  const forward = scale(FROM, -1);
  const right = normalize(cross(forward, [0, 1, 0]));
  const up = cross(right, forward);
  const project = (p: Vec3): [number, number, number] => [dot(p, right), dot(p, up), dot(p, forward)];

  // Faces of every box that turn towards the viewer, in view space.
  const faces: Face[] = [];
  const SIGNS: [number, number][] = [
    [-1, -1],
    [1, -1],
    [1, 1],
    [-1, 1],
  ];
  for (const solid of solids) {
    for (let axis = 0; axis < 3; axis++) {
      for (const side of [1, -1]) {
        const normal = normalize(scale(solid.half[axis], side));
        if (dot(normal, forward) >= 0) continue;
        const a = solid.half[(axis + 1) % 3];
        const b = solid.half[(axis + 2) % 3];
        const faceCentre = addScaled(solid.centre, solid.half[axis], side);
        const corners = SIGNS.map(([sa, sb]) => project(addScaled(addScaled(faceCentre, a, sa), b, sb)));
        const light = 0.58 + 0.42 * Math.max(0, dot(normal, LIGHT));
        faces.push({ corners, colour: solid.colour.map((c) => Math.round(c * light)) as Rgb, opacity: solid.opacity, id: faces.length + 1 });
      }
    }
  }

  // Fit the projected design into the picture, keeping its proportions.
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const face of faces) {
    for (const [x, y] of face.corners) {
      minX = Math.min(minX, x);
      maxX = Math.max(maxX, x);
      minY = Math.min(minY, y);
      maxY = Math.max(maxY, y);
    }
  }
  const usableW = width * (1 - 2 * MARGIN);
  const usableH = height * (1 - 2 * MARGIN);
  const fit = Math.min(usableW / Math.max(maxX - minX, 1e-6), usableH / Math.max(maxY - minY, 1e-6));
  const offsetX = (width - (maxX - minX) * fit) / 2;
  const offsetY = (height - (maxY - minY) * fit) / 2;
  for (const face of faces) {
    face.corners = face.corners.map(([x, y, z]) => [offsetX + (x - minX) * fit, offsetY + (maxY - y) * fit, z]);
  }

  const depth = new Float64Array(width * height).fill(Infinity);
  const ids = new Int32Array(width * height);
  const colour = new Uint8ClampedArray(width * height * 3);

  // Solid parts first, with a depth buffer.
  for (const face of faces) {
    if (face.opacity < 1) continue;
    fillQuad(face, width, height, (index, z) => {
      if (z >= depth[index]) return;
      depth[index] = z;
      ids[index] = face.id;
      colour[index * 3] = face.colour[0];
      colour[index * 3 + 1] = face.colour[1];
      colour[index * 3 + 2] = face.colour[2];
    });
  }
  // Crease lines where one face meets another or the background.
  const crease = new Uint8Array(width * height);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const index = y * width + x;
      const id = ids[index];
      if (id === 0) continue;
      if ((x + 1 < width && ids[index + 1] !== id) || (x > 0 && ids[index - 1] !== id) || (y + 1 < height && ids[index + width] !== id) || (y > 0 && ids[index - width] !== id)) {
        crease[index] = 1;
      }
    }
  }
  for (let index = 0; index < width * height; index++) {
    if (ids[index] === 0) continue;
    const at = index * 4;
    for (let c = 0; c < 3; c++) rgba[at + c] = crease[index] ? CREASE[c] : colour[index * 3 + c];
    rgba[at + 3] = 255;
  }
  // Clear and tinted sheet over them, blended, hidden where a solid part is nearer.
  for (const face of faces) {
    if (face.opacity >= 1) continue;
    fillQuad(face, width, height, (index, z) => {
      if (z >= depth[index]) return;
      const at = index * 4;
      const under = rgba[at + 3] / 255;
      const alpha = face.opacity + under * (1 - face.opacity);
      for (let c = 0; c < 3; c++) {
        rgba[at + c] = Math.round((face.colour[c] * face.opacity + rgba[at + c] * under * (1 - face.opacity)) / alpha);
      }
      rgba[at + 3] = Math.round(alpha * 255);
    });
  }
  return { rgba, width, height };
}

/** Calls `plot` for every pixel whose centre lies in the quad (two triangles), with the depth there. */
function fillQuad(face: Face, width: number, height: number, plot: (index: number, depth: number) => void): void {
  const [a, b, c, d] = face.corners;
  fillTriangle(a, b, c, width, height, plot);
  fillTriangle(a, c, d, width, height, plot);
}

function fillTriangle(a: number[], b: number[], c: number[], width: number, height: number, plot: (index: number, depth: number) => void): void {
  const area = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  if (Math.abs(area) < 1e-9) return;
  // Barycentric weights and depth are linear in x along a row: weight = k * x + m.
  const edges = [
    [b, c],
    [c, a],
  ] as const;
  const y0 = Math.max(0, Math.floor(Math.min(a[1], b[1], c[1])));
  const y1 = Math.min(height - 1, Math.ceil(Math.max(a[1], b[1], c[1])));
  const xMin = Math.max(0, Math.floor(Math.min(a[0], b[0], c[0])));
  const xMax = Math.min(width - 1, Math.ceil(Math.max(a[0], b[0], c[0])));
  for (let y = y0; y <= y1; y++) {
    const py = y + 0.5;
    // w(px) for the weights of a and b, written as k·px + m.
    const [ka, kb] = edges.map(([p, q]) => (p[1] - q[1]) / area);
    const [ma, mb] = edges.map(([p, q]) => (p[0] * (q[1] - py) - (p[1] - py) * q[0]) / area);
    // Each of wa ≥ 0, wb ≥ 0, 1 − wa − wb ≥ 0 bounds px on one side.
    let lo = xMin + 0.5;
    let hi = xMax + 0.5;
    const bound = (k: number, m: number) => {
      // k·px + m ≥ 0
      if (Math.abs(k) < 1e-12) {
        if (m < 0) hi = -Infinity;
      } else if (k > 0) lo = Math.max(lo, -m / k);
      else hi = Math.min(hi, -m / k);
    };
    bound(ka, ma);
    bound(kb, mb);
    bound(-ka - kb, 1 - ma - mb);
    if (hi < lo) continue;
    const zk = ka * a[2] + kb * b[2] + (-ka - kb) * c[2];
    const zm = ma * a[2] + mb * b[2] + (1 - ma - mb) * c[2];
    const first = Math.max(xMin, Math.ceil(lo - 0.5));
    const last = Math.min(xMax, Math.floor(hi - 0.5));
    for (let x = first; x <= last; x++) plot(y * width + x, zk * (x + 0.5) + zm);
  }
}

function hexToRgb(hex: string): Rgb {
  const value = Number.parseInt(hex.replace('#', ''), 16);
  return [(value >> 16) & 255, (value >> 8) & 255, value & 255];
}
