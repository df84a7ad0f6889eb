/**
 * Rigid transforms of profiles and panels (move, mirror, quarter turns), keeping each profile's
 * section orientation (roll) and the faces of its machining, and each panel's width/height and
 * cut-outs, consistent with the moved geometry.
 */
import { faceNormal, sectionAxes } from '../geometry/profileGeometry';
import { dot, type Vec3 } from '../geometry/vectors';
import type { Axis, Panel, Profile } from './schema';

export interface RigidTransform {
  point(p: readonly [number, number, number]): Vec3;
  /** The linear part, applied to directions. */
  vector(v: readonly [number, number, number]): Vec3;
}

const AXES: Axis[] = ['x', 'y', 'z'];
const AXIS_INDEX: Record<Axis, 0 | 1 | 2> = { x: 0, y: 1, z: 2 };

const clean = (v: number) => (Math.abs(v) < 1e-9 ? 0 : Math.round(v * 1e9) / 1e9);
const cleanVec = (v: readonly number[]): Vec3 => [clean(v[0]), clean(v[1]), clean(v[2])];

export function translation(offset: readonly [number, number, number]): RigidTransform {
  return {
    point: (p) => cleanVec([p[0] + offset[0], p[1] + offset[1], p[2] + offset[2]]),
    vector: (v) => [v[0], v[1], v[2]],
  };
}

/** Reflection in the plane through `through` whose normal is `axis`. */
export function mirror(axis: Axis, through: readonly [number, number, number]): RigidTransform {
  const i = AXIS_INDEX[axis];
  return {
    point: (p) => {
      const q: Vec3 = [p[0], p[1], p[2]];
      q[i] = 2 * through[i] - p[i];
      return cleanVec(q);
    },
    vector: (v) => {
      const q: Vec3 = [v[0], v[1], v[2]];
      q[i] = -v[i];
      return cleanVec(q);
    },
  };
}

/** Quarter turns (right-handed, counter-clockwise looking down the axis) about an axis through a point. */
export function quarterTurns(axis: Axis, through: readonly [number, number, number], turns: number): RigidTransform {
  const n = (((Math.round(turns) % 4) + 4) % 4) as 0 | 1 | 2 | 3;
  const rotate = (v: readonly [number, number, number]): Vec3 => {
    let [x, y, z] = v;
    for (let k = 0; k < n; k++) {
      if (axis === 'x') [y, z] = [-z, y];
      else if (axis === 'y') [z, x] = [-x, z];
      else [x, y] = [-y, x];
    }
    return cleanVec([x, y, z]);
  };
  return {
    point: (p) => {
      const r = rotate([p[0] - through[0], p[1] - through[1], p[2] - through[2]]);
      return cleanVec([r[0] + through[0], r[1] + through[1], r[2] + through[2]]);
    },
    vector: rotate,
  };
}

/** The roll that makes a profile along `direction` have its section width axis along ±`widthAxis`. */
export function rollForWidthAxis(direction: readonly [number, number, number], widthAxis: readonly [number, number, number]): number {
  const base = sectionAxes(direction, 0);
  const deg = (Math.atan2(dot(widthAxis, base.v), dot(widthAxis, base.u)) * 180) / Math.PI;
  // The section is symmetric, so keep the roll in [0, 180).
  const r = ((Math.round(deg * 1e6) / 1e6) % 180 + 180) % 180;
  return r === 180 ? 0 : r;
}

export function transformProfile(p: Profile, t: RigidTransform): Profile {
  const before = sectionAxes(p.direction, p.rollDeg);
  const direction = t.vector(p.direction);
  const newU = t.vector(before.u);
  const rollDeg = rollForWidthAxis(direction, newU);
  const after = sectionAxes(direction, rollDeg);
  const machining = p.machining.map((m) => {
    const n = t.vector(faceNormal(before, m.face));
    let best = m.face;
    let bestDot = -Infinity;
    for (let f = 0; f < 4; f++) {
      const d = dot(n, faceNormal(after, f));
      if (d > bestDot + 1e-9) {
        bestDot = d;
        best = f;
      }
    }
    return { ...m, face: best };
  });
  return { ...p, start: t.point(p.start), direction, rollDeg, machining };
}

function unitAxis(a: Axis): Vec3 {
  const v: Vec3 = [0, 0, 0];
  v[AXIS_INDEX[a]] = 1;
  return v;
}

function panelPlaneAxes(normal: Axis): [Axis, Axis] {
  const others = AXES.filter((a) => a !== normal);
  return [others[0], others[1]];
}

function axisOf(v: Vec3): Axis {
  const abs = v.map(Math.abs);
  return abs[0] >= abs[1] && abs[0] >= abs[2] ? 'x' : abs[1] >= abs[2] ? 'y' : 'z';
}

export function transformPanel(panel: Panel, t: RigidTransform): Panel {
  const [wAxis, hAxis] = panelPlaneAxes(panel.rect.normal);
  const normal = axisOf(t.vector(unitAxis(panel.rect.normal)));
  const [newW, newH] = panelPlaneAxes(normal);
  const wMapped = t.vector(unitAxis(wAxis));
  const hMapped = t.vector(unitAxis(hAxis));
  const swapped = axisOf(wMapped) !== newW;
  const cutouts = panel.cutouts.map((c) => {
    const world: Vec3 = [0, 0, 0];
    for (let i = 0; i < 3; i++) world[i] = c.u * wMapped[i] + c.v * hMapped[i];
    return { ...c, u: clean(world[AXIS_INDEX[newW]]), v: clean(world[AXIS_INDEX[newH]]) };
  });
  return {
    ...panel,
    cutouts,
    rect: {
      center: t.point(panel.rect.center),
      normal,
      width: swapped ? panel.rect.height : panel.rect.width,
      height: swapped ? panel.rect.width : panel.rect.height,
    },
  };
}
