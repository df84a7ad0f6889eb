import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Canvas } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import * as THREE from 'three';
import { defaultCatalogue, type Catalogue } from '@/domain/catalogue';
import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import { CameraDirector } from './CameraDirector';
import { DesignParts } from './DesignParts';
import { FindingMarkers } from './FindingMarkers';
import { LevelOfDetail } from './LevelOfDetail';
import { designFootprint } from './footprint';
import { renderModeFromUrl } from './renderMode';
import { HighlightContext, PartClickContext, SceneContext, type SceneShared } from './sceneContext';
import { SceneLights } from './SceneLights';
import { isSoftwareRenderer } from './softwareRenderer';
import { SceneResources } from './sceneResources';
import { SceneTestHook } from './SceneTestHook';
import { UnitGrid } from './UnitGrid';
import { CLICK_SLOP_PX } from './useSelectOnClick';
import { VIEW_DIRECTIONS } from './cameraFraming';
import { ViewPlan, ViewPlanSync } from './ViewPlan';
import { quietThreeWarnings } from './quietThreeWarnings';
import type { CameraRequest, PartClickMode, PartHighlight, ViewerDisplayOptions } from './viewerTypes';

// Before any canvas exists: fiber's store makes a deprecated THREE.Clock (see quietThreeWarnings).
quietThreeWarnings();

export interface DesignViewerProps {
  /** The design to draw (required). Parts are re-laid out only when this object changes. */
  design: DesignDocument;
  /** Its analysis: finding badges and tints (default null: none). */
  analysis?: DesignAnalysis | null;
  /** Part ids drawn as selected (default none). */
  selection?: readonly string[];
  /** Part id drawn as hovered (default none). */
  hoveredId?: string | null;
  /** Grid, badges, panels, contact shadow (defaults: all on, mm grid). */
  display?: ViewerDisplayOptions;
  /** One-shot camera request (frame parts, named view); acted on when its nonce changes (default none). */
  cameraRequest?: CameraRequest | null;
  /** When this changes, the camera frames the whole design at once (default: the design's id-less identity, i.e. framed once on mount). */
  frameKey?: string | number | null;
  /** A part was clicked (not dragged). Without it parts are not clickable (default none). */
  onPartClick?: (partId: string, mode: PartClickMode) => void;
  /** A click (not a drag) landed on empty space (default none). */
  onEmptyClick?: (event: MouseEvent) => void;
  /** Catalogue the parts are drawn from (default: the built-in catalogue). */
  catalogue?: Catalogue;
  /** Show our orientation control, the plan of the footprint (default true). */
  viewPlan?: boolean;
  /** Extra content INSIDE the canvas: editor tools, the step player's animation (default none). */
  children?: ReactNode;
  /** Extra HTML over the canvas, positioned by the caller (default none). */
  overlay?: ReactNode;
  /** Extra class names for the wrapper, which fills its parent (default none). */
  className?: string;
  /** data-testid of the wrapper (default 'design-viewer'). */
  testId?: string;
}

/** Camera clipping planes, mm: near enough for a close look at a slot, far enough for a 20 m frame. */
const NEAR_MM = 5;
const FAR_MM = 120_000;

/**
 * The shared 3D view of a design: ONE persistent canvas (render on demand, Y up, mm, front at -Z)
 * drawing the design from props, with lights, contact shadow, floor grid, finding badges, orbit
 * and pinch zoom, camera framing and our plan-shaped orientation control. Reads no store: the
 * editor, the viewer page, the workbench and review pages pass their data in and add their own
 * tools as `children`. Mount it once; it never remounts as the design changes, and disposes
 * everything it allocated when it unmounts. Installs `window.__slotwiseScene` for tests.
 */
