/** Where a panel is in space: its in-plane axes and box (mm). */
import type { Box } from './box';

export type AxisName = 'x' | 'y' | 'z';
const AXIS_INDEX: Record<AxisName, 0 | 1 | 2> = { x: 0, y: 1, z: 2 };

/** Index of the normal axis, then of the width and height axes (the other two in x, y, z order). */
export function panelAxes(normal: AxisName): { n: 0 | 1 | 2; w: 0 | 1 | 2; h: 0 | 1 | 2 } {
  const n = AXIS_INDEX[normal];
  const others = ([0, 1, 2] as const).filter((i) => i !== n) as (0 | 1 | 2)[];
  return { n, w: others[0], h: others[1] };
}

/** Box of a sheet `width` × `height` × `thickness` centred on `center` facing `normal`. */
export function panelBox(center: readonly [number, number, number], normal: AxisName, width: number, height: number, thickness: number): Box {
  const { n, w, h } = panelAxes(normal);
  const half: [number, number, number] = [0, 0, 0];
  half[n] = thickness / 2;
  half[w] = width / 2;
  half[h] = height / 2;
  return {
    minX: center[0] - half[0],
    minY: center[1] - half[1],
    minZ: center[2] - half[2],
    maxX: center[0] + half[0],
    maxY: center[1] + half[1],
    maxZ: center[2] + half[2],
  };
}
