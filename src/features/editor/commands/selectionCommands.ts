import type { Axis, DesignDocument, Vec3 } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';
import { operationCommand } from './operationCommand';
import { axisIndex, boundsCentre, duplicateOffset, partBounds } from './selectionGeometry';

const count = (ids: string[]) => (ids.length === 1 ? ids[0] : `${ids.length} parts`);

export function deletePartsCommand(ids: string[]): EditorCommand {
  return operationCommand(`Delete ${count(ids)}`, { type: 'removeParts', payload: { ids } });
}

export function duplicatePartsCommand(design: DesignDocument, ids: string[]): EditorCommand {
  const offset = duplicateOffset(partBounds(design, ids));
  return operationCommand(`Duplicate ${count(ids)}`, { type: 'duplicateParts', payload: { ids, offset } });
}

/** Mirror about the plane normal to `axis` through the frame's centre or the selection's own centre. */
export function mirrorPartsCommand(design: DesignDocument, ids: string[], axis: Axis, through: 'frame' | 'selection', keepOriginal: boolean): EditorCommand {
  const bounds = partBounds(design, through === 'frame' ? 'all' : ids);
  const point: Vec3 = bounds ? boundsCentre(bounds) : [0, 0, 0];
  const verb = keepOriginal ? 'Mirror a copy of' : 'Mirror';
  return operationCommand(`${verb} ${count(ids)} across ${axis.toUpperCase()}`, {
    type: 'mirrorParts',
    payload: { ids, axis, point, keepOriginal },
  });
}

/** `total` instances in all along an axis, `spacingMm` apart (the originals are the first). */
export function arrayPartsCommand(ids: string[], total: number, axis: Axis, spacingMm: number): EditorCommand {
  const spacing: Vec3 = [0, 0, 0];
  spacing[axisIndex(axis)] = spacingMm;
  return operationCommand(`Array ${count(ids)} × ${total} along ${axis.toUpperCase()}`, {
    type: 'arrayParts',
    payload: { ids, count: total, spacing },
  });
}

export function rotatePartsCommand(design: DesignDocument, ids: string[], axis: Axis, turns = 1): EditorCommand {
  const bounds = partBounds(design, ids);
  const point: Vec3 = bounds ? boundsCentre(bounds) : [0, 0, 0];
  return operationCommand(`Turn ${count(ids)} 90° about ${axis.toUpperCase()}`, {
    type: 'rotateParts90',
    payload: { ids, axis, point, quarterTurns: turns },
  });
}

/** Ids present in `after` but not in `before` (what a duplicate, mirror or array added). */
export function addedPartIds(before: DesignDocument, after: DesignDocument): string[] {
  const had = new Set([...before.profiles, ...before.panels, ...before.joints, ...before.accessories].map((part) => part.id));
  return [...after.profiles, ...after.panels].map((part) => part.id).filter((id) => !had.has(id));
}