export function DesignViewer({
  design,
  analysis = null,
  selection,
  hoveredId = null,
  display,
  cameraRequest,
  frameKey = null,
  onPartClick,
  onEmptyClick,
  catalogue = defaultCatalogue,
  viewPlan = true,
  children,
  overlay,
  className,
  testId = 'design-viewer',
}: DesignViewerProps) {
  const markerRef = useRef<SVGGElement>(null);
  const pointerDown = useRef<{ x: number; y: number } | null>(null);
  const [shared] = useState<SceneShared>(() => ({
    catalogue,
    resources: new SceneResources(catalogue),
    renderMode: renderModeFromUrl(),
    pickables: new Set(),
    anchors: { current: new Map() },
    aimCamera: { current: null },
    gizmoBusy: { current: false },
    drawn: { batches: new Set(), version: 0 },
    playerProbe: { current: null },
  }));
  useEffect(() => () => shared.resources.dispose(), [shared]);

  // Software WebGL (no GPU) draws without multisampling: it costs seconds on the first frame there.
  const gl = useMemo(() => ({ antialias: !isSoftwareRenderer(), preserveDrawingBuffer: false, powerPreference: 'high-performance' as const }), []);
  const emptySelection = useRef<readonly string[]>([]).current;
  const highlight = useMemo<PartHighlight>(() => ({ selection: selection ?? emptySelection, hoveredId, analysis }), [selection, emptySelection, hoveredId, analysis]);
  const footprint = useMemo(() => designFootprint(design), [design]);
  const [ownRequest, setOwnRequest] = useState<CameraRequest | null>(null);
  const units = display?.units ?? 'mm';

  return (
    <SceneContext.Provider value={shared}>
      <HighlightContext.Provider value={highlight}>
        <PartClickContext.Provider value={onPartClick}>
          <div
            className={`relative h-full w-full touch-none overflow-hidden bg-paper-sunk ${className ?? ''}`}
            data-testid={testId}
            onPointerDownCapture={(e) => {
              pointerDown.current = { x: e.clientX, y: e.clientY };
            }}
          >
            <Canvas
              frameloop="demand"
              dpr={[1, 2]}
              gl={gl}
              shadows={false}
              camera={{ fov: 40, near: NEAR_MM, far: FAR_MM, position: [2400, 1800, -3000], up: [0, 1, 0] }}
              onCreated={({ gl: renderer, scene }) => {
                renderer.setClearColor('#eef0ee');
                renderer.toneMapping = THREE.ACESFilmicToneMapping;
                renderer.toneMappingExposure = 1.05;
                scene.fog = null;
              }}
              onPointerMissed={(e) => {
                // A click on empty space; the end of a camera drag or a click on a tool handle is not one.
                const down = pointerDown.current;
                const dragged = down && Math.hypot(e.clientX - down.x, e.clientY - down.y) > CLICK_SLOP_PX;
                if (dragged || shared.gizmoBusy.current || e.button !== 0) return;
                onEmptyClick?.(e);
              }}
            >
              <SceneLights design={design} contactShadow={display?.contactShadow ?? true} />
              {(display?.grid ?? true) && <UnitGrid design={design} units={units} />}
              <DesignParts design={design} panels={display?.panels ?? true} />
              {(display?.findingMarkers ?? true) && <FindingMarkers design={design} analysis={analysis} />}
              <OrbitControls makeDefault enableDamping={false} zoomToCursor minDistance={40} maxDistance={60_000} />
              <CameraDirector requests={[cameraRequest, ownRequest]} frameKey={frameKey} />
              {viewPlan && <ViewPlanSync markerRef={markerRef} />}
              <LevelOfDetail profileCount={design.profiles.length} />
              <SceneTestHook />
              {children}
            </Canvas>
            {viewPlan && (
              <ViewPlan
                footprint={footprint}
                markerRef={markerRef}
                onView={(view) => shared.aimCamera.current?.(VIEW_DIRECTIONS[view].clone())}
                onFit={() => setOwnRequest({ ids: 'all', nonce: nextNonce() })}
              />
            )}
            {overlay}
          </div>
        </PartClickContext.Provider>
      </HighlightContext.Provider>
    </SceneContext.Provider>
  );
}

let nonceCounter = 0;
function nextNonce(): number {
  nonceCounter += 1;
  return nonceCounter;
}
