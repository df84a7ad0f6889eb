import { mergeDesign } from '@/domain/design/mergeDesign';
import type { DesignDocument, Vec3 } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';
import { partBounds } from './selectionGeometry';

/** Gap left between the current frame and an inserted one, mm. */
export const INSERT_GAP_MM = 200;

/**
 * Adds another design's parts to the current one: every id renamed so nothing clashes, and the
 * whole piece moved beside the current frame (to +X) unless an offset is given. Undoable as one entry.
 */
export function insertDesignCommand(label: string, inserted: DesignDocument, offset?: Vec3): EditorCommand {
  let previous: DesignDocument | null = null;
  return {
    label,
    apply(design) {
      previous = design;
      return mergeDesign(design, inserted, offset ?? besideOffset(design, inserted));
    },
    undo(design) {
      return previous ?? design;
    },
    toJSON() {
      return { type: 'insert-design', label, offset: offset ?? null, design: inserted };
    },
  };
}

/** Where an added frame goes: beside the current parts, to +X, with a gap. mm. */
export function besideOffset(current: DesignDocument, inserted: DesignDocument): Vec3 {
  const here = partBounds(current, 'all');
  const there = partBounds(inserted, 'all');
  if (!here || !there) return [0, 0, 0];
  return [Math.round(here.max[0] + INSERT_GAP_MM - there.min[0]), 0, 0];
}

export { mergeDesign };
