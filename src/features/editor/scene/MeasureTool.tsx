import { useEffect, useMemo, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import { CLICK_SLOP_PX, useScene } from '@/components/viewer';
import { formatLength } from '@/domain/units';
import { useEditorStoreApi, useEditorStore } from '../store/editorStore';
import { snapPoint } from '../snapping/snap';
import { gridStepsFor, unitIncrement } from '../snapping/steps';
import { mmPerPixel, pointerRay } from './pointerRay';

type Point = [number, number, number];

/** "812 mm (X 800, Y 0, Z 140)": the straight distance and its parts along the axes, in the display units. */
export function measureText(a: Point, b: Point, units: 'mm' | 'in'): string {
  const d = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const parts = (['X', 'Y', 'Z'] as const).map((axis, i) => `${axis} ${formatLength(Math.abs(d[i]), units)}`);
  return `${formatLength(Math.hypot(d[0], d[1], d[2]), units)} (${parts.join(', ')})`;
}

/**
 * The measure tool: click a snapped point, then another; a line and a label show the distance
 * between them. A third click starts a new measurement; Escape clears it. It never edits the design.
 */
export function MeasureTool({ snapPixels = 12 }: { snapPixels?: number }) {
  const store = useEditorStoreApi();
  const tool = useEditorStore((s) => s.tool);
  const { catalogue } = useScene();
  const gl = useThree((s) => s.gl);
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as { target: THREE.Vector3 } | null;
  const invalidate = useThree((s) => s.invalidate);
  const lineRef = useRef<THREE.Line>(null);
  const line = useMemo(() => {
    const geometry = new THREE.BufferGeometry().setAttribute('position', new THREE.Float32BufferAttribute([0, 0, 0, 0, 0, 0], 3));
    const material = new THREE.LineBasicMaterial({ color: '#b4431f', depthTest: false, transparent: true });
    const object = new THREE.Line(geometry, material);
    object.renderOrder = 21;
    object.visible = false;
    return object;
  }, []);
  useEffect(() => () => {
    line.geometry.dispose();
    (line.material as THREE.Material).dispose();
  }, [line]);

  useEffect(() => {
    if (tool !== 'measure') {
      line.visible = false;
      invalidate();
      return;
    }
    const element = gl.domElement;
    const label = document.createElement('div');
    label.setAttribute('role', 'status');
    label.setAttribute('aria-live', 'polite');
    label.dataset.testid = 'measure-label';
    label.className = 'pointer-events-none absolute z-30 -translate-x-1/2 -translate-y-full whitespace-nowrap rounded bg-ink px-2 py-1 text-xs font-medium tabular-nums text-paper shadow';
    label.style.display = 'none';
    element.parentElement?.appendChild(label);
    let first: Point | null = null;
    let fixed = false;
    let down: { x: number; y: number } | null = null;
    const projected = new THREE.Vector3();

    const snapAt = (e: PointerEvent): Point => {
      const state = store.getState();
      const distance = controls ? camera.position.distanceTo(controls.target) : 2000;
      const tolerance = mmPerPixel(camera, element, distance) * snapPixels;
      return snapPoint(pointerRay(e, element, camera), state.design, catalogue, { grid: gridStepsFor(state.units).minor, tolerance, alongStep: unitIncrement(state.units) }).point as Point;
    };
    const show = (a: Point, b: Point) => {
      const positions = line.geometry.getAttribute('position') as THREE.BufferAttribute;
      positions.setXYZ(0, ...a);
      positions.setXYZ(1, ...b);
      positions.needsUpdate = true;
      line.geometry.computeBoundingSphere();
      line.visible = true;
      projected.set((a[0] + b[0]) / 2, (a[1] + b[1]) / 2, (a[2] + b[2]) / 2).project(camera);
      label.style.left = `${((projected.x + 1) / 2) * element.clientWidth}px`;
      label.style.top = `${((1 - projected.y) / 2) * element.clientHeight - 10}px`;
      label.textContent = measureText(a, b, store.getState().units);
      label.style.display = '';
      invalidate();
    };
    const onMove = (e: PointerEvent) => {
      if (first && !fixed) show(first, snapAt(e));
    };
    const onDown = (e: PointerEvent) => {
      down = { x: e.clientX, y: e.clientY };
    };
    const onUp = (e: PointerEvent) => {
      if (e.button !== 0 || !down || Math.hypot(e.clientX - down.x, e.clientY - down.y) > CLICK_SLOP_PX) return;
      down = null;
      const point = snapAt(e);
      if (!first || fixed) {
        first = point;
        fixed = false;
        show(point, point);
      } else {
        fixed = true;
        show(first, point);
      }
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape' || !first) return;
      e.stopPropagation();
      first = null;
      line.visible = false;
      label.style.display = 'none';
      invalidate();
    };
    element.addEventListener('pointermove', onMove);
    element.addEventListener('pointerdown', onDown);
    element.addEventListener('pointerup', onUp);
    window.addEventListener('keydown', onKey, true);
    element.style.cursor = 'crosshair';
    return () => {
      element.removeEventListener('pointermove', onMove);
      element.removeEventListener('pointerdown', onDown);
      element.removeEventListener('pointerup', onUp);
      window.removeEventListener('keydown', onKey, true);
      element.style.cursor = '';
      line.visible = false;
      label.remove();
      invalidate();
    };
  }, [tool, gl, camera, controls, store, catalogue, invalidate, line, snapPixels]);

  return <primitive ref={lineRef} object={line} />;
}
