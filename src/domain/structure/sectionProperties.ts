/**
 * Section properties of a cross-section drawn as polygons (mm), by Green's theorem over each edge
 * (the "shoelace" sums extended to first and second moments). Holes are subtracted whatever their
 * winding, so outlines and holes may be given clockwise or counter-clockwise.
 */

export type Point2 = readonly [number, number];
export type Polygon = Point2[];

export interface SectionProperties {
  /** mm² */
  area: number;
  /** mm, in the polygon's own coordinates */
  centroid: { x: number; y: number };
  /** mm⁴ about the centroidal x axis (∫y² dA) */
  ix: number;
  /** mm⁴ about the centroidal y axis (∫x² dA) */
  iy: number;
  /** mm⁴, product of area ∫xy dA about the centroid */
  ixy: number;
  /** mm³ = ix / max|y − cy| over the outline */
  sx: number;
  /** mm³ = iy / max|x − cx| over the outline */
  sy: number;
  /** mm, radius of gyration √(ix/A) */
  rx: number;
  /** mm, radius of gyration √(iy/A) */
  ry: number;
}

interface AreaIntegrals {
  area: number;
  firstX: number; // ∫x dA
  firstY: number; // ∫y dA
  secondXX: number; // ∫x² dA
  secondYY: number; // ∫y² dA
  secondXY: number; // ∫xy dA
}

/** Signed integrals over one polygon (mm-based), positive for counter-clockwise winding; coordinates shifted by (ox, oy). */
function polygonIntegrals(polygon: Polygon, ox: number, oy: number): AreaIntegrals {
  const out: AreaIntegrals = { area: 0, firstX: 0, firstY: 0, secondXX: 0, secondYY: 0, secondXY: 0 };
  const count = polygon.length;
  for (let k = 0; k < count; k++) {
    const xi = polygon[k][0] - ox;
    const yi = polygon[k][1] - oy;
    const xj = polygon[(k + 1) % count][0] - ox;
    const yj = polygon[(k + 1) % count][1] - oy;
    const cross = xi * yj - xj * yi;
    out.area += cross / 2;
    out.firstX += ((xi + xj) * cross) / 6;
    out.firstY += ((yi + yj) * cross) / 6;
    out.secondXX += ((xi * xi + xi * xj + xj * xj) * cross) / 12;
    out.secondYY += ((yi * yi + yi * yj + yj * yj) * cross) / 12;
    out.secondXY += ((xi * yj + 2 * xi * yi + 2 * xj * yj + xj * yi) * cross) / 24;
  }
  return out;
}

/** Signed area of a polygon in mm² (positive when counter-clockwise). */
export function signedPolygonArea(polygon: Polygon): number {
  return polygonIntegrals(polygon, 0, 0).area;
}

/**
 * Area, centroid, centroidal second moments, product of area, section moduli and radii of gyration
 * of an outline minus its holes (mm, mm², mm³, mm⁴). Works for either winding.
 */
export function polygonSectionProperties(outline: Polygon, holes: Polygon[] = []): SectionProperties {
  if (outline.length < 3) throw new Error('A cross-section outline needs at least 3 points.');
  // Shift to the outline's bounding-box centre so large coordinates do not cancel digits away.
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const [x, y] of outline) {
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
  }
  const ox = (minX + maxX) / 2;
  const oy = (minY + maxY) / 2;

  const total: AreaIntegrals = { area: 0, firstX: 0, firstY: 0, secondXX: 0, secondYY: 0, secondXY: 0 };
  const add = (polygon: Polygon, sign: 1 | -1) => {
    const part = polygonIntegrals(polygon, ox, oy);
    const orient = part.area < 0 ? -1 : 1; // make every polygon count positive, then apply sign
    for (const key of Object.keys(total) as (keyof AreaIntegrals)[]) total[key] += sign * orient * part[key];
  };
  add(outline, 1);
  for (const hole of holes) if (hole.length >= 3) add(hole, -1);

  const area = total.area;
  if (!(area > 0)) throw new Error('A cross-section must enclose a positive area.');
  const cx = total.firstX / area;
  const cy = total.firstY / area;
  const ix = total.secondYY - area * cy * cy;
  const iy = total.secondXX - area * cx * cx;
  const ixy = total.secondXY - area * cx * cy;

  let extremeY = 0;
  let extremeX = 0;
  for (const [x, y] of outline) {
    extremeX = Math.max(extremeX, Math.abs(x - ox - cx));
    extremeY = Math.max(extremeY, Math.abs(y - oy - cy));
  }
  return {
    area,
    centroid: { x: cx + ox, y: cy + oy },
    ix,
    iy,
    ixy,
    sx: ix / extremeY,
    sy: iy / extremeX,
    rx: Math.sqrt(ix / area),
    ry: Math.sqrt(iy / area),
  };
}

