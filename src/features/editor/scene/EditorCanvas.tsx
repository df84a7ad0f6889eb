import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Canvas } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import * as THREE from 'three';
import { defaultCatalogue, type Catalogue } from '@/domain/catalogue';
import { useEditorStoreApi } from '../store/editorStore';
import { CameraDirector } from './CameraDirector';
import { DesignParts } from './DesignParts';
import { DrawProfileTool } from './DrawProfileTool';
import { FindingMarkers } from './FindingMarkers';
import { HoverPicker } from './HoverPicker';
import { MoveGizmo } from './MoveGizmo';
import { OpeningTargets } from './OpeningTargets';
import { OrientationCube } from './OrientationCube';
import { OrientationCubeSync } from './OrientationCubeSync';
import { CLICK_SLOP_PX } from './useSelectOnClick';
import { renderModeFromUrl } from './renderMode';
import { SceneContext, type SceneShared } from './sceneContext';
import { SceneLights } from './SceneLights';
import { SceneResources } from './sceneResources';
import { SceneTestHook } from './SceneTestHook';
import { UnitGrid } from './UnitGrid';

interface EditorCanvasProps {
  /** Catalogue the parts are drawn from (default: the built-in catalogue). */
  catalogue?: Catalogue;
  /** Extra class names for the wrapper, which fills its parent (default none). */
  className?: string;
  /** Extra scene content, such as overlays from other editor features (default none). */
  children?: ReactNode;
}

/** Camera clipping planes, mm: near enough for a close look at a slot, far enough for a 20 m frame. */
const NEAR_MM = 5;
const FAR_MM = 120_000;

/**
 * The editor's 3D view: ONE persistent canvas (render on demand, Y up, mm), drawing the store's
 * design and answering its camera requests. Mount it once; it never remounts as the design
 * changes. Everything it allocates is disposed when it unmounts.
 */
export function EditorCanvas({ catalogue = defaultCatalogue, className, children }: EditorCanvasProps) {
  const store = useEditorStoreApi();
  const cubeRef = useRef<HTMLDivElement>(null);
  const pointerDown = useRef<{ x: number; y: number } | null>(null);
  const [shared] = useState<SceneShared>(() => ({
    catalogue,
    resources: new SceneResources(catalogue),
    renderMode: renderModeFromUrl(),
    pickables: new Set(),
    anchors: { current: new Map() },
    aimCamera: { current: null },
    gizmoBusy: { current: false },
  }));
  useEffect(() => () => shared.resources.dispose(), [shared]);

  const gl = useMemo(() => ({ antialias: true, preserveDrawingBuffer: false, powerPreference: 'high-performance' as const }), []);

  return (
    <SceneContext.Provider value={shared}>
      <div
        className={`relative h-full w-full overflow-hidden bg-paper-sunk ${className ?? ''}`}
        data-testid="editor-canvas"
        onPointerDownCapture={(e) => {
          pointerDown.current = { x: e.clientX, y: e.clientY };
        }}
      >
        <Canvas
          frameloop="demand"
          dpr={[1, 2]}
          gl={gl}
          camera={{ fov: 40, near: NEAR_MM, far: FAR_MM, position: [2400, 1800, 3000], up: [0, 1, 0] }}
          onCreated={({ gl: renderer, scene }) => {
            renderer.setClearColor('#eef0ee');
            renderer.toneMapping = THREE.ACESFilmicToneMapping;
            renderer.toneMappingExposure = 1.05;
            scene.fog = null;
          }}
          onPointerMissed={(e) => {
            // A click on empty space clears the selection; the end of a camera drag or a gizmo click does not.
            const down = pointerDown.current;
            const dragged = down && Math.hypot(e.clientX - down.x, e.clientY - down.y) > CLICK_SLOP_PX;
            const state = store.getState();
            if (dragged || shared.gizmoBusy.current || state.tool !== 'select' || e.button !== 0) return;
            state.clearSelection();
          }}
        >
          <SceneLights />
          <UnitGrid />
          <DesignParts />
          <FindingMarkers />
          <OpeningTargets />
          <DrawProfileTool />
          <MoveGizmo />
          <OrbitControls makeDefault enableDamping={false} zoomToCursor minDistance={40} maxDistance={60_000} />
          <CameraDirector />
          <HoverPicker />
          <OrientationCubeSync cubeRef={cubeRef} />
          <SceneTestHook />
          {children}
        </Canvas>
        <OrientationCube cubeRef={cubeRef} />
      </div>
    </SceneContext.Provider>
  );
}
