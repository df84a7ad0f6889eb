/** Where a panel is in space: its in-plane axes and box (mm). */
import type { Box } from './box';

export type AxisName = 'x' | 'y' | 'z';

export interface PanelAxes {
  readonly n: 0 | 1 | 2;
  readonly w: 0 | 1 | 2;
  readonly h: 0 | 1 | 2;
}

/** The normal axis, then the other two in x, y, z order; one shared record per normal. */
const PANEL_AXES: Record<AxisName, PanelAxes> = {
  x: { n: 0, w: 1, h: 2 },
  y: { n: 1, w: 0, h: 2 },
  z: { n: 2, w: 0, h: 1 },
};

/** Index of the normal axis, then of the width and height axes (the other two in x, y, z order). */
export function panelAxes(normal: AxisName): PanelAxes {
  return PANEL_AXES[normal];
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
