import { useEffect, useMemo, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import { formatLength } from '@/domain/units';
import { operationCommand } from '../commands';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { drawTarget } from '../snapping/drawTarget';
import { snapPoint } from '../snapping/snap';
import { gridStepsFor, unitIncrement } from '../snapping/steps';
import type { Vec3 } from '@/domain/geometry';
import { CLICK_SLOP_PX } from '@/components/viewer';
import { mmPerPixel, pointerRay } from './pointerRay';
import { profileMatrix } from '@/components/viewer';
import { useScene } from '@/components/viewer';

interface DrawProfileToolProps {
  /** How close the pointer must pass a target to snap to it, CSS px (default 12). */
  snapPixels?: number;
}

const SNAP_COLOURS = { end: '#0b7a75', 'face-centre': '#285e9e', 'slot-line': '#6a4bb0', grid: '#5d6873', step: '#5d6873' } as const;

/**
 * The draw-profile tool: the first click sets a snapped start point, moving stretches a preview
 * profile along the world axis the pointer follows with a live length label, the second click
 * adds the profile as one command; Escape cancels. Mounted always; active only for its tool.
 */
export function DrawProfileTool({ snapPixels = 12 }: DrawProfileToolProps) {
  const store = useEditorStoreApi();
  const tool = useEditorStore((s) => s.tool);
  const variantId = useEditorStore((s) => s.drawSystemVariantId);
  const { resources, catalogue } = useScene();
  const gl = useThree((s) => s.gl);
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as { target: THREE.Vector3 } | null;
  const invalidate = useThree((s) => s.invalidate);

  const previewRef = useRef<THREE.Mesh>(null);
  const markerRef = useRef<THREE.Mesh>(null);
  const start = useRef<Vec3 | null>(null);
  const geometry = useMemo(() => resources.profileGeometry(variantId) ?? resources.hardwareGeometry('block'), [resources, variantId]);
  const markerGeometry = useMemo(() => new THREE.SphereGeometry(1, 16, 12), []);
  const markerMaterial = useMemo(() => new THREE.MeshBasicMaterial({ color: SNAP_COLOURS.grid, depthTest: false, transparent: true }), []);
  useEffect(
    () => () => {
      markerGeometry.dispose();
      markerMaterial.dispose();
    },
    [markerGeometry, markerMaterial],
  );

  useEffect(() => {
    const preview = previewRef.current;
    const marker = markerRef.current;
    if (!preview || !marker) return;
    const element = gl.domElement;
    // The length label is plain DOM over the canvas, placed by projecting the preview's midpoint.
    const label = document.createElement('div');
    label.setAttribute('role', 'status');
    label.setAttribute('aria-live', 'polite');
    label.className = 'pointer-events-none absolute z-30 -translate-x-1/2 -translate-y-full whitespace-nowrap rounded bg-ink px-2 py-1 text-xs font-medium tabular-nums text-paper shadow';
    label.style.display = 'none';
    const hideAll = () => {
      preview.visible = false;
      marker.visible = false;
      label.style.display = 'none';
      invalidate();
    };
    if (tool !== 'draw-profile') {
      start.current = null;
      hideAll();
      return;
    }
    element.parentElement?.appendChild(label);
    const projected = new THREE.Vector3();
    let down: { x: number; y: number } | null = null;
    let frame: number | null = null;
    let lastMove: PointerEvent | null = null;
    let lastTarget: ReturnType<typeof drawTarget> | null = null;

    const settings = () => {
      const state = store.getState();
      const distance = controls ? camera.position.distanceTo(controls.target) : 2000;
      const { minor } = gridStepsFor(state.units);
      return { state, grid: minor, step: unitIncrement(state.units), tolerance: mmPerPixel(camera, element, distance) * snapPixels, pixel: mmPerPixel(camera, element, distance) };
    };

    const update = () => {
      frame = null;
      const e = lastMove;
      if (!e) return;
      const { state, grid, step, tolerance, pixel } = settings();
      const ray = pointerRay(e, element, camera);
      if (!start.current) {
        const hit = snapPoint(ray, state.design, catalogue, { grid, tolerance, alongStep: step });
        marker.position.set(...hit.point);
        marker.scale.setScalar(pixel * 5);
        markerMaterial.color.set(SNAP_COLOURS[hit.kind]);
        marker.visible = true;
        preview.visible = false;
        label.style.display = 'none';
      } else {
        lastTarget = drawTarget(start.current, ray, state.design, catalogue, { step, tolerance, grid });
        const { direction, length, end, kind } = lastTarget;
        marker.position.set(...end);
        marker.scale.setScalar(pixel * 5);
        markerMaterial.color.set(SNAP_COLOURS[kind]);
        marker.visible = true;
        if (length > 0) {
          preview.matrix.copy(profileMatrix({ start: start.current, direction, length, rollDeg: 0 }));
          preview.visible = true;
        } else preview.visible = false;
        projected.set((start.current[0] + end[0]) / 2, (start.current[1] + end[1]) / 2, (start.current[2] + end[2]) / 2).project(camera);
        label.style.left = `${((projected.x + 1) / 2) * element.clientWidth}px`;
        label.style.top = `${((1 - projected.y) / 2) * element.clientHeight - 10}px`;
        label.textContent = formatLength(length, state.units);
        label.style.display = '';
      }
      invalidate();
    };

    const onMove = (e: PointerEvent) => {
      lastMove = e;
      if (frame === null) frame = requestAnimationFrame(update);
    };
    const onDown = (e: PointerEvent) => {
      down = { x: e.clientX, y: e.clientY };
    };
    const onUp = (e: PointerEvent) => {
      if (e.button !== 0 || !down || Math.hypot(e.clientX - down.x, e.clientY - down.y) > CLICK_SLOP_PX) return;
      down = null;
      const { state, grid, step, tolerance } = settings();
      const ray = pointerRay(e, element, camera);
      if (!start.current) {
        start.current = snapPoint(ray, state.design, catalogue, { grid, tolerance, alongStep: step }).point;
        lastMove = e;
        update();
        return;
      }
      const target = drawTarget(start.current, ray, state.design, catalogue, { step, tolerance, grid });
      if (target.length < step) return;
      const from = start.current;
      start.current = null;
      state.execute(
        operationCommand(`Draw profile ${formatLength(target.length, state.units)}`, {
          type: 'addProfile',
          payload: { profile: { variantId: state.drawSystemVariantId, start: from, direction: target.direction, length: target.length } },
        }),
      );
      lastMove = e;
      update();
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape' || !start.current) return;
      e.stopPropagation();
      start.current = null;
      lastTarget = null;
      hideAll();
    };

    element.addEventListener('pointermove', onMove);
    element.addEventListener('pointerdown', onDown);
    element.addEventListener('pointerup', onUp);
    window.addEventListener('keydown', onKey, true);
    element.style.cursor = 'crosshair';
    return () => {
      if (frame !== null) cancelAnimationFrame(frame);
      element.removeEventListener('pointermove', onMove);
      element.removeEventListener('pointerdown', onDown);
      element.removeEventListener('pointerup', onUp);
      window.removeEventListener('keydown', onKey, true);
      element.style.cursor = '';
      void lastTarget;
      hideAll();
      label.remove();
    };
  }, [tool, gl, camera, controls, store, catalogue, invalidate, markerMaterial, snapPixels]);

  return (
    <group name="draw-profile-tool">
      <mesh ref={previewRef} geometry={geometry} material={resources.surface('preview')} matrixAutoUpdate={false} visible={false} raycast={() => null} />
      <mesh ref={markerRef} geometry={markerGeometry} material={markerMaterial} visible={false} renderOrder={20} raycast={() => null} />
    </group>
  );
}
