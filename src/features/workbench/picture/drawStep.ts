/**
 * A light step picture on a 2D canvas: an isometric view of the frame with earlier steps in grey,
 * this step's parts in the accent colour, pulled back along their insertion direction (exploded),
 * and later steps left out. No three.js, so the workbench, the print view and offline use stay
 * light; the shared 3D player replaces it on screens where it is available.
 * Units: mm in, pixels out.
 */
import { defaultCatalogue, getVariant } from '@/domain/catalogue';
import type { DesignDocument } from '@/domain/design/schema';

type V3 = [number, number, number];

export interface StepPictureInput {
  design: DesignDocument;
  /** Part ids placed in the steps before this one. */
  donePartIds: Set<string>;
  /** Part ids this step places. */
  stepPartIds: Set<string>;
  insertionDirection: V3 | null;
  /** Pull the step's parts back along the insertion direction (mm). */
  explode?: number;
}

interface Segment {
  a: V3;
  b: V3;
  width: number;
  state: 'done' | 'step';
}

interface Quad {
  corners: V3[];
  state: 'done' | 'step';
}

const COS30 = Math.cos(Math.PI / 6);
const SIN30 = 0.5;
/** Isometric projection with y up, seen from the front-right and above (front is -z); screen y grows downwards. */
const project = ([x, y, z]: V3): [number, number] => [(x - z) * COS30, -y - (x + z) * SIN30];

const add = (a: V3, b: V3, k = 1): V3 => [a[0] + b[0] * k, a[1] + b[1] * k, a[2] + b[2] * k];

function panelCorners(center: V3, normal: 'x' | 'y' | 'z', width: number, height: number): V3[] {
  const axes = (['x', 'y', 'z'] as const).filter((axis) => axis !== normal);
  const unit = (axis: 'x' | 'y' | 'z'): V3 => (axis === 'x' ? [1, 0, 0] : axis === 'y' ? [0, 1, 0] : [0, 0, 1]);
  const u = unit(axes[0]);
  const v = unit(axes[1]);
  return [
    add(add(center, u, -width / 2), v, -height / 2),
    add(add(center, u, width / 2), v, -height / 2),
    add(add(center, u, width / 2), v, height / 2),
    add(add(center, u, -width / 2), v, height / 2),
  ];
}

/** Draws the step picture into `ctx` over a `width` × `height` pixel area. */
export function drawStepPicture(ctx: CanvasRenderingContext2D, width: number, height: number, input: StepPictureInput): void {
  const { design, donePartIds, stepPartIds } = input;
  const pull = input.insertionDirection && input.explode !== 0 ? add([0, 0, 0], input.insertionDirection, -(input.explode ?? 250)) : ([0, 0, 0] as V3);
  const segments: Segment[] = [];
  const quads: Quad[] = [];
  const all: V3[] = [];

  for (const profile of design.profiles) {
    const end = add(profile.start as V3, profile.direction as V3, profile.length);
    all.push(profile.start as V3, end);
    const state = stepPartIds.has(profile.id) ? 'step' : donePartIds.has(profile.id) ? 'done' : null;
    if (!state) continue;
    const offset = state === 'step' ? pull : ([0, 0, 0] as V3);
    const variant = getVariant(defaultCatalogue, profile.variantId);
    segments.push({ a: add(profile.start as V3, offset), b: add(end, offset), width: variant?.width ?? 30, state });
  }
  for (const panel of design.panels) {
    const state = stepPartIds.has(panel.id) ? 'step' : donePartIds.has(panel.id) ? 'done' : null;
    if (!state) continue;
    const offset = state === 'step' ? pull : ([0, 0, 0] as V3);
    quads.push({ corners: panelCorners(add(panel.rect.center as V3, offset), panel.rect.normal, panel.rect.width, panel.rect.height), state });
  }

  ctx.save();
  ctx.fillStyle = '#f7f5f0';
  ctx.fillRect(0, 0, width, height);
  // Fit the whole frame (not just what is drawn) so the view holds still from step to step.
  const projected = all.length > 0 ? all.map(project) : [[0, 0] as [number, number]];
  const xs = projected.map((p) => p[0]);
  const ys = projected.map((p) => p[1]);
  const spanX = Math.max(1, Math.max(...xs) - Math.min(...xs));
  const spanY = Math.max(1, Math.max(...ys) - Math.min(...ys));
  const scale = Math.min((width * 0.8) / spanX, (height * 0.8) / spanY);
  const ox = width / 2 - ((Math.max(...xs) + Math.min(...xs)) / 2) * scale;
  const oy = height / 2 - ((Math.max(...ys) + Math.min(...ys)) / 2) * scale;
  const toScreen = (point: V3): [number, number] => {
    const [px, py] = project(point);
    return [ox + px * scale, oy + py * scale];
  };

  for (const state of ['done', 'step'] as const) {
    for (const quad of quads.filter((item) => item.state === state)) {
      ctx.beginPath();
      quad.corners.map(toScreen).forEach(([x, y], index) => (index === 0 ? ctx.moveTo(x, y) : ctx.lineTo(x, y)));
      ctx.closePath();
      ctx.fillStyle = state === 'step' ? 'rgba(217, 119, 6, 0.35)' : 'rgba(120, 130, 140, 0.18)';
      ctx.fill();
      ctx.strokeStyle = state === 'step' ? '#b45309' : '#9aa3ab';
      ctx.lineWidth = state === 'step' ? 2 : 1;
      ctx.stroke();
    }
    for (const segment of segments.filter((item) => item.state === state)) {
      const [ax, ay] = toScreen(segment.a);
      const [bx, by] = toScreen(segment.b);
      ctx.lineCap = 'square';
      ctx.strokeStyle = state === 'step' ? '#92400e' : '#5b6670';
      ctx.lineWidth = Math.max(2, segment.width * scale) + 2;
      ctx.beginPath();
      ctx.moveTo(ax, ay);
      ctx.lineTo(bx, by);
      ctx.stroke();
      ctx.strokeStyle = state === 'step' ? '#f59e0b' : '#c3cad1';
      ctx.lineWidth = Math.max(1, segment.width * scale);
      ctx.stroke();
    }
  }
  ctx.restore();
}

/** The picture as a PNG data URL (print view, offline copies). */
export function stepPictureDataUrl(input: StepPictureInput, width = 640, height = 480): string {
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const ctx = canvas.getContext('2d');
  if (!ctx) return '';
  drawStepPicture(ctx, width, height, input);
  return canvas.toDataURL('image/png');
}
