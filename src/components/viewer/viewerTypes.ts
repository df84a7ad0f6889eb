/** Props vocabulary shared by the viewer layer's components (no store, no editor types). */
import type { DesignAnalysis } from '@/domain/analysis/types';
import type { LengthUnit } from '@/domain/units';

/**
 * Named camera views. Front is -Z (the design format and the frame starters put the front at -Z):
 * the front view's camera stands on the -Z side looking toward +Z. Left is -X, right is +X, as the
 * starters label their parts ("Upright, front left" stands at -X, -Z).
 */
export type ViewName = 'front' | 'back' | 'left' | 'right' | 'top' | 'iso';

/** A one-shot camera move: the scene acts when `nonce` changes. */
export interface CameraRequest {
  /** Parts to frame, or every part. */
  ids: readonly string[] | 'all';
  /** Direction to look from; keeps the current direction when left out. */
  view?: ViewName;
  /** Jump without the eased move (default false). */
  instant?: boolean;
  nonce: number;
}

/** What the viewer draws besides the parts. */
export interface ViewerDisplayOptions {
  /** Units of the floor grid (default 'mm'). */
  units?: LengthUnit;
  /** The floor grid (default true). */
  grid?: boolean;
  /** Severity badges over parts named by errors and warnings (default true). */
  findingMarkers?: boolean;
  /** Panels (sheets) drawn; false hides every panel to see inside (default true). */
  panels?: boolean;
  /** A soft contact shadow under the design (default true). */
  contactShadow?: boolean;
}

/** How a click picked a part: replace the selection, add to it (shift), or toggle (ctrl/cmd). */
export type PartClickMode = 'replace' | 'add' | 'toggle';

/** Selection, hover and findings: they tint parts (colours written per instance, no re-layout). */
export interface PartHighlight {
  selection: readonly string[];
  hoveredId: string | null;
  analysis: DesignAnalysis | null;
}
