/**
 * The one entry point for applying any DesignOperation, frame groups included. Frame-group
 * operations regenerate a starter's parts, and the starters are built from the plain operations,
 * so they are dispatched here, above both, instead of inside operations.ts (no import cycle).
 */
import { defaultCatalogue } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { addFrameGroup, regenerateFrameGroup, renameFrameGroup } from './frameGroups';
import { applyOperation } from './operations';
import type { DesignOperation } from './operationTypes';
import type { DesignDocument } from './schema';

/** Applies one operation (lengths mm) and returns the new document; throws OperationError when it cannot. */
export function applyDesignOperation(design: DesignDocument, op: DesignOperation, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  switch (op.type) {
    case 'addFrameGroup':
      return addFrameGroup(design, op.payload.group, catalogue);
    case 'regenerateFrameGroup':
      return regenerateFrameGroup(design, op.payload.groupId, op.payload.params, catalogue);
    case 'renameFrameGroup':
      return renameFrameGroup(design, op.payload.groupId, op.payload.name);
    default:
      return applyOperation(design, op, catalogue);
  }
}

export { addFrameGroup, regenerateFrameGroup, renameFrameGroup };
export { frameGroupOfPart, frameGroupsOf } from './frameGroups';
