import { useRef, type KeyboardEvent, type RefObject } from 'react';
import { useFrame } from '@react-three/fiber';
import type { OrbitControls as OrbitControlsImpl } from 'three-stdlib';
import { useThree } from '@react-three/fiber';
import type { Footprint } from './footprint';
import type { ViewName } from './viewerTypes';

/** Size of the plan drawing, px. */
const PLAN = 96;
/** Room the footprint may take inside the plan, px. */
const INNER = 52;

interface ViewPlanProps {
  /** The design's plan extent, mm (required). */
  footprint: Footprint;
  /** Turns the camera to a named view (required). */
  onView: (view: ViewName) => void;
  /** Fits the whole design in view from the current direction (required). */
  onFit: () => void;
  /** The marker the in-canvas sync turns to where the camera stands (required; from useRef). */
  markerRef: RefObject<SVGGElement | null>;
}

/**
 * Slotwise's orientation control, drawn for furniture: a small plan of the design's footprint seen
 * from above, front (-Z) at the bottom. Click (or press Enter on) an edge to look at the design
 * from that side; a dot on the ring shows where the camera stands. Buttons below look from above,
 * from the three-quarter view, and fit everything. HTML and SVG: no draw calls, works with keys
 * and touch.
 */
export function ViewPlan({ footprint, onView, onFit, markerRef }: ViewPlanProps) {
  const width = Math.max(1, footprint.maxX - footprint.minX);
  const depth = Math.max(1, footprint.maxZ - footprint.minZ);
  const scale = INNER / Math.max(width, depth);
  const w = Math.max(14, width * scale);
  const d = Math.max(14, depth * scale);
  const left = (PLAN - w) / 2;
  const top = (PLAN - d) / 2;
  // Plan x runs along -X (as the top view shows it), plan y along -Z: the front edge is at the bottom.
  const edges: { view: ViewName; label: string; x1: number; y1: number; x2: number; y2: number }[] = [
    { view: 'front', label: 'Look from the front', x1: left, y1: top + d, x2: left + w, y2: top + d },
    { view: 'back', label: 'Look from the back', x1: left, y1: top, x2: left + w, y2: top },
    { view: 'left', label: 'Look from the left side', x1: left + w, y1: top, x2: left + w, y2: top + d },
    { view: 'right', label: 'Look from the right side', x1: left, y1: top, x2: left, y2: top + d },
  ];
  const onKey = (view: ViewName) => (e: KeyboardEvent) => {
    if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      onView(view);
    }
  };
  return (
    <div className="pointer-events-none absolute right-3 top-3 flex select-none flex-col items-end gap-1" role="group" aria-label="Camera views" data-testid="view-plan">
      <svg
        width={PLAN}
        height={PLAN}
        viewBox={`0 0 ${PLAN} ${PLAN}`}
        className="pointer-events-auto rounded-full bg-paper-raised/80 shadow-sm"
        aria-label="Plan of the design: click an edge to look from that side"
      >
        <circle cx={PLAN / 2} cy={PLAN / 2} r={PLAN / 2 - 6} fill="none" stroke="currentColor" className="text-paper-line" strokeDasharray="2 4" />
        <rect x={left} y={top} width={w} height={d} rx={2} className="fill-paper-sunk stroke-ink-muted/50" strokeWidth={1} />
        {edges.map((edge) => (
          <g
            key={edge.view}
            role="button"
            tabIndex={0}
            aria-label={edge.label}
            onClick={() => onView(edge.view)}
            onKeyDown={onKey(edge.view)}
            className="group cursor-pointer outline-none"
          >
            <title>{edge.label}</title>
            {/* A wide invisible stroke makes a touch target; the visible edge thickens on hover and focus. */}
            <line x1={edge.x1} y1={edge.y1} x2={edge.x2} y2={edge.y2} stroke="transparent" strokeWidth={16} strokeLinecap="round" />
            <line
              x1={edge.x1}
              y1={edge.y1}
              x2={edge.x2}
              y2={edge.y2}
              strokeLinecap="round"
              className={`${edge.view === 'front' ? 'stroke-accent' : 'stroke-ink-soft'} group-hover:stroke-accent-strong group-focus-visible:stroke-accent-strong`}
              strokeWidth={edge.view === 'front' ? 4 : 3}
            />
          </g>
        ))}
        <text x={PLAN / 2} y={Math.min(PLAN - 4, top + d + 13)} textAnchor="middle" className="fill-accent-strong text-[9px] font-semibold uppercase tracking-wide">
          Front
        </text>
        <g ref={markerRef} style={{ transformOrigin: `${PLAN / 2}px ${PLAN / 2}px` }} aria-hidden="true">
          <circle cx={PLAN - 6} cy={PLAN / 2} r={4} className="fill-accent" />
        </g>
      </svg>
      <div className="pointer-events-auto flex gap-1">
        <PlanButton label="Top" title="Look from above" onClick={() => onView('top')} />
        <PlanButton label="¾" title="Three-quarter view from the front" onClick={() => onView('iso')} />
        <PlanButton label="Fit" title="Fit the whole design in view" onClick={onFit} />
      </div>
    </div>
  );
}

function PlanButton({ label, title, onClick }: { label: string; title: string; onClick: () => void }) {
  return (
    <button
      type="button"
      title={title}
      aria-label={title}
      onClick={onClick}
      className="min-h-[44px] min-w-[44px] rounded-md border border-paper-line bg-paper-raised/90 px-2 text-xs font-medium text-ink-soft hover:border-accent hover:text-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
    >
      {label}
    </button>
  );
}

/**
 * Inside the canvas: on every rendered frame, turns the plan's camera marker to where the camera
 * stands around its target (plan x = -X, plan y = -Z). Writes the DOM directly, no React state.
 */
export function ViewPlanSync({ markerRef }: { markerRef: RefObject<SVGGElement | null> }) {
  const last = useRef('');
  const controls = useThree((s) => s.controls) as unknown as OrbitControlsImpl | null;
  useFrame(({ camera }) => {
    const el = markerRef.current;
    if (!el) return;
    const tx = controls?.target.x ?? 0;
    const tz = controls?.target.z ?? 0;
    const angle = (Math.atan2(-(camera.position.z - tz), -(camera.position.x - tx)) * 180) / Math.PI;
    const transform = `rotate(${angle.toFixed(1)}deg)`;
    if (transform !== last.current) {
      el.style.transform = transform;
      last.current = transform;
    }
  });
  return null;
}