/** Principal second moments (mm⁴) and the angle of the major axis from x (radians). */
export function principalSecondMoments(section: Pick<SectionProperties, 'ix' | 'iy' | 'ixy'>): {
  major: number;
  minor: number;
  angle: number;
} {
  const mean = (section.ix + section.iy) / 2;
  const radius = Math.hypot((section.ix - section.iy) / 2, section.ixy);
  return { major: mean + radius, minor: mean - radius, angle: 0.5 * Math.atan2(-2 * section.ixy, section.ix - section.iy) };
}

// ---------------------------------------------------------------------------------------------
// Closed forms (any mechanics of materials text)

function symmetricSection(area: number, ix: number, iy: number, halfHeight: number, halfWidth: number): SectionProperties {
  return {
    area,
    centroid: { x: 0, y: 0 },
    ix,
    iy,
    ixy: 0,
    sx: ix / halfHeight,
    sy: iy / halfWidth,
    rx: Math.sqrt(ix / area),
    ry: Math.sqrt(iy / area),
  };
}

/** Solid rectangle b wide (x) by h high (y), mm: A = bh, Ix = bh³/12. Centred on the origin. */
export function rectangleSection(width: number, height: number): SectionProperties {
  return symmetricSection(width * height, (width * height ** 3) / 12, (height * width ** 3) / 12, height / 2, width / 2);
}

/** Hollow rectangle, outer B × H and centred inner b × h, mm: Ix = (BH³ − bh³)/12, Sx = 2Ix/H. */
export function hollowRectangleSection(outerWidth: number, outerHeight: number, innerWidth: number, innerHeight: number): SectionProperties {
  if (innerWidth >= outerWidth || innerHeight >= outerHeight) throw new Error('The inner rectangle must be smaller than the outer.');
  return symmetricSection(
    outerWidth * outerHeight - innerWidth * innerHeight,
    (outerWidth * outerHeight ** 3 - innerWidth * innerHeight ** 3) / 12,
    (outerHeight * outerWidth ** 3 - innerHeight * innerWidth ** 3) / 12,
    outerHeight / 2,
    outerWidth / 2,
  );
}

/** Solid circle of diameter d, mm: A = πd²/4, I = πd⁴/64. */
export function circleSection(diameter: number): SectionProperties {
  const i = (Math.PI * diameter ** 4) / 64;
  return symmetricSection((Math.PI * diameter ** 2) / 4, i, i, diameter / 2, diameter / 2);
}

/** Hollow circle (tube) of outer D and inner d, mm: I = π(D⁴ − d⁴)/64. */
export function hollowCircleSection(outerDiameter: number, innerDiameter: number): SectionProperties {
  if (innerDiameter >= outerDiameter) throw new Error('The inner diameter must be smaller than the outer.');
  const i = (Math.PI * (outerDiameter ** 4 - innerDiameter ** 4)) / 64;
  return symmetricSection((Math.PI * (outerDiameter ** 2 - innerDiameter ** 2)) / 4, i, i, outerDiameter / 2, outerDiameter / 2);
}

/** Counter-clockwise rectangle polygon w × h (mm) centred on (cx, cy). */
export function rectanglePolygon(width: number, height: number, cx = 0, cy = 0): Polygon {
  const w = width / 2;
  const h = height / 2;
  return [
    [cx - w, cy - h],
    [cx + w, cy - h],
    [cx + w, cy + h],
    [cx - w, cy + h],
  ];
}

/**
 * Counter-clockwise regular polygon approximating a circle of diameter d (mm) centred on (cx, cy).
 * The vertices are pushed out so the polygon has the circle's area (error in I is then O(1/n²)).
 */
export function circlePolygon(diameter: number, segments = 64, cx = 0, cy = 0): Polygon {
  const n = Math.max(3, Math.floor(segments));
  // Area of a regular n-gon with circumradius R is (n/2)R²sin(2π/n); match πr².
  const r = diameter / 2;
  const radius = r * Math.sqrt((2 * Math.PI) / (n * Math.sin((2 * Math.PI) / n)));
  const points: Polygon = [];
  for (let k = 0; k < n; k++) {
    const angle = (2 * Math.PI * k) / n;
    points.push([cx + radius * Math.cos(angle), cy + radius * Math.sin(angle)]);
  }
  return points;
}
