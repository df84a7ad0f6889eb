import type { DesignDocument, Vec3 } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';
import { operationCommand } from './operationCommand';

export { INSERT_GAP_MM, mergeDesign } from '@/domain/design/mergeDesign';

/**
 * Adds another design's parts to the current one (the domain's `insertDesign` operation): ids
 * renamed, the piece moved beside the current frame (to +X) unless an offset is given. One entry.
 */
export function insertDesignCommand(label: string, inserted: DesignDocument, offset?: Vec3): EditorCommand {
  return operationCommand(label, { type: 'insertDesign', payload: { design: inserted, ...(offset ? { offset } : {}) } });
}

export { besideOffset } from '@/domain/design/mergeDesign';
